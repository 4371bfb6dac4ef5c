/**
 * The compare view's model (renderer/app/compare/compare-model.ts) on plates, by exact arithmetic
 * (A = b·h, Ix = b·h³/12; Gere & Timoshenko, Mechanics of Materials, §12.3), exact unit factors
 * (1 in = 25.4 mm, 1 kip = 4448.2216152605 N, 1 ft = 0.3048 m, 1 lbf = 4.4482216152605 N) and the
 * midspan deflection 5·w·L⁴/(384·E·I) (Roark, Table 8.1 case 2e), E = 29,000 ksi for A992 steel
 * (AISC Specification, common practice).
 */
import { describe, expect, it } from 'vitest';
import type { SectionDocument } from '../../core/document/index.ts';
import { defaultDisplaySet, type LengthUnit } from '../../core/units/index.ts';
import { compareModel, comparisonReportInput, DEFAULT_INPUTS, nextSort, uniqueNames } from '../../renderer/app/compare/compare-model.ts';

function plate(name: string, b: number, h: number, material: string | null, unit: LengthUnit = 'mm'): { name: string; doc: SectionDocument } {
  return {
    name,
    doc: {
      format: 'sectionsmith-section', version: 1, name, unit, defaultMaterial: material, materials: [],
      parts: [{ id: 'p', name: 'plate', type: 'rectangle', operation: 'add', material: null, visible: true, placement: { x: 0, y: 0, rotationDeg: 0, mirror: false }, width: b, height: h }],
    },
  };
}
const mm = defaultDisplaySet('mm');
const E = 29000e3 * 6894.757293168; // Pa

describe('compare view model', () => {
  it('shows Ix in 10⁶ mm⁴ with ratios to the chosen baseline, and sorts by a clicked column both ways', () => {
    const entries = [plate('wide', 100, 200, null), plate('deep', 50, 400, null)];
    const m = compareModel(entries, { ...nextSort(DEFAULT_INPUTS, 'Ix'), baseline: 'deep' }, mm);
    expect(m.ok).toBe(true);
    if (!m.ok) return;
    const ix = m.columns.find((c) => c.key === 'Ix')!;
    expect(ix.unit).toBe('10⁶ mm⁴');
    expect(ix.toShown(m.rows[0]!.values.Ix!)).toBeCloseTo((100 * 200 ** 3) / 12 / 1e6, 9);
    expect(m.rows.map((r) => r.name)).toEqual(['wide', 'deep']);
    // (100·200³)/(50·400³) = 1/4 exactly.
    expect(m.rows[0]!.ratios.Ix).toBeCloseTo(0.25, 12);
    const down = compareModel(entries, nextSort(nextSort(DEFAULT_INPUTS, 'Ix'), 'Ix'), mm);
    expect(down.ok && down.rows.map((r) => r.name)).toEqual(['deep', 'wide']);
  });

  it('the shared span gives 5wL⁴/(384EI); targets pick the lightest passing and say why the others fail', () => {
    const entries = [plate('light', 10, 300, 'astm-a992'), plate('heavy', 20, 300, 'astm-a992'), plate('shallow', 30, 100, 'astm-a992')];
    const m = compareModel(entries, { ...DEFAULT_INPUTS, span: '6000', load: '2', minIx: '20', ratio: '360' }, mm);
    expect(m.ok).toBe(true);
    if (!m.ok) return;
    const I = (10 * 300 ** 3) / 12 / 1e12;
    const light = m.comparison.alternatives.find((a) => a.name === 'light')!;
    expect(light.values.deflection! / ((5 * 2000 * 6 ** 4) / (384 * E * I)) - 1).toBeCloseTo(0, 6);
    // Ix: light 22.5, heavy 45, shallow 2.5 (10⁶ mm⁴); L/360 = 16.67 mm; light deflects 5·2000·6⁴/(384·E·2.25e-5) = 7.5 mm.
    expect(m.lightest).toBe('light');
    const shallow = m.verdicts.find((v) => v.name === 'shallow')!;
    expect(shallow.passes).toBe(false);
    expect(shallow.reasons.join(' ')).toContain('Ix 2.500 10⁶ mm⁴ is below the 20 10⁶ mm⁴ asked for');
    expect(shallow.reasons.join(' ')).toMatch(/deflection \d+(\.\d+)? mm exceeds span\/360 = 16\.67 mm/);
    const report = comparisonReportInput(m, 4);
    expect(report.tables.map((t) => t.title)).toContain('Targets');
    expect(report.memberChecks?.join(' ')).toContain('Lightest meeting the targets (by weight): light');
  });

  it('inch work reads the load in kip/ft and shows weight in lb/ft', () => {
    const m = compareModel([plate('in plate', 2, 10, 'astm-a992', 'in')], { ...DEFAULT_INPUTS, span: '240', load: '1' }, defaultDisplaySet('in'));
    expect(m.ok).toBe(true);
    if (!m.ok) return;
    // 1 kip/ft = 4448.2216152605 / 0.3048 N/m.
    expect(m.comparison.beam?.load).toBeCloseTo(4448.2216152605 / 0.3048, 9);
    const w = m.columns.find((c) => c.key === 'weight')!;
    expect(w.unit).toBe('lb/ft');
    expect(w.toShown(4.4482216152605 / 0.3048)).toBeCloseTo(1, 12);
  });

  it('bad typing is named; a span without a load is refused; an invalid section is left out with its reason', () => {
    const empty = { name: 'empty', doc: { ...plate('empty', 1, 1, null).doc, parts: [] } };
    const m = compareModel([plate('a', 10, 100, null), empty], { ...DEFAULT_INPUTS, span: '6000', ratio: 'abc' }, mm);
    expect(m.ok).toBe(true);
    if (!m.ok) return;
    expect(m.inputErrors).toContain('deflection target span/n: "abc" is not a number');
    expect(m.inputErrors).toContain('the shared beam needs both a span and a uniform load');
    expect(m.excluded.join(' ')).toMatch(/^empty: /);
    expect(compareModel([empty], DEFAULT_INPUTS, mm).ok).toBe(false);
  });

  it('repeated names are made unique', () => {
    expect(uniqueNames([plate('a', 1, 1, null), plate('a', 1, 1, null), plate(' ', 1, 1, null)]).map((e) => e.name)).toEqual(['a', 'a (2)', 'Untitled section']);
  });
});

describe('compare view in the document\'s unit system (issue 11: an inch comparison report said "uniform load 4.378 kN/m" with densities in kg/m³)', () => {
  const inch = (name: string, b: number, h: number) => plate(name, b, h, 'astm-a992', 'in');

  it('an inch comparison typed "20 ft" and "30 kN/m": the report says 2.056 kip/ft (30000 · 0.3048 / 4448.2216152605), densities 490 lb/ft³, weight in lb/ft', () => {
    const m = compareModel([inch('4 x 12', 4, 12), inch('4 x 10', 4, 10)], { ...DEFAULT_INPUTS, span: '20 ft', load: '30 kN/m' }, defaultDisplaySet('in'));
    expect(m.ok).toBe(true);
    if (!m.ok) return;
    expect(m.inputErrors).toEqual([]);
    expect(m.comparison.beam?.span).toBeCloseTo(240, 12);
    expect(m.comparison.beam?.load).toBeCloseTo(30000, 9);
    const report = comparisonReportInput(m, 4);
    const checks = report.memberChecks?.join(' ') ?? '';
    expect(checks).toContain(`uniform load ${((30000 * 0.3048) / 4448.2216152605).toFixed(3)} kip/ft`);
    expect(checks).not.toMatch(/kN\/m/);
    // A992: 490 lb/ft³ (AISC Manual, common practice, from memory).
    expect(report.materials?.join(' ')).toMatch(/density 490\.?0* lb\/ft³/);
    expect(report.materials?.join(' ')).not.toMatch(/kg\/m³/);
    const w = m.columns.find((c) => c.key === 'weight')!;
    // 490 lb/ft³ × 48/144 ft² = 163.33 lb/ft.
    expect(w.toShown(m.rows.find((r) => r.name === '4 x 12')!.values.weight!) / ((490 * 48) / 144) - 1).toBeCloseTo(0, 12);
  });

  it('a metric comparison shows weight in kg/m and EIx in kN·m²; targets typed with units: "3e7 mm4", "1 ft", "8000 kN*m2"', () => {
    const m = compareModel([plate('light', 10, 300, 'astm-a992'), plate('heavy', 20, 300, 'astm-a992')], { ...DEFAULT_INPUTS, minIx: '3e7 mm4', maxDepth: '1 ft', minEI: '8000 kN*m2' }, mm);
    expect(m.ok).toBe(true);
    if (!m.ok) return;
    expect(m.inputErrors).toEqual([]);
    const w = m.columns.find((c) => c.key === 'weight')!;
    const ei = m.columns.find((c) => c.key === 'EIx')!;
    expect([w.unit, ei.unit]).toEqual(['kg/m', 'kN·m²']);
    // 10 × 300 mm of 490 lb/ft³ steel: 490 × 0.45359237 / 0.3048³ kg/m³ × 0.003 m².
    expect(w.toShown(m.rows.find((r) => r.name === 'light')!.values.weight!) / (((490 * 0.45359237) / 0.3048 ** 3) * 0.003) - 1).toBeCloseTo(0, 12);
    // Ix: light 2.25e7, heavy 4.5e7 mm⁴; EIx = E · I: light 4484 kN·m², heavy 8967 kN·m² (E = 29000 ksi); depth 300 mm < 304.8 mm.
    expect(m.lightest).toBe('heavy');
    expect(m.verdicts.find((v) => v.name === 'light')?.reasons.join(' ')).toMatch(/Ix 22\.50 10⁶ mm⁴ is below the 30 10⁶ mm⁴ asked for/);
  });

  it('a force typed as the span is refused naming the box and the text', () => {
    const m = compareModel([plate('a', 10, 100, 'astm-a992')], { ...DEFAULT_INPUTS, span: '6 kN', load: '2' }, mm);
    expect(m.ok && m.inputErrors.join(' ')).toMatch(/span \(mm\): "6 kN" is a force, not a length/);
  });
});
