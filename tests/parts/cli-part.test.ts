/**
 * `sectionsmith part`: the command object run with a recording io (the dispatcher lists it in
 * cli/main.ts). Expected values are closed forms or the AISC table, named beside each check.
 */
import { describe, expect, it } from 'vitest';
import { partCommand, parseDimension } from '../../cli/commands/part.ts';
import { PROPERTY_CATALOGUE } from '../../core/properties/catalogue.ts';
import { CAUTION } from '../../cli/command.ts';

async function run(positionals: string[], flags: Record<string, string | boolean> = {}): Promise<{ code: number; out: string; err: string }> {
  let out = '';
  let err = '';
  const code = await partCommand.run(positionals, flags, { out: (t) => void (out += t), err: (t) => void (err += t), readFile: () => '' });
  return { code, out, err };
}

async function runJson(positionals: string[], flags: Record<string, string | boolean> = {}): Promise<Record<string, unknown>> {
  const result = await run(positionals, { ...flags, json: true });
  expect(result.err).toBe('');
  expect(result.code).toBe(0);
  return JSON.parse(result.out) as Record<string, unknown>;
}

describe('sectionsmith part', () => {
  it('reads decimals, fractions and mixed numbers; rejects anything else', () => {
    expect(parseDimension('0.75')).toBe(0.75);
    expect(parseDimension('3/4')).toBe(0.75);
    expect(parseDimension('1-1/2')).toBe(1.5);
    expect(parseDimension('1e-3')).toBe(0.001);
    expect(parseDimension('12in')).toBeNaN();
  });

  it('round-bar d=2: JSON has every props key, Ix = πd⁴/64 = π/4 (Gere & Timoshenko, App. D) and the caution', async () => {
    const j = await runJson(['round-bar', 'd=2']);
    for (const key of [...PROPERTY_CATALOGUE.map((r) => r.key), 'isotropic']) expect(j, key).toHaveProperty(key);
    expect((j['units'] as Record<string, string>)['Ix']).toBe('in⁴');
    expect(Math.abs((j['Ix'] as number) / (Math.PI / 4) - 1)).toBeLessThan(1e-12);
    expect(j['caution']).toBe(CAUTION);
    expect(j['part']).toBe('round-bar');
  });

  it('plate b=12 t=3/4 prints a table with A = 9 in² and the caution', async () => {
    const { code, out } = await run(['plate', 'b=12', 't=3/4']);
    expect(code).toBe(0);
    expect(out).toMatch(/area\s+9\.00000\s+in²/);
    expect(out).toContain('plate: b=12 t=0.75 [in]');
    expect(out).toContain(`CAUTION: ${CAUTION}`);
  });

  it('--unit mm reads the dimensions in mm: plate 300 × 20 has A = 6000 mm² (exact)', async () => {
    const j = await runJson(['plate', 'b=300', 't=20'], { unit: 'mm' });
    expect(j['area']).toBe(6000);
    expect(j['unit']).toBe('mm');
  });

  it('--designation W14X90: A within 1 % of the AISC v15.0 table (26.5 in²), with its modelling notes', async () => {
    const j = await runJson([], { designation: 'W14X90' });
    expect(Math.abs((j['area'] as number) / 26.5 - 1)).toBeLessThan(0.01);
    expect(j['designation']).toBe('W14X90');
    expect(String(j['modelling'])).toContain('kdes − tf');
  });

  it('--designation with --unit mm reports in mm: a 2x10 is 38.1 × 234.95 mm (1.5 × 9.25 in × 25.4)', async () => {
    const j = await runJson([], { designation: '2x10', unit: 'mm' });
    expect(Math.abs((j['area'] as number) / (1.5 * 9.25 * 25.4 ** 2) - 1)).toBeLessThan(1e-12);
  });

  it('exits 2 naming the problem: unknown type, bad value, impossible dimensions, unknown designation', async () => {
    const cases: [string[], Record<string, string>, string][] = [
      [['hexagon'], {}, 'no part type "hexagon"'],
      [['plate', 'b=twelve', 't=1'], {}, 'b=twelve: "twelve" is not a number'],
      [['plate', 'b'], {}, '"b" is not key=value'],
      [['i-shape', 'd=1.5', 'bf=2', 'tw=0.2', 'tf=0.9'], {}, 'tf = 0.9 is not less than half of d = 1.5'],
      [[], { designation: 'W14X91' }, 'no catalogue entry "W14X91"'],
      [['plate', 'b=1', 't=1'], { unit: 'yd' }, '--unit: expected in, ft, mm, cm or m'],
    ];
    for (const [positionals, flags, message] of cases) {
      const { code, err, out } = await run(positionals, flags);
      expect(code, message).toBe(2);
      expect(err).toContain(message);
      expect(out).toBe('');
    }
  });
});
