import { describe, expect, it } from 'vitest';
import type { Part, SectionDocument } from '../../core/document/types.ts';
import { builtInMaterial } from '../../core/materials/library.ts';
import {
  blankDraft,
  draftFromMaterial,
  draftFromStored,
  draftInDensityUnit,
  draftInStressUnit,
  materialFromDraft,
  materialIdFor,
  planMaterialDelete,
  withDefaultMaterial,
  withMaterial,
  withPartMaterial,
  type MaterialDraft,
} from '../../renderer/app/materials/material-form.ts';

// Exact unit definitions: 1 lbf = 4.4482216152605 N, 1 in = 0.0254 m, 1 lb = 0.45359237 kg, 1 ft = 0.3048 m.
const PA_PER_PSI = 4.4482216152605 / 0.0254 ** 2;
const KG_M3_PER_LB_FT3 = 0.45359237 / 0.3048 ** 3;

const place = { x: 0, y: 0, rotationDeg: 0, mirror: false };
const plate = (id: string, material: string | null, operation: 'add' | 'subtract' = 'add'): Part => ({ id, name: id, type: 'rectangle', operation, material, visible: true, placement: place, width: 10, height: 100 });

function doc(unit: 'mm' | 'in' = 'mm', parts: Part[] = [], extra: Partial<SectionDocument> = {}): SectionDocument {
  return { format: 'sectionsmith-section', version: 1, name: 'mezzanine flitch beam', unit, parts, materials: [], defaultMaterial: null, ...extra } as SectionDocument;
}

/** Structural steel to EN 1993-1-1 §3.2.6 (E = 210 000 N/mm², ν = 0.3) and S355 to EN 10025-2 (fy 355, fu 470 N/mm², t ≤ 40 mm) — from memory. */
function s355Draft(d: SectionDocument): MaterialDraft {
  const b = blankDraft(d);
  return { ...b, name: 'Steel S355', kind: 'steel', text: { ...b.text, E: '210000', nu: '0.3', density: '7850', fy: '355', fu: '470' }, source: 'EN 1993-1-1 §3.2.6; EN 10025-2 (from memory)' };
}

describe('material form: typed text to a stored material', () => {
  it('an SI document starts the form in MPa and kg/m³, an inch document in ksi and lb/ft³', () => {
    expect([blankDraft(doc('mm')).stressUnit, blankDraft(doc('mm')).densityUnit]).toEqual(['MPa', 'kg/m3']);
    expect([blankDraft(doc('in')).stressUnit, blankDraft(doc('in')).densityUnit]).toEqual(['ksi', 'lb/ft3']);
  });

  it('S355 typed in MPa is stored with the typed numbers, a new id from its name, and the source on every value', () => {
    const r = materialFromDraft(s355Draft(doc()), null, null, doc());
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    expect(r.material).toMatchObject({ id: 'steel-s355', name: 'Steel S355', kind: 'steel', stressUnit: 'MPa', E: 210000, nu: 0.3, density: 7850, fy: 355, fu: 470, strengthBasis: 'yield' });
    expect(r.material.sources?.E).toBe('EN 1993-1-1 §3.2.6; EN 10025-2 (from memory)');
    expect(r.material.G).toBeUndefined();
  });

  it('a density typed as 490 lb/ft³ is stored as 490 × 0.45359237 / 0.3048³ kg/m³ (exact definitions)', () => {
    const d = doc('in');
    const b = blankDraft(d);
    const draft: MaterialDraft = { ...b, name: 'Steel 490', text: { ...b.text, E: '29000', G: '11200', density: '490', fy: '50' } };
    const r = materialFromDraft(draft, null, null, d);
    expect(r.ok && r.material.density).toBeCloseTo(490 * KG_M3_PER_LB_FT3, 9);
  });

  it('a modulus typed with its own unit, "210 GPa" in an MPa form, is stored as 210 000 MPa (1 GPa = 1000 MPa)', () => {
    const base = s355Draft(doc());
    const r = materialFromDraft({ ...base, text: { ...base.text, E: '210 GPa' } }, null, null, doc());
    expect(r.ok && r.material.E).toBeCloseTo(210000, 9);
  });

  it('each bad field gets its own message naming the field and what is wrong', () => {
    const base = s355Draft(doc());
    const bad = (text: Partial<MaterialDraft['text']>, extra: Partial<MaterialDraft> = {}) => {
      const r = materialFromDraft({ ...base, ...extra, text: { ...base.text, ...text } }, null, null, doc());
      expect(r.ok).toBe(false);
      return r.ok ? {} : r.errors;
    };
    expect(bad({ E: 'stiff' }).E).toMatch(/^E \(modulus of elasticity\): .*"stiff"/);
    expect(bad({ E: '0' }).E).toMatch(/E .*greater than 0/);
    expect(bad({ E: '-200000' }).E).toMatch(/greater than 0/);
    expect(bad({ E: '200 bar' }).E).toMatch(/unknown unit "bar"/);
    expect(bad({ E: '' }).E).toMatch(/enter a value/);
    expect(bad({ density: '' }).density).toMatch(/density: enter a value/);
    expect(bad({ density: '-1' }).density).toMatch(/density.*must not be negative/);
    expect(bad({ fy: 'abc' }).fy).toMatch(/^fy .*"abc" is not a number/);
    // ν of an isotropic solid lies in (−1, 0.5) (Timoshenko & Goodier, Theory of Elasticity: positive strain energy).
    expect(bad({ nu: '0.6' }).nu).toMatch(/ν \(Poisson ratio\): must be below 0.5/);
    expect(bad({ nu: '', G: '' }).G).toMatch(/give the shear modulus G or the Poisson ratio ν/);
    expect(bad({ fu: '300' }).fu).toMatch(/fu .*300 MPa is below the yield strength fy = 355 MPa/);
    expect(bad({}, { name: '  ' }).name).toMatch(/name: enter a name/);
  });

  it('several wrong fields are named at once: an unreadable E does not hide a ν out of range or a blank fy', () => {
    const base = s355Draft(doc());
    const r = materialFromDraft({ ...base, text: { ...base.text, E: 'two hundred', nu: '0.7', fy: '' } }, null, null, doc());
    expect(r.ok).toBe(false);
    if (r.ok) return;
    expect(Object.keys(r.errors).sort()).toEqual(['E', 'fy', 'nu']);
    expect(r.errors.nu).toMatch(/below 0.5/);
  });

  it('a second material with the same name (any case) is refused, naming the name', () => {
    const first = materialFromDraft(s355Draft(doc()), null, null, doc());
    if (!first.ok) throw new Error('first material should be valid');
    const d = withMaterial(doc(), first.material);
    const r = materialFromDraft({ ...s355Draft(d), name: 'steel s355' }, null, null, d);
    expect(!r.ok && r.errors.name).toMatch(/already has a material called "steel s355"/);
  });

  it('new ids never collide with a document or built-in id', () => {
    expect(materialIdFor('Steel ASTM A36', new Set())).toBe('steel-astm-a36');
    expect(materialIdFor('astm-a36', new Set(['astm-a36']))).toBe('astm-a36-2');
    expect(materialIdFor('astm-a36', new Set(['astm-a36', 'astm-a36-2']))).toBe('astm-a36-3');
    expect(materialIdFor('***', new Set())).toBe('material');
  });
});

describe('material form: starting from a stored material', () => {
  const a992 = builtInMaterial('astm-a992')!;

  it('a duplicate of the built-in A992, untouched, keeps every number and per-value source exactly and gets a new id', () => {
    const d = doc('in');
    const { draft, origin } = draftFromMaterial(a992, 'lb/ft3', `${a992.name} (copy)`);
    const r = materialFromDraft(draft, origin, null, d);
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    const { id, name, ...values } = r.material;
    const { id: _id, name: _name, ...expected } = a992;
    expect(values).toEqual(expected);
    expect(id).not.toBe('astm-a992');
    expect(name).toBe('Steel ASTM A992 (Fy 50 ksi) (copy)');
  });

  it('changing E drops E\'s old source for the one typed in the form; the others keep theirs', () => {
    const { draft, origin } = draftFromMaterial(a992, 'kg/m3', 'Weathering plate');
    const r = materialFromDraft({ ...draft, text: { ...draft.text, E: '28500' }, source: 'mill certificate' }, origin, null, doc());
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    expect(r.material.E).toBe(28500);
    expect(r.material.sources?.E).toBe('mill certificate');
    expect(r.material.sources?.G).toBe(a992.sources?.G);
  });

  it('editing keeps the id, so parts that use the material keep it', () => {
    const d = withMaterial(doc(), a992);
    const { draft, origin } = draftFromMaterial(a992, 'kg/m3');
    const r = materialFromDraft({ ...draft, text: { ...draft.text, fy: '55' } }, origin, 'astm-a992', d);
    expect(r.ok && [r.material.id, r.material.fy]).toEqual(['astm-a992', 55]);
  });

  it('switching the form from ksi to MPa converts the values (29 000 ksi = 29e6 × 6894.757… Pa) and keeps their sources', () => {
    const { draft, origin } = draftFromMaterial(a992, 'kg/m3');
    const mpa = draftInStressUnit(draft, 'MPa');
    expect(Number(mpa.text.E)).toBeCloseTo((29e6 * PA_PER_PSI) / 1e6, 6);
    expect(Number(mpa.text.fy)).toBeCloseTo((50e3 * PA_PER_PSI) / 1e6, 6);
    const r = materialFromDraft(mpa, origin, null, doc());
    expect(r.ok && r.material.stressUnit).toBe('MPa');
    expect(r.ok && r.material.sources?.E).toBe(a992.sources?.E);
  });

  it('switching the density unit converts 7850 kg/m³ to 7850 / (0.45359237 / 0.3048³) lb/ft³', () => {
    const d = s355Draft(doc());
    expect(Number(draftInDensityUnit(d, 'lb/ft3').text.density)).toBeCloseTo(7850 / KG_M3_PER_LB_FT3, 8);
    const garbled = { ...d, text: { ...d.text, density: 'heavy' } };
    expect(draftInDensityUnit(garbled, 'lb/ft3').text.density).toBe('heavy');
  });
});

describe('materials in the document', () => {
  it('choosing a built-in as default or for a part copies it into the document once', () => {
    const d0 = doc('mm', [plate('web plate', null), plate('flange', null)]);
    const d1 = withDefaultMaterial(d0, 'df-l-no2');
    const d2 = withPartMaterial(d1, 'flange', 'astm-a36');
    const d3 = withPartMaterial(d2, 'web plate', 'astm-a36');
    expect(d3.materials.map((m) => m.id)).toEqual(['df-l-no2', 'astm-a36']);
    expect(d3.defaultMaterial).toBe('df-l-no2');
    expect(d3.parts.map((p) => p.material)).toEqual(['astm-a36', 'astm-a36']);
  });

  it('deleting a material used by parts gives them the other default, says so, and clears an E_ref chosen from it', () => {
    const d0 = withPartMaterial(withDefaultMaterial(doc('mm', [plate('side board', null), plate('steel plate', null)]), 'df-l-no2'), 'steel plate', 'astm-a36');
    const d = { ...d0, referenceModulus: { material: 'astm-a36' } };
    const plan = planMaterialDelete(d, 'astm-a36');
    expect(plan.ok).toBe(true);
    if (!plan.ok) return;
    expect(plan.summary.join('; ')).toMatch(/part "steel plate" will use the document default, "Douglas Fir-Larch No. 2"/);
    expect(plan.summary.join('; ')).toMatch(/E_ref goes back/);
    const after = plan.apply(d);
    expect(after.materials.map((m) => m.id)).toEqual(['df-l-no2']);
    expect(after.parts.map((p) => p.material)).toEqual([null, null]);
    expect(after.referenceModulus).toBeUndefined();
  });

  it('deleting the default while parts rely on it is refused, naming those parts', () => {
    const d = withPartMaterial(withDefaultMaterial(doc('mm', [plate('side board', null), plate('steel plate', null), plate('bolt hole', null, 'subtract')]), 'df-l-no2'), 'steel plate', 'astm-a36');
    const plan = planMaterialDelete(d, 'df-l-no2');
    expect(plan.ok).toBe(false);
    if (!plan.ok) expect(plan.message).toMatch(/"Douglas Fir-Larch No. 2" cannot be deleted: it is the document default, and part "side board" would be left with no material/);
  });

  it('deleting a material parts name when the document has no default is refused, naming the parts', () => {
    const d = withPartMaterial(withPartMaterial(doc('mm', [plate('left', null), plate('right', null)]), 'left', 'hdpe'), 'right', 'hdpe');
    const plan = planMaterialDelete(d, 'hdpe');
    expect(!plan.ok && plan.message).toMatch(/no default material, and parts "left", "right" would be left with no material/);
  });

  it('deleting an unused default leaves the document with no default', () => {
    const d = withDefaultMaterial(doc('mm', [plate('trailer rail', 'astm-a36')]), 'al-6061-t6');
    const plan = planMaterialDelete(withPartMaterial(d, 'trailer rail', 'astm-a36'), 'al-6061-t6');
    expect(plan.ok && plan.summary).toEqual(['the document will have no default material']);
  });
});

describe('material form: how stored numbers read', () => {
  it('490 lb/ft³ stored in kg/m³ shows as 7849.0471 (8 figures of 490 × 0.45359237 / 0.3048³) and, untouched, is stored back exactly', () => {
    const a36 = builtInMaterial('astm-a36')!;
    const { draft, origin } = draftFromMaterial(a36, 'kg/m3');
    expect(draft.text.density).toBe('7849.0471');
    const r = materialFromDraft(draft, origin, null, doc());
    expect(r.ok && r.material.density).toBe(a36.density);
  });

  it('the same density shown in lb/ft³ reads 490', () => {
    expect(draftFromMaterial(builtInMaterial('astm-a36')!, 'lb/ft3').draft.text.density).toBe('490');
  });
});

describe('material form: repairing a stored entry that does not pass', () => {
  it('a hand-edited entry (E written as text, fy missing) opens with what reads, names fy, and saves under its own id once fy is typed', () => {
    const raw = { id: 'deck-alloy', name: 'Deck alloy', kind: 'aluminium', stressUnit: 'ksi', E: '10100', G: 3800, density: 2712.6 };
    const d = { ...doc('in'), materials: [raw] } as SectionDocument;
    const { draft, origin } = draftFromStored(raw, d);
    expect([draft.text.E, draft.text.G, draft.kind, draft.stressUnit]).toEqual(['10100', '3800', 'aluminium', 'ksi']);
    const first = materialFromDraft(draft, origin, 'deck-alloy', d);
    expect(first.ok).toBe(false);
    if (!first.ok) expect(Object.keys(first.errors)).toEqual(['fy']);
    const fixed = materialFromDraft({ ...draft, text: { ...draft.text, fy: '35' } }, origin, 'deck-alloy', d);
    expect(fixed.ok && [fixed.material.id, fixed.material.E, fixed.material.fy]).toEqual(['deck-alloy', 10100, 35]);
  });
});
