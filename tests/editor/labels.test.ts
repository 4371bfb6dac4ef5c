/** The canvas label rule (renderer/app/canvas/labels.ts): no two placed boxes overlap, reserved boxes stay clear. Exact arithmetic on pixel boxes. */
import { describe, expect, it } from 'vitest';
import { overlaps, placeLabels, scaleBar, type LabelRequest } from '../../renderer/app/canvas/labels.ts';

const req = (id: string, x: number, y: number, priority = 0): LabelRequest => ({ id, text: id, anchor: [x, y], offsets: [[8, -6]], width: 80, height: 14, priority });

describe('placeLabels', () => {
  it('keeps a label where it prefers when nothing is in the way', () => {
    const { placed } = placeLabels([req('centroid', 100, 100)], [], 800, 600);
    expect(placed).toEqual([{ id: 'centroid', text: 'centroid', x: 108, y: 94, width: 80, height: 14 }]);
  });

  it('moves the second of two labels at the same anchor so they do not overlap', () => {
    const { placed } = placeLabels([req('centroid', 100, 100, 0), req('shear centre', 100, 100, 1)], [], 800, 600);
    expect(placed).toHaveLength(2);
    expect(overlaps(placed[0]!, placed[1]!)).toBe(false);
    expect(placed[0]!.id).toBe('centroid'); // the higher priority keeps its place
  });

  it('never places a label over a reserved box (the stress legend)', () => {
    const legend = { x: 90, y: 80, width: 200, height: 50 };
    const { placed } = placeLabels([req('axis 1', 100, 100)], [legend], 800, 600);
    expect(overlaps(placed[0]!, legend)).toBe(false);
  });

  it('twenty labels on one point: none overlaps another', () => {
    const { placed, leftOut } = placeLabels(Array.from({ length: 20 }, (_, i) => req(`l${i}`, 400, 300, i)), [], 800, 600);
    expect(placed.length + leftOut.length).toBe(20);
    for (let i = 0; i < placed.length; i++) for (let j = i + 1; j < placed.length; j++) expect(overlaps(placed[i]!, placed[j]!)).toBe(false);
  });
});

describe('scaleBar', () => {
  it('picks the round length whose bar is nearest 120 px (exact arithmetic)', () => {
    // 0.5 px per mm: 120 px is 240 mm; of 100, 200, 500 and 1000 mm, 200 is nearest → 100 px
    expect(scaleBar(0.5, 800, 600)).toMatchObject({ pixels: 100, text: '200' });
    // 6.6 px per unit: 120 px is 18.18; of 10, 20, 50, 100, 20 is nearest → 132 px
    expect(scaleBar(6.6, 800, 600)).toMatchObject({ pixels: 132, text: '20' });
  });

  it('sits in the bottom-right corner of the canvas', () => {
    const { box } = scaleBar(0.5, 800, 600);
    expect(box.x + box.width).toBe(790);
    expect(box.y + box.height).toBe(592);
  });
});
