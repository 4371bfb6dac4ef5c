/**
 * `props --torsion` on a document of two materials: a steel tube D = 74, d = 46 mm filled with a
 * core of another material. Concentric circles: GJ = Σ G_i J_i (ω = 0; Timoshenko & Goodier,
 * torsion of circular shafts), J = GJ/G_ref with G_ref the first part's material. Steel G from
 * E = 200 GPa and ν = 0.3 (G = E/(2(1 + ν)), identity); the core's G typed as 12 GPa.
 * Arcs are meshed as 2.5° chords: J about 0.063 % low (docs/methods.md §7.8); tolerance 0.1 %.
 */
import { describe, expect, it } from 'vitest';
import { propsCommand } from '../../cli/commands/props.ts';
import type { CliIo, FlagValues } from '../../cli/command.ts';

function run(text: string, flags: FlagValues) {
  let out = '';
  let err = '';
  const io: CliIo = { out: (t) => { out += t; }, err: (t) => { err += t; }, readFile: () => text };
  const code = propsCommand.run(['filled-tube.json'], flags, io) as number;
  return { code, out, err };
}

const circle = (id: string, operation: 'add', material: string, diameter: number) => ({
  id, name: id, type: 'circle', operation, material, visible: true, placement: { x: 0, y: 0, rotationDeg: 0, mirror: false }, diameter,
});
const doc = JSON.stringify({
  format: 'sectionsmith-section', version: 1, name: 'filled tube', unit: 'mm', defaultMaterial: null,
  materials: [
    { id: 'steel', name: 'steel', kind: 'steel', stressUnit: 'MPa', E: 200_000, nu: 0.3, density: 7850, fy: 355, strengthBasis: 'yield' },
    { id: 'fill', name: 'fill', kind: 'other', stressUnit: 'MPa', E: 30_000, G: 12_000, density: 2400, fy: 30, strengthBasis: 'yield' },
  ],
  // The core is placed over a solid steel bar; the later part wins where they overlap.
  parts: [circle('tube', 'add', 'steel', 74), circle('core', 'add', 'fill', 46)],
});

describe('props --torsion on a section of two materials', () => {
  const gSteel = 200_000 / 2.6;
  const exactJ = (Math.PI / 2) * (37 ** 4 - 23 ** 4) + (12_000 / gSteel) * (Math.PI / 2) * 23 ** 4;

  it('--json: J = Σ G_i J_i / G_ref within 0.1 %, GJ = G_ref·J in kN·m² and each G in MPa (the metric unit system), each G with its origin', () => {
    const r = run(doc, { json: true, torsion: true });
    expect(r.err).toBe('');
    expect(r.code).toBe(0);
    const j = JSON.parse(r.out) as { J: number; GJ: number; GJUnit: string; gRef: number; shearModulusUnit: string; shearModuli: { material: string; G: number; from: string }[] };
    expect(Math.abs(j.J / exactJ - 1)).toBeLessThan(1e-3);
    expect(j.shearModulusUnit).toBe('MPa');
    expect(j.gRef).toBeCloseTo(gSteel, 9);
    // MPa × mm⁴ = N·mm² = 1e-9 kN·m² (SI prefixes, exact).
    expect(j.GJUnit).toBe('kN·m²');
    expect(j.GJ / ((gSteel * j.J) / 1e9) - 1).toBeCloseTo(0, 12);
    expect(j.shearModuli).toEqual([
      { material: 'steel', G: expect.closeTo(gSteel, 9) as unknown as number, from: 'from E and ν = 0.3: G = E/(2(1 + ν))' },
      { material: 'fill', G: 12_000, from: 'typed' },
    ]);
  });

  it('the table names GJ, G_ref and each material\'s G, and notes that the materials differ in E/G', () => {
    const r = run(doc, { torsion: true });
    expect(r.code).toBe(0);
    expect(r.out).toMatch(/GJ\s+\S+\s+kN·m²\s+torsional stiffness/);
    expect(r.out).toMatch(/Gref\s+76,923\.\d*\s+MPa\s+reference shear modulus: steel/);
    expect(r.out).toMatch(/G\s+12,000\.?\d*\s+MPa\s+fill: typed/);
    expect(r.out).toMatch(/G-weighted; the materials differ in E\/G/);
  });
});
