import { describe, expect, it } from 'vitest';
import { compositeProperties } from '../../core/materials/composite.ts';
import { kern } from '../../core/stress/kern.ts';
import { neutralAxis, stressAt, stressExtremes, strainPlane, type SectionStiffness } from '../../core/stress/normal-stress.ts';
import { regionContains, stressGrid } from '../../core/stress/field.ts';
import { readRefs, refValue } from '../member/refs.ts';
import { circle, mat, polygon, rect, rel } from '../materials/helpers.ts';

const refs = readRefs(new URL('../fixtures/analytic-refs-stress-member.csv', import.meta.url));
/** A single-material stiffness (E = 1): EA = A, EI = I. */
const geometric = (A: number, cx: number, cy: number, Ix: number, Iy: number, Ixy: number): SectionStiffness => ({ EA: A, cx, cy, EIx: Ix, EIy: Iy, EIxy: Ixy });

describe('normal stress by the unsymmetric bending formula (docs/methods.md §9.1; Gere & Timoshenko)', () => {
  it('rectangle 100×200, N = −200 kN, Mx = 30 kN·m: σ_top = 35 and σ_bottom = −55 N/mm² (analytic refs rectangle_stress)', () => {
    const s = geometric(20_000, 0, 0, (100 * 200 ** 3) / 12, (200 * 100 ** 3) / 12, 0);
    const p = strainPlane(s, { N: -200_000, Mx: 30e6, My: 0 });
    const e = stressExtremes(p, 1, rect(-50, -100, 50, 100));
    expect(rel(e.max, refValue(refs, 'rectangle_stress', 'sigma_top'))).toBeLessThan(1e-12);
    expect(rel(e.min, refValue(refs, 'rectangle_stress', 'sigma_bottom'))).toBeLessThan(1e-12);
    expect(e.maxAt[1]).toBe(100);
    expect(e.minAt[1]).toBe(-100);
  });

  // Unequal angle 150 × 90 × 10 (long leg along +y, short leg along +x, sharp corners), built by hand
  // from two rectangles: leg 10 × 150 at x 0..10 and leg 80 × 10 at x 10..90 (parallel-axis theorem, exact).
  const A1 = 1500, x1 = 5, y1 = 75, A2 = 800, x2 = 50, y2 = 5;
  const A = A1 + A2;
  const xc = (A1 * x1 + A2 * x2) / A, yc = (A1 * y1 + A2 * y2) / A;
  const Ix = (10 * 150 ** 3) / 12 + A1 * (y1 - yc) ** 2 + (80 * 10 ** 3) / 12 + A2 * (y2 - yc) ** 2;
  const Iy = (150 * 10 ** 3) / 12 + A1 * (x1 - xc) ** 2 + (10 * 80 ** 3) / 12 + A2 * (x2 - xc) ** 2;
  const Ixy = A1 * (x1 - xc) * (y1 - yc) + A2 * (x2 - xc) * (y2 - yc);
  const angle = polygon([[0, 0], [90, 0], [90, 10], [10, 10], [10, 150], [0, 150]]);
  const unit = mat('unit', 1, 1, 0);
  const c = compositeProperties([{ region: angle, material: unit }], 'm');

  it('unequal angle 150×90×10: the section sums match the hand composition of two rectangles', () => {
    expect(rel(c.stiffness.EA, A)).toBeLessThan(1e-12);
    expect(rel(c.stiffness.EIx, Ix)).toBeLessThan(1e-12);
    expect(rel(c.stiffness.EIy, Iy)).toBeLessThan(1e-12);
    expect(rel(c.stiffness.EIxy, Ixy)).toBeLessThan(1e-12);
    expect(c.thetaDeg).toBeCloseTo(20.135, 3); // docs/methods.md §3: angle_150x90x10 θ1 = 20.135°
  });

  it('unequal angle under Mx alone: neutral axis at −47.70° (= atan(Ixy/Iy), docs/methods.md §9.1 angle_150x90x10_stress)', () => {
    const na = neutralAxis(strainPlane(c.stiffness, { N: 0, Mx: 1e6, My: 0 }));
    expect(na.angleDeg).toBeCloseTo(-47.70, 2);
    expect(Math.abs(na.angleDeg - (Math.atan(Ixy / Iy) * 180) / Math.PI)).toBeLessThan(1e-9);
    expect(Math.hypot(na.point[0] - xc, na.point[1] - yc)).toBeLessThan(1e-9); // N = 0: through the centroid
  });

  it('unequal angle: the principal-axis route σ = N/A + M1 v/I1 + M2 u/I2 gives the same stress at every vertex', () => {
    const f = { N: -50_000, Mx: 4e6, My: -1.5e6 };
    const p = strainPlane(c.stiffness, f);
    const t = (Math.atan2(-2 * Ixy, Ix - Iy)) / 2; // θ1 (Gere & Timoshenko; docs/methods.md §3)
    const mean = (Ix + Iy) / 2, R = Math.hypot((Ix - Iy) / 2, Ixy);
    const I1 = mean + R, I2 = mean - R;
    const M1 = f.Mx * Math.cos(t) - f.My * Math.sin(t), M2 = f.Mx * Math.sin(t) + f.My * Math.cos(t);
    for (const [x, y] of [[0, 0], [90, 0], [90, 10], [10, 10], [10, 150], [0, 150]] as const) {
      const X = x - xc, Y = y - yc;
      const u = X * Math.cos(t) + Y * Math.sin(t), v = -X * Math.sin(t) + Y * Math.cos(t);
      const principal = f.N / A + (M1 * v) / I1 + (M2 * u) / I2;
      expect(Math.abs(stressAt(p, 1, x, y) - principal)).toBeLessThan(1e-12 * 1e3);
    }
  });

  it('the neutral axis carries zero stress and the stress resultants reproduce N, Mx, My (vertex check of (9.1))', () => {
    const f = { N: 12_000, Mx: -3e6, My: 2e6 };
    const p = strainPlane(c.stiffness, f);
    const na = neutralAxis(p, { minX: 0, minY: 0, maxX: 90, maxY: 150 });
    expect(na.segment).not.toBeNull();
    for (const q of na.segment!) expect(Math.abs(stressAt(p, 1, q[0], q[1]))).toBeLessThan(1e-9);
    // ∫σ dA = N·(1) since σ is linear: σ at the centroid times A
    expect(rel(stressAt(p, 1, xc, yc) * A, f.N)).toBeLessThan(1e-12);
  });

  it('circle d = 100 under Mx: the largest stress M r/I is found on the arc at the top, not at a vertex', () => {
    const I = (Math.PI * 100 ** 4) / 64;
    const p = strainPlane(geometric((Math.PI * 100 ** 2) / 4, 0, 0, I, I, 0), { N: 0, Mx: 1e6, My: 0 });
    const e = stressExtremes(p, 1, circle(0, 0, 100));
    expect(rel(e.max, (1e6 * 50) / I)).toBeLessThan(1e-12);
    expect(Math.abs(e.maxAt[0])).toBeLessThan(1e-9);
    expect(rel(e.maxAt[1], 50)).toBeLessThan(1e-12);
  });

  it('two materials: the stress in each is E_i·ε, so at the interface the steel stress is E_s/E_a times the aluminium stress', () => {
    const steel = mat('s', 2e11, 3.55e8, 7850), al = mat('a', 7e10, 2.5e8, 2700);
    const strip = compositeProperties([{ region: rect(0, 0, 50, 10), material: steel }, { region: rect(0, 10, 50, 30), material: al }], 'mm');
    const p = strainPlane(strip.stiffness, { N: 0, Mx: 1e9, My: 0 });
    expect(rel(stressAt(p, steel.E, 25, 10), (200 / 70) * stressAt(p, al.E, 25, 10))).toBeLessThan(1e-12);
    expect(Math.abs(stressAt(p, al.E, 25, strip.cy))).toBeLessThan(1e-6); // zero at the E-weighted centroid
  });
});

describe('stress field samples for a colour map', () => {
  it('cells of an L-shape hold the formula value inside and NaN in the cut-away corner', () => {
    const region = polygon([[0, 0], [90, 0], [90, 10], [10, 10], [10, 150], [0, 150]]);
    const p = strainPlane(geometric(2300, 20, 50, 5e6, 1.5e6, -1.6e6), { N: 1000, Mx: 1e6, My: 0 });
    const g = stressGrid(p, [{ region, E: 1 }], 9, 15);
    // cell (0, 0) centre (5, 5): inside; cell (8, 14) centre (85, 145): outside
    expect(rel(g.values[0]!, stressAt(p, 1, 5, 5))).toBeLessThan(1e-14);
    expect(Number.isNaN(g.values[14 * 9 + 8]!)).toBe(true);
    expect(g.piece[14 * 9 + 8]).toBe(-1);
  });

  it('point location is exact for arcs: inside a circle just under the arc, outside just beyond it, and holes excluded', () => {
    const ring = circle(0, 0, 100, 80);
    expect(regionContains(ring, 0, 49.999)).toBe(true);
    expect(regionContains(ring, 0, 50.001)).toBe(false);
    expect(regionContains(ring, 35.3, 35.3)).toBe(true); // radius 49.92
    expect(regionContains(ring, 0, 0)).toBe(false); // in the hole
    expect(regionContains(ring, 0, -45)).toBe(true);
  });
});

describe('kern (docs/methods.md §9.2)', () => {
  it('rectangle 100×200 with corners (0 0)-(100 200): rhombus with half-diagonals b/6 and h/6 (middle-third rule)', () => {
    const s = geometric(20_000, 50, 100, (100 * 200 ** 3) / 12, (200 * 100 ** 3) / 12, 0);
    const k = kern(rect(0, 0, 100, 200), s);
    const xs = k.vertices.map((v) => v[0] - 50), ys = k.vertices.map((v) => v[1] - 100);
    expect(rel(Math.max(...xs), refValue(refs, 'rectangle', 'kern_half_width_x'))).toBeLessThan(1e-12);
    expect(rel(-Math.min(...xs), refValue(refs, 'rectangle', 'kern_half_width_x'))).toBeLessThan(1e-12);
    expect(rel(Math.max(...ys), refValue(refs, 'rectangle', 'kern_half_height_y'))).toBeLessThan(1e-12);
    expect(k.vertices).toHaveLength(4);
    expect(k.arcTolerance).toBe(0);
  });

  it('right triangle b = 120, h = 90: kern vertices (30, 45), (30, 22.5), (60, 22.5) (triangle shrunk by 1/4; analytic refs)', () => {
    const s = geometric(refValue(refs, 'right_triangle', 'A'), refValue(refs, 'right_triangle', 'xc'), refValue(refs, 'right_triangle', 'yc'),
      refValue(refs, 'right_triangle', 'Ix'), refValue(refs, 'right_triangle', 'Iy'), refValue(refs, 'right_triangle', 'Ixy'));
    const k = kern(polygon([[0, 0], [120, 0], [0, 90]]), s);
    const expected = [0, 1, 2].map((i) => [refValue(refs, 'right_triangle', `kern_vertex${i}_x`), refValue(refs, 'right_triangle', `kern_vertex${i}_y`)]);
    expect(k.vertices).toHaveLength(3);
    for (const [ex, ey] of expected) {
      expect(k.vertices.some(([x, y]) => Math.abs(x - ex!) < 1e-12 * 60 && Math.abs(y - ey!) < 1e-12 * 60)).toBe(true);
    }
  });

  it('solid circle d = 100: every kern vertex at d/8 = 12.5; the kern polygon within arcTolerance of the circle', () => {
    const I = (Math.PI * 100 ** 4) / 64;
    const k = kern(circle(0, 0, 100), geometric((Math.PI * 100 ** 2) / 4, 0, 0, I, I, 0));
    const radius = refValue(refs, 'circle', 'kern_radius');
    for (const [x, y] of k.vertices) expect(rel(Math.hypot(x, y), radius)).toBeLessThan(1e-12);
    expect(k.vertices.length).toBeGreaterThanOrEqual(720);
    expect(k.arcTolerance).toBeLessThan(1e-5);
  });

  it('hollow circle 100/80: kern radius (do² + di²)/(8 do) = 20.5; the hole changes A and I, not the hull', () => {
    const A = (Math.PI * (100 ** 2 - 80 ** 2)) / 4, I = (Math.PI * (100 ** 4 - 80 ** 4)) / 64;
    const k = kern(circle(0, 0, 100, 80), geometric(A, 0, 0, I, I, 0));
    for (const [x, y] of k.vertices) expect(rel(Math.hypot(x, y), refValue(refs, 'hollow_circle', 'kern_radius'))).toBeLessThan(1e-12);
  });

  it('a load at a kern vertex gives zero stress along its hull edge and compression elsewhere (definition of the kern)', () => {
    const region = polygon([[0, 0], [90, 0], [90, 10], [10, 10], [10, 150], [0, 150]]);
    const c = compositeProperties([{ region, material: mat('u', 1, 1, 0) }], 'm');
    const k = kern(region, c.stiffness);
    const P = 1000;
    k.vertices.forEach(([ex, ey], i) => {
      const N = -P;
      const p = strainPlane(c.stiffness, { N, Mx: N * (ey - c.cy), My: N * (ex - c.cx) });
      const a = k.hull[i]!, b = k.hull[(i + 1) % k.hull.length]!;
      expect(Math.abs(stressAt(p, 1, a[0], a[1]))).toBeLessThan(1e-12 * P);
      expect(Math.abs(stressAt(p, 1, b[0], b[1]))).toBeLessThan(1e-12 * P);
      for (const q of k.hull) expect(stressAt(p, 1, q[0], q[1])).toBeLessThan(1e-12 * P);
    });
  });

  it('two materials (bimaterial strip): top and bottom kern vertices at −EIx/(EA (30 − y_E)) and EIx/(EA y_E) from the E-centroid', () => {
    const steel = mat('s', 2e11, 3.55e8, 7850), al = mat('a', 7e10, 2.5e8, 2700);
    const c = compositeProperties([{ region: rect(0, 0, 50, 10), material: steel }, { region: rect(0, 10, 50, 30), material: al }], 'mm');
    const s = c.stiffness;
    const k = kern(rect(0, 0, 50, 30), s);
    const ys = k.vertices.map((v) => v[1] - s.cy);
    expect(rel(Math.min(...ys), -s.EIx / (s.EA * (30 - s.cy)))).toBeLessThan(1e-12);
    expect(rel(Math.max(...ys), s.EIx / (s.EA * s.cy))).toBeLessThan(1e-12);
  });
});
