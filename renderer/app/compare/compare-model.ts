/**
 * The compare view's model (pure, no DOM): named alternatives in, a comparison out through
 * core/compare (values, ratios to the chosen baseline, efficiency measures, EI, weight and the
 * deflection of a shared simply supported span under a shared uniform load), the values in the
 * editor's display units, sorting by any column, targets (Ix ≥ X, deflection ≤ span/n) with the
 * lightest passing alternative and, for each other one, the reason it fails.
 *
 * Units: the comparison works in the length unit of the first alternative (`unit`). The span is
 * typed in that unit; the uniform load in kN/m (kip/ft for inch and foot work); the Ix target in
 * the display unit of second moments. EI is shown in kN·m² (kip·in²), weight in kN/m (lb/ft),
 * deflection in the display length unit. Alternatives whose geometry is invalid are left out
 * and listed with the reason.
 */
import { anyTarget, COLUMN_HEADINGS, COMPARE_COLUMNS, compareDocuments, CompareError, comparisonCsv, comparisonSvg, lightestMeeting, sortAlternatives, stiffnessRanking, type Alternative, type CompareColumn, type Comparison, type Pick, type TargetFailure, type Targets } from '../../../core/compare/index.ts';
import { STRESS_FACTOR_MEANING } from '../../../core/member/verdict.ts';
import type { SectionDocument } from '../../../core/document/types.ts';
import type { ReportInput, ReportTable } from '../../../core/report/index.ts';
import { sectionFromDocument } from '../../../core/section/index.ts';
import { convertLength, formatSig, fromDisplay, toDisplay, type DisplaySet, type LengthUnit, type Quantity } from '../../../core/units/index.ts';
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

const inchWork = (u: LengthUnit): boolean => u === 'in' || u === 'ft';
const N_PER_KIP = 4448.2216152605; // exact: 1 lbf = 4.4482216152605 N
const N_PER_LBF = 4.4482216152605;

/** The column list with the units the view shows. */
export function compareColumns(unit: LengthUnit, display: DisplaySet): ColumnInfo[] {
  const inch = inchWork(unit);
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
    EIx: inch
      ? { symbol: COLUMN_HEADINGS.EIx, meaning: 'bending stiffness, each material with its own E', unit: 'kip·in²', toShown: (v) => v / N_PER_KIP / 0.0254 ** 2 }
      : { symbol: COLUMN_HEADINGS.EIx, meaning: 'bending stiffness, each material with its own E', unit: 'kN·m²', toShown: (v) => v / 1000 },
    weight: inch
      ? { symbol: 'w', meaning: 'weight per length', unit: 'lb/ft', toShown: (v) => (v * 0.3048) / N_PER_LBF }
      : { symbol: 'w', meaning: 'weight per length', unit: 'kN/m', toShown: (v) => v / 1000 },
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
  const inch = inchWork(unit);
  const span = typed(inputs.span, `span (${unit})`);
  const load = typed(inputs.load, `uniform load (${inch ? 'kip/ft' : 'kN/m'})`);
  const minIxTyped = typed(inputs.minIx, `Ix target (${display.inertia.label})`);
  const ratioTyped = typed(inputs.ratio, 'deflection target span/n');
  const liveTyped = typed(inputs.live, `live part of the load (${inch ? 'kip/ft' : 'kN/m'})`, false);
  const liveRatioTyped = typed(inputs.liveRatio, 'live-load deflection target span/n');
  const minSxTyped = typed(inputs.minSx, `Sx target (${display.modulus.label})`);
  const minZxTyped = typed(inputs.minZx, `Zx target (${display.modulus.label})`);
  const minEITyped = typed(inputs.minEI, `EIx target (${inch ? 'kip·in²' : 'kN·m²'})`);
  const maxDepthTyped = typed(inputs.maxDepth, `depth limit (${display.length.lengthUnit})`);
  const factorTyped = typed(inputs.stressFactor, 'stress limit factor');
  const all = [span, load, minIxTyped, ratioTyped, liveTyped, liveRatioTyped, minSxTyped, minZxTyped, minEITyped, maxDepthTyped, factorTyped];
  const inputErrors = all.map((x) => x.error).filter((e): e is string => e !== null);
  if (liveTyped.value !== null && load.value !== null && !(liveTyped.value >= 0 && liveTyped.value <= load.value)) inputErrors.push(`live part of the load: must be between 0 and the total load ${load.value}, got ${liveTyped.value}`);
  if ((span.value === null) !== (load.value === null) && span.error === null && load.error === null) inputErrors.push('the shared beam needs both a span and a uniform load');
  // kN/m → N/m ×1000; kip/ft → N/m × 4448.2216152605 / 0.3048 (exact factors).
  const loadNPerM = load.value === null ? null : load.value * (inch ? N_PER_KIP / 0.3048 : 1000);
  const perLoad = inch ? N_PER_KIP / 0.3048 : 1000;
  const liveNPerM = liveTyped.value === null || load.value === null || !(liveTyped.value <= load.value) ? null : liveTyped.value * perLoad;
  const beam = span.value !== null && loadNPerM !== null ? { span: span.value, load: loadNPerM, ...(liveNPerM !== null ? { live: liveNPerM } : {}) } : null;
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
  const minIx = minIxTyped.value === null ? null : fromDisplay(minIxTyped.value, unit, display.inertia);
  const minSx = minSxTyped.value === null ? null : fromDisplay(minSxTyped.value, unit, display.modulus);
  const minZx = minZxTyped.value === null ? null : fromDisplay(minZxTyped.value, unit, display.modulus);
  // kN·m² → N·m² × 1000; kip·in² → N·m² × 4448.2216152605 · 0.0254² (exact factors).
  const minEIx = minEITyped.value === null ? null : minEITyped.value * (inch ? N_PER_KIP * 0.0254 ** 2 : 1000);
  const maxDepth = maxDepthTyped.value === null ? null : convertLength(maxDepthTyped.value, display.length.lengthUnit, unit);
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
    `Shared beam: simply supported, span ${formatSig(c.beam.span, 4)} ${c.unit}, uniform load ${formatSig(c.beam.load / 1000, 4)} kN/m${c.beam.live !== undefined ? ` (live part ${formatSig(c.beam.live / 1000, 4)} kN/m)` : ''}, self-weight not included; deflection 5wL⁴/(384 EI) at midspan.`,
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
