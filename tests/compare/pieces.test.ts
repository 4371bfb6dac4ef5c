// Compare says, per alternative, when its material falls into separate pieces or parts overlap
// (issue 12 item 2: every result view and output). Dimensions typed here; the overlap area is
// exact arithmetic (400 × 25 = 10 000 mm²).
import { describe, expect, it } from 'vitest';
import { newDocument } from '../../core/document/index.ts';
import type { Part, SectionDocument } from '../../core/document/types.ts';
import { compareDocuments } from '../../core/compare/index.ts';

const rect = (id: string, width: number, height: number, x: number, y: number): Part => ({
  id, name: id, type: 'rectangle', operation: 'add', material: null, visible: true, placement: { x, y, rotationDeg: 0, mirror: false }, width, height,
});
const doc = (name: string, parts: readonly Part[]): SectionDocument => ({ ...newDocument('mm', name), parts });

describe('compare notes separate pieces and overlaps per alternative', () => {
  it('two plates apart: noted; one plate: not; a duplicate part: the overlap with its area', () => {
    const c = compareDocuments([
      doc('two plates', [rect('left', 10, 100, -20, 0), rect('right', 10, 100, 20, 0)]),
      doc('one plate', [rect('plate', 20, 100, 0, 0)]),
      doc('doubled', [rect('top flange', 400, 25, 0, 0), { ...rect('copy', 400, 25, 0, 0), name: 'top flange copy' }]),
    ]);
    const notes = (name: string) => c.alternatives.find((a) => a.name === name)?.notes.join(' ') ?? '';
    expect(notes('two plates')).toContain('The material falls into 2 separate pieces');
    expect(notes('one plate')).not.toContain('separate pieces');
    expect(notes('doubled')).toContain('Parts "top flange" and "top flange copy" overlap by 10000 mm²');
  });
});
