/**
 * Comparison of alternatives on rectangles, checked by exact arithmetic (A = b·h, Ix = b·h³/12,
 * Sx = b·h²/6, Zx = b·h²/4; Gere & Timoshenko, Mechanics of Materials) and the midspan
 * deflection of a simply supported beam under uniform load, 5·w·L⁴ / (384·E·I) (Roark, Table 8.1
 * case 2e), with E = 29,000 ksi for ASTM A992 steel (AISC Specification, common practice).
 */
import Papa from 'papaparse';
import { describe, expect, it } from 'vitest';
import { compareDocuments, comparisonCsv, lightestMeeting, sortAlternatives } from '../../core/compare/index.ts';
import type { SectionDocument } from '../../core/document/index.ts';

function plate(name: string, b: number, h: number, material: string | null): SectionDocument {
  return {
    format: 'sectionsmith-section', version: 1, name, unit: 'mm', defaultMaterial: material, materials: [],
    parts: [{ id: 'p', name: 'plate', type: 'rectangle', operation: 'add', material: null, visible: true, placement: { x: 0, y: 0, rotationDeg: 0, mirror: false }, width: b, height: h }],
  };
}

describe('compare alternatives', () => {
  it('values and ratios to the baseline are those of b·h, b·h³/12, b·h²/6, b·h²/4', () => {
    const c = compareDocuments([plate('deep', 10, 300, null), plate('shallow', 20, 150, null)], { baseline: 'deep' });
    const shallow = c.alternatives[1]!;
    expect(shallow.values.A).toBeCloseTo(3000, 9);
    expect(shallow.values.Ix! / (20 * 150 ** 3 / 12) - 1).toBeCloseTo(0, 12);
    expect(shallow.values.Sx! / (20 * 150 ** 2 / 6) - 1).toBeCloseTo(0, 12);
    expect(shallow.values.Zx! / (20 * 150 ** 2 / 4) - 1).toBeCloseTo(0, 12);
    // (20·150³) / (10·300³) = 0.25 exactly.
    expect(shallow.ratios.Ix).toBeCloseTo(0.25, 12);
    expect(shallow.notes.join(' ')).toContain('no material');
    // No materials anywhere: one note for the section, not one per part.
    expect(shallow.notes).toEqual(['no EI, weight, deflection or stress: no materials assigned (choose a default material, or one for each part)']);
    expect(sortAlternatives(c, 'Ix').map((a) => a.name)).toEqual(['shallow', 'deep']);
  });

  it('with steel, the deflection of a shared 6 m span under 2 kN/m is 5wL⁴/(384EI), and the lightest meeting L/360 is chosen', () => {
    const docs = [plate('a', 10, 300, 'astm-a992'), plate('b', 12, 240, 'astm-a992'), plate('c', 8, 200, 'astm-a992')];
    const c = compareDocuments(docs, { beam: { span: 6000, load: 2000 } });
    const E = 29000 * 6.894757293168e6; // ksi → Pa (1 psi = 6894.757293168 Pa, exact by definition of the pound-force and inch)
    for (const [i, [b, h]] of [[10, 300], [12, 240], [8, 200]].entries()) {
      const I = (b! * h! ** 3) / 12 / 1e12; // m⁴
      const expected = (5 * 2000 * 6 ** 4) / (384 * E * I);
      expect(c.alternatives[i]!.values.deflection! / expected - 1).toBeCloseTo(0, 6);
    }
    const pick = lightestMeeting(c, { deflectionRatio: 360 });
    // span/360 = 16.7 mm. By hand: a (Ix 22.5e6 mm⁴) deflects 7.5 mm, b (13.8e6) 12.2 mm, c (5.33e6) 31.6 mm;
    // a and b pass, and b (A 2880 mm²) is lighter than a (3000 mm²) in the same steel.
    expect(pick.choice?.name).toBe('b');
    expect(pick.by).toBe('weight');
    expect(pick.failing).toHaveLength(1);
    expect(pick.failing[0]).toMatch(/^c: /);
    const csv = comparisonCsv(c);
    // A metric comparison: EIx in kN·m², weight in kg/m, deflection in mm (core/units/systems.ts).
    // Parsed by papaparse (headings hold commas, so they are quoted).
    const [head = [], first = []] = Papa.parse<string[]>(csv.trim()).data;
    const deflection = head.find((h) => h.startsWith('deflection, total load (max) ['));
    expect(deflection).toBe('deflection, total load (max) [mm]');
    expect(head.some((h) => h.startsWith('EIx') && h.endsWith('[kN*m^2]'))).toBe(true);
    expect(head.some((h) => h.startsWith('weight') && h.endsWith('[kg/m]'))).toBe(true);
    const dA = (5 * 2000 * 6 ** 4) / (384 * E * ((10 * 300 ** 3) / 12 / 1e12)); // m, plate a
    expect(Number(first[head.indexOf(deflection!)]) / (dA * 1000) - 1).toBeCloseTo(0, 6);
    expect(csv).toContain('licensed engineer');
  });
});
