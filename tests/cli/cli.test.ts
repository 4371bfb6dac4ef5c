// The command line: dispatch, help, flags and the messages for bad input. Most cases run in
// process through runCli (fast); two run the real launcher as a process to prove the bin works
// after `npm ci` and that a bad file exits with code 2.
import { execFile } from 'node:child_process';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { COMMANDS } from '../../cli/main.ts';
import { cli, tempFolder } from './run-cli.ts';
import { newDocument } from '../../core/document/index.ts';

const here = dirname(fileURLToPath(import.meta.url));
const launcher = join(here, '..', '..', 'cli', 'sectionsmith.mjs');
const { dir, file } = tempFolder('sectionsmith-cli-');

const rectangle = (extra: Record<string, unknown> = {}) => ({
  id: 'p1', name: 'deck plate', type: 'rectangle', operation: 'add', material: null, visible: true,
  placement: { x: 0, y: 0, rotationDeg: 0, mirror: false }, width: 300, height: 20, ...extra,
});
const docText = (parts: unknown[]) => JSON.stringify({ ...newDocument('mm', 'Footbridge deck'), parts }, null, 2);

describe('props output', () => {
  it('--json gives the issue\'s keys in the document unit, with unit and caution (b h = 6000, b h³/12 = 200000)', async () => {
    const r = await cli('props', file('deck.json', docText([rectangle()])), '--json');
    expect(r.code).toBe(0);
    const got = JSON.parse(r.out) as Record<string, unknown>;
    for (const key of ['area', 'cx', 'cy', 'Ix', 'Iy', 'Ixy', 'I1', 'I2', 'thetaDeg', 'rx', 'ry', 'SxTop', 'SxBottom', 'SyLeft', 'SyRight', 'Zx', 'Zy', 'unit', 'caution']) {
      expect(got, key).toHaveProperty(key);
    }
    expect(got.unit).toBe('mm');
    expect(got.area).toBe(6000);
    expect(got.Ix).toBeCloseTo((300 * 20 ** 3) / 12, 6);
  });

  it('--unit on a document reports in that unit: 6000 mm² = 6000/645.16 in² (25.4² exactly)', async () => {
    const r = await cli('props', file('deck.json', docText([rectangle()])), '--json', '--unit', 'in');
    const got = JSON.parse(r.out) as { unit: string; area: number; cy: number };
    expect(got.unit).toBe('in');
    expect(Math.abs(got.area - 6000 / 645.16) / (6000 / 645.16)).toBeLessThan(1e-15);
  });

  it('the table shows symbols, values in display units and the caution line', async () => {
    const r = await cli('props', file('deck.json', docText([rectangle(), { ...rectangle({ id: 'p2', name: 'spare', visible: false }) }])));
    expect(r.code).toBe(0);
    expect(r.out).toMatch(/1 hidden part left out/);
    // 300 × 20: Ix = 200000 mm⁴ = 0.2 (10⁶ mm⁴); A = 6000 mm².
    expect(r.out).toMatch(/\n {2}Ix +0\.200000 +10⁶ mm⁴ /);
    expect(r.out).toMatch(/\n {2}area +6,000\.00 +mm² /);
    expect(r.out).toMatch(/CAUTION: Results are preliminary: verify them with a licensed engineer and the local building code, which govern\./);
  });

  it('a GeoJSON file needs --unit, and with it its coordinates are read in that unit', async () => {
    const path = file('bar.geojson', JSON.stringify({ type: 'Polygon', coordinates: [[[0, 0], [2, 0], [2, 1], [0, 1], [0, 0]]] }));
    const missing = await cli('props', path, '--json');
    expect(missing.code).toBe(2);
    expect(missing.err).toBe(`${path}: GeoJSON carries no length unit; say what its coordinates are with --unit in|ft|mm|cm|m\n`);
    const ok = await cli('props', path, '--json', '--unit', 'in');
    expect((JSON.parse(ok.out) as { area: number; unit: string }).area).toBe(2);
  });
});

describe('bad input: exit code 2 and a message naming the file and the place', () => {
  it('JSON syntax: line and column', async () => {
    const path = file('broken.json', '{\n  "format": "sectionsmith-section",\n  "parts": [1, 2,,]\n}');
    const r = await cli('props', path);
    expect(r.code).toBe(2);
    expect(r.err).toBe(`${path}: line 3, column 18: JSON syntax error: expected a value, found ","\n`);
  });

  it('schema: the JSON path with expected and got', async () => {
    const path = file('schema.json', docText([rectangle({ placement: { x: 0, y: 0, rotationDeg: 'ninety', mirror: false } })]));
    const r = await cli('props', path, '--json');
    expect(r.code).toBe(2);
    expect(r.out).toBe('');
    // docText writes the one-section (version 1) layout: the path is that file's own, and says so.
    expect(r.err).toBe(`${path}: parts[0].placement.rotationDeg: expected a finite number (degrees), got "ninety" (version 1 layout)\n`);
  });

  it('geometry in a document: the part, its JSON path down to the vertex, and the problem', async () => {
    const bow = { ...rectangle(), type: 'polygon', outer: [[0, 0], [10, 10], [10, 0], [0, 30]], holes: [] } as Record<string, unknown>;
    delete bow.width;
    delete bow.height;
    const path = file('bow.json', docText([bow]));
    const r = await cli('props', path);
    expect(r.code).toBe(2);
    expect(r.err).toMatch(new RegExp(`^${path.replace(/[.*+?^${}()|[\]\\]/g, '\\$&')}: parts\\[0\\]\\.outer\\[\\d\\]: Part "deck plate", polygon 0, outer ring: the segment from vertex 0 meets the segment from vertex 2 at \\(7\\.5, 7\\.5\\)`));
  });

  it('geometry in GeoJSON: the coordinates path of the offending vertex', async () => {
    const path = file('bow.geojson', JSON.stringify({ type: 'Feature', geometry: { type: 'Polygon', coordinates: [[[0, 0], [10, 10], [10, 0], [0, 30], [0, 0]]] } }));
    const r = await cli('props', path, '--unit', 'mm');
    expect(r.code).toBe(2);
    expect(r.err).toMatch(/bow\.geojson: geometry\.coordinates\[0\]\[0\]: Polygon 0, outer ring: the segment from vertex 0 meets the segment from vertex 2 at \(7\.5, 7\.5\)/);
  });

  it('a missing file, a file that is neither format, a bad unit and an unknown flag', async () => {
    const missing = join(dir, 'nope.json');
    expect((await cli('props', missing)).err).toBe(`${missing}: cannot read the file: no such file\n`);
    const other = file('other.json', '{"hello": 1}');
    expect((await cli('props', other)).err).toMatch(/other\.json: not a Sectionsmith document .* and not GeoJSON/);
    const unit = await cli('props', other, '--unit', 'furlong');
    expect([unit.code, unit.err]).toEqual([2, 'sectionsmith props: --unit: expected in, ft, mm, cm or m, got "furlong"\n']);
    const flag = await cli('props', other, '--jsn');
    expect(flag.code).toBe(2);
    expect(flag.err).toMatch(/Unknown option '--jsn'[\s\S]*sectionsmith help props/);
  });

  it('no command or an unknown command is a usage error', async () => {
    expect((await cli()).code).toBe(2);
    const r = await cli('propz');
    expect([r.code, r.err]).toEqual([2, `sectionsmith: no command "propz"; commands: ${COMMANDS.map((c) => c.name).join(', ')} (see sectionsmith --help)\n`]);
    expect(COMMANDS.map((c) => c.name)).toContain('props');
  });
});

describe('help', () => {
  it('--help documents every command and every flag', async () => {
    const r = await cli('--help');
    expect(r.code).toBe(0);
    for (const command of COMMANDS) {
      expect(r.out).toContain(`usage: sectionsmith ${command.usage}`);
      for (const flag of command.flags) expect(r.out).toContain(`--${flag.name}`);
    }
  });

  it('`help props` and `props --help` print the props help', async () => {
    const a = await cli('help', 'props');
    const b = await cli('props', '--help');
    expect(a.out).toBe(b.out);
    expect(a.out).toMatch(/^usage: sectionsmith props FILE \[--json\] \[--unit U\]/);
  });
});

describe('the real launcher as a process', () => {
  const run = (args: string[]) =>
    new Promise<{ code: number; stdout: string; stderr: string }>((resolve) => {
      execFile(process.execPath, [launcher, ...args], { encoding: 'utf8' }, (err, stdout, stderr) => {
        resolve({ code: err ? Number(err.code) : 0, stdout, stderr });
      });
    });

  it('runs after npm ci with no build step (--help exits 0) and a bad file exits 2 with the file named', async () => {
    const bad = file('bad-process.json', '{"format": "sectionsmith-section", "version": 7}');
    const [help, broken] = await Promise.all([run(['--help']), run(['props', bad])]);
    expect(help.code).toBe(0);
    expect(help.stdout).toMatch(/usage: sectionsmith props FILE/);
    expect(broken.code).toBe(2);
    expect(broken.stderr).toBe(`${bad}: document is version 7; this build reads up to 3. Open it with a newer Sectionsmith.\n`);
  });
});
