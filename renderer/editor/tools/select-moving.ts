/**
 * Select tool, dragging the selection. The anchor is the selected vertex or centre nearest the
 * press; the anchor's new place is snapped, and the parts move by (snapped anchor − anchor)
 * from the document as it was at the press.
 */
import type { SectionDocument } from '../../../core/document/types.ts';
import type { Vec } from '../geometry.ts';
import { translateParts } from '../transforms.ts';
import type { Guide } from '../snapping.ts';
import type { ToolContext, ToolState, PointerInput } from './tool.ts';

function nearestAnchor(ctx: ToolContext, p: Vec): Vec {
  let best: Vec = p;
  let bestD = Infinity;
  for (const o of ctx.outlines()) {
    if (!ctx.selection.includes(o.partId)) continue;
    for (const v of [...o.vertices, o.centre]) {
      const d = Math.hypot(v[0] - p[0], v[1] - p[1]);
      if (d < bestD) {
        bestD = d;
        best = v;
      }
    }
  }
  return best;
}

export function selectMoving(ctx: ToolContext, start: Vec): ToolState {
  const snapshot: SectionDocument = ctx.doc;
  const selection = [...ctx.selection];
  const anchor = nearestAnchor(ctx, start);
  const exclude = new Set(selection);
  /** `moved`: the latest position differs from the start (a drag back to the start is no step). */
  const moving = (guides: readonly Guide[], moved: boolean): ToolState => ({
    name: 'select.moving',
    guides,
    move(c: ToolContext, e: PointerInput): ToolState {
      const raw: Vec = [anchor[0] + e.p[0] - start[0], anchor[1] + e.p[1] - start[1]];
      const s = c.snap(raw, e.alt, { exclude, from: snapshot });
      const dx = s.point[0] - anchor[0];
      const dy = s.point[1] - anchor[1];
      c.preview(translateParts(snapshot, selection, dx, dy));
      return moving(s.guides, dx !== 0 || dy !== 0);
    },
    up(c: ToolContext): ToolState {
      if (moved && c.doc !== snapshot) c.commit(selection.length === 1 ? 'Move part' : 'Move parts', snapshot, c.doc);
      else c.restore(snapshot, selection);
      return c.enter('select.idle');
    },
    key(c: ToolContext, key: string): ToolState {
      if (key !== 'Escape') return this;
      c.restore(snapshot, selection);
      return c.enter('select.idle');
    },
  });
  return moving([], false);
}
