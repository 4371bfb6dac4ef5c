import { describe, expect, it } from 'vitest';
import { propsCommand } from '../../cli/commands/props.ts';
import type { CliIo, FlagValues } from '../../cli/command.ts';

const rel = (a: number, b: number): number => Math.abs(a - b) / Math.abs(b);

function run(text: string, flags: FlagValues) {
  let out = '', err = '';
  const io: CliIo = { out: (t) => { out += t; }, err: (t) => { err += t; }, readFile: () => text };
  const code = propsCommand.run(['strip.json'], flags, io) as number;
  return { code, out, err };
}

// The bimaterial strip of tests/fixtures/bimaterial-strip.csv as a document in mm.
const material = (id: string, E: number, fy: number, density: number) => ({ id, name: id, kind: 'other', stressUnit: 'MPa', E, nu: 0.3, density, fy, strengthBasis: 'yield' });
const part = (id: string, mat: string, y: number, height: number) => ({
  id, name: id, type: 'rectangle', operation: 'add', material: mat, visible: true, placement: { x: 25, y, rotationDeg: 0, mirror: false }, width: 50, height,
});
const strip = JSON.stringify({
  format: 'sectionsmith-section', version: 1, name: 'strip', unit: 'mm', defaultMaterial: null,
  materials: [material('steel', 200_000, 355, 7850), material('aluminium', 70_000, 250, 2700)],
  parts: [part('steel bar', 'steel', 5, 10), part('aluminium bar', 'aluminium', 20, 20)],
});

describe('sectionsmith props with materials (bimaterial strip; methods note §6 values)', () => {
  it('adds EA = 1.7e5 kN, EIx in kN·m², y_E = 190/17 mm, mass 6.625 kg/m and weight as mass 6.625 kg/m, each key with its unit', () => {
    const r = run(strip, { json: true });
    expect(r.err).toBe('');
    const j = JSON.parse(r.out) as Record<string, number> & { units: Record<string, string> };
    expect(rel(j.EA!, 1.7e5)).toBeLessThan(1e-12); // 1.7e8 N
    const yE = 190 / 17;
    const EIx = 200_000 * (50 * 1000 / 12 + 500 * (5 - yE) ** 2) + 70_000 * (50 * 8000 / 12 + 1000 * (20 - yE) ** 2); // N·mm²
    expect(rel(j.EIx!, EIx / 1e9)).toBeLessThan(1e-12); // 1 kN·m² = 1e9 N·mm²
    expect(rel(j.cyE!, yE)).toBeLessThan(1e-12);
    expect(rel(j.massPerLength!, 6.625)).toBeLessThan(1e-12);
    expect(rel(j.weightPerLength!, 6.625)).toBeLessThan(1e-12);
    expect([j.units.EA, j.units.EIx, j.units.cyE, j.units.massPerLength, j.units.weightPerLength, j.units.eRef, j.units.Ix, j.units.area]).toEqual(['kN', 'kN·m²', 'mm', 'kg/m', 'kg/m', 'MPa', 'mm⁴', 'mm²']);
    expect(rel(j.transformedArea!, 850)).toBeLessThan(1e-12); // E_ref = steel (first part)
  });

  it('--eref 70000 (MPa) makes the aluminium the reference: A_tr = 1.7e8/70000 mm², EI unchanged', () => {
    const j = JSON.parse(run(strip, { json: true, eref: '70GPa' }).out) as Record<string, number>;
    expect(rel(j.transformedArea!, 1.7e8 / 70_000)).toBeLessThan(1e-12);
    expect(rel(j.eRef!, 70_000)).toBeLessThan(1e-15);
  });

  it('a bad --eref is refused with exit code 2 and a message naming the flag', () => {
    const r = run(strip, { eref: '70 furlongs' });
    expect(r.code).toBe(2);
    expect(r.err).toMatch(/--eref: unknown unit "furlongs"/);
  });

  it('the table shows EA and weightPerLength rows with units, and the caution', () => {
    const r = run(strip, {});
    expect(r.out).toMatch(/EA\s+170,000\s+kN/);
    expect(r.out).toMatch(/weightPerLength\s+6\.625\d*\s+kg\/m/);
    expect(r.out).toMatch(/licensed engineer/);
  });
});
