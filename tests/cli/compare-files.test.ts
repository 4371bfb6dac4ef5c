/**
 * `sectionsmith compare A.json B.json …` run as a process: several document files, one alternative
 * each. Two plates of our own (a mezzanine flitch plate 100 × 200 mm and a deeper 100 × 300 mm
 * one): A = b·h and Ix = b·h³/12 (Gere & Timoshenko, Mechanics of Materials, §12.3), so the
 * ratios to the first are 300/200 = 1.5 and (300/200)³ = 3.375 exactly; Sx = b·h²/6, ratio 2.25.
 */
import { execFileSync } from 'node:child_process';
import { mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { newDocument, serialiseDocument } from '../../core/document/index.ts';

const CLI = new URL('../../cli/sectionsmith.mjs', import.meta.url).pathname;
const dir = mkdtempSync(join(tmpdir(), 'compare-files-'));

function run(args: string[]): { code: number; out: string; err: string } {
  try {
    return { code: 0, out: execFileSync('node', [CLI, ...args], { encoding: 'utf8', stdio: ['ignore', 'pipe', 'pipe'] }), err: '' };
  } catch (e) {
    const x = e as { status: number; stdout: string; stderr: string };
    return { code: x.status, out: x.stdout, err: x.stderr };
  }
}

function plate(file: string, name: string, height: number): string {
  const doc = {
    ...newDocument('mm', name),
    parts: [{ id: 'p1', name: 'flitch plate', type: 'rectangle', operation: 'add', material: null, visible: true, placement: { x: 0, y: 0, rotationDeg: 0, mirror: false }, width: 100, height }],
  };
  const path = join(dir, file);
  writeFileSync(path, serialiseDocument(doc as Parameters<typeof serialiseDocument>[0]));
  return path;
}

const rel = (a: number, b: number): number => Math.abs(a / b - 1);

describe('sectionsmith compare with several document files', () => {
  const shallow = plate('shallow.section.json', 'plate 100x200', 200);
  const deep = plate('deep.section.json', 'plate 100x300', 300);

  it('exit 0; --json lists both by name with A = b·h, Ix = b·h³/12 and ratios 1.5, 3.375, 2.25 to the first file', () => {
    const r = run(['compare', shallow, deep, '--json']);
    expect(r.err).toBe('');
    expect(r.code).toBe(0);
    const body = JSON.parse(r.out) as { baseline: string; unit: string; caution: string; alternatives: { name: string; values: Record<string, number | null>; ratios: Record<string, number | null> }[] };
    expect(body.baseline).toBe('plate 100x200');
    expect(body.unit).toBe('mm');
    expect(body.caution).toMatch(/licensed engineer/);
    const byName = Object.fromEntries(body.alternatives.map((a) => [a.name, a]));
    expect(rel(byName['plate 100x200']!.values.A!, 100 * 200)).toBeLessThan(1e-12);
    expect(rel(byName['plate 100x300']!.values.Ix!, (100 * 300 ** 3) / 12)).toBeLessThan(1e-12);
    expect(rel(byName['plate 100x300']!.ratios.A!, 1.5)).toBeLessThan(1e-12);
    expect(rel(byName['plate 100x300']!.ratios.Ix!, 3.375)).toBeLessThan(1e-12);
    expect(rel(byName['plate 100x300']!.ratios.Sx!, 2.25)).toBeLessThan(1e-12);
    expect(byName['plate 100x200']!.ratios.Ix).toBe(1);
  });

  it('--baseline names the second file; --min-ix picks the only plate with Ix ≥ 1e8 mm⁴ (b·h³/12 = 2.25e8 vs 6.67e7); --csv writes both rows with the Ix ratio 8/27', () => {
    const csv = join(dir, 'cmp.csv');
    const r = run(['compare', shallow, deep, '--baseline', 'plate 100x300', '--min-ix', '1e8', '--csv', csv]);
    expect(r.code).toBe(0);
    expect(r.out).toContain('ratios (×) to "plate 100x300"');
    expect(r.out).toContain('lightest meeting every target (by area: no weight for every alternative): plate 100x300');
    expect(r.out).toMatch(/plate 100x200 does not meet: Ix 66670000 mm⁴ is below the minimum 100000000 mm⁴ by 33\.33 %/);
    expect(r.out).toContain('CAUTION:');
    const lines = readFileSync(csv, 'utf8').split(/\r?\n/).filter((l) => l !== '');
    expect(lines).toHaveLength(3);
    const head = lines[0]!.split(',');
    const shallowRow = lines.find((l) => l.startsWith('plate 100x200,'))!.split(',');
    // Ix ratio of the shallow plate to the deep one: (200/300)³ = 8/27.
    expect(rel(Number(shallowRow[head.indexOf('Ix (geometric) / plate 100x300')]), 8 / 27)).toBeLessThan(1e-12);
    expect(lines.filter((l) => l.startsWith('plate 100x300,'))).toHaveLength(1);
  });

  it('a missing second file is bad input (exit 2) naming it, not a partial comparison', () => {
    const missing = join(dir, 'nowhere.section.json');
    const r = run(['compare', shallow, missing]);
    expect(r.code).toBe(2);
    expect(r.err).toContain(missing);
    expect(r.out).toBe('');
  });
});
