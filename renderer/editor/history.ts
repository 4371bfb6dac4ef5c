/**
 * Undo history as reversible steps. Documents are immutable, so a step holds the whole file
 * before and after one gesture or command (shared structure keeps this cheap), which section
 * was being edited on each side with its one-section view (kept, so an undo gives back the very
 * object results were cached on), plus the ids selected on each side. Derived results are never stored here (STYLE.md §10).
 * A mark records the step count at a moment (e.g. the last save) to tell whether work is unsaved.
 */
import type { SectionDocument, SectionFile } from '../../core/document/types.ts';

/** The whole file, the section being edited, and that section's view (sectionView of the two). */
export interface Snapshot {
  readonly file: SectionFile;
  readonly active: string;
  readonly view: SectionDocument;
}

export interface Step {
  readonly label: string;
  readonly before: Snapshot;
  readonly after: Snapshot;
  readonly selectionBefore: readonly string[];
  readonly selectionAfter: readonly string[];
}

export interface History {
  readonly done: readonly Step[];
  readonly undone: readonly Step[];
  /** Length of `done` when the document was last saved or opened; null if that state is gone. */
  readonly savedAt: number | null;
}

export const MAX_STEPS = 500;

export function emptyHistory(): History {
  return { done: [], undone: [], savedAt: 0 };
}

export function pushStep(h: History, step: Step): History {
  const done = [...h.done, step];
  const dropped = Math.max(0, done.length - MAX_STEPS);
  // A new step after undoing past the saved state makes that state unreachable.
  const savedAt = h.savedAt === null || h.savedAt > h.done.length ? null : h.savedAt - dropped;
  return { done: done.slice(dropped), undone: [], savedAt: savedAt !== null && savedAt < 0 ? null : savedAt };
}

export function undoStep(h: History): { history: History; step: Step } | null {
  const step = h.done[h.done.length - 1];
  if (!step) return null;
  return { history: { ...h, done: h.done.slice(0, -1), undone: [...h.undone, step] }, step };
}

export function redoStep(h: History): { history: History; step: Step } | null {
  const step = h.undone[h.undone.length - 1];
  if (!step) return null;
  return { history: { ...h, done: [...h.done, step], undone: h.undone.slice(0, -1) }, step };
}

export function markSaved(h: History): History {
  return { ...h, savedAt: h.done.length };
}

export function isDirty(h: History): boolean {
  return h.savedAt !== h.done.length;
}
