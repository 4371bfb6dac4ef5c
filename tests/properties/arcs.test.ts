/**
 * Exact circular arcs (docs/methods.md §2) against closed forms and independent quadrature.
 */
import { describe, expect, it } from 'vitest';
import { plasticNeutralAxisWeighted, regionIntegrals, ringIntegrals, sectionProperties } from '../../core/properties/index.ts';
import { degrees, type Region } from '../../core/geometry/types.ts';
import { circleRing, expectRel, poly, rectRing, reverseRing, ring } from './helpers.ts';

const EXACT = 1e-12;

describe('full circle as exact arcs', () => {
  const d = 100;
  const I = (Math.PI * d ** 4) / 64; // πd⁴/64 (Gere & Timoshenko, Mechanics of Materials)
  it('two semicircular arcs: Ix = Iy = πd⁴/64 to 1e-12, Ixy = 0', () => {
    const p = sectionProperties([poly(circleRing(0, 0, d / 2))]);
    expectRel(p.Ix, I, EXACT);
    expectRel(p.Iy, I, EXACT);
    expectRel(p.Ixy, 0, EXACT, I);
  });
  it('four quarter arcs (bulge tan(π/8)) starting at 30°: the same Ix to 1e-12', () => {
    const b = Math.tan(Math.PI / 8);
    const pts: number[] = [];
    for (let k = 0; k < 4; k++) {
      const t = Math.PI / 6 + (k * Math.PI) / 2;
      pts.push(7 + 50 * Math.cos(t), -3 + 50 * Math.sin(t));
    }
    const p = sectionProperties([poly(ring(pts, [b, b, b, b]))]);
    expectRel(p.area, (Math.PI * d * d) / 4, EXACT);
    expectRel(p.Ix, I, EXACT);
    expectRel(p.cx, 7, EXACT);
    expectRel(p.cy, -3, EXACT, 1);
  });
  it('a circle 1e6 away from the origin keeps Ix = πd⁴/64 to 1e-9 (local origin, docs/methods.md §1.3)', () => {
    const p = sectionProperties([poly(circleRing(1e6, -1e6, d / 2))]);
    expectRel(p.Ix, I, 1e-9);
    expectRel(p.cx, 1e6, 1e-12);
  });
  it('raw integrals about the origin: A = πr², Qx = A·cy, Ixx_O = A·cy² + πr⁴/4 (docs/methods.md §2.3 check)', () => {
    const r = 30;
    const raw = ringIntegrals(circleRing(10, 20, r), 0, 0);
    expectRel(raw.A, Math.PI * r * r, EXACT);
    expectRel(raw.Qx, Math.PI * r * r * 20, EXACT);
    expectRel(raw.Ixx, Math.PI * r * r * 400 + (Math.PI * r ** 4) / 4, EXACT);
  });
});

describe('quarter-circle shapes', () => {
  const r = 40;
  it('quarter disc: A = πr²/4, centroid 4r/(3π), θ1 = +45° (symmetric about y = x; Ixy < 0) (Gere & Timoshenko, table of plane areas)', () => {
    const p = sectionProperties([poly(ring([0, 0, r, 0, 0, r], [0, Math.tan(Math.PI / 8), 0]))]);
    expectRel(p.area, (Math.PI * r * r) / 4, EXACT);
    expectRel(p.cx, (4 * r) / (3 * Math.PI), EXACT);
    expectRel(p.cy, (4 * r) / (3 * Math.PI), EXACT);
    // Ixy about the centroid = r⁴/8 − A·x̄ȳ = r⁴(1/8 − 4/(9π)) (parallel-axis transfer of ∫xy = r⁴/8 about the corner).
    expectRel(p.Ixy, r ** 4 * (1 / 8 - 4 / (9 * Math.PI)), EXACT);
    expect(Math.abs(p.thetaDeg - 45)).toBeLessThan(1e-9);
  });
  it('fillet spandrel (square r × r minus a quarter disc): area r²(1 − π/4), centroid (10 − 3π)r/(12 − 3π) from the corner (Roark, section-property table; standard result, from memory)', () => {
    // Corner at the origin; concave arc centred at (r, r) from (r, 0) to (0, r): clockwise about its centre.
    const spandrel: Region = [poly(ring([0, 0, r, 0, 0, r], [0, -Math.tan(Math.PI / 8), 0]))];
    const p = sectionProperties(spandrel);
    const A = r * r * (1 - Math.PI / 4);
    expectRel(p.area, A, EXACT);
    const xbar = ((10 - 3 * Math.PI) * r) / (12 - 3 * Math.PI);
    expectRel(p.cx, xbar, EXACT);
    expectRel(p.cy, xbar, EXACT);
    // Ix by composition: square (r⁴/3 about the corner edge) minus the quarter disc centred at (r, r)
    // (∫(y − r)² = πr⁴/16 about its own centre; centroid r − 4r/(3π)), transferred to the spandrel centroid.
    const Aq = (Math.PI * r * r) / 4;
    const yq = r - (4 * r) / (3 * Math.PI);
    const IxCorner = r ** 4 / 3 - (Math.PI * r ** 4 / 16 - Aq * (4 * r / (3 * Math.PI)) ** 2 + Aq * yq * yq);
    expectRel(p.Ix, IxCorner - A * xbar * xbar, 1e-11);
  });
});

describe('polygonised circle converges to the exact arc result like O(Δφ²) (docs/methods.md §11)', () => {
  const r = 50;
  const exact = sectionProperties([poly(circleRing(0, 0, r))]).Ix;
  const ngon = (n: number) => {
    const pts: number[] = [];
    for (let k = 0; k < n; k++) pts.push(r * Math.cos((2 * Math.PI * k) / n), r * Math.sin((2 * Math.PI * k) / n));
    return sectionProperties([poly(ring(pts))]).Ix;
  };
  it('the inscribed N-gon matches (N r⁴/24) sin α (2 + cos α), α = 2π/N (sum of fan triangles; derived)', () => {
    for (const n of [6, 32, 100]) {
      const a = (2 * Math.PI) / n;
      expectRel(ngon(n), ((n * r ** 4) / 24) * Math.sin(a) * (2 + Math.cos(a)), EXACT);
    }
  });
  it('the deficit to πr⁴/4 shrinks by 4 (±1%) each time N doubles, and the exact arc result is πr⁴/4', () => {
    expectRel(exact, (Math.PI * r ** 4) / 4, EXACT);
    const e = [64, 128, 256].map((n) => exact - ngon(n));
    expect(e[0]! / e[1]!).toBeGreaterThan(3.96);
    expect(e[0]! / e[1]!).toBeLessThan(4.04);
    expect(e[1]! / e[2]!).toBeGreaterThan(3.96);
    expect(e[1]! / e[2]!).toBeLessThan(4.04);
  });
});

/**
 * Independent oracle for a circular segment under the chord (0,0)→(c,0) that bulges to y < 0
 * (a CCW arc segment of the ring's bottom edge): the depth h(x) = (c²/4 − w²)/(√(r² − w²) + √(r² − c²/4)),
 * w = x − c/2, written without cancellation; x integrals by 40-point composite Gauss–Legendre
 * (4 panels × 10 nodes), inner y integrals in closed form.
 */
function segmentOracle(c: number, sweep: number) {
  const r = c / (2 * Math.sin(Math.abs(sweep) / 2));
  const X10 = [0.1488743389816312, 0.4333953941292472, 0.6794095682990244, 0.8650633666889845, 0.9739065285171717];
  const W10 = [0.2955242247147529, 0.2692667193099963, 0.219086362515982, 0.1494513491505806, 0.0666713443086881];
  const sum = [0, 0, 0, 0, 0, 0];
  const panels = 4;
  for (let p = 0; p < panels; p++) {
    const a = (p * c) / panels;
    const half = c / panels / 2;
    for (let k = 0; k < 10; k++) {
      const xi = (k < 5 ? -1 : 1) * X10[k % 5]!;
      const w = W10[k % 5]! * half;
      const x = a + half + xi * half;
      const u = x - c / 2;
      const h = (c * c / 4 - u * u) / (Math.sqrt(r * r - u * u) + Math.sqrt(r * r - c * c / 4));
      // y from −h to 0: ∫dy = h, ∫y = −h²/2, ∫y² = h³/3.
      sum[0]! += w * h;
      sum[1]! += w * (-h * h / 2);
      sum[2]! += w * x * h;
      sum[3]! += w * (h ** 3 / 3);
      sum[4]! += w * x * x * h;
      sum[5]! += w * x * (-h * h / 2);
    }
  }
  return sum;
}

describe('nearly straight and moderate arcs stay accurate (docs/methods.md §2.4; quadrature below |Δt| = 0.5, closed form above)', () => {
  const c = 100;
  const rectangle = ringIntegrals(rectRing(0, 0, c, 50), 0, 0);
  for (const sweep of [1.2, 0.6, 0.49, 0.02, 0.0099, 0.001, 1e-5]) {
    it(`sweep ${sweep} rad (r/c = ${(1 / (2 * Math.sin(sweep / 2))).toPrecision(3)}): the arc's addition matches the segment oracle to 1e-9 of each segment integral`, () => {
      const b = Math.tan(sweep / 4);
      const withArc = ringIntegrals(ring([0, 0, c, 0, c, 50, 0, 50], [b, 0, 0, 0]), 0, 0);
      const seg = segmentOracle(c, sweep);
      const got = [
        withArc.A - rectangle.A,
        withArc.Qx - rectangle.Qx,
        withArc.Qy - rectangle.Qy,
        withArc.Ixx - rectangle.Ixx,
        withArc.Iyy - rectangle.Iyy,
        withArc.Ixy - rectangle.Ixy,
      ];
      // Absolute error budget: 1e-9 of the segment integral, plus rounding of the rectangle-sized totals.
      const totals = [rectangle.A, rectangle.Qx, rectangle.Qy, rectangle.Ixx, rectangle.Iyy, rectangle.Ixy];
      got.forEach((g, i) => {
        expect(Math.abs(g - seg[i]!)).toBeLessThanOrEqual(1e-9 * Math.abs(seg[i]!) + 1e-14 * Math.abs(totals[i]!));
      });
    });
  }
  it('segment area of the oracle equals r²(Δ − sin Δ)/2 at Δ = 0.02 (circular segment, Roark)', () => {
    const sweep = 0.02;
    const r = c / (2 * Math.sin(sweep / 2));
    expectRel(segmentOracle(c, sweep)[0]!, (r * r * (sweep - Math.sin(sweep))) / 2, 1e-9);
  });
});

describe('arc ring reversal and fan-form consistency', () => {
  it('a ring with arcs run backwards gives exactly the negated raw integrals (1e-12)', () => {
    const r = ring([0, 0, 100, 0, 100, 60, 0, 60], [0.3, -0.2, 0.004, 0]);
    const fwd = ringIntegrals(r, 13, -7);
    const back = ringIntegrals(reverseRing(r), 13, -7);
    for (const k of ['A', 'Qx', 'Qy', 'Ixx', 'Iyy', 'Ixy'] as const) expectRel(back[k], -fwd[k], EXACT, Math.abs(fwd.Ixx));
  });
  it('raw integrals about two origins agree after the binomial shift (mixed lines and arcs)', () => {
    const region: Region = [poly(ring([0, 0, 100, 0, 100, 60, 0, 60], [0.3, -0.2, 0.004, 0.7]))];
    const a = regionIntegrals(region, 0, 0);
    const b = regionIntegrals(region, 40, 25);
    expectRel(b.A, a.A, EXACT);
    expectRel(b.Qy, a.Qy - 40 * a.A, EXACT, Math.abs(a.Qy));
    expectRel(b.Ixx, a.Ixx - 2 * 25 * a.Qx + 625 * a.A, EXACT, a.Ixx);
    expectRel(b.Ixy, a.Ixy - 40 * a.Qx - 25 * a.Qy + 1000 * a.A, EXACT, a.Ixx);
  });
});

describe('arc extreme points in bounds and moduli (docs/methods.md §2.4, §4)', () => {
  it('semicircle rotated by 30°: the box holds the arc top (0, r) and left (−r, 0) and the end points elsewhere', () => {
    const r = 50;
    const c = Math.cos(Math.PI / 6), s = Math.sin(Math.PI / 6);
    const p = sectionProperties([poly(ring([r * c, r * s, -r * c, -r * s], [1, 0]))]);
    expectRel(p.yMax, r, EXACT);
    expectRel(p.xMin, -r, EXACT);
    expectRel(p.xMax, r * c, EXACT);
    expectRel(p.yMin, -r * s, EXACT);
  });
  it('semicircle: I1 = Iy along θ1 = 90°, S1± = Iy/r from the arc points (±r, 0), S2± = Sx top and bottom (Gere & Timoshenko)', () => {
    const r = 50;
    const p = sectionProperties([poly(ring([r, 0, -r, 0], [1, 0]))]);
    expect(p.thetaDeg).toBe(90);
    expectRel(p.I1, p.Iy, EXACT);
    expectRel(p.S1Plus, p.Iy / r, EXACT);
    expectRel(p.S1Minus, p.Iy / r, EXACT);
    const yc = (4 * r) / (3 * Math.PI);
    expectRel(p.S2Plus, p.Ix / (r - yc), EXACT);
    expectRel(p.S2Minus, p.Ix / yc, EXACT);
  });
  it('holes never govern: a tube has the same extreme distances as the solid disc', () => {
    const p = sectionProperties([poly(circleRing(0, 0, 50), circleRing(0, 0, 40, true))]);
    expectRel(p.SxTop, p.Ix / 50, EXACT);
    expectRel(p.S2Minus, p.I2 / 50, EXACT);
  });
});

describe('weighted plastic axis with arcs (several materials)', () => {
  it('disc r = 40 (weight 3) inside a tube 40..50 (weight 1): PNA through the centre, moment = 3·80³/6 + (100³ − 80³)/6 (Gere & Timoshenko Z = d³/6)', () => {
    const r = plasticNeutralAxisWeighted(
      [
        { region: [poly(circleRing(10, 20, 40))], weight: 3 },
        { region: [poly(circleRing(10, 20, 50), circleRing(10, 20, 40, true))], weight: 1 },
      ],
      degrees(0),
    );
    expectRel(r.d, 20, 1e-10, 50);
    expectRel(r.moment, (3 * 80 ** 3) / 6 + (100 ** 3 - 80 ** 3) / 6, 1e-10);
  });
});
