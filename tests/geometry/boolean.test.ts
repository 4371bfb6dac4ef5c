import fc from 'fast-check';
import polygonClipping from 'polygon-clipping';
import { afterEach, describe, expect, it, vi } from 'vitest';
import {
  BooleanError, differenceRegions, flattenRing, intersectRegions, isRegionValid, ringFromPoints, ringSignedArea, unionRegions, validateRegion,
} from '../../core/geometry/index.ts';
import type { Region } from '../../core/geometry/index.ts';
import { circle, piece, pointsOf, regionArea, square, starRing } from './helpers.ts';

const names = { context: 'composing the footbridge box girder', parts: ['top flange', 'web'] };

const rect = fc
  .tuple(fc.integer({ min: -50, max: 50 }), fc.integer({ min: -50, max: 50 }), fc.integer({ min: 1, max: 40 }), fc.integer({ min: 1, max: 40 }))
  .map(([x, y, w, h]): Region => [piece(square(x, y, x + w, y + h))]);

const star = fc
  .tuple(fc.double({ min: -5, max: 5, noNaN: true }), fc.double({ min: -5, max: 5, noNaN: true }), fc.array(fc.double({ min: 1, max: 8, noNaN: true }), { minLength: 3, maxLength: 14 }))
  .map(([cx, cy, radii]): Region => [piece(starRing(cx, cy, radii))]);

describe('Boolean identities (inclusion–exclusion: A(a∪b) + A(a∩b) = A(a) + A(b))', () => {
  it('holds exactly for axis-aligned rectangles with integer corners (all cut points are integers)', () => {
    fc.assert(
      fc.property(rect, rect, (a, b) => {
        const u = unionRegions(a, b, names), i = intersectRegions(a, b, names);
        expect(regionArea(u) + regionArea(i)).toBe(regionArea(a) + regionArea(b));
      }),
      { seed: 42, numRuns: 200 },
    );
  });

  it('holds to 1e-9 relative for random star-shaped (non-convex) polygons, and the outputs are valid regions', () => {
    fc.assert(
      fc.property(star, star, (a, b) => {
        const u = unionRegions(a, b, names), i = intersectRegions(a, b, names);
        const lhs = regionArea(u) + regionArea(i), rhs = regionArea(a) + regionArea(b);
        expect(Math.abs(lhs - rhs)).toBeLessThan(1e-9 * rhs);
        expect(isRegionValid(u)).toBe(true);
        // a \ b and a ∩ b split a: A(a \ b) + A(a ∩ b) = A(a).
        expect(Math.abs(regionArea(differenceRegions(a, b, names)) + regionArea(i) - regionArea(a))).toBeLessThan(1e-9 * rhs);
      }),
      { seed: 42, numRuns: 120 },
    );
  });

  it('A − A is empty, for rectangles and for star polygons', () => {
    fc.assert(
      fc.property(fc.oneof(rect, star), (a) => {
        expect(differenceRegions(a, a, names)).toEqual([]);
      }),
      { seed: 42, numRuns: 200 },
    );
  });

  it('returns outer rings counter-clockwise and holes clockwise (normalised output)', () => {
    const out = differenceRegions([piece(square(0, 0, 10, 10))], [piece(square(3, 3, 5, 5))], names);
    expect(out).toHaveLength(1);
    expect(ringSignedArea(out[0]?.outer ?? { xy: new Float64Array() })).toBe(100);
    expect(ringSignedArea(out[0]?.holes[0] ?? { xy: new Float64Array() })).toBe(-4);
  });
});

describe('exact arcs survive clipping', () => {
  it('a circle (two bulge-1 arcs) unioned with a disjoint rectangle comes back as the same two arcs, area π r² to 1e-12', () => {
    const r = 12.5;
    const out = unionRegions([piece(circle(0, 0, r))], [piece(square(30, -5, 50, 5))], names);
    const round = out.find((p) => p.outer.bulge !== undefined);
    expect(out).toHaveLength(2);
    expect(pointsOf(round?.outer ?? { xy: new Float64Array() })).toHaveLength(2);
    expect(Array.from(round?.outer.bulge ?? [])).toEqual([1, 1]);
    // Closed form π r² (the disc); the rectangle adds 20 × 10.
    expect(Math.abs(ringSignedArea(round?.outer ?? { xy: new Float64Array() }) / (Math.PI * r * r) - 1)).toBeLessThan(1e-12);
    expect(Math.abs(regionArea(out) - (Math.PI * r * r + 200))).toBeLessThan(1e-12 * regionArea(out));
  });

  it('a plate minus a round hole keeps the hole as two exact arcs: area = b·h − π r² (closed form)', () => {
    const out = differenceRegions([piece(square(-10, -10, 10, 10))], [piece(circle(1, 2, 4))], names);
    expect(out[0]?.holes).toHaveLength(1);
    const hole = out[0]?.holes[0] ?? { xy: new Float64Array() };
    expect(pointsOf(hole)).toHaveLength(2);
    expect(Math.abs(regionArea(out) - (400 - 16 * Math.PI))).toBeLessThan(1e-12 * 400);
  });

  it('a circle cut by a rectangle matches the circular-segment closed form within the stated bound (sagitta × chord per cut piece)', () => {
    // Segment of a circle of radius r beyond the line x = h: area r² acos(h/r) − h √(r² − h²) (Roark, circular segment).
    const r = 10, h = 3.7, s = 1e-5;
    const out = intersectRegions([piece(circle(0, 0, r))], [piece(square(h, -20, 30, 20))], names, { maxSagitta: s });
    const exact = r * r * Math.acos(h / r) - h * Math.sqrt(r * r - h * h);
    // Two cut pieces, each a chord of at most the flattening step: c ≤ 2·r·sin(step/2), step = 2·acos(1 − s/r).
    const step = 2 * Math.acos(1 - s / r);
    const bound = 2 * s * 2 * r * Math.sin(step / 2);
    const got = regionArea(out);
    expect(Math.abs(got - exact)).toBeLessThanOrEqual(bound);
    // And most of the boundary is exact arc again: only a few segments remain.
    expect(pointsOf(out[0]?.outer ?? { xy: new Float64Array() }).length).toBeLessThanOrEqual(6);
  });
});

describe('Boolean operations on arcs', () => {
  it('two overlapping discs: union area 2πr² − lens, with the lens r²(2·acos(d/2r)) − (d/2)√(4r² − d²) (closed form), within the cut-arc bound', () => {
    const r = 5, d = 6, s = 1e-5;
    const a = [piece(circle(0, 0, r))], b = [piece(circle(d, 0, r))];
    const lens = 2 * r * r * Math.acos(d / (2 * r)) - (d / 2) * Math.sqrt(4 * r * r - d * d);
    // Four cut arc pieces (two per circle at each of the two crossing points), each ≤ s × chord.
    const chord = 2 * r * Math.sin(Math.acos(1 - s / r));
    const bound = 4 * s * chord;
    const u = unionRegions(a, b, names, { maxSagitta: s });
    const i = intersectRegions(a, b, names, { maxSagitta: s });
    expect(Math.abs(regionArea(u) - (2 * Math.PI * r * r - lens))).toBeLessThanOrEqual(bound);
    expect(Math.abs(regionArea(i) - lens)).toBeLessThanOrEqual(bound);
    // The lens: per crossing point, one straight cut piece on each circle (4), plus the restored arcs —
    // one on the first disc, two on the second (its input vertex (1, 0) lies inside the lens): 8 segments.
    expect(pointsOf(i[0]?.outer ?? { xy: new Float64Array() })).toHaveLength(8);
  });

  it('a disc minus its upper half keeps the diameter straight: half-disc area π r²/2 (closed form) to 1e-12', () => {
    // The cut runs exactly through both input vertices (±r, 0), so the output edge joining them is a
    // straight edge between the two end points of one semicircle, not that semicircle.
    const r = 3;
    const out = differenceRegions([piece(circle(0, 0, r))], [piece(square(-5, 0, 5, 5))], names);
    expect(out).toHaveLength(1);
    expect(pointsOf(out[0]?.outer ?? { xy: new Float64Array() })).toHaveLength(2);
    expect(Math.abs(regionArea(out) / (Math.PI * r * r / 2) - 1)).toBeLessThan(1e-12);
  });

  it('a disc crossing a rectangle: inclusion–exclusion holds to 1e-7 × size² for random placements (default chord tolerance), and the union validates clean', () => {
    fc.assert(
      fc.property(fc.double({ min: -20, max: 20, noNaN: true }), fc.double({ min: -20, max: 20, noNaN: true }), fc.double({ min: 1, max: 15, noNaN: true }), rect, (cx, cy, r, box) => {
        const disc = [piece(circle(cx, cy, r))];
        const u = unionRegions(disc, box, names);
        const lhs = regionArea(u) + regionArea(intersectRegions(disc, box, names));
        expect(Math.abs(lhs - regionArea(disc) - regionArea(box))).toBeLessThan(1e-7 * 100 * 100);
        expect(validateRegion(u)).toEqual([]);
      }),
      { seed: 42, numRuns: 25 },
    );
  });
});

describe('flattenRing', () => {
  it('keeps every chord within the sagitta: each flattened point lies on the circle, each chord midpoint within s of it', () => {
    const r = 7, s = 1e-3;
    const flat = flattenRing(circle(1, 1, r), s);
    const n = flat.xy.length / 2;
    for (let k = 0; k < n; k++) {
      const x = flat.xy[2 * k] ?? NaN, y = flat.xy[2 * k + 1] ?? NaN;
      const x2 = flat.xy[2 * ((k + 1) % n)] ?? NaN, y2 = flat.xy[2 * ((k + 1) % n) + 1] ?? NaN;
      expect(Math.abs(Math.hypot(x - 1, y - 1) - r)).toBeLessThan(1e-12 * r);
      const mid = Math.hypot((x + x2) / 2 - 1, (y + y2) / 2 - 1);
      expect(r - mid).toBeLessThanOrEqual(s);
    }
    // Piece count per semicircle: ceil(π / (2·acos(1 − s/r))) (docs/methods.md §2.6).
    expect(flat.pieces[0]).toBe(Math.ceil(Math.PI / (2 * Math.acos(1 - s / r))));
    // Original vertices are copied bit for bit.
    expect([flat.xy[0], flat.xy[1]]).toEqual([8, 1]);
  });

  it('leaves straight rings as they are', () => {
    const ring = square(0, 0, 2, 3);
    expect(flattenRing(ring, 0.1).xy).toEqual(ring.xy);
  });
});

describe('BooleanError', () => {
  afterEach(() => vi.restoreAllMocks());

  it('names the operation and the parts when the input holds a NaN', () => {
    const bad = [piece(ringFromPoints([[0, 0], [NaN, 0], [1, 1]]))];
    const run = () => unionRegions(bad, [piece(square(0, 0, 1, 1))], names);
    expect(run).toThrow(BooleanError);
    try {
      run();
    } catch (e) {
      expect(e).toBeInstanceOf(BooleanError);
      const err = e as BooleanError;
      expect(err.operation).toBe('union');
      expect(err.parts).toEqual(['top flange', 'web']);
      expect(err.message).toContain('"top flange"');
      expect(err.message).toContain('vertex 1');
      expect(err.toDiagnostic().code).toBe('boolean-failed');
    }
  });

  it('wraps the library\'s own exception ("Infinite loop…") with the operation and parts', () => {
    vi.spyOn(polygonClipping, 'difference').mockImplementation(() => {
      throw new Error('Infinite loop when passing sweep line over endpoints (queue size too big).');
    });
    const run = () => differenceRegions([piece(square(0, 0, 2, 2))], [piece(square(1, 1, 3, 3))], { parts: ['deck', 'opening'] });
    expect(run).toThrow(/difference of parts "deck" and "opening" failed: the clipping library stopped: Infinite loop/);
  });
});
