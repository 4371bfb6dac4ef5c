/**
 * Comparison of alternative sections (one document each): the main properties in one length
 * unit, their ratios to a baseline alternative, efficiency measures (Ix/A, Sx/A, Zx/A), and,
 * where the document has materials, EIx, weight per length and the midspan deflection of a
 * shared simply supported span under a shared uniform load (core/member). Sorting by any
 * column and picking the lightest alternative that meets targets (Ix ≥ X, deflection ≤ L/n).
 *
 * Units: `unit` for lengths (area unit², moduli unit³, Ix unit⁴); EIx N·m², weight N/m,
 *   deflection m (SI, as core/member returns them); the span in `unit`, the load in N/m.
 * "Lightest" uses the weight per length when every candidate has one, else the area.
 */
import type { SectionDocument } from '../document/types.ts';
import { materialPiecesFromDocument } from '../materials/document.ts';
import { CAUTION, sectionMemberCheck } from '../member/index.ts';
import { sectionFromDocument } from '../section/index.ts';
import { convertLength } from '../units/index.ts';
import type { LengthUnit } from '../units/types.ts';

export { CAUTION };

export const COMPARE_COLUMNS = ['A', 'Ix', 'Iy', 'Sx', 'Zx', 'IxPerA', 'SxPerA', 'ZxPerA', 'EIx', 'weight', 'deflection'] as const;
export type CompareColumn = (typeof COMPARE_COLUMNS)[number];

export interface Alternative {
  readonly name: string;
  readonly values: Readonly<Record<CompareColumn, number | null>>;
  /** values / baseline values (null where either is missing). */
  readonly ratios: Readonly<Record<CompareColumn, number | null>>;
  /** Why material-based values are missing, when they are. */
  readonly notes: readonly string[];
}

export interface SharedBeam {
  /** Simply supported span, in the comparison unit. */
  readonly span: number;
  /** Uniform load, N/m downward. */
  readonly load: number;
}

export interface Comparison {
  readonly unit: LengthUnit;
  readonly baseline: string;
  readonly beam: SharedBeam | null;
  readonly alternatives: readonly Alternative[];
  readonly caution: string;
}

export class CompareError extends Error {}

function valuesOf(doc: SectionDocument, unit: LengthUnit, beam: SharedBeam | null): { values: Record<CompareColumn, number | null>; notes: string[] } {
  const s = sectionFromDocument(doc);
  if (s.properties === null) throw new CompareError(`"${doc.name}": ${s.diagnostics.map((d) => d.message).join('; ')}`);
  const p = s.properties;
  const L = (v: number, power: number): number => convertLength(v, doc.unit, unit, power);
  const A = L(p.area, 2), Ix = L(p.Ix, 4), Sx = L(Math.min(p.SxTop, p.SxBottom), 3), Zx = L(p.Zx, 3);
  const values: Record<CompareColumn, number | null> = { A, Ix, Iy: L(p.Iy, 4), Sx, Zx, IxPerA: Ix / A, SxPerA: Sx / A, ZxPerA: Zx / A, EIx: null, weight: null, deflection: null };
  const notes: string[] = [];
  if (doc.defaultMaterial === null && doc.parts.every((part) => part.operation !== 'add' || part.material === null)) {
    // One line instead of one per part when the section has no materials at all.
    notes.push('no EI, weight or deflection: no materials assigned (choose a default material, or one for each part)');
    return { values, notes };
  }
  const pieces = materialPiecesFromDocument(doc);
  if (pieces.issues.length > 0 || pieces.pieces.length === 0) {
    notes.push(`no EI, weight or deflection: ${pieces.issues.join('; ') || 'no material pieces'}`);
    return { values, notes };
  }
  const spanInDoc = beam === null ? 1 : convertLength(beam.span, unit, doc.unit);
  const member = sectionMemberCheck(pieces.pieces, doc.unit, { span: spanInDoc, support: 'simple', points: [], uniform: beam?.load ?? 0, selfWeight: false });
  if (!member.ok) {
    notes.push(`member check: ${member.issues.join('; ')}`);
    return { values, notes };
  }
  values.EIx = member.composite.EIx;
  values.weight = Number.isFinite(member.composite.weightPerLength) ? member.composite.weightPerLength : null;
  if (values.weight === null) notes.push('no weight: a material has no density');
  if (beam !== null) values.deflection = Math.abs(member.result.deflectionMax);
  return { values, notes };
}

/** Compares named documents; `baseline` is a document name (default: the first). */
export function compareDocuments(docs: readonly SectionDocument[], options: { unit?: LengthUnit; baseline?: string; beam?: SharedBeam | null } = {}): Comparison {
  const first = docs[0];
  if (first === undefined) throw new CompareError('nothing to compare: give at least one document');
  const unit = options.unit ?? first.unit;
  const beam = options.beam ?? null;
  const baseName = options.baseline ?? first.name;
  const computed = docs.map((d) => ({ name: d.name, ...valuesOf(d, unit, beam) }));
  const base = computed.find((c) => c.name === baseName);
  if (base === undefined) throw new CompareError(`--baseline "${baseName}": no alternative has that name; names: ${computed.map((c) => c.name).join(', ')}`);
  const alternatives = computed.map((c) => {
    const ratios = Object.fromEntries(COMPARE_COLUMNS.map((k) => {
      const v = c.values[k], b = base.values[k];
      return [k, v === null || b === null || b === 0 ? null : v / b];
    })) as Record<CompareColumn, number | null>;
    return { name: c.name, values: c.values, ratios, notes: c.notes };
  });
  return { unit, baseline: baseName, beam, alternatives, caution: CAUTION };
}

/** The alternatives sorted by a column (missing values last). */
export function sortAlternatives(c: Comparison, column: CompareColumn, descending = false): Alternative[] {
  return [...c.alternatives].sort((a, b) => {
    const x = a.values[column], y = b.values[column];
    if (x === null || y === null) return x === null ? (y === null ? 0 : 1) : -1;
    return descending ? y - x : x - y;
  });
}

export interface Targets {
  /** Ix at least this, unit⁴. */
  readonly minIx?: number;
  /** Deflection at most span / ratio (needs the shared beam). */
  readonly deflectionRatio?: number;
}

/** The lightest alternative meeting every target (weight when all have one, else area), or null. */
export function lightestMeeting(c: Comparison, targets: Targets): { choice: Alternative | null; by: 'weight' | 'A'; failing: readonly string[] } {
  const by = c.alternatives.every((a) => a.values.weight !== null) ? 'weight' : 'A';
  const failing: string[] = [];
  const ok = c.alternatives.filter((a) => {
    const why: string[] = [];
    if (targets.minIx !== undefined && !((a.values.Ix ?? 0) >= targets.minIx)) why.push(`Ix ${a.values.Ix} < ${targets.minIx}`);
    if (targets.deflectionRatio !== undefined) {
      if (c.beam === null || a.values.deflection === null) why.push('no deflection (needs --span, --load and materials)');
      else if (a.values.deflection > convertLength(c.beam.span, c.unit, 'm') / targets.deflectionRatio) why.push(`deflection over span/${targets.deflectionRatio}`);
    }
    if (why.length > 0) failing.push(`${a.name}: ${why.join(', ')}`);
    return why.length === 0;
  });
  const choice = ok.reduce<Alternative | null>((best, a) => (best === null || (a.values[by] ?? Infinity) < (best.values[by] ?? Infinity) ? a : best), null);
  return { choice, by, failing };
}

