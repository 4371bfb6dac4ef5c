/**
 * Sawn lumber by nominal size: one or more plies of the dressed section, side by side.
 *
 * Units: the nominal sizes b × d are trade names in inches ("2 × 10") and are never converted;
 *   the region is in INCHES (regionUnit 'in'). core/parts/index.ts shapeRegion() scales it to a
 *   document unit.
 * Geometry: each ply is the dressed b × d rectangle from NDS Supplement Table 1A (lumber-sizes.ts),
 *   b along x (thickness), d along y (depth); plies touch face to face along x, as nailed or
 *   bolted multi-ply members are modelled for section properties (common practice; the fasteners
 *   do not count). Laying a plank flat is b > d (e.g. b = 10, d = 2).
 * Local origin: centre of the bounding box of all plies.
 */
import type { Diagnostic, Point, Polygon } from '../geometry/types.ts';
import type { PartType } from './registry-types.ts';
import { ringOf } from './outline.ts';
import { DRESSED_SIZES, dressedSize } from './lumber-sizes.ts';
import { badParameter, formatNumber, readParams, type Values } from './params.ts';

/** Dressed thickness (along x) and depth (along y) in inches for nominal b × d, either way round. */
export function dressedPly(nominalB: number, nominalD: number): { b: number; d: number } | undefined {
  const upright = dressedSize(nominalB, nominalD);
  if (upright !== undefined) return { b: upright.b, d: upright.d };
  const flat = dressedSize(nominalD, nominalB);
  return flat === undefined ? undefined : { b: flat.d, d: flat.b };
}

function plyPolygon(x0: number, b: number, d: number): Polygon {
  const corners: Point[] = [
    [x0, -d / 2],
    [x0 + b, -d / 2],
    [x0 + b, d / 2],
    [x0, d / 2],
  ];
  return { outer: ringOf(corners, [0, 0, 0, 0]), holes: [] };
}

export const lumber: PartType = {
  id: 'lumber',
  label: 'Sawn lumber (nominal size, dressed per NDS Supplement Table 1A)',
  origin: 'centre of the bounding box of the plies; thickness b along x, depth d along y, plies side by side along x',
  regionUnit: 'in',
  params: [
    { key: 'b', label: 'nominal thickness, in (e.g. 2 for a 2×10)', defaultIn: 2, quantity: 'nominal-in' },
    { key: 'd', label: 'nominal width, in (e.g. 10 for a 2×10)', defaultIn: 10, quantity: 'nominal-in' },
    { key: 'plies', label: 'number of plies', defaultIn: 1, optional: true, min: 1, quantity: 'count' },
  ],
  region(params: Values): { region: Polygon[]; diagnostics: readonly Diagnostic[] } {
    const { values, diagnostics } = readParams('lumber', lumber.params, params);
    if (diagnostics.length > 0) return { region: [], diagnostics };
    const { b, d, plies } = values as { b: number; d: number; plies: number };
    const ply = dressedPly(b, d);
    if (ply === undefined) {
      const known = DRESSED_SIZES.map((s) => s.nominal).join(', ');
      return { region: [], diagnostics: [badParameter('lumber', `nominal ${formatNumber(b)}x${formatNumber(d)} is not in NDS Supplement Table 1A as held here (${known})`)] };
    }
    const total = plies * ply.b;
    const region = Array.from({ length: plies }, (_, i) => plyPolygon(-total / 2 + i * ply.b, ply.b, ply.d));
    return { region, diagnostics };
  },
};
