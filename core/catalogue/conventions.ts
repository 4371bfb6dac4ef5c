/**
 * How published AISC dimensions become geometry, family by family: flange slopes, root fillet
 * and toe radii. The AISC Shapes Database v15.0 publishes d, bf, tw, tf, kdes (and for angles
 * d, b, t, kdes) but no radii and no slopes, so each family needs a stated rule. Every rule, its
 * source and how well it reproduces the table are written down in docs/catalogue-conventions.md;
 * the rules marked "fitted" were chosen by us from the published values, not published.
 *
 * Units: inches and lb/ft (the database's); slopes are rise over run.
 * Rules (family → convention):
 *   W, WT, HP — parallel flanges, root fillet r = kdes − tf, sharp toes.
 *   M, MT — parallel flanges, r = (kdes − tf)/2: the published kdes of M shapes is the detailing
 *     k (kdes = kdet for all 18), so it does not give the fillet; the factor 1/2 is fitted to
 *     the nominal weights of all M shapes (docs/catalogue-conventions.md).
 *   S, ST, C — inner flange slope 2:12 (16⅔ %, from memory of the AISC Manual Part 1), tf the
 *     average thickness at mid-outstand, r = kdes − flange thickness at the web face, flange toe
 *     radius rt = 0.4·tf (fitted to the published Iy, Sy of S8X18.4, C6X10.5 and C15X50).
 *   MC — the slope varies by section and is not published (AISC Manual Part 1, from memory).
 *     It cannot be inferred from the nominal weight: the area changes by only about 0.7 % per
 *     1:12 of slope (through the root fillet), so the rounding of W and of the dimensions moves
 *     the inferred slope by more than Iy can bear (MC12X31: W gives 1.5:12 and Iy 7.6 % low).
 *     We use 0.06 (about 0.7:12), fitted to the published A, I, S, Z, r of MC12X31, the one MC
 *     with published properties in our reference set. As for M shapes, the published kdes of
 *     every MC equals its detailing kdet, so it bounds the fillet without giving it:
 *     r = (kdes − flange thickness at the web face)/2, the M rule, which brings 37 of the 40 MC
 *     weights within tolerance (kdes − that thickness: 25 of 40); sharp toes. A table's own
 *     "slope" column replaces the slope.
 *   L, 2L — the published kdes of angles is the detailing k (kdes = kdet for every angle), so
 *     root radius r = 3/4·(kdes − t) and toe radius rt = r/2 (the toe half the root, as in
 *     common practice for rolled angles, from memory), the 3/4 fitted to the nominal weights of
 *     all 137 angles (135 within tolerance; (kdes − t)/2 gave 130) and the published properties
 *     of the four subset angles (all within 1.5 % but L4X4X1/2 Iz) — not published;
 *     a double angle takes kdes from the single angle of the same size.
 * Does not guarantee: that a row reproduces its table beyond the rounding of the published
 *   dimensions (3 significant figures) and these rules; the measured agreement and the rows that
 *   cannot be reproduced are in docs/catalogue-conventions.md.
 */

/** Nominal weight per area of steel, lb/ft per in²: 490 lb/ft³ / 144 in²/ft² (AISC Manual, common practice). */
export const STEEL_LBFT_PER_IN2 = 490 / 144;

export type FlangedShape = 'i-shape' | 'channel' | 'tee';

export interface FlangedDims {
  readonly d: number;
  readonly bf: number;
  readonly tw: number;
  readonly tf: number;
  readonly kdes: number;
}

/** Explicit values that replace a rule (a table's own "r", "rt" or "slope" column). */
export interface FlangedGiven {
  readonly slope?: number | undefined;
  readonly r?: number | undefined;
  readonly rt?: number | undefined;
}

export interface FlangedPart {
  readonly shape: FlangedShape;
  readonly params: Record<string, number>;
  readonly slope: number;
  /** How the slope was found: 'parallel', 'standard 2:12', 'from weight', 'as given'. */
  readonly slopeRule: string;
}

const STANDARD_SLOPE = 2 / 12;
/** Families whose published kdes is the detailing k (kdes = kdet for every row): r = (kdes − flange at web)/2. */
export const HALF_FILLET_FAMILIES: ReadonlySet<string> = new Set(['M', 'MT', 'MC']);
/** MC slope, rise over run: fitted to MC12X31 (see the header), not published. */
export const MC_SLOPE = 0.06;

function shapeOf(family: string): FlangedShape {
  if (family === 'C' || family === 'MC') return 'channel';
  return family === 'WT' || family === 'MT' || family === 'ST' ? 'tee' : 'i-shape';
}

function flangeOutstand(shape: FlangedShape, bf: number, tw: number): number {
  // A channel's flange runs from the web to one toe; an I's or a tee's from the web to each toe.
  return shape === 'channel' ? bf - tw : (bf - tw) / 2;
}

/** The part for a given slope, with the root radius and toe radius of the family's rule. */
function partAtSlope(family: string, dims: FlangedDims, slope: number, given: FlangedGiven): Record<string, number> {
  const { d, bf, tw, tf, kdes } = dims;
  const shape = shapeOf(family);
  const atWeb = tf + (slope * flangeOutstand(shape, bf, tw)) / 2;
  const fillet = HALF_FILLET_FAMILIES.has(family) ? (kdes - atWeb) / 2 : kdes - atWeb;
  const r = given.r ?? Math.max(fillet, 0);
  const sloped = family === 'S' || family === 'C' || family === 'ST';
  const rt = given.rt ?? (sloped ? 0.4 * tf : 0);
  return { d, bf, tw, tf, r, ...(slope > 0 ? { slope } : {}), ...(rt > 0 ? { rt } : {}) };
}

/**
 * The part a rolled flanged shape builds from its published dimensions by the family rules
 * above; `given` replaces a rule with a table's own value.
 */
export function flangedPart(family: string, dims: FlangedDims, given: FlangedGiven = {}): FlangedPart {
  const shape = shapeOf(family);
  let slope = 0;
  let slopeRule = 'parallel flanges';
  if (given.slope !== undefined) {
    slope = given.slope;
    slopeRule = 'slope as given';
  } else if (family === 'S' || family === 'C' || family === 'ST') {
    slope = STANDARD_SLOPE;
    slopeRule = 'inner flange slope 2:12';
  } else if (family === 'MC') {
    slope = MC_SLOPE;
    slopeRule = `inner flange slope ${MC_SLOPE} (fitted to MC12X31; the MC slope is not published)`;
  }
  return { shape, params: partAtSlope(family, dims, slope, given), slope, slopeRule };
}

/** Share of kdes − t taken as an angle's root radius (fitted, see the header). */
export const ANGLE_ROOT_SHARE = 0.75;

/** Angle root and toe radii from the published kdes: r = 3/4·(kdes − t), rt = r/2 (see the header). */
export function angleRadii(t: number, kdes: number | undefined): { r: number; rt: number } {
  if (kdes === undefined || !(kdes > t)) return { r: 0, rt: 0 };
  const r = ANGLE_ROOT_SHARE * (kdes - t);
  return { r, rt: r / 2 };
}
