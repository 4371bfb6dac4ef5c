/**
 * Member check: a beam's maximum deflection and moment, span/deflection, the bending stress per
 * material at the largest sagging and hogging moments, the shear stress at the neutral axis, and
 * a verdict over every criterion it checks (core/member/verdict.ts): deflection under total load
 * and under live load against their limits, bending stress and shear stress in each material
 * against its limit. Each criterion carries its use ratio; any ratio over 1 fails the member.
 *
 * The section bends about its x axis (loads act in −y, the usual beam orientation); the stiffness
 * is EIx about the E-weighted centroid. Stress in material i at fibre y (docs/methods.md §6, §9.1):
 * σ_i = −M·E_i·(y − y_E)/EIx with M sagging positive (compression at the top). When EIxy ≠ 0 the
 * section is assumed restrained to bend in the load plane (a caution is added).
 *
 * Deflection limits: span/360, /240, /180, /120 as listed in IBC Table 1604.3 (common practice,
 * NOT code compliance: the locally adopted code governs), or a user ratio. For a cantilever the
 * span in the limit is taken as twice the cantilever length, per that table's footnote (from
 * memory). Units: any consistent set, as core/member/beam.ts. Source: docs/methods.md §10.
 */
import { invariant } from '../invariant.ts';
import type { StrengthBasis } from '../materials/schema.ts';
import {
  beamCaseIssues, beamDiagram, deflectionExtremes, momentExtremes, shearAt, solveBeam,
  type BeamCase, type BeamDiagram, type BeamSolution, type DeflectionExtreme, type ExtremeValue, type PointLoad,
} from './beam.ts';
import { memberVerdict, type MemberVerdict, type StressLimits } from './verdict.ts';

/** Q_E (Pa·m³) and Σ E·t (Pa·m) at the neutral axis, and the materials the axis cuts. */
export interface ShearCut {
  readonly QE: number;
  readonly Et: number;
  readonly cut: readonly { readonly materialId: string; readonly E: number }[];
}

export const CAUTION = 'Results are preliminary; verify with a licensed engineer and the local building code, which govern.';
export const LIMIT_CAUTION = 'Deflection limits are offered as common practice (IBC Table 1604.3 ratios), not as code compliance; the local code and a licensed engineer govern.';

export const COMMON_DEFLECTION_RATIOS = [360, 240, 180, 120] as const;

/** One material's extreme fibres, measured in y (section coordinates). */
export interface MaterialFibres {
  readonly id: string;
  readonly name: string;
  readonly E: number;
  readonly yTop: number;
  readonly yBottom: number;
  /** Strength used for a stress ratio (yield or reference), same stress unit as E; optional. */
  readonly strength?: number;
  /** What `strength` is, for the reader (e.g. "yield strength fy"). */
  readonly strengthLabel?: string;
  /** The material's strength basis (yield, reference bending, tensile), when known. */
  readonly strengthBasis?: StrengthBasis;
  /** The material this piece is made of (criteria are per material); default `id`. */
  readonly materialId?: string;
  readonly materialName?: string;
}

/** Live load, given apart from the rest so its deflection can be checked on its own. */
export interface LiveLoad {
  readonly uniform: number;
  readonly points: readonly PointLoad[];
}

export interface MemberInput {
  readonly beam: Omit<BeamCase, 'EI'>;
  readonly EIx: number;
  readonly EIxy?: number;
  readonly EIy?: number;
  /** E-weighted centroid height, section coordinates. */
  readonly yE: number;
  readonly materials: readonly MaterialFibres[];
  /** Self-weight as a uniform load (force per length, downward) added when given. */
  readonly selfWeight?: number;
  /** Deflection limit under the total load as span/ratio (e.g. 240); omitted = not checked. */
  readonly limitRatio?: number;
  /** Live load, part of the total: the total is `beam` + `live` (+ self-weight). */
  readonly live?: LiveLoad;
  /** Deflection limit under the live load alone, span/ratio (e.g. 360). */
  readonly liveLimitRatio?: number;
  /** How stresses are judged: factor × strength basis, or typed allowables per material. */
  readonly stressLimits?: StressLimits;
  /** Q_E and Σ E·t at the neutral axis (core/member/shear.ts), in SI: Pa·m³ and Pa·m. */
  readonly neutralAxisShear?: ShearCut;
  readonly samples?: number;
}

export interface MaterialStress {
  readonly id: string;
  readonly name: string;
  /** Largest tension (+) and compression (−) over the span, and where (x) and at which fibre (y). */
  readonly maxTension: number;
  readonly maxTensionAt: { readonly x: number; readonly y: number };
  readonly maxCompression: number;
  readonly maxCompressionAt: { readonly x: number; readonly y: number };
  /** max(|σ|) / strength, when a strength was given, and what that strength is. */
  readonly strengthRatio?: number;
  readonly strengthLabel?: string;
}

export interface DeflectionLimit {
  readonly ratio: number;
  /** Length used in the limit (2·L for a cantilever). */
  readonly limitLength: number;
  readonly allowed: number;
  readonly passes: boolean;
  readonly verdict: 'within limit' | 'exceeds limit';
}

export interface MemberResult {
  readonly deflectionMax: number;
  readonly deflectionAt: number;
  readonly deflectionSolve: Pick<DeflectionExtreme, 'iterations' | 'residual' | 'converged'>;
  /** Span / |deflectionMax| (Infinity when there is no deflection). */
  readonly spanOverDeflection: number;
  /** Largest |M| and where; the signed value (sagging +). */
  readonly momentMax: number;
  readonly momentAt: number;
  readonly momentSagging: ExtremeValue;
  readonly momentHogging: ExtremeValue;
  readonly reactions: { readonly left: number; readonly leftMoment: number };
  readonly uniformTotal: number;
  readonly stresses: readonly MaterialStress[];
  readonly limit?: DeflectionLimit;
  /** Largest downward deflection under the live load alone, when a live load was given. */
  readonly liveDeflectionMax?: number;
  readonly liveLimit?: DeflectionLimit;
  /** Largest |V| over the span and where (N, m). */
  readonly shearMax: ExtremeValue;
  /** Shear stress at the neutral axis per material cut by it (Pa), when the section was given. */
  readonly shearStresses: readonly { readonly materialId: string; readonly tau: number }[];
  /** Every criterion judged, the governing one, and the verdict. */
  readonly verdict: MemberVerdict;
  readonly diagram: BeamDiagram;
  readonly cautions: readonly string[];
}

function materialStress(m: MaterialFibres, input: MemberInput, sag: ExtremeValue, hog: ExtremeValue): MaterialStress {
  const cases: { sigma: number; x: number; y: number }[] = [];
  for (const M of [sag, hog]) for (const y of [m.yTop, m.yBottom]) cases.push({ sigma: (-M.value * m.E * (y - input.yE)) / input.EIx, x: M.at, y });
  const tension = cases.reduce((a, b) => (b.sigma > a.sigma ? b : a));
  const compression = cases.reduce((a, b) => (b.sigma < a.sigma ? b : a));
  const peak = Math.max(Math.abs(tension.sigma), Math.abs(compression.sigma));
  return {
    id: m.id,
    name: m.name,
    maxTension: Math.max(0, tension.sigma),
    maxTensionAt: { x: tension.x, y: tension.y },
    maxCompression: Math.min(0, compression.sigma),
    maxCompressionAt: { x: compression.x, y: compression.y },
    ...(m.strength !== undefined ? { strengthRatio: peak / m.strength, strengthLabel: m.strengthLabel ?? 'strength' } : {}),
  };
}

export function deflectionLimit(span: number, cantilever: boolean, ratio: number, deflection: number): DeflectionLimit {
  invariant(Number.isFinite(ratio) && ratio > 0, 'deflectionLimit: ratio must be positive');
  const limitLength = cantilever ? 2 * span : span;
  const allowed = limitLength / ratio;
  const passes = Math.abs(deflection) <= allowed;
  return { ratio, limitLength, allowed, passes, verdict: passes ? 'within limit' : 'exceeds limit' };
}

/** Problems with the member input, plainly; empty when it is usable. */
export function memberInputIssues(input: MemberInput): string[] {
  const issues = beamCaseIssues({ ...input.beam, EI: input.EIx });
  if (input.selfWeight !== undefined && !(Number.isFinite(input.selfWeight) && input.selfWeight >= 0)) issues.push(`self-weight must be a non-negative number, got ${input.selfWeight}`);
  if (input.limitRatio !== undefined && !(Number.isFinite(input.limitRatio) && input.limitRatio > 0)) issues.push(`deflection limit ratio must be positive, got ${input.limitRatio}`);
  if (input.liveLimitRatio !== undefined && !(Number.isFinite(input.liveLimitRatio) && input.liveLimitRatio > 0)) issues.push(`live-load deflection limit ratio must be positive, got ${input.liveLimitRatio}`);
  if (input.live !== undefined) {
    issues.push(...beamCaseIssues({ ...input.beam, ...input.live, EI: input.EIx }).filter((m) => /load/.test(m)).map((m) => `live ${m}`));
  }
  const f = input.stressLimits?.factor;
  if (f !== undefined && !(Number.isFinite(f) && f > 0)) issues.push(`stress limit factor must be a positive number, got ${f}`);
  for (const [id, v] of input.stressLimits?.allowable ?? new Map<string, number>()) if (!(Number.isFinite(v) && v > 0)) issues.push(`allowable bending stress for "${id}" must be positive, got ${v}`);
  for (const [id, v] of input.stressLimits?.shearAllowable ?? new Map<string, number>()) if (!(Number.isFinite(v) && v > 0)) issues.push(`allowable shear stress for "${id}" must be positive, got ${v}`);
  return issues;
}

/** Largest |V| over the span: at the ends and on both sides of each point load (shear is linear between). */
export function shearExtreme(s: BeamSolution): ExtremeValue {
  const candidates: ExtremeValue[] = [{ value: shearAt(s, 0), at: 0 }, { value: shearAt(s, s.beam.span), at: s.beam.span }];
  for (const p of s.beam.points) {
    const right = shearAt(s, p.a);
    candidates.push({ value: right, at: p.a }, { value: right + p.P, at: p.a });
  }
  return candidates.reduce((a, b) => (Math.abs(b.value) > Math.abs(a.value) ? b : a));
}

function liveDeflection(input: MemberInput): number | undefined {
  const live = input.live;
  if (live === undefined || (live.uniform === 0 && live.points.every((p) => p.P === 0))) return undefined;
  const s = solveBeam({ ...input.beam, uniform: live.uniform, points: live.points, EI: input.EIx });
  const { down, up } = deflectionExtremes(s);
  return Math.abs(up.value) > Math.abs(down.value) ? up.value : down.value;
}

export function memberCheck(input: MemberInput): MemberResult {
  const issues = memberInputIssues(input);
  invariant(issues.length === 0, `memberCheck: ${issues.join('; ')}`);
  const uniformTotal = input.beam.uniform + (input.live?.uniform ?? 0) + (input.selfWeight ?? 0);
  const s = solveBeam({ ...input.beam, uniform: uniformTotal, points: [...input.beam.points, ...(input.live?.points ?? [])], EI: input.EIx });
  const { down, up } = deflectionExtremes(s);
  const governing = Math.abs(up.value) > Math.abs(down.value) ? up : down;
  const { sagging, hogging } = momentExtremes(s);
  const peakM = Math.abs(hogging.value) > Math.abs(sagging.value) ? hogging : sagging;
  const span = input.beam.span;
  const cautions = [CAUTION, 'Shear deformation is ignored (unconservative for short, deep or sandwich beams).'];
  const eixy = input.EIxy ?? 0;
  if (input.EIy !== undefined && Math.abs(eixy) > 1e-9 * Math.sqrt(input.EIx * input.EIy)) {
    cautions.push('EIxy is not zero: the section is assumed restrained to bend in the load plane; free bending also deflects sideways.');
  }
  if (!governing.converged) cautions.push(`maximum deflection search stopped after ${governing.iterations} halvings (slope residual ${governing.residual.toExponential(2)}).`);
  const cantilever = input.beam.support === 'cantilever';
  const limit = input.limitRatio !== undefined ? deflectionLimit(span, cantilever, input.limitRatio, governing.value) : undefined;
  const liveMax = liveDeflection(input);
  const liveLimit = input.liveLimitRatio !== undefined && liveMax !== undefined ? deflectionLimit(span, cantilever, input.liveLimitRatio, liveMax) : undefined;
  if (limit !== undefined || input.liveLimitRatio !== undefined) cautions.push(LIMIT_CAUTION);
  const stresses = input.materials.map((m) => materialStress(m, input, sagging, hogging));
  const shearMax = shearExtreme(s);
  const na = input.neutralAxisShear;
  const shearStresses = na === undefined || !(na.Et > 0) ? [] : na.cut.map((c) => ({ materialId: c.materialId, tau: (c.E * Math.abs(shearMax.value) * na.QE) / (input.EIx * na.Et) }));
  const verdict = memberVerdict({
    span, deflection: governing.value, ...(limit !== undefined ? { limit } : {}),
    ...(input.liveLimitRatio !== undefined ? { liveLimitRatio: input.liveLimitRatio } : {}),
    ...(liveMax !== undefined ? { liveDeflection: liveMax } : {}), ...(liveLimit !== undefined ? { liveLimit } : {}),
    materials: input.materials, stresses, shearStresses, shearGiven: na !== undefined, limits: input.stressLimits ?? {},
  });
  return {
    deflectionMax: governing.value,
    deflectionAt: governing.at,
    deflectionSolve: { iterations: governing.iterations, residual: governing.residual, converged: governing.converged },
    spanOverDeflection: governing.value === 0 ? Infinity : span / Math.abs(governing.value),
    momentMax: peakM.value,
    momentAt: peakM.at,
    momentSagging: sagging,
    momentHogging: hogging,
    reactions: { left: s.V0, leftMoment: s.M0 },
    uniformTotal,
    stresses,
    ...(limit !== undefined ? { limit } : {}),
    ...(liveMax !== undefined ? { liveDeflectionMax: liveMax } : {}),
    ...(liveLimit !== undefined ? { liveLimit } : {}),
    shearMax,
    shearStresses,
    verdict,
    diagram: beamDiagram(s, input.samples ?? 200, [governing.at, peakM.at]),
    cautions,
  };
}
