/**
 * Typed physical quantities: what kind a number is (length, force, line load, moment, stress …),
 * the units it may be typed or shown in, their exact factors to SI, and ONE reader for text typed
 * into any input box or command-line flag.
 *
 * Units: every value leaves this module in SI — m, N, N/m, N·m, Pa, kg/m³, N·m² — or, through
 * `convertQuantity`, in any unit of its kind. Section geometry (length powers of the document unit)
 * is converted by ./index.ts, which keeps the exact integer arithmetic for powers up to 6.
 *
 * Factors (definitions, so exact as decimals; each is the double nearest the defined value, and a
 * derived factor such as psi adds one rounding per operation, ≤ 1 ulp each):
 *   1 in = 0.0254 m, 1 ft = 0.3048 m                     (international inch and foot, 1959)
 *   1 lb = 0.45359237 kg                                  (international pound, 1959)
 *   g_n = 9.80665 m/s²                                    (standard gravity, CGPM 1901)
 *   1 lbf = 0.45359237 kg × 9.80665 m/s² = 4.4482216152605 N; 1 kip = 1000 lbf
 *   1 tonne = 1000 kg
 * The tests check every derived factor against NIST SP 811 (2008), Appendix B.8.
 *
 * Mass and weight: the pound (lb) and kilogram are masses. Where a field measures a force and the
 * text gives the matching mass (10 lb for a load, 90 lb/ft for a weight per length, 1.2 kg/m), the
 * mass is taken under standard gravity — the pound-force is defined that way — and the field shows
 * the force it read. Unit weight typed into a density field (kN/m³) is divided by g_n likewise.
 *
 * Reading text (`readQuantity`): an optional sign, then a number with an optional unit — decimals,
 * exponents (1.8e6), fractions (3/4) and mixed numbers (9-1/2, 9 1/2). A bare number is read in the
 * field's current unit. Lengths may chain feet and inches: 13'-9", 13 ft 9-1/2 in, 13' 9 1/2".
 * A decimal comma (4,2 m) is accepted; a comma that could be a thousands separator (12,000) is
 * refused as ambiguous. Refusals name the field and the text: empty, not a number, unknown unit,
 * a unit of another kind.
 *
 * Not guaranteed: values beyond the double range overflow like any product.
 */

/** Exponents of a unit over length, force and mass: stress is L⁻²F, density L⁻³M. */
interface Dimension {
  readonly L: number;
  readonly F: number;
  readonly M: number;
}

export type QuantityKind =
  | 'length' | 'area' | 'modulus' | 'inertia' | 'warping'
  | 'force' | 'lineLoad' | 'moment' | 'torque' | 'stress' | 'density'
  | 'weightPerLength' | 'massPerLength' | 'flexuralStiffness' | 'axialStiffness'
  | 'angle' | 'ratio';

interface KindSpec {
  readonly dim: Dimension;
  /** Words for messages: "a length", "a force per length". */
  readonly words: string;
  /** The SI unit values are kept in. */
  readonly si: string;
  /** A matching mass (or weight, for density) is read under standard gravity. */
  readonly gravity?: boolean;
  /** Units offered, in the order shown in hints. */
  readonly units: readonly string[];
}

const d = (L: number, F = 0, M = 0): Dimension => ({ L, F, M });

export const KINDS: Readonly<Record<QuantityKind, KindSpec>> = {
  length: { dim: d(1), words: 'a length', si: 'm', units: ['mm', 'cm', 'm', 'in', 'ft'] },
  area: { dim: d(2), words: 'an area', si: 'm²', units: ['mm²', 'cm²', 'm²', 'in²', 'ft²'] },
  modulus: { dim: d(3), words: 'a section modulus (length³)', si: 'm³', units: ['mm³', 'cm³', 'm³', 'in³', 'ft³'] },
  inertia: { dim: d(4), words: 'a second moment of area (length⁴)', si: 'm⁴', units: ['mm⁴', 'cm⁴', 'm⁴', 'in⁴', 'ft⁴'] },
  warping: { dim: d(6), words: 'a warping constant (length⁶)', si: 'm⁶', units: ['mm⁶', 'cm⁶', 'm⁶', 'in⁶', 'ft⁶'] },
  force: { dim: d(0, 1), words: 'a force', si: 'N', gravity: true, units: ['N', 'kN', 'MN', 'lbf', 'kip'] },
  lineLoad: { dim: d(-1, 1), words: 'a force per length', si: 'N/m', gravity: true, units: ['N/m', 'kN/m', 'N/mm', 'lbf/ft', 'kip/ft', 'lbf/in', 'kip/in'] },
  moment: { dim: d(1, 1), words: 'a moment (force × length)', si: 'N·m', gravity: true, units: ['N·mm', 'N·m', 'kN·m', 'kN·mm', 'MN·m', 'lbf·in', 'lbf·ft', 'kip·in', 'kip·ft'] },
  torque: { dim: d(1, 1), words: 'a torque (force × length)', si: 'N·m', gravity: true, units: ['N·mm', 'N·m', 'kN·m', 'lbf·in', 'lbf·ft', 'kip·in', 'kip·ft'] },
  stress: { dim: d(-2, 1), words: 'a stress or modulus (force per area)', si: 'Pa', units: ['Pa', 'kPa', 'MPa', 'GPa', 'psi', 'ksi'] },
  density: { dim: d(-3, 0, 1), words: 'a density (mass per volume)', si: 'kg/m³', gravity: true, units: ['kg/m³', 'lb/ft³'] },
  weightPerLength: { dim: d(-1, 1), words: 'a weight per length', si: 'N/m', gravity: true, units: ['N/m', 'kN/m', 'kg/m', 'lb/ft', 'kip/ft'] },
  massPerLength: { dim: d(-1, 0, 1), words: 'a mass per length', si: 'kg/m', gravity: true, units: ['kg/m', 'lb/ft'] },
  flexuralStiffness: { dim: d(2, 1), words: 'a flexural stiffness EI (force × length²)', si: 'N·m²', units: ['N·mm²', 'N·m²', 'kN·m²', 'MN·m²', 'lbf·in²', 'kip·in²', 'kip·ft²'] },
  axialStiffness: { dim: d(0, 1), words: 'an axial stiffness EA (force)', si: 'N', units: ['N', 'kN', 'MN', 'lbf', 'kip'] },
  angle: { dim: d(0), words: 'an angle', si: 'deg', units: ['deg'] },
  ratio: { dim: d(0), words: 'a ratio', si: '–', units: ['–'] },
};

export const QUANTITY_KINDS = Object.keys(KINDS) as readonly QuantityKind[];

// ---------------------------------------------------------------------------------------------
// Atoms: the named units a unit expression is built from.

export const METRES_PER_INCH = 0.0254;
export const METRES_PER_FOOT = 0.3048;
export const KG_PER_POUND = 0.45359237;
export const STANDARD_GRAVITY = 9.80665;
/** 0.45359237 × 9.80665, exact: 4.4482216152605 N. */
export const NEWTONS_PER_LBF = 4.4482216152605;

interface Atom {
  readonly si: number;
  readonly dim: Dimension;
}

const LBF = NEWTONS_PER_LBF;
const KIP = 1000 * NEWTONS_PER_LBF;
const IN = METRES_PER_INCH;
const FT = METRES_PER_FOOT;
const LB = KG_PER_POUND;

const ATOMS: Readonly<Record<string, Atom>> = {
  m: { si: 1, dim: d(1) }, mm: { si: 1e-3, dim: d(1) }, cm: { si: 1e-2, dim: d(1) }, km: { si: 1e3, dim: d(1) },
  metre: { si: 1, dim: d(1) }, metres: { si: 1, dim: d(1) }, meter: { si: 1, dim: d(1) }, meters: { si: 1, dim: d(1) },
  in: { si: IN, dim: d(1) }, inch: { si: IN, dim: d(1) }, inches: { si: IN, dim: d(1) }, '"': { si: IN, dim: d(1) }, '″': { si: IN, dim: d(1) }, "''": { si: IN, dim: d(1) },
  ft: { si: FT, dim: d(1) }, foot: { si: FT, dim: d(1) }, feet: { si: FT, dim: d(1) }, "'": { si: FT, dim: d(1) }, '′': { si: FT, dim: d(1) },
  N: { si: 1, dim: d(0, 1) }, kN: { si: 1e3, dim: d(0, 1) }, MN: { si: 1e6, dim: d(0, 1) },
  lbf: { si: LBF, dim: d(0, 1) }, kip: { si: KIP, dim: d(0, 1) }, kips: { si: KIP, dim: d(0, 1) },
  kg: { si: 1, dim: d(0, 0, 1) }, g: { si: 1e-3, dim: d(0, 0, 1) }, t: { si: 1e3, dim: d(0, 0, 1) },
  lb: { si: LB, dim: d(0, 0, 1) }, lbs: { si: LB, dim: d(0, 0, 1) }, lbm: { si: LB, dim: d(0, 0, 1) },
  Pa: { si: 1, dim: d(-2, 1) }, kPa: { si: 1e3, dim: d(-2, 1) }, MPa: { si: 1e6, dim: d(-2, 1) }, GPa: { si: 1e9, dim: d(-2, 1) },
  psi: { si: LBF / (IN * IN), dim: d(-2, 1) }, ksi: { si: KIP / (IN * IN), dim: d(-2, 1) },
  psf: { si: LBF / (FT * FT), dim: d(-2, 1) }, ksf: { si: KIP / (FT * FT), dim: d(-2, 1) },
  pcf: { si: LB / (FT * FT * FT), dim: d(-3, 0, 1) },
  plf: { si: LBF / FT, dim: d(-1, 1) }, klf: { si: KIP / FT, dim: d(-1, 1) },
  Nm: { si: 1, dim: d(1, 1) }, Nmm: { si: 1e-3, dim: d(1, 1) }, kNm: { si: 1e3, dim: d(1, 1) }, kNmm: { si: 1, dim: d(1, 1) }, MNm: { si: 1e6, dim: d(1, 1) },
  deg: { si: 1, dim: d(0) }, '°': { si: 1, dim: d(0) },
};

const SUPERSCRIPTS: Readonly<Record<string, number>> = { '¹': 1, '²': 2, '³': 3, '⁴': 4, '⁵': 5, '⁶': 6 };

/** A unit expression read: its factor to SI and its dimension. */
export interface UnitValue {
  readonly si: number;
  readonly dim: Dimension;
}

/** One atom with an optional power: "m3", "in^4", "m²", "ft^-1". */
const POWERED_ATOM = /^(''|["″'′°]|[A-Za-z]+)(?:\^([+-]?\d+)|([¹²³⁴⁵⁶])|(\d+))?/;

/** The unit expression `text` ("kN/m", "kip·ft²", "lb/ft^3", "N m"), or null when it is not one. */
export function unitValue(text: string): UnitValue | null {
  const t = text.trim();
  if (t === '') return null;
  const parts = t.split('/');
  if (parts.length > 2) return null;
  let si = 1;
  const dim = { L: 0, F: 0, M: 0 };
  for (const [k, part] of parts.entries()) {
    const sign = k === 0 ? 1 : -1;
    let rest = part.trim();
    if (rest === '') return null;
    while (rest !== '') {
      const m = POWERED_ATOM.exec(rest);
      const atom = m ? ATOMS[m[1] ?? ''] : undefined;
      if (!m || !atom) return null;
      const power = sign * Number(m[2] ?? (m[3] !== undefined ? SUPERSCRIPTS[m[3]] : undefined) ?? m[4] ?? 1);
      si *= atom.si ** power;
      dim.L += atom.dim.L * power;
      dim.F += atom.dim.F * power;
      dim.M += atom.dim.M * power;
      rest = rest.slice(m[0].length);
      // Between atoms of a product: ·, ⋅, *, ×, '.', '-' or a space.
      const sep = /^\s*[·⋅*×.-]\s*|^\s+/.exec(rest);
      if (sep) {
        rest = rest.slice(sep[0].length);
        if (rest === '') return null;
      } else if (rest !== '' && !/^["″'′]/.test(rest)) return null;
    }
  }
  return { si, dim };
}

const sameDim = (a: Dimension, b: Dimension): boolean => a.L === b.L && a.F === b.F && a.M === b.M;

/**
 * SI factor of `unit` read as a unit of `kind`, or null when it is not one (unknown, or another
 * kind). Mass for weight (and weight for density) goes through standard gravity, as the header says.
 */
export function unitFactor(unit: string, kind: QuantityKind): number | null {
  const spec = KINDS[kind];
  if (kind === 'ratio') return unit === '–' || unit === '-' || unit === '' ? 1 : null;
  const u = unitValue(unit);
  if (u === null) return null;
  if (sameDim(u.dim, spec.dim)) return u.si;
  if (!spec.gravity) return null;
  // A mass M where the field has a force F (or F where it has M): one power of g_n.
  if (u.dim.L === spec.dim.L && u.dim.M === spec.dim.F && u.dim.F === spec.dim.M) {
    const p = spec.dim.F - spec.dim.M;
    return u.si * STANDARD_GRAVITY ** p;
  }
  return null;
}

/** `value` of `kind` from unit `from` to unit `to` (both labels of that kind). Throws on a unit that is not of the kind: a programming error. */
export function convertQuantity(value: number, kind: QuantityKind, from: string, to: string): number {
  if (from === to) return value;
  const a = unitFactor(from, kind);
  const b = unitFactor(to, kind);
  if (a === null || b === null) throw new RangeError(`convertQuantity: "${a === null ? from : to}" is not a unit of ${KINDS[kind].words}`);
  return (value * a) / b;
}

/** A value of `kind` in `unit` → SI. */
export const toSI = (value: number, kind: QuantityKind, unit: string): number => convertQuantity(value, kind, unit, KINDS[kind].si);
/** An SI value of `kind` → `unit`. */
export const fromSI = (value: number, kind: QuantityKind, unit: string): number => convertQuantity(value, kind, KINDS[kind].si, unit);

/** The kinds `text`'s unit could measure, for "is a force, not a length". */
function kindWordsOf(u: UnitValue): string | null {
  const hit = QUANTITY_KINDS.find((k) => sameDim(KINDS[k].dim, u.dim) && k !== 'axialStiffness' && k !== 'torque' && k !== 'weightPerLength' && k !== 'angle' && k !== 'ratio');
  return hit === undefined ? null : KINDS[hit].words;
}

// ---------------------------------------------------------------------------------------------
// Reading typed text

/** What a field is: its name (for messages), its kind and the unit a bare number is read in. */
export interface QuantityField {
  readonly label: string;
  readonly kind: QuantityKind;
  readonly unit: string;
}

export type QuantityRead =
  | {
      readonly ok: true;
      readonly si: number;
      /** The unit written in the text, or the field's for a bare number (a compound length: the field's). */
      readonly unit: string;
      /** The number as written, in `unit` (exactly the typed digits, with no trip through SI). */
      readonly value: number;
    }
  | { readonly ok: false; readonly message: string };

/** A user-facing refusal, thrown by `parseQuantityOrThrow`; its message names the field and the text. */
export class QuantityError extends Error {
  override readonly name = 'QuantityError';
}

const NUMBER = /^(\d+)(?:\s+|-)(\d+)\s*\/\s*(\d+)|^(\d+(?:\.\d+)?)\s*\/\s*(\d+(?:\.\d+)?)(?![\d.])|^(\d+\.?\d*|\.\d+)(?:[eE]([+-]?\d+))?/;
/** A unit: atoms with powers, joined by ·, *, ×, ., -, a space (before a letter) or one '/'. */
const UNIT = /^(?:''|["″'′°]|[A-Za-z]+(?:\^[+-]?\d+|[¹²³⁴⁵⁶]|\d+)?(?:\s*[·⋅*×./]\s*[A-Za-z]+(?:\^[+-]?\d+|[¹²³⁴⁵⁶]|\d+)?|-[A-Za-z]+(?:\^[+-]?\d+|[¹²³⁴⁵⁶]|\d+)?|\s+(?=[A-Za-z])[A-Za-z]+(?:\^[+-]?\d+|[¹²³⁴⁵⁶]|\d+)?)*)/;

interface Term {
  readonly value: number;
  readonly unit: string;
}

/** Splits "13'-9 1/2\"" into [{13, "'"}, {9.5, '"'}]; null when the text is not terms. */
function terms(text: string): Term[] | { error: 'number' | 'divide' } {
  const out: Term[] = [];
  let rest = text;
  while (rest !== '') {
    if (out.length > 0) rest = rest.replace(/^\s*-?\s*/, '');
    const n = NUMBER.exec(rest);
    if (!n) return { error: 'number' };
    let value: number;
    if (n[1] !== undefined) {
      if (Number(n[3]) === 0) return { error: 'divide' };
      value = Number(n[1]) + Number(n[2]) / Number(n[3]);
    } else if (n[4] !== undefined) {
      if (Number(n[5]) === 0) return { error: 'divide' };
      value = Number(n[4]) / Number(n[5]);
    } else value = Number(`${n[6]}${n[7] !== undefined ? `e${n[7]}` : ''}`);
    rest = rest.slice(n[0].length).replace(/^\s+/, '');
    const u = UNIT.exec(rest);
    const unit = u ? u[0] : '';
    rest = rest.slice(unit.length).replace(/^\s+/, '');
    out.push({ value, unit: unit.trim() });
    // Text that is neither a unit nor the next number (e.g. "3 furlongs!") is caught by the unit check.
    if (rest !== '' && !/^[-\d.]/.test(rest)) {
      out.push({ value: NaN, unit: rest });
      break;
    }
  }
  return out;
}

/** A comma: the decimal comma of "4,2", refused where it could be a thousands separator. */
function decimalComma(text: string): string | null {
  if (!text.includes(',')) return text;
  if (/\d{1,3}(?:,\d{3})+(?!\d)/.test(text)) return null;
  return text.replace(/(\d),(\d)/g, '$1.$2');
}

/** Reads typed text as a quantity of the field's kind; never throws on user text. */
export function readQuantity(text: string, field: QuantityField): QuantityRead {
  const spec = KINDS[field.kind];
  const hint = `e.g. "12 ${spec.units[1] ?? spec.units[0] ?? ''}"`;
  const fail = (why: string): QuantityRead => ({ ok: false, message: `${field.label}: ${why}` });
  const trimmed = text.trim().replace(/[−–]/g, '-');
  if (trimmed === '') return fail(`enter a value (${hint}; a bare number is read in ${field.unit})`);
  const dotted = decimalComma(trimmed);
  if (dotted === null) return fail(`"${text}" is ambiguous: is the comma a thousands separator or a decimal point? Write it without the comma (12000) or with a point (12.5)`);
  const sign = dotted.startsWith('-') ? -1 : 1;
  const body = dotted.replace(/^[-+]\s*/, '');
  const found = terms(body);
  if (!Array.isArray(found)) return fail(found.error === 'divide' ? `"${text}" divides by zero` : `"${text}" is not a number (${hint})`);
  const first = found[0];
  if (first === undefined) return fail(`"${text}" is not a number (${hint})`);
  if (found.length === 1 && first.unit === '') {
    const f = unitFactor(field.unit, field.kind);
    if (f === null) throw new RangeError(`readQuantity: field "${field.label}" has unit "${field.unit}", not a unit of ${spec.words}`);
    return finite(sign * first.value * f, field.unit, sign * first.value, text, fail);
  }
  let si = 0;
  for (const t of found) {
    if (t.unit === '') return fail(`"${text}": every part of a compound length needs its unit, as in 13'-9" or 13 ft 9-1/2 in`);
    const f = unitFactor(t.unit, field.kind);
    if (f === null) {
      const u = unitValue(t.unit);
      if (u === null) return fail(`unknown unit "${t.unit}" in "${text}"; use ${spec.units.join(', ')}`);
      const other = kindWordsOf(u);
      return fail(`"${text}" is ${other ?? `in ${t.unit}`}, not ${spec.words}; use ${spec.units.join(', ')}`);
    }
    if (Number.isNaN(t.value)) return fail(`"${text}" is not a number (${hint})`);
    si += t.value * f;
  }
  if (found.length > 1 && field.kind !== 'length') return fail(`"${text}": only lengths may be written in parts (13'-9")`);
  if (found.length === 1) return finite(sign * si, first.unit, sign * first.value, text, fail);
  return finite(sign * si, field.unit, (sign * si) / (unitFactor(field.unit, field.kind) ?? 1), text, fail);
}

function finite(si: number, unit: string, value: number, text: string, fail: (why: string) => QuantityRead): QuantityRead {
  return Number.isFinite(si) ? { ok: true, si, unit, value } : fail(`"${text}" is not a finite number`);
}

/** readQuantity for callers that stop on the first refusal (the command line): throws QuantityError. */
export function parseQuantityOrThrow(text: string, field: QuantityField): number {
  const r = readQuantity(text, field);
  if (!r.ok) throw new QuantityError(r.message);
  return r.si;
}

// ---------------------------------------------------------------------------------------------
// Labels

/** Plain-ASCII form of a unit label for CSV headers and terminals: "kN·m²" → "kN*m^2". */
export function asciiUnit(label: string): string {
  return label
    .replace(/·|⋅/g, '*')
    .replace(/[¹²³⁴⁵⁶]/g, (c) => `^${SUPERSCRIPTS[c] ?? ''}`)
    .replace('–', '-');
}
