/**
 * Plates, bars and tubes: plate, round-bar, pipe (round tube), rect-tube.
 *
 * Units: the caller's length unit (defaults are inches). Local origin: the centre of the
 *   bounding box, which is also the centroid (every one of these is doubly symmetric).
 * Winding: outer rings counter-clockwise, the bore / inner ring clockwise. Corner roundings and
 *   circles are exact arcs (bulges), so areas and moments are exact, not polygonal.
 * Tube corners follow the tabulated hollow-section convention: outside radius 2t by default and
 *   inside radius (outside − t) when that is positive, else a sharp inside corner (AISC Shapes
 *   Database v15.0 user notes for HSS; the 2·tdes radius reproduces the tabulated areas, see
 *   SOURCES.md).
 */
import type { Diagnostic, Point, Polygon } from '../geometry/types.ts';
import type { PartType } from './registry-types.ts';
import { circleRing, roundedRing, type Corner } from './outline.ts';
import { complain, formatNumber, readParams, type Values } from './params.ts';

/** The four corners of a centred B × H rectangle, counter-clockwise or clockwise, all rounded by r. */
export function rectangleCorners(width: number, height: number, radius: number, direction: 'ccw' | 'cw'): Corner[] {
  const w = width / 2;
  const h = height / 2;
  const ccw: Point[] = [
    [-w, -h],
    [w, -h],
    [w, h],
    [-w, h],
  ];
  const points = direction === 'ccw' ? ccw : [...ccw].reverse();
  return points.map((at) => ({ at, radius }));
}

type Built = { region: Polygon[]; diagnostics: readonly Diagnostic[] };
const failed = (diagnostics: readonly Diagnostic[]): Built => ({ region: [], diagnostics });

export const plate: PartType = {
  id: 'plate',
  label: 'Plate',
  origin: 'centre of the plate; width b along x, thickness t along y',
  params: [
    { key: 'b', label: 'width', defaultIn: 12 },
    { key: 't', label: 'thickness', defaultIn: 0.5 },
    { key: 'r', label: 'corner radius', defaultIn: 0, optional: true },
  ],
  region(params: Values): Built {
    const { values, diagnostics } = readParams('plate', plate.params, params);
    if (diagnostics.length > 0) return failed(diagnostics);
    const { b, t, r } = values as { b: number; t: number; r: number };
    complain(diagnostics, 'plate', 2 * r > Math.min(b, t), `corner radius r = ${formatNumber(r)} is more than half of the smaller side ${formatNumber(Math.min(b, t))}`);
    if (diagnostics.length > 0) return failed(diagnostics);
    return { region: [{ outer: roundedRing(rectangleCorners(b, t, r, 'ccw')), holes: [] }], diagnostics };
  },
};

export const roundBar: PartType = {
  id: 'round-bar',
  label: 'Round bar',
  origin: 'centre of the bar',
  params: [{ key: 'd', label: 'diameter', defaultIn: 2 }],
  region(params: Values): Built {
    const { values, diagnostics } = readParams('round-bar', roundBar.params, params);
    if (diagnostics.length > 0) return failed(diagnostics);
    return { region: [{ outer: circleRing(0, 0, values['d']! / 2, 'ccw'), holes: [] }], diagnostics };
  },
};

export const pipe: PartType = {
  id: 'pipe',
  label: 'Round tube or pipe',
  origin: 'centre of the tube',
  params: [
    { key: 'OD', label: 'outside diameter', defaultIn: 6.625 },
    { key: 't', label: 'wall thickness (design)', defaultIn: 0.26 },
  ],
  region(params: Values): Built {
    const { values, diagnostics } = readParams('pipe', pipe.params, params);
    if (diagnostics.length > 0) return failed(diagnostics);
    const { OD, t } = values as { OD: number; t: number };
    complain(diagnostics, 'pipe', 2 * t >= OD, `wall t = ${formatNumber(t)} is at least half of OD = ${formatNumber(OD)} (no bore left; use round-bar)`);
    if (diagnostics.length > 0) return failed(diagnostics);
    return { region: [{ outer: circleRing(0, 0, OD / 2, 'ccw'), holes: [circleRing(0, 0, OD / 2 - t, 'cw', 'top')] }], diagnostics };
  },
};

export const rectTube: PartType = {
  id: 'rect-tube',
  label: 'Rectangular or square tube',
  origin: 'centre of the tube; height H along y, width B along x',
  params: [
    { key: 'H', label: 'outside height', defaultIn: 6 },
    { key: 'B', label: 'outside width', defaultIn: 6 },
    { key: 't', label: 'wall thickness (design)', defaultIn: 0.233 },
    { key: 'r', label: 'outside corner radius', defaultIn: 0.466, optional: true, defaultRule: '2t' },
  ],
  region(params: Values): Built {
    const { values, diagnostics } = readParams('rect-tube', rectTube.params, params);
    if (diagnostics.length > 0) return failed(diagnostics);
    const { H, B, t } = values as { H: number; B: number; t: number };
    const r = values['r'] ?? 2 * t;
    const small = Math.min(H, B);
    complain(diagnostics, 'rect-tube', 2 * t >= small, `wall t = ${formatNumber(t)} is at least half of the smaller side ${formatNumber(small)} (no bore left)`);
    complain(diagnostics, 'rect-tube', 2 * r > small, `outside corner radius r = ${formatNumber(r)} is more than half of the smaller side ${formatNumber(small)}`);
    if (diagnostics.length > 0) return failed(diagnostics);
    const inner = rectangleCorners(B - 2 * t, H - 2 * t, Math.max(r - t, 0), 'cw');
    return { region: [{ outer: roundedRing(rectangleCorners(B, H, r, 'ccw')), holes: [roundedRing(inner)] }], diagnostics };
  },
};
