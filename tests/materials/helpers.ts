/** Small shape builders for the materials, stress and member tests (section coordinates, y up). */
import { ringFromPoints } from '../../core/geometry/ring.ts';
import type { Region } from '../../core/geometry/types.ts';
import type { MaterialSI } from '../../core/materials/schema.ts';

/** Axis-aligned rectangle [x0, x1] × [y0, y1], counter-clockwise. */
export function rect(x0: number, y0: number, x1: number, y1: number): Region {
  return [{ outer: ringFromPoints([[x0, y0], [x1, y0], [x1, y1], [x0, y1]]), holes: [] }];
}

/** Exact circle of diameter d centred at (cx, cy): two semicircular arcs (bulge ±1). */
export function circle(cx: number, cy: number, d: number, hole?: number): Region {
  const r = d / 2;
  const outer = ringFromPoints([[cx + r, cy], [cx - r, cy]], [1, 1]);
  const holes = hole === undefined ? [] : [ringFromPoints([[cx + hole / 2, cy], [cx - hole / 2, cy]], [-1, -1])];
  return [{ outer, holes }];
}

export function polygon(points: readonly (readonly [number, number])[]): Region {
  return [{ outer: ringFromPoints(points), holes: [] }];
}

/** A material in SI for tests (E, fy in Pa; density kg/m³). */
export function mat(id: string, E: number, fy: number, density: number, strengthBasis: MaterialSI['strengthBasis'] = 'yield'): MaterialSI {
  return { id, name: id, kind: 'other', E, G: E / 2.6, density, fy, strengthBasis };
}

export const rel = (a: number, b: number): number => Math.abs(a - b) / Math.abs(b);
