/**
 * Plastic neutral axis: weighted (several materials), axial force, plateaus, arcs, asymmetric
 * sections and bad input (docs/methods.md §5). Closed forms are derived beside each check from the
 * stress-block definition Z = ∫|s − d| dA (EN 1993-1-1 plastic modulus definition; Gere & Timoshenko).
 */
import { describe, expect, it } from 'vitest';
import {
  plasticAboutX,
  plasticAboutY,
  plasticNeutralAxis,
  plasticNeutralAxisWeighted,
} from '../../core/properties/index.ts';
import { degrees, type Region } from '../../core/geometry/types.ts';
import { circleRing, expectRel, poly, rectRing, ring } from './helpers.ts';

const rect = (x0: number, y0: number, x1: number, y1: number): Region => [poly(rectRing(x0, y0, x1, y1))];

describe('weighted plastic neutral axis (several materials)', () => {
  it('two stacked plates with weights 355 and 20: PNA from the force balance and Mp = Σ w ∫|y − d| dA (derived)', () => {
    // Steel plate 150 × 10 on top ([0,150]×[200,210], fy = 355) over a timber block 100 × 200 ([25,125]×[0,200], f = 20).
    const steel = { region: rect(0, 200, 150, 210), weight: 355 };
    const timber = { region: rect(25, 0, 125, 200), weight: 20 };
    const Fs = 355 * 1500; // 532 500
    const Ft = 20 * 20000; // 400 000
    // Steel force exceeds the timber's: the PNA lies in the steel, 355·150·(210 − d) = 355·150·(d − 200) + Ft.
    const d = (355 * 150 * 410 - Ft) / (2 * 355 * 150);
    const Mp = 355 * 150 * ((210 - d) ** 2 / 2 + (d - 200) ** 2 / 2) + Ft * (d - 100);
    const r = plasticNeutralAxisWeighted([steel, timber], degrees(0));
    expect(Fs).toBeGreaterThan(Ft);
    expectRel(r.d, d, 1e-12);
    expectRel(r.moment, Mp, 1e-12);
    expect(r.method).toBe('quadratic');
    expectRel(r.weightedAreaPlus, r.weightedAreaMinus, 1e-12);
  });
  it('one region split into two pieces of equal weight gives the single-region PNA and Z', () => {
    const whole = plasticNeutralAxis([poly(ring([0, 0, 120, 0, 0, 90]))], degrees(0));
    const split = plasticNeutralAxisWeighted(
      [
        { region: [poly(ring([0, 0, 60, 0, 60, 45, 0, 90]))], weight: 2 },
        { region: [poly(ring([60, 0, 120, 0, 60, 45]))], weight: 2 },
      ],
      degrees(0),
    );
    expectRel(split.d, whole.d, 1e-12);
    expectRel(split.moment, 2 * whole.Z, 1e-12);
  });
  it('axial force N on a rectangle b × h (weight w): d = (h − N/(w b))/2 and Σ w∫|y − d| dA = w b((h − d)² + d²)/2 (derived)', () => {
    const b = 100, h = 200, w = 250;
    for (const N of [0, 1e6, -2.5e6, 4.9e6]) {
      const r = plasticNeutralAxisWeighted([{ region: rect(0, 0, b, h), weight: w }], degrees(0), N);
      const d = (h - N / (w * b)) / 2;
      expectRel(r.d, d, 1e-12, h);
      expectRel(r.moment, (w * b * ((h - d) ** 2 + d ** 2)) / 2, 1e-12);
      expectRel(r.weightedAreaPlus - r.weightedAreaMinus, N, 1e-12, w * b * h);
    }
  });
  it('rejects a non-positive weight, an empty piece list and an axial force above the full-yield force, naming the problem', () => {
    expect(() => plasticNeutralAxisWeighted([{ region: rect(0, 0, 1, 1), weight: 0 }], degrees(0))).toThrow(/piece 0 has weight 0/);
    expect(() => plasticNeutralAxisWeighted([], degrees(0))).toThrow(/no pieces/);
    expect(() => plasticNeutralAxisWeighted([{ region: rect(0, 0, 10, 10), weight: 1 }], degrees(0), 101)).toThrow(/exceeds the full-yield force 100/);
  });
});

describe('plateau and breakpoint roots (docs/methods.md §5.3)', () => {
  it('two equal plates with a gap: the PNA is the middle of the gap, reported as a plateau with its interval', () => {
    // [0,100]×[0,10] and [0,100]×[50,60]: any d in [10, 50] balances the areas; Z = 2·1000·(distance of plate centroids)/2.
    const r = plasticNeutralAxis([poly(rectRing(0, 0, 100, 10)), poly(rectRing(0, 50, 100, 60))], degrees(0));
    expect(r.method).toBe('plateau');
    expectRel(r.d, 30, 1e-12);
    expect(r.plateau).toEqual([10, 50]);
    expectRel(r.Z, 1000 * (55 - 30) + 1000 * (30 - 5), 1e-12);
  });
  it('a PNA exactly at a vertex level (I-section web-flange junction with equal halves) is found there', () => {
    // Two rectangles [0,10]×[0,100] and [−45,55]×[100,110]: 1000 each, so d = 100 exactly.
    const r = plasticAboutX([poly(ring([0, 0, 10, 0, 10, 100, 55, 100, 55, 110, -45, 110, -45, 100, 0, 100]))]);
    expectRel(r.pnaY, 100, 1e-12);
    expectRel(r.Zx, 10 * 100 ** 2 / 2 + 1000 * 5, 1e-12);
  });
});

describe('PNA of sections with arcs (Brent on exact clipped arcs)', () => {
  it('circle d = 100 at 37°: PNA through the centre and Z = d³/6 to 1e-10 (Gere & Timoshenko)', () => {
    const r = plasticNeutralAxis([poly(circleRing(3, 4, 50))], degrees(37));
    const n = [-Math.sin((37 * Math.PI) / 180), Math.cos((37 * Math.PI) / 180)];
    expectRel(r.d, n[0]! * 3 + n[1]! * 4, 1e-10, 50);
    expectRel(r.Z, 1e6 / 6, 1e-10);
    expect(r.method).toBe('brent');
    expect(r.converged).toBe(true);
    expect(r.evaluations).toBeLessThan(200);
  });
  it('half-disc above a rectangle: PNA and Z by segment formulas (circular segment area r²(α − sin α)/2 and first moment 2r³ sin³(α/2)/3, Roark)', () => {
    // Rectangle [−50,50]×[−20,0] (2000) under a half disc r = 50 on y ≥ 0 (1250π ≈ 3927): the PNA is in the half disc
    // at y = d where the segment above has area A/2; solve for d by bisection on the closed form (independent of the engine).
    const R = 50;
    const A = 2000 + (Math.PI * R * R) / 2;
    const segArea = (d: number) => { const a = 2 * Math.acos(d / R); return (R * R * (a - Math.sin(a))) / 2; };
    let lo = 0, hi = R;
    for (let k = 0; k < 200; k++) { const m = (lo + hi) / 2; if (segArea(m) > A / 2) lo = m; else hi = m; }
    const d = (lo + hi) / 2;
    // First moment about y = 0 of the segment above y = d: 2 r³ sin³(α/2)/3 = (2/3)(r² − d²)^{3/2}.
    const segQ = (2 / 3) * (R * R - d * d) ** 1.5;
    const halfDiscQ = (2 * R ** 3) / 3;
    const rectQ = -2000 * 10;
    const Qabove = segQ;
    const Qbelow = halfDiscQ - segQ + rectQ;
    const Z = Qabove - d * (A / 2) + d * (A / 2) - Qbelow;
    const r = plasticAboutX([poly(ring([-50, -20, 50, -20, 50, 0, -50, 0], [0, 0, 1, 0]))]);
    expectRel(r.pnaY, d, 1e-10, R);
    expectRel(r.Zx, Z, 1e-10);
  });
  it('tube 100/80 about y: PNA at the centre and Zy = (do³ − di³)/6', () => {
    const r = plasticAboutY([poly(circleRing(-7, 2, 50), circleRing(-7, 2, 40, true))]);
    expectRel(r.pnaX, -7, 1e-10, 50);
    expectRel(r.Zy, (1e6 - 512000) / 6, 1e-10);
  });
});

describe('plastic moment not parallel to the PNA (docs/methods.md §5.1)', () => {
  it('equal angle about x has Z⊥ ≠ 0 and is flagged; a rectangle has Z⊥ = 0 and is not', () => {
    const angle = plasticNeutralAxis([poly(ring([0, 0, 100, 0, 100, 10, 10, 10, 10, 100, 0, 100]))], degrees(0));
    expect(angle.momentNotParallel).toBe(true);
    const box = plasticNeutralAxis(rect(0, 0, 100, 200), degrees(0));
    expect(box.momentNotParallel).toBe(false);
  });
  it('Z⊥ of the equal angle about x equals ∫ sign(y − d)·x dA from its rectangles (derived)', () => {
    // Angle: horizontal leg [0,100]×[0,10] (1000), vertical leg [0,10]×[10,100] (900); half area 950.
    // Above y = 10 lies only 900 < 950, so d is in the horizontal leg: 900 + 100·(10 − d) = 950 → d = 9.5.
    const d = 9.5;
    const above = 900 * 5 + 100 * (10 - d) * 50; // ∫x dA of the parts above d
    const below = 100 * d * 50; // ∫x dA of the part below d
    const r = plasticNeutralAxis([poly(ring([0, 0, 100, 0, 100, 10, 10, 10, 10, 100, 0, 100]))], degrees(0));
    expectRel(r.d, d, 1e-12);
    expectRel(r.Zperp, above - below, 1e-12);
  });
});
