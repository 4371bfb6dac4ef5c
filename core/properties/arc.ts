/**
 * Circular-arc helpers private to core/properties (docs/methods.md §2.4, §2.5).
 *
 * An arc segment is stored as its chord (start Ps, end Pe) and a bulge b = tan(sweep/4)
 * (b > 0 counter-clockwise about the centre, b < 0 clockwise; core/geometry/types.ts).
 * Points on the arc are evaluated RELATIVE TO THE START POINT in half-angle form,
 *   P(τ) = Ps + 2 r sin(τ/2) · (−sin(t0 + τ/2), cos(t0 + τ/2)),
 * so that a far centre (nearly straight arc, r ≫ chord) never enters a subtraction.
 * Units: any length unit; angles in radians inside this module.
 * Does not guarantee anything for a chord of zero length with b ≠ 0 (validated upstream).
 */

export interface ArcGeometry {
  /** Centre relative to the start point (cx − xs, cy − ys). */
  readonly centreDx: number;
  readonly centreDy: number;
  readonly radius: number;
  /** Parameter angle of the start point about the centre. */
  readonly t0: number;
  /** Signed sweep, 4·atan(b). */
  readonly sweep: number;
}

const TWO_PI = 2 * Math.PI;

/**
 * Bulges smaller than this are straight edges: the sagitta c·|b|/2 is then below half an ulp of
 * the chord, i.e. below the precision of the input itself, and the radius c(1 + b²)/(4|b|) would
 * overflow for denormal bulges.
 */
export const STRAIGHT_BULGE = 1e-16;

export const isStraight = (b: number): boolean => Math.abs(b) < STRAIGHT_BULGE;

/** Centre, radius and angles of the arc from (xs, ys) to (xe, ye) with bulge b ≠ 0 (docs/methods.md §2.4). */
export function arcFromBulge(xs: number, ys: number, xe: number, ye: number, b: number): ArcGeometry {
  const dx = xe - xs;
  const dy = ye - ys;
  const k = (1 - b * b) / (4 * b);
  // Pc − Ps = d/2 + k·n_L with n_L = (−dy, dx); formed directly so no large centre is subtracted.
  const centreDx = dx / 2 - k * dy;
  const centreDy = dy / 2 + k * dx;
  const radius = (Math.hypot(dx, dy) * (1 + b * b)) / (4 * Math.abs(b));
  const t0 = Math.atan2(-centreDy, -centreDx);
  return { centreDx, centreDy, radius, t0, sweep: 4 * Math.atan(b) };
}

/** Offset of the arc point at parameter offset τ from the start point (half-angle form). */
export function arcPointOffset(arc: ArcGeometry, tau: number): [number, number] {
  const chord = 2 * arc.radius * Math.sin(tau / 2);
  const mid = arc.t0 + tau / 2;
  return [-chord * Math.sin(mid), chord * Math.cos(mid)];
}

/**
 * Offset τ (same sign as the sweep, |τ| ≤ |sweep|) at which the arc passes the parameter angle
 * phi, or NaN when phi is outside the swept interval.
 */
export function sweepOffsetOfAngle(arc: ArcGeometry, phi: number): number {
  const forward = arc.sweep >= 0;
  let tau = (forward ? phi - arc.t0 : arc.t0 - phi) % TWO_PI;
  if (tau < 0) tau += TWO_PI;
  return tau <= Math.abs(arc.sweep) ? (forward ? tau : -tau) : Number.NaN;
}

/**
 * Extreme projections onto the unit direction (ux, uy) of ring vertices and arc extreme points,
 * for one ring stored flat, with coordinates taken relative to (ox, oy). Updates out[0] (min) and
 * out[1] (max) in place.
 */
export function ringProjectionRange(
  xy: Float64Array,
  bulge: Float64Array | undefined,
  ox: number,
  oy: number,
  ux: number,
  uy: number,
  out: [number, number],
): void {
  const n = xy.length >> 1;
  if (bulge === undefined) {
    // Straight edges: the vertices alone, with the running extremes kept in locals.
    let lo = out[0], hi = out[1];
    for (let i = 0; i < n; i++) {
      const s = ux * (xy[2 * i]! - ox) + uy * (xy[2 * i + 1]! - oy);
      if (s < lo) lo = s;
      if (s > hi) hi = s;
    }
    out[0] = lo;
    out[1] = hi;
    return;
  }
  const phiMax = Math.atan2(uy, ux);
  const phiMin = phiMax + Math.PI;
  for (let i = 0; i < n; i++) {
    const xs = xy[2 * i]! - ox;
    const ys = xy[2 * i + 1]! - oy;
    const s = ux * xs + uy * ys;
    if (s < out[0]) out[0] = s;
    if (s > out[1]) out[1] = s;
    const b = bulge === undefined ? 0 : bulge[i]!;
    if (isStraight(b)) continue;
    const j = (i + 1) % n;
    const arc = arcFromBulge(xs, ys, xy[2 * j]! - ox, xy[2 * j + 1]! - oy, b);
    // Projection of the centre plus ±r for ordinary arcs; half-angle form for nearly straight ones.
    const centre = ux * (xs + arc.centreDx) + uy * (ys + arc.centreDy);
    const nearlyStraight = Math.abs(arc.sweep) < 0.01;
    for (const [phi, sign] of [[phiMax, 1], [phiMin, -1]] as const) {
      const tau = sweepOffsetOfAngle(arc, phi);
      if (Number.isNaN(tau)) continue;
      const [px, py] = nearlyStraight ? arcPointOffset(arc, tau) : [0, 0];
      const sp = nearlyStraight ? ux * (xs + px) + uy * (ys + py) : centre + sign * arc.radius;
      if (sp < out[0]) out[0] = sp;
      if (sp > out[1]) out[1] = sp;
    }
  }
}
