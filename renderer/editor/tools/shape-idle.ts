/** Rectangle and circle tools, waiting: a press starts a drag from a snapped point. */
import type { ToolContext, ToolState, PointerInput } from './tool.ts';

export function shapeIdle(kind: 'rectangle' | 'circle'): ToolState {
  return {
    name: `${kind}.idle`,
    move(ctx: ToolContext, e: PointerInput): ToolState {
      const s = ctx.snap(e.p, e.alt);
      return { ...ctx.enter('shape.idle', kind), guides: s.guides };
    },
    down(ctx: ToolContext, e: PointerInput): ToolState {
      const s = ctx.snap(e.p, e.alt);
      return ctx.enter('shape.dragging', kind, s.point, s.point, s.guides);
    },
  };
}
