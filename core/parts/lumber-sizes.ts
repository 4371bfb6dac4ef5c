/**
 * Dressed (surfaced four sides) sizes of sawn lumber by nominal size, in inches.
 *
 * Source: AWC, National Design Specification Supplement, 2018 edition, Table 1A "Nominal and
 *   Minimum Dressed Sizes of Sawn Lumber" (dry sizes, 19 % maximum moisture content, for boards and
 *   dimension lumber; green sizes for timbers 5 in and thicker, nominal minus 1/2 in). Rows copied
 *   from the project's reference transcription of that table (the 1 in board thickness 3/4 in and
 *   the timber rule are from memory there, and so here). Only the sizes listed are offered; other
 *   nominal sizes are reported as unknown rather than guessed.
 */

export interface DressedSize {
  readonly nominal: string;
  readonly category: 'board' | 'dimension' | 'timber';
  readonly nominalB: number;
  readonly nominalD: number;
  /** Dressed thickness and width, inches. */
  readonly b: number;
  readonly d: number;
  readonly condition: 'dry' | 'green';
}

type Row = readonly [string, DressedSize['category'], number, number, number, number, DressedSize['condition']];

const ROWS: readonly Row[] = [
  ['1x3', 'board', 1, 3, 0.75, 2.5, 'dry'],
  ['1x4', 'board', 1, 4, 0.75, 3.5, 'dry'],
  ['1x6', 'board', 1, 6, 0.75, 5.5, 'dry'],
  ['1x8', 'board', 1, 8, 0.75, 7.25, 'dry'],
  ['1x10', 'board', 1, 10, 0.75, 9.25, 'dry'],
  ['1x12', 'board', 1, 12, 0.75, 11.25, 'dry'],
  ['2x3', 'dimension', 2, 3, 1.5, 2.5, 'dry'],
  ['2x4', 'dimension', 2, 4, 1.5, 3.5, 'dry'],
  ['2x5', 'dimension', 2, 5, 1.5, 4.5, 'dry'],
  ['2x6', 'dimension', 2, 6, 1.5, 5.5, 'dry'],
  ['2x8', 'dimension', 2, 8, 1.5, 7.25, 'dry'],
  ['2x10', 'dimension', 2, 10, 1.5, 9.25, 'dry'],
  ['2x12', 'dimension', 2, 12, 1.5, 11.25, 'dry'],
  ['2x14', 'dimension', 2, 14, 1.5, 13.25, 'dry'],
  ['3x4', 'dimension', 3, 4, 2.5, 3.5, 'dry'],
  ['3x6', 'dimension', 3, 6, 2.5, 5.5, 'dry'],
  ['3x8', 'dimension', 3, 8, 2.5, 7.25, 'dry'],
  ['3x10', 'dimension', 3, 10, 2.5, 9.25, 'dry'],
  ['3x12', 'dimension', 3, 12, 2.5, 11.25, 'dry'],
  ['4x4', 'dimension', 4, 4, 3.5, 3.5, 'dry'],
  ['4x6', 'dimension', 4, 6, 3.5, 5.5, 'dry'],
  ['4x8', 'dimension', 4, 8, 3.5, 7.25, 'dry'],
  ['4x10', 'dimension', 4, 10, 3.5, 9.25, 'dry'],
  ['4x12', 'dimension', 4, 12, 3.5, 11.25, 'dry'],
  ['4x14', 'dimension', 4, 14, 3.5, 13.25, 'dry'],
  ['5x5', 'timber', 5, 5, 4.5, 4.5, 'green'],
  ['6x6', 'timber', 6, 6, 5.5, 5.5, 'green'],
  ['6x8', 'timber', 6, 8, 5.5, 7.5, 'green'],
  ['6x10', 'timber', 6, 10, 5.5, 9.5, 'green'],
  ['6x12', 'timber', 6, 12, 5.5, 11.5, 'green'],
  ['8x8', 'timber', 8, 8, 7.5, 7.5, 'green'],
  ['8x10', 'timber', 8, 10, 7.5, 9.5, 'green'],
  ['8x12', 'timber', 8, 12, 7.5, 11.5, 'green'],
  ['10x10', 'timber', 10, 10, 9.5, 9.5, 'green'],
];

export const DRESSED_SIZES: readonly DressedSize[] = ROWS.map(([nominal, category, nominalB, nominalD, b, d, condition]) => ({
  nominal,
  category,
  nominalB,
  nominalD,
  b,
  d,
  condition,
}));

/** The dressed size for a nominal thickness × width (inches), or undefined when not in the table. */
export function dressedSize(nominalB: number, nominalD: number): DressedSize | undefined {
  return DRESSED_SIZES.find((s) => s.nominalB === nominalB && s.nominalD === nominalD);
}
