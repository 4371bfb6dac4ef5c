/**
 * One inch expressed in a document length unit, for the inch trade names of lumber only.
 * Exact by the international inch, 25.4 mm (NIST SP 811, Appendix B.8). core/units owns unit
 * conversion for everything else; this small table stays local so that parts do not depend on it.
 */
import type { LengthUnit } from '../units/types.ts';

const MM_PER_UNIT: Readonly<Record<LengthUnit, number>> = { in: 25.4, ft: 304.8, mm: 1, cm: 10, m: 1000 };

export function inchInUnit(unit: LengthUnit): number {
  return MM_PER_UNIT.in / MM_PER_UNIT[unit];
}
