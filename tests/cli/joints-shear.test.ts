// `props --shear … --json` and the text output: τmax per part, the stress at each joint, the EI
// share of separate plies, torsion by the parts that act together, and separate pieces and
// overlaps said in every output. References as in tests/joints: the shear formula V·Q/(I·t)
// (Gere & Timoshenko, Mechanics of Materials); the Saint-Venant series for the torsion constant
// of a rectangle (Timoshenko & Goodier, Theory of Elasticity, torsion of rectangular bars); unit
// factors from NIST SP 811 (1 lbf = 4.4482216152605 N, 1 in = 0.0254 m, exact).
import { mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { runCli } from '../../cli/main.ts';
import { builtInMaterial } from '../../core/materials/index.ts';

const dir = mkdtempSync(join(tmpdir(), 'sectionsmith-joints-'));
const rect = (id: string, width: number, height: number, x: number, y: number, material: string | null = null) => ({
  id, name: id, type: 'rectangle', operation: 'add', material, visible: true, placement: { x, y, rotationDeg: 0, mirror: false }, width, height,
});

function write(name: string, unit: string, parts: { material: string | null }[], joints: unknown[] = []): string {
  const file = join(dir, `${name}.json`);
  // The library's own entries, copied into the file (the values the material library cites).
  const materials = [...new Set(parts.map((p) => p.material).filter((m) => m !== null))].map((id) => builtInMaterial(id as string));
  writeFileSync(file, JSON.stringify({ format: 'sectionsmith-section', version: 3, name, unit, materials, defaultMaterial: null, sections: [{ id: 's1', name, parts, joints }] }));
  return file;
}

async function cli(...argv: string[]): Promise<{ code: number; out: string; err: string }> {
  let out = '';
  let err = '';
  const io = { out: (t: string) => void (out += t), err: (t: string) => void (err += t), readFile: (p: string) => readFileSync(p, 'utf8') };
  const code = await runCli(argv, io);
  return { code, out, err };
}

const rel = (got: number, want: number) => Math.abs(got - want) / Math.abs(want);

interface ShearJson {
  shear: {
    Vy: number; forceUnit: string; qUnit: string; stressUnit: string;
    joints: { parts: string[]; q: number; tauJoint: number; tauIn: Record<string, number | null> }[];
    parts: { part: string; tauMax: number; cut: { orientation: string; crossed: string[] } | null }[];
  };
  units: Record<string, string>;
  caution: string;
}

describe('props --shear: τmax per part and at the joints, every key with its unit', () => {
  // Welded I: flanges 300 × 20, web 10 × 560 mm; V = 500 kN.
  const file = write('welded-i', 'mm', [rect('top', 300, 20, 0, 290), rect('web', 10, 560, 0, 0), rect('bottom', 300, 20, 0, -290)]);
  const Ix = (10 * 560 ** 3) / 12 + 2 * ((300 * 20 ** 3) / 12 + 6000 * 290 ** 2);
  const q = (500_000 * 6000 * 290) / Ix; // N/mm
  const tauWeb = (500_000 * (6000 * 290 + (10 * 280 ** 2) / 2)) / (Ix * 10); // N/mm² = MPa

  it('metric: V in kN, q in N/mm, τ in MPa; the web τmax by V·Q/(Ix·tw)', async () => {
    const r = await cli('props', file, '--shear', '500kN', '--json');
    expect(r.code).toBe(0);
    const j = JSON.parse(r.out) as ShearJson;
    expect([j.shear.Vy, j.shear.forceUnit, j.shear.qUnit, j.shear.stressUnit]).toEqual([500, 'kN', 'N/mm', 'MPa']);
    expect(rel(j.shear.parts.find((p) => p.part === 'web')?.tauMax ?? 0, tauWeb)).toBeLessThan(1e-9);
    for (const x of j.shear.joints) {
      expect(rel(Math.abs(x.q), q)).toBeLessThan(1e-9);
      expect(rel(x.tauJoint, q / 10)).toBeLessThan(1e-9);
      expect(rel(x.tauIn.web ?? 0, q / 10)).toBeLessThan(1e-6);
    }
    for (const key of ['shear.Vy', 'shear.joints[].q', 'shear.joints[].tauJoint', 'shear.joints[].tauIn', 'shear.parts[].tauMax', 'shear.parts[].cut.at', 'joints[].length']) expect(j.units[key]).toBeTruthy();
    expect([j.units['shear.parts[].tauMax'], j.units['shear.joints[].q']]).toEqual(['MPa', 'N/mm']);
  });

  it('the text output lists τmax per part, τ at each joint, the weld note and the caution', async () => {
    const r = await cli('props', file, '--shear', '500kN');
    expect(r.code).toBe(0);
    const web = r.out.split('\n').find((l) => /^\s+τmax\s/.test(l) && l.includes('web:'));
    expect(web).toContain(`${tauWeb.toPrecision(4)}  MPa`);
    expect(r.out).toMatch(/τ joint\s+\S+\s+MPa\s+J1 top \| web: on the joint plane/);
    expect(r.out).toContain('the local code governs');
    expect(r.out).toContain('CAUTION:');
  });
});

describe('inch document: a flitch beam in kip, kip/in and ksi; EI shares of the plies', () => {
  // Two 2x10 (NDS Supplement Table 1A: 1.5 × 9.25 in) and a 3/8 × 9 in plate; E 1.6e6 psi and 29e6 psi (from memory).
  const parts = [rect('ply 1', 1.5, 9.25, -0.9375, 0, 'df-l-no2'), rect('plate', 0.375, 9, 0, 0, 'astm-a36'), rect('ply 2', 1.5, 9.25, 0.9375, 0, 'df-l-no2')];
  const bolted = [{ parts: ['ply 1', 'plate'], kind: { type: 'fastened', fastener: 'bolt', rows: 2 } }, { parts: ['plate', 'ply 2'], kind: { type: 'fastened', fastener: 'bolt', rows: 2 } }];
  const n = 29e6 / 1.6e6;
  const In = 2 * ((1.5 * 9.25 ** 3) / 12) + n * ((0.375 * 9 ** 3) / 12);

  it('bolted, under 5 kip: τ in the plate = n·V·Q_n/(I_n·Σ n·t) in ksi, q in kip/in', async () => {
    const r = await cli('props', write('flitch-bolted', 'in', parts, bolted), '--shear', '5kip', '--json');
    expect(r.code).toBe(0);
    const j = JSON.parse(r.out) as ShearJson & { plies?: unknown };
    const Qn = 2 * ((1.5 * 4.625 ** 2) / 2) + n * ((0.375 * 4.5 ** 2) / 2);
    const tauPlate = (n * 5 * Qn) / In / (2 * 1.5 + n * 0.375); // kip/in²
    expect([j.shear.Vy, j.shear.forceUnit, j.shear.qUnit, j.shear.stressUnit]).toEqual([5, 'kip', 'kip/in', 'ksi']);
    expect(rel(j.shear.parts.find((p) => p.part === 'plate')?.tauMax ?? 0, tauPlate)).toBeLessThan(1e-9);
    expect(j.plies).toBeUndefined();
  });

  it('not connected (the default): each ply\'s share of the load by EI, said in JSON and text', async () => {
    const file = write('flitch', 'in', parts);
    const j = JSON.parse((await cli('props', file, '--json')).out) as { plies: { note: string; plies: { parts: string[]; shareX: number; EIx: number }[] }; units: Record<string, string>; warnings: string[] };
    const EIw = 1.6e6 * ((1.5 * 9.25 ** 3) / 12), EIs = 29e6 * ((0.375 * 9 ** 3) / 12);
    expect(j.plies.plies.map((p) => p.parts)).toEqual([['ply 1'], ['plate'], ['ply 2']]);
    expect(rel(j.plies.plies[1]?.shareX ?? 0, EIs / (2 * EIw + EIs))).toBeLessThan(1e-12);
    // EI in kip·in²: 29e6 psi · I / 1000.
    expect(j.units['plies.plies[].EIx']).toBe('kip·in²');
    expect(rel(j.plies.plies[1]?.EIx ?? 0, EIs / 1000)).toBeLessThan(1e-12);
    expect(j.plies.note).toContain('in proportion to each ply\'s EI');
    expect(j.warnings.join(' ')).toContain('Bending properties (A, I, S, Z) assume the parts act together');
    const text = (await cli('props', file)).out;
    expect(text).toMatch(/EI share\s+\S+\s+%\s+plate: share of a vertical load/);
  });
});

describe('props --torsion: parts joined only by "not connected" twist separately', () => {
  // Two plates 10 × 100 mm side by side, touching along 100 mm, not connected.
  const file = write('two-plies', 'mm', [rect('ply 1', 10, 100, -5, 0), rect('ply 2', 10, 100, 5, 0)], [{ parts: ['ply 1', 'ply 2'], kind: { type: 'not-connected' } }]);
  // Saint-Venant series (Timoshenko & Goodier): J = b·t³/3·[1 − 192·t/(π⁵·b)·Σ_{n odd} tanh(nπb/2t)/n⁵].
  const series = (b: number, t: number): number => {
    let s = 0;
    for (let k = 1; k < 200; k += 2) s += Math.tanh((k * Math.PI * b) / (2 * t)) / k ** 5;
    return ((b * t ** 3) / 3) * (1 - ((192 * t) / (Math.PI ** 5 * b)) * s);
  };

  it('J = 2 × J(10 × 100) by the series, each piece listed, no shared Cw or shear centre', async () => {
    const r = await cli('props', file, '--torsion', '--json');
    expect(r.code).toBe(0);
    const j = JSON.parse(r.out) as { J: number; Cw: number | null; xs: number | null; torsionPieces: { parts: string[]; J: number }[]; torsionComponents: number };
    expect(rel(j.J, 2 * series(100, 10))).toBeLessThan(2e-3);
    expect(j.torsionPieces.map((p) => p.parts)).toEqual([['ply 1'], ['ply 2']]);
    expect([j.Cw, j.xs, j.torsionComponents]).toEqual([null, null, 2]);
    // Welded (the default for parts with no material), the same plates are one 20 × 100 bar.
    const welded = write('two-plies-welded', 'mm', [rect('ply 1', 10, 100, -5, 0), rect('ply 2', 10, 100, 5, 0)]);
    const w = JSON.parse((await cli('props', welded, '--torsion', '--json')).out) as { J: number };
    expect(rel(w.J, series(100, 20))).toBeLessThan(2e-3);
  });
});

describe('separate pieces and overlaps are said in the CLI output', () => {
  it('a GeoJSON of two polygons apart: "separate pieces" in JSON and text', async () => {
    const file = join(dir, 'two.geojson');
    writeFileSync(file, JSON.stringify({ type: 'MultiPolygon', coordinates: [[[[0, 0], [10, 0], [10, 100], [0, 100], [0, 0]]], [[[20, 0], [30, 0], [30, 100], [20, 100], [20, 0]]]] }));
    const j = JSON.parse((await cli('props', file, '--unit', 'mm', '--json')).out) as { pieces: number; warnings: string[] };
    expect(j.pieces).toBe(2);
    expect(j.warnings[0]).toContain('The material falls into 2 separate pieces');
    expect((await cli('props', file, '--unit', 'mm')).out).toContain('WARNING: The material falls into 2 separate pieces');
  });

  it('a duplicate part on top of another: the warning names both and the area (400 × 25 = 10 000 mm²)', async () => {
    const file = write('dup', 'mm', [rect('top flange', 400, 25, 0, 0), { ...rect('copy', 400, 25, 0, 0), name: 'top flange copy' }]);
    const text = (await cli('props', file)).out;
    expect(text).toContain('WARNING: Parts "top flange" and "top flange copy" overlap by 10000 mm²');
  });

  it('member: two plates apart say so in the text and the JSON', async () => {
    const file = write('apart', 'mm', [rect('left', 10, 100, -20, 0), rect('right', 10, 100, 20, 0)]);
    const args = ['member', file, '--span', '2m', '--support', 'simple', '--uniform', '1kN/m', '--E', '200GPa'];
    const text = await cli(...args);
    expect(text.out).toContain('WARNING: The material falls into 2 separate pieces');
    const j = JSON.parse((await cli(...args, '--json')).out) as { warnings: string[] };
    expect(j.warnings[0]).toContain('Bending properties (A, I, S, Z) assume the parts act together');
  });
});
