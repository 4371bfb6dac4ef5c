/** Rectangle and circle tools, waiting: a press starts a drag from a snapped point. */
import type { ToolContext, ToolState, PointerInput } from './tool.ts';
import { shapeDragging } from './shape-dragging.ts';

export function shapeIdle(kind: 'rectangle' | 'circle'): ToolState {
  return {
    name: `${kind}.idle`,
    move(ctx: ToolContext, e: PointerInput): ToolState {
      const s = ctx.snap(e.p, e.alt);
      return { ...shapeIdle(kind), guides: s.guides };
    },
    down(ctx: ToolContext, e: PointerInput): ToolState {
      const s = ctx.snap(e.p, e.alt);
      return shapeDragging(kind, s.point, s.point, s.guides);
    },
  };
}
