/**
 * How well the catalogue reproduces its table: each AISC entry's area against its nominal weight,
 * family by family (the dimensions table publishes W for all 2,091 shapes but no area).
 *
 * Units: in², lb/ft. The nominal weight of a steel shape is its area × 490 lb/ft³ (AISC Manual,
 *   common practice), so W / (490/144) is the area the weight stands for.
 * Basis: rolled shapes compare the area of the catalogue geometry. HSS and Pipe weights are
 *   computed by the producers' standards from the NOMINAL wall (the AISC database says so for
 *   HSS; Pipe weights are those of ASME B36.10, from memory), while the properties use the design
 *   wall tdes: so HSS and Pipe compare W with the same geometry built at tnom.
 * Tolerance: 1 % (issue 16), or the half unit of W's last published digit when that is larger
 *   (a 4.1 lb/ft label stands for anything from 4.05 to 4.15, 1.2 % either way; a "6" is read as
 *   6.0): the reference itself is no more precise than that, and the result says which bound applied.
 * Does not guarantee: that W was rounded from the table's own area (AISC designations are
 *   nominal); the properties themselves are compared in tests/catalogue with the published subset.
 */
import { regionIntegrals } from '../properties/integrals.ts';
import { getPartType } from '../parts/index.ts';
import { ANGLE_ROOT_SHARE, HALF_FILLET_FAMILIES, STEEL_LBFT_PER_IN2 } from './conventions.ts';
import type { CatalogueEntry, Family } from './index.ts';

export const AREA_TOLERANCE = 0.01;

export interface WeightAgreement {
  readonly designation: string;
  readonly family: Family;
  /** Area of the catalogue geometry (HSS, Pipe: at the nominal wall), in². */
  readonly area: number;
  /** W / (490/144), in². */
  readonly areaFromWeight: number;
  /** area / areaFromWeight − 1. */
  readonly relative: number;
  /** The bound used: 1 %, or W's rounding when larger. */
  readonly tolerance: number;
  readonly within: boolean;
  /** The entry's published caveats (a row outside tolerance with a caveat is explained). */
  readonly caveats: readonly string[];
}

/**
 * Half a unit of the last digit of a published number, read to at least two significant figures
 * (a label's "6" stands for 6.0: AISC weights carry 2 to 3 significant figures):
 * 4.1 → 0.05, 90 → 0.5, 3.45 → 0.005, 6 → 0.05.
 */
export function halfLastDigit(value: number): number {
  const text = String(value);
  const dot = text.indexOf('.');
  const decimals = dot < 0 ? 0 : text.length - dot - 1;
  const twoFigures = Math.max(0, 1 - Math.floor(Math.log10(Math.abs(value))));
  return 0.5 * 10 ** -Math.max(decimals, twoFigures);
}

/** The parameters at the nominal wall for HSS and Pipe (their weight basis); other shapes unchanged. */
function weightBasisParams(entry: CatalogueEntry): Readonly<Record<string, number>> {
  const tnom = entry.dimensions['tnom'];
  if ((entry.family !== 'HSS' && entry.family !== 'Pipe') || tnom === undefined) return entry.params;
  return entry.shape === 'rect-tube' ? { ...entry.params, t: tnom, r: 2 * tnom } : { ...entry.params, t: tnom };
}

/** The weight agreement of one entry with a published nominal weight, or undefined (lumber, user entries). */
export function weightAgreement(entry: CatalogueEntry): WeightAgreement | undefined {
  const W = entry.nominalWeight;
  if (W === undefined || entry.userDefined) return undefined;
  const built = getPartType(entry.shape)?.region(weightBasisParams(entry));
  const area = built === undefined || built.diagnostics.length > 0 ? Number.NaN : regionIntegrals(built.region).A;
  const areaFromWeight = W / STEEL_LBFT_PER_IN2;
  const relative = area / areaFromWeight - 1;
  const tolerance = Math.max(AREA_TOLERANCE, halfLastDigit(W) / W);
  return { designation: entry.designation, family: entry.family, area, areaFromWeight, relative, tolerance, within: Math.abs(relative) <= tolerance, caveats: entry.caveats };
}

export interface FamilyAgreement {
  readonly family: Family;
  readonly rows: number;
  readonly within: number;
  /** Rows outside tolerance that carry a published caveat. */
  readonly explained: number;
  /** The row furthest from its weight (largest |relative|). */
  readonly worst: WeightAgreement;
}

/** Per family: rows, rows within tolerance, rows explained by a caveat, and the worst row. */
export function familyAgreement(entries: readonly CatalogueEntry[]): FamilyAgreement[] {
  const byFamily = new Map<Family, WeightAgreement[]>();
  for (const entry of entries) {
    const a = weightAgreement(entry);
    if (a === undefined) continue;
    const list = byFamily.get(a.family) ?? [];
    list.push(a);
    byFamily.set(a.family, list);
  }
  return [...byFamily].map(([family, list]) => ({
    family,
    rows: list.length,
    within: list.filter((a) => a.within).length,
    explained: list.filter((a) => !a.within && a.caveats.length > 0).length,
    worst: list.reduce((w, a) => (!(Math.abs(a.relative) <= Math.abs(w.relative)) ? a : w)),
  }));
}

const TOES: Readonly<Record<string, number>> = { 'i-shape': 4, channel: 2, tee: 2, angle: 2, 'double-angle': 4 };

/**
 * The least area any fillet and toe rounding can give with the published dimensions: the
 * rectangles of web and flanges (or legs) with no fillet, less every toe rounded at the largest
 * radius that fits (the toe thickness, at most tf or t): (1 − π/4)·t² per toe.
 */
function leastArea(entry: CatalogueEntry): number | undefined {
  const toes = TOES[entry.shape];
  if (toes === undefined) return undefined;
  const built = getPartType(entry.shape)?.region({ ...entry.params, r: 0, rt: 0 });
  if (built === undefined || built.diagnostics.length > 0) return undefined;
  const t = entry.params['tf'] ?? entry.params['t'] ?? 0;
  return regionIntegrals(built.region).A - toes * (1 - Math.PI / 4) * t * t;
}

function sameDimensions(a: CatalogueEntry, b: CatalogueEntry): boolean {
  const ka = Object.keys(a.dimensions);
  return ka.length === Object.keys(b.dimensions).length && ka.every((k) => a.dimensions[k] === b.dimensions[k]);
}

/**
 * Why the published weight of `entry` cannot be reproduced by ANY geometry with its published
 * dimensions, when the published numbers themselves show it; undefined otherwise. Two proofs:
 * - the web and flange (or leg) rectangles with no fillet, less the largest toe roundings,
 *   already exceed W/(490/144) beyond tolerance (fillets only add area; an average tf fixes the
 *   flange area whatever the slope);
 * - another shape of the family has the same published dimensions and a different W, so at most
 *   one of the two weights can belong to those dimensions.
 */
export function provenWeightInconsistency(entry: CatalogueEntry, family: readonly CatalogueEntry[]): string | undefined {
  const agreement = weightAgreement(entry);
  if (agreement === undefined || agreement.within) return undefined;
  const twin = family.find((e) => e !== entry && e.nominalWeight !== entry.nominalWeight && sameDimensions(e, entry));
  if (twin !== undefined) return `published with the same dimensions as ${twin.designation} (W ${twin.nominalWeight} lb/ft) but W ${entry.nominalWeight} lb/ft: one set of dimensions cannot give both weights`;
  const least = leastArea(entry);
  if (least !== undefined && least / agreement.areaFromWeight - 1 > agreement.tolerance) {
    return `the published dimensions with no fillet and the largest toe roundings still give A = ${least.toFixed(3)} in², ${((least / agreement.areaFromWeight - 1) * 100).toFixed(1)} % above W ${entry.nominalWeight} lb/ft ÷ (490/144) = ${agreement.areaFromWeight.toFixed(3)} in²`;
  }
  return undefined;
}

/** The largest root radius the published k allows for an entry (k − the thickness at the web or leg), in. */
function largestRoot(entry: CatalogueEntry): number | undefined {
  const r = entry.params['r'];
  if (r === undefined || TOES[entry.shape] === undefined) return undefined;
  if (entry.family === 'L' || entry.family === '2L') return r / ANGLE_ROOT_SHARE;
  return HALF_FILLET_FAMILIES.has(entry.family) ? 2 * r : r;
}

function areaWith(entry: CatalogueEntry, change: Readonly<Record<string, number>>): number {
  const built = getPartType(entry.shape)?.region({ ...entry.params, ...change });
  return built === undefined || built.diagnostics.length > 0 ? Number.NaN : regionIntegrals(built.region).A;
}

const pct = (x: number): string => `${x >= 0 ? '+' : '−'}${Math.abs(x * 100).toFixed(2)} %`;
const inches = (x: number): string => `${Number(x.toFixed(3))} in`;

/**
 * Why a row is outside tolerance of its published weight, in words, or undefined when it is
 * within. In order:
 * - a proven published inconsistency (provenWeightInconsistency);
 * - the published weight is above the most area the published k allows (largest root fillet,
 *   r = k − thickness, and sharp toes): a published inconsistency;
 * - else a geometry that meets W exists, and the reason names the root radius that would meet it
 *   with the family's slope and toes (found by bisection: the area grows with r), so the row's
 *   kdes does not give its fillet as the family rule reads it — our miss, not the table's.
 */
export function weightMissReason(entry: CatalogueEntry, family: readonly CatalogueEntry[]): string | undefined {
  const a = weightAgreement(entry);
  if (a === undefined || a.within) return undefined;
  const proven = provenWeightInconsistency(entry, family);
  if (proven !== undefined) return `published inconsistency: ${proven}`;
  const rMax = largestRoot(entry);
  if (rMax === undefined) return 'not reproduced by the family rule (our miss)';
  const most = areaWith(entry, { r: rMax, rt: 0 });
  if (most / a.areaFromWeight - 1 < -a.tolerance) {
    return `published inconsistency: even the largest root fillet the published k allows (r = ${inches(rMax)}) with sharp toes gives A = ${most.toFixed(3)} in², ${pct(most / a.areaFromWeight - 1)} from W ${entry.nominalWeight} lb/ft ÷ (490/144) = ${a.areaFromWeight.toFixed(3)} in²`;
  }
  const rule = entry.params['r'] ?? 0;
  const target = a.areaFromWeight;
  let lo = 0;
  let hi = rMax;
  const at0 = areaWith(entry, { r: 0 });
  if (at0 > target) return `our miss: with no root fillet and the family's toes the area is still ${pct(at0 / target - 1)} from W ÷ (490/144); only rounding the toes more than the family rule does would meet it`;
  if (areaWith(entry, { r: hi }) < target) return `our miss: the family's toe roundings keep the area below W ÷ (490/144) whatever the root fillet (up to k − thickness = ${inches(rMax)}); smaller toe roundings would meet it`;
  for (let i = 0; i < 40; i++) {
    const mid = (lo + hi) / 2;
    if (areaWith(entry, { r: mid }) < target) lo = mid;
    else hi = mid;
  }
  return `our miss: the family rule's root fillet r = ${inches(rule)} gives A ${pct(a.relative)} from W ÷ (490/144); r = ${inches((lo + hi) / 2)} (within the k − thickness = ${inches(rMax)} the published k allows) would meet W, so this row's k does not give its fillet as the rule reads it`;
}
