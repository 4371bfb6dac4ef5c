// core/document versions 2 and 3: several named sections (alternatives) in one file. The migration
// from version 1, the rules on sections (at least one, unique ids and names, names not blank) with
// their paths, and the one-section views (core/document/sections.ts). Expected values are the
// format's own rules (core/document/types.ts, migrations.ts), written out by hand.
import { describe, expect, it } from 'vitest';
import {
  DOCUMENT_VERSION,
  MIGRATIONS,
  allSectionViews,
  documentFromJson,
  fileFromSection,
  findSection,
  mapSectionViews,
  newDocument,
  newSectionFile,
  parseDocument,
  sectionNameProblem,
  sectionView,
  serialiseDocument,
  uniqueSectionId,
  uniqueSectionName,
  withSectionView,
  type Part,
  type SectionFile,
} from '../../core/document/index.ts';
import { InvariantError } from '../../core/invariant.ts';

const at = (x: number, y: number) => ({ x, y, rotationDeg: 0, mirror: false });
const plate = (id: string, width: number, height: number, y = 0, material: string | null = null): Part => ({
  id, name: `plate ${width} × ${height}`, type: 'rectangle', operation: 'add', material, visible: true, placement: at(0, y), width, height,
});

/** A footbridge girder file with two alternatives: thicker flanges, deeper web. */
const girder: SectionFile = {
  format: 'sectionsmith-section', version: 3, name: 'Footbridge box girder', unit: 'mm',
  materials: [{ id: 's355', name: 'S355 steel' }, { id: 'oak', name: 'oak' }], defaultMaterial: 's355',
  sections: [
    { id: 's1', name: 'Thicker flanges', parts: [plate('top', 700, 30, 415), plate('web', 12, 800), plate('bottom', 520, 35, -417.5, 'oak')] },
    { id: 's2', name: 'Deeper web', parts: [plate('top', 700, 20, 460), plate('web', 12, 900, 0, 'oak'), plate('bottom', 520, 25, -462.5)] },
  ],
};

function messages(value: unknown): string[] {
  const r = documentFromJson(value);
  return r.ok ? [] : r.errors.map((e) => e.message);
}

/** A current-version file (the section rules came with version 2 and hold in version 3). */
const v2 = (sections: unknown, extra: Record<string, unknown> = {}) => ({
  format: 'sectionsmith-section', version: DOCUMENT_VERSION, name: 'Trailer frame', unit: 'in', materials: [], defaultMaterial: null, sections, ...extra,
});

describe('version 1 → 2 migration', () => {
  it('the current version is 3, and the migrations read versions 0, 1 and 2', () => {
    expect(DOCUMENT_VERSION).toBe(3);
    expect(MIGRATIONS.map((m) => m.from)).toEqual([0, 1, 2]);
  });

  it('a version 1 file becomes one section "s1" named after the document, holding its parts; the rest stays at the top', () => {
    const parts = [plate('p1', 10, 300)];
    const v1 = { format: 'sectionsmith-section', version: 1, name: 'Mezzanine flitch beam', unit: 'in', parts, materials: [{ id: 'df', name: 'Douglas fir' }], defaultMaterial: 'df' };
    const r = documentFromJson(v1);
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    expect(r.migratedFrom).toBe(1);
    // Through 2 to 3: no cut-outs here, so version 3 adds nothing.
    expect(r.file).toEqual({
      format: 'sectionsmith-section', version: 3, name: 'Mezzanine flitch beam', unit: 'in',
      materials: [{ id: 'df', name: 'Douglas fir' }], defaultMaterial: 'df',
      sections: [{ id: 's1', name: 'Mezzanine flitch beam', parts }],
    });
    // The first section's view is the version 1 document again.
    expect(r.document).toEqual(v1);
  });

  it('a reference modulus in a version 1 file (development builds wrote one) moves to the top of version 2 unchanged', () => {
    const r = documentFromJson({ format: 'sectionsmith-section', version: 1, name: 'flitch', unit: 'in', parts: [], materials: [{ id: 'a36', name: 'A36' }], defaultMaterial: null, referenceModulus: { material: 'a36' } });
    expect(r.ok && r.file.referenceModulus).toEqual({ material: 'a36' });
    const bad = documentFromJson({ format: 'sectionsmith-section', version: 1, name: 'flitch', unit: 'in', parts: [], materials: [], defaultMaterial: null, referenceModulus: { material: 'a36' } });
    expect(bad.ok ? [] : bad.errors.map((e) => e.message)).toEqual(['referenceModulus.material: expected the id of an entry in materials, got "a36"']);
  });

  it('a version 1 file with a blank name gets a section called "Section 1" (section names may not be blank)', () => {
    const r = documentFromJson({ format: 'sectionsmith-section', version: 1, name: ' ', unit: 'mm', parts: [], materials: [], defaultMaterial: null });
    expect(r.ok && [r.file.name, r.file.sections[0]?.name]).toEqual([' ', 'Section 1']);
  });

  it('version 0 goes through 1 to 2: the parts land in the one section', () => {
    const r = documentFromJson({ format: 'sectionsmith-section', version: 0, name: 'Trailer frame', units: 'in', parts: [{ kind: 'circle', x: 1, y: 2, angle: 0, diameter: 3 }] });
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    expect(r.migratedFrom).toBe(0);
    expect(r.file.sections).toEqual([{ id: 's1', name: 'Trailer frame', parts: [{ id: 'p1', name: 'circle 1', type: 'circle', operation: 'add', material: null, visible: true, placement: at(1, 2), diameter: 3 }] }]);
  });

  it('problems in a version 1 file are reported at its own paths (parts[…]), marked as the version 1 layout, cross-field rules included', () => {
    const v1 = { format: 'sectionsmith-section', version: 1, name: 'n', unit: 'mm', materials: [], defaultMaterial: null, parts: [plate('p1', 10, 10), { ...plate('p2', 10, 10), width: -1 }] };
    expect(messages(v1)).toEqual(['parts[1].width: expected a positive finite number, got -1 (version 1 layout)']);
    expect(messages({ ...v1, parts: [plate('p1', 10, 10), plate('p1', 5, 5, 0, 'oak')] })).toEqual([
      'parts[1].id: expected a unique id, got "p1" again (version 1 layout)',
      'parts[1].material: expected the id of an entry in materials or null, got "oak" (version 1 layout)',
    ]);
  });

  it('a newer file is still refused, naming both versions', () => {
    expect(messages({ ...girder, version: 4 })).toEqual(['document is version 4; this build reads up to 3. Open it with a newer Sectionsmith.']);
  });
});

describe('rules on sections (since version 2), with paths', () => {
  it('the two-alternative girder file is valid and reads back unchanged', () => {
    const r = parseDocument(serialiseDocument(girder), 'girder.section.json');
    expect(r.ok && r.file).toEqual(girder);
  });

  it('no sections, or a missing sections key, is refused', () => {
    expect(messages(v2([]))).toEqual(['sections: expected at least one section, got an array of 0 items']);
    const { sections: _none, ...without } = v2([]);
    expect(messages(without)).toEqual(['sections: expected the key "sections" in the document, got nothing (the key is missing)']);
  });

  it('parts at the top of a version 2 or 3 file are an unknown key (they belong in a section)', () => {
    expect(messages(v2([{ id: 's1', name: 'a', parts: [] }], { parts: [] }))).toEqual(['parts: unexpected key "parts" in the document; check its spelling against the format']);
  });

  it('a bad dimension in the second section is reported at sections[1].parts[2].width with expected vs got', () => {
    const second = [plate('a', 1, 1), plate('b', 1, 1), { ...plate('c', 1, 1), width: 'wide' }];
    expect(messages(v2([{ id: 's1', name: 'one', parts: [] }, { id: 's2', name: 'two', parts: second }]))).toEqual([
      'sections[1].parts[2].width: expected a positive finite number, got "wide"',
    ]);
  });

  it('duplicate section ids, duplicate names (ignoring surrounding spaces) and blank names are each named', () => {
    expect(messages(v2([{ id: 's1', name: 'rail', parts: [] }, { id: 's1', name: ' rail ', parts: [] }]))).toEqual([
      'sections[1].id: expected a unique section id, got "s1" again',
      'sections[1].name: expected a name no other section has, got " rail ", already the name of sections[0]',
    ]);
    expect(messages(v2([{ id: 's1', name: '   ', parts: [] }]))).toEqual(['sections[0].name: expected a non-empty name (not only spaces), got "   "']);
    expect(messages(v2([{ id: 's1', name: 'a', parts: [], kind: 'x' }]))).toEqual(['sections[0].kind: unexpected key "kind" in sections[0]; check its spelling against the format']);
  });

  it('part ids need only be unique within their section; materials are checked against the shared list', () => {
    expect(messages(v2([{ id: 's1', name: 'a', parts: [plate('p1', 1, 1)] }, { id: 's2', name: 'b', parts: [plate('p1', 2, 2)] }]))).toEqual([]);
    expect(messages(v2([{ id: 's1', name: 'a', parts: [] }, { id: 's2', name: 'b', parts: [plate('p1', 2, 2, 0, 'oak')] }]))).toEqual([
      'sections[1].parts[0].material: expected the id of an entry in materials or null, got "oak"',
    ]);
  });
});

describe('one-section views', () => {
  it('sectionView gives the section\'s name and parts with the file\'s unit and materials, in the version 1 layout', () => {
    const view = sectionView(girder, 's2');
    expect(view).toEqual({ format: 'sectionsmith-section', version: 1, name: 'Deeper web', unit: 'mm', parts: girder.sections[1]?.parts, materials: girder.materials, defaultMaterial: 's355' });
    expect(view.parts).toBe(girder.sections[1]?.parts);
  });

  it('allSectionViews lists every section in file order as { name, doc }', () => {
    const all = allSectionViews(girder);
    expect(all.map((a) => a.name)).toEqual(['Thicker flanges', 'Deeper web']);
    expect(all.map((a) => a.doc.parts.length)).toEqual([3, 3]);
    expect(all[1]?.doc).toEqual(sectionView(girder, 's2'));
  });

  it('withSectionView writes edited parts back into that section only, and an unchanged view returns the same file', () => {
    const view = sectionView(girder, 's1');
    expect(withSectionView(girder, 's1', view)).toBe(girder);
    const edited = withSectionView(girder, 's1', { ...view, parts: view.parts.slice(0, 2) });
    expect(edited.sections[0]?.parts.map((p) => p.id)).toEqual(['top', 'web']);
    expect(edited.sections[1]).toBe(girder.sections[1]);
    expect(edited.materials).toBe(girder.materials);
  });

  it('materials are document-wide: removing one through a view clears it in every section (to the default), so the file stays valid', () => {
    const view = sectionView(girder, 's1');
    const edited = withSectionView(girder, 's1', { ...view, materials: [{ id: 's355', name: 'S355 steel' }], parts: view.parts.map((p) => ({ ...p, material: null })) });
    expect(edited.sections.flatMap((s) => s.parts.map((p) => p.material))).toEqual([null, null, null, null, null, null]);
    expect(parseDocument(serialiseDocument(edited), 'x.json').ok).toBe(true);
  });

  it('a view renames its section only to a free, non-blank name; a unit change through a view is refused (a bug: convert the whole file)', () => {
    const view = sectionView(girder, 's1');
    expect(withSectionView(girder, 's1', { ...view, name: 'Heavy flanges' }).sections.map((s) => s.name)).toEqual(['Heavy flanges', 'Deeper web']);
    expect(() => withSectionView(girder, 's1', { ...view, name: 'Deeper web' })).toThrow(InvariantError);
    expect(() => withSectionView(girder, 's1', { ...view, unit: 'in' })).toThrow(/cannot change the document unit/);
    expect(() => sectionView(girder, 's9')).toThrow(/no section with id "s9"/);
  });

  it('mapSectionViews applies one change to every section (here: every plate twice as wide)', () => {
    const wide = mapSectionViews(girder, (v) => ({ ...v, parts: v.parts.map((p) => (p.type === 'rectangle' ? { ...p, width: p.width * 2 } : p)) }));
    expect(wide.sections.flatMap((s) => s.parts.map((p) => (p.type === 'rectangle' ? p.width : 0)))).toEqual([1400, 24, 1040, 1400, 24, 1040]);
  });

  it('fileFromSection and newSectionFile make valid one-section files', () => {
    const one = fileFromSection({ ...newDocument('ft', 'Trailer frame'), parts: [plate('p1', 1, 2)] });
    expect(one.sections).toEqual([{ id: 's1', name: 'Trailer frame', parts: [plate('p1', 1, 2)] }]);
    for (const f of [one, newSectionFile('cm'), newSectionFile('m', '')]) expect(parseDocument(serialiseDocument(f), 'f.json').ok).toBe(true);
  });
});

describe('finding and naming sections', () => {
  it('findSection takes an exact name, then a name ignoring case and spaces, then an id; null otherwise', () => {
    expect(findSection(girder, 'Deeper web')?.id).toBe('s2');
    expect(findSection(girder, '  deeper WEB ')?.id).toBe('s2');
    expect(findSection(girder, 's1')?.name).toBe('Thicker flanges');
    expect(findSection(girder, 'Shallow web')).toBeNull();
  });

  it('new ids and names do not clash: s3, "Deeper web 2"; a blank or taken name is explained', () => {
    expect(uniqueSectionId(girder)).toBe('s3');
    expect(uniqueSectionName(girder, 'Deeper web')).toBe('Deeper web 2');
    expect(uniqueSectionName(girder, 'Cover plates')).toBe('Cover plates');
    expect(sectionNameProblem(girder, ' ')).toBe('a section name cannot be empty');
    expect(sectionNameProblem(girder, 'Deeper web')).toBe('another section is already called "Deeper web"');
    expect(sectionNameProblem(girder, 'Deeper web', 's2')).toBeNull();
  });
});
