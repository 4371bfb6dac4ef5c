import { describe, expect, it } from 'vitest';
import { editorWith } from './helpers.ts';

describe('undo history', () => {
  it('undo then redo walks back and forward through the same document objects', () => {
    const ed = editorWith();
    const d0 = ed.getState().doc;
    ed.addRectangle({ x: 0, y: 0, width: 10, height: 10 });
    const d1 = ed.getState().doc;
    ed.moveSelectionBy(5, 0);
    const d2 = ed.getState().doc;
    ed.undo();
    expect(ed.getState().doc).toBe(d1);
    ed.undo();
    expect(ed.getState().doc).toBe(d0);
    ed.redo();
    ed.redo();
    expect(ed.getState().doc).toBe(d2);
  });

  it('a new step after undo clears the redo list', () => {
    const ed = editorWith();
    ed.addRectangle({ x: 0, y: 0, width: 10, height: 10 });
    ed.undo();
    ed.addCircle({ x: 0, y: 0, diameter: 4 });
    expect(ed.getState().canRedo).toBe(false);
  });

  it('the saved mark makes the document clean; an edit makes it dirty; undoing back to it makes it clean again', () => {
    const ed = editorWith();
    ed.addRectangle({ x: 0, y: 0, width: 10, height: 10 });
    ed.markSaved({ name: 'a.json', handle: null });
    expect(ed.getState().dirty).toBe(false);
    ed.moveSelectionBy(1, 1);
    expect(ed.getState().dirty).toBe(true);
    ed.undo();
    expect(ed.getState().dirty).toBe(false);
  });

  it('after undoing past the saved state and editing, the saved state is unreachable (dirty)', () => {
    const ed = editorWith();
    ed.addRectangle({ x: 0, y: 0, width: 10, height: 10 });
    ed.markSaved({ name: 'a.json', handle: null });
    ed.undo();
    ed.addCircle({ x: 0, y: 0, diameter: 4 });
    ed.undo();
    expect(ed.getState().dirty).toBe(true);
  });

  it('undo restores the selection of before the step', () => {
    const ed = editorWith();
    ed.addRectangle({ x: 0, y: 0, width: 10, height: 10 });
    ed.addRectangle({ x: 20, y: 0, width: 10, height: 10 });
    expect(ed.getState().selection).toEqual(['part-2']);
    ed.undo();
    expect(ed.getState().selection).toEqual(['part-1']);
  });

  it('a drag with no movement leaves no step; previews bump the revision', () => {
    const ed = editorWith();
    ed.addRectangle({ x: 0, y: 0, width: 10, height: 10 });
    ed.setTool('select');
    const rev = ed.getState().revision;
    ed.pointerDown({ p: [1, 1], alt: false, shift: false });
    ed.pointerMove({ p: [3, 1], alt: false, shift: false });
    expect(ed.getState().revision).toBeGreaterThan(rev);
    ed.pointerMove({ p: [1, 1], alt: false, shift: false });
    ed.pointerUp({ p: [1, 1], alt: false, shift: false });
    expect(ed.getState().undoLabel).toBe('Add plate');
  });
});

describe('live dimension edits', () => {
  it('many live changes to one part become one undo step back to the value before the first', () => {
    const ed = editorWith();
    ed.addRectangle({ x: 0, y: 0, width: 10, height: 10 });
    for (const w of [1, 12, 123]) ed.livePart('part-1', (p) => (p.type === 'rectangle' ? { ...p, width: w } : p));
    ed.commitLive('Change b');
    expect(ed.getState().undoLabel).toBe('Change b');
    ed.undo();
    const p = ed.getState().doc.parts[0];
    expect(p?.type === 'rectangle' ? p.width : null).toBe(10);
  });

  it('cancelLive restores the document from before the live edit exactly', () => {
    const ed = editorWith();
    ed.addRectangle({ x: 0, y: 0, width: 10, height: 10 });
    const before = ed.getState().doc;
    ed.livePart('part-1', (p) => (p.type === 'rectangle' ? { ...p, width: 99 } : p));
    ed.cancelLive();
    expect(ed.getState().doc).toBe(before);
    expect(ed.getState().undoLabel).toBe('Add plate');
  });
});
