/**
 * The tool table: every tool state by id (tool.ts ToolStates), and the state each tool starts in.
 * The editor switches tools and states only through this table, so no state file imports
 * another (ctx.enter looks the next state up here).
 */
import { polygonPlacing } from './polygon-placing.ts';
import { selectIdle } from './select-idle.ts';
import { selectMoving } from './select-moving.ts';
import { shapeDragging } from './shape-dragging.ts';
import { shapeIdle } from './shape-idle.ts';
import type { ToolContext, ToolId, ToolState, ToolStateId, ToolStates } from './tool.ts';
import { vertexDragging } from './vertex-dragging.ts';
import { vertexIdle } from './vertex-idle.ts';

type StateMaker<K extends ToolStateId> = (ctx: ToolContext, ...args: ToolStates[K]) => ToolState;

export const TOOL_STATES: { readonly [K in ToolStateId]: StateMaker<K> } = {
  'select.idle': () => selectIdle(),
  'select.moving': (ctx, start) => selectMoving(ctx, start),
  'shape.idle': (_ctx, kind) => shapeIdle(kind),
  'shape.dragging': (_ctx, kind, start, current, guides) => shapeDragging(kind, start, current, guides),
  'polygon.placing': (_ctx, points, cursor, guides) => polygonPlacing(points, cursor, guides),
  'vertex.idle': (_ctx, chosen) => vertexIdle(chosen),
  'vertex.dragging': (_ctx, snapshot, working, ref, startAt, pressAt, label) => vertexDragging(snapshot, working, ref, startAt, pressAt, label),
};

/** The state `id` with its arguments, made from the table. */
export function enterState<K extends ToolStateId>(ctx: ToolContext, id: K, ...args: ToolStates[K]): ToolState {
  const make = TOOL_STATES[id] as StateMaker<K>;
  return make(ctx, ...args);
}

/** The state each tool starts in, by tool id. */
export const TOOL_ENTRY: { readonly [K in ToolId]: (ctx: ToolContext) => ToolState } = {
  select: (ctx) => enterState(ctx, 'select.idle'),
  polygon: (ctx) => enterState(ctx, 'polygon.placing', [], null, []),
  rectangle: (ctx) => enterState(ctx, 'shape.idle', 'rectangle'),
  circle: (ctx) => enterState(ctx, 'shape.idle', 'circle'),
  vertex: (ctx) => enterState(ctx, 'vertex.idle', null),
};
