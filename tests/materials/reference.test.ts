import { describe, expect, it } from 'vitest';
import { newDocument, parseDocument, serialiseDocument } from '../../core/document/index.ts';
import type { SectionDocument } from '../../core/document/types.ts';
import { documentReferenceModulus } from '../../core/materials/reference.ts';
import { builtInMaterial } from '../../core/materials/library.ts';

// 1 psi = 4.4482216152605 N / (0.0254 m)² = 6894.757293168361 Pa (exact definitions of the lbf and the inch).
const PA_PER_PSI = 4.4482216152605 / 0.0254 ** 2;

const withMaterials = (ref?: SectionDocument['referenceModulus']): SectionDocument => ({
  ...newDocument('mm', 'mezzanine flitch beam'),
  materials: [builtInMaterial('astm-a36')!, builtInMaterial('df-l-no2')!],
  defaultMaterial: 'df-l-no2',
  ...(ref !== undefined ? { referenceModulus: ref } : {}),
});

describe('the optional referenceModulus field of a document', () => {
  it('a file written before the field existed (no referenceModulus key) still loads, and E_ref is the first part\'s', () => {
    const text = serialiseDocument(withMaterials());
    expect(text).not.toContain('referenceModulus');
    const r = parseDocument(text, 'old.section.json');
    expect(r.ok).toBe(true);
    if (r.ok) expect(documentReferenceModulus(r.document)).toEqual({ ok: true, eRef: undefined, from: 'first piece' });
  });

  it('a version 1 file (one section, no referenceModulus) loads and E_ref is the first part\'s', () => {
    const v1 = JSON.stringify({ format: 'sectionsmith-section', version: 1, name: 'old flitch beam', unit: 'mm', defaultMaterial: 'df-l-no2', materials: [builtInMaterial('df-l-no2')], parts: [] });
    const r = parseDocument(v1, 'old.section.json');
    expect(r.ok).toBe(true);
    if (r.ok) expect(documentReferenceModulus(r.document)).toEqual({ ok: true, eRef: undefined, from: 'first piece' });
  });

  it('a material choice and a typed value survive save and load unchanged', () => {
    for (const ref of [{ material: 'astm-a36' }, { value: 1.6, unit: 'GPa' as const }]) {
      const r = parseDocument(serialiseDocument(withMaterials(ref)), 'flitch.section.json');
      expect(r.ok).toBe(true);
      if (r.ok) expect(r.document.referenceModulus).toEqual(ref);
    }
  });

  it('E_ref of a chosen material is its E in Pa: 29,000 ksi for A36 (library value, AISC common practice)', () => {
    const c = documentReferenceModulus(withMaterials({ material: 'astm-a36' }));
    expect(c.ok).toBe(true);
    if (c.ok) {
      expect(c.from).toBe('material');
      expect(c.eRef! / (29_000_000 * PA_PER_PSI)).toBeCloseTo(1, 14);
    }
  });

  it('a typed E_ref of 1,600,000 psi is 1.6e6 × 6894.757… Pa (exact unit definitions)', () => {
    const c = documentReferenceModulus(withMaterials({ value: 1_600_000, unit: 'psi' }));
    expect(c.ok && c.eRef! / (1_600_000 * PA_PER_PSI)).toBeCloseTo(1, 14);
  });

  it('a material id that is not in the file is refused with the path and the id named', () => {
    const text = serialiseDocument(withMaterials({ material: 'astm-a36' })).replace('"material": "astm-a36"\n', '"material": "steel-x"\n');
    const r = parseDocument(text, 'flitch.section.json');
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.errors.map((e) => e.message).join('\n')).toMatch(/referenceModulus\.material: .*"steel-x"/);
  });

  it('a typed value that is zero, negative, or in an unknown unit is refused, naming the field', () => {
    for (const bad of ['{ "value": 0, "unit": "MPa" }', '{ "value": -5, "unit": "MPa" }', '{ "value": 200, "unit": "bar" }', '{ "E": 200 }']) {
      const json = JSON.parse(serialiseDocument(withMaterials())) as Record<string, unknown>;
      json.referenceModulus = JSON.parse(bad);
      const r = parseDocument(JSON.stringify(json), 'flitch.section.json');
      expect(r.ok).toBe(false);
      if (!r.ok) expect(r.errors[0]!.message).toContain('referenceModulus');
    }
  });
});
