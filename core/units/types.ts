/** Length units a document may use. Exact factors to millimetres live in core/units/index.ts. */
export type LengthUnit = 'in' | 'ft' | 'mm' | 'cm' | 'm';
export const LENGTH_UNITS: readonly LengthUnit[] = ['in', 'ft', 'mm', 'cm', 'm'];
