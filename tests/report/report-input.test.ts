/**
 * The editor's report input (renderer/app/report/report-input.ts), checked by exact arithmetic on a
 * 100 × 200 mm plate (A = b·h, Ix = b·h³/12, Sx = b·h²/6; Gere & Timoshenko, Mechanics of
 * Materials, §12.3 and §5.4) and the midspan deflection of a simply supported beam under a
 * uniform load, 5·w·L⁴/(384·E·I) (Roark, Table 8.1 case 2e), with E = 29,000 ksi for A992 steel
 * (AISC Specification, common practice; 1 psi = 6894.757293168 Pa exactly).
 */
import { describe, expect, it } from 'vitest';
import type { SectionDocument } from '../../core/document/index.ts';
import { reportHtml } from '../../core/report/index.ts';
import { defaultDisplaySet } from '../../core/units/index.ts';
import { fileStem, materialLines, memberLines, reportTitle, sectionReportInput, withPaperSize } from '../../renderer/app/report/report-input.ts';

function plate(b: number, h: number, material: string | null, name = 'Mezzanine flitch plate'): SectionDocument {
  return {
    format: 'sectionsmith-section', version: 1, name, unit: 'mm', defaultMaterial: material, materials: [],
    parts: [{ id: 'p', name: 'plate', type: 'rectangle', operation: 'add', material: null, visible: true, placement: { x: 0, y: 0, rotationDeg: 0, mirror: false }, width: b, height: h }],
  };
}
const display = defaultDisplaySet('mm');
const cells = (input: { tables: readonly { rows: readonly (readonly string[])[] }[] }, symbol: string): readonly string[] | undefined => input.tables.flatMap((t) => t.rows).find((r) => r[0] === symbol);

describe('section report input', () => {
  it('tabulates A = b·h, Ix = b·h³/12 and Sx = b·h²/6 in the display units at the figures asked', () => {
    const r = sectionReportInput({ doc: plate(100, 200, null), display, sig: 4, torsion: null, member: null });
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    expect(cells(r.input, 'A')?.slice(1, 3)).toEqual(['20000', 'mm²']);
    // 100·200³/12 = 66 666 666.7 mm⁴ = 66.67 × 10⁶ mm⁴; 100·200²/6 = 666 666.7 mm³ = 666.7 × 10³ mm³.
    expect(cells(r.input, 'Ix')?.slice(1, 3)).toEqual(['66.67', '10⁶ mm⁴']);
    expect(cells(r.input, 'Sx top')?.slice(1, 3)).toEqual(['666.7', '10³ mm³']);
    const six = sectionReportInput({ doc: plate(100, 200, null), display, sig: 6, torsion: null, member: null });
    expect(six.ok && cells(six.input, 'Ix')?.[1]).toBe('66.6667');
    expect(r.input.materials).toEqual([]);
    expect(r.input.memberChecks).toEqual([]);
    expect(r.input.torsion).toBeNull();
    expect(r.input.drawings[0]).toContain('<svg');
  });

  it('puts the torsion table and the mesh note in only when a torsion result is given', () => {
    const torsion = { J: 1e7, Cw: 0, xs: 0, ys: 0, meshElements: 4321, meshNodes: 9000, iterations: 50, jRelativeError: 0.0004, components: 1 };
    const r = sectionReportInput({ doc: plate(100, 200, null), display, sig: 4, torsion, member: null });
    expect(r.ok && r.input.tables.map((t) => t.title)).toContain('Torsion (finite elements)');
    expect(r.ok && r.input.torsion).toEqual({ meshElements: 4321, jRelativeError: 0.0004 });
    // 1e7 mm⁴ = 10 × 10⁶ mm⁴.
    expect(r.ok && cells(r.input, 'J')?.slice(1, 3)).toEqual(['10.00', '10⁶ mm⁴']);
    expect(r.ok && reportHtml(r.input)).toContain('4321 elements');
  });

  it('refuses a section without area, naming why', () => {
    const r = sectionReportInput({ doc: { ...plate(100, 200, null), parts: [] }, display, sig: 4, torsion: null, member: null });
    expect(r.ok).toBe(false);
    expect(!r.ok && r.errors.join(' ')).toMatch(/./);
  });

  it('lists the material with E = 29000 ksi in MPa and recomputes the member case: 5wL⁴/(384EI), wL²/8 and the L/360 limit', () => {
    const doc = plate(100, 200, 'astm-a992');
    const lines = materialLines(doc);
    expect(lines).toHaveLength(1);
    const E = 29000e3 * 6894.757293168; // Pa
    // 29000 ksi × 6.894757293168 MPa/ksi = 199947.96 MPa, 199900 at 4 figures.
    expect(lines[0]).toContain('E = 199900 MPa');
    const member = { unit: 'mm' as const, input: { span: 6000, support: 'simple' as const, points: [], uniform: 2000, selfWeight: false, limitRatio: 360 } };
    const text = memberLines(doc, member).join('\n');
    const I = (100 * 200 ** 3) / 12 / 1e12; // m⁴
    const delta = (5 * 2000 * 6 ** 4) / (384 * E * I) * 1000; // mm
    expect(text).toContain(`Largest deflection ${delta.toPrecision(4)} mm`);
    // wL²/8 = 2 kN/m · 36 m² / 8 = 9 kN·m.
    expect(text).toContain('Largest bending moment 9.000 kN·m');
    // span/360 = 16.67 mm and δ ≈ 1.67 mm: within.
    expect(text).toContain('Within the common-practice limit L/360 (allowed 16.67 mm)');
    expect(text).toMatch(/licensed engineer govern/);
  });

  it('a member case given in metres is read in the document unit (6 m = 6000 mm)', () => {
    const doc = plate(100, 200, 'astm-a992');
    const inMm = memberLines(doc, { unit: 'mm', input: { span: 6000, support: 'simple', points: [{ P: 1000, a: 3000 }], uniform: 0, selfWeight: false } });
    const inM = memberLines(doc, { unit: 'm', input: { span: 6, support: 'simple', points: [{ P: 1000, a: 3 }], uniform: 0, selfWeight: false } });
    expect(inM).toEqual(inMm);
  });

  it('without materials the member lines say what is missing instead of numbers', () => {
    const lines = memberLines(plate(100, 200, null), { unit: 'mm', input: { span: 6000, support: 'simple', points: [], uniform: 2000, selfWeight: false } });
    expect(lines).toHaveLength(1);
    expect(lines[0]).toMatch(/needs a material for every part: part "plate" has no material/);
  });

  it('paper size, title and file stem', () => {
    const html = reportHtml({ title: 'x', drawings: [], tables: [] });
    expect(withPaperSize(html, 'A4')).toContain('<style>@page { size: A4; }</style></head>');
    expect(withPaperSize(html, 'Letter')).toContain('@page { size: letter; }');
    expect(() => withPaperSize('<p>', 'A4')).toThrow(/no <\/head>/);
    expect(reportTitle('Trailer frame', 'Main rail')).toBe('Trailer frame — Main rail');
    expect(reportTitle('Main rail', 'Main rail')).toBe('Main rail');
    expect(reportTitle('', '')).toBe('Untitled section');
    expect(fileStem('footbridge-box-girder.section.json')).toBe('footbridge-box-girder');
    expect(fileStem('Trailer frame (v2).json')).toBe('Trailer-frame-v2');
  });
});
