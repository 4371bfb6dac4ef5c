/**
 * From a table row's published dimensions to a part of the parts library, with the modelling
 * conventions of core/catalogue (the same rules, applied to any row instead of the stored
 * AISC v15.0 rows; tests/check/shapes.test.ts holds them equal to the catalogue's own params
 * for every catalogue entry, so the two cannot drift apart):
 *   flanged families — the slopes, root fillets and toe radii of core/catalogue/conventions.ts
 *     (docs/catalogue-conventions.md);
 *   L — root radius 3/4·(kdes − t) and toe radius r/2 when kdes is given (sharp otherwise), the
 *     thickness from the label's fraction when the printed t is that fraction rounded; the
 *     longer leg b along y.
 *   HSS (rectangular) — design wall tdes, outside corner radius 2·tdes.
 *   HSS (round), PIPE — OD with tdes; a round HSS uses the nominal OD of its label when the
 *     printed OD is that value rounded.
 * A column "r" (root fillet radius), "rt" (toe radius) or "slope", when the table has one,
 * replaces the convention.
 *
 * Units: any length unit, consistently (the conventions are ratios of the dimensions, except
 *   the label's nominal OD, which is read in inches and used only for inch tables).
 */
import { publishedCaveats } from '../catalogue/caveats.ts';
import { angleRadii, angleThickness, flangedPart, HALF_FILLET_FAMILIES } from '../catalogue/index.ts';
import type { LengthUnit } from '../units/types.ts';

/** The shape families a table row may name (AISC type codes). */
export const TABLE_FAMILIES = ['W', 'M', 'HP', 'S', 'C', 'MC', 'WT', 'MT', 'ST', 'L', 'HSS', 'PIPE', 'LC', 'LZ', 'HAT', 'TRACK'] as const;
export type TableFamily = (typeof TABLE_FAMILIES)[number];

export function isTableFamily(value: string): value is TableFamily {
  return (TABLE_FAMILIES as readonly string[]).includes(value);
}

/** The family named by a type cell ("w", "Pipe", "hss" …), or undefined. */
export function familyOf(text: string): TableFamily | undefined {
  const key = text.trim().toUpperCase();
  return isTableFamily(key) ? key : COLD_FORMED_NAMES[key.replace(/[\s_-]+/g, ' ')];
}

/** Cold-formed families (no AISC label): lipped channel, lipped Z, hat, track. */
export const COLD_FORMED_FAMILIES: readonly TableFamily[] = ['LC', 'LZ', 'HAT', 'TRACK'];

/** Type cells that name a cold-formed family in words (upper case, single spaces). */
const COLD_FORMED_NAMES: Readonly<Record<string, TableFamily>> = {
  'LIPPED CHANNEL': 'LC', 'LIPPED C': 'LC', STUD: 'LC', 'C STUD': 'LC', 'LIPPED Z': 'LZ', 'Z PURLIN': 'LZ', 'HAT CHANNEL': 'HAT', 'FURRING CHANNEL': 'HAT', 'PLAIN CHANNEL': 'TRACK', 'UNLIPPED CHANNEL': 'TRACK',
};

/** The dimensions each family needs (published symbols); optional ones follow in OPTIONAL_DIMENSIONS. */
export const REQUIRED_DIMENSIONS: Readonly<Record<TableFamily, readonly string[]>> = {
  W: ['d', 'bf', 'tw', 'tf', 'kdes'],
  M: ['d', 'bf', 'tw', 'tf', 'kdes'],
  HP: ['d', 'bf', 'tw', 'tf', 'kdes'],
  S: ['d', 'bf', 'tw', 'tf', 'kdes'],
  C: ['d', 'bf', 'tw', 'tf', 'kdes'],
  MC: ['d', 'bf', 'tw', 'tf', 'kdes'],
  WT: ['d', 'bf', 'tw', 'tf', 'kdes'],
  MT: ['d', 'bf', 'tw', 'tf', 'kdes'],
  ST: ['d', 'bf', 'tw', 'tf', 'kdes'],
  L: ['d', 'b', 't'],
  HSS: ['tdes'],
  PIPE: ['OD', 'tdes'],
  LC: ['t'],
  LZ: ['t'],
  HAT: ['t', 'Bb'],
  TRACK: ['t'],
};

/** Every dimension symbol a table column may map to. */
export const DIMENSION_SYMBOLS: readonly string[] = ['d', 'bf', 'tw', 'tf', 'kdes', 'b', 't', 'Ht', 'B', 'tnom', 'tdes', 'OD', 'ID', 'r', 'rt', 'slope', 'D', 'B2', 'L', 'R', 'Bb', 'lipAngle'];

const COLD_FORMED_PART: Readonly<Record<string, string>> = { LC: 'lipped-channel', LZ: 'lipped-z', HAT: 'hat', TRACK: 'track' };

/**
 * A cold-formed row (core/parts/cold-formed.ts): depth D (or d), flange width B (or bf), lip L,
 * thickness t, inside bend radius R (or r); all out-to-out as product tables give them.
 */
function coldFormedPart(family: TableFamily, dims: Readonly<Record<string, number>>): TablePartResult {
  const D = dims['D'] ?? dims['d'];
  const B = dims['B'] ?? dims['bf'];
  const R = dims['R'] ?? dims['r'] ?? 0;
  const missing = [D === undefined ? 'depth (D or d)' : '', B === undefined ? 'flange or crown width (B or bf)' : '', family === 'LC' && dims['L'] === undefined ? 'lip L' : '', ...REQUIRED_DIMENSIONS[family].filter((k) => dims[k] === undefined)].filter((m) => m !== '');
  if (missing.length > 0) return { ok: false, message: `a ${family} row needs ${missing.join(', ')} (no value given)` };
  const params: Record<string, number> = { D: D!, B: B!, t: dims['t']!, R };
  for (const key of ['B2', 'L', 'Bb', 'lipAngle']) if (dims[key] !== undefined && !(family === 'TRACK' && key === 'L')) params[key] = dims[key];
  return { ok: true, part: { shape: COLD_FORMED_PART[family]!, params, modelling: `${COLD_FORMED_PART[family]!}: out-to-out D, B, L; inside bend radius R = ${R} at every bend (exact arcs)` } };
}

export interface TablePart {
  readonly shape: string;
  readonly params: Readonly<Record<string, number>>;
  readonly modelling: string;
}

export type TablePartResult = { readonly ok: true; readonly part: TablePart } | { readonly ok: false; readonly message: string };

function need(dims: Readonly<Record<string, number>>, family: string, keys: readonly string[]): string | null {
  const missing = keys.filter((k) => dims[k] === undefined);
  return missing.length === 0 ? null : `a ${family} row needs ${missing.join(', ')} (no value given)`;
}

/** The modelling note with the catalogue's published caveats for this designation appended ("; NOTE: …"). */
function withCaveats(modelling: string, designation: string, family: string): string {
  const caveats = publishedCaveats(designation.replace(/\s+/g, '').toUpperCase(), family);
  return caveats.length === 0 ? modelling : `${modelling}; NOTE: ${caveats.join('; ')}`;
}

/** The nominal OD in a round HSS label ("HSS6.625X0.280" → 6.625), or NaN. */
export function labelOD(designation: string): number {
  const m = /^HSS(\d+(?:\.\d+)?)X\d*\.?\d+$/i.exec(designation.replace(/\s+/g, ''));
  return m === null ? Number.NaN : Number(m[1]);
}

/**
 * The part a row builds. `dims` holds the published dimensions by symbol in `unit`; the
 * designation is used only for a round HSS's nominal OD (inch tables).
 */
export function tablePart(family: TableFamily, dims: Readonly<Record<string, number>>, designation: string, unit: LengthUnit): TablePartResult {
  if (COLD_FORMED_FAMILIES.includes(family)) return coldFormedPart(family, dims);
  const missing = need(dims, family, REQUIRED_DIMENSIONS[family]);
  if (family === 'HSS') {
    const t = dims['tdes']!;
    if (dims['OD'] !== undefined) {
      const printed = dims['OD'];
      const nominal = labelOD(designation);
      // Inch tables print OD to 3 significant figures (6.63 for 6.625): use the label's value when it rounds to the printed one.
      const useLabel = unit === 'in' && Number.isFinite(nominal) && Number(nominal.toPrecision(3)) === Number(printed.toPrecision(3));
      if (missing !== null) return { ok: false, message: missing };
      return { ok: true, part: { shape: 'pipe', params: { OD: useLabel ? nominal : printed, t }, modelling: useLabel ? `round HSS: nominal OD ${nominal} from the label, wall tdes` : 'round HSS: OD as given, wall tdes' } };
    }
    const m2 = need(dims, 'rectangular HSS', ['Ht', 'B', 'tdes']);
    if (m2 !== null) return { ok: false, message: `${m2} (a round HSS needs OD and tdes)` };
    const r = dims['r'] ?? 2 * t;
    return { ok: true, part: { shape: 'rect-tube', params: { H: dims['Ht']!, B: dims['B']!, t, r }, modelling: dims['r'] === undefined ? 'rectangular HSS: wall tdes, outside corner radius 2·tdes' : 'rectangular HSS: wall tdes, outside corner radius r as given' } };
  }
  if (missing !== null) return { ok: false, message: missing };
  if (family === 'PIPE') return { ok: true, part: { shape: 'pipe', params: { OD: dims['OD']!, t: dims['tdes']! }, modelling: 'pipe: OD with the design wall tdes (the published ID is nominal)' } };
  if (family === 'L') {
    const t = unit === 'in' ? angleThickness(designation, dims['t']!) : dims['t']!;
    const byRule = angleRadii(t, dims['kdes']);
    const r = dims['r'] ?? byRule.r;
    const rt = dims['rt'] ?? (dims['r'] === undefined ? byRule.rt : 0);
    const radii = dims['r'] !== undefined ? 'root radius r as given' : dims['kdes'] !== undefined ? 'root radius 3/4·(kdes − t), toe radius r/2' : 'sharp root and toes (no kdes)';
    // Published d is the shorter leg; the tabulated x axis has the longer leg b vertical (core/catalogue).
    return { ok: true, part: { shape: 'angle', params: { d: dims['b']!, b: dims['d']!, t, r, rt }, modelling: withCaveats(`angle: ${radii}, longer leg along y`, designation, 'L') } };
  }
  const { shape, params, slopeRule } = flangedPart(family, dims as Record<'d' | 'bf' | 'tw' | 'tf' | 'kdes', number>, { slope: dims['slope'], r: dims['r'], rt: dims['rt'] });
  const rule = dims['r'] !== undefined ? 'r as given' : HALF_FILLET_FAMILIES.has(family) ? 'r = (kdes − flange thickness at the web)/2' : 'r = kdes − flange thickness at the web';
  const toe = params['rt'] === undefined ? '' : dims['rt'] !== undefined ? ', toe radius as given' : ', toe radius 0.4·tf';
  return { ok: true, part: { shape, params, modelling: withCaveats(`${family}: ${slopeRule}${params['slope'] === undefined ? '' : ', tf average'}, ${rule}${toe}`, designation, family) } };
}
