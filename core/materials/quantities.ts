/**
 * Force, stress and density units as the materials code names them, and their factors to SI
 * (N, Pa, kg/m³). Every factor comes from core/units (./quantity.ts holds the definitions and
 * their NIST SP 811 checks); this file only keeps the short unit lists and helpers that the
 * materials schema and forms use.
 */
import { convertQuantity, fromSI, QuantityError, readQuantity, STANDARD_GRAVITY, unitFactor } from '../units/quantity.ts';

export { QuantityError, STANDARD_GRAVITY };

import { FORCE_UNITS, STRESS_UNITS, type DensityUnit, type ForceUnit, type StressUnit } from '../units/types.ts';

// The unit names live in core/units/types.ts, a leaf the document types can import without a cycle.
export { FORCE_UNITS, STRESS_UNITS, type DensityUnit, type ForceUnit, type StressUnit };

const factor = (unit: string, kind: 'force' | 'stress' | 'density'): number => {
  const f = unitFactor(unit, kind);
  if (f === null) throw new RangeError(`${unit} is not a unit of ${kind}`);
  return f;
};
const NEWTONS_PER = Object.fromEntries(FORCE_UNITS.map((u) => [u, factor(u, 'force')])) as Readonly<Record<ForceUnit, number>>;
const PASCALS_PER = Object.fromEntries(STRESS_UNITS.map((u) => [u, factor(u, 'stress')])) as Readonly<Record<StressUnit, number>>;
const KG_PER_M3_PER: Readonly<Record<DensityUnit, number>> = { 'kg/m3': 1, 'lb/ft3': factor('lb/ft3', 'density') };

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
  return convertQuantity(kgPerMetre, 'massPerLength', 'kg/m', 'lb/ft');
}

/**
 * Reads "29000ksi", "200 GPa", "4.5kN" or a bare number (then `defaultUnit` applies) through
 * core/units' one reader, and returns the value in the unit typed when `units` lists it, else in
 * `defaultUnit`; any unit of the same kind is read. `what` names the input in the message.
 */
export function parseQuantity<U extends string>(text: string, _units: readonly U[], defaultUnit: U, what: string): { value: number; unit: U } {
  const kind = (['force', 'stress', 'density', 'moment', 'lineLoad'] as const).find((k) => unitFactor(defaultUnit, k) !== null);
  if (kind === undefined) throw new RangeError(`parseQuantity: "${defaultUnit}" is not a force, stress, density, moment or line-load unit`);
  const r = readQuantity(text, { label: what, kind, unit: defaultUnit });
  if (!r.ok) throw new QuantityError(r.message);
  // The unit as typed when the caller lists it (forms keep it); else the value in defaultUnit.
  const typed = _units.find((u) => u === r.unit);
  return typed !== undefined ? { value: r.value, unit: typed } : { value: fromSI(r.si, kind, defaultUnit), unit: defaultUnit };
}
