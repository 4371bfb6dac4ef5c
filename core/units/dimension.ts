/**
 * Dimension labels: ONE precision rule for every length written beside a dimension line (the
 * drawing's overall width and depth, the selected part's dimensions, extreme-fibre distances,
 * the sizes shown while a part is drawn). A label has a fixed number of decimals per document
 * unit, trailing zeros kept, so that labels in one drawing line up and never mix precisions
 * (381 beside 188.976 reads as if one were exact and the other measured):
 *
 *   mm 1 decimal (0.1 mm)   cm 2 (0.1 mm)   m 4 (0.1 mm)   in 3 (0.001 in)   ft 4 (0.0001 ft)
 *
 * The resolution is about a tenth of a millimetre in every unit, finer than any rolled or cut
 * tolerance (common practice), and coarse enough that a converted size (7.44 in = 188.976 mm)
 * reads like a drawn one (189.0). Rounding is to the nearest, halves away from zero on the
 * decimal value as written (toFixed of the double); a result of zero is written without a sign.
 * Not for results (areas, moduli): those keep significant figures (formatSig in ./index.ts).
 */
import type { LengthUnit } from './types.ts';

export const DIMENSION_DECIMALS: Readonly<Record<LengthUnit, number>> = { mm: 1, cm: 2, m: 4, in: 3, ft: 4 };

/** A length in the document unit as a dimension label, e.g. formatDimension(188.976, 'mm') = '189.0'. */
export function formatDimension(value: number, unit: LengthUnit): string {
  if (!Number.isFinite(value)) return String(value);
  const text = value.toFixed(DIMENSION_DECIMALS[unit]);
  // '-0.0' (a tiny negative rounded to zero) is written as zero.
  return /^-0(\.0+)?$/.test(text) ? text.slice(1) : text;
}
