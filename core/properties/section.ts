/**
 * Section properties of one region (one material): every field of SectionProperties.
 *
 * Sign conventions (used by every module of core/properties):
 *   - x to the right, y up; angles counter-clockwise from +x, in degrees (docs/methods.md §0);
 *   - Ixy = +∫ X·Y dA about the centroid (Gere & Timoshenko; docs/methods.md §1.5): a right triangle
 *     with its legs along +x and +y has Ixy < 0;
 *   - θ1 is the axis of I1 ≥ I2, in (−90°, 90°]; 0 with isotropic = true when the principal
 *     direction is undefined (docs/methods.md §3);
 *   - S1± = I1 / extreme distance from axis 1 on the side of +v / −v, with v = −X sinθ1 + Y cosθ1;
 *     S2± likewise with u = X cosθ1 + Y sinθ1 (docs/methods.md §4);
 *   - Zx: PNA horizontal at y = pnaY; Zy: PNA vertical at x = pnaX; Z1, Z2: PNA along axis 1
 *     (bending about axis 1) and along axis 2 (docs/methods.md §5).
 *
 * Accuracy: two passes (docs/methods.md §1.3): raw sums about the bounding-box centre give the centroid;
 * the second moments are then summed about the centroid itself, which avoids the A·yc²
 * subtraction. Expect ~1e−13 relative for polygons and exact arcs; ~1e−9 for sections drawn
 * ~1e6 length units from the origin (input representation error).
 * Assumes a normalised, valid region (core/geometry normalise/validate); throws an
 * InvariantError for zero or negative area.
 */
import { invariant } from '../invariant.ts';
import type { Degrees, Region } from '../geometry/types.ts';
import type { RawIntegrals, SectionProperties } from './types.ts';
import { regionIntegrals } from './integrals.ts';
import { principalAxes } from './principal.ts';
import { elasticModuli } from './moduli.ts';
import { plasticAboutX, plasticAboutY, plasticNeutralAxis } from './plastic.ts';

export interface CentroidalIntegrals {
  readonly A: number;
  readonly cx: number;
  readonly cy: number;
  /** Centroidal second moments; Ixy = +∫ X·Y dA. */
  readonly Ix: number;
  readonly Iy: number;
  readonly Ixy: number;
}

/** Centroid and centroidal second moments from raw integrals about any origin (docs/methods.md §1.2). */
export function centroidalFromIntegrals(raw: RawIntegrals): CentroidalIntegrals {
  invariant(raw.A !== 0 && Number.isFinite(raw.A), `centroidalFromIntegrals: area is ${raw.A}`);
  const xl = raw.Qy / raw.A;
  const yl = raw.Qx / raw.A;
  return {
    A: raw.A,
    cx: raw.originX + xl,
    cy: raw.originY + yl,
    Ix: raw.Ixx - raw.A * yl * yl,
    Iy: raw.Iyy - raw.A * xl * xl,
    Ixy: raw.Ixy - raw.A * xl * yl,
  };
}

/**
 * A principal axis this close to x or y (degrees) is x or y with rounding in Ixy: a symmetric
 * section's Ixy comes out as ~1e−16·I, not 0, which tilts θ by ~1e−14°. Z1 and Z2 then reuse Zx
 * and Zy instead of two more plastic searches. Z changes with the axis angle by about Z per
 * radian, so the snap moves Z1, Z2 by at most ~2e−11 relative, well inside the 1e−9 of docs/methods.md §11.
 */
const AXIS_SNAP_DEG = 1e-9;

/** Plastic modulus with the PNA at angleDeg, reusing Zx (PNA along x) or Zy (along y) when the angle is one of those. */
function plasticModulusAt(region: Region, angleDeg: number, Zx: number, Zy: number): number {
  const r = ((angleDeg % 180) + 180) % 180;
  if (Math.min(r, 180 - r) <= AXIS_SNAP_DEG) return Zx;
  if (Math.abs(r - 90) <= AXIS_SNAP_DEG) return Zy;
  return plasticNeutralAxis(region, angleDeg as Degrees).Z;
}

/** Every property of the SectionProperties contract for one normalised region. */
export function sectionProperties(region: Region): SectionProperties {
  const first = centroidalFromIntegrals(regionIntegrals(region));
  invariant(first.A > 0, `sectionProperties: the region's area is ${first.A}; a normalised region has positive area`);
  // Second pass about the centroid itself (docs/methods.md §1.3).
  const c = centroidalFromIntegrals(regionIntegrals(region, first.cx, first.cy));
  const { A, cx, cy, Ix, Iy, Ixy } = c;
  const p = principalAxes(Ix, Iy, Ixy);
  const s = elasticModuli(region, { cx, cy, Ix, Iy, I1: p.I1, I2: p.I2, thetaDeg: p.thetaDeg });
  const px = plasticAboutX(region);
  const py = plasticAboutY(region);
  const z1 = plasticModulusAt(region, p.thetaDeg, px.Zx, py.Zy);
  const z2 = plasticModulusAt(region, p.thetaDeg + 90, px.Zx, py.Zy);
  return {
    area: A,
    cx,
    cy,
    Ix,
    Iy,
    Ixy,
    Ip: Ix + Iy,
    I1: p.I1,
    I2: p.I2,
    thetaDeg: p.thetaDeg,
    isotropic: p.isotropic,
    rx: Math.sqrt(Ix / A),
    ry: Math.sqrt(Iy / A),
    r1: Math.sqrt(p.I1 / A),
    r2: Math.sqrt(Math.max(0, p.I2) / A),
    ...s,
    Zx: px.Zx,
    Zy: py.Zy,
    Z1: z1,
    Z2: z2,
    pnaY: px.pnaY,
    pnaX: py.pnaX,
    shapeFactorX: px.Zx / Math.min(s.SxTop, s.SxBottom),
    shapeFactorY: py.Zy / Math.min(s.SyLeft, s.SyRight),
  };
}
