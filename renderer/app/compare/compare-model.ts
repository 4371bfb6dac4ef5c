/**
 * The compare view's model (pure, no DOM): named alternatives in, a comparison out through
 * core/compare (values, ratios to the chosen baseline, efficiency measures, EI, weight and the
 * deflection of a shared simply supported span under a shared uniform load), the values in the
 * editor's display units, sorting by any column, targets (Ix ≥ X, deflection ≤ span/n) with the
 * lightest passing alternative and, for each other one, the reason it fails.
 *
 * Units: the comparison works in the length unit of the first alternative (`unit`), and forces,
 * EI and weights in that unit's system (core/units unitSystem: kip/ft, kip·in², lb/ft for inch
 * and foot work; kN/m, kN·m², kg/m for mm, cm and m). Every typed box reads through core/units
 * readQuantity: a bare number is in the unit the box shows (span in `unit`, load in the system's
 * line-load unit, the Ix, Sx and Zx targets in the display units of the section's properties,
 * EIx in the system's unit, depth in the display length unit); a number with its own unit
 * ("20 ft", "30 kN/m", "500 in4") is converted. Deflection is shown in the display length unit.
 * Alternatives whose geometry is invalid are left out and listed with the reason.
 */
import { anyTarget, COLUMN_HEADINGS, COMPARE_COLUMNS, compareDocuments, CompareError, comparisonCsv, comparisonSvg, lightestMeeting, sortAlternatives, stiffnessRanking, type Alternative, type CompareColumn, type Comparison, type Pick, type TargetFailure, type Targets } from '../../../core/compare/index.ts';
import { STRESS_FACTOR_MEANING } from '../../../core/member/verdict.ts';
import type { SectionDocument } from '../../../core/document/types.ts';
import type { ReportInput, ReportTable } from '../../../core/report/index.ts';
import { sectionFromDocument } from '../../../core/section/index.ts';
import { convertLength, formatSig, fromDisplay, fromSI, KINDS, readQuantity, toDisplay, toSI, unitSystem, type DisplaySet, type LengthUnit, type Quantity, type QuantityKind } from '../../../core/units/index.ts';
import { parseNumber } from '../shell/numbers.ts';
import { materialLines } from '../report/report-input.ts';

export interface CompareEntry {
  readonly name: string;
  readonly doc: SectionDocument;
}

export interface CompareInputs {
  readonly baseline: string | null;
  readonly sortBy: CompareColumn;
  readonly descending: boolean;
  /** Shared span in the comparison unit, and uniform load in kN/m or kip/ft; both blank = no beam. */
  readonly span: string;
  readonly load: string;
  /** Ix target in the display unit of second moments; blank = none. */
  readonly minIx: string;
  /** Deflection target under total load, span/n; blank = none. */
  readonly ratio: string;
  /** The live part of the load (same unit as the load), and its deflection target span/n. */
  readonly live: string;
  readonly liveRatio: string;
  /** Minimums on Sx (smaller fibre) and Zx in the display unit of moduli, EIx in kN·m² (kip·in²); maximum depth in the display length unit. */
  readonly minSx: string;
  readonly minZx: string;
  readonly minEI: string;
  readonly maxDepth: string;
  /** Target: bending stress use ≤ 1 in every material. */
  readonly stress: boolean;
  /** Stress limit factor × strength basis; blank = 1 (the default, shown with its meaning). */
  readonly stressFactor: string;
}

export const DEFAULT_INPUTS: CompareInputs = { baseline: null, sortBy: 'A', descending: false, span: '', load: '', minIx: '', ratio: '', live: '', liveRatio: '', minSx: '', minZx: '', minEI: '', maxDepth: '', stress: false, stressFactor: '' };

export interface ColumnInfo {
  readonly key: CompareColumn;
  readonly symbol: string;
  readonly meaning: string;
  readonly unit: string;
  /** A value of core/compare (comparison unit, or SI for EI, weight, deflection) in the shown unit. */
  readonly toShown: (v: number) => number;
}

export interface Verdict {
  readonly name: string;
  readonly passes: boolean;
  readonly reasons: readonly string[];
}

export type CompareModel =
  | { readonly ok: false; readonly errors: readonly string[]; readonly excluded: readonly string[] }
  | {
      readonly ok: true;
      readonly comparison: Comparison;
      readonly docs: readonly SectionDocument[];
      readonly columns: readonly ColumnInfo[];
      readonly rows: readonly Alternative[];
      /** Problems with typed inputs (span, load, targets), each naming the field. */
      readonly inputErrors: readonly string[];
      /** Alternatives left out, with the reason. */
      readonly excluded: readonly string[];
      readonly targetsSet: boolean;
      readonly lightest: string | null;
      readonly lightestBy: 'weight' | 'A';
      readonly verdicts: readonly Verdict[];
      /** Core's pick with every target failure, when targets are set (for the CSV). */
      readonly pick: Pick | null;
      /** Alternatives from stiffest down, by EIx where the materials differ (else Ix), and why. */
      readonly stiffnessRanking: readonly string[];
      readonly stiffnessNote: string;
      /** What the stress limit is (shown beside the stress target). */
      readonly stressMeaning: string;
    };

/** The units the view's force-like boxes and columns use for a comparison in `unit`. */
export function compareUnits(unit: LengthUnit): { lineLoad: string; flexuralStiffness: string; weightPerLength: string } {
  const s = unitSystem(unit).units;
  return { lineLoad: s.lineLoad, flexuralStiffness: s.flexuralStiffness, weightPerLength: s.weightPerLength };
}

/** The column list with the units the view shows. */
export function compareColumns(unit: LengthUnit, display: DisplaySet): ColumnInfo[] {
  const u = compareUnits(unit);
  const q = (quantity: Quantity, v: number, power = 1): number => toDisplay(v, unit, display[quantity]) * power;
  const info: Record<CompareColumn, Omit<ColumnInfo, 'key'>> = {
    A: { symbol: 'A', meaning: 'area', unit: display.area.label, toShown: (v) => q('area', v) },
    Ix: { symbol: COLUMN_HEADINGS.Ix, meaning: 'second moment about x of the geometry, whatever the materials', unit: display.inertia.label, toShown: (v) => q('inertia', v) },
    Iy: { symbol: COLUMN_HEADINGS.Iy, meaning: 'second moment about y of the geometry', unit: display.inertia.label, toShown: (v) => q('inertia', v) },
    Sx: { symbol: COLUMN_HEADINGS.Sx, meaning: 'elastic modulus Ix / (largest distance to a fibre): the smaller of top and bottom', unit: display.modulus.label, toShown: (v) => q('modulus', v) },
    Zx: { symbol: COLUMN_HEADINGS.Zx, meaning: 'plastic modulus about the plastic neutral axis', unit: display.modulus.label, toShown: (v) => q('modulus', v) },
    // Ix/A is a length², Sx/A and Zx/A lengths: shown in the display length unit.
    IxPerA: { symbol: 'Ix/A', meaning: 'stiffness per area', unit: `${display.length.lengthUnit}²`, toShown: (v) => convertLength(v, unit, display.length.lengthUnit, 2) },
    SxPerA: { symbol: COLUMN_HEADINGS.SxPerA, meaning: 'elastic strength per area', unit: display.length.lengthUnit, toShown: (v) => convertLength(v, unit, display.length.lengthUnit) },
    ZxPerA: { symbol: 'Zx/A', meaning: 'plastic strength per area', unit: display.length.lengthUnit, toShown: (v) => convertLength(v, unit, display.length.lengthUnit) },
    depth: { symbol: COLUMN_HEADINGS.depth, meaning: 'overall depth of the section (top to bottom)', unit: display.length.lengthUnit, toShown: (v) => convertLength(v, unit, display.length.lengthUnit) },
    EIx: { symbol: COLUMN_HEADINGS.EIx, meaning: 'bending stiffness, each material with its own E', unit: u.flexuralStiffness, toShown: (v) => fromSI(v, 'flexuralStiffness', u.flexuralStiffness) },
    weight: { symbol: 'w', meaning: 'weight per length', unit: u.weightPerLength, toShown: (v) => fromSI(v, 'weightPerLength', u.weightPerLength) },
    deflection: { symbol: 'δ total', meaning: 'largest deflection of the shared beam under the total load', unit: display.length.lengthUnit, toShown: (v) => convertLength(v, 'm', display.length.lengthUnit) },
    liveDeflection: { symbol: 'δ live', meaning: 'largest deflection of the shared beam under the live load alone', unit: display.length.lengthUnit, toShown: (v) => convertLength(v, 'm', display.length.lengthUnit) },
    stressUse: { symbol: 'σ/limit', meaning: 'bending stress use of the worst material: stress / (factor × strength basis)', unit: '%', toShown: (v) => v * 100 },
  };
  return COMPARE_COLUMNS.map((key) => ({ key, ...info[key] }));
}

/** Names made unique ("a", "a (2)"), since the baseline, rows and CSV go by name. */
export function uniqueNames(entries: readonly CompareEntry[]): CompareEntry[] {
  const seen = new Map<string, number>();
  return entries.map((e) => {
    const base = e.name.trim() || 'Untitled section';
    const n = (seen.get(base) ?? 0) + 1;
    seen.set(base, n);
    return { name: n === 1 ? base : `${base} (${n})`, doc: e.doc };
  });
}

type Typed = { value: number | null; error: string | null };
function typed(text: string, what: string, positive = true): Typed {
  if (text.trim() === '') return { value: null, error: null };
  const r = parseNumber(text, what);
  if (!r.ok) return { value: null, error: r.message };
  if (positive && !(r.value > 0)) return { value: null, error: `${what}: enter a number greater than 0, got ${text.trim()}` };
  return { value: r.value, error: null };
}

type TypedQuantity = { value: number | null; si: number | null; error: string | null };
/**
 * A typed quantity box: a bare number is in the unit the box shows (`bareToSI`), text with a unit
 * goes through core/units readQuantity; `value` is in the box's unit, `si` in SI.
 */
function typedQuantity(text: string, what: string, kind: QuantityKind, bareToSI: (v: number) => number, siToShown: (si: number) => number, positive = true): TypedQuantity {
  if (text.trim() === '') return { value: null, si: null, error: null };
  const bare = parseNumber(text, what);
  let value: number, si: number;
  if (bare.ok) {
    value = bare.value;
    si = bareToSI(value);
  } else {
    const r = readQuantity(text, { label: what, kind, unit: KINDS[kind].si });
    if (!r.ok) return { value: null, si: null, error: r.message };
    si = r.si;
    value = siToShown(si);
  }
  if (positive ? !(si > 0) : !(si >= 0)) return { value: null, si: null, error: `${what}: enter a value ${positive ? 'greater than' : 'of at least'} 0, got ${text.trim()}` };
  return { value, si, error: null };
}

interface ShownTargets {
  readonly Ix: number | null;
  readonly Sx: number | null;
  readonly Zx: number | null;
  readonly EIx: number | null;
  readonly depth: number | null;
  readonly ratio: number | null;
  readonly liveRatio: number | null;
}

/** A failure in the view's display units, worded for the screen; core's sentence where there is no shorter one. */
function shownReason(f: TargetFailure, a: Alternative, c: Comparison, columns: readonly ColumnInfo[], typedTargets: ShownTargets): string {
  const col = (k: CompareColumn): ColumnInfo => columns.find((x) => x.key === k)!;
  const fmt = (v: number): string => formatSig(v, 4);
  // A typed target reads as typed: 100, not 100.0.
  const t = (v: number): string => {
    const text = formatSig(v, 4);
    return text.includes('.') && !text.includes('e') ? text.replace(/\.?0+$/, '') : text;
  };
  const by = f.ratio === null ? '' : ` (by ${formatSig(Math.abs(f.ratio - 1) * 100, 3)} %)`;
  const min = (k: 'Ix' | 'Sx' | 'Zx' | 'EIx', typed: number | null): string => {
    const x = col(k), v = a.values[k];
    return v === null || typed === null ? f.message : `${k === 'Sx' ? COLUMN_HEADINGS.Sx : k} ${fmt(x.toShown(v))} ${x.unit} is below the ${t(typed)} ${x.unit} asked for${by}`;
  };
  const deflection = (k: 'deflection' | 'liveDeflection', ratio: number | null): string => {
    const x = col(k), v = a.values[k];
    if (c.beam === null) return 'no deflection: type the shared span and load';
    if (v === null) return `no ${k === 'liveDeflection' ? 'live-load ' : ''}deflection: ${a.notes.join('; ') || (k === 'liveDeflection' ? 'type the live part of the load' : 'no materials')}`;
    const allowed = convertLength(c.beam.span, c.unit, 'm') / (ratio ?? NaN);
    return `${k === 'liveDeflection' ? 'live-load deflection' : 'deflection'} ${fmt(x.toShown(v))} ${x.unit} exceeds span/${t(ratio ?? NaN)} = ${fmt(x.toShown(allowed))} ${x.unit}${by}`;
  };
  switch (f.target) {
    case 'minIx': return min('Ix', typedTargets.Ix);
    case 'minSx': return min('Sx', typedTargets.Sx);
    case 'minZx': return min('Zx', typedTargets.Zx);
    case 'minEIx': return min('EIx', typedTargets.EIx);
    case 'maxDepth': {
      const x = col('depth');
      return a.values.depth === null || typedTargets.depth === null ? f.message : `depth ${fmt(x.toShown(a.values.depth))} ${x.unit} exceeds the ${t(typedTargets.depth)} ${x.unit} allowed${by}`;
    }
    case 'deflection': return deflection('deflection', typedTargets.ratio);
    case 'liveDeflection': return deflection('liveDeflection', typedTargets.liveRatio);
    case 'stress': return f.message;
  }
}

function verdictsFor(c: Comparison, pick: Pick, columns: readonly ColumnInfo[], typedTargets: ShownTargets): Verdict[] {
  return pick.verdicts.map((v) => {
    const a = c.alternatives.find((x) => x.name === v.name)!;
    return { name: v.name, passes: v.meets, reasons: v.failures.map((f) => shownReason(f, a, c, columns, typedTargets)) };
  });
}

/** Everything the view shows, from the alternatives and what the user typed. */
export function compareModel(entries: readonly CompareEntry[], inputs: CompareInputs, display: DisplaySet): CompareModel {
  const named = uniqueNames(entries);
  const excluded: string[] = [];
  const valid = named.filter((e) => {
    const s = sectionFromDocument(e.doc);
    if (s.properties === null) excluded.push(`${e.name}: ${s.diagnostics.map((x) => x.message).join('; ') || 'the section has no area'}`);
    return s.properties !== null;
  });
  if (valid.length === 0) return { ok: false, errors: ['nothing to compare: no alternative has a valid section'], excluded };
  const unit = valid[0]!.doc.unit;
  const u = compareUnits(unit);
  const length = (shown: LengthUnit) => [(v: number): number => convertLength(v, shown, 'm'), (si: number): number => convertLength(si, 'm', shown)] as const;
  const section = (q: 'inertia' | 'modulus', power: number) => [(v: number): number => convertLength(fromDisplay(v, unit, display[q]), unit, 'm', power), (si: number): number => toDisplay(convertLength(si, 'm', unit, power), unit, display[q])] as const;
  const system = (kind: QuantityKind, shown: string) => [(v: number): number => toSI(v, kind, shown), (si: number): number => fromSI(si, kind, shown)] as const;
  const span = typedQuantity(inputs.span, `span (${unit})`, 'length', ...length(unit));
  const load = typedQuantity(inputs.load, `uniform load (${u.lineLoad})`, 'lineLoad', ...system('lineLoad', u.lineLoad));
  const minIxTyped = typedQuantity(inputs.minIx, `Ix target (${display.inertia.label})`, 'inertia', ...section('inertia', 4));
  const ratioTyped = typed(inputs.ratio, 'deflection target span/n');
  const liveTyped = typedQuantity(inputs.live, `live part of the load (${u.lineLoad})`, 'lineLoad', ...system('lineLoad', u.lineLoad), false);
  const liveRatioTyped = typed(inputs.liveRatio, 'live-load deflection target span/n');
  const minSxTyped = typedQuantity(inputs.minSx, `Sx target (${display.modulus.label})`, 'modulus', ...section('modulus', 3));
  const minZxTyped = typedQuantity(inputs.minZx, `Zx target (${display.modulus.label})`, 'modulus', ...section('modulus', 3));
  const minEITyped = typedQuantity(inputs.minEI, `EIx target (${u.flexuralStiffness})`, 'flexuralStiffness', ...system('flexuralStiffness', u.flexuralStiffness));
  const maxDepthTyped = typedQuantity(inputs.maxDepth, `depth limit (${display.length.lengthUnit})`, 'length', ...length(display.length.lengthUnit));
  const factorTyped = typed(inputs.stressFactor, 'stress limit factor');
  const all = [span, load, minIxTyped, ratioTyped, liveTyped, liveRatioTyped, minSxTyped, minZxTyped, minEITyped, maxDepthTyped, factorTyped];
  const inputErrors = all.map((x) => x.error).filter((e): e is string => e !== null);
  if (liveTyped.si !== null && load.si !== null && !(liveTyped.si <= load.si)) inputErrors.push(`live part of the load: must be between 0 and the total load ${formatSig(load.value ?? NaN, 4)} ${u.lineLoad}, got ${formatSig(liveTyped.value ?? NaN, 4)} ${u.lineLoad}`);
  if ((span.value === null) !== (load.value === null) && span.error === null && load.error === null) inputErrors.push('the shared beam needs both a span and a uniform load');
  const spanInUnit = span.si === null ? null : convertLength(span.si, 'm', unit);
  const liveNPerM = liveTyped.si === null || load.si === null || !(liveTyped.si <= load.si) ? null : liveTyped.si;
  const beam = spanInUnit !== null && load.si !== null ? { span: spanInUnit, load: load.si, ...(liveNPerM !== null ? { live: liveNPerM } : {}) } : null;
  const docs = valid.map((e) => ({ ...e.doc, name: e.name }));
  const baseline = inputs.baseline !== null && valid.some((e) => e.name === inputs.baseline) ? inputs.baseline : valid[0]!.name;
  let comparison: Comparison;
  try {
    comparison = compareDocuments(docs, { unit, baseline, beam, ...(factorTyped.value !== null ? { stressLimits: { factor: factorTyped.value } } : {}) });
  } catch (err) {
    if (err instanceof CompareError) return { ok: false, errors: [err.message], excluded };
    throw err;
  }
  const columns = compareColumns(unit, display);
  const inUnit = (si: number | null, power: number): number | null => (si === null ? null : convertLength(si, 'm', unit, power));
  const minIx = inUnit(minIxTyped.si, 4);
  const minSx = inUnit(minSxTyped.si, 3);
  const minZx = inUnit(minZxTyped.si, 3);
  const minEIx = minEITyped.si;
  const maxDepth = inUnit(maxDepthTyped.si, 1);
  const ratio = ratioTyped.value;
  const liveRatio = liveRatioTyped.value;
  const targets: Targets = {
    ...(minIx !== null ? { minIx } : {}), ...(minSx !== null ? { minSx } : {}), ...(minZx !== null ? { minZx } : {}), ...(minEIx !== null ? { minEIx } : {}),
    ...(maxDepth !== null ? { maxDepth } : {}), ...(ratio !== null ? { deflectionRatio: ratio } : {}), ...(liveRatio !== null ? { liveDeflectionRatio: liveRatio } : {}),
    ...(inputs.stress ? { stressWithinLimit: true } : {}),
  };
  const targetsSet = anyTarget(targets);
  const pick = lightestMeeting(comparison, targets);
  const shownTargets: ShownTargets = { Ix: minIxTyped.value, Sx: minSxTyped.value, Zx: minZxTyped.value, EIx: minEITyped.value, depth: maxDepthTyped.value, ratio, liveRatio };
  return {
    ok: true,
    comparison,
    docs,
    columns,
    rows: sortAlternatives(comparison, inputs.sortBy, inputs.descending),
    inputErrors,
    excluded,
    targetsSet,
    lightest: targetsSet ? (pick.choice?.name ?? null) : null,
    lightestBy: pick.by,
    verdicts: targetsSet ? verdictsFor(comparison, pick, columns, shownTargets) : [],
    pick: targetsSet ? pick : null,
    stiffnessRanking: stiffnessRanking(comparison).map((a) => a.name),
    stiffnessNote: comparison.stiffnessNote,
    stressMeaning: STRESS_FACTOR_MEANING,
  };
}

/** Clicking a column header: a new column sorts ascending, the same one again flips the order. */
export function nextSort(inputs: CompareInputs, column: CompareColumn): CompareInputs {
  return inputs.sortBy === column ? { ...inputs, descending: !inputs.descending } : { ...inputs, sortBy: column, descending: false };
}

export function shownNumber(v: number | null, col: ColumnInfo, sig: number): string {
  return v === null ? '–' : formatSig(col.toShown(v), sig);
}

export function shownRatio(r: number | null): string {
  return r === null ? '' : `${formatSig(r, 3)}×`;
}

/** The comparison as files: CSV (full precision, core units) and SVG (outlines at one scale). */
export function comparisonFiles(m: Extract<CompareModel, { ok: true }>, stem: string): { csv: { suggestedName: string; mimeType: string; text: string }; svg: { suggestedName: string; mimeType: string; text: string } } {
  return {
    csv: { suggestedName: `${stem}-comparison.csv`, mimeType: 'text/csv', text: comparisonCsv({ ...m.comparison, alternatives: m.rows }, m.pick) },
    svg: { suggestedName: `${stem}-comparison.svg`, mimeType: 'image/svg+xml', text: comparisonSvg(m.docs, m.comparison.unit) },
  };
}

/** A line load (N/m) in the comparison unit's system, with its unit: "2.000 kip/ft", "30.00 kN/m". */
function beamLoad(nPerM: number, unit: LengthUnit): string {
  const lu = compareUnits(unit).lineLoad;
  return `${formatSig(fromSI(nPerM, 'lineLoad', lu), 4)} ${lu}`;
}

/** The comparison as a report: outlines, the table with ratios, the targets and verdicts, materials, shared-beam results. */
export function comparisonReportInput(m: Extract<CompareModel, { ok: true }>, sig: number, date?: string): ReportInput {
  const c = m.comparison;
  const head = (cols: readonly ColumnInfo[]): string[] => ['alternative', ...cols.map((k) => `${k.symbol} [${k.unit}]`)];
  const body = (cols: readonly ColumnInfo[]): string[][] => m.rows.map((a) => [`${a.name}${a.name === c.baseline ? ' (baseline)' : ''}${a.name === m.lightest ? ' (lightest meeting the targets)' : ''}`, ...cols.map((k) => `${shownNumber(a.values[k.key], k, sig)}${a.ratios[k.key] === null ? '' : ` (${shownRatio(a.ratios[k.key])})`}`)]);
  const geometric = m.columns.filter((k) => ['A', 'Ix', 'Iy', 'Sx', 'Zx'].includes(k.key));
  const efficiency = m.columns.filter((k) => !['A', 'Ix', 'Iy', 'Sx', 'Zx'].includes(k.key));
  const tables: ReportTable[] = [
    { title: `Properties (ratio to "${c.baseline}" in brackets)`, columns: head(geometric), rows: body(geometric) },
    { title: 'Efficiency, stiffness, weight, deflection and stress', columns: head(efficiency), rows: body(efficiency) },
    { title: `Stiffness ranking (${m.stiffnessNote})`, columns: ['rank', 'alternative'], textColumns: [1], rows: m.stiffnessRanking.map((n, i) => [String(i + 1), n]) },
  ];
  if (m.targetsSet) tables.push({ title: 'Targets', columns: ['alternative', 'meets every target', 'targets not met (by how much)'], textColumns: [1, 2], rows: m.verdicts.map((v) => [v.name, v.passes ? 'yes' : 'no', v.reasons.join('; ')]) });
  const d = m.columns.find((k) => k.key === 'deflection')!;
  const checks = c.beam === null ? [] : [
    `Shared beam: simply supported, span ${formatSig(c.beam.span, 4)} ${c.unit}, uniform load ${beamLoad(c.beam.load, c.unit)}${c.beam.live !== undefined ? ` (live part ${beamLoad(c.beam.live, c.unit)})` : ''}, self-weight not included; deflection 5wL⁴/(384 EI) at midspan.`,
    ...m.rows.map((a) => `${a.name}: midspan deflection ${shownNumber(a.values.deflection, d, sig)} ${a.values.deflection === null ? `(${a.notes.join('; ')})` : d.unit}${a.stress.length > 0 ? `; bending stress use ${a.stress.map((u) => `${u.material} ${u.ratio === undefined ? 'not checked' : `${formatSig(u.ratio * 100, 3)} %`}`).join(', ')}` : ''}.`),
    `Stress limits: ${m.stressMeaning}`,
  ];
  if (m.targetsSet) checks.push(m.lightest === null ? 'No alternative meets the targets.' : `Lightest meeting the targets (by ${m.lightestBy === 'weight' ? 'weight' : 'area'}): ${m.lightest}.`);
  return {
    title: `Comparison of ${c.alternatives.length} alternative${c.alternatives.length === 1 ? '' : 's'}`,
    drawings: [comparisonSvg(m.docs, c.unit)],
    tables,
    materials: m.docs.flatMap((doc) => materialLines(doc).map((l) => `${doc.name} — ${l}`)),
    memberChecks: checks,
    torsion: null,
    ...(date !== undefined ? { date } : {}),
  };
}
