/**
 * Exact segment–segment contact and point-in-ring classification.
 *
 * Orientation signs come from Shewchuk's adaptive orient2d (robust-predicates), so "do these
 * straight segments meet" is answered exactly for the given doubles. Point-in-ring with arcs uses
 * the winding number of the chord polygon plus ±1 for each circular segment (the region between
 * an arc and its chord) that contains the point; the point-vs-circle test is floating point, and
 * a point within 1e-12·r of an arc counts as ON the boundary.
 * Winding: any. Units: any consistent length. Source: Shewchuk (1997) for orient2d; D. Sunday's
 * winding-number test (common practice); the decomposition ring = chord polygon ⊕ circular
 * segments follows docs/methods.md §2.2.
 */
import { orient2d } from 'robust-predicates';
import { arcFromBulge, ringVertexCount } from './ring.ts';
import type { Ring } from './types.ts';

/**
 * > 0 when c lies to the LEFT of the directed line a→b (counter-clockwise turn, y up), < 0 to the
 * right, exactly 0 when collinear. robust-predicates' orient2d has the opposite sign in y-up axes
 * (checked: orient2d(0,0, 1,0, 0,1) = −1).
 */
export function leftTurn(ax: number, ay: number, bx: number, by: number, cx: number, cy: number): number {
  return -orient2d(ax, ay, bx, by, cx, cy);
}

export const CONTACT_NONE = 0;
/** The interiors cross at one point. */
export const CONTACT_CROSS = 1;
/** They meet at a single point that is an end point of at least one of them. */
export const CONTACT_TOUCH = 2;
/** Collinear, sharing a piece of positive length. */
export const CONTACT_OVERLAP = 3;
export type Contact = 0 | 1 | 2 | 3;

function within(a: number, b: number, v: number): boolean {
  return a <= b ? a <= v && v <= b : b <= v && v <= a;
}

/** How closed segments p0p1 and q0q1 meet (exact). Neither may have zero length. */
export function segmentContact(p0x: number, p0y: number, p1x: number, p1y: number, q0x: number, q0y: number, q1x: number, q1y: number): Contact {
  const o1 = orient2d(p0x, p0y, p1x, p1y, q0x, q0y);
  const o2 = orient2d(p0x, p0y, p1x, p1y, q1x, q1y);
  if ((o1 > 0 && o2 > 0) || (o1 < 0 && o2 < 0)) return CONTACT_NONE;
  const o3 = orient2d(q0x, q0y, q1x, q1y, p0x, p0y);
  const o4 = orient2d(q0x, q0y, q1x, q1y, p1x, p1y);
  if ((o3 > 0 && o4 > 0) || (o3 < 0 && o4 < 0)) return CONTACT_NONE;
  if (o1 !== 0 && o2 !== 0 && o3 !== 0 && o4 !== 0) return CONTACT_CROSS;
  if (o1 === 0 && o2 === 0) return collinearContact(p0x, p0y, p1x, p1y, q0x, q0y, q1x, q1y);
  // One end point lies on the other segment's line; it touches only if it lies within it.
  const touches =
    (o1 === 0 && within(p0x, p1x, q0x) && within(p0y, p1y, q0y)) ||
    (o2 === 0 && within(p0x, p1x, q1x) && within(p0y, p1y, q1y)) ||
    (o3 === 0 && within(q0x, q1x, p0x) && within(q0y, q1y, p0y)) ||
    (o4 === 0 && within(q0x, q1x, p1x) && within(q0y, q1y, p1y));
  return touches ? CONTACT_TOUCH : CONTACT_NONE;
}

function collinearContact(p0x: number, p0y: number, p1x: number, p1y: number, q0x: number, q0y: number, q1x: number, q1y: number): Contact {
  // Project on the axis along which p varies most; exact comparisons of the coordinates.
  const useX = Math.abs(p1x - p0x) >= Math.abs(p1y - p0y);
  const pa = useX ? Math.min(p0x, p1x) : Math.min(p0y, p1y);
  const pb = useX ? Math.max(p0x, p1x) : Math.max(p0y, p1y);
  const qa = useX ? Math.min(q0x, q1x) : Math.min(q0y, q1y);
  const qb = useX ? Math.max(q0x, q1x) : Math.max(q0y, q1y);
  const lo = Math.max(pa, qa);
  const hi = Math.min(pb, qb);
  if (lo > hi) return CONTACT_NONE;
  return lo === hi ? CONTACT_TOUCH : CONTACT_OVERLAP;
}

/** A point where two meeting segments meet (the crossing point, or a shared/touching end point). */
export function contactPoint(p0x: number, p0y: number, p1x: number, p1y: number, q0x: number, q0y: number, q1x: number, q1y: number): [number, number] {
  const rx = p1x - p0x, ry = p1y - p0y, sx = q1x - q0x, sy = q1y - q0y;
  const den = rx * sy - ry * sx;
  if (den !== 0) {
    const t = Math.min(1, Math.max(0, ((q0x - p0x) * sy - (q0y - p0y) * sx) / den));
    return [p0x + t * rx, p0y + t * ry];
  }
  // Collinear: an end point of q lying on p, else an end point of p.
  if (within(p0x, p1x, q0x) && within(p0y, p1y, q0y)) return [q0x, q0y];
  if (within(p0x, p1x, q1x) && within(p0y, p1y, q1y)) return [q1x, q1y];
  return [p0x, p0y];
}

/** +1 inside, −1 outside, 0 on the boundary (or too close to an arc to say). */
export function pointInRing(ring: Ring, px: number, py: number): 1 | 0 | -1 {
  const { xy, bulge } = ring;
  const n = ringVertexCount(ring);
  let wn = 0;
  for (let i = 0; i < n; i++) {
    const j = i + 1 === n ? 0 : i + 1;
    const ax = xy[2 * i] ?? 0, ay = xy[2 * i + 1] ?? 0, bx = xy[2 * j] ?? 0, by = xy[2 * j + 1] ?? 0;
    const o = leftTurn(ax, ay, bx, by, px, py);
    const b = bulge?.[i] ?? 0;
    if (o === 0 && within(ax, bx, px) && within(ay, by, py)) {
      if (b === 0 || (px === ax && py === ay) || (px === bx && py === by)) return 0;
      // On the chord of an arc, which is not the boundary: the crossing rule is ambiguous there.
      return windingByAngles(ring, px, py);
    }
    if (ay <= py) {
      if (by > py && o > 0) wn++;
    } else if (by <= py && o < 0) wn--;
    if (b === 0) continue;
    const arc = arcFromBulge(ax, ay, bx, by, b);
    const d = Math.hypot(px - arc.cx, py - arc.cy);
    // Arc side of the chord: right of a→b for a counter-clockwise arc (b > 0), left for b < 0.
    const onArcSide = b > 0 ? o < 0 : o > 0;
    if (!onArcSide) continue;
    if (Math.abs(d - arc.r) <= 1e-12 * arc.r) return 0;
    if (d < arc.r) wn += b > 0 ? 1 : -1;
  }
  return wn !== 0 ? 1 : -1;
}

/**
 * Winding number by summing the angle each segment subtends at p (exact up to rounding, then
 * rounded to an integer). Used only where p lies on the chord of an arc, where the crossing rule
 * is ambiguous. A line subtends atan2(cross, dot); an arc subtends its chord's angle, plus its
 * sweep's sign × 2π when p lies between the chord and the arc, or ±π when p is on the chord itself.
 */
function windingByAngles(ring: Ring, px: number, py: number): 1 | 0 | -1 {
  const { xy, bulge } = ring;
  const n = ringVertexCount(ring);
  let total = 0;
  for (let i = 0; i < n; i++) {
    const j = i + 1 === n ? 0 : i + 1;
    const ax = xy[2 * i] ?? 0, ay = xy[2 * i + 1] ?? 0, bx = xy[2 * j] ?? 0, by = xy[2 * j + 1] ?? 0;
    const ux = ax - px, uy = ay - py, vx = bx - px, vy = by - py;
    const o = leftTurn(ax, ay, bx, by, px, py);
    const b = bulge?.[i] ?? 0;
    const onChord = o === 0 && within(ax, bx, px) && within(ay, by, py);
    if (b === 0) {
      if (onChord) return 0;
      total += Math.atan2(ux * vy - uy * vx, ux * vx + uy * vy);
      continue;
    }
    const arc = arcFromBulge(ax, ay, bx, by, b);
    const d = Math.hypot(px - arc.cx, py - arc.cy);
    const onArcSide = b > 0 ? o < 0 : o > 0;
    if (onArcSide && Math.abs(d - arc.r) <= 1e-12 * arc.r) return 0;
    if (onChord) {
      total += b > 0 ? Math.PI : -Math.PI;
      continue;
    }
    total += Math.atan2(ux * vy - uy * vx, ux * vx + uy * vy);
    if (onArcSide && d < arc.r) total += b > 0 ? 2 * Math.PI : -2 * Math.PI;
  }
  return Math.round(total / (2 * Math.PI)) !== 0 ? 1 : -1;
}
