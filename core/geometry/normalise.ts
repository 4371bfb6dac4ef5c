/**
 * Normalisation: the harmless clean-ups docs/methods.md §1.1 lists, and the winding properties rely on.
 *
 * Does, for every ring, in this order:
 *   1. drops exactly repeated consecutive vertices (a zero-length segment) and an explicitly
 *      repeated closing vertex — the zero-length segment's bulge goes with it;
 *   2. removes a vertex between two STRAIGHT segments when it lies exactly on the line through its
 *      neighbours and strictly between them (exact orient2d test, robust-predicates); a vertex
 *      where the boundary doubles back (a zero-width spike) is kept, so validation reports it;
 *   3. forces outer rings counter-clockwise and holes clockwise (reverseRing keeps the arcs).
 * Units: unchanged. Tolerance: none — every test is exact; nothing is snapped.
 * Does not: repair anything else (self-intersections, holes outside, …): validateRegion reports
 *   those. Never mutates its input; returns new rings. A ring with zero signed area keeps its
 *   orientation. A bulge array that ends up all zero is dropped.
 * Source: docs/methods.md §1.1 ("Orientation", "Harmless input"); Shewchuk, "Adaptive precision
 *   floating-point arithmetic and fast robust geometric predicates" (1997) for orient2d.
 */
import { orient2d } from 'robust-predicates';
import { reverseRing, ringSignedArea } from './ring.ts';
import type { Polygon, Region, Ring } from './types.ts';

/**
 * Vertices and bulges while cleaning: typed arrays with a length, no per-vertex allocation (rings
 * may hold millions of vertices). Capacity is the input vertex count; cleaning only removes.
 */
interface Chain {
  x: Float64Array;
  y: Float64Array;
  b: Float64Array;
  n: number;
}

function emptyChain(capacity: number): Chain {
  return { x: new Float64Array(capacity), y: new Float64Array(capacity), b: new Float64Array(capacity), n: 0 };
}

function push(c: Chain, x: number, y: number, b: number): void {
  c.x[c.n] = x;
  c.y[c.n] = y;
  c.b[c.n] = b;
  c.n++;
}

/** Removes vertex v, shifting the later ones down. */
function removeAt(c: Chain, v: number): void {
  c.x.copyWithin(v, v + 1, c.n);
  c.y.copyWithin(v, v + 1, c.n);
  c.b.copyWithin(v, v + 1, c.n);
  c.n--;
}

function chainWithoutRepeats(ring: Ring): Chain {
  const { xy, bulge } = ring;
  const n = xy.length >> 1;
  const c = emptyChain(n);
  for (let i = 0; i < n; i++) {
    const x = xy[2 * i] ?? 0;
    const y = xy[2 * i + 1] ?? 0;
    const last = c.n - 1;
    if (last >= 0 && c.x[last] === x && c.y[last] === y) {
      // Segment last → i has zero length: the kept vertex takes over vertex i's outgoing segment.
      c.b[last] = bulge?.[i] ?? 0;
      continue;
    }
    push(c, x, y, bulge?.[i] ?? 0);
  }
  while (c.n > 1 && c.x[c.n - 1] === c.x[0] && c.y[c.n - 1] === c.y[0]) {
    // The closing segment last → first has zero length; the segment before it now ends at vertex 0.
    c.n--;
  }
  return c;
}

/** True when vertex v (between u and w) is on segment u→w, strictly inside it. */
function isPassThrough(c: Chain, u: number, v: number, w: number): boolean {
  const ux = c.x[u] ?? 0, uy = c.y[u] ?? 0, vx = c.x[v] ?? 0, vy = c.y[v] ?? 0, wx = c.x[w] ?? 0, wy = c.y[w] ?? 0;
  if (orient2d(ux, uy, vx, vy, wx, wy) !== 0) return false;
  // Same direction on both sides (no doubling back): (v − u)·(w − v) > 0.
  return (vx - ux) * (wx - vx) + (vy - uy) * (wy - vy) > 0;
}

function chainWithoutCollinear(c: Chain): Chain {
  const out = emptyChain(c.n);
  // A vertex k is removable when segment (k−1 → k) and (k → k+1) are straight and k is a pass-through.
  for (let i = 0; i < c.n; i++) {
    push(out, c.x[i] ?? 0, c.y[i] ?? 0, c.b[i] ?? 0);
    popWhilePassThrough(out);
  }
  // Seam: vertex 0 and the last vertex were never tested with their cyclic neighbours.
  let changed = true;
  while (changed && out.n > 3) {
    changed = removeIfPassThrough(out, out.n - 1) || removeIfPassThrough(out, 0);
  }
  return out;
}

/** Removes vertex v when both of its segments are straight and it lies strictly inside u→w. */
function removeIfPassThrough(c: Chain, v: number): boolean {
  const n = c.n;
  const u = (v + n - 1) % n;
  const w = (v + 1) % n;
  if ((c.b[u] ?? 0) !== 0 || (c.b[v] ?? 0) !== 0 || !isPassThrough(c, u, v, w)) return false;
  removeAt(c, v);
  return true;
}

function popWhilePassThrough(c: Chain): void {
  while (c.n >= 3) {
    const w = c.n - 1, v = w - 1, u = w - 2;
    if ((c.b[u] ?? 0) !== 0 || (c.b[v] ?? 0) !== 0 || !isPassThrough(c, u, v, w)) return;
    removeAt(c, v);
  }
}

function ringFromChain(c: Chain): Ring {
  const n = c.n;
  const xy = new Float64Array(2 * n);
  let curved = false;
  for (let i = 0; i < n; i++) {
    xy[2 * i] = c.x[i] ?? 0;
    xy[2 * i + 1] = c.y[i] ?? 0;
    if ((c.b[i] ?? 0) !== 0) curved = true;
  }
  if (!curved) return { xy };
  return { xy, bulge: c.b.slice(0, n) };
}

/**
 * True when cleaning would change nothing: straight edges only, no repeated consecutive vertex
 * (the closing pair included) and no pass-through vertex, all tested cyclically as the chain
 * passes would. One scan, no allocation: the common case of a clean million-vertex outline.
 */
function alreadyClean(ring: Ring): boolean {
  const { xy, bulge } = ring;
  const n = xy.length >> 1;
  if (n < 4 || (bulge !== undefined && bulge.some((b) => b !== 0))) return false;
  let ux = xy[2 * n - 4]!, uy = xy[2 * n - 3]!, vx = xy[2 * n - 2]!, vy = xy[2 * n - 1]!;
  for (let i = 0; i < n; i++) {
    const wx = xy[2 * i]!, wy = xy[2 * i + 1]!;
    if (wx === vx && wy === vy) return false;
    if (orient2d(ux, uy, vx, vy, wx, wy) === 0 && (vx - ux) * (wx - vx) + (vy - uy) * (wy - vy) > 0) return false;
    ux = vx; uy = vy; vx = wx; vy = wy;
  }
  return true;
}

/** Cleans one ring and gives it the requested winding (+1 counter-clockwise, −1 clockwise). */
export function normaliseRing(ring: Ring, winding: 1 | -1): Ring {
  const cleaned = alreadyClean(ring) ? { xy: ring.xy.slice() } : ringFromChain(chainWithoutCollinear(chainWithoutRepeats(ring)));
  const area = ringSignedArea(cleaned);
  return area * winding < 0 ? reverseRing(cleaned) : cleaned;
}

export function normalisePolygon(polygon: Polygon): Polygon {
  return { outer: normaliseRing(polygon.outer, 1), holes: polygon.holes.map((h) => normaliseRing(h, -1)) };
}

/** A new region with every ring cleaned, outer rings counter-clockwise and holes clockwise. */
export function normaliseRegion(region: Region): Region {
  return region.map(normalisePolygon);
}
