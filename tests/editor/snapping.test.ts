import { describe, expect, it } from 'vitest';
import type { RectanglePart } from '../../core/document/types.ts';
import { roundToGrid, snapPoint, type SnapSettings } from '../../renderer/editor/snapping.ts';
import { at, drag, editorWith } from './helpers.ts';

const settings: SnapSettings = { grid: 10, gridOn: true, objectsOn: true, radius: 1 };

describe('snapping', () => {
  it('rounds to exact grid multiples (0.1 spacing gives 0.3, not 0.30000000000000004)', () => {
    expect(roundToGrid(0.29, 0.1)).toBe(0.3);
    expect(roundToGrid(14.9, 10)).toBe(10);
    expect(roundToGrid(-15.1, 10)).toBe(-20);
  });

  it('a point within the radius of a vertex lands on it with a point guide', () => {
    const r = snapPoint([10.4, 9.7], [{ kind: 'vertex', at: [10, 10] }], settings, false);
    expect(r.point).toEqual([10, 10]);
    expect(r.guides).toEqual([{ kind: 'point', at: [10, 10], target: 'vertex' }]);
  });

  it('a vertex wins over a midpoint at the same distance', () => {
    const r = snapPoint([0, 0], [{ kind: 'midpoint', at: [0.5, 0] }, { kind: 'vertex', at: [-0.5, 0] }], settings, false);
    expect(r.point).toEqual([-0.5, 0]);
  });

  it('lines up one axis with a far target and rounds the other to the grid', () => {
    const r = snapPoint([33.3, 57.2], [{ kind: 'vertex', at: [33, 1000] }], settings, false);
    expect(r.point).toEqual([33, 60]);
    expect(r.guides).toEqual([{ kind: 'vertical', x: 33, from: [33, 1000] }]);
  });

  it('the section centroid is a target', () => {
    const r = snapPoint([2.2, 3.1], [{ kind: 'centroid', at: [2, 3] }], settings, false);
    expect(r.point).toEqual([2, 3]);
  });

  it('suspended (Alt held) returns the raw point and no guides', () => {
    const r = snapPoint([10.4, 9.7], [{ kind: 'vertex', at: [10, 10] }], settings, true);
    expect(r).toEqual({ point: [10.4, 9.7], guides: [] });
  });

  it('a moved plate corner snaps onto another plate corner, from the total movement (no drift)', () => {
    const ed = editorWith(undefined, true);
    ed.addRectangle({ x: 0, y: 0, width: 10, height: 10 });
    ed.addRectangle({ x: 100, y: 3, width: 10, height: 10 });
    ed.setTool('select');
    // Grab plate 2 near its (95,-2) corner and carry it towards (5,5), the top-right corner of plate 1.
    ed.pointerDown(at(95.2, -1.8));
    for (let k = 1; k <= 20; k++) ed.pointerMove(at(95.2 + (k / 20) * (5.3 - 95.2), -1.8 + (k / 20) * (5.1 + 1.8)));
    ed.pointerUp(at(5.3, 5.1));
    const p2 = ed.getState().doc.parts[1] as RectanglePart;
    // Corner (95,-2) now at (5,5): the move is (−90, +7), so the centre (100,3) goes to (10,10).
    expect([p2.placement.x, p2.placement.y]).toEqual([10, 10]);
  });

  it('holding Alt places a drawn plate corner off the grid', () => {
    const ed = editorWith(undefined, true);
    ed.setTool('rectangle');
    ed.pointerDown(at(0, 0));
    ed.pointerMove(at(13.7, 21.1, true));
    ed.pointerUp(at(13.7, 21.1, true));
    const r = ed.getState().doc.parts[0] as RectanglePart;
    expect([r.width, r.height]).toEqual([13.7, 21.1]);
  });

  it('without Alt the same drawn corner lands on the 10 mm grid', () => {
    const ed = editorWith(undefined, true);
    ed.setTool('rectangle');
    drag(ed, [0, 0], [13.7, 21.1]);
    const r = ed.getState().doc.parts[0] as RectanglePart;
    expect([r.width, r.height]).toEqual([10, 20]);
  });
});
