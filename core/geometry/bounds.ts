/**
 * Bounding box and extreme projections of a region, exact with circular arcs.
 *
 * Units: the document's length unit. Winding: any (only vertices and arcs are looked at).
 * An arc's farthest point in direction φ is Pc + r(cos φ, sin φ) when φ lies inside its swept
 * interval, otherwise one of its end points (docs/methods.md §2.4, "Extreme points").
 * Only OUTER rings are used: holes of a valid region lie inside their outer ring (validateRegion
 * checks that), so they cannot reach farther.
 * Accuracy: an arc's extreme point carries the rounding of its centre from the bulge formula,
 *   a few ulps of the radius. Does not: check validity; an empty region has no bounds (null).
 * Source: docs/methods.md §2.4.
 */
import { arcOfSegment, ringVertexCount, type ArcGeometry } from './ring.ts';
import type { Point, Region, Ring } from './types.ts';

export interface Bounds {
  readonly minX: number;
  readonly minY: number;
  readonly maxX: number;
  readonly maxY: number;
}

/** Largest and smallest projection p·(dirX, dirY), and where they occur. */
export interface Extremes {
  readonly max: number;
  readonly min: number;
  readonly maxAt: Point;
  readonly minAt: Point;
}

const TWO_PI = 2 * Math.PI;

/** True when angle phi lies on the arc's swept interval (either direction). */
export function arcContainsAngle(arc: ArcGeometry, phi: number): boolean {
  const along = arc.sweep >= 0 ? phi - arc.t0 : arc.t0 - phi;
  const wrapped = ((along % TWO_PI) + TWO_PI) % TWO_PI;
  return wrapped <= Math.abs(arc.sweep);
}

/** Extreme projections of one ring onto (dx, dy), arcs included. */
export function ringExtremeAlong(ring: Ring, dx: number, dy: number): Extremes {
  const { xy } = ring;
  const n = ringVertexCount(ring);
  let max = -Infinity, min = Infinity;
  let iMax = 0, iMin = 0;
  for (let i = 0; i < n; i++) {
    const s = (xy[2 * i] ?? 0) * dx + (xy[2 * i + 1] ?? 0) * dy;
    if (s > max) { max = s; iMax = i; }
    if (s < min) { min = s; iMin = i; }
  }
  let maxAt: Point = [xy[2 * iMax] ?? NaN, xy[2 * iMax + 1] ?? NaN];
  let minAt: Point = [xy[2 * iMin] ?? NaN, xy[2 * iMin + 1] ?? NaN];
  const consider = (x: number, y: number): void => {
    const s = x * dx + y * dy;
    if (s > max) { max = s; maxAt = [x, y]; }
    if (s < min) { min = s; minAt = [x, y]; }
  };
  if (ring.bulge !== undefined) {
    const len = Math.hypot(dx, dy);
    const phi = Math.atan2(dy, dx);
    for (let i = 0; i < n; i++) {
      const arc = arcOfSegment(ring, i);
      if (arc === null || len === 0) continue;
      if (arcContainsAngle(arc, phi)) consider(arc.cx + (arc.r * dx) / len, arc.cy + (arc.r * dy) / len);
      if (arcContainsAngle(arc, phi + Math.PI)) consider(arc.cx - (arc.r * dx) / len, arc.cy - (arc.r * dy) / len);
    }
  }
  return { max, min, maxAt, minAt };
}

/** Max and min of the projection p·(dirX, dirY) over the outer rings (pass a unit vector for lengths). */
export function extremeAlong(region: Region, dirX: number, dirY: number): Extremes | null {
  let best: Extremes | null = null;
  for (const polygon of region) {
    const e = ringExtremeAlong(polygon.outer, dirX, dirY);
    if (best === null) { best = e; continue; }
    best = {
      max: e.max > best.max ? e.max : best.max,
      maxAt: e.max > best.max ? e.maxAt : best.maxAt,
      min: e.min < best.min ? e.min : best.min,
      minAt: e.min < best.min ? e.minAt : best.minAt,
    };
  }
  return best;
}

/** Exact bounds of one ring, arcs included. */
export function ringBounds(ring: Ring): Bounds {
  const ex = ringExtremeAlong(ring, 1, 0);
  const ey = ringExtremeAlong(ring, 0, 1);
  return { minX: ex.min, maxX: ex.max, minY: ey.min, maxY: ey.max };
}

/** Exact bounding box of the region's outer rings, or null for an empty region. */
export function regionBounds(region: Region): Bounds | null {
  if (region.length === 0) return null;
  let minX = Infinity, minY = Infinity, maxX = -Infinity, maxY = -Infinity;
  for (const polygon of region) {
    const b = ringBounds(polygon.outer);
    minX = Math.min(minX, b.minX);
    minY = Math.min(minY, b.minY);
    maxX = Math.max(maxX, b.maxX);
    maxY = Math.max(maxY, b.maxY);
  }
  return { minX, minY, maxX, maxY };
}
