/**
 * The selected part's dimension lines (renderer/app/canvas/dimension-model.ts). Expected sizes
 * are the typed sizes (exact arithmetic) written by the one precision rule; a rectangle rotated
 * by 30° spans b·cos30 + h·sin30 across (trigonometry of its corners).
 */
import { describe, expect, it } from 'vitest';
import type { Part } from '../../core/document/types.ts';
import { documentOutlines } from '../../renderer/editor/geometry.ts';
import { selectionDimensions } from '../../renderer/app/canvas/dimension-model.ts';
import { shapeOutlineResolver } from '../../renderer/controller/results.ts';

const place = (x = 0, y = 0, rotationDeg = 0) => ({ x, y, rotationDeg, mirror: false });
const common = { operation: 'add' as const, material: null, visible: true };
const plate: Part = { ...common, id: 'p', name: 'Plate', type: 'rectangle', width: 381, height: 188.976, placement: place(10, 20) };
const round: Part = { ...common, id: 'c', name: 'Round', type: 'circle', diameter: 50.8, placement: place(300, 0) };
const beam: Part = { ...common, id: 'w', name: 'Beam', type: 'shape', shape: 'i-shape', params: { d: 350.5, bf: 204.5, tw: 8.6, tf: 15.1, r: 0 }, designation: 'W14X48', placement: place() };

const dims = (parts: Part[], selection: string[]) => selectionDimensions(parts, documentOutlines({ format: 'sectionsmith-section', version: 1, name: 'x', unit: 'mm', parts, materials: [], defaultMaterial: null }, shapeOutlineResolver(() => 'mm')), selection, 'mm');

describe('selection dimension lines', () => {
  it('give a plate its overall width and depth with one precision', () => {
    const d = dims([plate], ['p']);
    expect(d.lines.map((l) => [l.id, l.text])).toEqual([['part-width', '381.0'], ['part-depth', '189.0']]);
    // The width line runs along the top edge (y = 20 + 188.976/2), from x = 10 − 190.5 to 10 + 190.5.
    const w = d.lines[0];
    expect(w?.a[0]).toBeCloseTo(10 - 190.5, 9);
    expect(w?.b[0]).toBeCloseTo(10 + 190.5, 9);
    expect(w?.a[1]).toBeCloseTo(20 + 94.488, 9);
  });

  it('nothing selected: no dimension lines', () => {
    expect(dims([plate], []).lines).toHaveLength(0);
  });

  it('a rotated plate also gets its own width and height along its edges', () => {
    const turned = { ...plate, width: 200, height: 100, placement: place(0, 0, 30) } as Part;
    const d = dims([turned], ['p']);
    const byId = new Map(d.lines.map((l) => [l.id, l.text]));
    expect(byId.get('part-b')).toBe('200.0');
    expect(byId.get('part-h')).toBe('100.0');
    // 200·cos30 + 100·sin30 = 173.205… + 50
    expect(byId.get('part-width')).toBe((200 * Math.cos(Math.PI / 6) + 50).toFixed(1));
  });

  it('a round gets its diameter, a standard part its main dimensions by trade symbol', () => {
    expect(dims([round], ['c']).callout?.text).toBe('⌀ 50.8');
    const text = dims([beam], ['w']).callout?.text ?? '';
    expect(text).toBe('W14X48: d 350.5 · bf 204.5 · tw 8.6 · tf 15.1');
  });

  it('two parts selected: the overall size of both, no callout', () => {
    const d = dims([plate, round], ['p', 'c']);
    expect(d.callout).toBeNull();
    // from x = 10 − 190.5 = −180.5 to 300 + 25.4 = 325.4: 505.9
    expect(d.lines[0]?.text).toBe('505.9');
  });
});
