/**
 * Length units, display units and number formatting.
 *
 * THIS IS THE ONLY MODULE THAT CONVERTS LENGTHS (STYLE.md §4). Every other module works in the
 * document's one length unit and calls here when a value must be shown or read in another unit.
 *
 * Factors (exact by definition): 1 in = 25.4 mm (international inch, 1959), 1 ft = 12 in =
 * 304.8 mm, 1 cm = 10 mm, 1 m = 1000 mm. A quantity of dimension length^p (area p = 2,
 * section modulus p = 3, second moment p = 4, warping constant p = 6) converts with the factor
 * raised to p. The factor (a/b)^p is formed in exact integer arithmetic and rounded once to the
 * nearest double, so convertLength(1, 'in', 'mm', 4) is the double nearest 416231.4256.
 * A conversion therefore adds one rounding of the factor and one of the product (≤ 1 ulp each).
 *
 * Not guaranteed: values beyond the double range overflow to ±Infinity like any product.
 */
import type { LengthUnit } from './types.ts';

export { LENGTH_UNITS, type LengthUnit } from './types.ts';

/** Length of one unit in tenths of a millimetre: integers, so ratios of them are exact. */
const TENTHS_OF_MM: Readonly<Record<LengthUnit, bigint>> = { in: 254n, ft: 3048n, mm: 10n, cm: 100n, m: 10000n };

/** Millimetres per unit (exact decimals; each is the double nearest the defined value). */
export const MM_PER_UNIT: Readonly<Record<LengthUnit, number>> = { in: 25.4, ft: 304.8, mm: 1, cm: 10, m: 1000 };

export function isLengthUnit(value: unknown): value is LengthUnit {
  return value === 'in' || value === 'ft' || value === 'mm' || value === 'cm' || value === 'm';
}

const gcd = (a: bigint, b: bigint): bigint => (b === 0n ? a : gcd(b, a % b));

/** The double nearest num/den (num, den > 0), rounded once. */
function nearestDouble(num: bigint, den: bigint): number {
  const small = 2n ** 53n;
  // Both exact as doubles: IEEE division is correctly rounded.
  if (num <= small && den <= small) return Number(num) / Number(den);
  // Scale so the integer quotient carries ≥ 64 significant bits, then keep a sticky bit for the
  // remainder: Number(bigint) rounds to nearest, and the sticky bit prevents a double rounding.
  const shift = BigInt(Math.max(0, 64 - (num.toString(2).length - den.toString(2).length)));
  const scaled = num << shift;
  let q = scaled / den;
  if (scaled % den !== 0n) q |= 1n;
  return Number(q) / 2 ** Number(shift);
}

const factorCache = new Map<string, number>();

/** Exact factor (rounded once) that converts a length^power quantity from `from` to `to`. */
export function lengthFactor(from: LengthUnit, to: LengthUnit, power = 1): number {
  if (!Number.isInteger(power)) throw new RangeError(`lengthFactor: power must be an integer, got ${power}`);
  if (from === to || power === 0) return 1;
  const key = `${from}>${to}^${power}`;
  const cached = factorCache.get(key);
  if (cached !== undefined) return cached;
  const [a, b] = power > 0 ? [TENTHS_OF_MM[from], TENTHS_OF_MM[to]] : [TENTHS_OF_MM[to], TENTHS_OF_MM[from]];
  const g = gcd(a, b);
  const p = BigInt(Math.abs(power));
  const factor = nearestDouble((a / g) ** p, (b / g) ** p);
  factorCache.set(key, factor);
  return factor;
}

/** Converts `value` of dimension length^power (1 length, 2 area, 3 modulus, 4 inertia, 6 warping). */
export function convertLength(value: number, from: LengthUnit, to: LengthUnit, power = 1): number {
  return from === to ? value : value * lengthFactor(from, to, power);
}

// ---------------------------------------------------------------------------------------------
// Display units

/** What a reported number measures, by its length dimension. */
export type Quantity = 'length' | 'area' | 'modulus' | 'inertia' | 'warping';

export const QUANTITY_POWER: Readonly<Record<Quantity, number>> = { length: 1, area: 2, modulus: 3, inertia: 4, warping: 6 };

/** A unit to show a quantity in: value shown = (value in lengthUnit^power) / scale. */
export interface DisplayUnit {
  readonly id: string;
  /** Printable label, e.g. 'in⁴', '10⁶ mm⁴'. */
  readonly label: string;
  /** Plain-ASCII label for CSV headers and terminals without Unicode, e.g. 'in4', '1e6 mm4'. */
  readonly ascii: string;
  readonly quantity: Quantity;
  readonly lengthUnit: LengthUnit;
  readonly scale: number;
}

const SUPERSCRIPT: Readonly<Record<number, string>> = { 1: '', 2: '²', 3: '³', 4: '⁴', 6: '⁶', 9: '⁹' };

function displayUnit(quantity: Quantity, lengthUnit: LengthUnit, scaleExponent = 0): DisplayUnit {
  const p = QUANTITY_POWER[quantity];
  const prefix = scaleExponent === 0 ? '' : `10${SUPERSCRIPT[scaleExponent] ?? `^${scaleExponent}`} `;
  const asciiPrefix = scaleExponent === 0 ? '' : `1e${scaleExponent} `;
  const asciiPower = p === 1 ? '' : String(p);
  return {
    id: `${asciiPrefix.trim()}${asciiPrefix ? '-' : ''}${lengthUnit}${asciiPower}`,
    label: `${prefix}${lengthUnit}${SUPERSCRIPT[p] ?? `^${p}`}`,
    ascii: `${asciiPrefix}${lengthUnit}${asciiPower}`,
    quantity,
    lengthUnit,
    scale: 10 ** scaleExponent,
  };
}

/** Every display unit offered, per quantity (the first of each unit's list is its plain power). */
export const DISPLAY_UNITS: Readonly<Record<Quantity, readonly DisplayUnit[]>> = {
  length: (['in', 'ft', 'mm', 'cm', 'm'] as const).map((u) => displayUnit('length', u)),
  area: [displayUnit('area', 'in'), displayUnit('area', 'ft'), displayUnit('area', 'mm'), displayUnit('area', 'mm', 3), displayUnit('area', 'cm'), displayUnit('area', 'm')],
  modulus: [displayUnit('modulus', 'in'), displayUnit('modulus', 'ft'), displayUnit('modulus', 'mm'), displayUnit('modulus', 'mm', 3), displayUnit('modulus', 'cm'), displayUnit('modulus', 'm')],
  inertia: [displayUnit('inertia', 'in'), displayUnit('inertia', 'ft'), displayUnit('inertia', 'mm'), displayUnit('inertia', 'mm', 6), displayUnit('inertia', 'cm'), displayUnit('inertia', 'm')],
  warping: [displayUnit('warping', 'in'), displayUnit('warping', 'mm'), displayUnit('warping', 'mm', 9), displayUnit('warping', 'cm'), displayUnit('warping', 'm')],
};

export type DisplaySet = Readonly<Record<Quantity, DisplayUnit>>;

function findDisplayUnit(quantity: Quantity, lengthUnit: LengthUnit, scale = 1): DisplayUnit {
  const found = DISPLAY_UNITS[quantity].find((d) => d.lengthUnit === lengthUnit && d.scale === scale);
  if (!found) throw new RangeError(`no display unit for ${quantity} in ${lengthUnit} scaled by ${scale}`);
  return found;
}

/**
 * Default display units per document unit (common practice):
 * in and ft documents show section properties in inches (ft⁴ values are unreadably small);
 * mm and m documents use mm, mm², 10³ mm³, 10⁶ mm⁴, 10⁹ mm⁶ (the steel tables' metric layout);
 * cm documents use cm, cm², cm³, cm⁴, cm⁶.
 */
export function defaultDisplaySet(unit: LengthUnit): DisplaySet {
  if (unit === 'in' || unit === 'ft') {
    return { length: findDisplayUnit('length', 'in'), area: findDisplayUnit('area', 'in'), modulus: findDisplayUnit('modulus', 'in'), inertia: findDisplayUnit('inertia', 'in'), warping: findDisplayUnit('warping', 'in') };
  }
  if (unit === 'cm') {
    return { length: findDisplayUnit('length', 'cm'), area: findDisplayUnit('area', 'cm'), modulus: findDisplayUnit('modulus', 'cm'), inertia: findDisplayUnit('inertia', 'cm'), warping: findDisplayUnit('warping', 'cm') };
  }
  return { length: findDisplayUnit('length', 'mm'), area: findDisplayUnit('area', 'mm'), modulus: findDisplayUnit('modulus', 'mm', 1e3), inertia: findDisplayUnit('inertia', 'mm', 1e6), warping: findDisplayUnit('warping', 'mm', 1e9) };
}

/** The display set that shows every quantity in plain powers of `unit` (in, in², in³ …). */
export function plainDisplaySet(unit: LengthUnit): DisplaySet {
  const pick = (q: Quantity): DisplayUnit => DISPLAY_UNITS[q].find((d) => d.lengthUnit === unit && d.scale === 1) ?? displayUnit(q, unit);
  return { length: pick('length'), area: pick('area'), modulus: pick('modulus'), inertia: pick('inertia'), warping: pick('warping') };
}

/** A value in the document unit, expressed in a display unit. */
export function toDisplay(value: number, documentUnit: LengthUnit, display: DisplayUnit): number {
  return convertLength(value, documentUnit, display.lengthUnit, QUANTITY_POWER[display.quantity]) / display.scale;
}

/** A value typed in a display unit, expressed in the document unit (the inverse of toDisplay). */
export function fromDisplay(value: number, documentUnit: LengthUnit, display: DisplayUnit): number {
  return convertLength(value * display.scale, display.lengthUnit, documentUnit, QUANTITY_POWER[display.quantity]);
}

// ---------------------------------------------------------------------------------------------
// Formatting

export interface FormatOptions {
  /** Group integer digits in threes with this separator (e.g. ',' or a thin space); default none. */
  readonly grouping?: string;
  /** Plain notation for decimal exponents in [minExponent, maxExponent); scientific outside. Defaults −4 and 9. */
  readonly minExponent?: number;
  readonly maxExponent?: number;
}

function groupDigits(integer: string, separator: string): string {
  let out = '';
  for (let i = 0; i < integer.length; i++) {
    if (i > 0 && (integer.length - i) % 3 === 0) out += separator;
    out += integer[i];
  }
  return out;
}

/**
 * `value` rounded to `sig` significant figures (1..17), keeping significant trailing zeros
 * ("12.00" at 4 figures). Zero (either sign) prints "0", never "-0". Plain notation for decimal
 * exponents −4..8 by default, otherwise "1.235e12" / "4.2e-7". Non-finite values print
 * "NaN", "Infinity", "-Infinity". Large plain integers pad with zeros ("12300" at 3 figures).
 */
export function formatSig(value: number, sig: number, options: FormatOptions = {}): string {
  if (!Number.isInteger(sig) || sig < 1 || sig > 17) throw new RangeError(`formatSig: significant figures must be 1..17, got ${sig}`);
  if (Number.isNaN(value)) return 'NaN';
  if (!Number.isFinite(value)) return value > 0 ? 'Infinity' : '-Infinity';
  if (value === 0) return '0';
  const [mantissa = '', exponentText = '0'] = Math.abs(value).toExponential(sig - 1).split('e');
  const exponent = Number(exponentText);
  const digits = mantissa.replace('.', '');
  const sign = value < 0 ? '-' : '';
  const { minExponent = -4, maxExponent = 9 } = options;
  if (exponent < minExponent || exponent >= maxExponent) return `${sign}${mantissa}e${exponent}`;
  let integer: string;
  let fraction: string;
  if (exponent < 0) {
    integer = '0';
    fraction = '0'.repeat(-exponent - 1) + digits;
  } else if (exponent + 1 >= digits.length) {
    integer = digits + '0'.repeat(exponent + 1 - digits.length);
    fraction = '';
  } else {
    integer = digits.slice(0, exponent + 1);
    fraction = digits.slice(exponent + 1);
  }
  const grouped = options.grouping ? groupDigits(integer, options.grouping) : integer;
  return `${sign}${grouped}${fraction ? `.${fraction}` : ''}`;
}

/** A value in the document unit formatted in a display unit: { text, unit } for tables. */
export function formatQuantity(value: number, documentUnit: LengthUnit, display: DisplayUnit, sig = 4, options: FormatOptions = {}): { text: string; unit: string } {
  return { text: formatSig(toDisplay(value, documentUnit, display), sig, options), unit: display.label };
}

// ---------------------------------------------------------------------------------------------
// Physical quantities (force, stress, moment …) and unit systems: see ./quantity.ts, ./systems.ts.
export * from './quantity.ts';
export * from './systems.ts';
