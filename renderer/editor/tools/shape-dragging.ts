/**
 * Rectangle and circle tools, dragging: a rectangle spans from the press to the (snapped)
 * pointer; a circle is centred on the press with its radius to the pointer. Release adds the
 * part as one undo step; a release without size adds nothing; Escape drops the drag.
 */
import type { CirclePart, RectanglePart, SectionDocument } from '../../../core/document/types.ts';
import type { Vec } from '../geometry.ts';
import type { Guide } from '../snapping.ts';
import type { ToolContext, ToolState, PointerInput } from './tool.ts';

export function rectanglePart(doc: SectionDocument, id: string, x: number, y: number, width: number, height: number): RectanglePart {
  return {
    id,
    name: `Plate ${doc.parts.length + 1}`,
    type: 'rectangle',
    placement: { x, y, rotationDeg: 0, mirror: false },
    operation: 'add',
    material: null,
    visible: true,
    width,
    height,
  };
}

export function circlePart(doc: SectionDocument, id: string, x: number, y: number, diameter: number): CirclePart {
  return {
    id,
    name: `Round ${doc.parts.length + 1}`,
    type: 'circle',
    placement: { x, y, rotationDeg: 0, mirror: false },
    operation: 'add',
    material: null,
    visible: true,
    diameter,
  };
}

export function shapeDragging(kind: 'rectangle' | 'circle', start: Vec, current: Vec, guides: readonly Guide[]): ToolState {
  const radius = Math.hypot(current[0] - start[0], current[1] - start[1]);
  return {
    name: `${kind}.dragging`,
    guides,
    draft: kind === 'rectangle' ? { kind, a: start, b: current } : { kind, centre: start, radius },
    move(ctx: ToolContext, e: PointerInput): ToolState {
      const s = ctx.snap(e.p, e.alt);
      return shapeDragging(kind, start, s.point, s.guides);
    },
    up(ctx: ToolContext): ToolState {
      const before = ctx.doc;
      const id = ctx.newPartId(before);
      const w = Math.abs(current[0] - start[0]);
      const h = Math.abs(current[1] - start[1]);
      if (kind === 'rectangle' && w > 0 && h > 0) {
        const part = rectanglePart(before, id, (start[0] + current[0]) / 2, (start[1] + current[1]) / 2, w, h);
        ctx.commit('Draw plate', before, { ...before, parts: [...before.parts, part] }, [id]);
      } else if (kind === 'circle' && radius > 0) {
        const part = circlePart(before, id, start[0], start[1], 2 * radius);
        ctx.commit('Draw round', before, { ...before, parts: [...before.parts, part] }, [id]);
      }
      return ctx.enter('shape.idle', kind);
    },
    key(ctx: ToolContext, key: string): ToolState {
      return key === 'Escape' ? ctx.enter('shape.idle', kind) : this;
    },
  };
}
