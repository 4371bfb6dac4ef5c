import { describe, expect, it } from 'vitest';
import type { RectanglePart, PolygonPart } from '../../core/document/types.ts';
import { partOutline, toLocal, toWorld, type Vec } from '../../renderer/editor/geometry.ts';
import { normaliseDegrees, scaleDocumentLengths } from '../../renderer/editor/transforms.ts';
import { editorWith, emptyDoc } from './helpers.ts';

function corners(p: RectanglePart | PolygonPart): Vec[] {
  return partOutline(p).rings[0]?.points.map(([x, y]) => [Number(x.toFixed(9)) + 0, Number(y.toFixed(9)) + 0] as Vec) ?? [];
}

describe('transforms', () => {
  it('move by a typed offset adds exactly (12.5, −4) to the placement', () => {
    const ed = editorWith();
    ed.addRectangle({ x: 1, y: 2, width: 4, height: 6 });
    ed.moveSelectionBy(12.5, -4);
    const r = ed.getState().doc.parts[0] as RectanglePart;
    expect([r.placement.x, r.placement.y]).toEqual([13.5, -2]);
  });

  it('move to a point puts the bounding-box centre of the selection there', () => {
    const ed = editorWith();
    ed.addRectangle({ x: 0, y: 0, width: 10, height: 10 });
    ed.addRectangle({ x: 20, y: 0, width: 10, height: 10 });
    ed.select(['part-1', 'part-2']);
    ed.moveSelectionTo(0, 50);
    const [a, b] = ed.getState().doc.parts as [RectanglePart, RectanglePart];
    expect([a.placement.x, a.placement.y, b.placement.x, b.placement.y]).toEqual([-10, 50, 10, 50]);
  });

  it('four 90° turns about the selection centre return every corner exactly', () => {
    const ed = editorWith();
    ed.addRectangle({ x: 3, y: 7, width: 40, height: 10 });
    const start = corners(ed.getState().doc.parts[0] as RectanglePart);
    for (let k = 0; k < 4; k++) ed.rotateSelection(90);
    const r = ed.getState().doc.parts[0] as RectanglePart;
    expect(r.placement).toEqual({ x: 3, y: 7, rotationDeg: 0, mirror: false });
    expect(corners(r)).toEqual(start);
  });

  it('a 90° turn of a 40 × 10 plate makes it span 10 wide and 40 high', () => {
    const ed = editorWith();
    ed.addRectangle({ x: 0, y: 0, width: 40, height: 10 });
    ed.rotateSelection(90);
    const pts = corners(ed.getState().doc.parts[0] as RectanglePart);
    const xs = pts.map((p) => p[0]);
    const ys = pts.map((p) => p[1]);
    expect([Math.max(...xs) - Math.min(...xs), Math.max(...ys) - Math.min(...ys)]).toEqual([10, 40]);
  });

  it('mirroring left–right maps every world vertex (x, y) to (2c − x, y) about the centre c', () => {
    const ed = editorWith();
    // A right triangle (0,0), (30,0), (0,10): bounding-box centre x = 15.
    ed.addPolygon([[0, 0], [30, 0], [0, 10]]);
    ed.rotateSelection(30);
    const before = corners(ed.getState().doc.parts[0] as PolygonPart);
    const c = ed.selectionCentre() as Vec;
    ed.mirrorSelection('left-right');
    const after = corners(ed.getState().doc.parts[0] as PolygonPart);
    before.forEach((p, i) => {
      expect(after[i]?.[0]).toBeCloseTo(2 * c[0] - p[0], 9);
      expect(after[i]?.[1]).toBeCloseTo(p[1], 9);
    });
  });

  it('mirroring top–bottom maps every world vertex (x, y) to (x, 2c − y)', () => {
    const ed = editorWith();
    ed.addPolygon([[0, 0], [30, 0], [0, 10]]);
    ed.rotateSelection(-20);
    const before = corners(ed.getState().doc.parts[0] as PolygonPart);
    const c = ed.selectionCentre() as Vec;
    ed.mirrorSelection('top-bottom');
    const after = corners(ed.getState().doc.parts[0] as PolygonPart);
    before.forEach((p, i) => {
      expect(after[i]?.[0]).toBeCloseTo(p[0], 9);
      expect(after[i]?.[1]).toBeCloseTo(2 * c[1] - p[1], 9);
    });
  });

  it('toLocal undoes toWorld for a mirrored, rotated placement', () => {
    const pl = { x: 4, y: -2, rotationDeg: 37, mirror: true };
    const back = toLocal(pl, toWorld(pl, [3, 5]));
    expect(back[0]).toBeCloseTo(3, 12);
    expect(back[1]).toBeCloseTo(5, 12);
  });

  it('duplicate adds a copy with a new id, selected, and the original unchanged', () => {
    const ed = editorWith();
    ed.addRectangle({ x: 0, y: 0, width: 10, height: 10 });
    ed.duplicateSelection(15, 0);
    const [a, b] = ed.getState().doc.parts as [RectanglePart, RectanglePart];
    expect([a.id, a.placement.x, b.id, b.placement.x]).toEqual(['part-1', 0, 'part-2', 15]);
    expect(ed.getState().selection).toEqual(['part-2']);
  });

  it('align left puts every selected bounding box at the leftmost edge', () => {
    const ed = editorWith();
    ed.addRectangle({ x: 0, y: 0, width: 100, height: 10 });
    ed.addRectangle({ x: 30, y: 20, width: 10, height: 10 });
    ed.select(['part-1', 'part-2']);
    ed.alignSelection('left');
    const b = ed.getState().doc.parts[1] as RectanglePart;
    expect(b.placement.x).toBe(-45);
    ed.alignSelection('top');
    const a = ed.getState().doc.parts[0] as RectanglePart;
    expect(a.placement.y).toBe(20);
  });

  it('delete removes only the selection, and one undo restores it', () => {
    const ed = editorWith();
    ed.addRectangle({ x: 0, y: 0, width: 10, height: 10 });
    ed.addRectangle({ x: 20, y: 0, width: 10, height: 10 });
    ed.deleteSelection();
    expect(ed.getState().doc.parts.map((p) => p.id)).toEqual(['part-1']);
    ed.undo();
    expect(ed.getState().doc.parts.map((p) => p.id)).toEqual(['part-1', 'part-2']);
  });

  it('angles normalise into (−180, 180]', () => {
    expect([normaliseDegrees(270), normaliseDegrees(-180), normaliseDegrees(540), normaliseDegrees(-90)]).toEqual([-90, 180, 180, -90]);
  });

  it('scaling lengths ×25.4 (in → mm, exact by definition) scales every length and nothing else', () => {
    const doc = { ...emptyDoc(), parts: [] };
    const ed = editorWith(doc);
    ed.addRectangle({ x: 1, y: 2, width: 3, height: 4 });
    ed.rotateSelection(30);
    const r = scaleDocumentLengths(ed.getState().doc, (v) => v * 25.4).parts[0] as RectanglePart;
    const expected = [25.4, 50.8, 76.2, 101.6];
    [r.placement.x, r.placement.y, r.width, r.height].forEach((v, i) => expect(v).toBeCloseTo(expected[i] as number, 10));
    expect(r.placement.rotationDeg).toBe(30);
  });
});
