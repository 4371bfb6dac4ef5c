/**
 * Vertex tool, dragging one vertex. `snapshot` is the document at the press (what Escape
 * restores and what the undo step starts from); `working` is the same document with the part
 * as an editable polygon (and any inserted vertex). Each move recomputes the vertex from its
 * start point plus the total pointer movement, snapped against the snapshot's targets.
 */
import type { Part, PolygonPart, SectionDocument } from '../../../core/document/types.ts';
import type { Vec } from '../geometry.ts';
import type { Guide } from '../snapping.ts';
import type { ToolContext, ToolState, PointerInput, VertexRef } from './tool.ts';
import { moveVertex } from './vertex-edit.ts';

function replacePart(doc: SectionDocument, part: Part): SectionDocument {
  return { ...doc, parts: doc.parts.map((p) => (p.id === part.id ? part : p)) };
}

export function vertexDragging(snapshot: SectionDocument, working: SectionDocument, ref: VertexRef, startAt: Vec, pressAt: Vec, label: string): ToolState {
  const part = working.parts.find((p) => p.id === ref.partId) as PolygonPart;
  const selection = [ref.partId];
  const state = (guides: readonly Guide[], changed: boolean): ToolState => ({
    name: 'vertex.dragging',
    guides,
    chosenVertex: ref,
    move(ctx: ToolContext, e: PointerInput): ToolState {
      const raw: Vec = [startAt[0] + e.p[0] - pressAt[0], startAt[1] + e.p[1] - pressAt[1]];
      const s = ctx.snap(raw, e.alt, { from: snapshot, skip: [startAt] });
      ctx.preview(replacePart(working, moveVertex(part, ref, s.point)));
      return state(s.guides, s.point[0] !== startAt[0] || s.point[1] !== startAt[1]);
    },
    up(ctx: ToolContext): ToolState {
      if (changed || label === 'Insert vertex') ctx.commit(label, snapshot, ctx.doc, selection);
      else ctx.restore(snapshot, selection);
      return ctx.enter('vertex.idle', ref);
    },
    key(ctx: ToolContext, key: string): ToolState {
      if (key !== 'Escape') return this;
      ctx.restore(snapshot, selection);
      return ctx.enter('vertex.idle', null);
    },
  });
  return state([], false);
}
