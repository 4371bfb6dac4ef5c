/**
 * How a member of separate plies shares its load: pieces that do not act together (parts apart,
 * or joined only by joints marked "not connected"; core/joints/groups.ts) bend each about its own
 * centroid with the member's one curvature, so each carries a share of the bending moment and
 * shear equal to its own EI over the sum (common practice for multi-ply and flitch beams; beams
 * side by side with equal deflection, Gere & Timoshenko, Mechanics of Materials, composite beams):
 *
 *   share_g = E_g·I_g / Σ E_h·I_h,   EI_g = Σ over the group's parts of E_k·∫(y − ȳ_g)² dA
 *
 * with ȳ_g the group's own E-weighted centroid (x bending, vertical loads), and the same with
 * x for y bending. A group of parts that act together (welded, fastened, glued) is one ply.
 * E is each part's material in pascals (materialInSI); where no part has a material, every part
 * is one material and the shares are those of I alone (said in `note`). Units: EI in N·unit²
 * (E in Pa times the document unit⁴ over the document unit², i.e. Pa·unit⁴), I in unit⁴.
 * Bending properties elsewhere assume all parts act together (SEPARATE_PIECES_NOTE).
 */
import type { SectionDocument } from '../document/types.ts';
import { partsActingTogether } from './groups.ts';
import { partMaterials } from './shear-flow.ts';

export interface PlyShare {
  /** Labels of the parts of this ply (a group acting together). */
  readonly labels: readonly string[];
  /** Indices into the composition's parts. */
  readonly parts: readonly number[];
  /** Own second moments about the ply's own (E-weighted) centroid, unit⁴, and E·I in Pa·unit⁴ (null without materials). */
  readonly Ix: number;
  readonly Iy: number;
  readonly EIx: number | null;
  readonly EIy: number | null;
  /** Share of a moment about x (vertical load) and about y (horizontal load), 0…1. */
  readonly shareX: number;
  readonly shareY: number;
}

export interface PlyShares {
  readonly plies: readonly PlyShare[];
  /** True when some plies are separate (more than one group). */
  readonly separate: boolean;
  readonly note: string;
}

export const PLY_SHARE_NOTE = 'A member of separate plies shares its load in proportion to each ply\'s EI (the plies bend together with one curvature, each about its own centroid).';

/** The EI share of each ply (group acting together); null when the section cannot be composed. */
export function plyShares(doc: SectionDocument): PlyShares | null {
  const acting = partsActingTogether(doc);
  if (acting.composition.diagnostics.length > 0) return null;
  const { list } = partMaterials(doc, acting.composition.parts);
  if (list.length === 0) return null;
  const byIndex = new Map(list.map((p) => [p.index, p]));
  const withMaterials = list.some((p) => p.E !== null);
  const eRef = list.find((p) => p.E !== null)?.E ?? 1;
  const plies = acting.groups.map((g) => {
    let A = 0, Qx = 0, Qy = 0, Ixx = 0, Iyy = 0;
    for (const k of g.parts) {
      const p = byIndex.get(k);
      if (!p) continue;
      A += p.n * p.raw.A;
      Qx += p.n * p.raw.Qx;
      Qy += p.n * p.raw.Qy;
      Ixx += p.n * p.raw.Ixx;
      Iyy += p.n * p.raw.Iyy;
    }
    // Transformed (E_ref units) about the ply's own centroid.
    const nIx = A > 0 ? Ixx - (Qx * Qx) / A : 0;
    const nIy = A > 0 ? Iyy - (Qy * Qy) / A : 0;
    return { labels: g.labels, parts: g.parts, nIx, nIy };
  });
  const sx = plies.reduce((s, p) => s + p.nIx, 0), sy = plies.reduce((s, p) => s + p.nIy, 0);
  return {
    plies: plies.map((p) => ({
      labels: p.labels, parts: p.parts, Ix: p.nIx, Iy: p.nIy,
      EIx: withMaterials ? eRef * p.nIx : null, EIy: withMaterials ? eRef * p.nIy : null,
      shareX: sx > 0 ? p.nIx / sx : 0, shareY: sy > 0 ? p.nIy / sy : 0,
    })),
    separate: plies.length > 1,
    note: `${PLY_SHARE_NOTE}${withMaterials ? '' : ' No part has a material: the shares are by I alone (one material taken throughout).'} Ix, Iy of a ply of several materials are transformed to the first material's E.`,
  };
}
