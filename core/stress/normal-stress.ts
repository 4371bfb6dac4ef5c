/**
 * Normal stress under N, Mx, My by the unsymmetric bending formula, for one or several materials.
 *
 * Sign convention (docs/methods.md §9.1): N = ∫σ dA (tension +), Mx = ∫σ·Y dA (tension at +Y when
 * Mx > 0), My = ∫σ·X dA (tension at +X when My > 0), about the (E-weighted) centroid.
 * Right-hand moment vector components convert with Mx = Mx_vec, My = −My_vec.
 *
 * Strain plane (docs/methods.md §6): ε(X, Y) = N/EA + [(My·EIx − Mx·EIxy)X + (Mx·EIy − My·EIxy)Y] / D,
 * D = EIx·EIy − EIxy², and σ_i = E_i·ε in material i. For one material give a stiffness built
 * with E = 1 (EA = A, EI = I): the "strain" is then the stress itself, formula (9.1).
 *
 * Units: whatever the stiffness and forces use (e.g. N and mm, or N and m); stresses come out
 * in force/length² of the same system. Does not: include shear stress beyond the average V/A,
 * or any non-linear material behaviour. Tolerance: none (closed form).
 * Source: Gere & Timoshenko, Mechanics of Materials (unsymmetric bending); Boresi & Schmidt,
 * Advanced Mechanics of Materials (generalised flexure formula); docs/methods.md §6, §9.1.
 */
import { extremeAlong } from '../geometry/bounds.ts';
import type { Point, Region } from '../geometry/types.ts';
import { invariant } from '../invariant.ts';

/** Axial and bending stiffness about the E-weighted centroid (cx, cy). One material: E = 1. */
export interface SectionStiffness {
  readonly EA: number;
  readonly cx: number;
  readonly cy: number;
  readonly EIx: number;
  readonly EIy: number;
  readonly EIxy: number;
}

export interface SectionForces {
  readonly N: number;
  readonly Mx: number;
  readonly My: number;
  readonly Vx?: number;
  readonly Vy?: number;
}

/** ε(x, y) = e0 + kx·(x − cx) + ky·(y − cy); (kx, ky) is the strain gradient. */
export interface StrainPlane {
  readonly cx: number;
  readonly cy: number;
  readonly e0: number;
  readonly kx: number;
  readonly ky: number;
}

/** The linear strain field of the section under the given forces (docs/methods.md §6). */
export function strainPlane(s: SectionStiffness, f: SectionForces): StrainPlane {
  const D = s.EIx * s.EIy - s.EIxy * s.EIxy;
  invariant(s.EA > 0, 'strainPlane: EA must be positive');
  invariant(D > 0, 'strainPlane: the bending stiffness tensor must be positive definite');
  return {
    cx: s.cx,
    cy: s.cy,
    e0: f.N / s.EA,
    kx: (f.My * s.EIx - f.Mx * s.EIxy) / D,
    ky: (f.Mx * s.EIy - f.My * s.EIxy) / D,
  };
}

export function strainAt(p: StrainPlane, x: number, y: number): number {
  return p.e0 + p.kx * (x - p.cx) + p.ky * (y - p.cy);
}

/** Stress at (x, y) in a material of modulus E (E = 1 for a single-material stiffness). */
export function stressAt(p: StrainPlane, E: number, x: number, y: number): number {
  return E * strainAt(p, x, y);
}

export interface StressExtremes {
  readonly max: number;
  readonly maxAt: Point;
  readonly min: number;
  readonly minAt: Point;
}

/**
 * Largest and smallest stress over a region of one material, with where they occur: a linear
 * field peaks on the outer boundary, at a vertex or at an arc's extreme point along the
 * gradient (docs/methods.md §9.1). With a zero gradient (pure axial) the first vertex is reported.
 */
export function stressExtremes(p: StrainPlane, E: number, region: Region): StressExtremes {
  const len = Math.hypot(p.kx, p.ky);
  const dir: Point = len > 0 ? [p.kx / len, p.ky / len] : [1, 0];
  const e = extremeAlong(region, dir[0], dir[1]);
  invariant(e !== null, 'stressExtremes: empty region');
  const atMax = stressAt(p, E, e.maxAt[0], e.maxAt[1]);
  const atMin = stressAt(p, E, e.minAt[0], e.minAt[1]);
  // A negative modulus never occurs (schema), so the gradient's maximum is the stress maximum.
  return atMax >= atMin
    ? { max: atMax, maxAt: e.maxAt, min: atMin, minAt: e.minAt }
    : { max: atMin, maxAt: e.minAt, min: atMax, minAt: e.maxAt };
}

/** Neutral axis ε = 0: a point on it (the one nearest the centroid) and its direction. */
export interface NeutralAxis {
  readonly exists: boolean;
  readonly point: Point;
  /** Direction of the line, degrees CCW from +x, in (−90°, 90°]. */
  readonly angleDeg: number;
  /** The line clipped to the given bounds (for drawing), or null when it misses them. */
  readonly segment: readonly [Point, Point] | null;
}

export interface BoxBounds {
  readonly minX: number;
  readonly minY: number;
  readonly maxX: number;
  readonly maxY: number;
}

/** Where the strain plane is zero (docs/methods.md §9.1: α X + β Y = −N/A, direction atan2(−α, β)). */
export function neutralAxis(p: StrainPlane, bounds?: BoxBounds): NeutralAxis {
  const g2 = p.kx * p.kx + p.ky * p.ky;
  if (g2 === 0) return { exists: false, point: [p.cx, p.cy], angleDeg: 0, segment: null };
  const point: Point = [p.cx - (p.e0 * p.kx) / g2, p.cy - (p.e0 * p.ky) / g2];
  let angle = (Math.atan2(-p.kx, p.ky) * 180) / Math.PI;
  if (angle > 90) angle -= 180;
  if (angle <= -90) angle += 180;
  const segment = bounds === undefined ? null : clipLineToBox(point, [p.ky, -p.kx], bounds);
  return { exists: true, point, angleDeg: angle, segment };
}

/** Liang–Barsky clipping of the infinite line point + t·dir to a box. */
function clipLineToBox(point: Point, dir: Point, b: BoxBounds): readonly [Point, Point] | null {
  let t0 = -Infinity, t1 = Infinity;
  const axes: [number, number, number, number][] = [
    [point[0], dir[0], b.minX, b.maxX],
    [point[1], dir[1], b.minY, b.maxY],
  ];
  for (const [p0, d, lo, hi] of axes) {
    if (d === 0) {
      if (p0 < lo || p0 > hi) return null;
      continue;
    }
    const ta = (lo - p0) / d, tb = (hi - p0) / d;
    t0 = Math.max(t0, Math.min(ta, tb));
    t1 = Math.min(t1, Math.max(ta, tb));
  }
  if (t0 > t1) return null;
  return [
    [point[0] + t0 * dir[0], point[1] + t0 * dir[1]],
    [point[0] + t1 * dir[0], point[1] + t1 * dir[1]],
  ];
}

/** Average shear stresses V/A in the two directions (a nominal value, not the peak). */
export function averageShear(f: SectionForces, area: number): { tauX: number; tauY: number } {
  invariant(area > 0, 'averageShear: area must be positive');
  return { tauX: (f.Vx ?? 0) / area, tauY: (f.Vy ?? 0) / area };
}
