/**
 * The palette's assemblies (renderer/app/parts/assembly-model.ts): form → pieces → document parts.
 * References: plate areas b·t and the parallel-axis theorem, I = Σ (b·t³/12 + b·t·d²), with the
 * doubly symmetric I closed form Ix = [B·D³ − (B − tw)·h³]/12 (Gere & Timoshenko, Mechanics of
 * Materials, §12.5; common practice); first moments for the centroid; W14X90 dimensions from the
 * AISC Shapes Database v15.0 (tests/fixtures/aisc-v15-subset.csv); dressed 2x12 = 1.5 × 11.25 in
 * (NDS Supplement 2018 Table 1A); E = 29,000 ksi for steel (AISC 360-16, common practice) and
 * E = 1,600,000 psi for Douglas Fir-Larch No. 2 (NDS Supplement Table 4A, from memory);
 * exact unit definitions (25.4 mm per inch, 1 lbf = 4.4482216152605 N).
 */
import { readFileSync } from 'node:fs';
import Papa from 'papaparse';
import { describe, expect, it } from 'vitest';
import type { SectionDocument } from '../../core/document/types.ts';
import { compositeProperties, materialPiecesFromDocument } from '../../core/materials/index.ts';
import { sectionFromDocument } from '../../core/section/index.ts';
import {
  ASSEMBLIES, assemblySpec, buildAssembly, catalogueParamsInUnit, defaultRoleMaterial, defaultTexts, missingRoleMaterials, placeAssembly, placeAssemblyStep, type AssemblyId,
} from '../../renderer/app/parts/assembly-model.ts';
import { editorWith, emptyDoc } from './helpers.ts';

const rel = (got: number, want: number): number => Math.abs(got / want - 1);

function form(id: AssemblyId, unit: SectionDocument['unit'], changes: Record<string, string> = {}): Record<string, string> {
  return { ...defaultTexts(assemblySpec(id), unit), ...changes };
}

function placed(id: AssemblyId, changes: Record<string, string> = {}, doc: SectionDocument = emptyDoc()): SectionDocument {
  const built = buildAssembly(id, form(id, doc.unit, changes), doc.unit);
  expect(built.fieldErrors).toEqual({});
  expect(built.errors).toEqual([]);
  return placeAssembly(doc, built.pieces, { steel: defaultRoleMaterial(doc, 'steel', id), timber: defaultRoleMaterial(doc, 'timber', id) }).doc;
}

function properties(doc: SectionDocument) {
  const r = sectionFromDocument(doc);
  expect(r.diagnostics).toEqual([]);
  return r.properties!;
}

const W14X90 = Papa.parse<Record<string, string>>(readFileSync(new URL('../fixtures/aisc-v15-subset.csv', import.meta.url), 'utf8'), { header: true, skipEmptyLines: true }).data.find((r) => r['label'] === 'W14X90')!;

describe('plate girder', () => {
  // Footbridge girder, mm: web 900 × 10, flanges 300 × 20 (the metric defaults of the form).
  it('defaults in a millimetre document: A = 900·10 + 2·300·20 = 21,000 mm² exactly', () => {
    expect(properties(placed('plate-girder')).area).toBe(21_000);
  });

  it('Ix = [B·D³ − (B − tw)·h³]/12 = 3,147,100,000 mm⁴ for the doubly symmetric girder (to 1e-12)', () => {
    const ix = (300 * 940 ** 3 - 290 * 900 ** 3) / 12;
    expect(ix).toBe(3_147_100_000);
    expect(rel(properties(placed('plate-girder')).Ix, ix)).toBeLessThan(1e-12);
  });

  it('unequal flanges: ȳ by first moments and Ix by the parallel-axis theorem', () => {
    const doc = placed('plate-girder', { bottomB: '400', bottomT: '30' });
    const pieces: [number, number, number][] = [
      [9000, 0, (10 * 900 ** 3) / 12],
      [6000, 460, (300 * 20 ** 3) / 12],
      [12000, -465, (400 * 30 ** 3) / 12],
    ];
    const A = pieces.reduce((s, [a]) => s + a, 0);
    const y = pieces.reduce((s, [a, c]) => s + a * c, 0) / A;
    const I = pieces.reduce((s, [a, c, i]) => s + i + a * (c - y) ** 2, 0);
    const p = properties(doc);
    expect(p.area).toBe(27_000);
    expect(rel(p.cy, y)).toBeLessThan(1e-12);
    expect(rel(p.Ix, I)).toBeLessThan(1e-12);
  });

  it('places the web centre at the typed point: centroid (120, −45) for a symmetric girder', () => {
    const p = properties(placed('plate-girder', { x: '120', y: '-45' }));
    expect(rel(p.cx, 120)).toBeLessThan(1e-12);
    expect(rel(p.cy, -45)).toBeLessThan(1e-12);
  });

  it('names the parts plainly, in the order web, top flange, bottom flange, with no material in a document without materials', () => {
    const doc = placed('plate-girder');
    expect(doc.parts.map((p) => p.name)).toEqual(['web plate', 'top flange plate', 'bottom flange plate']);
    expect(doc.parts.map((p) => p.material)).toEqual([null, null, null]);
    expect(doc.materials).toEqual([]);
  });

  it('a second girder in the same document gets unique ids and names ending " (2)"', () => {
    const twice = placed('plate-girder', {}, placed('plate-girder'));
    expect(new Set(twice.parts.map((p) => p.id)).size).toBe(6);
    expect(twice.parts.slice(3).map((p) => p.name)).toEqual(['web plate (2)', 'top flange plate (2)', 'bottom flange plate (2)']);
  });

  it('inch document defaults: web 36 × 3/8, flanges 12 × 1, A = 13.5 + 24 = 37.5 in² exactly', () => {
    expect(properties(placed('plate-girder', {}, { ...emptyDoc(), unit: 'in' })).area).toBe(37.5);
  });

  it('defaults convert exactly: 900 mm shows as 90 in a centimetre document, 36 in as 3 in a foot document', () => {
    expect(defaultTexts(assemblySpec('plate-girder'), 'cm')['webH']).toBe('90');
    expect(defaultTexts(assemblySpec('plate-girder'), 'ft')['webH']).toBe('3');
    // 3/8 in = 0.03125 ft (exact binary fraction).
    expect(defaultTexts(assemblySpec('plate-girder'), 'ft')['webT']).toBe('0.03125');
  });
});

describe('bad input is named by field and builds nothing', () => {
  it('a negative web thickness: "must be greater than 0" on webT and no pieces', () => {
    const b = buildAssembly('plate-girder', form('plate-girder', 'mm', { webT: '-3' }), 'mm');
    expect(b.pieces).toEqual([]);
    expect(b.fieldErrors['webT']).toBe('web plate, thickness tw: must be greater than 0, got -3');
  });

  it('text that is not a number names the field and the text', () => {
    const b = buildAssembly('plate-girder', form('plate-girder', 'mm', { topB: 'wide' }), 'mm');
    expect(b.pieces).toEqual([]);
    expect(b.fieldErrors['topB']).toBe('top flange plate, width b: "wide" is not a number');
  });

  it('an unknown designation offers similar ones of the right family', () => {
    const b = buildAssembly('cover-plated-i', form('cover-plated-i', 'in', { shape: 'W14X91' }), 'in');
    expect(b.pieces).toEqual([]);
    expect(b.fieldErrors['shape']).toMatch(/^rolled I \(catalogue\), designation: "W14X91" is not in the catalogue; similar: .*W14X90/);
  });

  it('a channel where an I is wanted is refused by family', () => {
    const b = buildAssembly('cover-plated-i', form('cover-plated-i', 'in', { shape: 'C15X50' }), 'in');
    expect(b.fieldErrors['shape']).toBe('rolled I (catalogue), designation: C15X50 is a C shape; this assembly takes W, M, S, HP shapes');
  });

  it('a cover plate with a width but no thickness asks for the thickness', () => {
    const b = buildAssembly('cover-plated-i', form('cover-plated-i', 'in', { topT: '' }), 'in');
    expect(b.pieces).toEqual([]);
    expect(b.fieldErrors['topT']).toBe('top cover plate, thickness t: enter it too, or clear both for no plate');
  });

  it('holes at a 1.5 in gauge on W14X90 cut into the web fillets: the helper message goes next to the gauge', () => {
    const b = buildAssembly('cover-plated-i', form('cover-plated-i', 'in', { holeD: '15/16', holeGauge: '1.5' }), 'in');
    expect(b.pieces).toEqual([]);
    expect(b.fieldErrors['holeGauge']).toContain('holes at gauge 1.5 cut into the web or its fillets');
  });

  it('two rows of bolt holes without a pitch: the message goes next to the pitch', () => {
    const b = buildAssembly('bolt-holes', form('bolt-holes', 'mm', { rows: '2' }), 'mm');
    expect(b.pieces).toEqual([]);
    expect(b.fieldErrors['pitch']).toContain('pitch = 0 must be at least the diameter 22 for 2 rows');
  });

  it('one ply is refused: a flitch beam needs at least 2', () => {
    expect(buildAssembly('flitch-beam', form('flitch-beam', 'in', { plies: '1' }), 'in').fieldErrors['plies']).toBe('lumber (NDS dressed sizes), plies: must be a whole number of at least 2, got 1');
  });

  it('every assembly builds from its own defaults in mm and in inches', () => {
    for (const spec of ASSEMBLIES) {
      for (const unit of ['mm', 'in'] as const) {
        const b = buildAssembly(spec.id, defaultTexts(spec, unit), unit);
        expect({ id: spec.id, unit, ...b.fieldErrors, errors: b.errors }).toEqual({ id: spec.id, unit, errors: [] });
        // Glulam and LVL/PSL are one part each (glulam's laminations are strips of that one part).
        expect(b.pieces.length).toBeGreaterThan(spec.id === 'glulam' || spec.id === 'scl' ? 0 : 1);
      }
    }
  });
});

describe('catalogue members in the document unit', () => {
  it('W14X90 in a millimetre document: d, bf, tw, tf are the AISC v15.0 inches × 25.4 (to 1e-12)', () => {
    const b = buildAssembly('cover-plated-i', form('cover-plated-i', 'mm', { topB: '', topT: '' }), 'mm');
    const i = b.pieces[0]!;
    expect(i.type === 'shape' && i.designation).toBe('W14X90');
    if (i.type !== 'shape') throw new Error('expected the rolled I first');
    for (const [key, column] of [['d', 'd_in'], ['bf', 'bf_in'], ['tw', 'tw_in'], ['tf', 'tf_in']] as const) {
      expect(rel(i.params[key]!, Number(W14X90[column]) * 25.4)).toBeLessThan(1e-12);
    }
  });

  it('a 400 × 20 mm top plate adds exactly 8,000 mm² to the W14X90 alone and sits on its flange', () => {
    const withPlate = placed('cover-plated-i', { topB: '400', topT: '20' });
    const alone = placed('cover-plated-i', { topB: '', topT: '' });
    expect(rel(properties(withPlate).area - properties(alone).area, 8000)).toBeLessThan(1e-12);
    const plate = withPlate.parts[1]!;
    expect(plate.name).toBe('top cover plate');
    expect(rel(plate.placement.y, (14 * 25.4) / 2 + 10)).toBeLessThan(1e-12);
  });

  it('holes with the gauge left empty use the published WGi = 5 1/2 in: strips at x = ±69.85 mm', () => {
    const doc = placed('cover-plated-i', { holeD: '24' });
    const holes = doc.parts.filter((p) => p.operation === 'subtract');
    expect(holes).toHaveLength(4);
    expect(holes.map((h) => Math.abs(h.placement.x))).toEqual([69.85, 69.85, 69.85, 69.85]);
    expect(holes.map((h) => h.material)).toEqual([null, null, null, null]);
  });

  it('lumber nominal sizes stay inch trade names in a millimetre document', () => {
    expect(catalogueParamsInUnit('lumber', { b: 2, d: 12, plies: 1 }, 'mm')).toEqual({ b: 2, d: 12, plies: 1 });
  });
});

describe('materials by role', () => {
  const withDefault: SectionDocument = { ...emptyDoc(), unit: 'in', defaultMaterial: 'df-l-no2' };

  it('none when the document uses no materials; else the timber it uses and A36 for the plates', () => {
    expect(defaultRoleMaterial(emptyDoc(), 'steel', 'flitch-beam')).toBeNull();
    expect(defaultRoleMaterial(withDefault, 'timber', 'flitch-beam')).toBe('df-l-no2');
    expect(defaultRoleMaterial(withDefault, 'steel', 'flitch-beam')).toBe('astm-a36');
  });

  it('a 2-ply 2x12 flitch with a 1/2 in plate: plies get the lumber, the plate the steel, copied into the document', () => {
    const doc = placed('flitch-beam', {}, withDefault);
    expect(doc.parts.map((p) => `${p.name}: ${p.material}`)).toEqual(['lumber ply 1: df-l-no2', 'steel plate: astm-a36', 'lumber ply 2: df-l-no2']);
    expect(doc.materials.map((m) => m.id).sort()).toEqual(['astm-a36', 'df-l-no2']);
  });

  it('EIx = E_wood·2·(1.5·11.25³/12) + E_steel·(0.5·11.25³/12), in N·m² (to 1e-9)', () => {
    const doc = placed('flitch-beam', {}, withDefault);
    const pieces = materialPiecesFromDocument(doc);
    expect(pieces.issues).toEqual([]);
    const lbIn2 = 4.4482216152605 * 0.0254 ** 2;
    const ei = (1.6e6 * 2 * (1.5 * 11.25 ** 3)) / 12 + (29e6 * (0.5 * 11.25 ** 3)) / 12;
    expect(rel(compositeProperties(pieces.pieces, 'in').EIx, ei * lbIn2)).toBeLessThan(1e-9);
  });
});

describe('one undo step in the editor', () => {
  it('places three parts selected together; one undo removes all of them', () => {
    const ed = editorWith();
    const built = buildAssembly('plate-girder', form('plate-girder', 'mm'), 'mm');
    const ids = placeAssemblyStep(ed, 'Place plate girder', built.pieces, {});
    expect(ed.getState().doc.parts).toHaveLength(3);
    expect(ed.getState().selection).toEqual(ids);
    expect(ed.getState().undoLabel).toBe('Place plate girder');
    ed.undo();
    expect(ed.getState().doc.parts).toHaveLength(0);
    expect(ed.getState().canUndo).toBe(false);
  });

  it('nothing built, nothing placed: no step', () => {
    const ed = editorWith();
    expect(placeAssemblyStep(ed, 'Place plate girder', [], {})).toEqual([]);
    expect(ed.getState().canUndo).toBe(false);
  });
});

describe('timber assemblies (issue 16 item 3)', () => {
  const inch: SectionDocument = { ...emptyDoc(), unit: 'in', defaultMaterial: 'df-l-no2' };
  const materialsFor = (doc: SectionDocument, id: AssemblyId, changes: Record<string, string> = {}) =>
    Object.fromEntries(assemblySpec(id).roles.map((r) => [r, defaultRoleMaterial(doc, r, id, form(id, doc.unit, changes))]));
  const placeIn = (doc: SectionDocument, id: AssemblyId, changes: Record<string, string> = {}): SectionDocument => {
    const built = buildAssembly(id, form(id, doc.unit, changes), doc.unit);
    expect(built.fieldErrors).toEqual({});
    expect(built.errors).toEqual([]);
    return placeAssembly(doc, built.pieces, materialsFor(doc, id, changes)).doc;
  };

  it('each is in the picker with its materials by role and its source named', () => {
    const ids = ASSEMBLIES.map((a) => a.id);
    expect(ids).toEqual(expect.arrayContaining(['glulam', 'scl', 'wood-i-joist', 'multi-ply']));
    expect(assemblySpec('glulam').source).toMatch(/ANSI A190\.1/);
    expect(assemblySpec('glulam').source).toMatch(/NDS Supplement/);
    expect(assemblySpec('scl').source).toMatch(/common practice/);
    expect(assemblySpec('wood-i-joist').source).toMatch(/common practice/);
    expect(assemblySpec('multi-ply').source).toMatch(/NDS Supplement .*Table 1A/);
    expect(assemblySpec('wood-i-joist').roles).toEqual(['joist-flange', 'joist-web']);
  });

  it('glulam 5-1/8 in × 8 laminations of 1-1/2 in: d = 12 in, A = 61.5 in², Ix = b·d³/12 = 738 in⁴ (NDS Supplement Table 1C, 5-1/8 × 12: A 61.5, Ix 738.0, from memory; b·d and b·d³/12 exactly)', () => {
    const doc = placeIn(inch, 'glulam');
    expect(doc.parts).toHaveLength(1);
    expect(doc.parts[0]!.material).toBe('glulam-24f-1.8e');
    const p = properties(doc);
    expect(rel(p.area, 5.125 * 12)).toBeLessThan(1e-12);
    expect(rel(p.Ix, (5.125 * 12 ** 3) / 12)).toBeLessThan(1e-12);
  });

  it('glulam of southern pine, 5 in × 10 laminations of 1-3/8 in: d = 13.75 in, Ix = 5·13.75³/12 (exact arithmetic)', () => {
    const p = properties(placeIn(inch, 'glulam', { b: '5', n: '10', tl: '1 3/8' }));
    expect(rel(p.Ix, (5 * 13.75 ** 3) / 12)).toBeLessThan(1e-12);
  });

  it('LVL 1-3/4 × 11-7/8 in takes the generic LVL; PSL has no built-in material, so the user chooses one', () => {
    const doc = placeIn(inch, 'scl');
    expect(doc.parts.map((x) => `${x.name}: ${x.material}`)).toEqual(['LVL: lvl-2.0e']);
    expect(rel(properties(doc).Ix, (1.75 * 11.875 ** 3) / 12)).toBeLessThan(1e-12);
    expect(placeIn(inch, 'scl', { product: 'psl', b: '3 1/2' }).parts.map((x) => `${x.name}: ${x.material}`)).toEqual(['PSL: null']);
  });

  it('wood I-joist 11-7/8 in, flanges 2-5/16 × 1-1/2, web 3/8: three parts, flanges and web each with their own material; Ix = [b·D³ − (b − tw)·hw³]/12', () => {
    // The flanges take lumber the document already uses (here Douglas Fir-Larch), else the generic LVL.
    expect(placeIn(inch, 'wood-i-joist').parts.map((x) => `${x.name}: ${x.material}`)).toEqual(['I-joist top flange: df-l-no2', 'I-joist web: null', 'I-joist bottom flange: df-l-no2']);
    const doc = placeIn({ ...inch, defaultMaterial: 'astm-a992' }, 'wood-i-joist');
    expect(doc.parts.map((x) => `${x.name}: ${x.material}`)).toEqual(['I-joist top flange: lvl-2.0e', 'I-joist web: null', 'I-joist bottom flange: lvl-2.0e']);
    const hw = 11.875 - 2 * 1.5;
    expect(rel(properties(doc).Ix, (2.3125 * 11.875 ** 3 - (2.3125 - 0.375) * hw ** 3) / 12)).toBeLessThan(1e-12);
    const web = placeAssembly(inch, buildAssembly('wood-i-joist', form('wood-i-joist', 'in'), 'in').pieces, { 'joist-flange': 'df-l-no2', 'joist-web': 'lvl-2.0e' }).doc;
    expect(web.parts.map((x) => x.material)).toEqual(['df-l-no2', 'lvl-2.0e', 'df-l-no2']);
  });

  it('in a document that uses materials, an I-joist web or a PSL left without one is refused (it would take the default material, here steel)', () => {
    const steel = { ...inch, defaultMaterial: 'astm-a992' };
    const web = missingRoleMaterials(steel, assemblySpec('wood-i-joist'), { 'joist-flange': 'lvl-2.0e', 'joist-web': null });
    expect(web).toHaveLength(1);
    expect(web[0]).toMatch(/web: with none it would take the document's default material \(astm-a992\)/);
    expect(missingRoleMaterials(steel, assemblySpec('wood-i-joist'), { 'joist-flange': 'lvl-2.0e', 'joist-web': 'lvl-2.0e' })).toEqual([]);
    expect(missingRoleMaterials(emptyDoc(), assemblySpec('scl'), { engineered: null })).toEqual([]);
  });

  it('an I-joist whose flanges fill its depth is refused next to the flange depth; nothing is built', () => {
    const built = buildAssembly('wood-i-joist', form('wood-i-joist', 'in', { flangeH: '6' }), 'in');
    expect(built.pieces).toEqual([]);
    expect(built.fieldErrors['flangeH']).toMatch(/leave no web/);
  });

  it('3-ply 2x10: three lumber parts side by side, touching at the two ply joints; A = 3 × 1.5 × 9.25 = 41.625 in² (NDS Supplement Table 1A)', () => {
    const doc = placeIn(inch, 'multi-ply');
    expect(doc.parts.map((x) => `${x.name}: ${x.material}`)).toEqual(['lumber ply 1: df-l-no2', 'lumber ply 2: df-l-no2', 'lumber ply 3: df-l-no2']);
    expect(doc.parts.map((x) => x.placement.x)).toEqual([-1.5, 0, 1.5]);
    expect(rel(properties(doc).area, 3 * 1.5 * 9.25)).toBeLessThan(1e-12);
    expect(buildAssembly('multi-ply', form('multi-ply', 'in', { plies: '1' }), 'in').fieldErrors['plies']).toMatch(/at least 2/);
  });

  it('glulam in a millimetre document: the lamination is typed in mm (38.1 = 1-1/2 in exactly) and n = 0 is refused naming the field', () => {
    const mm: SectionDocument = { ...emptyDoc(), unit: 'mm' };
    const p = properties(placeIn(mm, 'glulam', { b: '130', n: '8', tl: '38.1' }));
    expect(rel(p.Ix, (130 * (8 * 38.1) ** 3) / 12)).toBeLessThan(1e-12);
    expect(buildAssembly('glulam', form('glulam', 'mm', { n: '0' }), 'mm').fieldErrors['n']).toMatch(/laminations n/);
  });
});
