/**
 * Issue "quantities that keep their meaning", command-line side: every quantity flag goes through
 * core/units' one reader, and output follows the document's unit system.
 *
 * Hand calculations (exact arithmetic; beam formulas from Gere & Timoshenko, Mechanics of
 * Materials, App. G): a steel plate 4 in wide, 12 in deep (A992: E = 29,000 ksi and 490 lb/ft³,
 * AISC Manual 15th ed., common practice, from memory):
 *   A = 48 in², Ix = 4·12³/12 = 576 in⁴, EIx = 29000 · 576 = 16,704,000 kip·in²,
 *   weight = 490 lb/ft³ · 48/144 ft² = 163.3̄ lb/ft.
 *   Simple span 20 ft = 240 in under w = 2 kip/ft = 1/6 kip/in:
 *     δ = 5wL⁴/(384 EI) = 5 · (1/6) · 240⁴ / (384 · 16,704,000) in, M = wL²/8 = 2 · 20² / 8 = 100 kip·ft.
 * And its metric twin, a plate 100 mm × 300 mm of the same steel (E = 29,000 ksi, the same
 * material): A = 30,000 mm², Ix = 100·300³/12 = 2.25e8 mm⁴ = 2.25e-4 m⁴.
 */
import { mkdtempSync, readFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import Papa from 'papaparse';
import { describe, expect, it } from 'vitest';
import type { CliIo, FlagValues } from '../../cli/command.ts';
import { compareCommand } from '../../cli/commands/compare.ts';
import { memberCommand } from '../../cli/commands/member.ts';
import { builtInMaterial } from '../../core/materials/library.ts';

const KIP = 4448.2216152605; // N, exact (1 lbf = 0.45359237 kg × 9.80665 m/s²)
const PSI = 4.4482216152605 / 0.0254 ** 2; // Pa, exact definition
const steel = builtInMaterial('astm-a992')!;

function plateDoc(unit: 'in' | 'mm', sections: readonly [string, number, number][]): string {
  return JSON.stringify({
    format: 'sectionsmith-section', version: 2, name: 'mezzanine beam', unit, materials: [steel], defaultMaterial: steel.id,
    sections: sections.map(([name, b, h], i) => ({ id: `s${i}`, name, parts: [{ id: 'p', name: 'plate', type: 'rectangle', operation: 'add', material: null, visible: true, placement: { x: 0, y: 0, rotationDeg: 0, mirror: false }, width: b, height: h }] })),
  });
}

function run(command: typeof memberCommand, files: Record<string, string>, positionals: string[], flags: FlagValues) {
  let out = '', err = '';
  const io: CliIo = { out: (t) => { out += t; }, err: (t) => { err += t; }, readFile: (p) => { const t = files[p]; if (t === undefined) throw new Error('missing'); return t; } };
  const code = command.run(positionals, flags, io) as number;
  return { code, out, err };
}

const rel = (a: number, b: number): number => Math.abs(a / b - 1);
const inch = { 'beam.json': plateDoc('in', [['plate 4x12', 4, 12], ['plate 4x10', 4, 10]]) };
const metric = { 'beam.json': plateDoc('mm', [['plate 100x300', 100, 300]]) };
const EI_IN = 29000 * 576; // kip·in²
const DELTA_IN = (5 * (1 / 6) * 240 ** 4) / (384 * EI_IN);

describe('member: flags take units, output follows the unit system (what was seen: moments in N·mm, --span without a unit)', () => {
  it('--span 20ft --uniform 2kip/ft on an inch document: δ = 5wL⁴/384EI in, M = 100 kip·ft, EI in kip·in², all keyed with units', () => {
    const r = run(memberCommand, inch, ['beam.json'], { span: '20ft', support: 'simple', uniform: '2kip/ft', json: true });
    expect(r.err).toBe('');
    const j = JSON.parse(r.out) as { span: number; deflectionMax: number; momentMax: number; EI: number; units: Record<string, string> };
    expect(rel(j.span, 240)).toBeLessThan(1e-12);
    expect(rel(j.deflectionMax, DELTA_IN)).toBeLessThan(1e-9);
    expect(rel(j.momentMax, 100)).toBeLessThan(1e-12);
    expect(rel(j.EI, EI_IN)).toBeLessThan(1e-12);
    expect([j.units.span, j.units.deflectionMax, j.units.momentMax, j.units.EI, j.units.uniformTotal]).toEqual(['in', 'in', 'kip·ft', 'kip·in²', 'kip/ft']);
  });

  it('the same span written 240, 20ft, 6.096m and 19\'-12" gives the same deflection', () => {
    const d = (span: string): number => (JSON.parse(run(memberCommand, inch, ['beam.json'], { span, support: 'simple', uniform: '2kip/ft', json: true }).out) as { deflectionMax: number }).deflectionMax;
    for (const s of ['20ft', '6.096m', '19\'-12"', '6096 mm']) expect(rel(d(s), d('240')), s).toBeLessThan(1e-12);
  });

  it('the text report prints the moment in kN·m for a metric document (wL²/8 = 30 · 6² / 8 = 135 kN·m), not N·mm', () => {
    const r = run(memberCommand, metric, ['beam.json'], { span: '6m', support: 'simple', uniform: '30kN/m' });
    expect(r.err).toBe('');
    expect(r.out).toMatch(/maximum moment\s+135(\.0*)? kN·m at x = 3000(\.0*)? mm/);
    expect(r.out).not.toMatch(/N·mm/);
    // δ = 5wL⁴/(384EI) with w = 30 N/mm, L = 6000 mm, E = 29000 ksi, I = 2.25e8 mm⁴; in mm.
    const E = (29000 * 1000 * PSI) / 1e6; // N/mm²
    const delta = (5 * 30 * 6000 ** 4) / (384 * E * 2.25e8);
    const shown = Number(/maximum deflection\s+(\S+) mm/.exec(r.out)?.[1]);
    expect(rel(shown, delta)).toBeLessThan(1e-4); // 5 significant figures
  });

  it('a force in a length flag, an unknown unit and an empty value are refused naming the flag and the text', () => {
    expect(run(memberCommand, inch, ['beam.json'], { span: '10kN', support: 'simple' }).err).toMatch(/--span: "10kN" is a force, not a length/);
    expect(run(memberCommand, inch, ['beam.json'], { span: '20 furlong', support: 'simple' }).err).toMatch(/--span: unknown unit "furlong" in "20 furlong"/);
    const empty = run(memberCommand, inch, ['beam.json'], { span: ' ', support: 'simple' });
    expect(empty.code).toBe(2);
    expect(empty.err).toMatch(/--span: enter a value/);
  });
});

describe('compare: --load takes units (what was seen: "compare --load 30kN/m" refused) and exports carry them', () => {
  const dir = mkdtempSync(join(tmpdir(), 'quantities-compare-'));

  it('--span 20ft --load 2kip/ft on an inch document: CSV headings in kip·in², lb/ft, in, each value by hand', () => {
    const csvPath = join(dir, 'inch.csv');
    const r = run(compareCommand, inch, ['beam.json'], { span: '20ft', load: '2kip/ft', csv: csvPath });
    expect(r.err).toBe('');
    expect(r.out).toMatch(/uniform load 2(\.0*)? kip\/ft/);
    const [head = [], first, second] = Papa.parse<string[]>(readFileSync(csvPath, 'utf8').trim()).data;
    // Columns found by symbol and unit: "Ix (geometric) [in^4]" → starts with Ix, ends with [in^4].
    const col = (row: string[] | undefined, symbol: string, unit: string): number => {
      const i = head.findIndex((h) => h.startsWith(symbol) && h.endsWith(`[${unit}]`));
      expect(i, `${symbol} [${unit}]`).toBeGreaterThanOrEqual(0);
      return Number(row?.[i]);
    };
    const valueColumns = head.filter((h, i) => i > 0 && !h.includes(' / ') && !/^(notes|caution|stiffness rank|meets|targets)/.test(h));
    for (const h of valueColumns) expect(h, 'every value column names its unit').toMatch(/\[.+\]$/);
    expect(col(first, 'A ', 'in^2')).toBe(48);
    expect(col(first, 'Ix ', 'in^4')).toBeCloseTo(576, 10);
    expect(rel(col(first, 'EIx', 'kip*in^2'), EI_IN)).toBeLessThan(1e-12);
    expect(rel(col(first, 'weight', 'lb/ft'), (490 * 48) / 144)).toBeLessThan(1e-12);
    expect(rel(col(first, 'deflection, total', 'in'), DELTA_IN)).toBeLessThan(1e-9);
    // The 4 × 10 plate: Ix = 4·10³/12 = 1000/3 in⁴, δ scales with 1/I.
    expect(rel(col(second, 'deflection, total', 'in'), (DELTA_IN * 576) / (1000 / 3))).toBeLessThan(1e-9);
  });

  it('--load 30kN/m on a metric document: CSV in kN·m², kg/m, mm by hand', () => {
    const csvPath = join(dir, 'metric.csv');
    const r = run(compareCommand, metric, ['beam.json'], { span: '6m', load: '30kN/m', csv: csvPath, json: true });
    expect(r.err).toBe('');
    const j = JSON.parse(r.out) as { units: Record<string, string>; beam: { span: number; load: number } };
    expect(j.units).toMatchObject({ EIx: 'kN·m²', weight: 'kg/m', deflection: 'mm', 'beam.load': 'kN/m' });
    expect(j.beam).toEqual({ span: 6000, load: 30 });
    const [head = [], first] = Papa.parse<string[]>(readFileSync(csvPath, 'utf8').trim()).data;
    const col = (symbol: string, unit: string): number => Number(first?.[head.findIndex((h) => h.startsWith(symbol) && h.endsWith(`[${unit}]`))]);
    const E = 29000 * 1000 * PSI; // Pa
    expect(rel(col('EIx', 'kN*m^2'), (E * 2.25e-4) / 1000)).toBeLessThan(1e-12);
    // 490 lb/ft³ = 490 × 0.45359237 / 0.3048³ kg/m³ over 0.03 m²
    expect(rel(col('weight', 'kg/m'), ((490 * 0.45359237) / 0.3048 ** 3) * 0.03)).toBeLessThan(1e-12);
    expect(rel(col('deflection, total', 'mm'), ((5 * 30000 * 6 ** 4) / (384 * E * 2.25e-4)) * 1000)).toBeLessThan(1e-9);
  });

  it('a bare --load is still N/m, as --help says (the meaning of a number never changes silently)', () => {
    const a = JSON.parse(run(compareCommand, metric, ['beam.json'], { span: '6000', load: '30000', json: true }).out) as { alternatives: { values: { deflection: number } }[] };
    const b = JSON.parse(run(compareCommand, metric, ['beam.json'], { span: '6m', load: '30kN/m', json: true }).out) as { alternatives: { values: { deflection: number } }[] };
    expect(a.alternatives[0]!.values.deflection).toBe(b.alternatives[0]!.values.deflection);
    expect(KIP).toBeGreaterThan(0);
  });
});
