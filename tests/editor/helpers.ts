/** Small builders for headless editor tests (section coordinates, y up, millimetres). */
import { DOCUMENT_FORMAT, SECTION_VIEW_VERSION, type SectionDocument } from '../../core/document/types.ts';
import { Editor } from '../../renderer/editor/editor.ts';
import type { Vec } from '../../renderer/editor/geometry.ts';
import type { PointerInput } from '../../renderer/editor/tools/tool.ts';

export function emptyDoc(): SectionDocument {
  return { format: DOCUMENT_FORMAT, version: SECTION_VIEW_VERSION, name: 'test', unit: 'mm', parts: [], materials: [], defaultMaterial: null };
}

/** An editor with a 1 mm pick radius and a 10 mm grid, snapping as given. */
export function editorWith(doc: SectionDocument = emptyDoc(), snap = false): Editor {
  const ed = new Editor(doc);
  ed.setPickRadius(1);
  ed.setSnapSettings({ grid: 10, gridOn: snap, objectsOn: snap });
  return ed;
}

export const at = (x: number, y: number, alt = false): PointerInput => ({ p: [x, y] as Vec, alt, shift: false });

export function drag(ed: Editor, from: Vec, ...path: Vec[]): void {
  ed.pointerDown(at(from[0], from[1]));
  for (const p of path) ed.pointerMove(at(p[0], p[1]));
  const last = path[path.length - 1] ?? from;
  ed.pointerUp(at(last[0], last[1]));
}
