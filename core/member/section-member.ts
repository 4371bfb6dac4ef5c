/**
 * The member check of a section of material pieces: the glue the editor and the command line
 * share, so both give the same numbers.
 *
 * Input: pieces in the document's length unit (materials in SI); span and load positions in
 * the document unit; forces in N and line loads in N/m. Everything is converted to SI once
 * (lengths only through core/units), checked by core/member/check.ts, and returned in SI:
 * deflections and positions in m, moments in N·m, stresses in Pa, EI in N·m².
 * Self-weight, when asked for, is g·Σρ_i A_i from the material densities (docs/methods.md §6).
 */
import { compositeProperties, type CompositeProperties, type MaterialPiece } from '../materials/composite.ts';
import type { StrengthBasis } from '../materials/schema.ts';
import { convertLength, type LengthUnit } from '../units/index.ts';
import type { Support } from './beam.ts';
import { memberCheck, memberInputIssues, type MemberInput, type MemberResult, type ShearCut } from './check.ts';
import { neutralAxisShear } from './shear.ts';
import type { StressLimits } from './verdict.ts';

const STRENGTH_LABEL: Readonly<Record<StrengthBasis, string>> = {
  yield: 'yield strength fy',
  'reference-bending': 'reference Fb before the NDS adjustment factors (not an allowable stress)',
  tensile: 'tensile strength',
};

/** Q_E and Σ E·t at the E-weighted neutral axis, converted to SI (Pa·m³, Pa·m). */
function shearCutSI(pieces: readonly MaterialPiece[], unit: LengthUnit, cy: number): ShearCut {
  const cut = neutralAxisShear(pieces, cy);
  return { QE: cut.QE * convertLength(1, unit, 'm', 3), Et: cut.Et * convertLength(1, unit, 'm'), cut: cut.cut.map((c) => ({ materialId: c.materialId, E: c.E })) };
}

export interface SectionMemberInput {
  /** Span in the document unit. */
  readonly span: number;
  readonly support: Support;
  /** Point loads: P in N (downward +), a in the document unit from the left (fixed) end. */
  readonly points: readonly { readonly P: number; readonly a: number }[];
  /** Uniform load in N/m, downward positive. */
  readonly uniform: number;
  readonly selfWeight: boolean;
  /** Deflection limit under total load, span/ratio. */
  readonly limitRatio?: number;
  /** Live load (part of the total): P in N, a in the document unit; uniform in N/m. */
  readonly live?: { readonly uniform: number; readonly points: readonly { readonly P: number; readonly a: number }[] };
  /** Deflection limit under live load alone, span/ratio. */
  readonly liveLimitRatio?: number;
  /** Stress limits: factor × strength basis, or typed allowables (Pa) per material id. */
  readonly stressLimits?: StressLimits;
  readonly eRef?: number;
  readonly samples?: number;
}

export type SectionMemberResult =
  | { readonly ok: true; readonly result: MemberResult; readonly composite: CompositeProperties; readonly selfWeight?: number }
  | { readonly ok: false; readonly issues: readonly string[] };

export function sectionMemberCheck(pieces: readonly MaterialPiece[], unit: LengthUnit, input: SectionMemberInput): SectionMemberResult {
  const issues: string[] = [];
  if (pieces.length === 0) issues.push('the section has no material pieces');
  if (!(Number.isFinite(input.span) && input.span > 0)) issues.push(`span must be a positive length, got ${input.span}`);
  input.points.forEach((p, i) => {
    if (!(Number.isFinite(p.a) && p.a >= 0 && p.a <= input.span)) issues.push(`point load ${i + 1}: position ${p.a} ${unit} is outside the span 0…${input.span} ${unit}`);
  });
  input.live?.points.forEach((p, i) => {
    if (!(Number.isFinite(p.a) && p.a >= 0 && p.a <= input.span)) issues.push(`live point load ${i + 1}: position ${p.a} ${unit} is outside the span 0…${input.span} ${unit}`);
  });
  if (issues.length > 0) return { ok: false, issues };
  const composite = compositeProperties(pieces, unit, input.eRef);
  let selfWeight: number | undefined;
  if (input.selfWeight) {
    if (!Number.isFinite(composite.weightPerLength)) return { ok: false, issues: ['self-weight needs a density for every material'] };
    selfWeight = composite.weightPerLength;
  }
  const m = (v: number): number => convertLength(v, unit, 'm');
  const check: MemberInput = {
    beam: { span: m(input.span), support: input.support, points: input.points.map((p) => ({ P: p.P, a: m(p.a) })), uniform: input.uniform },
    EIx: composite.EIx, EIy: composite.EIy, EIxy: composite.EIxy, yE: m(composite.cy),
    materials: composite.pieces.map((p, i) => {
      const mat = pieces[i]!.material;
      return {
        id: p.materialId, name: `${p.label} (${mat.name})`, materialId: mat.id, materialName: mat.name, E: mat.E, yTop: m(p.yTop), yBottom: m(p.yBottom),
        ...(Number.isFinite(mat.fy) ? { strength: mat.fy, strengthLabel: STRENGTH_LABEL[mat.strengthBasis], strengthBasis: mat.strengthBasis } : {}),
      };
    }),
    neutralAxisShear: shearCutSI(pieces, unit, composite.cy),
    ...(input.live !== undefined ? { live: { uniform: input.live.uniform, points: input.live.points.map((p) => ({ P: p.P, a: m(p.a) })) } } : {}),
    ...(input.liveLimitRatio !== undefined ? { liveLimitRatio: input.liveLimitRatio } : {}),
    ...(input.stressLimits !== undefined ? { stressLimits: input.stressLimits } : {}),
    ...(selfWeight !== undefined ? { selfWeight } : {}),
    ...(input.limitRatio !== undefined ? { limitRatio: input.limitRatio } : {}),
    ...(input.samples !== undefined ? { samples: input.samples } : {}),
  };
  const problems = memberInputIssues(check);
  if (problems.length > 0) return { ok: false, issues: problems };
  return { ok: true, result: memberCheck(check), composite, ...(selfWeight !== undefined ? { selfWeight } : {}) };
}
