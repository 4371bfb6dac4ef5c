/**
 * The width-sweep bracket of the plastic neutral axis (docs/methods.md §5.3) against the plain bisection
 * over every breakpoint: both must return the same d and moment (exact identity — same balance,
 * same closed-form quadratic; 1e−12 relative), on random star polygons with holes, at several
 * angles, with and without axial force, and on a plateau (two separated pieces: mid-interval d).
 */
import { describe, expect, it } from 'vitest';
import { plasticNeutralAxisWeighted, plasticNeutralAxisWeightedByBisection } from '../../core/properties/plastic.ts';
import { normaliseRegion } from '../../core/geometry/normalise.ts';
import { degrees, type Region } from '../../core/geometry/types.ts';
import { expectRel, poly, rectRing, ring, seededRandom } from './helpers.ts';

/** A star-shaped ring of n vertices around (cx, cy), radii in [r0, r1], CCW. */
function star(rand: () => number, n: number, cx: number, cy: number, r0: number, r1: number): number[] {
  const pts: number[] = [];
  for (let i = 0; i < n; i++) {
    const t = (2 * Math.PI * i) / n;
    const r = r0 + (r1 - r0) * rand();
    pts.push(cx + r * Math.cos(t), cy + r * Math.sin(t));
  }
  return pts;
}

describe('plastic neutral axis: sweep-located bracket agrees with bisection', () => {
  const rand = seededRandom(20261201);
  const regions: Region[] = [];
  for (let k = 0; k < 6; k++) {
    const outer = ring(star(rand, 40 + 10 * k, 50, 30, 60, 100));
    const hole = ring(star(rand, 12 + k, 50 + 10 * rand(), 30 + 10 * rand(), 10, 30));
    regions.push(normaliseRegion([poly(outer, hole)]));
  }
  const angles = [0, -90, 17.5, 45, 123.4, -61];
  it('random star polygons with a hole, six angles, N = 0 and N = ±0.3 W: d and moment equal to 1e−12', () => {
    let cases = 0;
    for (const region of regions) {
      for (const angle of angles) {
        for (const share of [0, 0.3, -0.3]) {
          const W = plasticNeutralAxisWeighted([{ region, weight: 2.5 }], degrees(angle)).weightedAreaPlus * 2;
          const pieces = [{ region, weight: 2.5 }];
          const fast = plasticNeutralAxisWeighted(pieces, degrees(angle), share * W);
          const slow = plasticNeutralAxisWeightedByBisection(pieces, degrees(angle), share * W);
          expect(fast.method).toBe(slow.method);
          expectRel(fast.d, slow.d, 1e-12, 100);
          expectRel(fast.moment, slow.moment, 1e-12);
          expectRel(fast.weightedAreaPlus, slow.weightedAreaPlus, 1e-12);
          expect(fast.evaluations).toBeLessThan(slow.evaluations);
          cases++;
        }
      }
    }
    expect(cases).toBe(6 * 6 * 3);
  });
  it('a 6,000-vertex star with a hole straddling the origin (linear-time sort path): d and moment equal to 1e−12', () => {
    const big = normaliseRegion([poly(ring(star(rand, 6000, -5, 3, 60, 100)), ring(star(rand, 5000, 0, 0, 10, 30)))]);
    for (const angle of [0, -90, 33]) {
      const pieces = [{ region: big, weight: 1 }];
      const fast = plasticNeutralAxisWeighted(pieces, degrees(angle));
      const slow = plasticNeutralAxisWeightedByBisection(pieces, degrees(angle));
      expectRel(fast.d, slow.d, 1e-12, 100);
      expectRel(fast.moment, slow.moment, 1e-12);
      expect(fast.evaluations).toBeLessThan(slow.evaluations);
    }
  });
  it('Newton-located bracket (≥ 4,096 vertices): on a PNA through vertices, with axial force, and on a plateau it gives what bisection gives', () => {
    // An 8,000-gon inscribed in an ellipse: vertices 0 and 4,000 lie on y = cy, the PNA for bending
    // about x by symmetry, so both searches must end on that breakpoint (exact identity: symmetry).
    const n = 8000;
    const pts: number[] = [];
    for (let i = 0; i < n; i++) pts.push(700 + 200 * Math.cos((2 * Math.PI * i) / n), -300 + 100 * Math.sin((2 * Math.PI * i) / n));
    const ellipse = normaliseRegion([poly(ring(pts))]);
    // −89.9999999999999°: a principal angle with rounding in it; the two vertices on the minor axis
    // then project 1e−13 apart and both balance within tolerance (a tiny plateau).
    const cases: [Region, number, number][] = [[ellipse, 0, 0], [ellipse, -90, 0], [ellipse, 41, 0], [ellipse, 0, 0.4], [ellipse, 120, -0.25], [ellipse, -89.9999999999999, 0]];
    // Two 5,000-vertex stars far apart along y, equal areas by construction (one is the other moved):
    // the balance holds anywhere in the gap between them, so the fast path must hand over to the sweep.
    const one = star(rand, 5000, 0, 0, 60, 100);
    const other = one.map((v, i) => (i % 2 === 1 ? v + 500 : v));
    const pair = normaliseRegion([poly(ring(one)), poly(ring(other))]);
    cases.push([pair, 0, 0]);
    for (const [region, angle, share] of cases) {
      const W = 2 * plasticNeutralAxisWeightedByBisection([{ region, weight: 1 }], degrees(angle)).weightedAreaPlus;
      const fast = plasticNeutralAxisWeighted([{ region, weight: 1 }], degrees(angle), share * W);
      const slow = plasticNeutralAxisWeightedByBisection([{ region, weight: 1 }], degrees(angle), share * W);
      expect(fast.method).toBe(slow.method);
      expectRel(fast.d, slow.d, 1e-12, 1000);
      expectRel(fast.moment, slow.moment, 1e-12);
      expect(Math.abs(fast.residual)).toBeLessThanOrEqual(1e-11 * W);
      // Fewer passes than bisection shows the Newton path answered (a hand-over to the sweep costs more).
      if (region === ellipse) expect(fast.evaluations).toBeLessThan(slow.evaluations);
    }
    expect(plasticNeutralAxisWeighted([{ region: ellipse, weight: 1 }], degrees(0)).method).toBe('breakpoint');
    expect(plasticNeutralAxisWeighted([{ region: ellipse, weight: 1 }], degrees(0)).d).toBe(-300);
    expect(plasticNeutralAxisWeighted([{ region: pair, weight: 1 }], degrees(0)).method).toBe('plateau');
  });
  it('two separated plates (plateau between y = 10 and y = 90): both report d = 50 and the same interval', () => {
    // Equal plates [0,100]×[0,10] and [0,100]×[90,100]: any d in [10, 90] balances; the rule is the middle.
    const region: Region = [poly(rectRing(0, 0, 100, 10)), poly(rectRing(0, 90, 100, 100))];
    const fast = plasticNeutralAxisWeighted([{ region, weight: 1 }], degrees(0));
    const slow = plasticNeutralAxisWeightedByBisection([{ region, weight: 1 }], degrees(0));
    expect(fast.method).toBe('plateau');
    expect(fast.d).toBe(50);
    expect(fast.plateau).toEqual([10, 90]);
    expect(slow.plateau).toEqual([10, 90]);
    // Z = 2 · 1000 · 45 (each plate's area times its centroid's distance from d = 50), exact arithmetic.
    expectRel(fast.moment, 90000, 1e-12);
  });
});
