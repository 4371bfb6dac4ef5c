/**
 * Which table column holds what: the designation, the shape family, a dimension or a tabulated
 * property, each with its unit. Headers in trade symbols are recognised (d, bf, tw, tf, kdes, A,
 * Ix, Sx, Zx, rx, …), with the unit read from a suffix (`Ix_in4`, `d_mm`) or a bracket
 * (`Ix [in^4]`, `Ix (mm4)`, `Ix [10^6 mm^4]`); a column without a unit is in the table's unit.
 * The user corrects any column with an override "column=target" (target a symbol, `designation`,
 * `type` or `ignore`), and the result is plain data (a ColumnMapping) that can be saved as JSON
 * and given back later.
 *
 * Symbols are matched exactly first, because case carries meaning in the trade (b is an angle's
 * leg, B a tube's width); property names and the designation and type headers also match
 * without regard to case.
 */
import { isLengthUnit } from '../units/index.ts';
import type { LengthUnit } from '../units/types.ts';
import { DIMENSION_SYMBOLS } from './shapes.ts';

/** The properties a check can compute, with their length power. */
export const CHECKED_PROPERTIES: Readonly<Record<string, { readonly power: number; readonly what: string }>> = {
  A: { power: 2, what: 'area' },
  Ix: { power: 4, what: 'second moment about x' },
  Iy: { power: 4, what: 'second moment about y' },
  Sx: { power: 3, what: 'elastic modulus about x (smaller of the two fibres)' },
  Sy: { power: 3, what: 'elastic modulus about y (smaller of the two fibres)' },
  Zx: { power: 3, what: 'plastic modulus about x' },
  Zy: { power: 3, what: 'plastic modulus about y' },
  rx: { power: 1, what: 'radius of gyration about x' },
  ry: { power: 1, what: 'radius of gyration about y' },
  Iw: { power: 4, what: 'major principal moment (angles)' },
  Iz: { power: 4, what: 'minor principal moment (angles)' },
  rz: { power: 1, what: 'minor principal radius of gyration (angles)' },
};

/** The checked property a symbol names, or undefined; an own-property test, so "constructor" or "__proto__" is just unknown text. */
export function checkedProperty(symbol: string): { readonly power: number; readonly what: string } | undefined {
  return Object.hasOwn(CHECKED_PROPERTIES, symbol) ? CHECKED_PROPERTIES[symbol] : undefined;
}

/** Recognised trade columns that this check does not recompute (listed as not checked, never silently). */
const NOT_CHECKED: ReadonlyMap<string, string> = new Map([
  ['J', 'torsion constant: needs finite elements (sectionsmith props --torsion)'],
  ['Cw', 'warping constant: not recomputed by the table check'],
  ['W', 'nominal weight: read from the designation instead'],
]);

export type ColumnRole =
  | { readonly role: 'designation' }
  | { readonly role: 'type' }
  | { readonly role: 'dimension'; readonly symbol: string; readonly unit: LengthUnit }
  | { readonly role: 'property'; readonly symbol: string; readonly unit: LengthUnit; readonly scale: number }
  | { readonly role: 'ignore'; readonly why: string };

export interface ColumnMapping {
  /** One entry per header, in table order. */
  readonly columns: readonly ({ readonly header: string } & ColumnRole)[];
}

const DESIGNATION_NAMES = ['designation', 'label', 'aisc_manual_label', 'section', 'shape', 'name', 'size'];
const TYPE_NAMES = ['type', 'shape_type', 'family', 'kind'];
const DIMENSION_ALIASES: ReadonlyMap<string, string> = new Map([['H', 'Ht'], ['k_des', 'kdes'], ['Kdes', 'kdes'], ['k des', 'kdes'], ['depth', 'd'], ['flange width', 'bf'], ['web thickness', 'tw'], ['flange thickness', 'tf'], ['outside diameter', 'OD'], ['wall thickness', 'tdes']]);
const PROPERTY_ALIASES: ReadonlyMap<string, string> = new Map([['area', 'A'], ['ag', 'A']]);
/**
 * Column names of cold-formed product tables, any case (common practice): depth and flange width
 * map to the rolled symbols d and bf, which a cold-formed row also reads as D and B.
 */
const COLD_FORMED_ALIASES: ReadonlyMap<string, string> = new Map(Object.entries({
  depth: 'd', 'web depth': 'd', 'flange width': 'bf', flange: 'bf', 'flange width top': 'bf', 'flange width bottom': 'B2', 'crown width': 'B', 'brim width': 'Bb',
  lip: 'L', 'lip length': 'L', 'return lip': 'L', thickness: 't', 'design thickness': 't', 'base metal thickness': 't',
  radius: 'r', 'inside radius': 'R', 'bend radius': 'R', 'inside bend radius': 'R', 'lip angle': 'lipAngle',
}));

const SUPERSCRIPT: Readonly<Record<string, string>> = { '²': '2', '³': '3', '⁴': '4', '⁶': '6' };

/** A unit text such as "in^4", "mm4", "in²", "10^6 mm^4", "10⁶mm⁴" → unit, power and scale; null when not a unit. */
export function readUnit(text: string): { unit: LengthUnit; power: number; scale: number } | null {
  const plain = text.trim().replace(/[²³⁴⁶]/g, (c) => SUPERSCRIPT[c] ?? c).replace(/\s+/g, '').replace(/\^/g, '');
  const m = /^(?:10(\d+)(?:[x×*])?)?(in|ft|mm|cm|m)(\d?)$/.exec(plain);
  if (m === null) return null;
  const unit = m[2]!;
  if (!isLengthUnit(unit)) return null;
  return { unit, power: m[3] === '' || m[3] === undefined ? 1 : Number(m[3]), scale: m[1] === undefined ? 1 : 10 ** Number(m[1]) };
}

/** A header split into its name and unit text: "Ix [in^4]" → Ix, in^4; "Ix_in4" → Ix, in4; "Iz_minor_principal_in4" → Iz, in4. */
export function splitHeader(header: string): { name: string; unitText: string | null } {
  const h = header.trim();
  const bracket = /^(.*?)\s*[[(]([^\])]*)[\])]\s*$/.exec(h);
  if (bracket !== null) return { name: bracket[1]!.trim(), unitText: bracket[2]!.trim() };
  const tokens = h.split('_');
  if (tokens.length > 1 && readUnit(tokens[tokens.length - 1]!) !== null) return { name: tokens[0]!, unitText: tokens[tokens.length - 1]! };
  if (tokens.length > 1) return { name: tokens[0]!, unitText: null };
  return { name: h, unitText: null };
}

/**
 * The symbol a header name stands for: the whole name exactly, an alias, then (case-insensitive
 * when no two symbols differ only by case) the whole name without spaces ("k des" → kdes), then
 * each word from the last ("Flange width bf" → bf, "Depth d" → d). Case is ignored only where it
 * cannot change the meaning: b and B stay distinct.
 */
function findSymbol(name: string, table: readonly string[], aliases: ReadonlyMap<string, string>, anyCase: boolean): string | undefined {
  const one = (text: string): string | undefined => {
    if (table.includes(text)) return text;
    const alias = aliases.get(text) ?? aliases.get(text.toLowerCase());
    if (alias !== undefined) return alias;
    const lower = text.toLowerCase();
    const same = table.filter((s) => s.toLowerCase() === lower);
    // One symbol of that spelling in any case: "BF" is bf; "b" and "B" differ, so they match exactly only.
    if (same.length === 1 && (anyCase || table.every((s) => s === same[0] || s.toLowerCase() !== lower))) return same[0];
    return undefined;
  };
  const trimmed = name.trim();
  const words = trimmed.split(/\s+/).filter((w) => w !== '');
  for (const candidate of [trimmed, words.join(' '), words.join(''), ...words.slice().reverse()]) {
    if (candidate === '') continue;
    const found = one(candidate);
    if (found !== undefined) return found;
  }
  return undefined;
}

export class MappingError extends Error {}

/** The role of one header (auto-detection), in a table whose plain numbers are in `unit`. */
export function detectColumn(header: string, unit: LengthUnit): ColumnRole {
  const lower = header.trim().toLowerCase();
  if (DESIGNATION_NAMES.includes(lower)) return { role: 'designation' };
  if (TYPE_NAMES.includes(lower)) return { role: 'type' };
  const { name, unitText } = splitHeader(header);
  const read = unitText === null ? null : readUnit(unitText);
  const dimension = COLD_FORMED_ALIASES.get(name.trim().toLowerCase().replace(/\s+/g, ' ')) ?? findSymbol(name, DIMENSION_SYMBOLS, DIMENSION_ALIASES, false);
  const property = findSymbol(name, Object.keys(CHECKED_PROPERTIES), PROPERTY_ALIASES, true);
  // A whole name that is a property symbol (e.g. "A") is that property, not a dimension found in one of its words.
  if (dimension !== undefined && header.trim().split('_').length <= 2 && checkedProperty(name.trim()) === undefined) {
    if (unitText !== null && read === null) return { role: 'ignore', why: `dimension ${dimension} with an unknown unit "${unitText}"` };
    if (read !== null && (read.power !== 1 || read.scale !== 1)) return { role: 'ignore', why: `dimension ${dimension} with a unit that is not a length ("${unitText}")` };
    return { role: 'dimension', symbol: dimension, unit: read?.unit ?? unit };
  }
  if (property !== undefined) return propertyRole(property, read, unitText, unit, header);
  const notChecked = NOT_CHECKED.get(name);
  if (notChecked !== undefined) return { role: 'ignore', why: `${name}: ${notChecked}` };
  return { role: 'ignore', why: 'not a designation, type, dimension or property this check knows' };
}

function propertyRole(symbol: string, read: ReturnType<typeof readUnit>, unitText: string | null, unit: LengthUnit, header: string): ColumnRole {
  const power = checkedProperty(symbol)!.power;
  if (unitText !== null && read === null) return { role: 'ignore', why: `property ${symbol} with an unknown unit "${unitText}"` };
  if (read !== null && read.power !== power) {
    return { role: 'ignore', why: `column "${header}" reads as ${symbol}, but its unit "${unitText}" is length^${read.power}, not length^${power}` };
  }
  return { role: 'property', symbol, unit: read?.unit ?? unit, scale: read?.scale ?? 1 };
}

/**
 * The role a user override names: `designation`, `type`, `ignore`, a dimension or property
 * symbol, optionally with a unit ("Ix:mm4", "d:mm", "Ix:10^6mm^4").
 */
export function roleFromTarget(target: string, unit: LengthUnit, header: string): ColumnRole {
  const [symbolText = '', unitText] = target.split(':');
  const symbol = symbolText.trim();
  if (symbol === 'designation' || symbol === 'type') return { role: symbol };
  if (symbol === 'ignore') return { role: 'ignore', why: 'ignored by the user' };
  const read = unitText === undefined ? null : readUnit(unitText);
  if (unitText !== undefined && read === null) throw new MappingError(`--map ${header}=${target}: "${unitText}" is not a unit (in, ft, mm, cm, m with a power, e.g. mm4 or 10^6mm^4)`);
  if (DIMENSION_SYMBOLS.includes(symbol)) {
    if (read !== null && read.power !== 1) throw new MappingError(`--map ${header}=${target}: a dimension is a length, not length^${read.power}`);
    return { role: 'dimension', symbol, unit: read?.unit ?? unit };
  }
  const property = checkedProperty(symbol);
  if (property !== undefined) {
    if (read !== null && read.power !== 1 && read.power !== property.power) throw new MappingError(`--map ${header}=${target}: ${symbol} is length^${property.power}, not length^${read.power}`);
    return { role: 'property', symbol, unit: read?.unit ?? unit, scale: read?.scale ?? 1 };
  }
  const known = ['designation', 'type', 'ignore', ...DIMENSION_SYMBOLS, ...Object.keys(CHECKED_PROPERTIES)].join(', ');
  throw new MappingError(`--map ${header}=${target}: unknown target "${symbol}"; known: ${known}`);
}

/**
 * The mapping of a table's headers: a stored mapping's entries first (by header), then the
 * user's overrides, then auto-detection for the rest. Throws MappingError naming the column
 * when an override names no header of the table or two columns claim the same role.
 */
export function mapColumns(headers: readonly string[], unit: LengthUnit, overrides: ReadonlyMap<string, string> = new Map(), stored?: ColumnMapping): ColumnMapping {
  for (const header of overrides.keys()) {
    if (!headers.includes(header)) throw new MappingError(`--map ${header}=…: the table has no column "${header}"; its columns: ${headers.join(', ')}`);
  }
  const columns: ({ readonly header: string } & ColumnRole)[] = headers.map((header) => {
    const override = overrides.get(header);
    if (override !== undefined) return { header, ...roleFromTarget(override, unit, header) };
    const saved = stored?.columns.find((c) => c.header === header);
    if (saved !== undefined) return saved;
    return { header, ...detectColumn(header, unit) };
  });
  const seen = new Map<string, string>();
  for (const c of columns) {
    const key = c.role === 'dimension' || c.role === 'property' ? `${c.role}:${c.symbol}` : c.role === 'ignore' ? null : c.role;
    if (key === null) continue;
    const earlier = seen.get(key);
    if (earlier !== undefined && !overrides.has(c.header) && !overrides.has(earlier)) {
      // Two columns read the same way by auto-detection: the first one is used, the other is listed as ignored.
      columns[columns.indexOf(c)] = { header: c.header, role: 'ignore', why: `also reads as ${key.replace(/^(dimension|property):/, '')}; column "${earlier}" is used` };
      continue;
    }
    if (earlier !== undefined) throw new MappingError(`columns "${earlier}" and "${c.header}" both map to ${key.replace(/^(dimension|property):/, '')}; correct one with --map "${c.header}=ignore" or another target`);
    seen.set(key, c.header);
  }
  return { columns };
}

/** Validates plain data read back as a ColumnMapping (from a saved JSON file). */
export function readStoredMapping(value: unknown, where: string): ColumnMapping {
  const fail = (what: string): never => {
    throw new MappingError(`${where}: ${what}`);
  };
  if (typeof value !== 'object' || value === null || !Array.isArray((value as { columns?: unknown }).columns)) fail('expected an object with a "columns" list');
  const columns = (value as { columns: unknown[] }).columns.map((c, i): { readonly header: string } & ColumnRole => {
    if (typeof c !== 'object' || c === null) return fail(`columns[${i}] is not an object`);
    const { header, role } = c as { header?: unknown; role?: unknown };
    if (typeof header !== 'string') return fail(`columns[${i}].header must be text`);
    if (role === 'designation' || role === 'type') return { header, role };
    if (role === 'ignore') return { header, role, why: String((c as { why?: unknown }).why ?? 'ignored') };
    const { symbol, unit, scale } = c as { symbol?: unknown; unit?: unknown; scale?: unknown };
    if (typeof symbol !== 'string') return fail(`columns[${i}].symbol must be text`);
    if (!isLengthUnit(unit)) return fail(`columns[${i}].unit must be in, ft, mm, cm or m`);
    if (role === 'dimension') {
      if (!DIMENSION_SYMBOLS.includes(symbol)) return fail(`columns[${i}]: unknown dimension "${symbol}"`);
      return { header, role, symbol, unit };
    }
    if (role === 'property') {
      if (checkedProperty(symbol) === undefined) return fail(`columns[${i}]: unknown property "${symbol}"`);
      const s = scale === undefined ? 1 : scale;
      if (typeof s !== 'number' || !(s > 0)) return fail(`columns[${i}].scale must be a positive number`);
      return { header, role, symbol, unit, scale: s };
    }
    return fail(`columns[${i}].role must be designation, type, dimension, property or ignore`);
  });
  return { columns };
}
