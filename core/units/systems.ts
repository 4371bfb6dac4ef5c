/**
 * Unit systems: the units a document reports forces, moments, stresses, stiffnesses and weights
 * in, following its length unit, and the rule that shows rounding residue as 0.
 *
 * A document in in or ft reports in kip (or lbf, the user's choice), kip/ft, kip·ft, ksi (or psi),
 * kip·in² (or kip·ft²), lb/ft and lb/ft³, deflections in in. A document in mm, cm or m reports in
 * kN (or N), kN/m, kN·m, MPa, kN·m², kg/m (or kN/m) and kg/m³, deflections in mm (common practice
 * for each system). Lengths along a member (spans, load positions) are in the document unit.
 * Section geometry (area, moduli, second moments) follows the display set of ./index.ts instead.
 */
import { KINDS, type QuantityKind } from './quantity.ts';
import type { LengthUnit } from './types.ts';

export interface UnitChoices {
  /** in/ft documents: forces in kip (default) or lbf. */
  readonly imperialForce?: 'kip' | 'lbf';
  /** in/ft documents: stresses in ksi (default) or psi. */
  readonly imperialStress?: 'ksi' | 'psi';
  /** in/ft documents: EI in kip·in² (default) or kip·ft². */
  readonly imperialStiffnessLength?: 'in' | 'ft';
  /** mm/cm/m documents: forces in kN (default) or N. */
  readonly metricForce?: 'kN' | 'N';
  /** mm/cm/m documents: weight per length as mass kg/m (default) or force kN/m. */
  readonly metricWeight?: 'kg/m' | 'kN/m';
}

export type UnitSystemName = 'inch-pound' | 'metric';

/** The unit of every physical kind for one document. */
export interface UnitSystem {
  readonly name: UnitSystemName;
  /** Spans and positions along the member: the document unit. */
  readonly length: LengthUnit;
  /** Deflections: in or mm. */
  readonly deflection: string;
  readonly units: Readonly<Record<QuantityKind, string>>;
}

export const isImperial = (u: LengthUnit): boolean => u === 'in' || u === 'ft';

export function unitSystem(documentUnit: LengthUnit, choices: UnitChoices = {}): UnitSystem {
  const geometry = (p: string): string => `${documentUnit}${p}`;
  const common = {
    length: documentUnit, area: geometry('²'), modulus: geometry('³'), inertia: geometry('⁴'), warping: geometry('⁶'),
    angle: 'deg', ratio: '–',
  } as const;
  if (isImperial(documentUnit)) {
    const f = choices.imperialForce ?? 'kip';
    const ei = choices.imperialStiffnessLength ?? 'in';
    return {
      name: 'inch-pound', length: documentUnit, deflection: 'in',
      units: {
        ...common, force: f, axialStiffness: f, lineLoad: `${f}/ft`, moment: `${f}·ft`, torque: `${f}·ft`,
        stress: choices.imperialStress ?? 'ksi', density: 'lb/ft³', weightPerLength: 'lb/ft', massPerLength: 'lb/ft',
        flexuralStiffness: `${f}·${ei}²`,
      },
    };
  }
  const f = choices.metricForce ?? 'kN';
  return {
    name: 'metric', length: documentUnit, deflection: 'mm',
    units: {
      ...common, force: f, axialStiffness: f, lineLoad: `${f}/m`, moment: `${f}·m`, torque: `${f}·m`,
      stress: 'MPa', density: 'kg/m³', weightPerLength: choices.metricWeight ?? 'kg/m', massPerLength: 'kg/m',
      flexuralStiffness: `${f}·m²`,
    },
  };
}

/** Every kind's unit is one of that kind's (a check for tests and for choices read from settings). */
export function systemUnitsValid(s: UnitSystem): boolean {
  return (Object.keys(s.units) as QuantityKind[]).every((k) => k === 'length' || k === 'area' || k === 'modulus' || k === 'inertia' || k === 'warping' || KINDS[k].units.includes(s.units[k]));
}

/**
 * Rounding residue as 0: |value| below 1e-9 of its natural scale (the section size for positions,
 * A for areas, Ip for second moments, the largest |σ| for stresses) is zero within rounding — the
 * exact integrals carry about 1e-15 relative error, so 1e-9 leaves six orders of margin either way.
 */
export function zeroWithinRounding(value: number, scale: number): number {
  return Math.abs(value) < 1e-9 * Math.abs(scale) ? 0 : value;
}
