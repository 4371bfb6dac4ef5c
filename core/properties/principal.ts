/**
 * Principal axes, rotated and transferred second moments (docs/methods.md §1.2, §3).
 *
 * Sign convention: Ixy = +∫ X·Y dA (Gere & Timoshenko, Mechanics of Materials); angles are
 * counter-clockwise from +x, in degrees at this API. Rotating the axes by θ:
 *   I_u  = (Ix+Iy)/2 + (Ix−Iy)/2·cos2θ − Ixy·sin2θ
 *   I_v  = (Ix+Iy)/2 − (Ix−Iy)/2·cos2θ + Ixy·sin2θ
 *   I_uv =             (Ix−Iy)/2·sin2θ + Ixy·cos2θ
 * θ1 = ½·atan2(−2Ixy, Ix − Iy) is the axis of I1 ≥ I2, normalised to (−90°, 90°]. A section with
 * R ≤ 1e−12·(Ix+Iy)/2 is isotropic (circle, square, regular polygon): θ1 = 0 and the flag is set,
 * because its principal direction is rounding noise.
 */
import type { Degrees } from '../geometry/types.ts';

/** Relative Mohr-circle radius below which a section is isotropic (docs/methods.md §3). */
export const ISOTROPY_TOLERANCE = 1e-12;

export interface PrincipalAxes {
  readonly I1: number;
  readonly I2: number;
  /** Axis of I1, CCW from +x, in (−90°, 90°]; 0 when isotropic. */
  readonly thetaDeg: number;
  readonly isotropic: boolean;
}

export interface CentroidalMoments {
  readonly area: number;
  readonly cx: number;
  readonly cy: number;
  readonly Ix: number;
  readonly Iy: number;
  readonly Ixy: number;
}

export interface AxisMoments {
  readonly Ix: number;
  readonly Iy: number;
  readonly Ixy: number;
}

export interface RotatedMoments {
  /** Moment about the rotated x axis (u axis). */
  readonly Iu: number;
  /** Moment about the rotated y axis (v axis). */
  readonly Iv: number;
  /** Product ∫ u·v dA. */
  readonly Iuv: number;
}

/** Principal moments and the angle of the I1 axis from centroidal Ix, Iy, Ixy (docs/methods.md §3). */
export function principalAxes(Ix: number, Iy: number, Ixy: number): PrincipalAxes {
  const mean = (Ix + Iy) / 2;
  const R = Math.hypot((Ix - Iy) / 2, Ixy);
  if (R <= ISOTROPY_TOLERANCE * Math.abs(mean)) {
    return { I1: mean + R, I2: mean - R, thetaDeg: 0, isotropic: true };
  }
  let theta = (0.5 * Math.atan2(-2 * Ixy, Ix - Iy) * 180) / Math.PI;
  // atan2(−0, −1) = −π would give −90°; the contract's interval is (−90°, 90°].
  if (theta <= -90) theta += 180;
  theta += 0; // turns −0 into +0
  return { I1: mean + R, I2: mean - R, thetaDeg: theta, isotropic: false };
}

/**
 * Second moments about axes parallel to x and y through the point (a, b), transferred from the
 * centroid by the parallel-axis theorem (docs/methods.md §1.2; valid only from the centroid).
 */
export function secondMomentsAboutPoint(props: CentroidalMoments, a: number, b: number): AxisMoments {
  const dx = props.cx - a;
  const dy = props.cy - b;
  return {
    Ix: props.Ix + props.area * dy * dy,
    Iy: props.Iy + props.area * dx * dx,
    Ixy: props.Ixy + props.area * dx * dy,
  };
}

/** Second moments about centroidal axes rotated CCW by thetaDeg (tensor law, docs/methods.md §3). */
export function secondMomentsAtAngle(Ix: number, Iy: number, Ixy: number, thetaDeg: Degrees): RotatedMoments {
  const t = (2 * thetaDeg * Math.PI) / 180;
  const c = Math.cos(t);
  const s = Math.sin(t);
  const mean = (Ix + Iy) / 2;
  const half = (Ix - Iy) / 2;
  return {
    Iu: mean + half * c - Ixy * s,
    Iv: mean - half * c + Ixy * s,
    Iuv: half * s + Ixy * c,
  };
}
