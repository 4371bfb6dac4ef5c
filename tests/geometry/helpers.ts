// Small builders shared by the geometry tests (plain data, no logic under test).
import { ringFromPoints, ringSignedArea } from '../../core/geometry/index.ts';
import type { Point, Polygon, Region, Ring } from '../../core/geometry/index.ts';

export const square = (x0: number, y0: number, x1: number, y1: number): Ring =>
  ringFromPoints([[x0, y0], [x1, y0], [x1, y1], [x0, y1]]);

/** A full circle as two semicircular arcs (bulge 1 each, counter-clockwise), per types.ts. */
export const circle = (cx: number, cy: number, r: number): Ring => ringFromPoints([[cx + r, cy], [cx - r, cy]], [1, 1]);

export const piece = (outer: Ring, holes: Ring[] = []): Polygon => ({ outer, holes });

export const regionArea = (region: Region): number =>
  region.reduce((sum, p) => sum + ringSignedArea(p.outer) + p.holes.reduce((s, h) => s + ringSignedArea(h), 0), 0);

export const pointsOf = (ring: Ring): Point[] => {
  const out: Point[] = [];
  for (let i = 0; i < ring.xy.length; i += 2) out.push([ring.xy[i] ?? NaN, ring.xy[i + 1] ?? NaN]);
  return out;
};

/** Star-shaped (hence simple) polygon about (cx, cy): angles strictly increasing, radii > 0. */
export const starRing = (cx: number, cy: number, radii: readonly number[]): Ring =>
  ringFromPoints(radii.map((r, i): Point => {
    const t = (2 * Math.PI * i) / radii.length;
    return [cx + r * Math.cos(t), cy + r * Math.sin(t)];
  }));
