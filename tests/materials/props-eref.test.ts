import { describe, expect, it } from 'vitest';
import { propsCommand } from '../../cli/commands/props.ts';
import type { CliIo, FlagValues } from '../../cli/command.ts';

const rel = (a: number, b: number): number => Math.abs(a - b) / Math.abs(b);

function run(doc: Record<string, unknown>, flags: FlagValues) {
  let out = '', err = '';
  const text = JSON.stringify(doc);
  const io: CliIo = { out: (t) => { out += t; }, err: (t) => { err += t; }, readFile: () => text };
  const code = propsCommand.run(['strip.section.json'], flags, io, {}) as number;
  return { code, out, err };
}

// The bimaterial strip of docs/methods.md §6 (tests/fixtures/bimaterial-strip.csv) as a document in mm:
// steel 50 × 10 (E 200 000 MPa) under aluminium 50 × 20 (E 70 000 MPa); EA = 1.7e8 N·mm²/mm² (exact arithmetic).
const material = (id: string, E: number) => ({ id, name: id, kind: 'other', stressUnit: 'MPa', E, nu: 0.3, density: 1000, fy: 250, strengthBasis: 'yield' });
const part = (id: string, mat: string, y: number, height: number) => ({
  id, name: id, type: 'rectangle', operation: 'add', material: mat, visible: true, placement: { x: 25, y, rotationDeg: 0, mirror: false }, width: 50, height,
});
// A version 2 file (the field is file-wide, beside the materials); one section.
const strip = (referenceModulus?: unknown): Record<string, unknown> => ({
  format: 'sectionsmith-section', version: 2, name: 'footbridge deck strip', unit: 'mm', defaultMaterial: null,
  ...(referenceModulus !== undefined ? { referenceModulus } : {}),
  materials: [material('steel', 200_000), material('aluminium', 70_000)],
  sections: [{ id: 's1', name: 'steel under aluminium', parts: [part('steel bar', 'steel', 5, 10), part('aluminium bar', 'aluminium', 20, 20)] }],
});
const EA = 200_000 * 500 + 70_000 * 1000; // N, exact

describe('sectionsmith props honours the document\'s stored E_ref (referenceModulus); --eref still overrides', () => {
  it('a stored material choice (aluminium) gives A_tr = EA / 70 000 and eRef = 70 000 MPa', () => {
    const r = run(strip({ material: 'aluminium' }), { json: true });
    expect(r.err).toBe('');
    const j = JSON.parse(r.out) as Record<string, number>;
    expect(rel(j.eRef!, 70_000)).toBeLessThan(1e-12);
    expect(rel(j.transformedArea!, EA / 70_000)).toBeLessThan(1e-12);
  });

  it('a stored typed value of 100 GPa gives A_tr = EA / 100 000 MPa = 1700 mm²', () => {
    const j = JSON.parse(run(strip({ value: 100, unit: 'GPa' }), { json: true }).out) as Record<string, number>;
    expect(rel(j.transformedArea!, 1700)).toBeLessThan(1e-12);
  });

  it('--eref 200000 overrides the stored aluminium choice: A_tr = EA / 200 000 = 850 mm²', () => {
    const j = JSON.parse(run(strip({ material: 'aluminium' }), { json: true, eref: '200000' }).out) as Record<string, number>;
    expect(rel(j.transformedArea!, 850)).toBeLessThan(1e-12);
  });

  it('the table says where E_ref came from', () => {
    const r = run(strip({ material: 'aluminium' }), {});
    expect(r.out).toMatch(/eRef .*reference modulus \(the document's choice: aluminium\)/);
  });

  it('without a stored choice E_ref is the first part\'s (steel): A_tr = 850 mm²', () => {
    const j = JSON.parse(run(strip(), { json: true }).out) as Record<string, number>;
    expect(rel(j.transformedArea!, 850)).toBeLessThan(1e-12);
  });
});
