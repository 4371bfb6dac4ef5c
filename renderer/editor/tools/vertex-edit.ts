/**
 * Shared helpers of the vertex tool: which parts have editable vertices, where a vertex is in
 * the world, and how to change one ring of a part. Rectangles become polygons on their first
 * vertex edit (same undo step); circles and standard parts keep their parameters instead.
 */
import type { Part, PolygonPart } from '../../../core/document/types.ts';
import { distanceToSegment, toLocal, toWorld, type Vec } from '../geometry.ts';
import type { VertexRef } from './tool.ts';

export function asEditablePolygon(part: Part): PolygonPart | null {
  if (part.type === 'polygon') return part;
  if (part.type !== 'rectangle') return null;
  const w = part.width / 2;
  const h = part.height / 2;
  const { width: _w, height: _h, type: _t, ...common } = part;
  return { ...common, type: 'polygon', outer: [[-w, -h], [w, -h], [w, h], [-w, h]], holes: [] };
}

export function ringOf(part: PolygonPart, ring: number): readonly (readonly [number, number])[] {
  return ring < 0 ? part.outer : (part.holes[ring] ?? []);
}

export function withRing(part: PolygonPart, ring: number, points: readonly (readonly [number, number])[], bulgeEdit?: (b: readonly number[]) => number[]): PolygonPart {
  if (ring < 0) {
    const outerBulges = part.outerBulges && bulgeEdit ? bulgeEdit(part.outerBulges) : part.outerBulges;
    return { ...part, outer: points, ...(outerBulges ? { outerBulges } : {}) };
  }
  const holes = part.holes.map((h, i) => (i === ring ? points : h));
  const holeBulges = part.holeBulges?.map((b, i) => (i === ring && bulgeEdit ? bulgeEdit(b) : b));
  return { ...part, holes, ...(holeBulges ? { holeBulges } : {}) };
}

export function vertexWorld(part: PolygonPart, v: VertexRef): Vec {
  const p = ringOf(part, v.ring)[v.index];
  return p ? toWorld(part.placement, p) : [part.placement.x, part.placement.y];
}

export function moveVertex(part: PolygonPart, v: VertexRef, world: Vec): PolygonPart {
  const local = toLocal(part.placement, world);
  const pts = ringOf(part, v.ring).map((p, i) => (i === v.index ? ([local[0], local[1]] as const) : p));
  return withRing(part, v.ring, pts);
}

export function insertVertex(part: PolygonPart, ring: number, afterIndex: number, world: Vec): PolygonPart {
  const local = toLocal(part.placement, world);
  const pts = [...ringOf(part, ring)];
  pts.splice(afterIndex + 1, 0, [local[0], local[1]]);
  // The split edge keeps its bulge on both halves' first part only if it was straight; arcs are split as straight edges.
  return withRing(part, ring, pts, (b) => {
    const out = [...b];
    out.splice(afterIndex, 1, 0, 0);
    return out;
  });
}

export function removeVertex(part: PolygonPart, v: VertexRef): PolygonPart | null {
  const pts = ringOf(part, v.ring);
  if (pts.length <= 3) return null;
  return withRing(part, v.ring, pts.filter((_, i) => i !== v.index), (b) => {
    const out = [...b];
    out.splice(v.index, 1);
    return out;
  });
}

export interface VertexPick {
  readonly kind: 'vertex' | 'edge';
  readonly ref: VertexRef;
  readonly at: Vec;
}

function editableRings(parts: readonly Part[]): { ref: Omit<VertexRef, 'index'>; pts: Vec[] }[] {
  const out: { ref: Omit<VertexRef, 'index'>; pts: Vec[] }[] = [];
  for (const part of parts) {
    const poly = asEditablePolygon(part);
    if (!poly || !part.visible) continue;
    for (const ring of [-1, ...poly.holes.map((_, i) => i)]) {
      out.push({ ref: { partId: part.id, ring }, pts: ringOf(poly, ring).map((q) => toWorld(poly.placement, q)) });
    }
  }
  return out;
}

/** The vertex nearest p within radius; failing that, the nearest edge point within radius. */
export function pickVertex(parts: readonly Part[], p: Vec, radius: number): VertexPick | null {
  const rings = editableRings(parts);
  let best: VertexPick | null = null;
  let bestD = radius;
  for (const r of rings) {
    r.pts.forEach((q, index) => {
      const d = Math.hypot(q[0] - p[0], q[1] - p[1]);
      if (d <= bestD) {
        best = { kind: 'vertex', ref: { ...r.ref, index }, at: q };
        bestD = d;
      }
    });
  }
  if (best) return best;
  for (const r of rings) {
    r.pts.forEach((a, index) => {
      const b = r.pts[(index + 1) % r.pts.length] as Vec;
      const { distance, t } = distanceToSegment(p, a, b);
      if (distance <= bestD) {
        best = { kind: 'edge', ref: { ...r.ref, index }, at: [a[0] + t * (b[0] - a[0]), a[1] + t * (b[1] - a[1])] };
        bestD = distance;
      }
    });
  }
  return best;
}
