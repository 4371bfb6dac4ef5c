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
 * adapter, arcs flattened within 1e-4 of the size: a mirrored arc flattens into the mirrored
 * chords, so the chords cancel) is below 1e-9 of the group's area. The
 * axis is the middle of the bounding box, where any mirror axis of the section must lie.
 * Error estimate of a shear-centre coordinate: the larger of |coarse − fine| (the two nested
 * mesh levels of core/torsion) and jRelativeError × the section size (the solver's relative
 * error estimate taken as a relative error of positions). Lengths in the region's unit.
 * Sections of more than MAX_CHECKED_VERTICES outline points (dense imported curves) are not
 * checked (no snap: the check would cost a share of the solve), and the
 * Boolean test runs only up to MAX_BOOLEAN_VERTICES (it takes seconds on 1e5 points).
 */
import { differenceRegions, unionRegions } from '../geometry/boolean.ts';
import { regionBounds } from '../geometry/bounds.ts';
import { transformRegion } from '../geometry/transform.ts';
import type { Region } from '../geometry/types.ts';
import { regionIntegrals } from '../properties/integrals.ts';

export const MAX_CHECKED_VERTICES = 20_000;
/** The Boolean test (when the fast one says no) only up to this many outline points: it costs seconds on 1e5. */
export const MAX_BOOLEAN_VERTICES = 2_000;

const vertexCount = (r: Region): number => r.reduce((n, p) => n + p.outer.xy.length / 2 + p.holes.reduce((m, h) => m + h.xy.length / 2, 0), 0);
const area = (r: Region): number => (r.length === 0 ? 0 : Math.abs(regionIntegrals(r).A));

/** Is every group carried onto itself by the mirror x → 2a − x (axis 'vertical') or y → 2a − y ('horizontal')? */
/**
 * The fast test: the boundary segments (start, end, bulge) of a region, each mirrored (mirroring
 * reverses a segment and negates its bulge, so (p, q, b) becomes (m(q), m(p), b)), are the same
 * multiset as the originals, coordinates compared on a grid of 1e-9 of the size. Equal boundaries
 * bound the same region, so a yes is exact; a no may come from grid rounding, and the Boolean test
 * then decides.
 */
function segmentsMirror(g: Region, axis: 'vertical' | 'horizontal', a: number, size: number): boolean {
  const q = (v: number): number => Math.round(v / (1e-9 * size));
  const m = (x: number, y: number): [number, number] => (axis === 'vertical' ? [2 * a - x, y] : [x, 2 * a - y]);
  const own: string[] = [], mirrored: string[] = [];
  for (const p of g) {
    for (const ring of [p.outer, ...p.holes]) {
      const n = ring.xy.length / 2;
      for (let i = 0; i < n; i++) {
        const j = (i + 1) % n;
        const x0 = ring.xy[2 * i]!, y0 = ring.xy[2 * i + 1]!, x1 = ring.xy[2 * j]!, y1 = ring.xy[2 * j + 1]!;
        const b = ring.bulge?.[i] ?? 0;
        own.push(`${q(x0)},${q(y0)},${q(x1)},${q(y1)},${b}`);
        const [mx1, my1] = m(x1, y1), [mx0, my0] = m(x0, y0);
        mirrored.push(`${q(mx1)},${q(my1)},${q(mx0)},${q(my0)},${b}`);
      }
    }
  }
  own.sort();
  mirrored.sort();
  return own.every((k, i) => k === mirrored[i]);
}

export function mirrorsOntoItself(groups: readonly Region[], axis: 'vertical' | 'horizontal', a: number): boolean {
  const b = regionBounds(groups.flat());
  if (b !== null && groups.every((g) => segmentsMirror(g, axis, a, Math.max(b.maxX - b.minX, b.maxY - b.minY)))) return true;
  if (groups.reduce((n, g) => n + vertexCount(g), 0) > MAX_BOOLEAN_VERTICES) return false;
  // Arcs flattened coarsely (1e-4 of the size): a mirrored arc is flattened into the mirrored chords, so the test stays exact for symmetric arcs and costs far less.
  const options = b === null ? {} : { maxSagitta: 1e-4 * Math.max(b.maxX - b.minX, b.maxY - b.minY) };
  return groups.every((g) => {
    const m = axis === 'vertical' ? transformRegion(g, { x: 2 * a, y: 0, rotationDeg: 0, mirror: true }) : transformRegion(g, { x: 0, y: 2 * a, rotationDeg: 180, mirror: true });
    const own = area(g);
    try {
      return area(differenceRegions(g, m, undefined, options)) + area(differenceRegions(m, g, undefined, options)) <= 1e-9 * own;
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
  if (vertexCount(all) > MAX_CHECKED_VERTICES) return { xs: s.xs, ys: s.ys };
  const b = regionBounds(all);
  if (b === null) return { xs: s.xs, ys: s.ys };
  const size = Math.max(b.maxX - b.minX, b.maxY - b.minY);
  const ax = (b.minX + b.maxX) / 2;
  const ay = (b.minY + b.maxY) / 2;
  const near = (v: number, coarse: number, axis: number): boolean => Math.abs(v - axis) <= Math.max(Math.abs(coarse - v), s.relativeError * size);
  const xs = near(s.xs, s.xsCoarse, ax) && mirrorsOntoItself(groups, 'vertical', ax) ? ax : s.xs;
  const ys = near(s.ys, s.ysCoarse, ay) && mirrorsOntoItself(groups, 'horizontal', ay) ? ay : s.ys;
  return { xs, ys };
}
