/**
 * Checking a table of shapes: each row's published dimensions are rebuilt into a part with the
 * parts library (conventions in shapes.ts), its properties computed exactly (core/properties,
 * Green's theorem over straight and circular-arc edges), and every tabulated property that the
 * mapping names compared with the computed one. A property is flagged when
 * |computed / tabulated − 1| exceeds its tolerance (default 1 %, per property, per family).
 * Designations of inch tables are also read as AISC labels (W14X90, L4X4X1/2, HSS6X6X1/4) and
 * compared with the row: a label that names another family, weight or size is flagged.
 *
 * Units: plain numbers are in `unit` (default in); a column's own unit (header suffix or
 *   bracket) overrides it. Results are in the working unit: the table unit.
 * Bad input (no designation column, a non-numeric cell, an unknown type, a row with more cells
 *   than the header) throws TableInputError naming the row and the column. A row whose
 *   dimensions cannot build a shape is a finding about the table: that row is flagged.
 * Rows are numbered from 1 for the first row below the header (blank lines are not counted).
 */
import Papa from 'papaparse';
import { catalogueEntry, similarDesignations } from '../catalogue/index.ts';
import { CAUTION } from '../member/check.ts';
import { shapeRegion } from '../parts/index.ts';
import { sectionProperties } from '../properties/index.ts';
import type { SectionProperties } from '../properties/types.ts';
import { convertLength } from '../units/index.ts';
import type { LengthUnit } from '../units/types.ts';
import { CHECKED_PROPERTIES, mapColumns, type ColumnMapping } from './columns.ts';
import { COLD_FORMED_FAMILIES, familyOf, TABLE_FAMILIES, tablePart, type TableFamily } from './shapes.ts';

export { CAUTION };

/** Relative tolerances (0.01 = 1 %): a default, per property, and per family and property. */
export interface Tolerances {
  readonly default: number;
  readonly byProperty?: Readonly<Record<string, number>>;
  readonly byFamily?: Readonly<Record<string, Readonly<Record<string, number>>>>;
}

export const DEFAULT_TOLERANCE = 0.01;

/**
 * Relative tolerance of a label's nominal weight against the computed area × 490 lb/ft³.
 * Measured over every catalogue shape rebuilt from its dimensions: W, HP, S, WT, ST within
 * 2.5 % (HP8X36 worst), so 3 %; the light M, C, MC, MT shapes up to 11.4 % (M3X2.9), so 12 %.
 */
export const LABEL_WEIGHT_TOLERANCE: Readonly<Partial<Record<TableFamily, number>>> = { W: 0.03, HP: 0.03, S: 0.03, WT: 0.03, ST: 0.03, M: 0.12, C: 0.12, MC: 0.12, MT: 0.12 };
/** Published dimensions are printed to 3 significant figures: a row agrees with the catalogue within 0.5 %. */
export const CATALOGUE_DIMENSION_TOLERANCE = 0.005;
/** Steel weight density, lb/ft³ (common practice; AISC Manual tables use 490). */
export const STEEL_LB_PER_FT3 = 490;

export interface CheckOptions {
  /** The unit of plain numbers (columns without a unit of their own). Default 'in'. */
  readonly unit?: LengthUnit;
  /** The family of every row without a type column (or with an empty type cell). */
  readonly type?: TableFamily;
  /** User corrections "column → target" (see columns.ts roleFromTarget). */
  readonly overrides?: Readonly<Record<string, string>>;
  /** A mapping stored earlier; overrides win over it. */
  readonly mapping?: ColumnMapping;
  readonly tolerances?: Tolerances;
  /** Read designations as AISC labels (default: when the table unit is in). */
  readonly readLabels?: boolean;
  /** Called after each row with the rows done and the rows in all (a view's progress bar). */
  readonly onProgress?: (done: number, total: number) => void;
}

export interface PropertyCheck {
  readonly symbol: string;
  /** Tabulated and computed values in the working unit, powers as CHECKED_PROPERTIES. */
  readonly tabulated: number;
  readonly computed: number;
  /** computed / tabulated − 1. */
  readonly deviation: number;
  readonly tolerance: number;
  readonly flagged: boolean;
}

export interface RowCheck {
  /** 1 for the first row below the header. */
  readonly row: number;
  readonly designation: string;
  readonly family: TableFamily;
  /** The part the row built (dimensions in the working unit), or null when it could not be built. */
  readonly part: { readonly shape: string; readonly params: Readonly<Record<string, number>>; readonly modelling: string } | null;
  readonly properties: readonly PropertyCheck[];
  /** Plain sentences: deviations beyond tolerance, label mismatches, geometry problems. */
  readonly findings: readonly string[];
  readonly flagged: boolean;
}

export interface WorstDeviation {
  readonly row: number;
  readonly designation: string;
  readonly symbol: string;
  readonly deviation: number;
  readonly flagged: boolean;
}

export interface TableCheck {
  readonly unit: LengthUnit;
  readonly mapping: ColumnMapping;
  readonly rows: readonly RowCheck[];
  readonly summary: {
    readonly rowsChecked: number;
    readonly rowsFlagged: number;
    readonly propertiesChecked: number;
    readonly propertiesFlagged: number;
    /** The largest |deviation| of each property symbol, largest first. */
    readonly worst: readonly WorstDeviation[];
  };
  /** Columns read but not checked, with why. */
  readonly ignoredColumns: readonly { readonly header: string; readonly why: string }[];
  readonly caution: string;
}

export class TableInputError extends Error {}

const NUMBER = /^[+-]?(?:\d+\.?\d*|\.\d+)(?:[eE][+-]?\d+)?$/;
const GROUPED = /^[+-]?\d{1,3}(?:,\d{3})+(?:\.\d+)?$/;

/** A number cell ("1.25", "16,000", "1e3"); undefined when empty; throws naming the place when not a number. */
function numberCell(text: string, where: () => string): number | undefined {
  const t = text.trim();
  if (t === '') return undefined;
  if (NUMBER.test(t)) return Number(t);
  if (GROUPED.test(t)) return Number(t.replaceAll(',', ''));
  throw new TableInputError(`${where()}: "${t}" is not a number`);
}

/** The rows of a CSV text (RFC 4180; papaparse), header first; blank rows dropped. */
export function parseTable(text: string): { headers: string[]; rows: string[][] } {
  const parsed = Papa.parse<string[]>(text.replace(/^\uFEFF/, ''), { header: false, skipEmptyLines: false });
  const serious = parsed.errors.find((e) => e.type === 'Quotes');
  if (serious !== undefined) throw new TableInputError(`CSV: ${serious.message} (row ${serious.row ?? '?'})`);
  const all = parsed.data.filter((r) => r.some((c) => c.trim() !== ''));
  const [headers, ...rows] = all;
  if (headers === undefined) throw new TableInputError('the table is empty: expected a header row and rows of shapes');
  const trimmed = headers.map((h) => h.trim());
  trimmed.forEach((h, i) => {
    if (h === '') throw new TableInputError(`header: column ${i + 1} has no name`);
  });
  return { headers: trimmed, rows };
}

function toleranceOf(t: Tolerances, family: string, symbol: string): number {
  return t.byFamily?.[family]?.[symbol] ?? t.byProperty?.[symbol] ?? t.default;
}

function computedValue(symbol: string, p: SectionProperties): number {
  switch (symbol) {
    case 'A': return p.area;
    case 'Ix': return p.Ix;
    case 'Iy': return p.Iy;
    case 'Sx': return Math.min(p.SxTop, p.SxBottom);
    case 'Sy': return Math.min(p.SyLeft, p.SyRight);
    case 'Zx': return p.Zx;
    case 'Zy': return p.Zy;
    case 'rx': return p.rx;
    case 'ry': return p.ry;
    case 'Iw': return p.I1;
    case 'Iz': return p.I2;
    case 'rz': return p.r2;
    default: throw new TableInputError(`no computed value for "${symbol}"`);
  }
}

const pct = (v: number): string => `${(v * 100).toFixed(2)} %`;
const short = (v: number): string => String(Number(v.toPrecision(4)));

/** A fraction or decimal of a label in inches: "1/2", "1-1/2", ".250", "6.625", "6". */
export function labelNumber(text: string): number {
  const m = /^(?:(\d+)-)?(\d+)\/(\d+)$/.exec(text);
  if (m !== null) return (m[1] === undefined ? 0 : Number(m[1])) + Number(m[2]) / Number(m[3]);
  return /^(?:\d+\.?\d*|\.\d+)$/.test(text) ? Number(text) : Number.NaN;
}

const LABEL = /^(HSS|PIPE|WT|MT|ST|MC|HP|W|M|S|C|L)(.*)$/i;
const near = (a: number, b: number, rel: number): boolean => Math.abs(a - b) <= rel * Math.abs(b);

/** What is wrong with a designation read as an AISC label of `family` (inch tables); [] when it agrees. */
export function labelFindings(designation: string, family: TableFamily, dims: Readonly<Record<string, number>>, area: number | null): string[] {
  const key = designation.replace(/\s+/g, '').replace(/×/g, 'X').toUpperCase();
  const m = LABEL.exec(key);
  if (m === null) return [`designation "${designation}" does not start with a family code (${TABLE_FAMILIES.join(', ')})`];
  const named = m[1]!.toUpperCase();
  if (named !== family) return [`designation "${designation}" names family ${named}, but the row is ${family}`];
  const terms = m[2]!.split('X');
  const bad = (form: string): string[] => [`designation "${designation}" does not read as a ${family} label (${form})`];
  if (family === 'PIPE') return /^\d/.test(m[2]!) ? [] : bad('Pipe<size><schedule>');
  if (family === 'L') {
    const [a, b, t] = terms.map(labelNumber);
    if (terms.length !== 3 || ![a, b, t].every((v) => v !== undefined && Number.isFinite(v))) return bad('L<leg>X<leg>X<thickness>');
    const legs = [dims['d'], dims['b']].filter((v): v is number => v !== undefined).sort((x, y) => x - y);
    const named2 = [a!, b!].sort((x, y) => x - y);
    const out: string[] = [];
    if (legs.length === 2 && !(near(legs[0]!, named2[0]!, 0.005) && near(legs[1]!, named2[1]!, 0.005))) out.push(`designation "${designation}" names legs ${named2.join(' and ')} in, the row has d = ${legs[0]}, b = ${legs[1]}`);
    if (dims['t'] !== undefined && !near(dims['t'], t!, 0.005)) out.push(`designation "${designation}" names thickness ${short(t!)} in, the row has t = ${dims['t']}`);
    return out;
  }
  if (family === 'HSS') {
    const values = terms.map(labelNumber);
    if (!values.every(Number.isFinite) || (values.length !== 2 && values.length !== 3)) return bad('HSS<Ht>X<B>X<t> or HSS<OD>X<t>');
    const out: string[] = [];
    const tLabel = values[values.length - 1]!;
    if (dims['tnom'] !== undefined && !near(dims['tnom'], tLabel, 0.005)) out.push(`designation "${designation}" names wall ${short(tLabel)} in, the row has tnom = ${dims['tnom']}`);
    if (values.length === 3) {
      if (dims['Ht'] !== undefined && !near(dims['Ht'], values[0]!, 0.005)) out.push(`designation "${designation}" names Ht ${values[0]} in, the row has Ht = ${dims['Ht']}`);
      if (dims['B'] !== undefined && !near(dims['B'], values[1]!, 0.005)) out.push(`designation "${designation}" names B ${values[1]} in, the row has B = ${dims['B']}`);
    } else if (dims['OD'] !== undefined && !near(dims['OD'], values[0]!, 0.005)) {
      out.push(`designation "${designation}" names OD ${values[0]} in, the row has OD = ${dims['OD']}`);
    }
    return out;
  }
  // Flanged shapes: <family><nominal depth>X<nominal weight, lb/ft>.
  const weight = terms.length === 2 && /^\d+(?:\.\d+)?$/.test(terms[0]!) ? labelNumber(terms[1]!) : Number.NaN;
  if (!Number.isFinite(weight)) return bad(`${family}<depth>X<weight>`);
  if (area === null) return [];
  const fromArea = (area * 12 * STEEL_LB_PER_FT3) / 1728;
  const tolerance = LABEL_WEIGHT_TOLERANCE[family] ?? 0.03;
  return near(fromArea, weight, tolerance) ? [] : [`designation "${designation}" names ${weight} lb/ft, but the area gives ${short(fromArea)} lb/ft (steel ${STEEL_LB_PER_FT3} lb/ft³; ${pct(fromArea / weight - 1)}, tolerance ${pct(tolerance)})`];
}

/**
 * A designation that reads as an AISC label is looked up in the AISC v15.0 catalogue: a label
 * it does not hold is flagged (with close ones), and a row whose dimensions differ from the
 * catalogue's published ones by more than the printing precision is flagged (inch tables).
 */
export function catalogueFindings(designation: string, family: TableFamily, dims: Readonly<Record<string, number>>): string[] {
  const entry = catalogueEntry(designation);
  if (entry === undefined) {
    const close = similarDesignations(designation);
    return [`designation "${designation}" is not in the AISC Shapes Database v15.0${close.length > 0 ? `; close: ${close.join(', ')}` : ''} (use --own-labels for a maker's own designations)`];
  }
  const entryFamily = entry.family === 'Pipe' ? 'PIPE' : entry.family;
  if (entryFamily !== family) return [`designation "${designation}" is a ${entryFamily} in the AISC Shapes Database v15.0, but the row is ${family}`];
  const out: string[] = [];
  for (const [key, published] of Object.entries(entry.dimensions)) {
    const given = dims[key];
    if (given !== undefined && !near(given, published, CATALOGUE_DIMENSION_TOLERANCE)) out.push(`${key} = ${short(given)} in, but the AISC Shapes Database v15.0 gives ${published} in for ${entry.designation}`);
  }
  return out;
}

/** Checks every row of a table given as CSV text. Throws TableInputError on bad input. */
export function checkTable(text: string, options: CheckOptions = {}): TableCheck {
  const unit = options.unit ?? 'in';
  const tolerances = options.tolerances ?? { default: DEFAULT_TOLERANCE };
  const readLabels = options.readLabels ?? unit === 'in';
  const { headers, rows } = parseTable(text);
  const mapping = mapColumns(headers, unit, options.overrides, options.mapping);
  const cols = mapping.columns;
  const designationAt = cols.findIndex((c) => c.role === 'designation');
  if (designationAt < 0) throw new TableInputError(`no designation column: expected a header such as "designation", "label" or "shape" (columns: ${headers.join(', ')}); name one with --map COLUMN=designation`);
  const typeAt = cols.findIndex((c) => c.role === 'type');
  if (typeAt < 0 && options.type === undefined) throw new TableInputError(`no type column (a header such as "type" or "shape_type" holding ${TABLE_FAMILIES.join(', ')}): add one, name one with --map COLUMN=type, or give --type`);
  if (!cols.some((c) => c.role === 'property')) throw new TableInputError(`no property column to check (e.g. A, Ix, Sx, Zx, rx with a unit such as Ix_in4 or "Ix [mm^4]"): name one with --map COLUMN=Ix`);

  const results: RowCheck[] = [];
  rows.forEach((cells, index) => {
    const row = index + 1;
    const designation = (cells[designationAt] ?? '').trim();
    const at = (header: string): string => `row ${row}${designation === '' ? '' : ` (${designation})`}, column "${header}"`;
    if (cells.length > headers.length) throw new TableInputError(`row ${row}${designation === '' ? '' : ` (${designation})`}: ${cells.length} cells, but the header has ${headers.length} columns`);
    if (designation === '') throw new TableInputError(`${at(headers[designationAt]!)}: the designation is empty`);
    const typeText = typeAt < 0 ? '' : (cells[typeAt] ?? '').trim();
    const family = typeText === '' ? options.type : familyOf(typeText);
    if (family === undefined) {
      if (typeText === '') throw new TableInputError(`${at(headers[typeAt]!)}: the type is empty and no --type was given`);
      throw new TableInputError(`${at(headers[typeAt]!)}: unknown type "${typeText}"; known: ${TABLE_FAMILIES.join(', ')}`);
    }
    const dims: Record<string, number> = {};
    const tabulated: { symbol: string; value: number }[] = [];
    cols.forEach((c, i) => {
      if (c.role !== 'dimension' && c.role !== 'property') return;
      const value = numberCell(cells[i] ?? '', () => at(c.header));
      if (value === undefined) return;
      if (c.role === 'dimension') dims[c.symbol] = convertLength(value, c.unit, unit);
      else tabulated.push({ symbol: c.symbol, value: convertLength(value * c.scale, c.unit, unit, CHECKED_PROPERTIES[c.symbol]!.power) });
    });
    results.push(checkRow(row, designation, family, dims, tabulated, unit, tolerances, readLabels));
    options.onProgress?.(row, rows.length);
  });

  return summarise(unit, mapping, results);
}

function checkRow(row: number, designation: string, family: TableFamily, dims: Record<string, number>, tabulated: readonly { symbol: string; value: number }[], unit: LengthUnit, tolerances: Tolerances, readLabels: boolean): RowCheck {
  const findings: string[] = [];
  const built = tablePart(family, dims, designation, unit);
  let properties: PropertyCheck[] = [];
  let part: RowCheck['part'] = null;
  let area: number | null = null;
  if (!built.ok) {
    findings.push(`cannot build the shape: ${built.message}`);
  } else {
    part = built.part;
    const region = shapeRegion(built.part.shape, built.part.params, unit);
    if (region.diagnostics.length > 0) {
      findings.push(`cannot build the shape: ${region.diagnostics.map((d) => d.message).join('; ')}`);
    } else {
      const p = sectionProperties(region.region);
      area = p.area;
      properties = tabulated.map(({ symbol, value }) => {
        const computed = computedValue(symbol, p);
        const deviation = value === 0 ? (computed === 0 ? 0 : Infinity) : computed / value - 1;
        const tolerance = toleranceOf(tolerances, family, symbol);
        const flagged = !(Math.abs(deviation) <= tolerance);
        if (flagged) findings.push(`${symbol}: table ${short(value)}, computed ${short(computed)} (${pct(deviation)}; tolerance ${pct(tolerance)})`);
        return { symbol, tabulated: value, computed, deviation, tolerance, flagged };
      });
    }
  }
  // Cold-formed rows have no AISC label to read.
  if (readLabels && !COLD_FORMED_FAMILIES.includes(family)) {
    const label = labelFindings(designation, family, dims, unit === 'in' ? area : null);
    findings.push(...label, ...(label.length === 0 && unit === 'in' ? catalogueFindings(designation, family, dims) : []));
  }
  return { row, designation, family, part, properties, findings, flagged: findings.length > 0 };
}

function summarise(unit: LengthUnit, mapping: ColumnMapping, rows: readonly RowCheck[]): TableCheck {
  const worstBy = new Map<string, WorstDeviation>();
  let propertiesChecked = 0;
  let propertiesFlagged = 0;
  for (const r of rows) {
    for (const p of r.properties) {
      propertiesChecked++;
      if (p.flagged) propertiesFlagged++;
      const prev = worstBy.get(p.symbol);
      if (prev === undefined || Math.abs(p.deviation) > Math.abs(prev.deviation)) worstBy.set(p.symbol, { row: r.row, designation: r.designation, symbol: p.symbol, deviation: p.deviation, flagged: p.flagged });
    }
  }
  const worst = [...worstBy.values()].sort((a, b) => Math.abs(b.deviation) - Math.abs(a.deviation));
  const ignoredColumns = mapping.columns.flatMap((c) => (c.role === 'ignore' ? [{ header: c.header, why: c.why }] : []));
  return {
    unit,
    mapping,
    rows,
    summary: { rowsChecked: rows.length, rowsFlagged: rows.filter((r) => r.flagged).length, propertiesChecked, propertiesFlagged, worst },
    ignoredColumns,
    caution: CAUTION,
  };
}
