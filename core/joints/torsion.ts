/**
 * Torsion of a section whose parts do not all act together (core/joints/groups.ts): each group
 * of parts that acts together twists on its own, so J of the member is the sum of the groups'
 * J (Saint-Venant torsion of separate members sharing one twist rate; Timoshenko & Goodier,
 * Theory of Elasticity, torsion chapter), and each group keeps its own shear centre and Cw.
 * There is no shared shear centre, and no Cw of the whole: a warping constant about one point
 * means nothing for members that are not connected. Lengths in the document unit.
 * Uses core/torsion per group; errors from it pass through (MeshInputError etc.).
 */
import { torsionConstants, type TorsionOptions, type TorsionResult } from '../torsion/index.ts';
import type { ActingGroup } from './groups.ts';

export interface GroupTorsion {
  readonly labels: readonly string[];
  readonly result: TorsionResult;
}

export interface SeparateTorsion {
  /** Σ J of the groups. */
  readonly J: number;
  readonly groups: readonly GroupTorsion[];
  /** Largest estimated relative error of J among the groups. */
  readonly jRelativeError: number;
  readonly why: string;
}

export function separateTorsion(groups: readonly ActingGroup[], options: TorsionOptions = {}): SeparateTorsion {
  const each = groups.map((g) => ({ labels: g.labels, result: torsionConstants(g.region, options) }));
  return {
    J: each.reduce((s, g) => s + g.result.J, 0),
    groups: each,
    jRelativeError: Math.max(0, ...each.map((g) => g.result.jRelativeError)),
    why: `${groups.length} pieces twist separately (parts apart, or joints marked "not connected"): J is the sum of their J values; each piece has its own shear centre and Cw, and the section has no shared shear centre.`,
  };
}
