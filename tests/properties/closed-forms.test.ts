/**
 * sectionProperties against textbook closed forms. Reference values come from
 * tests/fixtures/analytic_refs.csv (copied from the shared reference; its `source` column names
 * the book or derivation of each value) or from closed forms written out beside the check.
 * Tolerances: docs/methods.md §11 (1e−12 exact sums, 1e−9 far offset, 1e−12 quadratic PNA, 1e−10 bisection PNA).
 */
import { describe, expect, it } from 'vitest';
import { sectionProperties, plasticNeutralAxis } from '../../core/properties/index.ts';
import { degrees, type Region } from '../../core/geometry/types.ts';
import { analyticRefs, circleRing, expectRel, poly, rectRing, ref, ring } from './helpers.ts';

const rows = analyticRefs();
const EXACT = 1e-12;

const rectangle: Region = [poly(rectRing(0, 0, 100, 200))];
const farX = 1234567.891;
const farY = -7654321.123;
const farRectangle: Region = [poly(rectRing(farX, farY, farX + 100, farY + 200))];
const circle: Region = [poly(circleRing(0, 0, 50))];
const tube: Region = [poly(circleRing(0, 0, 50), circleRing(0, 0, 40, true))];
const rightTriangle: Region = [poly(ring([0, 0, 120, 0, 0, 90]))];
const semicircle: Region = [poly(ring([50, 0, -50, 0], [1, 0]))];
const thinTube: Region = [poly(rectRing(0, 0, 200, 100), rectRing(5, 5, 195, 95))];
/** Holes are clockwise: the CCW rectangle ring reversed. */
function cwRect(x0: number, y0: number, x1: number, y1: number) {
  return ring([x0, y0, x0, y1, x1, y1, x1, y0]);
}
const thinTubeCw: Region = [poly(rectRing(0, 0, 200, 100), cwRect(5, 5, 195, 95))];
const rectWithHole: Region = [poly(rectRing(0, 0, 200, 300), cwRect(40, 50, 160, 250))];
const angle100: Region = [poly(ring([0, 0, 100, 0, 100, 10, 10, 10, 10, 100, 0, 100]))];
const teeFlange: Region = [poly(ring([-5, 0, 5, 0, 5, 180, 100, 180, 100, 200, -100, 200, -100, 180, -5, 180]))];
const iSection: Region = [
  poly(ring([-100, -157.5, 100, -157.5, 100, -142.5, 5, -142.5, 5, 142.5, 100, 142.5, 100, 157.5, -100, 157.5,
    -100, 142.5, -5, 142.5, -5, -142.5, -100, -142.5])),
];
const s2 = 50 * Math.SQRT2; // half-diagonal of a 100 × 100 square
const diamond: Region = [poly(ring([s2, 0, 0, s2, -s2, 0, 0, -s2]))];

describe('rectangle 100 × 200 (analytic_refs.csv: rectangle)', () => {
  const p = sectionProperties(rectangle);
  it('area, centroid, Ix, Iy, Ixy, Ip, rx, ry match b h, bh³/12, hb³/12 to 1e-12', () => {
    expectRel(p.area, ref(rows, 'rectangle', 'A'), EXACT);
    expectRel(p.cx, ref(rows, 'rectangle', 'xc'), EXACT);
    expectRel(p.cy, ref(rows, 'rectangle', 'yc'), EXACT);
    expectRel(p.Ix, ref(rows, 'rectangle', 'Ix'), EXACT);
    expectRel(p.Iy, ref(rows, 'rectangle', 'Iy'), EXACT);
    expectRel(p.Ixy, 0, EXACT, p.Ix);
    expectRel(p.Ip, ref(rows, 'rectangle', 'Ip'), EXACT);
    expectRel(p.rx, ref(rows, 'rectangle', 'rx'), EXACT);
    expectRel(p.ry, ref(rows, 'rectangle', 'ry'), EXACT);
  });
  it('elastic moduli bh²/6, hb²/6; plastic bh²/4, hb²/4 with PNA at mid-depth; shape factor 1.5', () => {
    for (const s of [p.SxTop, p.SxBottom]) expectRel(s, ref(rows, 'rectangle', 'Sx'), EXACT);
    for (const s of [p.SyLeft, p.SyRight]) expectRel(s, ref(rows, 'rectangle', 'Sy'), EXACT);
    expectRel(p.Zx, ref(rows, 'rectangle', 'Zx'), EXACT);
    expectRel(p.Zy, ref(rows, 'rectangle', 'Zy'), EXACT);
    expectRel(p.pnaY, 100, EXACT);
    expectRel(p.pnaX, 50, EXACT);
    expectRel(p.shapeFactorX, ref(rows, 'rectangle', 'shape_factor_x'), EXACT);
  });
  it('principal axes: I1 = Ix along θ1 = 0 (Ix > Iy, Ixy = 0), not isotropic, bounds are the corners', () => {
    expectRel(p.I1, ref(rows, 'rectangle', 'Ix'), EXACT);
    expectRel(p.I2, ref(rows, 'rectangle', 'Iy'), EXACT);
    expect(p.thetaDeg).toBe(0);
    expect(p.isotropic).toBe(false);
    expect([p.xMin, p.xMax, p.yMin, p.yMax]).toEqual([0, 100, 0, 200]);
  });
});

describe('rectangle drawn 7.7e6 from the origin (analytic_refs.csv: rectangle_far_offset, docs/methods.md §1.3)', () => {
  const p = sectionProperties(farRectangle);
  it('centroid and Ix = bh³/12 to 1e-9 relative, Ixy = 0 to 1e-9·Ix', () => {
    expectRel(p.cx, ref(rows, 'rectangle_far_offset', 'xc'), 1e-9);
    expectRel(p.cy, ref(rows, 'rectangle_far_offset', 'yc'), 1e-9);
    expectRel(p.Ix, ref(rows, 'rectangle_far_offset', 'Ix'), 1e-9);
    expectRel(p.Ixy, ref(rows, 'rectangle_far_offset', 'Ixy'), 1e-9, p.Ix);
    expectRel(p.Zx, ref(rows, 'rectangle', 'Zx'), 1e-9);
    expectRel(p.SxTop, ref(rows, 'rectangle', 'Sx'), 1e-9);
    expectRel(p.pnaY, farY + 100, 1e-12);
  });
});

describe('right triangle b = 120, h = 90 (analytic_refs.csv: right_triangle)', () => {
  const p = sectionProperties(rightTriangle);
  it('centroid b/3, h/3; Ix bh³/36; Iy hb³/36; Ixy = −b²h²/72 to 1e-12', () => {
    expectRel(p.area, ref(rows, 'right_triangle', 'A'), EXACT);
    expectRel(p.cx, ref(rows, 'right_triangle', 'xc'), EXACT);
    expectRel(p.cy, ref(rows, 'right_triangle', 'yc'), EXACT);
    expectRel(p.Ix, ref(rows, 'right_triangle', 'Ix'), EXACT);
    expectRel(p.Iy, ref(rows, 'right_triangle', 'Iy'), EXACT);
    expectRel(p.Ixy, ref(rows, 'right_triangle', 'Ixy'), EXACT);
  });
  it('Mohr circle I1, I2 to 1e-12 and θ1 = 60.128…° to 1e-9 degrees', () => {
    expectRel(p.I1, ref(rows, 'right_triangle', 'I1'), EXACT);
    expectRel(p.I2, ref(rows, 'right_triangle', 'I2'), EXACT);
    expect(Math.abs(p.thetaDeg - ref(rows, 'right_triangle', 'theta1_deg'))).toBeLessThan(1e-9);
  });
  it('horizontal PNA at h(1 − 1/√2) and Zx = bh²(2 − √2)/6 (quadratic method, 1e-12)', () => {
    expectRel(p.pnaY, ref(rows, 'right_triangle', 'PNA_y'), EXACT);
    expectRel(p.Zx, ref(rows, 'right_triangle', 'Zx'), EXACT);
  });
});

describe('equilateral triangle, side a = 60, base on the x axis', () => {
  const a = 60;
  const h = (a * Math.sqrt(3)) / 2;
  const p = sectionProperties([poly(ring([0, 0, a, 0, a / 2, h]))]);
  it('Ix = Iy = √3 a⁴/96 and flagged isotropic with θ1 = 0 (Gere & Timoshenko, Mechanics of Materials, triangle properties; docs/methods.md §3)', () => {
    const I = (Math.sqrt(3) * a ** 4) / 96;
    expectRel(p.Ix, I, EXACT);
    expectRel(p.Iy, I, EXACT);
    expect(p.isotropic).toBe(true);
    expect(p.thetaDeg).toBe(0);
  });
  it('shape factor about the base-parallel axis is 4(2 − √2) = 2.343 (classical value, docs/methods.md §5.1)', () => {
    // S_min = Ix / (2h/3) = bh²/24 and Z = bh²(2 − √2)/6 for any triangle with a horizontal base (width linear in y).
    expectRel(p.Zx, (a * h * h * (2 - Math.SQRT2)) / 6, EXACT);
    expectRel(p.shapeFactorX, 4 * (2 - Math.SQRT2), EXACT);
  });
});

describe('circle d = 100 and tube 100/80 as exact arcs (analytic_refs.csv: circle, hollow_circle)', () => {
  it('circle: A = πd²/4, Ix = Iy = πd⁴/64, Sx = πd³/32, Zx = d³/6, shape factor 16/(3π), rx = d/4, isotropic', () => {
    const p = sectionProperties(circle);
    expectRel(p.area, ref(rows, 'circle', 'A'), EXACT);
    expectRel(p.Ix, ref(rows, 'circle', 'Ix'), EXACT);
    expectRel(p.Iy, ref(rows, 'circle', 'Iy'), EXACT);
    expectRel(p.SxTop, ref(rows, 'circle', 'Sx'), EXACT);
    expectRel(p.SxBottom, ref(rows, 'circle', 'Sx'), EXACT);
    expectRel(p.Zx, ref(rows, 'circle', 'Zx'), 1e-10);
    expectRel(p.Zy, ref(rows, 'circle', 'Zx'), 1e-10);
    expectRel(p.shapeFactorX, ref(rows, 'circle', 'shape_factor_x'), 1e-10);
    expectRel(p.rx, ref(rows, 'circle', 'rx'), EXACT);
    expect(p.isotropic).toBe(true);
    expect([p.xMin, p.xMax, p.yMin, p.yMax]).toEqual([-50, 50, -50, 50]);
  });
  it('tube: A = π(do² − di²)/4, Ix = π(do⁴ − di⁴)/64, Sx, Zx = (do³ − di³)/6', () => {
    const p = sectionProperties(tube);
    expectRel(p.area, ref(rows, 'hollow_circle', 'A'), EXACT);
    expectRel(p.Ix, ref(rows, 'hollow_circle', 'Ix'), EXACT);
    expectRel(p.SxTop, ref(rows, 'hollow_circle', 'Sx'), EXACT);
    expectRel(p.Zx, ref(rows, 'hollow_circle', 'Zx'), 1e-10);
  });
});

describe('semicircle r = 50 (analytic_refs.csv: semicircle)', () => {
  const p = sectionProperties(semicircle);
  it('A = πr²/2, yc = 4r/(3π), Ix = (π/8 − 8/(9π))r⁴, Iy = πr⁴/8, Sx top and bottom', () => {
    expectRel(p.area, ref(rows, 'semicircle', 'A'), EXACT);
    expectRel(p.cy, ref(rows, 'semicircle', 'yc'), EXACT);
    expectRel(p.Ix, ref(rows, 'semicircle', 'Ix'), EXACT);
    expectRel(p.Iy, ref(rows, 'semicircle', 'Iy'), EXACT);
    expectRel(p.SxTop, ref(rows, 'semicircle', 'Sx_top'), EXACT);
    expectRel(p.SxBottom, ref(rows, 'semicircle', 'Sx_bot'), EXACT);
    expectRel(p.yMax, 50, EXACT);
  });
  it('PNA at 0.40397r and Zx = 0.35398r³ (Brent on the arc, 1e-10); Zy = 2r³/3 with the PNA on the axis', () => {
    expectRel(p.pnaY, ref(rows, 'semicircle', 'PNA_y'), 1e-10);
    expectRel(p.Zx, ref(rows, 'semicircle', 'Zx'), 1e-10);
    expectRel(p.Zy, ref(rows, 'semicircle', 'Zy'), 1e-10);
    expectRel(p.pnaX, 0, 1e-10, 50);
  });
});

describe('rectangular tube and rectangle with a central hole (analytic_refs.csv: thin_rect_tube, rect_with_central_hole)', () => {
  it('tube 200 × 100 × 5: A, Ix, Iy, Sx, Zx by composition of rectangles (exact)', () => {
    const p = sectionProperties(thinTubeCw);
    expectRel(p.area, ref(rows, 'thin_rect_tube', 'A'), EXACT);
    expectRel(p.Ix, ref(rows, 'thin_rect_tube', 'Ix'), EXACT);
    expectRel(p.Iy, ref(rows, 'thin_rect_tube', 'Iy'), EXACT);
    expectRel(p.SxTop, ref(rows, 'thin_rect_tube', 'Sx'), EXACT);
    expectRel(p.Zx, ref(rows, 'thin_rect_tube', 'Zx'), EXACT);
  });
  it('a hole given counter-clockwise (not normalised) adds instead of subtracting: the engine relies on normalisation', () => {
    // Documented assumption of core/properties: input is normalised (holes CW). A CCW hole adds area.
    expectRel(sectionProperties(thinTube).area, 200 * 100 + 190 * 90, EXACT);
  });
  it('200 × 300 with a 120 × 200 hole: A, centroid, Ix, Iy, Ixy = 0, Sx, Sy, Zx, Zy', () => {
    const p = sectionProperties(rectWithHole);
    for (const [q, v] of [['A', p.area], ['xc', p.cx], ['yc', p.cy], ['Ix', p.Ix], ['Iy', p.Iy], ['Zx', p.Zx], ['Zy', p.Zy]] as const) {
      expectRel(v, ref(rows, 'rect_with_central_hole', q), EXACT);
    }
    expectRel(p.Ixy, 0, EXACT, p.Ix);
    expectRel(p.SxTop, ref(rows, 'rect_with_central_hole', 'Sx'), EXACT);
    expectRel(p.SyLeft, ref(rows, 'rect_with_central_hole', 'Sy'), EXACT);
  });
});

describe('equal angle 100 × 100 × 10, sharp corners (analytic_refs.csv: angle_100x100x10)', () => {
  const p = sectionProperties(angle100);
  it('A, centroid, Ix, Iy, Ixy < 0 (legs along +x, +y) to 1e-12', () => {
    for (const [q, v] of [['A', p.area], ['xc', p.cx], ['yc', p.cy], ['Ix', p.Ix], ['Iy', p.Iy], ['Ixy', p.Ixy]] as const) {
      expectRel(v, ref(rows, 'angle_100x100x10', q), EXACT);
    }
  });
  it('I1, I2 to 1e-12, θ1 = 45° to 1e-9°, Sx top/bottom, S1_min and S2_min to 1e-12', () => {
    expectRel(p.I1, ref(rows, 'angle_100x100x10', 'I1'), EXACT);
    expectRel(p.I2, ref(rows, 'angle_100x100x10', 'I2'), EXACT);
    expect(Math.abs(p.thetaDeg - ref(rows, 'angle_100x100x10', 'theta1_deg'))).toBeLessThan(1e-9);
    expectRel(p.SxTop, ref(rows, 'angle_100x100x10', 'Sx_top'), EXACT);
    expectRel(p.SxBottom, ref(rows, 'angle_100x100x10', 'Sx_bot'), EXACT);
    expectRel(Math.min(p.S1Plus, p.S1Minus), ref(rows, 'angle_100x100x10', 'S1_min'), EXACT);
    expectRel(Math.min(p.S2Plus, p.S2Minus), ref(rows, 'angle_100x100x10', 'S2_min'), EXACT);
  });
});

describe('unequal angle 150 × 90 × 10, sharp corners: composition of two rectangles (exact, Gere & Timoshenko parallel-axis theorem)', () => {
  // Long leg 150 along +y (10 wide), short leg 90 along +x (10 thick); heel at the origin.
  const p = sectionProperties([poly(ring([0, 0, 90, 0, 90, 10, 10, 10, 10, 150, 0, 150]))]);
  // Rectangles: R1 = [0,10]×[0,150], R2 = [10,90]×[0,10].
  const parts = [
    { b: 10, h: 150, x: 5, y: 75 },
    { b: 80, h: 10, x: 50, y: 5 },
  ];
  const A = parts.reduce((s, r) => s + r.b * r.h, 0);
  const xc = parts.reduce((s, r) => s + r.b * r.h * r.x, 0) / A;
  const yc = parts.reduce((s, r) => s + r.b * r.h * r.y, 0) / A;
  const Ix = parts.reduce((s, r) => s + (r.b * r.h ** 3) / 12 + r.b * r.h * (r.y - yc) ** 2, 0);
  const Iy = parts.reduce((s, r) => s + (r.h * r.b ** 3) / 12 + r.b * r.h * (r.x - xc) ** 2, 0);
  const Ixy = parts.reduce((s, r) => s + r.b * r.h * (r.x - xc) * (r.y - yc), 0);
  it('Ix, Iy, Ixy match the composition to 1e-12', () => {
    expectRel(p.Ix, Ix, EXACT);
    expectRel(p.Iy, Iy, EXACT);
    expectRel(p.Ixy, Ixy, EXACT);
  });
  it('θ1 = ½ atan2(−2Ixy, Ix − Iy) ≈ 20.1° (docs/methods.md §3 quotes 20.135°) and I1 − I2 = 2R (Mohr)', () => {
    const theta = (0.5 * Math.atan2(-2 * Ixy, Ix - Iy) * 180) / Math.PI;
    expect(Math.abs(p.thetaDeg - theta)).toBeLessThan(1e-9);
    expect(Math.abs(p.thetaDeg - 20.135)).toBeLessThan(5e-4);
    expectRel(p.I1 - p.I2, 2 * Math.hypot((Ix - Iy) / 2, Ixy), 1e-11);
  });
  it('about x the plastic moment is not parallel to the PNA (Z⊥ ≠ 0, docs/methods.md §5.1)', () => {
    const z = plasticNeutralAxis([poly(ring([0, 0, 90, 0, 90, 10, 10, 10, 10, 150, 0, 150]))], degrees(0));
    expect(z.momentNotParallel).toBe(true);
    expect(Math.abs(z.Zperp)).toBeGreaterThan(1e-3 * z.Z);
  });
});

describe('tee with the PNA in the flange (analytic_refs.csv: tee_pna_in_flange)', () => {
  const p = sectionProperties(teeFlange);
  it('A, yc, Ix, Iy, Sx top/bottom to 1e-12', () => {
    expectRel(p.area, ref(rows, 'tee_pna_in_flange', 'A'), EXACT);
    expectRel(p.cy, ref(rows, 'tee_pna_in_flange', 'yc'), EXACT);
    expectRel(p.Ix, ref(rows, 'tee_pna_in_flange', 'Ix'), EXACT);
    expectRel(p.Iy, ref(rows, 'tee_pna_in_flange', 'Iy'), EXACT);
    expectRel(p.SxTop, ref(rows, 'tee_pna_in_flange', 'Sx_top'), EXACT);
    expectRel(p.SxBottom, ref(rows, 'tee_pna_in_flange', 'Sx_bot'), EXACT);
  });
  it('PNA at 185.5, Zx = 195 950, Zy = 204 500, shape factor 1.789 (quadratic method, 1e-12)', () => {
    expectRel(p.pnaY, ref(rows, 'tee_pna_in_flange', 'PNA_y'), EXACT);
    expectRel(p.Zx, ref(rows, 'tee_pna_in_flange', 'Zx'), EXACT);
    expectRel(p.Zy, ref(rows, 'tee_pna_in_flange', 'Zy'), EXACT);
    expectRel(p.shapeFactorX, ref(rows, 'tee_pna_in_flange', 'shape_factor_x'), EXACT);
  });
});

describe('tee with the PNA in the web: flange 120 × 10 on a web 12 × 200 (closed form by composition of rectangles)', () => {
  // Web [−6,6]×[0,200] (2400), flange [−60,60]×[200,210] (1200): A = 3600, half = 1800 lies in the web,
  // so the PNA is at y = 1800/12 = 150 above the web tip; Z = Σ|y − 150| dA:
  //   web below: 12·150²/2 = 135 000; web above: 12·50²/2 = 15 000; flange: 1200·(205 − 150) = 66 000.
  const p = sectionProperties([poly(ring([-6, 0, 6, 0, 6, 200, 60, 200, 60, 210, -60, 210, -60, 200, -6, 200]))]);
  it('PNA at y = 150 and Zx = 216 000 to 1e-12', () => {
    expectRel(p.pnaY, 150, EXACT);
    expectRel(p.Zx, 135000 + 15000 + 66000, EXACT);
  });
  it('Zy = (tf bf² + hw tw²)/4 = 46 800 with the PNA on the symmetry axis', () => {
    expectRel(p.Zy, (10 * 120 ** 2 + 200 * 12 ** 2) / 4, EXACT);
    expectRel(p.pnaX, 0, EXACT, 60);
  });
});

describe('I-section bf 200, tf 15, tw 10, D 315 (analytic_refs.csv: i_section)', () => {
  const p = sectionProperties(iSection);
  it('A, Ix, Iy, Sx, Zx = bf tf (D − tf) + tw hw²/4, Zy to 1e-12; shape factor in the rolled-I band 1.10–1.18', () => {
    expectRel(p.area, ref(rows, 'i_section', 'A'), EXACT);
    expectRel(p.Ix, ref(rows, 'i_section', 'Ix'), EXACT);
    expectRel(p.Iy, ref(rows, 'i_section', 'Iy'), EXACT);
    expectRel(p.SxTop, ref(rows, 'i_section', 'Sx'), EXACT);
    expectRel(p.Zx, ref(rows, 'i_section', 'Zx'), EXACT);
    expectRel(p.Zy, ref(rows, 'i_section', 'Zy'), EXACT);
    expect(p.shapeFactorX).toBeGreaterThan(1.1);
    expect(p.shapeFactorX).toBeLessThan(1.18);
  });
});

describe('channel 200 deep, flanges 80 × 12, web 8 (closed form by composition of rectangles)', () => {
  // Web [0,8]×[0,200]; flanges [8,80]×[0,12] and [8,80]×[188,200]; flanges toward +x.
  const p = sectionProperties([poly(ring([0, 0, 80, 0, 80, 12, 8, 12, 8, 188, 80, 188, 80, 200, 0, 200]))]);
  const rects = [
    { b: 8, h: 200, x: 4, y: 100 },
    { b: 72, h: 12, x: 44, y: 6 },
    { b: 72, h: 12, x: 44, y: 194 },
  ];
  const A = rects.reduce((s, r) => s + r.b * r.h, 0);
  const xc = rects.reduce((s, r) => s + r.b * r.h * r.x, 0) / A;
  it('A, xc, Ix, Iy by the parallel-axis theorem (Gere & Timoshenko) to 1e-12; Ixy = 0 (x axis of symmetry)', () => {
    expectRel(p.area, A, EXACT);
    expectRel(p.cx, xc, EXACT);
    expectRel(p.Ix, rects.reduce((s, r) => s + (r.b * r.h ** 3) / 12 + r.b * r.h * (r.y - 100) ** 2, 0), EXACT);
    expectRel(p.Iy, rects.reduce((s, r) => s + (r.h * r.b ** 3) / 12 + r.b * r.h * (r.x - xc) ** 2, 0), EXACT);
    expectRel(p.Ixy, 0, EXACT, p.Ix);
  });
  it('Zx = 2·bf tf (d − tf)/2 + tw d²/4 and SyLeft/SyRight use the web back and the flange tips', () => {
    expectRel(p.Zx, 2 * 72 * 12 * 94 + (8 * 200 ** 2) / 4, EXACT);
    expectRel(p.SyLeft, p.Iy / xc, EXACT);
    expectRel(p.SyRight, p.Iy / (80 - xc), EXACT);
  });
});

describe('diamond: a 100 × 100 square with its diagonals on the axes (analytic_refs.csv: diamond)', () => {
  const p = sectionProperties(diamond);
  it('Ix = a⁴/12, Sx = Ix/(a/√2), Zx = two triangles, shape factor 2 (classical)', () => {
    expectRel(p.Ix, ref(rows, 'diamond', 'Ix'), EXACT);
    expectRel(p.SxTop, ref(rows, 'diamond', 'Sx'), EXACT);
    expectRel(p.Zx, ref(rows, 'diamond', 'Zx'), EXACT);
    expectRel(p.shapeFactorX, ref(rows, 'diamond', 'shape_factor_x'), EXACT);
  });
});

describe('square of side a with the PNA at an arbitrary angle t (docs/methods.md §5 square_axis_30deg)', () => {
  // Z(t) = a³ cos t/4 + a³ sin² t/(12 cos t) for |t| ≤ 45°: the two halves are trapezoids (derived).
  const a = 80;
  const square: Region = [poly(rectRing(-a / 2, -a / 2, a / 2, a / 2))];
  for (const tDeg of [0, 10, 30, 45, -30]) {
    it(`Z at t = ${tDeg}° equals a³cos t/4 + a³sin²t/(12 cos t) and the PNA passes through the centre`, () => {
      const t = (tDeg * Math.PI) / 180;
      const z = plasticNeutralAxis(square, degrees(tDeg));
      expectRel(z.Z, (a ** 3 * Math.cos(t)) / 4 + (a ** 3 * Math.sin(t) ** 2) / (12 * Math.cos(t)), EXACT);
      expectRel(z.d, 0, EXACT, a);
    });
  }
});
