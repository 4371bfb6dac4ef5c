// `sectionsmith props` on a plate girder (web 1200 × 12, flanges 400 × 25 and 500 × 30 mm) with
// two 22 × 30 mm hole strips through the bottom flange: gross values ignore fastener holes, the
// net section is printed beside them, and --cutout-role sets a role for one run. Expected values
// are compositions of rectangles by hand (A = Σ b·h; Gere & Timoshenko, Mechanics of Materials).
import { mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { runCli } from '../../cli/main.ts';

const dir = mkdtempSync(join(tmpdir(), 'sectionsmith-gross-net-'));
const at = (x: number, y: number) => ({ x, y, rotationDeg: 0, mirror: false });
const rect = (id: string, width: number, height: number, x: number, y: number, extra: Record<string, unknown> = {}) => ({
  id, name: id, type: 'rectangle', operation: 'add', material: null, visible: true, placement: at(x, y), width, height, ...extra,
});
const girder = (role?: string) => join(dir, `girder-${role ?? 'none'}.json`);
function write(role?: string): string {
  const hole = (id: string, x: number) => rect(id, 22, 30, x, -615, { operation: 'subtract', ...(role ? { cutoutRole: role } : {}) });
  const doc = {
    format: 'sectionsmith-section', version: 3, name: 'Plate girder', unit: 'mm', materials: [], defaultMaterial: null,
    sections: [{ id: 's1', name: 'Plate girder', parts: [rect('web', 12, 1200, 0, 0), rect('top flange', 400, 25, 0, 612.5), rect('bottom flange', 500, 30, 0, -615), hole('hole 1', -70), hole('hole 2', 70)] }],
  };
  writeFileSync(girder(role), JSON.stringify(doc));
  return girder(role);
}

async function cli(...argv: string[]): Promise<{ code: number; out: string; err: string }> {
  let out = '';
  let err = '';
  const io = { out: (t: string) => void (out += t), err: (t: string) => void (err += t), readFile: (p: string) => readFileSync(p, 'utf8') };
  const code = await runCli(argv, io);
  return { code, out, err };
}

const GROSS = 14_400 + 10_000 + 15_000;
const NET = GROSS - 2 * 22 * 30;

describe('props: gross and net', () => {
  it('fastener holes: area is gross (39 400 mm²), net.area is 38 080 mm², fastenerHoles 2', async () => {
    const r = await cli('props', write('fastener-hole'), '--json');
    expect(r.code).toBe(0);
    const j = JSON.parse(r.out) as { area: number; fastenerHoles: number; net: { area: number } };
    expect(Math.abs(j.area - GROSS)).toBeLessThan(1e-9 * GROSS);
    expect(j.fastenerHoles).toBe(2);
    expect(Math.abs(j.net.area - NET)).toBeLessThan(1e-9 * NET);
  });

  it('the table labels the net rows and says the rest is gross', async () => {
    const r = await cli('props', write('fastener-hole'));
    expect(r.out).toMatch(/An\s+38,080(\.0)?\s+mm²\s+net area \(fastener holes deducted\)/);
    expect(r.out).toContain('deducted in the net rows only; all other values are gross');
  });

  it('voids (the default) are cut everywhere, with no net section; --cutout-role makes them fastener holes for one run', async () => {
    const plain = JSON.parse((await cli('props', write(), '--json')).out) as { area: number; fastenerHoles: number; net?: unknown };
    expect([plain.fastenerHoles, plain.net]).toEqual([0, undefined]);
    expect(Math.abs(plain.area - NET)).toBeLessThan(1e-9 * NET);
    const r = await cli('props', write(), '--json', '--cutout-role', 'hole 1=fastener-hole', '--cutout-role', 'hole 2=fastener-hole');
    const j = JSON.parse(r.out) as { area: number; net: { area: number } };
    expect(Math.abs(j.area - GROSS)).toBeLessThan(1e-9 * GROSS);
    expect(Math.abs(j.net.area - NET)).toBeLessThan(1e-9 * NET);
  });

  it('a bad --cutout-role names the part or the role and exits 2', async () => {
    const file = write();
    expect((await cli('props', file, '--cutout-role', 'hole 9=void')).err).toBe(`${file}: --cutout-role: no part named "hole 9" in section "Plate girder"\n`);
    expect((await cli('props', file, '--cutout-role', 'web=void')).err).toBe(`${file}: --cutout-role: part "web" adds material; a role belongs to a cut-out (a subtract part)\n`);
    const bad = await cli('props', file, '--cutout-role', 'hole 1=bolt');
    expect([bad.code, bad.err]).toEqual([2, `${file}: --cutout-role: expected PART=fastener-hole or PART=void (PART a part's name or id), got "hole 1=bolt"\n`]);
  });
});

describe('props --shear: the joints and their q', () => {
  it('a welded I (flanges 300 × 20, web 10 × 560 mm) under 500 kN: q = V·Af·(d − tf)/2/Ix at each flange weld, with the weld leg and the note', async () => {
    const file = join(dir, 'welded-i.json');
    writeFileSync(file, JSON.stringify({
      format: 'sectionsmith-section', version: 3, name: 'Welded I', unit: 'mm', materials: [], defaultMaterial: null,
      sections: [{ id: 's1', name: 'Welded I', parts: [rect('top', 300, 20, 0, 290), rect('web', 10, 560, 0, 0), rect('bottom', 300, 20, 0, -290)] }],
    }));
    const r = await cli('props', file, '--shear', '500kN', '--json');
    expect(r.code).toBe(0);
    const j = JSON.parse(r.out) as { shear: { qUnit: string; note: string; joints: { parts: string[]; q: number; requiredLeg: number }[] }; joints: { length: number }[] };
    // Gere & Timoshenko: q = V·Af·(d − tf)/2/Ix; Ix = 10·560³/12 + 2·(300·20³/12 + 6000·290²).
    const Ix = (10 * 560 ** 3) / 12 + 2 * ((300 * 20 ** 3) / 12 + 6000 * 290 ** 2);
    const q = (500_000 * 6000 * 580) / 2 / Ix;
    expect(j.shear.qUnit).toBe('N/mm');
    expect(j.joints.map((x) => x.length)).toEqual([10, 10]);
    expect(j.shear.joints.map((x) => x.parts)).toEqual([['top', 'web'], ['web', 'bottom']]);
    for (const x of j.shear.joints) expect(Math.abs(Math.abs(x.q) - q)).toBeLessThan(1e-9 * q);
    // AISC 360-22 §J2.4, LRFD, E70 (482.63 MPa), fillets both sides: w = q/(2·0.75·0.60·0.707·FEXX).
    expect(j.shear.joints[0]?.requiredLeg).toBeCloseTo(q / (2 * 0.75 * 0.6 * 0.707 * (70 * 6.894757293168361)), 9);
    expect(j.shear.note).toContain('the local code governs');
  });

  it('a bad --shear names the flag', async () => {
    const r = await cli('props', write(), '--shear', 'lots');
    expect([r.code, r.err.trim().startsWith('--shear: "lots" is not a number')]).toEqual([2, true]);
  });
});
