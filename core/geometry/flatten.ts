/**
 * Flattening arcs into polylines to a stated chord tolerance (docs/methods.md §2.6).
 *
 * Units: the document's length unit. Winding: kept (vertices come out in ring order).
 * Tolerance: every chord's sagitta (greatest distance between the chord and its arc) is
 *   ≤ maxSagitta. An arc of radius r and sweep Δt is split into m equal-angle pieces with
 *   m = max(2, ceil(|Δt| / (2·acos(1 − maxSagitta/r))), ceil(|Δt| / (π/2))), so no piece sweeps
 *   more than a quarter turn and a ring of two vertices (a circle, a D shape) never collapses
 *   into coincident chords.
 * Exactness: the ring's own vertices are copied bit for bit; interior arc points are computed
 *   as Ps + r(cos t − cos t0, sin t − sin t0) in half-angle form so a far centre never enters
 *   (docs/methods.md §2.4, "Nearly straight arcs").
 * Cap: at most MAX_PIECES_PER_ARC pieces per arc; a finer request is a bug (invariant).
 * Does not: check validity. Source: docs/methods.md §2.4, §2.6.
 */
import { invariant } from '../invariant.ts';
import { arcOfSegment, ringVertexCount, type ArcGeometry } from './ring.ts';
import type { Ring } from './types.ts';

export const MAX_PIECES_PER_ARC = 1 << 20;

/**
 * A flattened ring. Flattened vertex k lies on original segment `segment[k]`, at piece
 * `piece[k]` of that segment's `pieces[segment[k]]` (piece 0 is the original vertex itself).
 */
export interface FlatRing {
  readonly xy: Float64Array;
  readonly segment: Uint32Array;
  readonly piece: Uint32Array;
  /** Number of pieces each original segment was split into (1 for a straight segment). */
  readonly pieces: Uint32Array;
}

/** Number of equal-angle pieces that keeps the sagitta of an arc within maxSagitta. */
export function arcPieceCount(arc: ArcGeometry, maxSagitta: number): number {
  const sweep = Math.abs(arc.sweep);
  const ratio = maxSagitta / arc.r;
  const stepBySagitta = ratio >= 1 ? Math.PI : 2 * Math.acos(1 - ratio);
  const m = Math.max(2, Math.ceil(sweep / stepBySagitta), Math.ceil(sweep / (Math.PI / 2)));
  invariant(m <= MAX_PIECES_PER_ARC, `flattening an arc of radius ${arc.r} to sagitta ${maxSagitta} needs ${m} pieces (cap ${MAX_PIECES_PER_ARC})`);
  return m;
}

/** Point at parameter t0 + f on the arc, measured from its start point (half-angle form). */
export function arcPointFrom(x0: number, y0: number, arc: ArcGeometry, f: number): [number, number] {
  const s = Math.sin(f / 2);
  const mid = arc.t0 + f / 2;
  // cos t − cos t0 = −2 sin((t+t0)/2) sin((t−t0)/2); sin t − sin t0 = 2 cos((t+t0)/2) sin((t−t0)/2).
  return [x0 - 2 * arc.r * Math.sin(mid) * s, y0 + 2 * arc.r * Math.cos(mid) * s];
}

/** The ring as a polyline whose chords stay within maxSagitta of the exact arcs. */
export function flattenRing(ring: Ring, maxSagitta: number): FlatRing {
  invariant(maxSagitta > 0 && Number.isFinite(maxSagitta), `flattenRing: maxSagitta must be a positive finite length, got ${maxSagitta}`);
  const n = ringVertexCount(ring);
  const pieces = new Uint32Array(n);
  const arcs: (ArcGeometry | null)[] = [];
  let total = 0;
  for (let i = 0; i < n; i++) {
    const arc = arcOfSegment(ring, i);
    arcs.push(arc);
    pieces[i] = arc === null ? 1 : arcPieceCount(arc, maxSagitta);
    total += pieces[i] ?? 1;
  }
  const xy = new Float64Array(2 * total);
  const segment = new Uint32Array(total);
  const piece = new Uint32Array(total);
  let k = 0;
  for (let i = 0; i < n; i++) {
    const x0 = ring.xy[2 * i] ?? 0;
    const y0 = ring.xy[2 * i + 1] ?? 0;
    const arc = arcs[i] ?? null;
    const m = pieces[i] ?? 1;
    for (let p = 0; p < m; p++, k++) {
      const [x, y] = p === 0 || arc === null ? [x0, y0] : arcPointFrom(x0, y0, arc, (arc.sweep * p) / m);
      xy[2 * k] = x;
      xy[2 * k + 1] = y;
      segment[k] = i;
      piece[k] = p;
    }
  }
  return { xy, segment, piece, pieces };
}
