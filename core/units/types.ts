/** Length units a document may use. Exact factors to millimetres live in core/units/index.ts. */
export type LengthUnit = 'in' | 'ft' | 'mm' | 'cm' | 'm';
export const LENGTH_UNITS: readonly LengthUnit[] = ['in', 'ft', 'mm', 'cm', 'm'];

/** Force, stress and density units; their exact factors to SI live in core/materials/quantities.ts. */
export type ForceUnit = 'N' | 'kN' | 'lbf' | 'kip';
export type StressUnit = 'Pa' | 'kPa' | 'MPa' | 'GPa' | 'psi' | 'ksi';
export type DensityUnit = 'kg/m3' | 'lb/ft3';

export const FORCE_UNITS: readonly ForceUnit[] = ['N', 'kN', 'lbf', 'kip'];
export const STRESS_UNITS: readonly StressUnit[] = ['Pa', 'kPa', 'MPa', 'GPa', 'psi', 'ksi'];
