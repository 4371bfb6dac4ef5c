/**
 * Snapping the finite-element shear centre onto an axis of symmetry.
 *
 * The shear centre of a section with an axis of symmetry lies on that axis (Timoshenko &
 * Goodier, Theory of Elasticity, §109; Pilkey 2002, §6.2). The finite-element value sits a
 * little off it (mesh asymmetry and solver round-off: 1e-4 mm on a symmetric plate). When the
 * exact geometry is symmetric about a vertical or horizontal axis, and the finite-element
 * distance from that axis is within the solver's own error estimate of the shear centre, the
 * coordinate is set on the axis. A section that is not symmetric, or a distance larger than
 * the estimate, keeps the computed value.
 *
 * Symmetric here: every material group (the pieces of one shear modulus; one group for a
 * single material) is carried onto itself by the mirror, checked on the exact geometry: the
 * area of the symmetric difference of the group and its mirror image (core/geometry's Boolean
 * adapter, arcs flattened within its default sagitta) is below 1e-9 of the group's area. The
 * axis is the middle of the bounding box, where any mirror axis of the section must lie.
 * Error estimate of a shear-centre coordinate: the larger of |coarse − fine| (the two nested
 * mesh levels of core/torsion) and jRelativeError × the section size (the solver's relative
 * error estimate taken as a relative error of positions). Lengths in the region's unit.
 * Sections of more than MAX_CHECKED_VERTICES outline points are not checked (no snap): the
 * Boolean test would cost more than the solve saves in honesty.
 */
import { differenceRegions, unionRegions } from '../geometry/boolean.ts';
import { regionBounds } from '../geometry/bounds.ts';
import { transformRegion } from '../geometry/transform.ts';
import type { Region } from '../geometry/types.ts';
import { regionIntegrals } from '../properties/integrals.ts';

export const MAX_CHECKED_VERTICES = 200_000;

const vertexCount = (r: Region): number => r.reduce((n, p) => n + p.outer.xy.length / 2 + p.holes.reduce((m, h) => m + h.xy.length / 2, 0), 0);
const area = (r: Region): number => (r.length === 0 ? 0 : Math.abs(regionIntegrals(r).A));

/** Is every group carried onto itself by the mirror x → 2a − x (axis 'vertical') or y → 2a − y ('horizontal')? */
export function mirrorsOntoItself(groups: readonly Region[], axis: 'vertical' | 'horizontal', a: number): boolean {
  return groups.every((g) => {
    const m = axis === 'vertical' ? transformRegion(g, { x: 2 * a, y: 0, rotationDeg: 0, mirror: true }) : transformRegion(g, { x: 0, y: 2 * a, rotationDeg: 180, mirror: true });
    const own = area(g);
    try {
      return area(differenceRegions(g, m)) + area(differenceRegions(m, g)) <= 1e-9 * own;
    } catch {
      return false;
    }
  });
}

export interface ShearCentreEstimate {
  /** The fine level's shear centre, and the coarse level's. */
  readonly xs: number;
  readonly ys: number;
  readonly xsCoarse: number;
  readonly ysCoarse: number;
  /** The solver's relative error estimate (jRelativeError). */
  readonly relativeError: number;
}

/** The pieces of each shear modulus united, one region per material (pieces do not overlap). */
export function materialGroups(pieces: readonly { readonly region: Region; readonly G: number }[]): Region[] {
  const byG = new Map<number, Region>();
  for (const p of pieces) {
    const g = byG.get(p.G);
    byG.set(p.G, g === undefined ? p.region : [...g, ...p.region]);
  }
  return [...byG.values()].map((r) => {
    try {
      return r.length > 1 ? unionRegions(r.slice(0, 1), r.slice(1)) : r;
    } catch {
      return r;
    }
  });
}

/** xs, ys with each coordinate put on an axis of symmetry of the groups when within its error estimate. */
export function snapShearCentre(groups: readonly Region[], s: ShearCentreEstimate): { xs: number; ys: number } {
  const all = groups.flat();
  const b = regionBounds(all);
  if (b === null || vertexCount(all) > MAX_CHECKED_VERTICES) return { xs: s.xs, ys: s.ys };
  const size = Math.max(b.maxX - b.minX, b.maxY - b.minY);
  const ax = (b.minX + b.maxX) / 2;
  const ay = (b.minY + b.maxY) / 2;
  const near = (v: number, coarse: number, axis: number): boolean => Math.abs(v - axis) <= Math.max(Math.abs(coarse - v), s.relativeError * size);
  const xs = near(s.xs, s.xsCoarse, ax) && mirrorsOntoItself(groups, 'vertical', ax) ? ax : s.xs;
  const ys = near(s.ys, s.ysCoarse, ay) && mirrorsOntoItself(groups, 'horizontal', ay) ? ay : s.ys;
  return { xs, ys };
}
