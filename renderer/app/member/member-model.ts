/**
 * The member panel's view logic, without React: the input boxes of the section's stored member
 * case (core/document: MemberInputs, SI), the check itself (core/member), and the numbers shown.
 *
 * Units: the document's unit system (core/units/systems.ts). Span and load positions in the
 * document unit; forces kN or kip; line loads kN/m or kip/ft; moments kN·m or kip·ft; stresses
 * MPa or ksi; deflections mm or in. Every box reads through core/units' readQuantity, so a bare
 * number is in the unit shown and any supported unit may be typed; the values are kept in SI.
 * The deflection limits and the stress factor are plain ratios ("360" or "L/360").
 */
import { anyLoad, memberInputsOf } from '../../../core/document/inputs.ts';
import type { AllowableInput, LoadSet, MemberInputs, SectionDocument } from '../../../core/document/types.ts';
import { materialPiecesFromDocument } from '../../../core/materials/index.ts';
import { memberCaseInput, sectionMemberCheck, type Criterion, type MemberResult, type SectionMemberInput } from '../../../core/member/index.ts';
import { convertLength, fromSI, unitSystem, type LengthUnit } from '../../../core/units/index.ts';
import type { FieldRead, InputField } from '../shell/quantity-text.ts';
import { readField } from '../shell/quantity-text.ts';
import type { MemberCase } from '../report/report-input.ts';


export type LoadKey = 'dead' | 'live';
export type MemberFieldKey = 'span' | `${LoadKey}W` | `${LoadKey}P` | `${LoadKey}A` | 'totalLimit' | 'liveLimit' | 'stressFactor';

/** The unit of each shown quantity for this document. */
export function memberUnits(unit: LengthUnit): { length: string; force: string; line: string; moment: string; stress: string; deflection: string } {
  const s = unitSystem(unit);
  return { length: s.length, force: s.units.force, line: s.units.lineLoad, moment: s.units.moment, stress: s.units.stress, deflection: s.deflection };
}

/** Every box of the member case: its name in messages, kind and unit. */
export function memberFields(unit: LengthUnit): Readonly<Record<MemberFieldKey, InputField>> {
  const u = memberUnits(unit);
  return {
    span: { label: 'span L', kind: 'length', unit: u.length },
    deadW: { label: 'uniform load w (dead and other)', kind: 'lineLoad', unit: u.line },
    deadP: { label: 'point load P (dead and other)', kind: 'force', unit: u.force },
    deadA: { label: 'position a of P', kind: 'length', unit: u.length },
    liveW: { label: 'live uniform load wL', kind: 'lineLoad', unit: u.line },
    liveP: { label: 'live point load PL', kind: 'force', unit: u.force },
    liveA: { label: 'position a of PL', kind: 'length', unit: u.length },
    totalLimit: { label: 'total-load limit L/…', kind: 'ratio', unit: '–' },
    liveLimit: { label: 'live-load limit L/…', kind: 'ratio', unit: '–' },
    stressFactor: { label: 'stress limit factor', kind: 'ratio', unit: '–' },
  };
}

/** The allowable boxes of one material. */
export function allowableFields(materialName: string, unit: LengthUnit): { bending: InputField; shear: InputField } {
  const u = memberUnits(unit);
  return {
    bending: { label: `allowable bending stress in ${materialName}`, kind: 'stress', unit: u.stress },
    shear: { label: `allowable shear stress in ${materialName}`, kind: 'stress', unit: u.stress },
  };
}

/** What a box accepts beyond its kind: more than zero (spans, ratios, allowables) or from zero (positions). */
export type FieldRange = 'positive' | 'non-negative' | 'any';

export const FIELD_RANGE: Readonly<Record<MemberFieldKey, FieldRange>> = {
  span: 'positive', deadW: 'any', deadP: 'any', deadA: 'non-negative', liveW: 'any', liveP: 'any', liveA: 'non-negative',
  totalLimit: 'positive', liveLimit: 'positive', stressFactor: 'positive',
};

/** Reads a box; a ratio box also takes "L/360". Refusals name the box and the text. */
export function readMemberField(text: string, field: InputField, range: FieldRange = 'any'): FieldRead {
  const r = readField(field.kind === 'ratio' ? text.replace(/^\s*L\s*\//i, '') : text, field);
  if (!r.ok) return r;
  if (range === 'positive' && !(r.si > 0)) return { ok: false, message: `${field.label}: "${text}" must be more than zero` };
  if (range === 'non-negative' && r.si < 0) return { ok: false, message: `${field.label}: "${text}" is before the left end; give a position from 0 to L` };
  return r;
}

const loadOf = (m: MemberInputs, k: LoadKey): LoadSet => m[k];

/** The stored value of a box (SI; null for a point load's position at its default). */
export function memberValue(m: MemberInputs, key: MemberFieldKey): number | null {
  switch (key) {
    case 'span': return m.span;
    case 'deadW': case 'liveW': return loadOf(m, key === 'deadW' ? 'dead' : 'live').uniform;
    case 'deadP': case 'liveP': return loadOf(m, key === 'deadP' ? 'dead' : 'live').points[0]?.P ?? 0;
    case 'deadA': case 'liveA': return loadOf(m, key === 'deadA' ? 'dead' : 'live').points[0]?.a ?? null;
    case 'totalLimit': return m.totalLimit;
    case 'liveLimit': return m.liveLimit;
    case 'stressFactor': return m.stressFactor;
  }
}

/** The member case with one box's value set (SI; null clears a point load's position). */
export function withMemberValue(m: MemberInputs, key: MemberFieldKey, si: number | null): MemberInputs {
  const point = (set: LoadSet, change: { P?: number; a?: number | null }): LoadSet => {
    const first = set.points[0] ?? { P: 0 };
    const P = change.P ?? first.P;
    const a = change.a === undefined ? first.a : change.a;
    return { ...set, points: [{ P, ...(a !== null && a !== undefined ? { a } : {}) }, ...set.points.slice(1)] };
  };
  switch (key) {
    case 'span': return { ...m, span: si ?? m.span };
    case 'deadW': return { ...m, dead: { ...m.dead, uniform: si ?? 0 } };
    case 'liveW': return { ...m, live: { ...m.live, uniform: si ?? 0 } };
    case 'deadP': return { ...m, dead: point(m.dead, { P: si ?? 0 }) };
    case 'liveP': return { ...m, live: point(m.live, { P: si ?? 0 }) };
    case 'deadA': return { ...m, dead: point(m.dead, { a: si }) };
    case 'liveA': return { ...m, live: point(m.live, { a: si }) };
    case 'totalLimit': return { ...m, totalLimit: si ?? m.totalLimit };
    case 'liveLimit': return { ...m, liveLimit: si ?? m.liveLimit };
    case 'stressFactor': return { ...m, stressFactor: si ?? m.stressFactor };
  }
}

/** The member case with a material's typed allowable set or cleared (null). */
export function withAllowable(m: MemberInputs, material: string, which: 'bending' | 'shear', si: number | null): MemberInputs {
  const list = m.allowables ?? [];
  const old = list.find((a) => a.material === material) ?? { material };
  const { [which]: _gone, ...rest } = old;
  const next: AllowableInput = si === null ? rest : { ...rest, [which]: si };
  const others = list.filter((a) => a.material !== material);
  const kept = next.bending !== undefined || next.shear !== undefined ? [...others, next] : others;
  const { allowables: _old, ...base } = m;
  return kept.length > 0 ? { ...base, allowables: kept } : base;
}

export const allowableOf = (m: MemberInputs, material: string, which: 'bending' | 'shear'): number | null => m.allowables?.find((a) => a.material === material)?.[which] ?? null;

/** One part's bending stresses and its use ratio against its material's limit. */
export interface PartUse {
  readonly name: string;
  readonly materialId: string;
  /** Pa. */
  readonly tension: number;
  readonly compression: number;
  /** Largest |σ| / the limit of its material; undefined when that material has no limit. */
  readonly ratio?: number;
}

export type MemberOutcome =
  | { readonly kind: 'error'; readonly message: string }
  | { readonly kind: 'no-load'; readonly message: string }
  | { readonly kind: 'done'; readonly result: MemberResult; readonly input: SectionMemberInput; readonly parts: readonly PartUse[]; readonly materials: readonly { id: string; name: string }[] };

/** The materials of the section's pieces, once each, in part order. */
export function sectionMaterials(doc: SectionDocument): { id: string; name: string }[] {
  const found = materialPiecesFromDocument(doc);
  const seen = new Map<string, string>();
  for (const p of found.pieces) if (!seen.has(p.material.id)) seen.set(p.material.id, p.material.name);
  return [...seen].map(([id, name]) => ({ id, name }));
}

/** The member check of the section's stored case. */
export function memberOutcome(doc: SectionDocument, valid: boolean): MemberOutcome {
  if (!valid) return { kind: 'error', message: 'The section needs valid geometry first.' };
  const m = memberInputsOf(doc);
  const pieces = materialPiecesFromDocument(doc);
  if (pieces.issues.length > 0 || pieces.pieces.length === 0) return { kind: 'error', message: `Materials: ${pieces.issues.join('; ') || 'choose a material (Materials and stiffness)'}` };
  if (!anyLoad(m) && !m.selfWeight) return { kind: 'no-load', message: 'No load yet: type a uniform or point load (dead or live), or include the self-weight.' };
  const input = memberCaseInput(doc.unit, m);
  const r = sectionMemberCheck(pieces.pieces, doc.unit, input);
  if (!r.ok) return { kind: 'error', message: r.issues.join(' ') };
  const limits = new Map<string, Criterion>();
  for (const c of r.result.verdict.criteria) if (c.kind === 'bending' && c.materialId !== undefined) limits.set(c.materialId, c);
  const parts = r.result.stresses.map((s, i): PartUse => {
    const materialId = pieces.pieces[i]?.material.id ?? s.id;
    const limit = limits.get(materialId)?.limit;
    const peak = Math.max(Math.abs(s.maxTension), Math.abs(s.maxCompression));
    return { name: s.name, materialId, tension: s.maxTension, compression: s.maxCompression, ...(limit !== undefined ? { ratio: peak / limit } : {}) };
  });
  return { kind: 'done', result: r.result, input, parts, materials: sectionMaterials(doc) };
}

/** The member case for the report: the stored one, with lengths in the document unit. */
export function memberCaseOf(doc: SectionDocument): MemberCase | null {
  const m = memberInputsOf(doc);
  if (!anyLoad(m) && !m.selfWeight) return null;
  return { unit: doc.unit, input: memberCaseInput(doc.unit, m) };
}

/** SI → shown units, for the panel's numbers. */
export function shown(unit: LengthUnit): { deflection: (m: number) => number; length: (m: number) => number; moment: (nm: number) => number; stress: (pa: number) => number; force: (n: number) => number } {
  const u = memberUnits(unit);
  return {
    deflection: (m) => convertLength(m, 'm', u.deflection as LengthUnit),
    length: (m) => convertLength(m, 'm', unit),
    moment: (nm) => fromSI(nm, 'moment', u.moment),
    stress: (pa) => fromSI(pa, 'stress', u.stress),
    force: (n) => fromSI(n, 'force', u.force),
  };
}
