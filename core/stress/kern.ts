/**
 * The kern (core) of a section: where a compressive axial load may act without tension
 * (for several materials: without tensile strain) anywhere in the section.
 *
 * Method (docs/methods.md §9.2): the convex hull (Andrew's monotone chain) of every outer-ring
 * vertex and of points standing in for the arcs; each hull edge, written nᵀp = 1 in
 * coordinates about the centroid, gives the kern vertex e = −𝐉n/A with 𝐉 = [[Iy, Ixy],
 * [Ixy, Ix]]; several materials use EA and the EI tensor instead of A and 𝐉.
 *
 * Arcs: an arc that bulges outward (counter-clockwise about its centre on a counter-clockwise
 * outer ring) is replaced by its CIRCUMSCRIBED polygon — the end points and, for each sub-arc of
 * at most `maxArcStepDeg`, the crossing of its end tangents at distance r / cos(φ/2) — so the
 * hull contains the true section and the kern can only come out smaller (conservative). Every
 * supporting line of that polygon is a tangent of the arc, so for a circle every kern vertex is
 * exact (r/4 = d/8) and only the straight kern edges between them cut the true circular kern:
 * the radial shortfall is at most 1 − cos(step/2) of the kern radius (reported as `arcTolerance`).
 * An inward arc lies inside the hull of the section's true boundary points, so points on the arc
 * itself are used.
 *
 * Units: the section's length unit. Requires a valid, normalised region (outer rings CCW) and a
 * stiffness about the centroid that lies strictly inside the hull.
 * Source: docs/methods.md §9.2; A. M. Andrew, "Another efficient algorithm for convex hulls in two
 * dimensions", Inf. Proc. Letters 9 (1979) (from memory for the bibliographic details).
 */
import { arcOfSegment, ringVertexCount } from '../geometry/ring.ts';
import type { Point, Region } from '../geometry/types.ts';
import { invariant } from '../invariant.ts';
import type { SectionStiffness } from './normal-stress.ts';

export interface Kern {
  /** Kern vertices, counter-clockwise, section coordinates. */
  readonly vertices: readonly Point[];
  /** The hull the kern was built from, counter-clockwise, section coordinates. */
  readonly hull: readonly Point[];
  /** Relative radial shortfall bound from circumscribing the arcs (0 when there are no arcs). */
  readonly arcTolerance: number;
}

const cross = (o: Point, a: Point, b: Point): number => (a[0] - o[0]) * (b[1] - o[1]) - (a[1] - o[1]) * (b[0] - o[0]);

/** Andrew's monotone chain; collinear points are dropped; result counter-clockwise. */
export function convexHull(points: readonly Point[]): Point[] {
  const sorted = [...points].sort((a, b) => a[0] - b[0] || a[1] - b[1]);
  if (sorted.length < 3) return sorted;
  const lower: Point[] = [];
  for (const p of sorted) {
    while (lower.length >= 2 && cross(lower[lower.length - 2] as Point, lower[lower.length - 1] as Point, p) <= 0) lower.pop();
    lower.push(p);
  }
  const upper: Point[] = [];
  for (let i = sorted.length - 1; i >= 0; i--) {
    const p = sorted[i] as Point;
    while (upper.length >= 2 && cross(upper[upper.length - 2] as Point, upper[upper.length - 1] as Point, p) <= 0) upper.pop();
    upper.push(p);
  }
  lower.pop();
  upper.pop();
  return lower.concat(upper);
}

/** Vertices of the outer rings plus the stand-in points for arcs (see the header). */
export function hullCandidatePoints(region: Region, maxArcStepDeg: number): Point[] {
  const maxStep = (maxArcStepDeg * Math.PI) / 180;
  const points: Point[] = [];
  for (const polygon of region) {
    const ring = polygon.outer;
    const n = ringVertexCount(ring);
    for (let i = 0; i < n; i++) {
      points.push([ring.xy[2 * i] ?? 0, ring.xy[2 * i + 1] ?? 0]);
      const arc = arcOfSegment(ring, i);
      if (arc === null) continue;
      const steps = Math.max(1, Math.ceil(Math.abs(arc.sweep) / maxStep));
      const step = arc.sweep / steps;
      // Outward arcs: tangent crossings at r/cos(step/2); inward arcs: points on the arc.
      const reach = arc.sweep > 0 ? arc.r / Math.cos(step / 2) : arc.r;
      for (let k = 0; k < steps; k++) {
        const t = arc.t0 + (k + 0.5) * step;
        points.push([arc.cx + reach * Math.cos(t), arc.cy + reach * Math.sin(t)]);
        if (arc.sweep < 0 && k > 0) points.push([arc.cx + arc.r * Math.cos(arc.t0 + k * step), arc.cy + arc.r * Math.sin(arc.t0 + k * step)]);
      }
    }
  }
  return points;
}

/**
 * The kern for a section of stiffness `s` (one material: E = 1, so EA = A and EI = I).
 * `maxArcStepDeg` (default 0.5°) sets the arc subdivision.
 */
export function kern(region: Region, s: SectionStiffness, maxArcStepDeg = 0.5): Kern {
  invariant(maxArcStepDeg > 0 && maxArcStepDeg <= 90, 'kern: maxArcStepDeg must be in (0, 90]');
  const hasArcs = region.some((p) => p.outer.bulge?.some((b) => b !== 0) ?? false);
  const hull = convexHull(hullCandidatePoints(region, maxArcStepDeg));
  invariant(hull.length >= 3, 'kern: the section has no area (fewer than 3 hull points)');
  const vertices: Point[] = [];
  for (let k = 0; k < hull.length; k++) {
    const a = hull[k] as Point;
    const b = hull[(k + 1) % hull.length] as Point;
    const xa = a[0] - s.cx, ya = a[1] - s.cy, xb = b[0] - s.cx, yb = b[1] - s.cy;
    const c = xa * yb - xb * ya;
    invariant(c > 0, 'kern: the centroid must lie strictly inside the convex hull');
    const nX = (yb - ya) / c;
    const nY = -(xb - xa) / c;
    vertices.push([s.cx - (s.EIy * nX + s.EIxy * nY) / s.EA, s.cy - (s.EIxy * nX + s.EIx * nY) / s.EA]);
  }
  const half = (maxArcStepDeg * Math.PI) / 360;
  return { vertices, hull, arcTolerance: hasArcs ? 1 - Math.cos(half) : 0 };
}
