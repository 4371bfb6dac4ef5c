import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { arcOfSegment, regionBounds, ringFromPoints, ringSignedArea, rotateRegion, transformRegion, translateRegion } from '../../core/geometry/index.ts';
import type { Region } from '../../core/geometry/index.ts';
import { circle, piece, pointsOf, regionArea, square, starRing } from './helpers.ts';

// A plate with a bulged edge and a round hole: exercises arcs on outer rings and holes.
const plate = (): Region => [
  piece(ringFromPoints([[0, 0], [6, 0], [6, 4], [0, 4]], [0, 0.4, 0, 0]), [ringFromPoints([[2, 2], [1, 2]], [-1, -1])]),
];

describe('transformRegion', () => {
  it('rotates by 90° exactly: (x, y) → (−y, x) for every vertex (rotation matrix)', () => {
    const out = rotateRegion([piece(square(1, 2, 4, 3))], 90);
    expect(pointsOf(out[0]?.outer ?? { xy: new Float64Array() })).toEqual([[-2, 1], [-2, 4], [-3, 4], [-3, 1]]);
  });

  it('translates every vertex by (dx, dy) and keeps the bulges', () => {
    const out = translateRegion(plate(), 10, -5);
    expect(pointsOf(out[0]?.outer ?? { xy: new Float64Array() })[1]).toEqual([16, -5]);
    expect(Array.from(out[0]?.outer.bulge ?? [])).toEqual([0, 0.4, 0, 0]);
  });

  it('preserves area under any placement, mirrored or not (area is invariant under rigid motions)', () => {
    const a0 = regionArea(plate());
    fc.assert(
      fc.property(fc.double({ min: -1e4, max: 1e4, noNaN: true }), fc.double({ min: -1e4, max: 1e4, noNaN: true }), fc.double({ min: -720, max: 720, noNaN: true }), fc.boolean(), (x, y, rotationDeg, mirror) => {
        const moved = transformRegion(plate(), { x, y, rotationDeg, mirror });
        expect(Math.abs(regionArea(moved) - a0)).toBeLessThan(1e-9 * a0 * (1 + Math.hypot(x, y) / 10));
      }),
      { seed: 42, numRuns: 200 },
    );
  });

  it('mirror reverses each ring, then normalises: outer stays CCW, hole stays CW, arcs keep their radius', () => {
    const out = transformRegion(plate(), { x: 0, y: 0, rotationDeg: 0, mirror: true });
    const p = out[0];
    expect(p).toBeDefined();
    if (p === undefined) return;
    expect(ringSignedArea(p.outer)).toBeGreaterThan(0);
    expect(ringSignedArea(p.holes[0] ?? { xy: new Float64Array() })).toBeLessThan(0);
    const radiiBefore = [0, 1, 2, 3].map((i) => arcOfSegment(plate()[0]?.outer ?? { xy: new Float64Array() }, i)?.r).filter((r) => r !== undefined);
    const radiiAfter = [0, 1, 2, 3].map((i) => arcOfSegment(p.outer, i)?.r).filter((r) => r !== undefined);
    expect(radiiAfter).toHaveLength(1);
    expect(radiiAfter[0]).toBeCloseTo(radiiBefore[0] ?? NaN, 12);
    // The bulged right edge x = 6 becomes the bulged left edge x = −6, bulging outward (to x < −6).
    const b = regionBounds(out);
    const bBefore = regionBounds(plate());
    expect(b?.minX).toBeCloseTo(-(bBefore?.maxX ?? NaN), 12);
  });

  it('mirror of a random star polygon equals reflecting every vertex, with the order reversed (x → −x)', () => {
    fc.assert(
      fc.property(fc.array(fc.double({ min: 1, max: 10, noNaN: true }), { minLength: 3, maxLength: 12 }), (radii) => {
        const ring = starRing(0.5, 0.25, radii);
        const out = transformRegion([piece(ring)], { x: 0, y: 0, rotationDeg: 0, mirror: true })[0]?.outer;
        expect(out).toBeDefined();
        if (out === undefined) return;
        expect(ringSignedArea(out)).toBeCloseTo(ringSignedArea(ring), 10);
        const expected = new Set(pointsOf(ring).map(([x, y]) => `${-x},${y}`));
        expect(new Set(pointsOf(out).map(([x, y]) => `${x},${y}`))).toEqual(expected);
      }),
      { seed: 7, numRuns: 100 },
    );
  });

  it('keeps a circle a circle under rotation: same centre distance and radius', () => {
    const out = rotateRegion([piece(circle(3, 0, 1))], 30);
    const arc = arcOfSegment(out[0]?.outer ?? { xy: new Float64Array() }, 0);
    expect(arc?.r).toBeCloseTo(1, 14);
    expect(Math.hypot(arc?.cx ?? NaN, arc?.cy ?? NaN)).toBeCloseTo(3, 14);
    expect(Math.atan2(arc?.cy ?? NaN, arc?.cx ?? NaN)).toBeCloseTo(Math.PI / 6, 14);
  });
});
