/**
 * Force, stress and density units, and their exact factors to SI (N, Pa, kg/m³).
 *
 * Lengths are converted only by core/units; the inch and foot appear here only inside the
 * exact stress and density factors, which are definitions:
 *   1 lbf = 4.4482216152605 N (exact, from 1 lb = 0.45359237 kg and g_n = 9.80665 m/s²)
 *   1 in  = 0.0254 m (exact), so 1 psi = 4.4482216152605 / 0.0254² Pa
 *   1 lb/ft³ = 0.45359237 kg / 0.3048³ m³
 * Standard gravity g_n = 9.80665 m/s² (exact, by definition) turns mass per length into weight.
 */

import { FORCE_UNITS, STRESS_UNITS, type DensityUnit, type ForceUnit, type StressUnit } from '../units/types.ts';

// The unit names live in core/units/types.ts, a leaf the document types can import without a cycle.
export { FORCE_UNITS, STRESS_UNITS, type DensityUnit, type ForceUnit, type StressUnit };

export const STANDARD_GRAVITY = 9.80665;
const NEWTONS_PER_LBF = 4.4482216152605;
const METRES_PER_INCH = 0.0254;
const KG_PER_LB = 0.45359237;
const METRES_PER_FOOT = 0.3048;

const NEWTONS_PER: Readonly<Record<ForceUnit, number>> = {
  N: 1,
  kN: 1e3,
  lbf: NEWTONS_PER_LBF,
  kip: 1e3 * NEWTONS_PER_LBF,
};

const PASCALS_PER_PSI = NEWTONS_PER_LBF / (METRES_PER_INCH * METRES_PER_INCH);
const PASCALS_PER: Readonly<Record<StressUnit, number>> = {
  Pa: 1,
  kPa: 1e3,
  MPa: 1e6,
  GPa: 1e9,
  psi: PASCALS_PER_PSI,
  ksi: 1e3 * PASCALS_PER_PSI,
};

const KG_PER_M3_PER: Readonly<Record<DensityUnit, number>> = {
  'kg/m3': 1,
  'lb/ft3': KG_PER_LB / (METRES_PER_FOOT * METRES_PER_FOOT * METRES_PER_FOOT),
};

export const forceToNewtons = (value: number, unit: ForceUnit): number => value * NEWTONS_PER[unit];
export const newtonsTo = (newtons: number, unit: ForceUnit): number => newtons / NEWTONS_PER[unit];
export const stressToPascals = (value: number, unit: StressUnit): number => value * PASCALS_PER[unit];
export const pascalsTo = (pascals: number, unit: StressUnit): number => pascals / PASCALS_PER[unit];
export const densityToKgPerM3 = (value: number, unit: DensityUnit): number => value * KG_PER_M3_PER[unit];
export const kgPerM3To = (kgPerM3: number, unit: DensityUnit): number => kgPerM3 / KG_PER_M3_PER[unit];

export const isForceUnit = (s: string): s is ForceUnit => (FORCE_UNITS as readonly string[]).includes(s);
export const isStressUnit = (s: string): s is StressUnit => (STRESS_UNITS as readonly string[]).includes(s);

/** Mass per metre (kg/m) to weight per foot in pounds-force (lb/ft), exact factors. */
export function kgPerMetreToLbPerFoot(kgPerMetre: number): number {
  return (kgPerMetre * METRES_PER_FOOT) / KG_PER_LB;
}

/** Error text for a quantity that is not a finite number with a known unit. */
export class QuantityError extends Error {
  override readonly name = 'QuantityError';
}

/**
 * Reads "29000ksi", "200 GPa", "4.5kN" or a bare number (then `defaultUnit` applies).
 * `what` names the input in the error message (e.g. "--E").
 */
export function parseQuantity<U extends string>(
  text: string,
  units: readonly U[],
  defaultUnit: U,
  what: string,
): { value: number; unit: U } {
  const match = /^\s*([-+]?(?:\d+\.?\d*|\.\d+)(?:[eE][-+]?\d+)?)\s*([A-Za-z/0-9·]*)\s*$/.exec(text);
  if (!match) throw new QuantityError(`${what}: "${text}" is not a number with an optional unit`);
  const value = Number(match[1]);
  const unitText = match[2] ?? '';
  if (!Number.isFinite(value)) throw new QuantityError(`${what}: "${text}" is not a finite number`);
  if (unitText === '') return { value, unit: defaultUnit };
  const unit = units.find((u) => u === unitText);
  if (unit === undefined) {
    throw new QuantityError(`${what}: unknown unit "${unitText}" in "${text}"; use one of ${units.join(', ')}`);
  }
  return { value, unit };
}
