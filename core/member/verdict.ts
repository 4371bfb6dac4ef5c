/**
 * The member verdict: every criterion the check judges, each with its demand, its limit, what
 * that limit is, and its use ratio = demand / limit. The member passes only when every criterion
 * that could be checked has a ratio ≤ 1 (a ratio that is not a finite number fails). The
 * governing criterion is the one with the largest ratio. Criteria that cannot be judged (no live
 * load given, a material with no strength) are listed as "not checked" with the reason, so the
 * verdict never claims more than it covers.
 *
 * Limits (none of them is this program's own rule; the user sets or accepts each):
 *   deflection — span/ratio under the total load and under the live load alone; the common
 *     ratios L/240 total and L/360 live are those of IBC Table 1604.3 for floor members
 *     (common practice, not code compliance).
 *   bending stress — a typed allowable per material, or factor × the material's strength basis
 *     (fy for steel and aluminium, the reference Fb of the NDS Supplement for wood, fu where that
 *     is the basis). The default factor 1 makes the limit the strength itself: first yield, or
 *     the unadjusted reference value, with no resistance or safety factor.
 *   shear stress — a typed allowable per material, or, for a yield-based material,
 *     factor × 0.6·fy (shear yielding at 0.6·Fy, AISC 360-16 §G2.1, from memory).
 * Units: SI throughout (m, Pa), as core/member/check.ts returns them.
 */
import type { StrengthBasis } from '../materials/schema.ts';

export interface StressLimits {
  /** Bending (and shear) limit = factor × strength basis; default DEFAULT_STRESS_FACTOR. */
  readonly factor?: number;
  /** Typed allowable bending stress per material id, Pa; wins over the factor. */
  readonly allowable?: ReadonlyMap<string, number>;
  /** Typed allowable shear stress per material id, Pa. */
  readonly shearAllowable?: ReadonlyMap<string, number>;
}

export const DEFAULT_STRESS_FACTOR = 1;
/** Shear yielding at 0.6·Fy: AISC 360-16 §G2.1 (from memory). */
export const SHEAR_YIELD_RATIO = 0.6;
export const COMMON_TOTAL_RATIO = 240;
export const COMMON_LIVE_RATIO = 360;
export const DEFLECTION_LIMIT_MEANING = 'IBC Table 1604.3 floor members: L/360 under live load, L/240 under total load (common practice; the local code governs)';
export const STRESS_FACTOR_MEANING = 'stress limit = factor × the material\'s strength basis (fy; reference Fb for wood). The default factor 1 is the strength itself: first yield or the unadjusted reference value, with no resistance or safety factor. Set the factor, or type an allowable stress, as your design code requires.';

export type CriterionKind = 'deflection-total' | 'deflection-live' | 'bending' | 'shear';

export interface Criterion {
  readonly kind: CriterionKind;
  /** Plain words: "deflection under total load", "bending stress in S355 steel". */
  readonly label: string;
  readonly materialId?: string;
  readonly status: 'pass' | 'fail' | 'not checked';
  /** SI: m for deflections, Pa for stresses (absolute values). */
  readonly demand?: number;
  readonly limit?: number;
  /** demand / limit. */
  readonly ratio?: number;
  /** What the limit is: "span/240", "1 × yield strength fy", "typed allowable". */
  readonly limitBasis: string;
  /** Why a criterion was not checked. */
  readonly reason?: string;
}

export interface MemberVerdict {
  /** Every checked criterion within its limit, and at least one checked. */
  readonly passes: boolean;
  readonly criteria: readonly Criterion[];
  /** The checked criterion with the largest use ratio. */
  readonly governing: Criterion | null;
  /** One line: "FAILS: bending stress in steel at 182 % of its limit (governs)". */
  readonly summary: string;
}

interface PieceFibres {
  readonly id: string;
  readonly name: string;
  readonly strength?: number;
  readonly strengthLabel?: string;
  readonly strengthBasis?: StrengthBasis;
  readonly materialId?: string;
  readonly materialName?: string;
}

interface PieceStress {
  readonly maxTension: number;
  readonly maxCompression: number;
}

interface Limit {
  readonly ratio: number;
  readonly allowed: number;
}

export interface VerdictInput {
  readonly span: number;
  readonly deflection: number;
  readonly limit?: Limit;
  readonly liveLimitRatio?: number;
  readonly liveDeflection?: number;
  readonly liveLimit?: Limit;
  readonly materials: readonly PieceFibres[];
  /** Same order as `materials`. */
  readonly stresses: readonly PieceStress[];
  readonly shearStresses: readonly { readonly materialId: string; readonly tau: number }[];
  readonly shearGiven: boolean;
  readonly limits: StressLimits;
}

const pct = (r: number): string => (Number.isFinite(r) ? `${(r * 100).toPrecision(3)} %` : String(r));

function judged(c: Omit<Criterion, 'status' | 'ratio'> & { demand: number; limit: number }): Criterion {
  const ratio = c.demand / c.limit;
  // NaN or ∞ fail: a verdict never passes a number it could not compute.
  return { ...c, ratio, status: Number.isFinite(ratio) && ratio <= 1 ? 'pass' : 'fail' };
}

function deflectionCriteria(v: VerdictInput): Criterion[] {
  const out: Criterion[] = [];
  if (v.limit !== undefined) {
    out.push(judged({ kind: 'deflection-total', label: 'deflection under total load', demand: Math.abs(v.deflection), limit: v.limit.allowed, limitBasis: `span/${v.limit.ratio}` }));
  }
  if (v.liveLimitRatio !== undefined) {
    if (v.liveLimit === undefined || v.liveDeflection === undefined) {
      out.push({ kind: 'deflection-live', label: 'deflection under live load', status: 'not checked', limitBasis: `span/${v.liveLimitRatio}`, reason: 'no live load given' });
    } else {
      out.push(judged({ kind: 'deflection-live', label: 'deflection under live load', demand: Math.abs(v.liveDeflection), limit: v.liveLimit.allowed, limitBasis: `span/${v.liveLimit.ratio}` }));
    }
  }
  return out;
}

interface MaterialGroup {
  readonly id: string;
  readonly name: string;
  readonly piece: PieceFibres;
  peak: number;
  where: string;
}

function materialGroups(v: VerdictInput): MaterialGroup[] {
  const groups = new Map<string, MaterialGroup>();
  v.materials.forEach((m, i) => {
    const s = v.stresses[i];
    const peak = s === undefined ? 0 : Math.max(Math.abs(s.maxTension), Math.abs(s.maxCompression));
    const id = m.materialId ?? m.id;
    const g = groups.get(id);
    if (g === undefined) groups.set(id, { id, name: m.materialName ?? m.name, piece: m, peak, where: m.name });
    else if (!(peak <= g.peak)) { g.peak = peak; g.where = m.name; }
  });
  return [...groups.values()];
}

function bendingCriterion(g: MaterialGroup, limits: StressLimits): Criterion {
  const label = `bending stress in ${g.name}`;
  const typed = limits.allowable?.get(g.id);
  if (typed !== undefined) return judged({ kind: 'bending', label, materialId: g.id, demand: g.peak, limit: typed, limitBasis: 'typed allowable stress' });
  const strength = g.piece.strength;
  if (strength === undefined || !Number.isFinite(strength)) {
    return { kind: 'bending', label, materialId: g.id, status: 'not checked', limitBasis: 'none', reason: `no strength is known for ${g.name}: give the material a strength, or type an allowable stress` };
  }
  const factor = limits.factor ?? DEFAULT_STRESS_FACTOR;
  return judged({ kind: 'bending', label, materialId: g.id, demand: g.peak, limit: factor * strength, limitBasis: `${factor} × ${g.piece.strengthLabel ?? 'strength'}${limits.factor === undefined ? ' (default factor)' : ''}` });
}

function shearCriterion(cut: { materialId: string; tau: number }, g: MaterialGroup | undefined, limits: StressLimits): Criterion {
  const name = g?.name ?? cut.materialId;
  const label = `shear stress at the neutral axis in ${name}`;
  const typed = limits.shearAllowable?.get(cut.materialId);
  if (typed !== undefined) return judged({ kind: 'shear', label, materialId: cut.materialId, demand: cut.tau, limit: typed, limitBasis: 'typed allowable shear stress' });
  const strength = g?.piece.strength;
  if (g?.piece.strengthBasis !== 'yield' || strength === undefined || !Number.isFinite(strength)) {
    return { kind: 'shear', label, materialId: cut.materialId, status: 'not checked', limitBasis: 'none', reason: `no shear strength is known for ${name}: type an allowable shear stress` };
  }
  const factor = limits.factor ?? DEFAULT_STRESS_FACTOR;
  return judged({ kind: 'shear', label, materialId: cut.materialId, demand: cut.tau, limit: factor * SHEAR_YIELD_RATIO * strength, limitBasis: `${factor} × ${SHEAR_YIELD_RATIO} fy (shear yield, AISC 360-16 §G2.1, from memory)` });
}

export function memberVerdict(v: VerdictInput): MemberVerdict {
  const groups = materialGroups(v);
  const criteria: Criterion[] = [...deflectionCriteria(v), ...groups.map((g) => bendingCriterion(g, v.limits))];
  if (!v.shearGiven) {
    criteria.push({ kind: 'shear', label: 'shear stress', status: 'not checked', limitBasis: 'none', reason: 'the section geometry was not given to the check' });
  } else {
    for (const cut of v.shearStresses) criteria.push(shearCriterion(cut, groups.find((g) => g.id === cut.materialId), v.limits));
  }
  const checked = criteria.filter((c) => c.status !== 'not checked');
  const rank = (c: Criterion): number => (Number.isFinite(c.ratio) ? (c.ratio as number) : Infinity);
  const governing = checked.reduce<Criterion | null>((a, c) => (a === null || rank(c) > rank(a) ? c : a), null);
  const passes = checked.length > 0 && checked.every((c) => c.status === 'pass');
  const notChecked = criteria.filter((c) => c.status === 'not checked');
  const tail = notChecked.length > 0 ? `; not checked: ${notChecked.map((c) => `${c.label} (${c.reason ?? ''})`).join(', ')}` : '';
  const summary = governing === null
    ? `NOT CHECKED: no criterion could be judged${tail}`
    : `${passes ? 'PASSES' : 'FAILS'}: ${governing.label} governs at ${pct(governing.ratio ?? NaN)} of its limit (${governing.limitBasis})${tail}`;
  return { passes, criteria, governing, summary };
}
