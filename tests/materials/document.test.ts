import { describe, expect, it } from 'vitest';
import type { SectionDocument } from '../../core/document/types.ts';
import { regionIntegrals } from '../../core/properties/integrals.ts';
import { materialPiecesFromDocument } from '../../core/materials/document.ts';
import { builtInMaterial } from '../../core/materials/library.ts';

const place = (x: number, y: number) => ({ x, y, rotationDeg: 0, mirror: false });
const rectPart = (id: string, material: string | null, x: number, y: number, width: number, height: number, operation: 'add' | 'subtract' = 'add') =>
  ({ id, name: id, type: 'rectangle' as const, operation, material, visible: true, placement: place(x, y), width, height });

function doc(parts: SectionDocument['parts'], defaultMaterial: string | null = null): SectionDocument {
  return {
    format: 'sectionsmith-section', version: 1, name: 'trailer frame rail', unit: 'mm', parts, defaultMaterial,
    materials: [builtInMaterial('astm-a36')!, builtInMaterial('al-6061-t6')!],
  };
}

describe('document parts split into material pieces (later part wins; docs/methods.md §6 overlaps, option (a))', () => {
  it('a later aluminium bar over a steel bar takes the overlap; a subtract hole cuts both; areas add up exactly', () => {
    const d = doc([
      rectPart('steel bar', 'astm-a36', 0, 0, 100, 20), // x −50..50, y −10..10
      rectPart('aluminium bar', 'al-6061-t6', 0, 15, 40, 30), // x −20..20, y 0..30: overlaps the steel by 40 × 10
      rectPart('bolt hole', null, 0, 5, 10, 10, 'subtract'), // x −5..5, y 0..10: inside the aluminium's overlap
    ]);
    const r = materialPiecesFromDocument(d);
    expect(r.issues).toEqual([]);
    expect(r.pieces.map((p) => p.label)).toEqual(['steel bar', 'aluminium bar']);
    const areas = r.pieces.map((p) => regionIntegrals(p.region).A);
    // steel: 100·20 − 40·10 (taken by the aluminium) = 1600; aluminium: 40·30 − 10·10 (the hole) = 1100 (exact arithmetic)
    expect(areas[0]).toBeCloseTo(1600, 9);
    expect(areas[1]).toBeCloseTo(1100, 9);
    expect(r.pieces[0]!.material.E).toBeCloseTo(29_000 * 6.894757293168361e6, 0);
  });

  it('a part without its own material uses the document default', () => {
    const r = materialPiecesFromDocument(doc([rectPart('web', null, 0, 0, 10, 100)], 'al-6061-t6'));
    expect(r.pieces[0]!.material.id).toBe('al-6061-t6');
  });

  it('a part with no material and no document default is named in the issue', () => {
    const r = materialPiecesFromDocument(doc([rectPart('web', null, 0, 0, 10, 100)]));
    expect(r.pieces).toEqual([]);
    expect(r.issues).toEqual(['part "web" has no material and the document has no default material']);
  });

  it('an invalid stored material is reported with its index, id and field', () => {
    const d = { ...doc([rectPart('web', 'bad', 0, 0, 10, 100)]), materials: [{ id: 'bad', name: 'bad', kind: 'steel', stressUnit: 'MPa', E: 0, G: 1, density: 1, fy: 1, strengthBasis: 'yield' }] };
    const r = materialPiecesFromDocument(d);
    expect(r.issues[0]).toBe('materials[0]: material "bad" field E: E must be greater than 0');
  });
});
