/**
 * Vertex tool, waiting. A press on a vertex of a selected outline starts dragging it; a press on
 * an edge inserts a vertex there and drags it (one undo step); Delete removes the chosen vertex
 * (an outline keeps at least three). A press elsewhere on a part selects that part.
 */
import type { Part, SectionDocument } from '../../../core/document/types.ts';
import type { ToolContext, ToolState, PointerInput, VertexRef } from './tool.ts';
import { asEditablePolygon, insertVertex, pickVertex, removeVertex } from './vertex-edit.ts';

function replacePart(doc: SectionDocument, part: Part): SectionDocument {
  return { ...doc, parts: doc.parts.map((p) => (p.id === part.id ? part : p)) };
}

export function vertexIdle(chosen: VertexRef | null): ToolState {
  return {
    name: 'vertex.idle',
    chosenVertex: chosen,
    down(ctx: ToolContext, e: PointerInput): ToolState {
      const candidates = ctx.doc.parts.filter((p) => ctx.selection.includes(p.id));
      const pick = pickVertex(candidates, e.p, ctx.pickRadius);
      if (!pick) {
        const hit = ctx.hitPart(e.p);
        ctx.select(hit ? [hit] : []);
        return ctx.enter('vertex.idle', null);
      }
      const snapshot = ctx.doc;
      const part = snapshot.parts.find((p) => p.id === pick.ref.partId);
      const poly = part ? asEditablePolygon(part) : null;
      if (!poly) return this;
      if (pick.kind === 'vertex') return ctx.enter('vertex.dragging', snapshot, replacePart(snapshot, poly), pick.ref, pick.at, e.p, 'Move vertex');
      const inserted = insertVertex(poly, pick.ref.ring, pick.ref.index, pick.at);
      const ref = { ...pick.ref, index: pick.ref.index + 1 };
      const working = replacePart(snapshot, inserted);
      ctx.preview(working);
      return ctx.enter('vertex.dragging', snapshot, working, ref, pick.at, e.p, 'Insert vertex');
    },
    key(ctx: ToolContext, key: string): ToolState {
      if (key === 'Escape') return ctx.enter('vertex.idle', null);
      if ((key !== 'Delete' && key !== 'Backspace') || !chosen) return this;
      const part = ctx.doc.parts.find((p) => p.id === chosen.partId);
      const poly = part ? asEditablePolygon(part) : null;
      const removed = poly ? removeVertex(poly, chosen) : null;
      if (removed) ctx.commit('Delete vertex', ctx.doc, replacePart(ctx.doc, removed));
      return ctx.enter('vertex.idle', null);
    },
  };
}
