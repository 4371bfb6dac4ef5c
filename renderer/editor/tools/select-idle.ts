/** Select tool, waiting: a press on a part selects it (Shift adds) and may start a move. */
import { translateParts, deleteParts } from '../transforms.ts';
import type { ToolContext, ToolState, PointerInput } from './tool.ts';

export function selectIdle(): ToolState {
  return {
    name: 'select.idle',
    down(ctx: ToolContext, e: PointerInput): ToolState {
      const hit = ctx.hitPart(e.p);
      if (!hit) {
        if (!e.shift) ctx.select([]);
        return this;
      }
      if (e.shift) {
        ctx.select(ctx.selection.includes(hit) ? ctx.selection.filter((id) => id !== hit) : [...ctx.selection, hit]);
        return this;
      }
      if (!ctx.selection.includes(hit)) ctx.select([hit]);
      return ctx.enter('select.moving', e.p);
    },
    key(ctx: ToolContext, key: string): ToolState {
      if ((key === 'Delete' || key === 'Backspace') && ctx.selection.length > 0) {
        const before = ctx.doc;
        ctx.commit(ctx.selection.length === 1 ? 'Delete part' : 'Delete parts', before, deleteParts(before, ctx.selection), []);
      } else if (key === 'Escape') {
        ctx.select([]);
      }
      return this;
    },
  };
}

/** Arrow-key nudges are handled by the editor; kept here so the select tool owns its moves. */
export function nudge(ctx: ToolContext, dx: number, dy: number): void {
  if (ctx.selection.length === 0) return;
  ctx.commit('Nudge', ctx.doc, translateParts(ctx.doc, ctx.selection, dx, dy));
}
