/**
 * The plain logic behind the table-check view (CheckView.tsx), kept free of React and the DOM so
 * it is unit-tested under Node: the key a column mapping is remembered under (one per header
 * signature), the choices of the mapping dropdowns and the target text a choice stands for
 * (core/check/columns.ts roleFromTarget reads it), reading a remembered mapping back, and core's
 * messages reworded for the view (core speaks in command-line flags).
 */
import { CHECKED_PROPERTIES, DIMENSION_SYMBOLS, familyOf, readStoredMapping, type ColumnMapping, type ColumnRole, type TableFamily } from '../../../core/check/index.ts';
import { isLengthUnit, LENGTH_UNITS, type LengthUnit } from '../../../core/units/index.ts';

/** Settings keys of remembered mappings start with this. */
export const MAPPING_KEY_PREFIX = 'check-mapping:';

/** 32-bit FNV-1a of a text (UTF-16 code units), as 8 hex digits: a short stable key, not a secret. */
export function fnv1a(text: string): string {
  let h = 0x811c9dc5;
  for (let i = 0; i < text.length; i++) {
    h ^= text.charCodeAt(i);
    h = Math.imul(h, 0x01000193) >>> 0;
  }
  return h.toString(16).padStart(8, '0');
}

/**
 * The key a table's mapping is remembered under: its header signature, i.e. the headers trimmed,
 * in order. Two tables with the same headers share a mapping; any change of name or order gives
 * another key. The count is in the key so it can be read at a glance in storage.
 */
export function mappingKey(headers: readonly string[]): string {
  const trimmed = headers.map((h) => h.trim());
  return `${MAPPING_KEY_PREFIX}${trimmed.length}:${fnv1a(trimmed.join('\u001f'))}`;
}

/** What is remembered for a header signature: the mapping, with the table unit and shape type it was made for. */
export interface RememberedCheck {
  readonly mapping: ColumnMapping;
  readonly unit: LengthUnit;
  /** The shape type of rows without a type column; null when the table has its own. */
  readonly type: TableFamily | null;
}

/** The stored text: the headers too, so a (very unlikely) hash collision is detected, not applied. */
export function rememberedText(headers: readonly string[], remembered: RememberedCheck): string {
  return JSON.stringify({ headers: headers.map((h) => h.trim()), ...remembered });
}

/** What is remembered for these headers, or null when nothing is stored, it is damaged, or it is another table's. */
export function readRemembered(headers: readonly string[], text: string | null): RememberedCheck | null {
  if (text === null) return null;
  try {
    const value = JSON.parse(text) as { headers?: unknown; mapping?: unknown; unit?: unknown; type?: unknown };
    const trimmed = headers.map((h) => h.trim());
    if (!Array.isArray(value.headers) || value.headers.length !== trimmed.length || value.headers.some((h, i) => h !== trimmed[i])) return null;
    if (!isLengthUnit(value.unit)) return null;
    const type = typeof value.type === 'string' ? (familyOf(value.type) ?? null) : null;
    const mapping = readStoredMapping(value.mapping, 'remembered mapping');
    if (mapping.columns.length !== trimmed.length || mapping.columns.some((c, i) => c.header !== trimmed[i])) return null;
    return { mapping, unit: value.unit, type };
  } catch {
    return null; // a damaged entry is ignored and replaced at the next check, never a reason to refuse the table
  }
}

/** The settings key of the index of remembered header signatures (most recent first). */
export const MAPPING_INDEX_KEY = `${MAPPING_KEY_PREFIX}index`;
/** How many remembered tables the index keeps. */
export const MAPPING_INDEX_SIZE = 30;

function readIndex(text: string | null): string[][] {
  if (text === null) return [];
  try {
    const value: unknown = JSON.parse(text);
    if (!Array.isArray(value)) return [];
    return value.filter((h): h is string[] => Array.isArray(h) && h.every((x) => typeof x === 'string'));
  } catch {
    return []; // a damaged index is read as empty, never a reason to refuse the table
  }
}

/**
 * The index text after remembering a table with these headers: its signature first, once, then
 * the others most recent first, at most MAPPING_INDEX_SIZE. The index lets a table with columns
 * added find the mapping remembered for the narrower one (its exact key has changed).
 */
export function rememberedIndex(previous: string | null, headers: readonly string[]): string {
  const trimmed = headers.map((h) => h.trim());
  const same = (h: readonly string[]): boolean => h.length === trimmed.length && h.every((x, i) => x === trimmed[i]);
  return JSON.stringify([trimmed, ...readIndex(previous).filter((h) => !same(h))].slice(0, MAPPING_INDEX_SIZE));
}

/**
 * The remembered header signatures whose every column this table still has (columns were added),
 * widest first; the table's own signature is left out (its own key finds it).
 */
export function rememberedWithin(headers: readonly string[], indexText: string | null): string[][] {
  const present = new Set(headers.map((h) => h.trim()));
  return readIndex(indexText)
    .filter((h) => h.length < present.size && h.every((x) => present.has(x)))
    .sort((a, b) => b.length - a.length);
}

/** The columns of a table that a mapping remembered for `known` headers did not know, in table order. */
export function newColumns(headers: readonly string[], known: readonly string[]): string[] {
  const seen = new Set(known.map((h) => h.trim()));
  return headers.map((h) => h.trim()).filter((h) => !seen.has(h));
}

/** A dropdown choice: the role's target text and its label. */
export interface Choice {
  readonly value: string;
  readonly label: string;
}

/** Choices for what a column holds, grouped in the order an engineer reads a table. */
export function targetChoices(): { readonly group: string; readonly choices: readonly Choice[] }[] {
  return [
    { group: 'Row', choices: [{ value: 'designation', label: 'designation' }, { value: 'type', label: 'shape type' }, { value: 'ignore', label: 'not checked' }] },
    { group: 'Dimension', choices: DIMENSION_SYMBOLS.map((s) => ({ value: s, label: s })) },
    { group: 'Property', choices: Object.entries(CHECKED_PROPERTIES).map(([s, p]) => ({ value: s, label: `${s} — ${p.what}` })) },
  ];
}

const SUPER: Readonly<Record<number, string>> = { 1: '', 2: '²', 3: '³', 4: '⁴' };

/** Unit choices for a quantity of length power `power`: each length unit to that power, and the scaled mm ones of metric tables. */
export function unitChoices(power: number): Choice[] {
  const plain = LENGTH_UNITS.map((u) => ({ value: `${u}${power === 1 ? '' : power}`, label: `${u}${SUPER[power] ?? `^${power}`}` }));
  if (power === 3) plain.push({ value: '10^3mm3', label: '10³ mm³' });
  if (power === 4) plain.push({ value: '10^6mm4', label: '10⁶ mm⁴' });
  return plain;
}

/** The column's role as the symbol part of a target ("designation", "Ix"); ignore for an ignored column. */
export function symbolOf(role: ColumnRole): string {
  return role.role === 'dimension' || role.role === 'property' ? role.symbol : role.role;
}

/** The unit part of a target for a dimension or property role ("mm", "in4", "10^6mm4"); '' for the others. */
export function unitTextOf(role: ColumnRole): string {
  if (role.role === 'dimension') return role.unit;
  if (role.role !== 'property') return '';
  const power = CHECKED_PROPERTIES[role.symbol]?.power ?? 1;
  const exponent = Math.round(Math.log10(role.scale));
  return `${role.scale === 1 ? '' : `10^${exponent}`}${role.unit}${power === 1 ? '' : power}`;
}

/** The length power of a target symbol: 1 for a dimension, the property's power, null for designation/type/ignore. */
export function powerOf(symbol: string): number | null {
  if (DIMENSION_SYMBOLS.includes(symbol)) return 1;
  return CHECKED_PROPERTIES[symbol]?.power ?? null;
}

/**
 * The target text for a symbol and unit choice, as core/check roleFromTarget reads it:
 * "designation", "ignore", "d:mm", "Ix:10^6mm4". A symbol that takes a unit keeps the unit given
 * when it is of the right power, else the table unit to that power.
 */
export function targetText(symbol: string, unitText: string, tableUnit: LengthUnit): string {
  const power = powerOf(symbol);
  if (power === null) return symbol;
  const fits = unitChoices(power).some((c) => c.value === unitText);
  return `${symbol}:${fits ? unitText : `${tableUnit}${power === 1 ? '' : power}`}`;
}

/** Core's bad-input messages name command-line flags; in the view the same fixes are made in the mapping and the options. */
export function viewMessage(message: string): string {
  return message
    .replace(/--map COLUMN=(\w+)/g, 'the mapping (set a column to $1)')
    .replace(/--map "?([^"=]+?)=([^"\s;,)]+)"?(?: or another target)?/g, 'the mapping (set column "$1" to $2)')
    .replace(/--map (\S+?)=…/g, 'the mapping of "$1"')
    .replace(/^--map /, 'mapping: ')
    .replace(/give --type/g, 'choose the shape type')
    .replace(/no --type was given/g, 'no shape type is chosen')
    .replace(/ \(use --own-labels for a maker's own designations\)/g, " (tick \"maker's own designations\" for a maker's own labels)")
    .replace(/--tolerance /g, 'tolerance ');
}
