import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { isRegionValid, ringFromPoints, validateRegion } from '../../core/geometry/index.ts';
import type { Diagnostic, Region, Ring } from '../../core/geometry/index.ts';
import { circle, piece, square } from './helpers.ts';

const codes = (d: readonly Diagnostic[]) => d.map((x) => x.code);
const one = (region: Region, part = 'deck plate'): Diagnostic => {
  const d = validateRegion(region, { part });
  expect(d).toHaveLength(1);
  const first = d[0];
  if (first === undefined) throw new Error('no diagnostic');
  return first;
};

describe('validateRegion: rings that are fine', () => {
  it('accepts a convex square, a non-convex L shape, a circle of two arcs and a plate with a round hole', () => {
    const ell = ringFromPoints([[0, 0], [6, 0], [6, 1], [1, 1], [1, 8], [0, 8]]);
    expect(validateRegion([piece(square(0, 0, 2, 1))])).toEqual([]);
    expect(validateRegion([piece(ell)])).toEqual([]);
    expect(validateRegion([piece(circle(0, 0, 3))])).toEqual([]);
    expect(validateRegion([piece(square(-5, -5, 5, 5), [ringFromPoints([[2, 0], [-2, 0]], [-1, -1])])])).toEqual([]);
    expect(isRegionValid([piece(ell)])).toBe(true);
  });

  it('accepts a non-convex star-shaped ring with 400 vertices', () => {
    const pts = Array.from({ length: 400 }, (_, i): [number, number] => {
      const t = (2 * Math.PI * i) / 400;
      const r = i % 2 === 0 ? 10 : 4;
      return [r * Math.cos(t), r * Math.sin(t)];
    });
    expect(validateRegion([piece(ringFromPoints(pts))])).toEqual([]);
  });

  it('accepts pieces that touch along an edge or at a corner, an island inside a hole, and a hole touching its outer ring at a point', () => {
    const touching: Region = [piece(square(0, 0, 1, 1)), piece(square(1, 0, 2, 1)), piece(square(2, 1, 3, 2))];
    expect(validateRegion(touching)).toEqual([]);
    const island: Region = [piece(square(0, 0, 10, 10), [ringFromPoints([[2, 2], [2, 8], [8, 8], [8, 2]])]), piece(square(4, 4, 6, 6))];
    expect(validateRegion(island)).toEqual([]);
    const holeAtEdge = [piece(square(0, 0, 10, 10), [ringFromPoints([[5, 0], [3, 4], [7, 4]])])];
    expect(validateRegion(holeAtEdge)).toEqual([]);
  });

  it('accepts a plate with four rounded corners (convex arcs) and a round-cornered opening (arcs on a clockwise hole)', () => {
    const t = Math.tan(Math.PI / 8); // quarter-circle bulge
    const rounded = ringFromPoints([[1, 0], [9, 0], [10, 1], [10, 5], [9, 6], [1, 6], [0, 5], [0, 1]], [0, t, 0, t, 0, t, 0, t]);
    const opening = ringFromPoints([[3, 2], [3, 4], [4, 4], [4, 2]], [0, 0, 0, -1]);
    expect(validateRegion([piece(rounded, [opening])])).toEqual([]);
  });

  it('judges containment against the exact arc: a hole inside the bulge of a half disc is inside, one just beyond it is outside', () => {
    // Half disc of radius 5 above the diameter from (5,0) to (−5,0); the hole sits above the chord polygon.
    const half = ringFromPoints([[5, 0], [-5, 0]], [1, 0]);
    const tri = (y: number) => ringFromPoints([[0, y], [0.2, y + 0.2], [-0.2, y + 0.2]]);
    expect(validateRegion([piece(half, [tri(4.5)])])).toEqual([]);
    expect(codes(validateRegion([piece(half, [tri(5.1)])]))).toEqual(['hole-outside']);
  });

  it('tolerates a repeated closing vertex and repeated consecutive vertices (harmless input, docs/methods.md §1.1)', () => {
    const ring = ringFromPoints([[0, 0], [3, 0], [3, 0], [3, 2], [0, 2], [0, 0]]);
    expect(validateRegion([piece(ring)])).toEqual([]);
  });
});

describe('validateRegion: each diagnostic names the part, polygon, ring and vertex', () => {
  it('too-few-points: two distinct points joined by straight segments', () => {
    const d = one([piece(ringFromPoints([[0, 0], [1, 1], [1, 1]]))]);
    expect(d).toMatchObject({ code: 'too-few-points', part: 'deck plate', polygon: 0, ring: -1, vertex: 0 });
    expect(d.message).toContain('deck plate');
  });

  it('zero-area: three collinear points, reported on hole 0 of polygon 1', () => {
    const region: Region = [piece(square(0, 0, 1, 1)), piece(square(5, 0, 9, 4), [ringFromPoints([[6, 1], [7, 2], [8, 3]])])];
    const d = validateRegion(region, { part: 'web' }).filter((x) => x.code === 'zero-area');
    expect(d).toHaveLength(1);
    expect(d[0]).toMatchObject({ part: 'web', polygon: 1, ring: 0 });
  });

  it('non-finite: a NaN coordinate at vertex 2, without an `at` point', () => {
    const d = one([piece(ringFromPoints([[0, 0], [1, 0], [NaN, 1], [0, 1]]))]);
    expect(d).toMatchObject({ code: 'non-finite', ring: -1, vertex: 2 });
    expect(d.at).toBeUndefined();
  });

  it('too-large: a coordinate beyond 1e9 at vertex 1', () => {
    const d = one([piece(ringFromPoints([[0, 0], [2e9, 0], [0, 1]]))]);
    expect(d).toMatchObject({ code: 'too-large', vertex: 1, at: [2e9, 0] });
  });

  it('bad-bulge: an infinite bulge, a wrong-length bulge array, and a bulge on a zero-length segment', () => {
    const inf: Ring = { xy: Float64Array.from([0, 0, 1, 0, 1, 1]), bulge: Float64Array.from([0, Infinity, 0]) };
    expect(one([piece(inf)])).toMatchObject({ code: 'bad-bulge', vertex: 1 });
    const short: Ring = { xy: Float64Array.from([0, 0, 1, 0, 1, 1]), bulge: Float64Array.from([0, 0.5]) };
    expect(one([piece(short)]).code).toBe('bad-bulge');
    const zeroLength: Ring = { xy: Float64Array.from([0, 0, 1, 0, 1, 0, 1, 1]), bulge: Float64Array.from([0, 0.5, 0, 0]) };
    expect(one([piece(zeroLength)])).toMatchObject({ code: 'bad-bulge', vertex: 1 });
  });

  it('self-intersection on a bow-tie: segment 1 meets segment 3 where they cross, at (1, 1)', () => {
    const bowTie = ringFromPoints([[0, 0], [2, 2], [2, 0], [0, 2]]);
    const d = validateRegion([piece(bowTie)], { part: 'gusset' }).filter((x) => x.code === 'self-intersection');
    expect(d).toHaveLength(1);
    expect(d[0]).toMatchObject({ part: 'gusset', polygon: 0, ring: -1, vertex: 0, at: [1, 1] });
  });

  it('self-intersection on a figure-8 whose two loops have opposite winding', () => {
    const figure8 = ringFromPoints([[0, 0], [4, 4], [8, 0], [8, 4], [4, 0], [0, 4]]);
    const d = validateRegion([piece(figure8)]);
    expect(codes(d)).toContain('self-intersection');
    expect(d.find((x) => x.code === 'self-intersection')?.at).toEqual([2, 2]);
  });

  it('self-intersection, reported once, when the ring touches itself at a vertex (vertex 3 lies on segment 0)', () => {
    // A notch from the top reaching down: its tip (2,0) touches the bottom edge (0,0)–(4,0).
    const touching = ringFromPoints([[0, 0], [4, 0], [4, 4], [2, 0], [0, 4]]);
    const d = validateRegion([piece(touching)]);
    expect(codes(d)).toEqual(['self-intersection']);
    expect(d[0]?.at).toEqual([2, 0]);
    // The same notch stopping short of the edge is a simple ring.
    const clear = ringFromPoints([[0, 0], [4, 0], [4, 4], [2, 0.5], [0, 4]]);
    expect(validateRegion([piece(clear)])).toEqual([]);
  });

  it('self-intersection where the boundary doubles back on itself (a zero-width spike from vertex 1 to vertex 2 and back)', () => {
    const spike = ringFromPoints([[0, 0], [4, 0], [6, 0], [4, 0], [4, 2], [0, 2]]);
    const d = validateRegion([piece(spike)]);
    expect(codes(d)).toContain('self-intersection');
    expect(d.every((x) => x.ring === -1 && x.polygon === 0)).toBe(true);
  });

  it('self-intersection when an arc of the ring crosses one of its straight edges', () => {
    // Bottom segment bulges downward far enough (semicircle, radius 2) to cross the lower edge of a notch.
    const ring = ringFromPoints([[4, 0], [0, 0], [0, 4], [4, 4]], [1, 0, 0, 0]);
    const cut = ringFromPoints([[4, 0], [0, 0], [0, -1], [1, -1], [1, 4], [4, 4]], [1, 0, 0, 0, 0, 0]);
    expect(validateRegion([piece(ring)])).toEqual([]);
    expect(codes(validateRegion([piece(cut)]))).toContain('self-intersection');
  });

  it('hole-outside: a hole crossing its outer ring, and a hole lying wholly outside it', () => {
    const crossing = validateRegion([piece(square(0, 0, 10, 10), [ringFromPoints([[8, 8], [8, 12], [12, 12], [12, 8]])])], { part: 'flange' });
    expect(crossing).toHaveLength(1);
    expect(crossing[0]).toMatchObject({ code: 'hole-outside', part: 'flange', polygon: 0, ring: 0 });
    const outside = validateRegion([piece(square(0, 0, 10, 10), [square(1, 1, 2, 2), ringFromPoints([[20, 20], [20, 22], [22, 22], [22, 20]])])]);
    expect(outside).toHaveLength(1);
    expect(outside[0]).toMatchObject({ code: 'hole-outside', ring: 1, vertex: 0, at: [20, 20] });
  });

  it('overlap: two holes of one polygon crossing, and one hole inside another', () => {
    const h = (x0: number, y0: number, x1: number, y1: number) => ringFromPoints([[x0, y0], [x0, y1], [x1, y1], [x1, y0]]);
    const crossing = validateRegion([piece(square(0, 0, 10, 10), [h(1, 1, 4, 4), h(3, 3, 6, 6)])]);
    expect(crossing).toHaveLength(1);
    expect(crossing[0]).toMatchObject({ code: 'overlap', polygon: 0, ring: 1 });
    const nested = validateRegion([piece(square(0, 0, 10, 10), [h(1, 1, 8, 8), h(3, 3, 6, 6)])]);
    expect(nested).toHaveLength(1);
    expect(nested[0]).toMatchObject({ code: 'overlap', ring: 1 });
  });

  it('overlap: two squares sharing parts of their top and bottom edges, whose boundaries touch but never cross', () => {
    // [0,2]² and [1,3]×[0,2]: every contact is collinear or at a vertex, yet [1,2]×[0,2] is covered twice.
    const d = validateRegion([piece(square(0, 0, 2, 2)), piece(square(1, 0, 3, 2))]);
    expect(codes(d)).toEqual(['overlap']);
    // Two identical pieces overlap everywhere.
    expect(codes(validateRegion([piece(square(0, 0, 2, 2)), piece(square(0, 0, 2, 2))]))).toEqual(['overlap']);
  });

  it('hole-outside: a hole running along the outer ring\'s bottom edge and out through its side; a hole in the corner along two edges is fine', () => {
    // The hole's top edge crosses the outer ring's right side at (10, 2).
    const h = ringFromPoints([[8, 0], [8, 2], [12, 2], [12, 0]]);
    expect(codes(validateRegion([piece(square(0, 0, 10, 10), [h])]))).toEqual(['hole-outside']);
    // Touching only: the hole lies along the bottom and right edges, inside the outer ring.
    const corner = ringFromPoints([[8, 0], [8, 2], [10, 2], [10, 0]]);
    expect(validateRegion([piece(square(0, 0, 10, 10), [corner])])).toEqual([]);
  });

  it('overlap: two pieces of one region crossing, and one piece lying inside another', () => {
    const crossing = validateRegion([piece(square(0, 0, 4, 4)), piece(square(3, 3, 6, 6))], { part: 'box girder' });
    expect(crossing).toHaveLength(1);
    expect(crossing[0]).toMatchObject({ code: 'overlap', part: 'box girder', polygon: 1, ring: -1 });
    const inside = validateRegion([piece(square(0, 0, 10, 10)), piece(square(3, 3, 6, 6))]);
    expect(inside).toHaveLength(1);
    expect(inside[0]).toMatchObject({ code: 'overlap', polygon: 1 });
  });
});

describe('validateRegion: cost on a large ring', () => {
  it('validates a 1,000,000-vertex circle-like ring with no diagnostics in near-linear time, and finds a vertex moved onto a far segment', () => {
    const n = 1_000_000;
    const xy = new Float64Array(2 * n);
    for (let i = 0; i < n; i++) {
      const t = (2 * Math.PI * i) / n;
      const r = 100 * (1 + 0.01 * Math.sin(7 * t));
      xy[2 * i] = r * Math.cos(t) + 5000;
      xy[2 * i + 1] = r * Math.sin(t) - 3000;
    }
    const region: Region = [piece({ xy })];
    const start = performance.now();
    const d = validateRegion(region);
    const ms = performance.now() - start;
    console.log(`validateRegion, 1,000,000-vertex ring: ${ms.toFixed(0)} ms (cold; npm run bench -- geometry measures it warm)`);
    expect(d).toEqual([]);
    // Target: well under a second (measured 0.21–0.47 s warm on a shared 2-core machine, see the bench).
    // The assertion leaves room for a loaded test machine running files in parallel; a quadratic
    // sweep (about 10¹² pair tests) would take hours and fail it.
    expect(ms).toBeLessThan(8000);
    // One vertex moved onto a far segment: found, and named.
    xy[2 * 500_000] = xy[20] ?? 0;
    xy[2 * 500_000 + 1] = xy[21] ?? 0;
    expect(codes(validateRegion(region))).toContain('self-intersection');
  });
});

describe('validateRegion against a brute-force oracle', () => {
  // Independent O(n²) check with integer arithmetic (exact for these small integers): two
  // non-adjacent closed segments meeting, or two adjacent ones folding back over each other.
  type P = readonly [number, number];
  const orient = (a: P, b: P, c: P) => Math.sign((b[0] - a[0]) * (c[1] - a[1]) - (b[1] - a[1]) * (c[0] - a[0]));
  const onSeg = (a: P, b: P, c: P) => Math.min(a[0], b[0]) <= c[0] && c[0] <= Math.max(a[0], b[0]) && Math.min(a[1], b[1]) <= c[1] && c[1] <= Math.max(a[1], b[1]);
  const meet = (a: P, b: P, c: P, d: P) => {
    const o1 = orient(a, b, c), o2 = orient(a, b, d), o3 = orient(c, d, a), o4 = orient(c, d, b);
    if (o1 * o2 < 0 && o3 * o4 < 0) return true;
    return (o1 === 0 && onSeg(a, b, c)) || (o2 === 0 && onSeg(a, b, d)) || (o3 === 0 && onSeg(c, d, a)) || (o4 === 0 && onSeg(c, d, b));
  };
  const bruteSelfIntersects = (pts: readonly P[]) => {
    const n = pts.length;
    const at = (i: number): P => pts[i % n] ?? [0, 0];
    for (let i = 0; i < n; i++) {
      for (let j = i + 1; j < n; j++) {
        const adjacent = j === i + 1 || (i === 0 && j === n - 1);
        if (!adjacent && meet(at(i), at(i + 1), at(j), at(j + 1))) return true;
        if (adjacent) {
          // Shared vertex v between u→v and v→w: folding back means w on line uv, pointing back.
          const [u, v, w] = j === i + 1 ? [at(i), at(j), at(j + 1)] : [at(j), at(0), at(1)];
          if (orient(u, v, w) === 0 && (v[0] - u[0]) * (w[0] - v[0]) + (v[1] - u[1]) * (w[1] - v[1]) < 0) return true;
        }
      }
    }
    return false;
  };

  it('reports self-intersection exactly when the O(n²) check finds one (random integer rings, 3–9 vertices)', () => {
    const pt = fc.tuple(fc.integer({ min: 0, max: 6 }), fc.integer({ min: 0, max: 6 }));
    fc.assert(
      fc.property(fc.uniqueArray(pt, { minLength: 3, maxLength: 9, selector: ([x, y]) => `${x},${y}` }), (pts) => {
        const d = validateRegion([piece(ringFromPoints(pts))]);
        expect(codes(d).includes('self-intersection')).toBe(bruteSelfIntersects(pts));
      }),
      { seed: 42, numRuns: 500 },
    );
  });

  // Axis-aligned integer rectangles: interiors overlap iff both overlap lengths are positive;
  // one lies inside another (closed) iff its bounds lie within (interval arithmetic, exact).
  const box = fc.tuple(fc.integer({ min: 0, max: 8 }), fc.integer({ min: 0, max: 8 }), fc.integer({ min: 1, max: 6 }), fc.integer({ min: 1, max: 6 }));
  type Box = readonly [x: number, y: number, w: number, h: number];
  const interiorsOverlap = ([ax, ay, aw, ah]: Box, [bx, by, bw, bh]: Box) =>
    Math.min(ax + aw, bx + bw) - Math.max(ax, bx) > 0 && Math.min(ay + ah, by + bh) - Math.max(ay, by) > 0;
  const within = ([ax, ay, aw, ah]: Box, [bx, by, bw, bh]: Box) => ax >= bx && ay >= by && ax + aw <= bx + bw && ay + ah <= by + bh;
  const cw = ([x, y, w, h]: Box) => ringFromPoints([[x, y], [x, y + h], [x + w, y + h], [x + w, y]]);
  const sq = ([x, y, w, h]: Box) => square(x, y, x + w, y + h);

  it('reports overlap of two pieces exactly when their interiors overlap (random rectangles that cross, touch, nest or coincide)', () => {
    fc.assert(
      fc.property(box, box, (a, b) => {
        expect(codes(validateRegion([piece(sq(a)), piece(sq(b))])).includes('overlap')).toBe(interiorsOverlap(a, b));
      }),
      { seed: 42, numRuns: 400 },
    );
  });

  it('reports two holes overlapping exactly when their interiors overlap, and hole-outside exactly when a hole leaves the outer ring', () => {
    const outer: Box = [2, 2, 8, 8];
    fc.assert(
      fc.property(box, box, (a, b) => {
        const d = codes(validateRegion([piece(sq(outer), [cw(a), cw(b)])]));
        const leaves = !within(a, outer) || !within(b, outer);
        expect(d.includes('hole-outside')).toBe(leaves);
        // Overlap between the holes is judged when neither crosses the outer ring.
        if (!leaves) expect(d.includes('overlap')).toBe(interiorsOverlap(a, b));
      }),
      { seed: 42, numRuns: 400 },
    );
  });
});
