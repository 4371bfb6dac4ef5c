/**
 * Rings: construction, vertex count, exact signed area with circular arcs, reversal, and the
 * centre / radius / angles of an arc segment given by its bulge.
 *
 * Units: the document's length unit; angles in radians (branded `Radians`).
 * Winding: signed area > 0 means counter-clockwise. Nothing here changes winding except
 *   `reverseRing`, which traces the same boundary (same arcs) the other way round.
 * Bulge: bulge[i] = tan(sweep / 4) for segment i (DXF convention, see types.ts); 0 = straight.
 * Accuracy: the signed area is computed about the ring's first vertex (docs/methods.md §1.3) so that
 *   a ring far from the origin keeps its digits; each arc adds the fan triangle of its chord plus
 *   the signed circular segment r²(Δt − sin Δt)/2, evaluated by its Taylor series for small
 *   sweeps to avoid cancellation.
 * Does not guarantee: anything for rings with non-finite numbers (validate first).
 * Sources: docs/methods.md §1.1 (shoelace / Green's theorem), §2.4 (bulge → centre, radius, sweep);
 *   circular segment area r²(θ − sin θ)/2: Roark's Formulas for Stress and Strain, Table A.1
 *   (section properties, circular segment) — common practice.
 */
import { invariant } from '../invariant.ts';
import { radians, type Point, type Radians, type Ring } from './types.ts';

/** Centre, radius, start angle and signed sweep of one arc segment (docs/methods.md §2). */
export interface ArcGeometry {
  readonly cx: number;
  readonly cy: number;
  readonly r: number;
  /** Parameter angle of the segment's start vertex about the centre. */
  readonly t0: Radians;
  /** Signed sweep: > 0 counter-clockwise about the centre; |sweep| < 2π. */
  readonly sweep: Radians;
}

/** Builds a ring from points (closing vertex not repeated) and optional per-segment bulges. */
export function ringFromPoints(points: readonly Point[], bulges?: readonly number[]): Ring {
  const xy = new Float64Array(points.length * 2);
  points.forEach(([x, y], i) => {
    xy[2 * i] = x;
    xy[2 * i + 1] = y;
  });
  if (bulges === undefined) return { xy };
  invariant(bulges.length === points.length, `ringFromPoints: ${points.length} points need ${points.length} bulges, got ${bulges.length}`);
  return bulges.every((b) => b === 0) ? { xy } : { xy, bulge: Float64Array.from(bulges) };
}

export function ringVertexCount(ring: Ring): number {
  return ring.xy.length >> 1;
}

/** The bulge of segment i (0 when the ring has no arcs). */
export function segmentBulge(ring: Ring, i: number): number {
  return ring.bulge?.[i] ?? 0;
}

/** x − sin x without cancellation for small |x| (Taylor series, 9 terms, error < x¹⁹/19!). */
function xMinusSin(x: number): number {
  if (Math.abs(x) >= 0.5) return x - Math.sin(x);
  const x2 = x * x;
  let term = (x * x2) / 6;
  let sum = term;
  for (let k = 2; k <= 9; k++) {
    term *= -x2 / ((2 * k) * (2 * k + 1));
    sum += term;
  }
  return sum;
}

/**
 * Signed area between the chord of segment i and its arc (0 for a straight segment):
 * positive when the arc runs counter-clockwise about its centre (it bulges to the chord's right).
 */
export function arcSegmentArea(chordLength: number, bulge: number): number {
  if (bulge === 0) return 0;
  const r = (chordLength * (1 + bulge * bulge)) / (4 * Math.abs(bulge));
  const sweep = 4 * Math.atan(bulge);
  return (r * r * xMinusSin(sweep)) / 2;
}

/** Exact signed area (> 0 counter-clockwise), arcs included. */
export function ringSignedArea(ring: Ring): number {
  const { xy, bulge } = ring;
  const n = xy.length >> 1;
  if (n === 0) return 0;
  const ox = xy[0] ?? 0;
  const oy = xy[1] ?? 0;
  let twice = 0;
  let arcs = 0;
  for (let i = 0; i < n; i++) {
    const j = i + 1 === n ? 0 : i + 1;
    const x0 = (xy[2 * i] ?? 0) - ox;
    const y0 = (xy[2 * i + 1] ?? 0) - oy;
    const x1 = (xy[2 * j] ?? 0) - ox;
    const y1 = (xy[2 * j + 1] ?? 0) - oy;
    twice += x0 * y1 - x1 * y0;
    const b = bulge?.[i] ?? 0;
    if (b !== 0) arcs += arcSegmentArea(Math.hypot(x1 - x0, y1 - y0), b);
  }
  return twice / 2 + arcs;
}

/** The same boundary traced the other way: vertex order reversed, each arc's bulge negated. */
export function reverseRing(ring: Ring): Ring {
  const { xy, bulge } = ring;
  const n = xy.length >> 1;
  const out = new Float64Array(xy.length);
  for (let k = 0; k < n; k++) {
    const src = n - 1 - k;
    out[2 * k] = xy[2 * src] ?? 0;
    out[2 * k + 1] = xy[2 * src + 1] ?? 0;
  }
  if (bulge === undefined) return { xy: out };
  // Old segment s runs v[s] → v[s+1]; reversed, it runs v[s+1] → v[s], which starts at new index n−2−s.
  const outBulge = new Float64Array(n);
  for (let s = 0; s < n; s++) {
    const k = (((n - 2 - s) % n) + n) % n;
    outBulge[k] = 0 - (bulge[s] ?? 0); // 0 − b, not −b: a straight segment stays +0, not −0
  }
  return { xy: out, bulge: outBulge };
}

/** Centre, radius, start angle and sweep of arc segment i, or null when the segment is straight. */
export function arcOfSegment(ring: Ring, i: number): ArcGeometry | null {
  const b = segmentBulge(ring, i);
  if (b === 0) return null;
  const n = ringVertexCount(ring);
  const j = i + 1 === n ? 0 : i + 1;
  const { xy } = ring;
  return arcFromBulge(xy[2 * i] ?? 0, xy[2 * i + 1] ?? 0, xy[2 * j] ?? 0, xy[2 * j + 1] ?? 0, b);
}

/** docs/methods.md §2.4: Pc = M + ((1 − b²)/(4b))·n_L, r = |d|(1 + b²)/(4|b|), Δt = 4·atan(b). */
export function arcFromBulge(x0: number, y0: number, x1: number, y1: number, b: number): ArcGeometry {
  invariant(b !== 0, 'arcFromBulge: a straight segment has no arc');
  const dx = x1 - x0;
  const dy = y1 - y0;
  const k = (1 - b * b) / (4 * b);
  const cx = (x0 + x1) / 2 - k * dy;
  const cy = (y0 + y1) / 2 + k * dx;
  const r = (Math.hypot(dx, dy) * (1 + b * b)) / (4 * Math.abs(b));
  return { cx, cy, r, t0: radians(Math.atan2(y0 - cy, x0 - cx)), sweep: radians(4 * Math.atan(b)) };
}
