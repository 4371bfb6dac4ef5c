/**
 * Published values of the AISC Shapes Database v15.0 that the catalogue does not reproduce from
 * the same row's published dimensions, each with its reason, so that the catalogue entry, the
 * `part` command and the table check can say so instead of hiding the difference in a tolerance.
 * Found by measuring every row (core/catalogue/measure.ts): the reason for every row outside
 * tolerance of its published weight is generated into data/weight-notes.ts (a proven published
 * inconsistency, or our rule's miss with the fillet that would meet W), beside the caveats
 * written here. tests/catalogue/families.test.ts holds each of them true.
 */

import { WEIGHT_NOTES } from './data/weight-notes.ts';

const BY_DESIGNATION: Readonly<Record<string, readonly string[]>> = {
  'C3X3.5': [
    'published weight not reproduced: the web and flange rectangles alone (d·tw + 2(bf − tw)·tf = 1.072 in²) are 4.2 % above W 3.5 lb/ft ÷ (490/144) = 1.029 in², before any root fillet',
  ],
};

/** Every angle (L, 2L): their plastic moduli and minor principal moment sit at the edge of the rules we tried. */
const ANGLE_Z =
  'published Zx, Zy and Iz of angles not reproduced closely: for the angles with published values (L4X4X1/2, L6X4X3/8) the table\'s Z is 1.3–1.4 % below the exact Z of the rebuilt legs and L4X4X1/2 Iz 1.8 % below, while A, I, S and r agree within 1 %; toe roundings larger than the rule\'s would lower them, but no one toe rule measured meets L4X4X1/2 Iz and L6X4X3/8 Zy together (the database states no radii)';

/** The caveats written here by hand for a designation (the generated weight notes aside). */
export function writtenCaveats(designation: string): readonly string[] {
  return BY_DESIGNATION[designation] ?? [];
}

/** The caveats of one catalogue designation of a family (empty when it has none). */
export function publishedCaveats(designation: string, family?: string): readonly string[] {
  const weight = WEIGHT_NOTES.get(designation);
  const own = [...(BY_DESIGNATION[designation] ?? []), ...(weight === undefined ? [] : [weight])];
  return family === 'L' || family === '2L' ? [...own, ANGLE_Z] : own;
}
