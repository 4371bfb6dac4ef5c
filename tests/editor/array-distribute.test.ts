/**
 * Array, distribute, equal gaps and "touch" (plies side by side). Expected placements are exact
 * arithmetic on the typed sizes (a 38 × 286 mm ply repeated at its own thickness, and so on).
 */
import { describe, expect, it } from 'vitest';
import type { RectanglePart } from '../../core/document/types.ts';
import { editorWith } from './helpers.ts';

const xs = (ed: ReturnType<typeof editorWith>): number[] => ed.getState().doc.parts.map((p) => p.placement.x);

describe('array', () => {
  it('two copies at a pitch of one ply thickness build a 3-ply member that touches', () => {
    const ed = editorWith();
    ed.addRectangle({ x: 0, y: 0, width: 38, height: 286 });
    ed.arraySelection(2, 38, 0);
    expect(xs(ed)).toEqual([0, 38, 76]);
    expect(ed.getState().doc.parts.map((p) => p.name)).toEqual(['Plate 1', 'Plate 1 2', 'Plate 1 3']);
    expect(ed.getState().selection).toEqual(['part-2', 'part-3']);
    ed.undo();
    expect(ed.getState().doc.parts).toHaveLength(1); // the whole array is one step
  });

  it('refuses a count that is not a whole number ≥ 1', () => {
    const ed = editorWith();
    ed.addRectangle({ x: 0, y: 0, width: 10, height: 10 });
    expect(() => ed.arraySelection(0, 10, 0)).toThrow(/count/);
    expect(() => ed.arraySelection(2.5, 10, 0)).toThrow(/count/);
  });
});

describe('distribute', () => {
  /** Plates of widths 10, 20, 30 at centres 0, 100, 130 (boxes [−5,5], [90,110], [115,145]). */
  function three(): ReturnType<typeof editorWith> {
    const ed = editorWith();
    ed.addRectangle({ x: 0, y: 0, width: 10, height: 10 });
    ed.addRectangle({ x: 100, y: 0, width: 20, height: 10 });
    ed.addRectangle({ x: 130, y: 0, width: 30, height: 10 });
    ed.select(['part-1', 'part-2', 'part-3']);
    return ed;
  }

  it('touch: each box starts where the one before ends, from the first', () => {
    const ed = three();
    ed.distributeSelection('x', 'touch');
    // [−5,5] stays; the 20 wide starts at 5 → centre 15; the 30 wide starts at 25 → centre 40
    expect(xs(ed)).toEqual([0, 15, 40]);
  });

  it('centres: the outer two stay, the middle centre goes halfway', () => {
    const ed = three();
    ed.distributeSelection('x', 'centres');
    expect(xs(ed)).toEqual([0, 65, 130]);
  });

  it('equal gaps: the outer two stay, the gaps between boxes become equal', () => {
    const ed = three();
    ed.distributeSelection('x', 'gaps');
    // span −5 … 145 = 150, sizes 60, two gaps of 45: the 20 wide starts at 50 → centre 60
    expect(xs(ed)).toEqual([0, 60, 130]);
  });

  it('stacks along y the same way', () => {
    const ed = editorWith();
    ed.addRectangle({ x: 0, y: 0, width: 400, height: 25 });
    ed.addRectangle({ x: 0, y: 300, width: 12, height: 500 });
    ed.select(['part-1', 'part-2']);
    ed.distributeSelection('y', 'touch');
    const web = ed.getState().doc.parts[1] as RectanglePart;
    expect(web.placement.y).toBe(12.5 + 250); // flange top at 12.5, web centre 250 above it
  });
});
