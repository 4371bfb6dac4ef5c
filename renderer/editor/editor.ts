/**
 * The headless editor (STYLE.md §8): document, selection, history and the active tool state.
 * React subscribes to it and renders; canvas handlers translate events into these calls.
 * All coordinates here are section coordinates (y up) in the document unit.
 *
 * The editor holds the whole file (every section, or alternative) and edits one of them, the
 * active section: `state.doc` is that section's one-section view (core/document/sections.ts),
 * which the tools, panels and results use; each change to it is written back into the file.
 * Adding, duplicating, renaming, deleting and reordering sections are undo steps like any
 * edit. Switching the active section changes nothing in the file, so it is no step and leaves
 * the file saved; undo and redo go back to the section where the step was made.
 */
import {
  fileFromSection, mapSectionViews, sectionById, sectionNameProblem, sectionView, uniqueSectionId, uniqueSectionName, withSectionView,
} from '../../core/document/sections.ts';
import type { Part, SectionDocument, SectionFile } from '../../core/document/types.ts';
import { documentOutlines, outlineBox, outlineHit, type PartOutline, type ShapeRingResolver, type Vec } from './geometry.ts';
import { emptyHistory, isDirty, markSaved, pushStep, redoStep, undoStep, type History, type Snapshot } from './history.ts';
import { snapPoint, snapTargets, type SnapResult, type SnapSettings } from './snapping.ts';
import {
  alignParts, arrayParts, deleteParts, distributeParts, duplicateParts, mirrorParts, reorderPart, rotateParts, translateParts, uniquePartId, type AlignEdge, type DistributeMode,
} from './transforms.ts';
import type { PointerInput, SnapOptions, ToolContext, ToolId, ToolState } from './tools/tool.ts';
import { polygonPartFrom } from './tools/polygon-placing.ts';
import { circlePart, rectanglePart } from './tools/shape-dragging.ts';
import { enterState, TOOL_ENTRY } from './tools/table.ts';

export interface OpenFile {
  readonly name: string;
  readonly handle: string | null;
}

export interface EditorState {
  /** The active section's one-section view (what tools, panels and results use). */
  readonly doc: SectionDocument;
  /** The whole file: what is saved and written for recovery. */
  readonly sectionFile: SectionFile;
  /** Id of the section being edited. */
  readonly activeSection: string;
  readonly selection: readonly string[];
  readonly toolId: ToolId;
  readonly tool: ToolState;
  /** Bumps on every document change, previews included: derived results memoise on it. */
  readonly revision: number;
  readonly canUndo: boolean;
  readonly canRedo: boolean;
  readonly undoLabel: string | null;
  readonly redoLabel: string | null;
  readonly dirty: boolean;
  readonly file: OpenFile | null;
  readonly snap: SnapSettings;
  /** True while a gesture is under way (drag or an outline being drawn). */
  readonly gesture: boolean;
}

export interface EditorOptions {
  /** Outlines of standard parts (from core/parts); without it, shape parts draw nothing. */
  readonly resolveShape?: ShapeRingResolver;
}

/** A section command that could not be done, and why (nothing changed). */
export type SectionCommandResult = { readonly ok: true; readonly id: string } | { readonly ok: false; readonly message: string };

function asFile(doc: SectionDocument | SectionFile): SectionFile {
  return 'sections' in doc ? doc : fileFromSection(doc);
}

function snapshotOf(file: SectionFile, active: string): Snapshot {
  return { file, active, view: sectionView(file, active) };
}

/** The first section of a file (or of a one-section document, keeping that document as its view when it matches). */
function firstSnapshot(doc: SectionDocument | SectionFile): Snapshot {
  const file = asFile(doc);
  const first = file.sections[0] as { id: string; name: string };
  return !('sections' in doc) && doc.name === first.name ? { file, active: first.id, view: doc } : snapshotOf(file, first.id);
}

export class Editor {
  private doc: SectionDocument;
  /** The file as of the last step, undo, redo, load or switch; previews are written onto it. */
  private committed: Snapshot;
  private sectionFile: SectionFile;
  private selection: readonly string[] = [];
  private history: History = emptyHistory();
  private toolId: ToolId = 'select';
  private tool: ToolState;
  private revision = 0;
  private file: OpenFile | null = null;
  private snap: SnapSettings = { grid: 10, gridOn: true, objectsOn: true, radius: 1 };
  private pickRadius = 1;
  private centroid: Vec | null = null;
  private liveSnapshot: SectionDocument | null = null;
  private readonly listeners = new Set<() => void>();
  private readonly outlineCache = new WeakMap<SectionDocument, PartOutline[]>();
  private state: EditorState;
  private readonly options: EditorOptions;

  /** A one-section document is taken as a file with that one section. */
  constructor(doc: SectionDocument | SectionFile, options: EditorOptions = {}) {
    this.committed = firstSnapshot(doc);
    this.doc = this.committed.view;
    this.sectionFile = this.committed.file;
    this.options = options;
    this.tool = TOOL_ENTRY.select(this.context());
    this.state = this.buildState();
  }

  // ---- subscription -------------------------------------------------------------------------

  subscribe = (fn: () => void): (() => void) => {
    this.listeners.add(fn);
    return () => this.listeners.delete(fn);
  };

  getState = (): EditorState => this.state;

  private buildState(): EditorState {
    const done = this.history.done;
    const undone = this.history.undone;
    return {
      doc: this.doc,
      sectionFile: this.sectionFile,
      activeSection: this.committed.active,
      selection: this.selection,
      toolId: this.toolId,
      tool: this.tool,
      revision: this.revision,
      canUndo: done.length > 0,
      canRedo: undone.length > 0,
      undoLabel: done[done.length - 1]?.label ?? null,
      redoLabel: undone[undone.length - 1]?.label ?? null,
      dirty: isDirty(this.history),
      file: this.file,
      snap: this.snap,
      gesture: this.tool.name.endsWith('.dragging') || this.tool.name.endsWith('.moving') || this.tool.name === 'polygon.placing',
    };
  }

  private emit(): void {
    this.state = this.buildState();
    for (const fn of this.listeners) fn();
  }

  // ---- derived geometry ---------------------------------------------------------------------

  outlines(doc: SectionDocument = this.doc): readonly PartOutline[] {
    let o = this.outlineCache.get(doc);
    if (!o) {
      o = documentOutlines(doc, this.options.resolveShape);
      this.outlineCache.set(doc, o);
    }
    return o;
  }

  hitPart(p: Vec): string | null {
    const outlines = this.outlines();
    for (let i = this.doc.parts.length - 1; i >= 0; i--) {
      const part = this.doc.parts[i] as Part;
      const o = outlines[i];
      if (part.visible && o && outlineHit(o, p, this.pickRadius)) return part.id;
    }
    return null;
  }

  snapAt(p: Vec, alt: boolean, opts: SnapOptions = {}): SnapResult {
    const skip = opts.skip ?? [];
    const targets = snapTargets(this.outlines(opts.from ?? this.doc), opts.exclude ?? new Set(), this.centroid).filter(
      (t) => !skip.some((s) => s[0] === t.at[0] && s[1] === t.at[1]),
    );
    return snapPoint(p, targets, this.snap, alt);
  }

  /** Bounding-box centre of the selection (the pivot for rotate and mirror), or null. */
  selectionCentre(): Vec | null {
    const box = outlineBox(this.outlines().filter((o) => this.selection.includes(o.partId)));
    return box ? [(box.xMin + box.xMax) / 2, (box.yMin + box.yMax) / 2] : null;
  }

  // ---- settings -----------------------------------------------------------------------------

  setSnapSettings(s: Partial<SnapSettings>): void {
    this.snap = { ...this.snap, ...s };
    this.emit();
  }

  /** Pick and snap distances in section units (the UI passes a few pixels ÷ zoom). */
  setPickRadius(r: number): void {
    this.pickRadius = r;
    this.snap = { ...this.snap, radius: r };
  }

  /** The section centroid from the latest results, offered as a snap target. */
  setCentroid(c: Vec | null): void {
    this.centroid = c;
  }

  // ---- tools --------------------------------------------------------------------------------

  private context(): ToolContext {
    // Getters, so a state that selects and then reads sees the new selection.
    const current = { doc: () => this.doc, selection: () => this.selection };
    return {
      get doc() {
        return current.doc();
      },
      get selection() {
        return current.selection();
      },
      pickRadius: this.pickRadius,
      outlines: () => this.outlines(),
      hitPart: (p) => this.hitPart(p),
      snap: (p, alt, opts) => this.snapAt(p, alt, opts),
      select: (ids) => {
        this.selection = [...ids];
      },
      preview: (doc) => this.setDoc(doc),
      commit: (label, before, after, selectionAfter) => this.commitStep(label, before, after, selectionAfter),
      restore: (doc, selection) => {
        this.setDoc(doc);
        this.selection = [...selection];
      },
      newPartId: (doc) => uniquePartId(doc),
      enter: (id, ...args) => enterState(this.context(), id, ...args),
    };
  }

  private drive(fn: (t: ToolState, ctx: ToolContext) => ToolState | undefined): void {
    const next = fn(this.tool, this.context());
    if (next) this.tool = next;
    this.emit();
  }

  setTool(id: ToolId): void {
    if (this.state.gesture) this.tool.key?.(this.context(), 'Escape');
    this.toolId = id;
    this.tool = TOOL_ENTRY[id](this.context());
    this.emit();
  }

  pointerDown(e: PointerInput): void {
    this.drive((t, c) => t.down?.(c, e));
  }

  pointerMove(e: PointerInput): void {
    if (!this.tool.move) return;
    this.drive((t, c) => t.move?.(c, e));
  }

  pointerUp(e: PointerInput): void {
    this.drive((t, c) => t.up?.(c, e));
  }

  /** A key for the active tool (Escape, Enter, Delete, Backspace); returns whether a tool state handled it. */
  key(key: string): boolean {
    if (!this.tool.key) return false;
    this.drive((t, c) => t.key?.(c, key));
    return true;
  }

  /** A typed exact vertex for the polygon tool. */
  typedPoint(p: Vec): void {
    if (this.toolId !== 'polygon') this.setTool('polygon');
    this.drive((t, c) => t.typedPoint?.(c, p));
  }

  // ---- history ------------------------------------------------------------------------------

  /** Shows a view of the active section (a preview, or a step's result), written onto the committed file. */
  private setDoc(doc: SectionDocument): void {
    if (doc === this.doc) return;
    this.doc = doc;
    this.sectionFile = doc === this.committed.view ? this.committed.file : withSectionView(this.committed.file, this.committed.active, doc);
    this.revision++;
  }

  /** Makes a snapshot the current state (undo, redo, load, switch). */
  private restoreSnapshot(s: Snapshot): void {
    this.committed = s;
    this.sectionFile = s.file;
    if (s.view !== this.doc) {
      this.doc = s.view;
      this.revision++;
    }
  }

  private commitStep(label: string, before: SectionDocument, after: SectionDocument, selectionAfter?: readonly string[]): void {
    const base = this.committed;
    const from: Snapshot = before === base.view ? base : { file: withSectionView(base.file, base.active, before), active: base.active, view: before };
    const to: Snapshot = { file: withSectionView(base.file, base.active, after), active: base.active, view: after };
    this.pushSnapshots(label, from, to, selectionAfter ? [...selectionAfter] : this.selection.filter((id) => after.parts.some((p) => p.id === id)));
  }

  private pushSnapshots(label: string, from: Snapshot, to: Snapshot, selectionAfter: readonly string[]): void {
    this.history = pushStep(this.history, { label, before: from, after: to, selectionBefore: this.selection, selectionAfter });
    this.restoreSnapshot(to);
    this.selection = selectionAfter;
  }

  /** Ends a gesture and a live edit, so a whole-file change starts from a settled state. */
  private settle(): void {
    if (this.state.gesture) this.tool.key?.(this.context(), 'Escape');
    if (this.liveSnapshot) this.commitLive('Change dimension');
  }

  /** One command = one undo step. No step when nothing changed. */
  run(label: string, fn: (doc: SectionDocument, selection: readonly string[]) => { doc: SectionDocument; selection?: readonly string[] }): void {
    if (this.state.gesture) this.tool.key?.(this.context(), 'Escape');
    if (this.liveSnapshot) this.commitLive('Change dimension');
    const out = fn(this.doc, this.selection);
    if (out.doc !== this.doc) this.commitStep(label, this.doc, out.doc, out.selection);
    else if (out.selection) this.selection = [...out.selection];
    this.emit();
  }

  undo(): void {
    if (this.liveSnapshot) this.commitLive('Change dimension');
    if (this.state.gesture) {
      this.key('Escape');
      return;
    }
    const r = undoStep(this.history);
    if (!r) return;
    this.history = r.history;
    this.restoreSnapshot(r.step.before);
    this.selection = r.step.selectionBefore;
    this.tool = TOOL_ENTRY[this.toolId](this.context());
    this.emit();
  }

  redo(): void {
    if (this.state.gesture) return;
    const r = redoStep(this.history);
    if (!r) return;
    this.history = r.history;
    this.restoreSnapshot(r.step.after);
    this.selection = r.step.selectionAfter;
    this.tool = TOOL_ENTRY[this.toolId](this.context());
    this.emit();
  }

  /**
   * Replace everything (new or opened file; a one-section document counts as a file with that
   * section): the first section is active, history starts afresh and counts as saved.
   */
  load(doc: SectionDocument | SectionFile, file: OpenFile | null, dirty = false): void {
    this.liveSnapshot = null;
    this.restoreSnapshot(firstSnapshot(doc));
    this.revision++;
    this.history = dirty ? { done: [], undone: [], savedAt: null } : emptyHistory();
    this.selection = [];
    this.file = file;
    this.tool = TOOL_ENTRY[this.toolId](this.context());
    this.emit();
  }

  markSaved(file: OpenFile): void {
    this.history = markSaved(this.history);
    this.file = file;
    this.emit();
  }

  // ---- commands -----------------------------------------------------------------------------

  select(ids: readonly string[]): void {
    this.selection = [...ids];
    this.emit();
  }

  addPart(label: string, make: (doc: SectionDocument, id: string) => Part): string {
    let id = '';
    this.run(label, (doc) => {
      id = uniquePartId(doc);
      return { doc: { ...doc, parts: [...doc.parts, make(doc, id)] }, selection: [id] };
    });
    return id;
  }

  addRectangle(r: { x: number; y: number; width: number; height: number; operation?: 'add' | 'subtract'; name?: string }): string {
    return this.addPart('Add plate', (doc, id) => {
      const p = rectanglePart(doc, id, r.x, r.y, r.width, r.height);
      return { ...p, operation: r.operation ?? 'add', name: r.name ?? (r.operation === 'subtract' ? `Cut-out ${doc.parts.length + 1}` : p.name) };
    });
  }

  addCircle(c: { x: number; y: number; diameter: number; operation?: 'add' | 'subtract'; name?: string }): string {
    return this.addPart('Add round', (doc, id) => {
      const p = circlePart(doc, id, c.x, c.y, c.diameter);
      return { ...p, operation: c.operation ?? 'add', name: c.name ?? (c.operation === 'subtract' ? `Hole ${doc.parts.length + 1}` : p.name) };
    });
  }

  addPolygon(points: readonly Vec[], operation: 'add' | 'subtract' = 'add'): string {
    return this.addPart('Add outline', (doc, id) => polygonPartFrom(doc, id, points, operation));
  }

  updatePart(id: string, label: string, fn: (p: Part) => Part): void {
    this.run(label, (doc) => ({ doc: { ...doc, parts: doc.parts.map((p) => (p.id === id ? fn(p) : p)) } }));
  }

  moveSelectionBy(dx: number, dy: number): void {
    this.run('Move by offset', (doc, sel) => ({ doc: sel.length && (dx || dy) ? translateParts(doc, sel, dx, dy) : doc }));
  }

  /** Move so the selection's bounding-box centre lands on (x, y). */
  moveSelectionTo(x: number, y: number): void {
    const c = this.selectionCentre();
    if (!c) return;
    this.run('Move to point', (doc, sel) => ({ doc: c[0] === x && c[1] === y ? doc : translateParts(doc, sel, x - c[0], y - c[1]) }));
  }

  rotateSelection(deg: number, pivot: Vec | null = this.selectionCentre()): void {
    if (!pivot || deg === 0) return;
    this.run(`Rotate ${deg}°`, (doc, sel) => ({ doc: rotateParts(doc, sel, deg, pivot) }));
  }

  mirrorSelection(axis: 'left-right' | 'top-bottom'): void {
    const c = this.selectionCentre();
    if (!c) return;
    this.run('Mirror', (doc, sel) => ({ doc: mirrorParts(doc, sel, axis, axis === 'left-right' ? c[0] : c[1]) }));
  }

  duplicateSelection(dx = 0, dy = 0): void {
    this.run('Duplicate', (doc, sel) => {
      const r = duplicateParts(doc, sel, dx, dy);
      return { doc: r.doc, selection: r.ids };
    });
  }

  deleteSelection(): void {
    this.run('Delete', (doc, sel) => ({ doc: deleteParts(doc, sel), selection: [] }));
  }

  alignSelection(edge: AlignEdge): void {
    this.run('Align', (doc, sel) => ({ doc: alignParts(doc, sel, edge, this.outlines(doc)) }));
  }

  /** `count` copies of the selection at a pitch (dx, dy); the copies become the selection. */
  arraySelection(count: number, dx: number, dy: number): void {
    this.run(count === 1 ? 'Array: 1 copy' : `Array: ${count} copies`, (doc, sel) => {
      if (sel.length === 0) return { doc };
      const r = arrayParts(doc, sel, count, dx, dy);
      return { doc: r.doc, selection: r.ids };
    });
  }

  distributeSelection(axis: 'x' | 'y', mode: DistributeMode): void {
    this.run(mode === 'touch' ? 'Place side by side' : 'Distribute', (doc, sel) => ({ doc: distributeParts(doc, sel, axis, mode, this.outlines(doc)) }));
  }

  reorder(id: string, direction: -1 | 1): void {
    this.run('Reorder', (doc) => ({ doc: reorderPart(doc, id, direction) }));
  }

  /**
   * Live editing of one part (a dimension being typed): each call shows the change at once,
   * outside history; commitLive records everything since the first call as one step.
   */
  livePart(id: string, fn: (p: Part) => Part): void {
    this.liveSnapshot ??= this.doc;
    this.setDoc({ ...this.doc, parts: this.doc.parts.map((p) => (p.id === id ? fn(p) : p)) });
    this.emit();
  }

  /**
   * Live editing of the active section's view as a whole (a member or stress input being typed):
   * shown at once, outside history; commitLive records everything since the first call as one step.
   */
  liveDocument(fn: (doc: SectionDocument) => SectionDocument): void {
    this.liveSnapshot ??= this.doc;
    this.setDoc(fn(this.doc));
    this.emit();
  }

  commitLive(label: string): void {
    const before = this.liveSnapshot;
    this.liveSnapshot = null;
    if (before && before !== this.doc) this.commitStep(label, before, this.doc);
    this.emit();
  }

  /** Put back the document from before the live edit (Escape in a field). */
  cancelLive(): void {
    if (this.liveSnapshot) this.setDoc(this.liveSnapshot);
    this.liveSnapshot = null;
    this.emit();
  }

  /** A change to the active section's view as one step (its parts, or the shared materials). */
  replaceDocument(label: string, fn: (doc: SectionDocument) => SectionDocument): void {
    this.run(label, (doc) => ({ doc: fn(doc) }));
  }

  // ---- sections (alternatives) --------------------------------------------------------------

  /**
   * A change to the whole file as one step: `fn` returns the new file and the section to edit
   * next, or null for no change. Selection is kept only if the same section stays active.
   */
  replaceFile(label: string, fn: (file: SectionFile, active: string) => { file: SectionFile; active: string } | null): void {
    this.settle();
    const base = this.committed;
    const out = fn(base.file, base.active);
    if (out === null || (out.file === base.file && out.active === base.active)) {
      this.emit();
      return;
    }
    const sameView = out.active === base.active && out.file.unit === base.file.unit && out.file.materials === base.file.materials && out.file.defaultMaterial === base.file.defaultMaterial && out.file.referenceModulus === base.file.referenceModulus && sectionById(out.file, out.active) === sectionById(base.file, base.active);
    const to: Snapshot = sameView ? { file: out.file, active: out.active, view: base.view } : snapshotOf(out.file, out.active);
    const selection = out.active === base.active ? this.selection.filter((id) => to.view.parts.some((p) => p.id === id)) : [];
    this.pushSnapshots(label, base, to, selection);
    if (out.active !== base.active) this.tool = TOOL_ENTRY[this.toolId](this.context());
    this.emit();
  }

  /** Edit another section. Not an undo step: the file does not change. */
  switchSection(id: string): void {
    sectionById(this.committed.file, id);
    if (id === this.committed.active) return;
    this.settle();
    this.restoreSnapshot(snapshotOf(this.committed.file, id));
    this.selection = [];
    this.tool = TOOL_ENTRY[this.toolId](this.context());
    this.emit();
  }

  /**
   * A new section right after the active one, made active: empty, or a copy of the active
   * section's parts (`duplicate`). Named `name`, or "Alternative N" / "NAME (copy)", made unique.
   */
  addSection(options: { duplicate?: boolean; name?: string } = {}): SectionCommandResult {
    if (options.name !== undefined) {
      const problem = sectionNameProblem(this.committed.file, options.name);
      if (problem) return { ok: false, message: problem };
    }
    let id = '';
    this.replaceFile(options.duplicate ? 'Duplicate section' : 'Add section', (file, active) => {
      const current = sectionById(file, active);
      id = uniqueSectionId(file);
      const name = options.name?.trim() ?? uniqueSectionName(file, options.duplicate ? `${current.name} (copy)` : `Alternative ${file.sections.length + 1}`);
      const at = file.sections.indexOf(current) + 1;
      // A new alternative is for the same member: it starts with the active one's member case and forces.
      const added = { id, name, parts: options.duplicate ? current.parts : [], ...(current.member !== undefined ? { member: current.member } : {}), ...(current.stress !== undefined ? { stress: current.stress } : {}) };
      return { file: { ...file, sections: [...file.sections.slice(0, at), added, ...file.sections.slice(at)] }, active: id };
    });
    return { ok: true, id };
  }

  /** Renames a section (trimmed); refused, with the reason, when blank or taken. */
  renameSection(id: string, name: string): SectionCommandResult {
    const s = sectionById(this.committed.file, id);
    const problem = sectionNameProblem(this.committed.file, name, id);
    if (problem) return { ok: false, message: problem };
    const next = name.trim();
    if (next !== s.name) {
      this.replaceFile(`Rename section to ${next}`, (file, active) => ({ file: { ...file, sections: file.sections.map((x) => (x.id === id ? { ...x, name: next } : x)) }, active }));
    }
    return { ok: true, id };
  }

  /** Deletes a section (undoable); the last one cannot go. The neighbour becomes active if it was. */
  deleteSection(id: string): SectionCommandResult {
    const file = this.committed.file;
    const s = sectionById(file, id);
    if (file.sections.length === 1) return { ok: false, message: `"${s.name}" is the only section; a document keeps at least one` };
    this.replaceFile(`Delete section ${s.name}`, (f, active) => {
      const at = f.sections.findIndex((x) => x.id === id);
      const rest = f.sections.filter((x) => x.id !== id);
      return { file: { ...f, sections: rest }, active: active === id ? (rest[Math.min(at, rest.length - 1)] as { id: string }).id : active };
    });
    return { ok: true, id: this.committed.active };
  }

  /** Moves a section one place earlier (-1) or later (+1) in the file; the first is the default one. */
  moveSection(id: string, direction: -1 | 1): void {
    sectionById(this.committed.file, id);
    this.replaceFile('Reorder sections', (f, active) => {
      const i = f.sections.findIndex((x) => x.id === id);
      const j = i + direction;
      if (j < 0 || j >= f.sections.length) return null;
      const order = [...f.sections];
      [order[i], order[j]] = [order[j] as SectionFile['sections'][number], order[i] as SectionFile['sections'][number]];
      return { file: { ...f, sections: order }, active };
    });
  }

  /**
   * The same change applied to every section as one step (e.g. converting the document unit,
   * which is shared): `fn` maps each section's view; unit and materials must come back alike.
   */
  replaceAllSections(label: string, fn: (doc: SectionDocument) => SectionDocument): void {
    this.replaceFile(label, (file, active) => ({ file: mapSectionViews(file, fn), active }));
  }
}
