/**
 * Polygon tool: each click (or typed point) adds a vertex; a click on the first vertex or Enter
 * closes the outline (three vertices at least) as one undo step; Backspace removes the last
 * vertex; Escape drops the outline being drawn. The part's local origin is the centre of its
 * bounding box, and its outer ring is stored counter-clockwise (the document convention).
 */
import type { PolygonPart, SectionDocument } from '../../../core/document/types.ts';
import type { Vec } from '../geometry.ts';
import type { Guide } from '../snapping.ts';
import type { ToolContext, ToolState, PointerInput } from './tool.ts';

function signedArea(points: readonly Vec[]): number {
  let a = 0;
  for (let i = 0; i < points.length; i++) {
    const p = points[i] as Vec;
    const q = points[(i + 1) % points.length] as Vec;
    a += p[0] * q[1] - q[0] * p[1];
  }
  return a / 2;
}

export function polygonPartFrom(doc: SectionDocument, id: string, points: readonly Vec[], operation: 'add' | 'subtract'): PolygonPart {
  const xs = points.map((p) => p[0]);
  const ys = points.map((p) => p[1]);
  const ox = (Math.min(...xs) + Math.max(...xs)) / 2;
  const oy = (Math.min(...ys) + Math.max(...ys)) / 2;
  const ccw = signedArea(points) >= 0 ? [...points] : [...points].reverse();
  return {
    id,
    name: `Outline ${doc.parts.length + 1}`,
    type: 'polygon',
    placement: { x: ox, y: oy, rotationDeg: 0, mirror: false },
    operation,
    material: null,
    visible: true,
    outer: ccw.map((p) => [p[0] - ox, p[1] - oy] as const),
    holes: [],
  };
}

function close(ctx: ToolContext, points: readonly Vec[]): ToolState {
  if (points.length < 3) return polygonPlacing(points, null, []);
  const before = ctx.doc;
  const part = polygonPartFrom(before, ctx.newPartId(before), points, 'add');
  ctx.commit('Draw outline', before, { ...before, parts: [...before.parts, part] }, [part.id]);
  return polygonPlacing([], null, []);
}

export function polygonPlacing(points: readonly Vec[], cursor: Vec | null, guides: readonly Guide[]): ToolState {
  const first = points[0];
  const nearFirst = (ctx: ToolContext, p: Vec): boolean =>
    first !== undefined && points.length >= 3 && Math.hypot(p[0] - first[0], p[1] - first[1]) <= ctx.pickRadius;
  return {
    name: points.length === 0 ? 'polygon.idle' : 'polygon.placing',
    guides,
    draft: { kind: 'polygon', points, cursor, closing: false },
    move(ctx: ToolContext, e: PointerInput): ToolState {
      if (nearFirst(ctx, e.p) && first) return { ...polygonPlacing(points, first, []), draft: { kind: 'polygon', points, cursor: first, closing: true } };
      const s = ctx.snap(e.p, e.alt);
      return polygonPlacing(points, s.point, s.guides);
    },
    down(ctx: ToolContext, e: PointerInput): ToolState {
      if (nearFirst(ctx, e.p)) return close(ctx, points);
      const s = ctx.snap(e.p, e.alt);
      return polygonPlacing([...points, s.point], s.point, s.guides);
    },
    typedPoint(ctx: ToolContext, p: Vec): ToolState {
      if (first && points.length >= 3 && p[0] === first[0] && p[1] === first[1]) return close(ctx, points);
      return polygonPlacing([...points, p], cursor, []);
    },
    key(ctx: ToolContext, key: string): ToolState {
      if (key === 'Enter') return close(ctx, points);
      if (key === 'Escape') return polygonPlacing([], null, []);
      if (key === 'Backspace') return polygonPlacing(points.slice(0, -1), cursor, guides);
      return this;
    },
  };
}
