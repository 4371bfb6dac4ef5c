/**
 * Elastic section moduli about the centroidal x, y axes and the principal axes (docs/methods.md §4).
 *
 *   SxTop = Ix/(yMax − cy), SxBottom = Ix/(cy − yMin), SyRight = Iy/(xMax − cx), SyLeft = Iy/(cx − xMin)
 *   S1± = I1 / (extreme v on the ± side), S2± = I2 / (extreme u on the ± side)
 * with u = X cosθ1 + Y sinθ1 (along axis 1) and v = −X sinθ1 + Y cosθ1 (distance from axis 1).
 * Extreme distances are taken over the OUTER rings only (holes never govern in a valid section),
 * including the extreme points of arcs inside their sweep (§2.4). Distances are measured from the
 * centroid directly, so far-offset sections keep their digits.
 * Units: L³ for moduli, L for bounds. Assumes a normalised region of positive area.
 */
import { invariant } from '../invariant.ts';
import type { Region } from '../geometry/types.ts';
import { ringProjectionRange } from './arc.ts';

export interface ExtremeRange {
  readonly min: number;
  readonly max: number;
}

export interface ElasticModuli {
  readonly xMin: number;
  readonly xMax: number;
  readonly yMin: number;
  readonly yMax: number;
  readonly SxTop: number;
  readonly SxBottom: number;
  readonly SyLeft: number;
  readonly SyRight: number;
  readonly S1Plus: number;
  readonly S1Minus: number;
  readonly S2Plus: number;
  readonly S2Minus: number;
}

export interface ModuliInput {
  readonly cx: number;
  readonly cy: number;
  readonly Ix: number;
  readonly Iy: number;
  readonly I1: number;
  readonly I2: number;
  readonly thetaDeg: number;
}

/**
 * Least and greatest projection of the region's outer boundary (vertices and arc extreme points)
 * onto the unit direction (ux, uy), measured from the point (ox, oy).
 */
export function outerProjectionRange(region: Region, ux: number, uy: number, ox = 0, oy = 0): ExtremeRange {
  const out: [number, number] = [Infinity, -Infinity];
  for (const polygon of region) ringProjectionRange(polygon.outer.xy, polygon.outer.bulge, ox, oy, ux, uy, out);
  invariant(out[0] <= out[1], 'outerProjectionRange: the region has no outer vertices');
  return { min: out[0], max: out[1] };
}

/** Elastic moduli of a region with the given centroidal and principal moments (docs/methods.md §4). */
export function elasticModuli(region: Region, m: ModuliInput): ElasticModuli {
  const x = outerProjectionRange(region, 1, 0, m.cx, m.cy);
  const y = outerProjectionRange(region, 0, 1, m.cx, m.cy);
  const t = (m.thetaDeg * Math.PI) / 180;
  const c = Math.cos(t);
  const s = Math.sin(t);
  const u = outerProjectionRange(region, c, s, m.cx, m.cy);
  const v = outerProjectionRange(region, -s, c, m.cx, m.cy);
  return {
    xMin: m.cx + x.min,
    xMax: m.cx + x.max,
    yMin: m.cy + y.min,
    yMax: m.cy + y.max,
    SxTop: m.Ix / y.max,
    SxBottom: m.Ix / -y.min,
    SyRight: m.Iy / x.max,
    SyLeft: m.Iy / -x.min,
    S1Plus: m.I1 / v.max,
    S1Minus: m.I1 / -v.min,
    S2Plus: m.I2 / u.max,
    S2Minus: m.I2 / -u.min,
  };
}
