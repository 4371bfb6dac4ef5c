/**
 * The catalogue of standard designations: AISC Shapes Database v15.0 (all 2,091 shapes, published
 * dimensions only, data/aisc-v15.ts) and dressed sawn lumber (NDS Supplement 2018 Table 1A,
 * core/parts/lumber-sizes.ts), plus entries the user adds.
 *
 * Units: inches and lb/ft, as published. Each entry carries the part it builds (`shape`, `params`
 *   in inches) and the modelling conventions used to turn published dimensions into geometry
 *   (`modelling`), because the database publishes no fillet radii or flange slopes.
 * Properties are never stored here: they are computed from the part's exact geometry.
 * Conventions (see `modelling` of each entry, core/catalogue/conventions.ts and
 *   docs/catalogue-conventions.md): flange slopes, root fillet and toe radii family by family;
 *   HSS and Pipe use the design wall tdes (0.93·tnom, as tabulated); rectangular HSS outside
 *   corner radius 2·tdes; round HSS use the nominal OD of the label (6.625, not the printed 6.63).
 * Published values that no geometry built from the published dimensions can reproduce are named
 *   in each entry's `caveats` (core/catalogue/caveats.ts).
 * Does not guarantee: that an entry reproduces the tabulated properties beyond the rounding of the
 *   published dimensions (3 significant figures) and the conventions above.
 */
import type { Diagnostic } from '../geometry/types.ts';
import { getPartType } from '../parts/index.ts';
import { DRESSED_SIZES } from '../parts/lumber-sizes.ts';
import { DOUBLE_L_ROWS, HSSC_ROWS, HSSR_ROWS, I_ROWS, L_ROWS, PIPE_ROWS, type Row } from './data/aisc-v15.ts';
import { angleRadii, flangedPart, HALF_FILLET_FAMILIES } from './conventions.ts';
import { publishedCaveats } from './caveats.ts';

export { angleRadii, flangedPart, HALF_FILLET_FAMILIES, MC_SLOPE, STEEL_LBFT_PER_IN2, type FlangedDims, type FlangedGiven, type FlangedPart } from './conventions.ts';

export type Family = 'W' | 'M' | 'S' | 'HP' | 'C' | 'MC' | 'WT' | 'MT' | 'ST' | 'L' | '2L' | 'HSS' | 'Pipe' | 'lumber' | 'user';

export const AISC_SOURCE = 'AISC Shapes Database v15.0 (AISC, Nov 2017), published dimensions';
export const LUMBER_SOURCE = 'NDS Supplement 2018 (AWC), Table 1A, dressed sizes';

export interface CatalogueEntry {
  readonly designation: string;
  readonly family: Family;
  readonly source: string;
  /** Nominal weight, lb/ft (AISC W), when published. */
  readonly nominalWeight?: number;
  /** Overall depth, in (d, Ht, OD, or the dressed depth), for search. */
  readonly depth: number;
  /** The published dimensions, in, by the source's symbols. */
  readonly dimensions: Readonly<Record<string, number>>;
  /** The part this designation builds, dimensions in inches (lumber: nominal sizes). */
  readonly shape: string;
  readonly params: Readonly<Record<string, number>>;
  /** How published dimensions became geometry (conventions, assumptions). */
  readonly modelling: readonly string[];
  /** Published values this entry cannot reproduce from its published dimensions, and why. */
  readonly caveats: readonly string[];
  readonly userDefined: boolean;
}

export interface Catalogue {
  readonly entries: readonly CatalogueEntry[];
  /** Entries by normalised designation (see designationKey). */
  readonly byKey: ReadonlyMap<string, CatalogueEntry>;
}

/** The lookup key of a designation: upper case, no spaces, '×' read as 'X' ("w14x90" → "W14X90"). */
export function designationKey(designation: string): string {
  return designation.replace(/\s+/g, '').replace(/×/g, 'X').toUpperCase();
}

const HSS_NOTE = 'design wall thickness tdes (0.93·tnom, as tabulated) is used for geometry';

/** What the family rule of core/catalogue/conventions.ts did, in words, for one flanged entry. */
function flangedNote(type: string, slopeRule: string, params: Readonly<Record<string, number>>): string {
  const atWeb = params['slope'] === undefined ? 'tf' : 'flange thickness at the web';
  const fillet = HALF_FILLET_FAMILIES.has(type) ? `r = (kdes − ${atWeb})/2 (fitted: ${type} kdes is the detailing k)` : `r = kdes − ${atWeb}`;
  const toe = params['rt'] === undefined ? 'toes sharp' : 'toe radius rt = 0.4·tf (fitted)';
  const average = params['slope'] === undefined ? '' : '; tf is the average thickness at mid-outstand';
  return `${slopeRule}${average}; ${fillet} (AISC publishes no radius); ${toe}`;
}

function flangedEntry(row: Row): CatalogueEntry {
  const [designation, type, W, d, bf, tw, tf, kdes, WGi] = row as unknown as [string, Family, number, number, number, number, number, number, number | null];
  const { shape, params, slopeRule } = flangedPart(type, { d, bf, tw, tf, kdes });
  const modelling = [flangedNote(type, slopeRule, params)];
  if (shape === 'tee') modelling.push(`tee cut from the ${type === 'ST' ? 'S' : type === 'MT' ? 'M' : 'W'} shape: d is the depth of the tee`);
  return { designation, family: type, source: AISC_SOURCE, nominalWeight: W, depth: d, dimensions: { d, bf, tw, tf, kdes, ...(WGi === null ? {} : { WGi }) }, shape, params, modelling, caveats: publishedCaveats(designation), userDefined: false };
}

const ANGLE_NOTE = 'root radius r = 3/4·(kdes − t), toe radius rt = r/2 (fitted: the database states no radii, and kdes of angles is the detailing k)';

/**
 * An angle's thickness from its label's fraction when the printed t is that fraction rounded
 * ("L12X12X1-3/8": 1.375, printed 1.38), as round HSS take the label's OD; else the printed t.
 */
export function angleThickness(designation: string, printed: number): number {
  const terms = designation.replace(/^2?L/, '').split('X');
  const exact = fractionInches(terms[2] ?? '');
  return Number.isFinite(exact) && Number(exact.toPrecision(3)) === Number(printed.toPrecision(3)) ? exact : printed;
}

function angleEntry(row: Row): CatalogueEntry {
  const [designation, , W, d, b, printedT, kdes] = row as unknown as [string, string, number, number, number, number, number];
  const t = angleThickness(designation, printedT);
  const { r, rt } = angleRadii(t, kdes);
  // Published d is the shorter leg; the tabulated x axis has the longer leg vertical, so it goes along y.
  return { designation, family: 'L', source: AISC_SOURCE, nominalWeight: W, depth: b, dimensions: { d, b, t: printedT, kdes }, shape: 'angle', params: { d: b, b: d, t, r, rt }, modelling: [ANGLE_NOTE, 'the longer leg b runs along y (the tabulated x axis is horizontal)', ...(t === printedT ? [] : [`t = ${t} from the label (printed ${printedT})`])], caveats: publishedCaveats(designation, 'L'), userDefined: false };
}

/** A fraction such as "3/8", "1-1/2" or "3/4" in inches. */
function fractionInches(text: string): number {
  const m = /^(?:(\d+)-)?(\d+)(?:\/(\d+))?$/.exec(text);
  if (m === null) return Number.NaN;
  const whole = m[1] === undefined ? 0 : Number(m[1]);
  return m[3] === undefined ? whole + Number(m[2]) : whole + Number(m[2]) / Number(m[3]);
}

/** The gap of a double angle from its label: "2L4X3X1/2X3/8LLBB" → 3/8; no fourth term → 0. */
export function doubleAngleGap(designation: string): number {
  const parts = designation.replace(/^2L/, '').replace(/(LLBB|SLBB)$/, '').split('X');
  return parts.length === 4 ? fractionInches(parts[3]!) : 0;
}

/** kdes of the single angles by "d b t", for the double angles (whose rows carry no kdes). */
const ANGLE_KDES: ReadonlyMap<string, number> = new Map(L_ROWS.map((row) => [`${String(row[3])} ${String(row[4])} ${String(row[5])}`, row[6] as number]));

function doubleAngleEntry(row: Row): CatalogueEntry {
  const [designation, , W, d, b, printedT] = row as unknown as [string, string, number, number, number, number];
  const gap = doubleAngleGap(designation);
  const t = angleThickness(designation, printedT);
  // The label orders the legs as the single angle's (LLBB: long legs back to back, d = long leg).
  const kdes = ANGLE_KDES.get(`${Math.min(d, b)} ${Math.max(d, b)} ${printedT}`);
  const { r, rt } = angleRadii(t, kdes);
  const radii = kdes === undefined ? 'sharp root and toes (no single angle of this size gives kdes)' : `${ANGLE_NOTE}; kdes ${kdes} from the single angle`;
  return { designation, family: '2L', source: AISC_SOURCE, nominalWeight: W, depth: d, dimensions: { d, b, t: printedT, gap }, shape: 'double-angle', params: { d, b, t, r, rt, gap }, modelling: [radii, 'legs d back to back, gap from the label'], caveats: publishedCaveats(designation, '2L'), userDefined: false };
}

function rectHssEntry(row: Row): CatalogueEntry {
  const [designation, , W, Ht, B, tnom, tdes] = row as unknown as [string, string, number, number, number, number, number];
  return { designation, family: 'HSS', source: AISC_SOURCE, nominalWeight: W, depth: Ht, dimensions: { Ht, B, tnom, tdes }, shape: 'rect-tube', params: { H: Ht, B, t: tdes, r: 2 * tdes }, modelling: [HSS_NOTE, 'outside corner radius 2·tdes, inside radius tdes (AISC Shapes Database v15.0 user note)'], caveats: publishedCaveats(designation), userDefined: false };
}

function roundHssEntry(row: Row): CatalogueEntry {
  const [designation, , W, OD, tnom, tdes] = row as unknown as [string, string, number, number, number, number];
  const nominal = Number(/^HSS([\d.]+)X/.exec(designation)?.[1] ?? Number.NaN);
  return { designation, family: 'HSS', source: AISC_SOURCE, nominalWeight: W, depth: nominal, dimensions: { OD, tnom, tdes }, shape: 'pipe', params: { OD: nominal, t: tdes }, modelling: [HSS_NOTE, `nominal OD ${nominal} from the label (the printed OD ${OD} is rounded)`], caveats: publishedCaveats(designation), userDefined: false };
}

function pipeEntry(row: Row): CatalogueEntry {
  const [designation, , W, OD, ID, tnom, tdes] = row as unknown as [string, string, number, number, number, number, number];
  return { designation, family: 'Pipe', source: AISC_SOURCE, nominalWeight: W, depth: OD, dimensions: { OD, ID, tnom, tdes }, shape: 'pipe', params: { OD, t: tdes }, modelling: [HSS_NOTE, 'the published ID is nominal (OD − 2·tnom); the bore used is OD − 2·tdes'], caveats: publishedCaveats(designation), userDefined: false };
}

function lumberEntries(): CatalogueEntry[] {
  return DRESSED_SIZES.map((s) => ({
    designation: s.nominal,
    family: 'lumber' as const,
    source: LUMBER_SOURCE,
    depth: s.d,
    dimensions: { b: s.b, d: s.d },
    shape: 'lumber',
    params: { b: s.nominalB, d: s.nominalD, plies: 1 },
    modelling: [`dressed ${s.b} × ${s.d} in, ${s.condition} (${s.category})`],
    caveats: [],
    userDefined: false,
  }));
}

function catalogueOf(entries: readonly CatalogueEntry[]): Catalogue {
  return { entries, byKey: new Map(entries.map((e) => [designationKey(e.designation), e])) };
}

const STANDARD: Catalogue = catalogueOf([
  ...I_ROWS.map(flangedEntry),
  ...L_ROWS.map(angleEntry),
  ...DOUBLE_L_ROWS.map(doubleAngleEntry),
  ...HSSR_ROWS.map(rectHssEntry),
  ...HSSC_ROWS.map(roundHssEntry),
  ...PIPE_ROWS.map(pipeEntry),
  ...lumberEntries(),
]);

/** The standard catalogue: AISC v15.0 shapes and NDS dressed lumber. */
export function standardCatalogue(): Catalogue {
  return STANDARD;
}

/** The entry for a designation (case and spaces ignored), or undefined. */
export function catalogueEntry(designation: string, catalogue: Catalogue = STANDARD): CatalogueEntry | undefined {
  return catalogue.byKey.get(designationKey(designation));
}

export interface CatalogueQuery {
  /** Part of the designation, case and spaces ignored ("w14", "2x1"). */
  readonly text?: string;
  readonly family?: Family;
  /** Overall depth range, in. */
  readonly depthMin?: number;
  readonly depthMax?: number;
  /** Nominal weight range, lb/ft; entries without a published weight are left out when given. */
  readonly weightMin?: number;
  readonly weightMax?: number;
  readonly limit?: number;
}

/** Entries matching every given criterion, in catalogue order. */
export function searchCatalogue(query: CatalogueQuery, catalogue: Catalogue = STANDARD): CatalogueEntry[] {
  const text = query.text === undefined ? '' : designationKey(query.text);
  const byWeight = query.weightMin !== undefined || query.weightMax !== undefined;
  const found = catalogue.entries.filter(
    (e) =>
      (text === '' || designationKey(e.designation).includes(text)) &&
      (query.family === undefined || e.family === query.family) &&
      (query.depthMin === undefined || e.depth >= query.depthMin) &&
      (query.depthMax === undefined || e.depth <= query.depthMax) &&
      (!byWeight || (e.nominalWeight !== undefined && e.nominalWeight >= (query.weightMin ?? -Infinity) && e.nominalWeight <= (query.weightMax ?? Infinity))),
  );
  return query.limit === undefined ? found : found.slice(0, query.limit);
}

/** What the user supplies for a catalogue entry of their own. */
export interface UserEntry {
  readonly designation: string;
  readonly shape: string;
  /** Dimensions in inches by the part type's symbols. */
  readonly params: Readonly<Record<string, number>>;
  readonly nominalWeight?: number;
  readonly note?: string;
}

function userEntryProblems(entry: UserEntry, base: Catalogue, seen: Set<string>): Diagnostic[] {
  const name = entry.designation.trim();
  const bad = (message: string): Diagnostic => ({ code: 'bad-parameter', part: name || '(unnamed)', message: `catalogue entry "${name}": ${message}` });
  if (name === '') return [bad('the designation is empty')];
  const key = designationKey(name);
  if (base.byKey.has(key)) return [bad('a standard entry already has this designation; choose another name')];
  if (seen.has(key)) return [bad('this designation is given twice')];
  const type = getPartType(entry.shape);
  if (type === undefined) return [bad(`unknown part type "${entry.shape}"`)];
  if (entry.nominalWeight !== undefined && !(entry.nominalWeight > 0)) return [bad(`nominal weight ${entry.nominalWeight} must be greater than 0`)];
  return type.region(entry.params).diagnostics.map((d) => bad(d.message));
}

/**
 * A catalogue that also holds the user's entries (pure: the document or the app stores them).
 * Invalid entries are left out and reported, one diagnostic each.
 */
export function withUserEntries(entries: readonly UserEntry[], base: Catalogue = STANDARD): { catalogue: Catalogue; diagnostics: Diagnostic[] } {
  const diagnostics: Diagnostic[] = [];
  const seen = new Set<string>();
  const added: CatalogueEntry[] = [];
  for (const entry of entries) {
    const problems = userEntryProblems(entry, base, seen);
    diagnostics.push(...problems);
    if (problems.length > 0) continue;
    seen.add(designationKey(entry.designation));
    const p = entry.params;
    added.push({
      designation: entry.designation.trim(),
      family: 'user',
      source: 'user entry',
      ...(entry.nominalWeight === undefined ? {} : { nominalWeight: entry.nominalWeight }),
      depth: p['d'] ?? p['H'] ?? p['OD'] ?? p['t'] ?? 0,
      dimensions: { ...p },
      shape: entry.shape,
      params: { ...p },
      modelling: entry.note === undefined ? [] : [entry.note],
      caveats: [],
      userDefined: true,
    });
  }
  return { catalogue: catalogueOf([...base.entries, ...added]), diagnostics };
}

export type PartFromDesignation =
  | { readonly ok: true; readonly shape: string; readonly params: Readonly<Record<string, number>>; readonly designation: string; readonly entry: CatalogueEntry }
  | { readonly ok: false; readonly message: string };

/** Designations that share the longest start with `designation` (for "did you mean"). */
export function similarDesignations(designation: string, catalogue: Catalogue = STANDARD, count = 5): string[] {
  const key = designationKey(designation);
  let best: { prefix: number; names: string[] } = { prefix: 0, names: [] };
  for (const [k, e] of catalogue.byKey) {
    let n = 0;
    while (n < k.length && n < key.length && k[n] === key[n]) n++;
    if (n > best.prefix) best = { prefix: n, names: [e.designation] };
    else if (n === best.prefix && n > 0 && best.names.length < count) best.names.push(e.designation);
  }
  return best.names;
}

/** The part (shape and dimensions in inches) a designation builds, or a message naming close ones. */
export function partFromDesignation(designation: string, catalogue: Catalogue = STANDARD): PartFromDesignation {
  const entry = catalogueEntry(designation, catalogue);
  if (entry !== undefined) return { ok: true, shape: entry.shape, params: entry.params, designation: entry.designation, entry };
  const close = similarDesignations(designation, catalogue);
  const hint = close.length > 0 ? `; close: ${close.join(', ')}` : '';
  return { ok: false, message: `no catalogue entry "${designation}"${hint}` };
}

/**
 * What a user typed, read as a designation: upper case, "×" as X, "2 x 10" → 2X10, "w14 90" →
 * W14X90 (a space between two numbers is the X), other spaces dropped.
 */
export function queryKey(text: string): string {
  return text
    .trim()
    .toUpperCase()
    .replace(/×/g, 'X')
    .replace(/\s*X\s*/g, 'X')
    .replace(/(\d)\s+(?=\d)/g, '$1X')
    .replace(/\s+/g, '');
}

/** A nominal lumber size as typed ("2X10", "4X4"): digits X digits, nothing else. */
const LUMBER_QUERY = /^\d+X\d+$/;

/** The number after the last X of a key ("W14X90" → 90), for nearest-weight ordering. */
function lastNumber(key: string): number {
  const m = /X(\d+(?:\.\d+)?)$/.exec(key);
  return m === null ? Number.NaN : Number(m[1]);
}

/**
 * Entries matching typed text, closest first: an exact designation, then designations that start
 * with the text, then ones that contain it, then shapes of the same family and depth ordered by
 * how near their nominal weight is to the one typed ("W14X91" finds W14X90 first). When the text
 * is a lumber size ("2x10", "2 x 10"), lumber comes before steel at every rank.
 */
export function findShapes(text: string, catalogue: Catalogue = STANDARD, limit = 20): CatalogueEntry[] {
  const q = queryKey(text);
  if (q === '') return [];
  const lumberFirst = LUMBER_QUERY.test(q);
  const stem = /^([A-Z]+[\d.]+X)/.exec(q)?.[1];
  const wanted = lastNumber(q);
  const ranked: { entry: CatalogueEntry; rank: number; near: number; order: number }[] = [];
  catalogue.entries.forEach((entry, order) => {
    const key = designationKey(entry.designation);
    let rank: number;
    let near = key.length - q.length;
    if (key === q) rank = 0;
    else if (key.startsWith(q)) rank = 1;
    else if (key.includes(q)) rank = 2;
    else if (stem !== undefined && key.startsWith(stem) && Number.isFinite(wanted)) {
      rank = 3;
      near = Math.abs(lastNumber(key) - wanted);
    } else return;
    ranked.push({ entry, rank, near, order });
  });
  const steel = (e: CatalogueEntry): number => (lumberFirst && e.family !== 'lumber' ? 1 : 0);
  ranked.sort((a, b) => steel(a.entry) - steel(b.entry) || a.rank - b.rank || a.near - b.near || a.order - b.order);
  return ranked.slice(0, limit).map((r) => r.entry);
}
