/**
 * The parametric parts library: every part type by its id in trade words, and the built-up
 * helpers that place several parts at once.
 *
 * Units: part dimensions are in the document unit, except lumber, whose nominal sizes are trade
 *   names in inches (see lumber.ts). shapeRegion() returns any part's region in a given unit.
 * Each part type documents its local origin in `origin`; regions are exact (arcs as bulges).
 */
import type { Diagnostic, Region, Ring } from '../geometry/types.ts';
import type { LengthUnit } from '../units/types.ts';
import type { PartType } from './registry-types.ts';
import { convertLength } from '../units/index.ts';
import { inchInUnit } from './inch.ts';
import { hat, lippedChannel, lippedZ, track } from './cold-formed.ts';
import { lumber } from './lumber.ts';
import { glulam, lvl, psl } from './timber.ts';
import { angle, channel, doubleAngle, iShape, tee, zShape } from './rolled.ts';
import { pipe, plate, rectTube, roundBar } from './simple.ts';

export type { ParamSpec, PartType } from './registry-types.ts';
export {
  boltHolePattern,
  boxFromChannels,
  coverPlatedI,
  doubleAnglesBackToBack,
  flitchBeam,
  plateGirder,
  type BoltHoleOptions,
  type BuiltUpPiece,
} from './built-up.ts';
export { DRESSED_SIZES, dressedSize, type DressedSize } from './lumber-sizes.ts';
export { dressedPly } from './lumber.ts';
export { LAMINATION_THICKNESS_IN, multiPlyLumber, woodIJoist, type MultiPlyOptions, type WoodIJoistOptions } from './timber.ts';

const PART_TYPES: readonly PartType[] = [plate, roundBar, pipe, rectTube, iShape, channel, angle, doubleAngle, tee, zShape, lumber, lippedChannel, lippedZ, hat, track, glulam, lvl, psl];

/** Every part type, in palette order. */
export function partTypes(): readonly PartType[] {
  return PART_TYPES;
}

/** The part type with this id ('i-shape', 'channel', …), or undefined. */
export function getPartType(id: string): PartType | undefined {
  return PART_TYPES.find((t) => t.id === id);
}

/** The default dimensions of a part type, by symbol, in inches (optional ones included unless their default is a rule). */
export function defaultParams(type: PartType): Record<string, number> {
  const params: Record<string, number> = {};
  for (const spec of type.params) if (spec.defaultRule === undefined) params[spec.key] = spec.defaultIn;
  return params;
}


function scaledRing(ring: Ring, factor: number): Ring {
  const xy = ring.xy.map((v) => v * factor);
  return ring.bulge === undefined ? { xy } : { xy, bulge: ring.bulge.slice() };
}

/**
 * Dimensions of a part converted between length units: only 'length' symbols change; ratios
 * (slope), counts (plies) and nominal trade sizes (lumber b, d) are kept. Use it to place a
 * catalogue part (inches) in a millimetre document. Unknown symbols are kept as they are (the
 * part type reports them when the region is built).
 */
export function paramsInUnit(shape: string, params: Readonly<Record<string, number>>, from: LengthUnit, to: LengthUnit): Record<string, number> {
  const specs = getPartType(shape)?.params ?? [];
  const out: Record<string, number> = {};
  for (const [key, value] of Object.entries(params)) {
    const quantity = specs.find((s) => s.key === key)?.quantity ?? 'length';
    out[key] = quantity === 'length' ? convertLength(value, from, to) : value;
  }
  return out;
}

/**
 * The region of a part in the document unit `unit`: the part type's own region when its
 * dimensions are lengths in that unit, scaled from inches when the type works in inches (lumber).
 */
export function shapeRegion(shape: string, params: Readonly<Record<string, number>>, unit: LengthUnit): { region: Region; diagnostics: readonly Diagnostic[] } {
  const type = getPartType(shape);
  if (type === undefined) {
    const known = PART_TYPES.map((t) => t.id).join(', ');
    return { region: [], diagnostics: [{ code: 'bad-parameter', part: shape, message: `unknown part type "${shape}"; known: ${known}` }] };
  }
  const built = type.region(params);
  if (type.regionUnit !== 'in' || unit === 'in') return built;
  const factor = inchInUnit(unit);
  const region = built.region.map((p) => ({ outer: scaledRing(p.outer, factor), holes: p.holes.map((h) => scaledRing(h, factor)) }));
  return { region, diagnostics: built.diagnostics };
}
