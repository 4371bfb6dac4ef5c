/**
 * Tools are small state machines (STYLE.md §9): each state is a plain object with handlers
 * that return the next state. States never touch the UI; they talk to the editor through
 * ToolContext. A drag keeps the document it started from and recomputes from the total
 * pointer movement, so snapping never accumulates error and Escape restores it exactly.
 */
import type { SectionDocument } from '../../../core/document/types.ts';
import type { PartOutline, Vec } from '../geometry.ts';
import type { Guide, SnapResult } from '../snapping.ts';

export interface SnapOptions {
  readonly exclude?: ReadonlySet<string>;
  readonly from?: SectionDocument;
  readonly skip?: readonly Vec[];
}

export type ToolId = 'select' | 'polygon' | 'rectangle' | 'circle' | 'vertex';

export interface PointerInput {
  /** Section coordinates (y up), document unit. */
  readonly p: Vec;
  /** Alt held: snapping suspended. */
  readonly alt: boolean;
  /** Shift held: add to the selection. */
  readonly shift: boolean;
}

export interface VertexRef {
  readonly partId: string;
  /** -1 = outer ring, 0.. = hole index. */
  readonly ring: number;
  readonly index: number;
}

/** Transient drawing for the interaction overlay. */
export type Draft =
  | { readonly kind: 'polygon'; readonly points: readonly Vec[]; readonly cursor: Vec | null; readonly closing: boolean }
  | { readonly kind: 'rectangle'; readonly a: Vec; readonly b: Vec }
  | { readonly kind: 'circle'; readonly centre: Vec; readonly radius: number };

/**
 * Every tool state by id, with the arguments it starts from. A state moves to another through
 * `ctx.enter(id, ...args)`, which looks the state up in the tool table (tools/table.ts), so the
 * state files never import each other.
 */
export interface ToolStates {
  'select.idle': [];
  'select.moving': [start: Vec];
  'shape.idle': [kind: 'rectangle' | 'circle'];
  'shape.dragging': [kind: 'rectangle' | 'circle', start: Vec, current: Vec, guides: readonly Guide[]];
  'polygon.placing': [points: readonly Vec[], cursor: Vec | null, guides: readonly Guide[]];
  'vertex.idle': [chosen: VertexRef | null];
  'vertex.dragging': [snapshot: SectionDocument, working: SectionDocument, ref: VertexRef, startAt: Vec, pressAt: Vec, label: string];
}
export type ToolStateId = keyof ToolStates;

export interface ToolContext {
  readonly doc: SectionDocument;
  readonly selection: readonly string[];
  /** How close a pointer must be to pick something, section units. */
  readonly pickRadius: number;
  outlines(): readonly PartOutline[];
  /** Topmost visible part under p, or null. */
  hitPart(p: Vec): string | null;
  /**
   * Snap p against the targets of `opts.from` (default: the current document), leaving out the
   * parts in `exclude` and any target at one of the `skip` points (the thing being dragged).
   */
  snap(p: Vec, alt: boolean, opts?: SnapOptions): SnapResult;
  select(ids: readonly string[]): void;
  /** Show a changed document live, outside history (during a gesture). */
  preview(doc: SectionDocument): void;
  /** Record one undo step from `before` to the current document. */
  commit(label: string, before: SectionDocument, after: SectionDocument, selectionAfter?: readonly string[]): void;
  /** Put back a document exactly, outside history (Escape). */
  restore(doc: SectionDocument, selection: readonly string[]): void;
  newPartId(doc: SectionDocument): string;
  /** The tool state `id`, made from the tool table with `args` (how one state moves to another). */
  enter<K extends ToolStateId>(id: K, ...args: ToolStates[K]): ToolState;
}

export interface ToolState {
  /** e.g. 'select.idle', 'select.moving'. */
  readonly name: string;
  readonly guides?: readonly Guide[];
  readonly draft?: Draft;
  readonly chosenVertex?: VertexRef | null;
  down?(ctx: ToolContext, e: PointerInput): ToolState;
  move?(ctx: ToolContext, e: PointerInput): ToolState;
  up?(ctx: ToolContext, e: PointerInput): ToolState;
  /** Keys by KeyboardEvent.key ('Escape', 'Enter', 'Delete', 'Backspace'). */
  key?(ctx: ToolContext, key: string): ToolState;
  /** A typed exact point (polygon vertices). */
  typedPoint?(ctx: ToolContext, p: Vec): ToolState;
}

export const DEFAULT_PLACEMENT = { x: 0, y: 0, rotationDeg: 0, mirror: false } as const;
