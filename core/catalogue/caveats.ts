/**
 * Published values of the AISC Shapes Database v15.0 that the catalogue does not reproduce from
 * the same row's published dimensions, each with its reason, so that the catalogue entry, the
 * `part` command and the table check can say so instead of hiding the difference in a tolerance.
 * Found by measuring every row (core/catalogue/measure.ts; docs/catalogue-conventions.md has the
 * numbers and the rows outside tolerance that are NOT explained here: those are our rules' misses).
 * tests/catalogue/families.test.ts holds each entry here true against the published numbers.
 */

const SAME_DIMENSIONS = (twin: string, w: number, ownW: number): string =>
  `published weight inconsistent: the same d, bf, tw, tf and kdes as ${twin} (W ${w} lb/ft) but W ${ownW} lb/ft; one set of dimensions cannot give both weights`;

const BY_DESIGNATION: Readonly<Record<string, readonly string[]>> = {
  'M4X3.45': [SAME_DIMENSIONS('M4X3.2', 3.2, 3.45)],
  'M4X3.2': [SAME_DIMENSIONS('M4X3.45', 3.45, 3.2)],
  'C3X3.5': [
    'published weight not reproduced: the web and flange rectangles alone (d·tw + 2(bf − tw)·tf = 1.072 in²) are 4.2 % above W 3.5 lb/ft ÷ (490/144) = 1.029 in², before any root fillet',
  ],
};

/** Every angle (L, 2L): their plastic moduli do not follow from any radius rule we tried. */
const ANGLE_Z =
  'published plastic moduli Zx, Zy not reproduced: for the angles with published Z (L4X4X1/2, L6X4X3/8) the table is 1.5–1.9 % below the exact Z of the rebuilt legs with any root and toe radius tried, while A, I, S and r agree within 1 %';

/** The caveats of one catalogue designation of a family (empty when it has none). */
export function publishedCaveats(designation: string, family?: string): readonly string[] {
  const own = BY_DESIGNATION[designation] ?? [];
  return family === 'L' || family === '2L' ? [...own, ANGLE_Z] : own;
}
