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
 *   than the header, more rows than MAX_TABLE_ROWS) throws TableInputError naming the row and the
 *   column. A row is "pass" (every comparison made agrees), "flagged" (some comparison disagrees,
 *   or its dimensions build no valid shape) or "not checked" (nothing could be compared: a
 *   dimension or every tabulated value is missing, or the family is unknown), with the reason.
 *   Every comparison is made and reported, whichever fires first: property deviations, the
 *   label's nominal weight and size, and the catalogue's published dimensions.
 * Family: from the type column, else --type, else the designation's prefix (W, HP, S, …).
 * Tolerances: DEFAULT_TOLERANCES (per family and property, with the reasoning beside them);
 *   a tolerance the user gives wins over every built-in one at its level or less specific.
 * Cost: rows are parsed one at a time (papaparse step mode) and checked as they arrive: linear
 *   in the rows, at most MAX_TABLE_ROWS (or options.maxRows). checkTableRows hands each row on
 *   without keeping it; a distinct part is computed once per check (PROPERTY_CACHE_SIZE).
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
import { checkedProperty, mapColumns, type ColumnMapping } from './columns.ts';
import { COLD_FORMED_FAMILIES, familyOf, TABLE_FAMILIES, tablePart, type TableFamily } from './shapes.ts';

export { CAUTION };

/** Relative tolerances (0.01 = 1 %): a default, per property, and per family and property. */
export interface Tolerances {
  readonly default: number;
  /** False when the user gave no default: the built-in DEFAULT_TOLERANCES then fill in (parseTolerances sets it). */
  readonly defaultGiven?: boolean;
  readonly byProperty?: Readonly<Record<string, number>>;
  readonly byFamily?: Readonly<Record<string, Readonly<Record<string, number>>>>;
}

export const DEFAULT_TOLERANCE = 0.015;

/**
 * The built-in tolerances, under which every row of the published AISC Shapes Database v15.0
 * subset (tests/fixtures/aisc-v15-subset.csv) passes when rebuilt from its own dimensions. Why
 * not tighter:
 *  - AISC prints dimensions and properties to three significant figures (W14X90: d = 14.0,
 *    bf = 14.5). A dimension rounded to 3 figures is off by up to ±0.5 % of its last digit
 *    (e.g. tf = 0.710 means 0.7095…0.7105), and Iy ∝ tf·bf³ compounds these: W40X199 rebuilds
 *    with Iy +1.40 %, HP12X53 with Iy −1.24 %. So A within 1 % and I, S, Z, r within 1.5 %
 *    (the shape's fillet modelled as r = kdes − tf, a convention: AISC publishes no radius).
 *  - S and C shapes: toes are modelled sharp and the 2:12 flange slope is assumed; the y-axis
 *    values come out up to ~2.5 % high, so Iy, Sy, Zy 3 %.
 *  - MC shapes: the flange slope is not published; A and x-axis values 2 %, Iy and Sy 7 %,
 *    Zy 4 %, ry 3 %.
 *  - Angles: no root or toe radius is published; Zx, Zy 2 %, the minor principal Iz 2.5 %.
 * A change of 5 % in a published value is still caught everywhere except MC Iy and Sy.
 */
export const DEFAULT_TOLERANCES: Tolerances = {
  default: DEFAULT_TOLERANCE,
  byProperty: { A: 0.01 },
  byFamily: {
    S: { Iy: 0.03, Sy: 0.03, Zy: 0.03 },
    C: { Iy: 0.03, Sy: 0.03, Zy: 0.03 },
    MC: { A: 0.02, Ix: 0.02, Sx: 0.02, Zx: 0.02, Iy: 0.07, Sy: 0.07, Zy: 0.04, ry: 0.03 },
    L: { Zx: 0.02, Zy: 0.02, Iz: 0.025 },
  },
};

/** At most this many rows are checked (the whole AISC database has 2,091): a larger table is refused with a message naming the limit. */
export const MAX_TABLE_ROWS = 100_000;

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
  /** User corrections "column → target" (see columns.ts roleFromTarget), keyed by header. */
  readonly overrides?: ReadonlyMap<string, string>;
  /** A mapping stored earlier; overrides win over it. */
  readonly mapping?: ColumnMapping;
  readonly tolerances?: Tolerances;
  /** Read designations as AISC labels (default: when the table unit is in). */
  readonly readLabels?: boolean;
  /** At most this many rows (default MAX_TABLE_ROWS). */
  readonly maxRows?: number;
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

export type RowStatus = 'pass' | 'flagged' | 'not checked';

export interface RowCheck {
  /** 1 for the first row below the header. */
  readonly row: number;
  readonly designation: string;
  /** null when no type column, no --type and no family code at the start of the designation. */
  readonly family: TableFamily | null;
  /** Where the family came from. */
  readonly familyFrom: 'type column' | 'given type' | 'designation' | 'unknown';
  /** The part the row built (dimensions in the working unit), or null when it could not be built. */
  readonly part: { readonly shape: string; readonly params: Readonly<Record<string, number>>; readonly modelling: string } | null;
  readonly properties: readonly PropertyCheck[];
  /** Plain sentences: deviations beyond tolerance, label mismatches, geometry problems. */
  readonly findings: readonly string[];
  readonly status: RowStatus;
  /** Why nothing was compared, for a row that is not checked. */
  readonly notCheckedReason?: string;
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
    /** Rows judged (pass or flagged); rows not checked are counted apart. */
    readonly rowsChecked: number;
    readonly rowsPassed: number;
    readonly rowsFlagged: number;
    readonly rowsNotChecked: number;
    /** Rows read below the header. */
    readonly rowsRead: number;
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

/** The header row's names, trimmed; throws naming a column without a name. */
function headerNames(cells: readonly string[]): string[] {
  const trimmed = cells.map((h) => h.trim());
  trimmed.forEach((h, i) => {
    if (h === '') throw new TableInputError(`header: column ${i + 1} has no name`);
  });
  return trimmed;
}

/**
 * Reads a CSV text (RFC 4180; papaparse) one row at a time: `onHeader` with the header, then
 * `onRow` for each non-blank row, without holding the rows. Throws on a quoting error and on
 * more than MAX_TABLE_ROWS rows, naming the limit.
 */
export function streamTable(text: string, onHeader: (headers: string[]) => void, onRow: (cells: string[], row: number) => void, maxRows = MAX_TABLE_ROWS): void {
  let headers: string[] | null = null;
  let row = 0;
  let failure: unknown = null;
  Papa.parse<string[]>(text.replace(/^\uFEFF/, ''), {
    header: false,
    skipEmptyLines: false,
    step: (result, parser) => {
      try {
        const serious = result.errors.find((e) => e.type === 'Quotes');
        if (serious !== undefined) throw new TableInputError(`CSV: ${serious.message} (row ${row + 1})`);
        const cells = result.data;
        if (!cells.some((c) => c.trim() !== '')) return;
        if (headers === null) {
          headers = headerNames(cells);
          onHeader(headers);
          return;
        }
        row++;
        if (row > maxRows) throw new TableInputError(`the table has more than ${maxRows.toLocaleString('en-US')} rows, the most one check takes; split it into smaller tables`);
        onRow(cells, row);
      } catch (err) {
        failure = err;
        parser.abort();
      }
    },
  });
  if (failure !== null) throw failure;
  if (headers === null) throw new TableInputError('the table is empty: expected a header row and rows of shapes');
}

/** The rows of a CSV text, header first; blank rows dropped (streamTable, collected). */
export function parseTable(text: string): { headers: string[]; rows: string[][] } {
  let headers: string[] = [];
  const rows: string[][] = [];
  streamTable(text, (h) => { headers = h; }, (cells) => { rows.push(cells); });
  return { headers, rows };
}

const LEADING_FAMILY = /^(HSS|PIPE|WT|MT|ST|MC|HP|W|M|S|C|L)(?=\d)/i;

/** The family a designation's prefix names (W18X50 → W, HSS6X6X1/4 → HSS, Pipe8STD → PIPE), or undefined. */
export function familyFromDesignation(designation: string): TableFamily | undefined {
  const m = LEADING_FAMILY.exec(designation.replace(/\s+/g, ''));
  return m === null ? undefined : familyOf(m[1]!);
}

const own = <T>(record: Readonly<Record<string, T>> | undefined, key: string): T | undefined => (record !== undefined && Object.hasOwn(record, key) ? record[key] : undefined);

/** The most specific tolerance: the user's family:property, property, default (when given), then the built-in ones. */
export function toleranceOf(t: Tolerances, family: string, symbol: string): number {
  const user = own(own(t.byFamily, family), symbol) ?? own(t.byProperty, symbol);
  if (user !== undefined) return user;
  if (t.defaultGiven !== false) return t.default;
  return own(own(DEFAULT_TOLERANCES.byFamily, family), symbol) ?? own(DEFAULT_TOLERANCES.byProperty, symbol) ?? DEFAULT_TOLERANCES.default;
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
  const rows: RowCheck[] = [];
  const s = checkTableRows(text, options, (r) => rows.push(r));
  return { unit: s.unit, mapping: s.mapping, rows, summary: s.summary, ignoredColumns: s.ignoredColumns, caution: s.caution };
}

/** How many distinct shapes one check keeps computed properties for (a table repeating a shape computes it once). */
export const PROPERTY_CACHE_SIZE = 4096;

/**
 * Checks every row as it is read and hands each result to `onRow` without keeping it: the cost
 * is linear in the rows and the memory is bounded by the summary (one worst deviation per
 * property) and PROPERTY_CACHE_SIZE computed shapes, whatever the length of the table. Rows whose
 * part (shape, parameters, unit) was computed before reuse its exact properties. Throws
 * TableInputError on bad input, naming the row and column.
 */
export function checkTableRows(text: string, options: CheckOptions, onRow: (row: RowCheck) => void): Omit<TableCheck, 'rows'> {
  const unit = options.unit ?? 'in';
  const tolerances = options.tolerances ?? DEFAULT_TOLERANCES;
  const readLabels = options.readLabels ?? unit === 'in';
  // The row count is known only at the end when streaming; progress reports an estimate from the text length.
  const estimate = Math.max(1, text.split('\n', MAX_TABLE_ROWS + 2).length - 1);
  let mapping: ColumnMapping | null = null;
  let headers: string[] = [];
  let designationAt = -1, typeAt = -1;
  const summary = new Summary();
  const cache: PropertyCache = new Map();
  streamTable(text, (h) => {
    headers = h;
    mapping = mapColumns(h, unit, options.overrides, options.mapping);
    const cols = mapping.columns;
    designationAt = cols.findIndex((c) => c.role === 'designation');
    if (designationAt < 0) throw new TableInputError(`no designation column: expected a header such as "designation", "label" or "shape" (columns: ${h.join(', ')}); name one with --map COLUMN=designation`);
    typeAt = cols.findIndex((c) => c.role === 'type');
    if (!cols.some((c) => c.role === 'property')) throw new TableInputError(`no property column to check (e.g. A, Ix, Sx, Zx, rx with a unit such as Ix_in4 or "Ix [mm^4]"): name one with --map COLUMN=Ix`);
  }, (cells, row) => {
    const result = checkCells(cells, row, headers, mapping!, designationAt, typeAt, unit, tolerances, readLabels, options.type, cache);
    summary.add(result);
    onRow(result);
    options.onProgress?.(row, Math.max(row, estimate));
  }, options.maxRows ?? MAX_TABLE_ROWS);
  return summary.result(unit, mapping!);
}

type PropertyCache = Map<string, ReturnType<typeof sectionProperties> | readonly string[]>;

/** The exact properties of a part, or its diagnostics, computed once per distinct part of a check. */
function partProperties(shape: string, params: Readonly<Record<string, number>>, unit: LengthUnit, cache: PropertyCache): ReturnType<typeof sectionProperties> | readonly string[] {
  const key = `${shape}|${unit}|${Object.entries(params).map(([k, v]) => `${k}=${v}`).join(',')}`;
  const known = cache.get(key);
  if (known !== undefined) return known;
  const region = shapeRegion(shape, params, unit);
  const value = region.diagnostics.length > 0 ? region.diagnostics.map((d) => d.message) : sectionProperties(region.region);
  if (cache.size >= PROPERTY_CACHE_SIZE) cache.clear();
  cache.set(key, value);
  return value;
}

function checkCells(cells: readonly string[], row: number, headers: readonly string[], mapping: ColumnMapping, designationAt: number, typeAt: number, unit: LengthUnit, tolerances: Tolerances, readLabels: boolean, given: TableFamily | undefined, cache: PropertyCache): RowCheck {
  const designation = (cells[designationAt] ?? '').trim();
  const at = (header: string): string => `row ${row}${designation === '' ? '' : ` (${designation})`}, column "${header}"`;
  if (cells.length > headers.length) throw new TableInputError(`row ${row}${designation === '' ? '' : ` (${designation})`}: ${cells.length} cells, but the header has ${headers.length} columns`);
  if (designation === '') throw new TableInputError(`${at(headers[designationAt]!)}: the designation is empty`);
  const typeText = typeAt < 0 ? '' : (cells[typeAt] ?? '').trim();
  if (typeText !== '' && familyOf(typeText) === undefined) throw new TableInputError(`${at(headers[typeAt]!)}: unknown type "${typeText}"; known: ${TABLE_FAMILIES.join(', ')}`);
  const fromLabel = familyFromDesignation(designation);
  const family = typeText !== '' ? familyOf(typeText)! : given ?? fromLabel ?? null;
  const familyFrom: RowCheck['familyFrom'] = typeText !== '' ? 'type column' : given !== undefined ? 'given type' : fromLabel !== undefined ? 'designation' : 'unknown';
  const dims: Record<string, number> = {};
  const tabulated: { symbol: string; value: number }[] = [];
  mapping.columns.forEach((c, i) => {
    if (c.role !== 'dimension' && c.role !== 'property') return;
    const value = numberCell(cells[i] ?? '', () => at(c.header));
    if (value === undefined) return;
    if (c.role === 'dimension') dims[c.symbol] = convertLength(value, c.unit, unit);
    else tabulated.push({ symbol: c.symbol, value: convertLength(value * c.scale, c.unit, unit, checkedProperty(c.symbol)!.power) });
  });
  if (family === null) {
    const reason = `no family: no type column${typeAt >= 0 ? ' value' : ''}, no --type, and the designation does not start with ${TABLE_FAMILIES.join(', ')}`;
    return { row, designation, family: null, familyFrom, part: null, properties: [], findings: [], status: 'not checked', notCheckedReason: reason, flagged: false };
  }
  return checkRow(row, designation, family, familyFrom, dims, tabulated, unit, tolerances, readLabels, cache);
}

function checkRow(row: number, designation: string, family: TableFamily, familyFrom: RowCheck['familyFrom'], dims: Record<string, number>, tabulated: readonly { symbol: string; value: number }[], unit: LengthUnit, tolerances: Tolerances, readLabels: boolean, cache: PropertyCache): RowCheck {
  const findings: string[] = [];
  const built = tablePart(family, dims, designation, unit);
  let properties: PropertyCheck[] = [];
  let part: RowCheck['part'] = null;
  let area: number | null = null;
  let notCheckedReason: string | undefined;
  if (!built.ok) {
    // Missing dimensions mean nothing could be compared (not checked); present but unusable ones are a finding.
    if (/no value given/.test(built.message)) notCheckedReason = `cannot build the shape: ${built.message}`;
    else findings.push(`cannot build the shape: ${built.message}`);
  } else {
    part = built.part;
    const p = partProperties(built.part.shape, built.part.params, unit, cache);
    if (isDiagnostics(p)) {
      findings.push(`cannot build the shape: ${p.join('; ')}`);
    } else {
      area = p.area;
      properties = tabulated.map(({ symbol, value }) => {
        const computed = computedValue(symbol, p);
        const deviation = value === 0 ? (computed === 0 ? 0 : Infinity) : computed / value - 1;
        const tolerance = toleranceOf(tolerances, family, symbol);
        const flagged = !(Math.abs(deviation) <= tolerance);
        if (flagged) findings.push(`${symbol}: table ${short(value)}, computed ${short(computed)} (${pct(deviation)}; tolerance ${pct(tolerance)})`);
        return { symbol, tabulated: value, computed, deviation, tolerance, flagged };
      });
      if (tabulated.length === 0) notCheckedReason = 'no tabulated value in this row';
    }
  }
  // Cold-formed rows have no AISC label to read.
  if (readLabels && !COLD_FORMED_FAMILIES.includes(family)) {
    // Every comparison is made: the label's weight and size, and the catalogue's dimensions, whichever fires first.
    findings.push(...labelFindings(designation, family, dims, unit === 'in' ? area : null));
    if (unit === 'in') findings.push(...catalogueFindings(designation, family, dims));
  }
  const status: RowStatus = findings.length > 0 ? 'flagged' : notCheckedReason !== undefined ? 'not checked' : 'pass';
  return { row, designation, family, familyFrom, part, properties, findings, status, ...(status === 'not checked' ? { notCheckedReason } : {}), flagged: status === 'flagged' };
}

function isDiagnostics(p: ReturnType<typeof sectionProperties> | readonly string[]): p is readonly string[] {
  return Array.isArray(p);
}

/** The summary of a check, added to one row at a time (nothing per row is kept). */
class Summary {
  private readonly worstBy = new Map<string, WorstDeviation>();
  private propertiesChecked = 0;
  private propertiesFlagged = 0;
  private rowsPassed = 0;
  private rowsFlagged = 0;
  private rowsNotChecked = 0;
  private rowsRead = 0;

  add(r: RowCheck): void {
    this.rowsRead++;
    if (r.status === 'pass') this.rowsPassed++;
    else if (r.status === 'flagged') this.rowsFlagged++;
    else this.rowsNotChecked++;
    for (const p of r.properties) {
      this.propertiesChecked++;
      if (p.flagged) this.propertiesFlagged++;
      const prev = this.worstBy.get(p.symbol);
      if (prev === undefined || Math.abs(p.deviation) > Math.abs(prev.deviation)) this.worstBy.set(p.symbol, { row: r.row, designation: r.designation, symbol: p.symbol, deviation: p.deviation, flagged: p.flagged });
    }
  }

  result(unit: LengthUnit, mapping: ColumnMapping): Omit<TableCheck, 'rows'> {
    const worst = [...this.worstBy.values()].sort((a, b) => Math.abs(b.deviation) - Math.abs(a.deviation));
    const ignoredColumns = mapping.columns.flatMap((c) => (c.role === 'ignore' ? [{ header: c.header, why: c.why }] : []));
    return {
      unit,
      mapping,
      summary: {
        rowsChecked: this.rowsPassed + this.rowsFlagged,
        rowsPassed: this.rowsPassed,
        rowsFlagged: this.rowsFlagged,
        rowsNotChecked: this.rowsNotChecked,
        rowsRead: this.rowsRead,
        propertiesChecked: this.propertiesChecked,
        propertiesFlagged: this.propertiesFlagged,
        worst,
      },
      ignoredColumns,
      caution: CAUTION,
    };
  }
}
