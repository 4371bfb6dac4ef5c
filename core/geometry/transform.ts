/**
 * Placing a part's local shape in the section: mirror, rotate, translate.
 *
 * Order (same as the document's Placement): mirror about the local y axis (x → −x) first, then
 * rotate counter-clockwise by rotationDeg about the local origin, then translate by (x, y).
 * Units: lengths in the document unit, rotation in degrees.
 * Arcs stay exact: rotation and translation keep every bulge; a mirror reverses each arc's sense
 *   (bulge → −bulge) and each ring's orientation, so the result is re-normalised (outer CCW, holes
 *   CW) — reversal negates the bulges again, so a convex arc stays convex with the same radius.
 * Accuracy: rotations by whole multiples of 90° use exact cos/sin (0, ±1), so a rotated
 *   rectangle keeps exact coordinates; other angles round like any cos/sin product.
 * Does not: validate. Never mutates its input. Source: plane rotation x' = x cos θ − y sin θ,
 *   y' = x sin θ + y cos θ (common practice).
 */
import { normaliseRegion } from './normalise.ts';
import type { Polygon, Region, Ring } from './types.ts';

export interface RegionPlacement {
  readonly x: number;
  readonly y: number;
  readonly rotationDeg: number;
  readonly mirror: boolean;
}

/** cos and sin of an angle in degrees, exact at multiples of 90°. */
export function cosSinDegrees(deg: number): [number, number] {
  const reduced = ((deg % 360) + 360) % 360;
  if (reduced === 0) return [1, 0];
  if (reduced === 90) return [0, 1];
  if (reduced === 180) return [-1, 0];
  if (reduced === 270) return [0, -1];
  const rad = (reduced * Math.PI) / 180;
  return [Math.cos(rad), Math.sin(rad)];
}

/** Applies x' = a·x + b·y + tx, y' = c·x + d·y + ty; bulges are multiplied by `bulgeSign`. */
function mapRing(ring: Ring, m: readonly [number, number, number, number, number, number], bulgeSign: 1 | -1): Ring {
  const [a, b, c, d, tx, ty] = m;
  const src = ring.xy;
  const xy = new Float64Array(src.length);
  for (let i = 0; i < src.length; i += 2) {
    const x = src[i] ?? 0;
    const y = src[i + 1] ?? 0;
    xy[i] = a * x + b * y + tx;
    xy[i + 1] = c * x + d * y + ty;
  }
  if (ring.bulge === undefined) return { xy };
  return { xy, bulge: bulgeSign === 1 ? Float64Array.from(ring.bulge) : ring.bulge.map((v) => 0 - v) };
}

function mapRegion(region: Region, m: readonly [number, number, number, number, number, number], bulgeSign: 1 | -1): Region {
  return region.map((p: Polygon) => ({ outer: mapRing(p.outer, m, bulgeSign), holes: p.holes.map((h) => mapRing(h, m, bulgeSign)) }));
}

export function translateRegion(region: Region, dx: number, dy: number): Region {
  return mapRegion(region, [1, 0, 0, 1, dx, dy], 1);
}

/** Rotation counter-clockwise about the origin, in degrees. */
export function rotateRegion(region: Region, rotationDeg: number): Region {
  const [c, s] = cosSinDegrees(rotationDeg);
  return mapRegion(region, [c, -s, s, c, 0, 0], 1);
}

/** Mirror (x → −x), then rotate, then translate; mirrored results are re-normalised. */
export function transformRegion(region: Region, placement: RegionPlacement): Region {
  const [c, s] = cosSinDegrees(placement.rotationDeg);
  const f = placement.mirror ? -1 : 1;
  // Rotation R times mirror diag(f, 1): first column scaled by f.
  const moved = mapRegion(region, [f * c, -s, f * s, c, placement.x, placement.y], placement.mirror ? -1 : 1);
  return placement.mirror ? normaliseRegion(moved) : moved;
}
