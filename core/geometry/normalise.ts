/**
 * Normalisation: the harmless clean-ups METHODS.md §1.1 lists, and the winding properties rely on.
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
 * Source: METHODS.md §1.1 ("Orientation", "Harmless input"); Shewchuk, "Adaptive precision
 *   floating-point arithmetic and fast robust geometric predicates" (1997) for orient2d.
 */
import { orient2d } from 'robust-predicates';
import { reverseRing, ringSignedArea } from './ring.ts';
import type { Polygon, Region, Ring } from './types.ts';

/** Vertices and bulges as growable plain arrays while cleaning. */
interface Chain {
  x: number[];
  y: number[];
  b: number[];
}

function chainWithoutRepeats(ring: Ring): Chain {
  const { xy, bulge } = ring;
  const n = xy.length >> 1;
  const c: Chain = { x: [], y: [], b: [] };
  for (let i = 0; i < n; i++) {
    const x = xy[2 * i] ?? 0;
    const y = xy[2 * i + 1] ?? 0;
    const last = c.x.length - 1;
    if (last >= 0 && c.x[last] === x && c.y[last] === y) {
      // Segment last → i has zero length: the kept vertex takes over vertex i's outgoing segment.
      c.b[last] = bulge?.[i] ?? 0;
      continue;
    }
    c.x.push(x);
    c.y.push(y);
    c.b.push(bulge?.[i] ?? 0);
  }
  while (c.x.length > 1 && c.x[c.x.length - 1] === c.x[0] && c.y[c.y.length - 1] === c.y[0]) {
    // The closing segment last → first has zero length; the segment before it now ends at vertex 0.
    c.x.pop();
    c.y.pop();
    c.b.pop();
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
  const out: Chain = { x: [], y: [], b: [] };
  const n = c.x.length;
  // A vertex k is removable when segment (k−1 → k) and (k → k+1) are straight and k is a pass-through.
  for (let i = 0; i < n; i++) {
    out.x.push(c.x[i] ?? 0);
    out.y.push(c.y[i] ?? 0);
    out.b.push(c.b[i] ?? 0);
    popWhilePassThrough(out);
  }
  // Seam: vertex 0 and the last vertex were never tested with their cyclic neighbours.
  let changed = true;
  while (changed && out.x.length > 3) {
    changed = removeIfPassThrough(out, out.x.length - 1) || removeIfPassThrough(out, 0);
  }
  return out;
}

/** Removes vertex v when both of its segments are straight and it lies strictly inside u→w. */
function removeIfPassThrough(c: Chain, v: number): boolean {
  const n = c.x.length;
  const u = (v + n - 1) % n;
  const w = (v + 1) % n;
  if ((c.b[u] ?? 0) !== 0 || (c.b[v] ?? 0) !== 0 || !isPassThrough(c, u, v, w)) return false;
  c.x.splice(v, 1);
  c.y.splice(v, 1);
  c.b.splice(v, 1);
  return true;
}

function popWhilePassThrough(c: Chain): void {
  while (c.x.length >= 3) {
    const w = c.x.length - 1, v = w - 1, u = w - 2;
    if ((c.b[u] ?? 0) !== 0 || (c.b[v] ?? 0) !== 0 || !isPassThrough(c, u, v, w)) return;
    c.x.splice(v, 1);
    c.y.splice(v, 1);
    c.b.splice(v, 1);
  }
}

function ringFromChain(c: Chain): Ring {
  const n = c.x.length;
  const xy = new Float64Array(2 * n);
  for (let i = 0; i < n; i++) {
    xy[2 * i] = c.x[i] ?? 0;
    xy[2 * i + 1] = c.y[i] ?? 0;
  }
  if (c.b.every((b) => b === 0)) return { xy };
  return { xy, bulge: Float64Array.from(c.b) };
}

/** Cleans one ring and gives it the requested winding (+1 counter-clockwise, −1 clockwise). */
export function normaliseRing(ring: Ring, winding: 1 | -1): Ring {
  const cleaned = ringFromChain(chainWithoutCollinear(chainWithoutRepeats(ring)));
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
