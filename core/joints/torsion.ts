/**
 * Torsion of a section whose parts do not all act together (core/joints/groups.ts): each group
 * of parts that acts together twists on its own, so J of the member is the sum of the groups'
 * J (Saint-Venant torsion of separate members sharing one twist rate; Timoshenko & Goodier,
 * Theory of Elasticity, torsion chapter), and each group keeps its own shear centre and Cw.
 * There is no shared shear centre, and no Cw of the whole: a warping constant about one point
 * means nothing for members that are not connected. Lengths in the document unit.
 * Several materials: each group is solved G-weighted (core/torsion compositeTorsionAnalysis)
 * with one G_ref for all groups (the first piece's G), so the sum is GJ/G_ref.
 * Uses core/torsion per group; errors from it pass through (MeshInputError etc.).
 */
import type { SectionDocument } from '../document/types.ts';
import { BooleanError, intersectRegions } from '../geometry/index.ts';
import { materialPiecesFromDocument } from '../materials/index.ts';
import { compositeTorsionAnalysis, torsionConstants, type ShearPiece, type TorsionOptions, type TorsionResult } from '../torsion/index.ts';
import { partsActingTogether, type ActingGroup } from './groups.ts';

export interface GroupTorsion {
  readonly labels: readonly string[];
  readonly result: TorsionResult;
}

export interface SeparateTorsion {
  /** Σ J of the groups (GJ/G_ref with several materials). */
  readonly J: number;
  readonly groups: readonly GroupTorsion[];
  /** Largest estimated relative error of J among the groups. */
  readonly jRelativeError: number;
  readonly why: string;
  /** The sum as one TorsionResult: J, elements and nodes added, no Cw or shear centre (NaN), components = groups. */
  readonly combined: TorsionResult;
}

function summed(groups: readonly GroupTorsion[], why: string): SeparateTorsion {
  const J = groups.reduce((s, g) => s + g.result.J, 0);
  const jRelativeError = Math.max(0, ...groups.map((g) => g.result.jRelativeError));
  return {
    J, groups, jRelativeError, why,
    combined: {
      J, Cw: NaN, xs: NaN, ys: NaN, jRelativeError,
      meshElements: groups.reduce((s, g) => s + g.result.meshElements, 0),
      meshNodes: groups.reduce((s, g) => s + g.result.meshNodes, 0),
      iterations: Math.max(0, ...groups.map((g) => g.result.iterations)),
      components: groups.reduce((s, g) => s + g.result.components, 0),
      simplifiedOutline: null,
    },
  };
}

const whyText = (n: number): string => `${n} pieces twist separately (parts apart, or joints marked "not connected"): J is the sum of their J values; each piece has its own shear centre and Cw, and the section has no shared shear centre.`;

export function separateTorsion(groups: readonly ActingGroup[], options: TorsionOptions = {}): SeparateTorsion {
  return summed(groups.map((g) => ({ labels: g.labels, result: torsionConstants(g.region, options) })), whyText(groups.length));
}

/**
 * Torsion of a document by the groups of parts that act together: null when everything acts
 * together (one group: use the section's own torsion), else the sum over the groups. With parts
 * of several materials, each group is G-weighted with the first piece's G as G_ref.
 * Throws what core/torsion throws; a material problem throws RangeError naming it.
 */
export function torsionByJointGroups(doc: SectionDocument, options: TorsionOptions = {}): SeparateTorsion | null {
  const acting = partsActingTogether(doc);
  if (acting.groups.length <= 1) return null;
  const used = new Set(doc.parts.filter((p) => p.visible && p.operation === 'add').map((p) => p.material ?? doc.defaultMaterial));
  if (used.size <= 1) return separateTorsion(acting.groups, options);
  const found = materialPiecesFromDocument(doc);
  const problems = [...found.issues, ...found.diagnostics.map((d) => d.message)];
  if (problems.length > 0) throw new RangeError(problems.join('; '));
  const gRef = found.pieces[0]?.material.G ?? 1;
  const groups = acting.groups.map((g) => {
    const pieces: ShearPiece[] = [];
    for (const p of found.pieces) {
      let region = p.region;
      try {
        region = intersectRegions(p.region, g.region, { context: 'splitting the material pieces by the parts that act together', parts: [p.label ?? 'a material piece', g.labels.join(' + ')] });
      } catch (err) {
        if (!(err instanceof BooleanError)) throw err;
        region = [];
      }
      if (region.length > 0) pieces.push({ region, G: p.material.G });
    }
    return { labels: g.labels, result: compositeTorsionAnalysis(pieces, { ...options, referenceShearModulus: gRef }).result };
  });
  return summed(groups, whyText(groups.length));
}
