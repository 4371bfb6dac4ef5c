/**
 * The member and stress inputs in the file (format version 3, optional per section): stored in SI,
 * validated with paths that name the key, written in a fixed order and read back unchanged, and
 * allowables that go with their material. Values are exact arithmetic or the format's own words.
 */
import { describe, expect, it } from 'vitest';
import { parseDocument, serialiseDocument, validateDocument, withSectionView, sectionView, newSectionFile } from '../../core/document/index.ts';
import type { MemberInputs, SectionFile } from '../../core/document/types.ts';
import { readFileSync } from 'node:fs';

const CASE: MemberInputs = {
  span: 7.3152, support: 'propped', dead: { uniform: 4378.1, points: [{ P: 1000, a: 2 }] }, live: { uniform: 2918.8, points: [{ P: 500 }] },
  selfWeight: true, totalLimit: 240, liveLimit: 360, stressFactor: 0.6, allowables: [{ material: 'steel', bending: 2.07e8 }],
};

function file(extra: Record<string, unknown>): SectionFile {
  return {
    ...newSectionFile('in'),
    materials: [{ id: 'steel', name: 'Steel' }],
    sections: [{ id: 's1', name: 'Trailer frame rail', parts: [], ...extra }],
  } as SectionFile;
}

describe('member and stress inputs in the file', () => {
  it('a version 3 file without them loads unchanged (they are optional)', () => {
    const r = validateDocument(JSON.parse(serialiseDocument(newSectionFile('mm'))));
    expect(r.ok).toBe(true);
    expect(r.ok && r.document.sections[0]?.member).toBeUndefined();
  });

  it('written in a fixed order and read back exactly (SI values as they are)', () => {
    const f = file({ member: CASE, stress: { N: -5e5, Mx: 1.5e6, My: 0, Vx: 0, Vy: 12.5 } });
    const text = serialiseDocument(f);
    const back = parseDocument(text, 'trailer.section.json');
    expect(back.ok).toBe(true);
    if (!back.ok) return;
    expect(back.file.sections[0]?.member).toEqual(CASE);
    expect(back.file.sections[0]?.stress).toEqual({ N: -5e5, Mx: 1.5e6, My: 0, Vx: 0, Vy: 12.5 });
    expect(serialiseDocument(back.file)).toBe(text);
  });

  it('bad values are refused with the path of the key', () => {
    const bad = validateDocument(JSON.parse(serialiseDocument(file({ member: { ...CASE, span: -1, support: 'hinged' } }))));
    expect(bad.ok).toBe(false);
    const paths = !bad.ok ? bad.issues.map((i) => i.path) : [];
    expect(paths).toContain('sections[0].member.span');
    expect(paths).toContain('sections[0].member.support');
    const unknown = validateDocument(JSON.parse(serialiseDocument(file({ member: { ...CASE, allowables: [{ material: 'oak', bending: 1e7 }] } }))));
    expect(!unknown.ok && unknown.issues[0]?.message).toBe('sections[0].member.allowables[0].material: expected the id of an entry in materials, got "oak"');
    const typo = validateDocument({ ...JSON.parse(serialiseDocument(file({}))), sections: [{ id: 's1', name: 'a', parts: [], stress: { N: 1, Mx: 0, My: 0, Vx: 0, Vy: 0, T: 3 } }] });
    expect(!typo.ok && typo.issues[0]?.path).toBe('sections[0].stress.T');
  });

  it('an allowable goes with its material when the material is removed', () => {
    const f = file({ member: CASE });
    const view = sectionView(f, 's1');
    const out = withSectionView(f, 's1', { ...view, materials: [] });
    expect(out.sections[0]?.member?.allowables).toEqual([]);
    expect(validateDocument(JSON.parse(serialiseDocument(out))).ok).toBe(true);
  });

  it('the shipped example holds a member case for every alternative, and is a valid version 3 file', () => {
    const text = readFileSync(new URL('../../assets/examples/footbridge-box-girder.section.json', import.meta.url), 'utf8');
    const r = parseDocument(text, 'example');
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    expect(r.migratedFrom).toBeNull();
    expect(r.file.version).toBe(3);
    for (const s of r.file.sections) expect(s.member?.span).toBe(24);
  });
});
