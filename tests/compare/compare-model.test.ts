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
