import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { normaliseRegion, reverseRing, ringFromPoints, ringSignedArea } from '../../core/geometry/index.ts';
import type { Region } from '../../core/geometry/index.ts';
import { piece, pointsOf, square, starRing } from './helpers.ts';

const only = (region: Region) => {
  const p = region[0];
  if (p === undefined) throw new Error('expected one polygon');
  return p;
};

describe('normaliseRegion', () => {
  it('drops an explicitly repeated closing vertex', () => {
    const ring = ringFromPoints([[0, 0], [2, 0], [2, 1], [0, 1], [0, 0]]);
    expect(pointsOf(only(normaliseRegion([piece(ring)])).outer)).toEqual([[0, 0], [2, 0], [2, 1], [0, 1]]);
  });

  it('drops exactly repeated consecutive vertices and keeps the bulge of the segment that has length', () => {
    const ring = ringFromPoints([[0, 0], [2, 0], [2, 0], [2, 1], [0, 1]], [0, 0, 0.25, 0, 0]);
    const out = only(normaliseRegion([piece(ring)])).outer;
    expect(pointsOf(out)).toEqual([[0, 0], [2, 0], [2, 1], [0, 1]]);
    expect(Array.from(out.bulge ?? [])).toEqual([0, 0.25, 0, 0]);
  });

  it('removes vertices lying exactly between two straight neighbours, including across the start of the ring', () => {
    // The ring starts in the middle of the bottom edge; (1,0), (3,0) and (0,1) are pass-through vertices.
    const ring = ringFromPoints([[2, 0], [3, 0], [4, 0], [4, 2], [0, 2], [0, 1], [0, 0], [1, 0]]);
    const out = only(normaliseRegion([piece(ring)])).outer;
    expect(pointsOf(out).sort()).toEqual([[0, 0], [0, 2], [4, 0], [4, 2]].sort());
    expect(ringSignedArea(out)).toBe(8);
  });

  it('keeps a collinear vertex next to an arc, and keeps a vertex where the boundary doubles back (validation reports it)', () => {
    const withArc = ringFromPoints([[0, 0], [1, 0], [2, 0], [2, 2], [0, 2]], [0, 0.5, 0, 0, 0]);
    expect(pointsOf(only(normaliseRegion([piece(withArc)])).outer)).toHaveLength(5);
    const spike = ringFromPoints([[0, 0], [4, 0], [6, 0], [4, 0.0], [4, 2], [0, 2]]);
    // (6,0) then back to (4,0): a zero-width spike, not a pass-through, so nothing is removed there.
    expect(pointsOf(only(normaliseRegion([piece(spike)])).outer)).toContainEqual([6, 0]);
  });

  it('makes outer rings counter-clockwise and holes clockwise, with the arcs traced the same', () => {
    const cwOuter = ringFromPoints([[0, 0], [0, 10], [10, 10], [10, 0]]);
    const ccwHole = ringFromPoints([[2, 2], [4, 2], [4, 4], [2, 4]], [0.4, 0, 0, 0]);
    const out = only(normaliseRegion([piece(cwOuter, [ccwHole])]));
    expect(ringSignedArea(out.outer)).toBe(100);
    const hole = out.holes[0];
    expect(hole).toBeDefined();
    if (hole === undefined) return;
    // Same hole area (4 plus the segment of the bulge arc, which bulges outward of the CCW square).
    expect(ringSignedArea(hole)).toBeCloseTo(-ringSignedArea(ccwHole), 13);
    expect(ringSignedArea(hole)).toBeLessThan(-4);
  });

  it('never mutates its input', () => {
    const ring = ringFromPoints([[0, 0], [0, 1], [1, 1], [1, 0], [0, 0]]);
    const before = Array.from(ring.xy);
    normaliseRegion([piece(ring)]);
    expect(Array.from(ring.xy)).toEqual(before);
  });

  it('leaves an already normalised square unchanged', () => {
    const ring = square(0, 0, 3, 1);
    expect(only(normaliseRegion([piece(ring)])).outer).toEqual(ring);
  });

  it('gives the same ring, up to its start vertex, whichever way the input ran (docs/methods.md §11: reverse then re-normalise)', () => {
    fc.assert(
      fc.property(fc.array(fc.double({ min: 1, max: 9, noNaN: true }), { minLength: 3, maxLength: 16 }), fc.boolean(), (radii, asHole) => {
        const ring = starRing(1, -2, radii);
        const norm = (r: typeof ring) => {
          const p = normaliseRegion([asHole ? piece(square(-20, -20, 20, 20), [r]) : piece(r)])[0];
          return asHole ? p?.holes[0] : p?.outer;
        };
        const a = norm(ring), b = norm(reverseRing(ring));
        expect(a && b).toBeTruthy();
        if (a === undefined || b === undefined) return;
        expect(Math.sign(ringSignedArea(a))).toBe(asHole ? -1 : 1);
        expect(ringSignedArea(b)).toBeCloseTo(ringSignedArea(a), 10);
        // Same cyclic vertex sequence: rotate b to start where a starts.
        const pa = pointsOf(a).map((q) => q.join(',')), pb = pointsOf(b).map((q) => q.join(','));
        const k = pb.indexOf(pa[0] ?? '');
        expect([...pb.slice(k), ...pb.slice(0, k)]).toEqual(pa);
      }),
      { seed: 42, numRuns: 200 },
    );
  });
});
