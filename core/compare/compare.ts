/**
 * Comparison of alternative sections (one document each): the main properties in one length
 * unit, their ratios to a baseline alternative, efficiency measures (Ix/A, Sx/A, Zx/A), the
 * overall depth, and, where the document has materials, EIx, weight per length, and under a
 * shared simply supported span and uniform load (core/member) the maximum deflection (total and
 * live) and the bending-stress use ratio of each material (σ / limit, the limit being
 * factor × the material's strength basis as in the member check).
 *
 * Targets (all optional): deflection ≤ span/n under total and under live load, bending-stress use
 * ≤ 1 in every material, minimums on Ix, Sx, Zx and EIx, a maximum depth. The lightest
 * alternative meeting every target is picked (by weight when every alternative has one, else by
 * area); every other alternative carries each target it fails and by how much. A value that is
 * missing or not a finite number never meets a target.
 *
 * Stiffness: where the alternatives' materials differ (or one mixes materials), geometric Ix
 * does not rank their stiffness; `stiffnessColumn` is then EIx and the stiffness ranking uses it.
 *
 * Units: `unit` for lengths (area unit², moduli unit³, Ix unit⁴, depth unit); EIx N·m², weight
 *   N/m, deflection m (SI, as core/member returns them); the span in `unit`, loads in N/m.
 *   Every view shows EIx, weight and deflections in the unit system of `unit` through ./csv.ts
 *   (columnUnit, columnValue): kip·in², lb/ft, in or kN·m², kg/m, mm.
 */
import type { SectionDocument } from '../document/types.ts';
import { regionBounds } from '../geometry/bounds.ts';
import { materialPiecesFromDocument } from '../materials/document.ts';
import { CAUTION, sectionMemberCheck, type Criterion, type StressLimits } from '../member/index.ts';
import { sectionFromDocument } from '../section/index.ts';
import { convertLength, fromSI, unitSystem } from '../units/index.ts';
import type { LengthUnit } from '../units/types.ts';
import { partsActingTogether } from '../joints/index.ts';

export { CAUTION };

export const COMPARE_COLUMNS = ['A', 'Ix', 'Iy', 'Sx', 'Zx', 'IxPerA', 'SxPerA', 'ZxPerA', 'depth', 'EIx', 'weight', 'deflection', 'liveDeflection', 'stressUse'] as const;
export type CompareColumn = (typeof COMPARE_COLUMNS)[number];

/** What each column is, in words, for headings (view, CSV, report, CLI). */
export const COLUMN_HEADINGS: Readonly<Record<CompareColumn, string>> = {
  A: 'A (area)',
  Ix: 'Ix (geometric)',
  Iy: 'Iy (geometric)',
  Sx: 'Sx (smaller fibre)',
  Zx: 'Zx (plastic)',
  IxPerA: 'Ix/A',
  SxPerA: 'Sx/A (smaller fibre)',
  ZxPerA: 'Zx/A',
  depth: 'depth (overall)',
  EIx: 'EIx (E-weighted)',
  weight: 'weight per length',
  deflection: 'deflection, total load (max)',
  liveDeflection: 'deflection, live load (max)',
  stressUse: 'bending stress use (worst material, σ/limit)',
};

/** One material's bending stress against its limit under the shared beam. */
export interface StressUse {
  readonly material: string;
  readonly status: Criterion['status'];
  /** Pa. */
  readonly stress?: number;
  readonly limit?: number;
  readonly ratio?: number;
  readonly limitBasis: string;
  readonly reason?: string;
}

export interface Alternative {
  readonly name: string;
  readonly values: Readonly<Record<CompareColumn, number | null>>;
  /** values / baseline values (null where either is missing). */
  readonly ratios: Readonly<Record<CompareColumn, number | null>>;
  /** Bending stress per material (with a shared beam and materials). */
  readonly stress: readonly StressUse[];
  /** Ids of the materials the section uses. */
  readonly materials: readonly string[];
  /** Why material-based values are missing, when they are. */
  readonly notes: readonly string[];
}

export interface SharedBeam {
  /** Simply supported span, in the comparison unit. */
  readonly span: number;
  /** Total uniform load, N/m downward. */
  readonly load: number;
  /** The live part of `load`, N/m (for the live-load deflection). */
  readonly live?: number;
}

export interface Comparison {
  readonly unit: LengthUnit;
  readonly baseline: string;
  readonly beam: SharedBeam | null;
  readonly alternatives: readonly Alternative[];
  /** EIx where the materials differ (and every alternative has an EIx), else Ix. */
  readonly stiffnessColumn: 'Ix' | 'EIx';
  /** Why the stiffness column is what it is, in words. */
  readonly stiffnessNote: string;
  readonly stressLimits: StressLimits;
  readonly caution: string;
}

export class CompareError extends Error {}

type Values = Record<CompareColumn, number | null>;

function stressUses(criteria: readonly Criterion[]): StressUse[] {
  return criteria.filter((k) => k.kind === 'bending').map((k) => ({
    material: k.label.replace(/^bending stress in /, ''), status: k.status, limitBasis: k.limitBasis,
    ...(k.demand !== undefined ? { stress: k.demand } : {}), ...(k.limit !== undefined ? { limit: k.limit } : {}),
    ...(k.ratio !== undefined ? { ratio: k.ratio } : {}), ...(k.reason !== undefined ? { reason: k.reason } : {}),
  }));
}

function valuesOf(doc: SectionDocument, unit: LengthUnit, beam: SharedBeam | null, limits: StressLimits): { values: Values; stress: StressUse[]; materials: string[]; notes: string[] } {
  const s = sectionFromDocument(doc);
  if (s.properties === null) throw new CompareError(`"${doc.name}": ${s.diagnostics.map((d) => d.message).join('; ')}`);
  const p = s.properties;
  const L = (v: number, power: number): number => convertLength(v, doc.unit, unit, power);
  const A = L(p.area, 2), Ix = L(p.Ix, 4), Sx = L(Math.min(p.SxTop, p.SxBottom), 3), Zx = L(p.Zx, 3);
  const b = regionBounds(s.region);
  const values: Values = { A, Ix, Iy: L(p.Iy, 4), Sx, Zx, IxPerA: Ix / A, SxPerA: Sx / A, ZxPerA: Zx / A, depth: b === null ? null : L(b.maxY - b.minY, 1), EIx: null, weight: null, deflection: null, liveDeflection: null, stressUse: null };
  // Separate pieces and overlapping parts are said for every alternative (core/joints).
  const notes: string[] = partsActingTogether(doc).warnings.filter((w) => w.startsWith('The material falls into') || w.startsWith('Parts "'));
  const none = { values, stress: [], materials: [], notes };
  if (doc.defaultMaterial === null && doc.parts.every((part) => part.operation !== 'add' || part.material === null)) {
    // One line instead of one per part when the section has no materials at all.
    notes.push('no EI, weight, deflection or stress: no materials assigned (choose a default material, or one for each part)');
    return none;
  }
  const pieces = materialPiecesFromDocument(doc);
  if (pieces.issues.length > 0 || pieces.pieces.length === 0) {
    notes.push(`no EI, weight, deflection or stress: ${pieces.issues.join('; ') || 'no material pieces'}`);
    return none;
  }
  const materials = [...new Set(pieces.pieces.map((q) => q.material.id))];
  const spanInDoc = beam === null ? 1 : convertLength(beam.span, unit, doc.unit);
  const live = beam?.live ?? 0;
  const member = sectionMemberCheck(pieces.pieces, doc.unit, {
    span: spanInDoc, support: 'simple', points: [], uniform: (beam?.load ?? 0) - live, selfWeight: false, stressLimits: limits,
    ...(live !== 0 ? { live: { uniform: live, points: [] }, liveLimitRatio: 1 } : {}),
  });
  if (!member.ok) {
    notes.push(`member check: ${member.issues.join('; ')}`);
    return { ...none, materials };
  }
  values.EIx = member.composite.EIx;
  values.weight = Number.isFinite(member.composite.weightPerLength) ? member.composite.weightPerLength : null;
  if (values.weight === null) notes.push('no weight: a material has no density');
  if (beam === null) return { values, stress: [], materials, notes };
  values.deflection = Math.abs(member.result.deflectionMax);
  if (member.result.liveDeflectionMax !== undefined) values.liveDeflection = Math.abs(member.result.liveDeflectionMax);
  const stress = stressUses(member.result.verdict.criteria);
  const ratios = stress.map((u) => u.ratio);
  values.stressUse = ratios.every((r) => r !== undefined && Number.isFinite(r)) && ratios.length > 0 ? Math.max(...(ratios as number[])) : null;
  for (const u of stress) if (u.status === 'not checked') notes.push(`bending stress in ${u.material} not checked: ${u.reason ?? ''}`);
  return { values, stress, materials, notes };
}

/** EIx where materials differ between alternatives or within one, so stiffness is compared fairly. */
function stiffnessOf(alternatives: readonly { values: Values; materials: readonly string[] }[]): { column: 'Ix' | 'EIx'; note: string } {
  if (alternatives.every((a) => a.materials.length === 0)) return { column: 'Ix', note: 'no materials given: geometric Ix, which ranks stiffness only for one material throughout' };
  const sets = new Set(alternatives.map((a) => [...a.materials].sort().join('+')));
  const mixed = alternatives.some((a) => a.materials.length > 1) || sets.size > 1;
  if (!mixed) return { column: 'Ix', note: 'one material throughout: geometric Ix ranks stiffness' };
  if (alternatives.some((a) => a.values.EIx === null)) return { column: 'Ix', note: 'materials differ, but not every alternative has an EIx: geometric Ix shown, and it does not rank stiffness' };
  return { column: 'EIx', note: 'materials differ: stiffness is ranked by EIx, not by geometric Ix' };
}

/** Compares named documents; `baseline` is a document name (default: the first). */
export function compareDocuments(docs: readonly SectionDocument[], options: { unit?: LengthUnit; baseline?: string; beam?: SharedBeam | null; stressLimits?: StressLimits } = {}): Comparison {
  const first = docs[0];
  if (first === undefined) throw new CompareError('nothing to compare: give at least one document');
  const unit = options.unit ?? first.unit;
  const beam = options.beam ?? null;
  const baseName = options.baseline ?? first.name;
  const stressLimits = options.stressLimits ?? {};
  if (beam !== null) {
    if (!(Number.isFinite(beam.span) && beam.span > 0)) throw new CompareError(`span must be a positive length, got ${beam.span}`);
    if (!Number.isFinite(beam.load)) throw new CompareError(`load must be a finite number, got ${beam.load}`);
    if (beam.live !== undefined && !(Number.isFinite(beam.live) && beam.live >= 0 && beam.live <= beam.load)) throw new CompareError(`live load must be between 0 and the total load ${beam.load} N/m, got ${beam.live}`);
  }
  const computed = docs.map((d) => ({ name: d.name, ...valuesOf(d, unit, beam, stressLimits) }));
  const base = computed.find((c) => c.name === baseName);
  if (base === undefined) throw new CompareError(`--baseline "${baseName}": no alternative has that name; names: ${computed.map((c) => c.name).join(', ')}`);
  const alternatives = computed.map((c) => {
    const ratios = Object.fromEntries(COMPARE_COLUMNS.map((k) => {
      const v = c.values[k], b = base.values[k];
      return [k, v === null || b === null || b === 0 ? null : v / b];
    })) as Record<CompareColumn, number | null>;
    return { name: c.name, values: c.values, ratios, stress: c.stress, materials: c.materials, notes: c.notes };
  });
  const stiffness = stiffnessOf(alternatives);
  return { unit, baseline: baseName, beam, alternatives, stiffnessColumn: stiffness.column, stiffnessNote: stiffness.note, stressLimits, caution: CAUTION };
}

/** The alternatives sorted by a column (missing values last). */
export function sortAlternatives(c: Comparison, column: CompareColumn, descending = false): Alternative[] {
  return [...c.alternatives].sort((a, b) => {
    const x = a.values[column], y = b.values[column];
    if (x === null || y === null) return x === null ? (y === null ? 0 : 1) : -1;
    return descending ? y - x : x - y;
  });
}

/** The alternatives from stiffest to least stiff by the comparison's stiffness column. */
export function stiffnessRanking(c: Comparison): Alternative[] {
  return sortAlternatives(c, c.stiffnessColumn, true);
}

export interface Targets {
  /** Minimums: Ix unit⁴, Sx (smaller fibre) unit³, Zx unit³, EIx N·m². */
  readonly minIx?: number;
  readonly minSx?: number;
  readonly minZx?: number;
  readonly minEIx?: number;
  /** Maximum overall depth, unit. */
  readonly maxDepth?: number;
  /** Deflection under total load at most span / ratio (needs the shared beam). */
  readonly deflectionRatio?: number;
  /** Deflection under live load at most span / ratio (needs the shared beam with a live load). */
  readonly liveDeflectionRatio?: number;
  /** Bending stress use ≤ 1 in every material (needs the shared beam and strengths). */
  readonly stressWithinLimit?: boolean;
}

export type TargetId = 'minIx' | 'minSx' | 'minZx' | 'minEIx' | 'maxDepth' | 'deflection' | 'liveDeflection' | 'stress';

/** One target an alternative does not meet, and by how much. */
export interface TargetFailure {
  readonly target: TargetId;
  /** Plain sentence with both values and the margin: lengths in the comparison unit, stresses and EI in ksi and kip·in² (in, ft) or MPa and kN·m² (core/units unitSystem). */
  readonly message: string;
  /** value / limit (≥ 1 over a maximum, ≤ 1 under a minimum); null when the value is missing. */
  readonly ratio: number | null;
}

export interface TargetVerdict {
  readonly name: string;
  readonly meets: boolean;
  readonly failures: readonly TargetFailure[];
}

export interface Pick {
  readonly choice: Alternative | null;
  readonly by: 'weight' | 'A';
  readonly verdicts: readonly TargetVerdict[];
  /** "name: reason; reason" per failing alternative (for plain text). */
  readonly failing: readonly string[];
}

const g4 = (v: number): string => String(Number(v.toPrecision(4)));
/** Stresses in messages: the comparison unit's system (core/units unitSystem: ksi for inch and foot work, MPa otherwise). */
const stressText = (pa: number, u: LengthUnit): string => {
  const unit = unitSystem(u).units.stress;
  return `${g4(fromSI(pa, 'stress', unit))} ${unit}`;
};
/** EI in messages: the system's flexural stiffness unit (kip·in² or kN·m²), as a factor from N·m². */
const eiFactor = (u: LengthUnit): { f: number; unit: string } => {
  const unit = unitSystem(u).units.flexuralStiffness;
  return { f: fromSI(1, 'flexuralStiffness', unit), unit };
};
const pctOver = (r: number): string => `${g4(Math.abs(r - 1) * 100)} %`;

function minimum(target: TargetId, what: string, value: number | null, limit: number | undefined, unit: string): TargetFailure | null {
  if (limit === undefined) return null;
  if (value === null || !Number.isFinite(value)) return { target, message: `${what}: no value, so the minimum ${g4(limit)} ${unit} is not shown to be met`, ratio: null };
  return value >= limit ? null : { target, message: `${what} ${g4(value)} ${unit} is below the minimum ${g4(limit)} ${unit} by ${pctOver(value / limit)}`, ratio: value / limit };
}

function maximum(target: TargetId, what: string, value: number | null, limit: number | undefined, unit: string, missing: string): TargetFailure | null {
  if (limit === undefined) return null;
  if (value === null || !Number.isFinite(value)) return { target, message: `${what}: ${missing}`, ratio: null };
  return value <= limit ? null : { target, message: `${what} ${g4(value)} ${unit} exceeds ${g4(limit)} ${unit} by ${pctOver(value / limit)}`, ratio: value / limit };
}

function stressFailures(a: Alternative, c: Comparison): TargetFailure[] {
  const st = (pa: number | undefined): string => stressText(pa ?? NaN, c.unit);
  if (c.beam === null) return [{ target: 'stress', message: 'bending stress: needs the shared span and load', ratio: null }];
  if (a.stress.length === 0) return [{ target: 'stress', message: 'bending stress: not known (needs materials)', ratio: null }];
  return a.stress.flatMap((u): TargetFailure[] => {
    if (u.status === 'not checked' || u.ratio === undefined) return [{ target: 'stress', message: `bending stress in ${u.material}: not checked (${u.reason ?? 'no limit'})`, ratio: null }];
    if (Number.isFinite(u.ratio) && u.ratio <= 1) return [];
    return [{ target: 'stress', message: `bending stress in ${u.material} ${st(u.stress)} is ${g4(u.ratio * 100)} % of its limit ${st(u.limit)} (${u.limitBasis}): over by ${pctOver(u.ratio)}`, ratio: u.ratio }];
  });
}

/** Every target an alternative fails, with by how much. */
export function targetFailures(a: Alternative, c: Comparison, t: Targets): TargetFailure[] {
  const u = c.unit, v = a.values;
  const span = c.beam === null ? null : c.beam.span;
  // Deflections (m in core) are judged and written in the comparison unit.
  const inUnit = (m: number | null): number | null => (m === null ? null : convertLength(m, 'm', u));
  const ei = eiFactor(u);
  const noBeam = 'no deflection (needs the shared span, load and materials)';
  const out = [
    minimum('minIx', 'Ix', v.Ix, t.minIx, `${u}⁴`),
    minimum('minSx', 'Sx (smaller fibre)', v.Sx, t.minSx, `${u}³`),
    minimum('minZx', 'Zx', v.Zx, t.minZx, `${u}³`),
    minimum('minEIx', 'EIx', v.EIx === null ? null : v.EIx * ei.f, t.minEIx === undefined ? undefined : t.minEIx * ei.f, ei.unit),
    maximum('maxDepth', 'depth', v.depth, t.maxDepth, u, 'no depth'),
    maximum('deflection', 'deflection under total load', inUnit(v.deflection), t.deflectionRatio === undefined ? undefined : span === null ? NaN : span / t.deflectionRatio, u, noBeam),
    maximum('liveDeflection', 'deflection under live load', inUnit(v.liveDeflection), t.liveDeflectionRatio === undefined ? undefined : span === null ? NaN : span / t.liveDeflectionRatio, u, 'no live-load deflection (needs a shared live load)'),
  ].filter((f): f is TargetFailure => f !== null);
  if (t.stressWithinLimit === true) out.push(...stressFailures(a, c));
  return out;
}

/** The lightest alternative meeting every target (weight when all have one, else area), or null. */
export function lightestMeeting(c: Comparison, targets: Targets): Pick {
  const by = c.alternatives.every((a) => a.values.weight !== null) ? 'weight' : 'A';
  const verdicts = c.alternatives.map((a) => {
    const failures = targetFailures(a, c, targets);
    return { name: a.name, meets: failures.length === 0, failures };
  });
  const ok = c.alternatives.filter((_a, i) => verdicts[i]!.meets);
  const choice = ok.reduce<Alternative | null>((best, a) => (best === null || (a.values[by] ?? Infinity) < (best.values[by] ?? Infinity) ? a : best), null);
  const failing = verdicts.filter((v) => !v.meets).map((v) => `${v.name}: ${v.failures.map((f) => f.message).join('; ')}`);
  return { choice, by, verdicts, failing };
}

/** True when any target is set. */
export function anyTarget(t: Targets): boolean {
  return Object.values(t).some((v) => v !== undefined && v !== false);
}
