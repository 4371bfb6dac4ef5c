/**
 * Outlines with exact rounded corners: a closed chain of sharp corner points, each with a radius,
 * becomes a Ring whose rounded corners are circular arcs stored as bulges.
 *
 * Units: any length unit; the radii are in the same unit as the points.
 * Winding: kept as given. Each corner is rounded by an arc tangent to both neighbouring edges; its
 *   signed sweep equals the signed turning angle θ of the outline at that corner, so a convex
 *   corner of a counter-clockwise ring becomes a CCW arc (bulge > 0) and a concave corner (a root
 *   fillet) a CW arc (bulge < 0), as docs/methods.md §2.4 requires. bulge = tan(θ/4) (DXF convention).
 * Geometry: the tangent points lie r·tan(|θ|/2) from the corner along each edge (a circle
 *   tangent to two lines; Euclid, common practice). The arc end points therefore coincide with
 *   the neighbouring straight edges by construction.
 * Does not guarantee: that the outline does not cross itself (callers check their parameters).
 *   When two roundings meet exactly on one edge, the zero-length edge between them is dropped.
 */
import type { Point, Ring } from '../geometry/types.ts';
import { invariant } from '../invariant.ts';

export interface Corner {
  readonly at: Point;
  /** Rounding radius; 0 keeps the corner sharp. */
  readonly radius: number;
}

/** Where two roundings need more room than an edge has, in corner indices. */
export interface RoundingClash {
  readonly edgeFrom: number;
  readonly edgeTo: number;
  readonly edgeLength: number;
  readonly needed: number;
}

interface CornerCut {
  readonly tangentIn: Point;
  readonly tangentOut: Point;
  readonly bulge: number;
  readonly setback: number;
}

function cornerCut(prev: Point, at: Point, next: Point, radius: number): CornerCut {
  const inX = at[0] - prev[0];
  const inY = at[1] - prev[1];
  const outX = next[0] - at[0];
  const outY = next[1] - at[1];
  const inLen = Math.hypot(inX, inY);
  const outLen = Math.hypot(outX, outY);
  invariant(inLen > 0 && outLen > 0, 'cornerCut: repeated corner point');
  // Signed turning angle: > 0 turns left (convex on a CCW ring).
  const turn = Math.atan2(inX * outY - inY * outX, inX * outX + inY * outY);
  if (radius === 0 || turn === 0) return { tangentIn: at, tangentOut: at, bulge: 0, setback: 0 };
  const setback = radius * Math.tan(Math.abs(turn) / 2);
  return {
    tangentIn: [at[0] - (setback * inX) / inLen, at[1] - (setback * inY) / inLen],
    tangentOut: [at[0] + (setback * outX) / outLen, at[1] + (setback * outY) / outLen],
    bulge: Math.tan(turn / 4),
    setback,
  };
}

/** The edges on which two neighbouring roundings overlap (empty when every rounding fits). */
export function roundingClashes(corners: readonly Corner[]): RoundingClash[] {
  const cuts = cornerCuts(corners);
  const clashes: RoundingClash[] = [];
  for (let i = 0; i < corners.length; i++) {
    const j = (i + 1) % corners.length;
    const a = corners[i]!.at;
    const b = corners[j]!.at;
    const edgeLength = Math.hypot(b[0] - a[0], b[1] - a[1]);
    const needed = cuts[i]!.setback + cuts[j]!.setback;
    if (needed > edgeLength * (1 + 1e-12)) clashes.push({ edgeFrom: i, edgeTo: j, edgeLength, needed });
  }
  return clashes;
}

function cornerCuts(corners: readonly Corner[]): CornerCut[] {
  const n = corners.length;
  invariant(n >= 3, `an outline needs at least 3 corners, got ${n}`);
  return corners.map((c, i) => cornerCut(corners[(i + n - 1) % n]!.at, c.at, corners[(i + 1) % n]!.at, c.radius));
}

function samePoint(a: Point, b: Point, scale: number): boolean {
  return Math.abs(a[0] - b[0]) <= 1e-12 * scale && Math.abs(a[1] - b[1]) <= 1e-12 * scale;
}

/**
 * The ring of an outline with rounded corners. Call roundingClashes first: overlapping
 * roundings are a parameter problem the caller reports; here they are a broken invariant.
 */
export function roundedRing(corners: readonly Corner[]): Ring {
  invariant(roundingClashes(corners).length === 0, 'roundedRing: roundings overlap (check roundingClashes first)');
  const cuts = cornerCuts(corners);
  const scale = corners.reduce((m, c) => Math.max(m, Math.abs(c.at[0]), Math.abs(c.at[1])), 1e-300);
  const points: Point[] = [];
  const bulges: number[] = [];
  const push = (p: Point, bulge: number): void => {
    const last = points[points.length - 1];
    // A zero-length straight edge between two roundings is dropped: the next arc starts here.
    if (last !== undefined && bulges[bulges.length - 1] === 0 && samePoint(last, p, scale)) {
      bulges[bulges.length - 1] = bulge;
      return;
    }
    points.push(p);
    bulges.push(bulge);
  };
  for (const cut of cuts) {
    if (cut.bulge === 0) {
      push(cut.tangentIn, 0);
    } else {
      push(cut.tangentIn, cut.bulge);
      push(cut.tangentOut, 0);
    }
  }
  // The last straight edge may close onto the first point with zero length.
  if (points.length > 1 && bulges[bulges.length - 1] === 0 && samePoint(points[points.length - 1]!, points[0]!, scale)) {
    points.pop();
    bulges.pop();
  }
  return ringOf(points, bulges);
}

/** A ring from points and per-segment bulges (no bulge array when every segment is straight). */
export function ringOf(points: readonly Point[], bulges: readonly number[]): Ring {
  invariant(points.length === bulges.length, 'ringOf: one bulge per segment');
  const xy = new Float64Array(points.length * 2);
  points.forEach(([x, y], i) => {
    xy[2 * i] = x;
    xy[2 * i + 1] = y;
  });
  if (bulges.every((b) => b === 0)) return { xy };
  return { xy, bulge: Float64Array.from(bulges) };
}

/**
 * A full circle as two semicircular arcs: CCW (outer ring) or CW (hole). `start` 'side' puts the
 * two vertices at (cx ± r, cy), 'top' at (cx, cy ∓ r); a bore starts at 'top' so that its
 * vertices do not lie on the outer circle's chord (a diameter), which point-in-ring tests treat
 * as boundary.
 */
export function circleRing(cx: number, cy: number, radius: number, direction: 'ccw' | 'cw', start: 'side' | 'top' = 'side'): Ring {
  const b = direction === 'ccw' ? 1 : -1;
  const points: Point[] =
    start === 'side'
      ? [
          [cx + radius, cy],
          [cx - radius, cy],
        ]
      : [
          [cx, cy - radius],
          [cx, cy + radius],
        ];
  return ringOf(points, [b, b]);
}

/** The same corners in reverse order (the outline traced the other way round). */
export function reversedCorners(corners: readonly Corner[]): Corner[] {
  return [...corners].reverse();
}
