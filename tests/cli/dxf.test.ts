// DXF through the command line (in process, through the same flag parser as `sectionsmith`):
// props and member read a drawing, --layer and --parts choose what is read, a drawing without
// $INSUNITS needs --unit, errors exit 2 naming the entity, and props --dxf writes a drawing that
// reads back with the same properties. Expected values: annulus A = π(ro² − ri²) (Roark, Table A.1).
import { mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { COMMANDS, parseFlags } from '../../cli/main.ts';

const fixture = (name: string): string => new URL(`../fixtures/dxf/${name}`, import.meta.url).pathname;
const dir = mkdtempSync(join(tmpdir(), 'sectionsmith-dxf-'));

async function run(args: readonly string[]): Promise<{ code: number; out: string; err: string }> {
  const [name, ...rest] = args;
  const command = COMMANDS.find((c) => c.name === name);
  if (!command) throw new Error(`no command ${String(name)}`);
  const { positionals, flags, lists } = parseFlags(command, rest);
  let out = '', err = '';
  const code = await command.run(positionals, flags, { out: (t) => (out += t), err: (t) => (err += t), readFile: (p) => readFileSync(p, 'utf8') }, lists);
  return { code, out, err };
}

describe('sectionsmith with DXF drawings', () => {
  it('props reads a DXF: the pipe A = π(ro² − ri²) to 1e-12, the unit from $INSUNITS, the import notes on stderr', async () => {
    const r = await run(['props', fixture('pipe-lwpolyline.dxf'), '--json']);
    expect(r.code).toBe(0);
    const body = JSON.parse(r.out) as { area: number; unit: string };
    expect(body.unit).toBe('mm');
    expect(Math.abs(body.area - Math.PI * 900) / (Math.PI * 900)).toBeLessThan(1e-12);
    expect(r.err).toContain("unit: mm, from the file's $INSUNITS = 4");
  });

  it('--unit is required for a drawing without $INSUNITS, and then says what its coordinates are', async () => {
    const missing = await run(['props', fixture('error-no-unit.dxf')]);
    expect(missing.code).toBe(2);
    expect(missing.err).toContain('no $INSUNITS');
    expect(missing.err).toContain('--unit');
    const given = await run(['props', fixture('error-no-unit.dxf'), '--unit', 'in', '--json']);
    expect(given.code).toBe(0);
    expect(JSON.parse(given.out)).toMatchObject({ unit: 'in', area: 5000 });
  });

  it('--layer (repeatable) and --parts one choose the geometry; several layers read by default are named in a note', async () => {
    const all = await run(['props', fixture('two-layers.dxf'), '--json']);
    expect(all.err).toContain('read every layer with geometry: "FLANGE" (1), "OTHER" (1), "WEB" (1)');
    const body = JSON.parse(all.out) as { area: number; parts: number };
    expect(body.parts).toBe(3);
    expect(body.area).toBeCloseTo(2100, 9);
    const chosen = await run(['props', fixture('two-layers.dxf'), '--layer', 'FLANGE', '--layer', 'WEB', '--parts', 'one', '--json']);
    expect(JSON.parse(chosen.out)).toMatchObject({ area: 2000, parts: 1 });
    const bad = await run(['props', fixture('two-layers.dxf'), '--parts', 'two']);
    expect(bad.code).toBe(2);
    expect(bad.err).toContain('--parts: expected each or one');
  });

  it('a bad drawing exits 2 and names the entity type, handle and layer', async () => {
    const r = await run(['props', fixture('error-open-chain.dxf')]);
    expect(r.code).toBe(2);
    expect(r.err).toMatch(/error-open-chain\.dxf: LINE handle [0-9A-F]+ on layer "PROFILE".*does not close/);
  });

  it('member reads a DXF as it reads a document', async () => {
    const r = await run(['member', fixture('circle.dxf'), '--span', '300', '--support', 'simple', '--uniform', '1kN/m', '--E', '200GPa', '--json']);
    expect(r.code).toBe(0);
  });

  it('props --dxf OUT --dxf-parts writes a drawing whose SECTION layer reads back with the same properties', async () => {
    const example = new URL('../../assets/examples/footbridge-box-girder.section.json', import.meta.url).pathname;
    const out = join(dir, 'girder.dxf');
    const first = await run(['props', example, '--json', '--dxf', out, '--dxf-parts']);
    expect(first.code).toBe(0);
    const back = await run(['props', out, '--layer', 'SECTION', '--json']);
    expect(back.code).toBe(0);
    const a = JSON.parse(first.out) as Record<string, number>, b = JSON.parse(back.out) as Record<string, number>;
    for (const key of ['area', 'Ix', 'Iy', 'SxTop', 'SxBottom', 'Zx', 'Zy', 'rx', 'ry']) expect(Math.abs((b[key] ?? 0) - (a[key] ?? 0)) / Math.abs(a[key] ?? 1), key).toBeLessThan(1e-12);
    const text = readFileSync(out, 'utf8');
    expect(text).toMatch(/\nPART-/);
    expect(text).toContain('CAUTION: Results are preliminary');
  });
});

describe('sectionsmith part outline --points and part --dxf', () => {
  it('part outline --points reads a spreadsheet list (header, semicolons, a radius column) into an outline: A = 40·10 + π·5²/2', async () => {
    const file = join(dir, 'slot-end.csv');
    writeFileSync(file, 'x;y;radius\n0;0;0\n40;0;5\n40;10;0\n0;10;0\n');
    const r = await run(['part', 'outline', '--points', file, '--unit', 'mm', '--json']);
    expect(r.code).toBe(0);
    const body = JSON.parse(r.out) as { area: number; unit: string };
    expect(body.unit).toBe('mm');
    expect(Math.abs(body.area - (400 + (Math.PI * 25) / 2)) / 400).toBeLessThan(1e-12);
  });

  it('part outline names the line and column of a bad value, and exits 2', async () => {
    const file = join(dir, 'bad.csv');
    writeFileSync(file, '0\t0\n40\tforty\n40\t10\n');
    const r = await run(['part', 'outline', '--points', file]);
    expect(r.code).toBe(2);
    expect(r.err).toContain('bad.csv: line 2, column 2: "forty" is not a number');
  });

  it('part --designation … --dxf writes the part, which reads back with the same area (AISC v15.0 W14X90: A = 26.5 in², published, within 1 %)', async () => {
    const out = join(dir, 'w14x90.dxf');
    const first = await run(['part', '--designation', 'W14X90', '--json', '--dxf', out]);
    expect(first.code).toBe(0);
    const back = await run(['props', out, '--layer', 'SECTION', '--json']);
    const a = (JSON.parse(first.out) as { area: number }).area, b = (JSON.parse(back.out) as { area: number; unit: string });
    expect(b.unit).toBe('in');
    expect(Math.abs(b.area - a) / a).toBeLessThan(1e-12);
    expect(Math.abs(b.area - 26.5) / 26.5).toBeLessThan(0.01);
  });
});
