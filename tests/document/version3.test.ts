// core/document version 3: a cut-out's role (fastener hole or void) and the joint kinds of a
// section. The migration from version 2 (every cut-out read as a void, written out), the rules on
// roles and joints with their paths, and the round trip. Expected values are the format's own
// rules (core/document/types.ts, migrations.ts), written out by hand.
import { describe, expect, it } from 'vitest';
import { documentFromJson, parseDocument, sectionView, serialiseDocument, withSectionView, type Part, type SectionFile } from '../../core/document/index.ts';

const at = (x: number, y: number) => ({ x, y, rotationDeg: 0, mirror: false });
const plate = (id: string, width: number, height: number, y = 0): Part => ({
  id, name: id, type: 'rectangle', operation: 'add', material: null, visible: true, placement: at(0, y), width, height,
});
const hole = (id: string, x: number, y: number): Part => ({
  id, name: id, type: 'rectangle', operation: 'subtract', material: null, visible: true, placement: at(x, y), width: 22, height: 30,
});

function messages(value: unknown): string[] {
  const r = documentFromJson(value);
  return r.ok ? [] : r.errors.map((e) => e.message);
}

const v3 = (parts: readonly unknown[], joints?: unknown) => ({
  format: 'sectionsmith-section', version: 3, name: 'Plate girder', unit: 'mm', materials: [], defaultMaterial: null,
  sections: [{ id: 's1', name: 'Plate girder', parts, ...(joints !== undefined ? { joints } : {}) }],
});

describe('version 2 → 3 migration', () => {
  it('every cut-out of a version 2 file becomes a void, written out; add parts and everything else stay as they were', () => {
    const v2 = {
      format: 'sectionsmith-section', version: 2, name: 'Plate girder', unit: 'mm', materials: [], defaultMaterial: null,
      sections: [
        { id: 's1', name: 'With holes', parts: [plate('web', 12, 1200), hole('hole 1', -100, -615)] },
        { id: 's2', name: 'Plain', parts: [plate('web', 12, 1200)] },
      ],
    };
    const r = documentFromJson(v2);
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    expect(r.migratedFrom).toBe(2);
    expect(r.file).toEqual({
      format: 'sectionsmith-section', version: 3, name: 'Plate girder', unit: 'mm', materials: [], defaultMaterial: null,
      sections: [
        { id: 's1', name: 'With holes', parts: [plate('web', 12, 1200), { ...hole('hole 1', -100, -615), cutoutRole: 'void' }] },
        { id: 's2', name: 'Plain', parts: [plate('web', 12, 1200)] },
      ],
    });
  });

  it('a version 2 file may not carry the version 3 fields: cutoutRole and joints are unknown keys there', () => {
    const v2 = { format: 'sectionsmith-section', version: 2, name: 'g', unit: 'mm', materials: [], defaultMaterial: null, sections: [{ id: 's1', name: 'g', parts: [{ ...hole('h', 0, 0), cutoutRole: 'void' }] }] };
    expect(messages(v2)).toEqual(['sections[0].parts[0].cutoutRole: unexpected key "cutoutRole" in sections[0].parts[0]; check its spelling against the format (version 2 layout)']);
  });

  it('version 1 goes through 2 to 3: its cut-outs come out as voids', () => {
    const v1 = { format: 'sectionsmith-section', version: 1, name: 'Trailer frame', unit: 'in', materials: [], defaultMaterial: null, parts: [plate('p1', 4, 4), hole('p2', 0, 0)] };
    const r = documentFromJson(v1);
    expect(r.ok && r.file.sections[0]?.parts[1]?.cutoutRole).toBe('void');
  });
});

describe('version 3 rules on roles and joints, with paths', () => {
  it('a cut-out role is "fastener-hole" or "void", on subtract parts only', () => {
    expect(messages(v3([plate('web', 12, 1200), { ...hole('h', 0, 0), cutoutRole: 'fastener-hole' }]))).toEqual([]);
    expect(messages(v3([plate('web', 12, 1200), { ...hole('h', 0, 0), cutoutRole: 'bolt' }]))).toEqual([
      'sections[0].parts[1].cutoutRole: expected a cut-out role: "fastener-hole" or "void", got "bolt"',
    ]);
    expect(messages(v3([{ ...plate('web', 12, 1200), cutoutRole: 'void' }]))).toEqual([
      'sections[0].parts[0].cutoutRole: a cut-out role belongs to a subtract part, but this part adds material (remove the key or make the part subtract)',
    ]);
  });

  it('a joint names two different parts of its own section, once per pair, with a known kind', () => {
    const parts = [plate('web', 12, 1200), plate('top', 400, 25, 612.5)];
    expect(messages(v3(parts, [{ parts: ['web', 'top'], kind: { type: 'welded', weld: 'fillet-both-sides' } }]))).toEqual([]);
    expect(messages(v3(parts, [{ parts: ['web', 'bottom'], kind: { type: 'glued' } }]))).toEqual([
      'sections[0].joints[0].parts[1]: expected the id of a part of this section, got "bottom"',
    ]);
    expect(messages(v3(parts, [{ parts: ['web', 'web'], kind: { type: 'glued' } }]))).toEqual([
      'sections[0].joints[0].parts: expected two different parts, got "web" twice',
    ]);
    expect(messages(v3(parts, [{ parts: ['web', 'top'], kind: { type: 'glued' } }, { parts: ['top', 'web'], kind: { type: 'not-connected' } }]))).toEqual([
      'sections[0].joints[1].parts: the joint between "top" and "web" is already given at sections[0].joints[0]',
    ]);
    expect(messages(v3(parts, [{ parts: ['web', 'top'], kind: { type: 'fastened', fastener: 'nail', rows: 0 } }]))).toEqual([
      'sections[0].joints[0].kind.rows: expected a whole number of rows, at least 1, got 0',
    ]);
    expect(messages(v3(parts, [{ parts: ['web', 'top'], kind: { type: 'riveted' } }]))[0]).toMatch(/^sections\[0\]\.joints\[0\]\.kind\.type: expected a joint kind with "type" one of "welded", "fastened", "glued", "not-connected"/);
  });

  it('roles and joints are written and read back unchanged', () => {
    const file = v3(
      [plate('web', 12, 1200), plate('bottom', 500, 30, -615), { ...hole('h', 100, -615), cutoutRole: 'fastener-hole' }],
      [{ parts: ['web', 'bottom'], kind: { type: 'fastened', fastener: 'bolt', rows: 2, pitch: 150 } }],
    );
    const text = serialiseDocument(file as unknown as SectionFile);
    expect(text).toContain('"cutoutRole": "fastener-hole"');
    const r = parseDocument(text, 'girder.section.json');
    expect(r.ok && r.file).toEqual(file);
  });

  it('deleting a part through a section view drops the joint settings that named it', () => {
    const r = documentFromJson(v3([plate('web', 12, 1200), plate('top', 400, 25, 612.5)], [{ parts: ['web', 'top'], kind: { type: 'glued' } }]));
    if (!r.ok) throw new Error('fixture must be valid');
    const view = sectionView(r.file, 's1');
    expect(view.joints).toEqual([{ parts: ['web', 'top'], kind: { type: 'glued' } }]);
    const after = withSectionView(r.file, 's1', { ...view, parts: view.parts.slice(0, 1) });
    expect(after.sections[0]).toEqual({ id: 's1', name: 'Plate girder', parts: [plate('web', 12, 1200)] });
  });
});
