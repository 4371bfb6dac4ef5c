import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { leftTurn, pointInRing, ringFromPoints, segmentContact, validateRegion } from '../../core/geometry/index.ts';
import { sweepPairs } from '../../core/geometry/sweep.ts';
import { circle, piece } from './helpers.ts';

describe('segmentContact (exact orientation signs)', () => {
  it('tells crossing, touching at an end point, collinear overlap, collinear end-to-end touch and no contact apart', () => {
    expect(segmentContact(0, 0, 2, 2, 0, 2, 2, 0)).toBe(1);
    expect(segmentContact(0, 0, 2, 0, 1, 0, 1, 5)).toBe(2);
    expect(segmentContact(0, 0, 2, 0, 1, 0, 3, 0)).toBe(3);
    expect(segmentContact(0, 0, 2, 0, 2, 0, 3, 0)).toBe(2);
    expect(segmentContact(0, 0, 2, 0, 0, 1, 2, 1)).toBe(0);
    // Exactly collinear but apart, with coordinates that are not small integers (exact arithmetic).
    expect(segmentContact(0.1, 0.1, 0.3, 0.3, 0.5, 0.5, 0.7, 0.7)).toBe(0);
  });

  it('leftTurn is positive for a counter-clockwise turn in y-up axes', () => {
    expect(leftTurn(0, 0, 1, 0, 0, 1)).toBeGreaterThan(0);
    expect(leftTurn(0, 0, 1, 0, 0, -1)).toBeLessThan(0);
    expect(leftTurn(0, 0, 1, 1, 3, 3)).toBe(0);
  });
});

describe('pointInRing with arcs', () => {
  it('locates points against a circle of two arcs: inside, outside, on the boundary (x² + y² vs r²)', () => {
    const c = circle(0, 0, 2);
    expect(pointInRing(c, 0, 1.99)).toBe(1);
    expect(pointInRing(c, 1.5, -1.3)).toBe(1);
    expect(pointInRing(c, 1.5, 1.5)).toBe(-1);
    expect(pointInRing(c, 0, 2)).toBe(0);
  });

  it('counts the region between a concave arc and its chord as outside (bulge −1 bites into a square)', () => {
    // Square 0..4 whose top edge (4,4)→(0,4) is replaced by a clockwise semicircle dipping to y = 2.
    const bitten = ringFromPoints([[0, 0], [4, 0], [4, 4], [0, 4]], [0, 0, -1, 0]);
    expect(pointInRing(bitten, 2, 3)).toBe(-1);
    expect(pointInRing(bitten, 2, 1)).toBe(1);
    expect(pointInRing(bitten, 0.1, 3)).toBe(1); // distance √4.61 > 2 from the centre (2, 4)
    expect(pointInRing(bitten, 0.2, 3.9)).toBe(-1); // distance √3.25 < 2: inside the bite
    expect(validateRegion([piece(bitten)])).toEqual([]);
  });

  it('treats a point on the chord of an arc as inside, not on the boundary (the chord is not an edge)', () => {
    // A circle of radius 50 as two semicircles: its chord is the diameter on y = 0. Every point of
    // the open diameter is strictly inside the disc (x² + y² < r²); the two end points are on it.
    const c = circle(0, 0, 50);
    expect(pointInRing(c, 40, 0)).toBe(1);
    expect(pointInRing(c, -49.5, 0)).toBe(1);
    expect(pointInRing(c, 0, 0)).toBe(1);
    expect(pointInRing(c, 50, 0)).toBe(0);
    // A concentric bore whose vertices lie on that chord is a valid hole (a pipe wall).
    const bore = ringFromPoints([[40, 0], [-40, 0]], [-1, -1]);
    expect(validateRegion([{ outer: c, holes: [bore] }])).toEqual([]);
    // The concave bite's chord (4,4)→(0,4) lies outside the bitten square.
    const bitten = ringFromPoints([[0, 0], [4, 0], [4, 4], [0, 4]], [0, 0, -1, 0]);
    expect(pointInRing(bitten, 2, 4)).toBe(-1);
  });
});

describe('sweepPairs', () => {
  it('visits exactly the segment pairs whose boxes overlap (brute-force O(n²) oracle, random segments)', () => {
    const seg = fc.tuple(fc.integer({ min: 0, max: 30 }), fc.integer({ min: 0, max: 30 }), fc.integer({ min: 0, max: 30 }), fc.integer({ min: 0, max: 30 }));
    fc.assert(
      fc.property(fc.array(seg, { minLength: 1, maxLength: 40 }), (segs) => {
        // Each segment gets its own two points: point 2k → point 2k+1.
        const x = new Float64Array(segs.flatMap(([a, , c]) => [a, c]));
        const y = new Float64Array(segs.flatMap(([, b, , d]) => [b, d]));
        const n = 2 * segs.length;
        const ends = new Uint32Array(n);
        for (let k = 0; k < n; k++) ends[k] = k % 2 === 0 ? k + 1 : k;
        const got = new Set<string>();
        sweepPairs(x, y, ends, (a, b) => {
          if (a % 2 === 0 && b % 2 === 0) got.add(a < b ? `${a},${b}` : `${b},${a}`);
          return true;
        });
        const want = new Set<string>();
        const box = (k: number) => [Math.min(x[k] ?? 0, x[k + 1] ?? 0), Math.max(x[k] ?? 0, x[k + 1] ?? 0), Math.min(y[k] ?? 0, y[k + 1] ?? 0), Math.max(y[k] ?? 0, y[k + 1] ?? 0)] as const;
        for (let a = 0; a < n; a += 2) {
          for (let b = a + 2; b < n; b += 2) {
            const [ax0, ax1, ay0, ay1] = box(a), [bx0, bx1, by0, by1] = box(b);
            if (ax0 <= bx1 && bx0 <= ax1 && ay0 <= by1 && by0 <= ay1) want.add(`${a},${b}`);
          }
        }
        expect(got).toEqual(want);
      }),
      { seed: 42, numRuns: 300 },
    );
  });
});
