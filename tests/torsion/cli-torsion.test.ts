/**
 * `sectionsmith props FILE --torsion` run as a real process (the bin launcher). The section is a
 * 100 × 200 mm rectangle given as GeoJSON; its J is the Saint-Venant series 45 736 335.42 mm⁴
 * (Timoshenko & Goodier, torsion chapter; analytic reference values), and its shear centre is
 * the centroid (50, 100) by double symmetry.
 */
import { execFile } from 'node:child_process';
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { rectangleSeriesJ } from './shapes.ts';

const here = dirname(fileURLToPath(import.meta.url));
const launcher = join(here, '..', '..', 'cli', 'sectionsmith.mjs');
const dir = mkdtempSync(join(tmpdir(), 'sectionsmith-torsion-'));
const geojson = join(dir, 'plate.geojson');
writeFileSync(geojson, JSON.stringify({ type: 'Polygon', coordinates: [[[0, 0], [100, 0], [100, 200], [0, 200], [0, 0]]] }));

function run(...args: string[]): Promise<{ code: number; out: string; err: string }> {
  return new Promise((resolve) => {
    execFile(process.execPath, [launcher, ...args], { timeout: 60_000 }, (error, stdout, stderr) => {
      resolve({ code: error ? Number(error.code ?? 1) : 0, out: stdout, err: stderr });
    });
  });
}

describe('props --torsion (process)', () => {
  it('--json adds J (within 0.1 % of the series), Cw, xs, ys at the centroid, meshElements and jRelativeError', async () => {
    const r = await run('props', geojson, '--unit', 'mm', '--torsion', '--json');
    expect(r.code, r.err).toBe(0);
    const got = JSON.parse(r.out) as Record<string, number>;
    for (const key of ['J', 'Cw', 'xs', 'ys', 'meshElements', 'jRelativeError', 'caution']) expect(got, key).toHaveProperty(key);
    expect(45736335.42391449 / rectangleSeriesJ(100, 200) - 1).toBeLessThan(1e-12);
    expect(Math.abs((got.J ?? 0) / 45736335.42391449 - 1)).toBeLessThan(1e-3);
    expect(Math.abs((got.xs ?? 0) - 50)).toBeLessThan(1e-3); // mesh not exactly symmetric: 1e-5 of the size
    expect(Math.abs((got.ys ?? 0) - 100)).toBeLessThan(1e-3);
    expect(got.meshElements).toBeGreaterThan(0);
    expect(got.jRelativeError).toBeGreaterThanOrEqual(0);
  });
  it('the table gains J, Cw, xs, ys rows and keeps the caution line; without --torsion there is no J row', async () => {
    const r = await run('props', geojson, '--unit', 'mm', '--torsion');
    expect(r.code, r.err).toBe(0);
    expect(r.out).toMatch(/^\s+J\s+45,7\d\d,\d\d\d\s+mm⁴\s+torsion constant/m);
    expect(r.out).toMatch(/^\s+Cw\s/m);
    expect(r.out).toMatch(/^\s+xs\s+50(\.0+)?\s+mm/m);
    expect(r.out).toMatch(/CAUTION/);
    const plain = await run('props', geojson, '--unit', 'mm');
    expect(plain.out).not.toMatch(/^\s+J\s/m);
  });
});
