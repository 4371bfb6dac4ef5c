/**
 * Units on the command line's remaining bare-number inputs (issue 11 item 5): `part TYPE
 * key=value` lengths and the compare targets --min-ix, --min-sx, --min-zx. A bare number keeps
 * its stated meaning (--unit, or the comparison unit's powers); a value with a unit is converted.
 *
 * Hand calculations (exact arithmetic; 1 in = 25.4 mm, 1 ft = 12 in exactly, NIST SP 811 App. B.8):
 * - I-shape without fillets, d = 14, bf = 10, tw = 1/2, tf = 3/4 in:
 *   A = 2·bf·tf + (d − 2tf)·tw = 15 + 6.25 = 21.25 in² = 21.25 × 645.16 mm² = 13,709.65 mm².
 *   Ix = [bf·d³ − (bf − tw)(d − 2tf)³]/12 = (27,440 − 9.5 · 1953.125)/12 = 8885.3125/12 = 740.442708… in⁴
 *   (Gere & Timoshenko, Mechanics of Materials, §12.4).
 * - Trailer crossmember alternatives (inch): bar 4 × 8 (Ix = 4·8³/12 = 170.667 in⁴, Sx = 42.667 in³),
 *   box 6 × 10 less 4 × 8 (Ix = (6000 − 2048)/12 = 329.333 in⁴, Sx = Ix/5 = 65.867 in³).
 */
import { describe, expect, it } from 'vitest';
import type { CliIo, FlagValues } from '../../cli/command.ts';
import { compareCommand } from '../../cli/commands/compare.ts';
import { partCommand } from '../../cli/commands/part.ts';

interface Out { code: number; out: string; err: string }

async function run(command: typeof partCommand, positionals: string[], flags: FlagValues, file = ''): Promise<Out> {
  let out = '', err = '';
  const io: CliIo = { out: (t) => { out += t; }, err: (t) => { err += t; }, readFile: () => file };
  const code = await command.run(positionals, flags, io, {});
  return { code, out, err };
}

const rect = (id: string, w: number, h: number, operation = 'add') => ({ id, name: id, type: 'rectangle', operation, material: null, visible: true, placement: { x: 0, y: 0, rotationDeg: 0, mirror: false }, width: w, height: h });
const alternatives = JSON.stringify({
  format: 'sectionsmith-section', version: 2, name: 'trailer crossmember', unit: 'in', materials: [], defaultMaterial: null,
  sections: [
    { id: 's1', name: 'bar 4x8', parts: [rect('bar', 4, 8)] },
    { id: 's2', name: 'box 6x10', parts: [rect('outer', 6, 10), rect('void', 4, 8, 'subtract')] },
  ],
});

describe('part TYPE key=value takes units', () => {
  const IX = (10 * 14 ** 3 - 9.5 * 12.5 ** 3) / 12;

  it('d=14in bf=10in tw=1/2in tf=3/4" with --unit mm: A = 21.25 in² = 13,709.65 mm², Ix = 740.4427 in⁴ in mm⁴', async () => {
    const r = await run(partCommand, ['i-shape', 'd=14in', 'bf=10in', 'tw=1/2in', 'tf=3/4"'], { unit: 'mm', json: true });
    expect(r.err).toBe('');
    const j = JSON.parse(r.out) as { area: number; Ix: number; params: Record<string, number>; paramsUnit: string; units: Record<string, string> };
    expect(j.paramsUnit).toBe('mm');
    expect([j.units['params.d'], j.units['params.tf']]).toEqual(['mm', 'mm']);
    expect(j.params.d).toBeCloseTo(355.6, 10);
    expect(j.area / 13709.65 - 1).toBeLessThan(1e-12);
    expect(Math.abs(j.Ix / (IX * 25.4 ** 4) - 1)).toBeLessThan(1e-12);
  });

  it('bare numbers are in --unit (default in), and d=1\'-2" is 14 in', async () => {
    const bare = JSON.parse((await run(partCommand, ['i-shape', 'd=14', 'bf=10', 'tw=0.5', 'tf=3/4'], { json: true })).out) as { area: number; Ix: number };
    const feet = JSON.parse((await run(partCommand, ['i-shape', 'd=1\'-2"', 'bf=10', 'tw=0.5', 'tf=3/4'], { json: true })).out) as { area: number; Ix: number };
    expect(bare.area).toBeCloseTo(21.25, 12);
    expect(Math.abs(bare.Ix / IX - 1)).toBeLessThan(1e-12);
    expect(Math.abs(feet.Ix / bare.Ix - 1)).toBeLessThan(1e-14);
  });

  it('a force as a dimension, an unknown unit and a unit on lumber\'s nominal size are refused naming the key and text', async () => {
    const force = await run(partCommand, ['i-shape', 'd=14kN', 'bf=10', 'tw=0.5', 'tf=0.75'], {});
    expect(force.code).toBe(2);
    expect(force.err).toMatch(/d=14kN: "14kN" is a force, not a length/);
    expect((await run(partCommand, ['i-shape', 'd=14 furlong', 'bf=10', 'tw=0.5', 'tf=0.75'], {})).err).toMatch(/d=14 furlong: unknown unit "furlong"/);
    const lumber = await run(partCommand, ['lumber', 'b=2in', 'd=10'], {});
    expect(lumber.code).toBe(2);
    expect(lumber.err).toMatch(/b=2in: b is a nominal size in inches.*no unit/);
  });
});

describe('compare --min-ix, --min-sx and --min-zx take units', () => {
  type Pick = { pick: { name: string | null; failing: unknown[] } | null };
  const pick = async (flags: FlagValues): Promise<Pick> => JSON.parse((await run(compareCommand, ['alts.json'], { ...flags, json: true }, alternatives)).out) as Pick;

  it('--min-ix 200 (bare: in⁴ in an inch comparison), 200in4 and 8324.67cm4 all pick the box (329.3 in⁴) over the bar (170.7 in⁴)', async () => {
    for (const t of ['200', '200in4', '200 in^4', `${200 * 2.54 ** 4}cm4`]) {
      const p = await pick({ 'min-ix': t });
      expect([t, p.pick?.name]).toEqual([t, 'box 6x10']);
    }
    // 170 in⁴ = 7075.9 cm⁴: both meet it, and the lighter (by area: bar 32 in², box 28 in²) is the box.
    expect((await pick({ 'min-ix': `${160 * 2.54 ** 4} cm4` })).pick?.failing).toEqual([]);
  });

  it('--min-sx 50in3: the bar (42.67 in³) fails and the box (65.87 in³) meets it; 50 bare the same', async () => {
    for (const t of ['50in3', '50', `${50 * 16.387064}cm3`]) {
      const p = await pick({ 'min-sx': t });
      expect([t, p.pick?.name, p.pick?.failing.length]).toEqual([t, 'box 6x10', 1]);
    }
  });

  it('a length given as --min-ix or --min-zx is refused naming the flag and the text', async () => {
    const r = await run(compareCommand, ['alts.json'], { 'min-ix': '72in' }, alternatives);
    expect(r.code).toBe(2);
    expect(r.err).toMatch(/--min-ix: "72in" is a length, not a second moment of area/);
    expect((await run(compareCommand, ['alts.json'], { 'min-zx': '5in4' }, alternatives)).err).toMatch(/--min-zx: "5in4" is a second moment of area.*not a section modulus/);
  });
});

describe('props --json says the unit of every number (issue 11 item 3)', () => {
  it('a flitch beam of two materials in inches, with --torsion: every numeric key has its unit, stiffnesses in kip·in², G in ksi', async () => {
    const { propsCommand } = await import('../../cli/commands/props.ts');
    const { builtInMaterial } = await import('../../core/materials/library.ts');
    const part = (id: string, w: number, h: number, x: number, material: string | null) => ({ ...rect(id, w, h), placement: { x, y: 0, rotationDeg: 0, mirror: false }, material });
    const flitch = JSON.stringify({
      format: 'sectionsmith-section', version: 2, name: 'mezzanine flitch beam', unit: 'in', materials: [builtInMaterial('df-l-no2'), builtInMaterial('astm-a36')], defaultMaterial: 'df-l-no2',
      sections: [{ id: 's', name: 'flitch', parts: [part('left', 1.5, 9.25, -1, null), part('plate', 0.5, 9, 0, 'astm-a36'), part('right', 1.5, 9.25, 1, null)] }],
    });
    const r = await run(propsCommand, ['flitch.json'], { json: true, torsion: true }, flitch);
    expect(r.err).toBe('');
    const j = JSON.parse(r.out) as Record<string, unknown> & { units: Record<string, string> };
    const missing = Object.entries(j).filter(([k, v]) => typeof v === 'number' && !Object.hasOwn(j.units, k)).map(([k]) => k);
    expect(missing).toEqual([]);
    expect([j.units.EIx, j.units.GJ, j.units.gRef, j.units.weightPerLength]).toEqual(['kip·in²', 'kip·in²', 'ksi', 'lb/ft']);
  });
});

describe('rounding residue is printed and exported as 0 (issue 11 item 4: "cx 1.5e-14")', () => {
  it('three 0.1 × 0.3 m steel bars at (−0.1, 0.5), (0.2, 0), (−0.1, −0.5): x̄E = Σ A·x / ΣA = 0, EIxy = E·Σ A·x·y = 0, θ = 0 exactly, not 1e-17 and 1e-11', async () => {
    const { propsCommand } = await import('../../cli/commands/props.ts');
    const { builtInMaterial } = await import('../../core/materials/library.ts');
    const bar = (id: string, x: number, y: number) => ({ ...rect(id, 0.1, 0.3), placement: { x, y, rotationDeg: 0, mirror: false } });
    const three = JSON.stringify({
      format: 'sectionsmith-section', version: 2, name: 'trailer frame', unit: 'm', materials: [builtInMaterial('astm-a36')], defaultMaterial: 'astm-a36',
      sections: [{ id: 's', name: 'three bars', parts: [bar('a', -0.1, 0.5), bar('b', 0.2, 0), bar('c', -0.1, -0.5)] }],
    });
    const r = await run(propsCommand, ['three.json'], { json: true }, three);
    const j = JSON.parse(r.out) as Record<string, number>;
    expect([j.cx, j.cy, j.Ixy, j.cxE, j.cyE, j.EIxy, j.thetaEIDeg]).toEqual([0, 0, 0, 0, 0, 0, 0]);
    // A value that is not residue is kept: the plastic neutral axis for y bending splits the area in half at x = −0.075 (exact arithmetic).
    expect(j.pnaX).toBeCloseTo(-0.075, 12);
  });
});

describe('compare target messages in the unit system', () => {
  it('an inch comparison under 6 kip/ft on 20 ft: the bar\'s stress M/S = (0.5 · 240² / 8) / 42.667 = 84.38 ksi against 50 ksi (A992 fy, from memory), in ksi not psi', async () => {
    const { builtInMaterial } = await import('../../core/materials/library.ts');
    const steel = JSON.stringify({ ...JSON.parse(alternatives), materials: [builtInMaterial('astm-a992')], defaultMaterial: 'astm-a992' });
    const r = await run(compareCommand, ['alts.json'], { span: '20ft', load: '6kip/ft', stress: true }, steel);
    expect(r.out).toMatch(/bar 4x8 does not meet: bending stress in Steel ASTM A992 \(Fy 50 ksi\) 84\.3[78] ksi is 168\.[78] % of its limit 50 ksi/);
    expect(r.out).not.toMatch(/psi/);
  });
});
