/**
 * One inch expressed in a document length unit, for the inch trade names of lumber only.
 * The factor comes from core/units (exact by the international inch, 25.4 mm).
 */
import { lengthFactor } from '../units/index.ts';
import type { LengthUnit } from '../units/types.ts';

export function inchInUnit(unit: LengthUnit): number {
  return lengthFactor('in', unit);
}
