import { describe, expect, it } from 'vitest';
import type { PolygonPart, RectanglePart, CirclePart } from '../../core/document/types.ts';
import { at, drag, editorWith } from './helpers.ts';

describe('rectangle and circle tools', () => {
  it('a drag from (0,0) to (100,200) adds one 100 × 200 plate centred at (50,100) as one undo step', () => {
    const ed = editorWith();
    ed.setTool('rectangle');
    drag(ed, [0, 0], [30, 40], [100, 200]);
    const parts = ed.getState().doc.parts;
    expect(parts).toHaveLength(1);
    const r = parts[0] as RectanglePart;
    expect([r.type, r.width, r.height, r.placement.x, r.placement.y]).toEqual(['rectangle', 100, 200, 50, 100]);
    ed.undo();
    expect(ed.getState().doc.parts).toHaveLength(0);
  });

  it('a drag with the rectangle tool shows a draft and adds nothing until release', () => {
    const ed = editorWith();
    ed.setTool('rectangle');
    ed.pointerDown(at(0, 0));
    ed.pointerMove(at(10, 10));
    expect(ed.getState().tool.draft).toEqual({ kind: 'rectangle', a: [0, 0], b: [10, 10] });
    expect(ed.getState().doc.parts).toHaveLength(0);
  });

  it('Escape during a rectangle drag adds no part and no undo step', () => {
    const ed = editorWith();
    ed.setTool('rectangle');
    ed.pointerDown(at(0, 0));
    ed.pointerMove(at(10, 10));
    ed.key('Escape');
    ed.pointerUp(at(10, 10));
    expect(ed.getState().doc.parts).toHaveLength(0);
    expect(ed.getState().canUndo).toBe(false);
  });

  it('a circle drag from the centre (5,5) to (8,9) gives diameter 10 (3-4-5 triangle)', () => {
    const ed = editorWith();
    ed.setTool('circle');
    drag(ed, [5, 5], [8, 9]);
    const c = ed.getState().doc.parts[0] as CirclePart;
    expect([c.type, c.diameter, c.placement.x, c.placement.y]).toEqual(['circle', 10, 5, 5]);
  });

  it('typed dimensions add an exact plate and a subtracted hole', () => {
    const ed = editorWith();
    ed.addRectangle({ x: 0, y: 0, width: 100, height: 200 });
    ed.addCircle({ x: 0, y: 50, diameter: 20, operation: 'subtract' });
    const [r, c] = ed.getState().doc.parts as [RectanglePart, CirclePart];
    expect([r.width, r.height, r.operation]).toEqual([100, 200, 'add']);
    expect([c.diameter, c.placement.y, c.operation]).toEqual([20, 50, 'subtract']);
  });
});

describe('polygon tool', () => {
  it('clicks then a click on the first vertex close a counter-clockwise outline as one step', () => {
    const ed = editorWith();
    ed.setTool('polygon');
    // Clicked clockwise: (0,0) → (0,10) → (20,10) → (20,0); stored counter-clockwise.
    for (const [x, y] of [[0, 0], [0, 10], [20, 10], [20, 0]] as const) {
      ed.pointerDown(at(x, y));
      ed.pointerUp(at(x, y));
    }
    expect(ed.getState().doc.parts).toHaveLength(0);
    ed.pointerDown(at(0.3, 0.2));
    const p = ed.getState().doc.parts[0] as PolygonPart;
    expect(p.type).toBe('polygon');
    expect([p.placement.x, p.placement.y]).toEqual([10, 5]);
    const world = p.outer.map(([x, y]) => [x + 10, y + 5]);
    let twiceArea = 0;
    world.forEach((q, i) => {
      const n = world[(i + 1) % world.length] as number[];
      twiceArea += (q[0] as number) * (n[1] as number) - (n[0] as number) * (q[1] as number);
    });
    // Shoelace: 20 × 10 rectangle, counter-clockwise → +200 (exact arithmetic).
    expect(twiceArea / 2).toBe(200);
    ed.undo();
    expect(ed.getState().doc.parts).toHaveLength(0);
  });

  it('typed points and Enter close an outline; fewer than three points close nothing', () => {
    const ed = editorWith();
    ed.typedPoint([0, 0]);
    ed.typedPoint([30, 0]);
    ed.key('Enter');
    expect(ed.getState().doc.parts).toHaveLength(0);
    ed.typedPoint([0, 40]);
    ed.key('Enter');
    const p = ed.getState().doc.parts[0] as PolygonPart;
    expect(p.outer.map(([x, y]) => [x + p.placement.x, y + p.placement.y])).toEqual([[0, 0], [30, 0], [0, 40]]);
  });

  it('Backspace drops the last typed point and Escape drops the outline being drawn', () => {
    const ed = editorWith();
    ed.typedPoint([0, 0]);
    ed.typedPoint([5, 5]);
    ed.key('Backspace');
    const draft = ed.getState().tool.draft;
    expect(draft?.kind === 'polygon' ? draft.points : null).toEqual([[0, 0]]);
    ed.key('Escape');
    const after = ed.getState().tool.draft;
    expect(after?.kind === 'polygon' ? after.points : null).toEqual([]);
    expect(ed.getState().canUndo).toBe(false);
  });
});

describe('select tool', () => {
  it('dragging a part by (+7, −3) moves its placement by exactly that and is one undo step', () => {
    const ed = editorWith();
    ed.addRectangle({ x: 0, y: 0, width: 10, height: 10 });
    ed.setTool('select');
    drag(ed, [1, 1], [2, 2], [5, 0], [8, -2]);
    const r = ed.getState().doc.parts[0] as RectanglePart;
    expect([r.placement.x, r.placement.y]).toEqual([7, -3]);
    ed.undo();
    const back = ed.getState().doc.parts[0] as RectanglePart;
    expect([back.placement.x, back.placement.y]).toEqual([0, 0]);
    ed.redo();
    const again = ed.getState().doc.parts[0] as RectanglePart;
    expect([again.placement.x, again.placement.y]).toEqual([7, -3]);
  });

  it('Escape during a move restores the exact document object from before the press', () => {
    const ed = editorWith();
    ed.addRectangle({ x: 0, y: 0, width: 10, height: 10 });
    const before = ed.getState().doc;
    ed.setTool('select');
    ed.pointerDown(at(1, 1));
    ed.pointerMove(at(4.123, 9.87));
    expect(ed.getState().doc).not.toBe(before);
    ed.key('Escape');
    expect(ed.getState().doc).toBe(before);
    ed.pointerUp(at(4.123, 9.87));
    expect(ed.getState().doc).toBe(before);
    expect(ed.getState().undoLabel).toBe('Add plate');
  });

  it('a click on empty space clears the selection; a click on a part selects it', () => {
    const ed = editorWith();
    ed.addRectangle({ x: 0, y: 0, width: 10, height: 10 });
    ed.setTool('select');
    drag(ed, [50, 50]);
    expect(ed.getState().selection).toEqual([]);
    drag(ed, [2, 2]);
    expect(ed.getState().selection).toEqual(['part-1']);
  });

  it('Delete removes the selected part; undo brings it back', () => {
    const ed = editorWith();
    ed.addRectangle({ x: 0, y: 0, width: 10, height: 10 });
    ed.setTool('select');
    ed.key('Delete');
    expect(ed.getState().doc.parts).toHaveLength(0);
    ed.undo();
    expect(ed.getState().doc.parts).toHaveLength(1);
  });
});

describe('vertex tool', () => {
  it('dragging the (5,5) corner of a 10 × 10 plate to (8,9) turns it into that polygon', () => {
    const ed = editorWith();
    ed.addRectangle({ x: 0, y: 0, width: 10, height: 10 });
    ed.setTool('vertex');
    drag(ed, [5, 5], [6, 6], [8, 9]);
    const p = ed.getState().doc.parts[0] as PolygonPart;
    expect(p.type).toBe('polygon');
    expect(p.outer).toEqual([[-5, -5], [5, -5], [8, 9], [-5, 5]]);
    ed.undo();
    expect(ed.getState().doc.parts[0]?.type).toBe('rectangle');
  });

  it('a press on an edge inserts a vertex there and drags it, all in one undo step', () => {
    const ed = editorWith();
    ed.addRectangle({ x: 0, y: 0, width: 10, height: 10 });
    ed.setTool('vertex');
    drag(ed, [0, -5.2], [0, -8]);
    const p = ed.getState().doc.parts[0] as PolygonPart;
    expect(p.outer).toEqual([[-5, -5], [0, -7.8], [5, -5], [5, 5], [-5, 5]]);
    ed.undo();
    expect(ed.getState().doc.parts[0]?.type).toBe('rectangle');
  });

  it('Delete removes the chosen vertex but never leaves fewer than three', () => {
    const ed = editorWith();
    ed.addPolygon([[0, 0], [10, 0], [10, 10], [0, 10]]);
    ed.setTool('vertex');
    drag(ed, [10, 10]);
    ed.key('Delete');
    expect((ed.getState().doc.parts[0] as PolygonPart).outer).toHaveLength(3);
    drag(ed, [0, 10]);
    ed.key('Delete');
    expect((ed.getState().doc.parts[0] as PolygonPart).outer).toHaveLength(3);
  });

  it('Escape during a vertex drag restores the part exactly, still a rectangle', () => {
    const ed = editorWith();
    ed.addRectangle({ x: 0, y: 0, width: 10, height: 10 });
    const before = ed.getState().doc;
    ed.setTool('vertex');
    ed.pointerDown(at(5, 5));
    ed.pointerMove(at(9, 9));
    ed.key('Escape');
    expect(ed.getState().doc).toBe(before);
  });
});
