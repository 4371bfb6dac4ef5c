// Documents with several sections (alternatives) through the real command line, as processes
// (`node cli/sectionsmith.mjs …`): props and member read the first section or --section NAME,
// an unknown name is bad input listing the names, and compare takes every section of every file.
// The input is the golden two-section document (tests/golden/two-alternatives): a solid
// 120 × 200 mm bar and a 200 × 300 mm box with a centred 100 × 200 mm void. Expected values are
// closed forms of rectangles (A = b·h, I = b·h³/12; Gere & Timoshenko, Mechanics of Materials).
import { execFile } from 'node:child_process';
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { beforeAll, describe, expect, it } from 'vitest';

const here = dirname(fileURLToPath(import.meta.url));
const launcher = join(here, '..', '..', 'cli', 'sectionsmith.mjs');
const twoSections = join(here, '..', 'golden', 'two-alternatives', 'input.json');
const dir = mkdtempSync(join(tmpdir(), 'sectionsmith-sections-'));

// A one-section file in the version 1 layout: a 100 × 100 mm square bar.
const squareBar = join(dir, 'square-bar.json');
writeFileSync(squareBar, JSON.stringify({
  format: 'sectionsmith-section', version: 1, name: 'Square bar 100', unit: 'mm', materials: [], defaultMaterial: null,
  parts: [{ id: 'p1', name: 'bar', type: 'rectangle', operation: 'add', material: null, visible: true, placement: { x: 0, y: 0, rotationDeg: 0, mirror: false }, width: 100, height: 100 }],
}));

interface Run { readonly code: number | null; readonly out: string; readonly err: string }

function run(args: readonly string[]): Promise<Run> {
  return new Promise((resolve) => {
    execFile(process.execPath, [launcher, ...args], { encoding: 'utf8' }, (err, out, errText) => {
      resolve({ code: err ? (typeof err.code === 'number' ? err.code : null) : 0, out, err: errText });
    });
  });
}

const CASES = {
  first: ['props', twoSections, '--json'],
  second: ['props', twoSections, '--json', '--section', 'Hollow box'],
  loose: ['props', twoSections, '--section', '  hollow BOX'],
  unknown: ['props', twoSections, '--section', 'Channel'],
  member: ['member', twoSections, '--section', 'Hollow box', '--span', '4000', '--support', 'simple', '--uniform', '10kN/m', '--E', '200GPa', '--json'],
  compareOne: ['compare', twoSections, '--json'],
  compareTwo: ['compare', twoSections, squareBar, '--json', '--baseline', 'Square bar 100'],
} as const;
const runs: Partial<Record<keyof typeof CASES, Run>> = {};

beforeAll(async () => {
  // All at once: each process pays the node + tsx start-up once.
  await Promise.all(Object.entries(CASES).map(async ([k, args]) => {
    runs[k as keyof typeof CASES] = await run(args);
  }));
}, 60_000);

const json = (r: Run | undefined): Record<string, unknown> => JSON.parse(r?.out ?? '{}') as Record<string, unknown>;
const close = (got: unknown, want: number): void => {
  expect(typeof got).toBe('number');
  expect(Math.abs((got as number) - want)).toBeLessThanOrEqual(1e-9 * Math.abs(want));
};

describe('props and member on a document with two sections', () => {
  it('props reads the first section by default: the 120 × 200 bar, A = 24000 mm², Ix = 120·200³/12 = 8e7 mm⁴', () => {
    expect(runs.first?.code).toBe(0);
    const r = json(runs.first);
    expect(r.section).toBe('Solid bar 120 x 200');
    close(r.area, 24000);
    close(r.Ix, 8e7);
  });

  it('--section NAME reads that section: the box, A = 200·300 − 100·200 = 40000 mm², Ix = (200·300³ − 100·200³)/12', () => {
    expect(runs.second?.code).toBe(0);
    const r = json(runs.second);
    expect(r.section).toBe('Hollow box');
    close(r.area, 40000);
    close(r.Ix, (200 * 300 ** 3 - 100 * 200 ** 3) / 12);
  });

  it('a name differing only in case and spaces finds the one section; the table names document and section', () => {
    expect(runs.loose?.code).toBe(0);
    expect(runs.loose?.out).toContain('Sectionsmith document "Trailer crossmember", section "Hollow box" (2 of 2), 2 parts');
  });

  it('an unknown section is bad input (exit 2) naming the file and listing the sections', () => {
    expect(runs.unknown?.code).toBe(2);
    expect(runs.unknown?.out).toBe('');
    expect(runs.unknown?.err).toBe(`${twoSections}: --section: no section named "Channel"; the sections are "Solid bar 120 x 200", "Hollow box"\n`);
  });

  it('member --section checks the box: EI = E·Ix and midspan deflection 5wL⁴/(384EI) (Gere & Timoshenko, simple beam, uniform load)', () => {
    expect(runs.member?.err).toBe('');
    expect(runs.member?.code).toBe(0);
    const r = json(runs.member);
    const EI = 200_000 * ((200 * 300 ** 3 - 100 * 200 ** 3) / 12); // N/mm² · mm⁴
    close(r.EI, EI / 1e9); // reported in kN·m²: 1 kN·m² = 1e9 N·mm²
    close(r.deflectionMax, (5 * 10 * 4000 ** 4) / (384 * EI)); // 10 kN/m = 10 N/mm
  });
});

describe('compare takes every section of every file', () => {
  it('one document with two sections compares them: A ratio 40000/24000 and Ix ratio (1150e6/3)/8e7 to the first', () => {
    expect(runs.compareOne?.err).toBe('');
    expect(runs.compareOne?.code).toBe(0);
    const c = json(runs.compareOne) as { baseline: string; alternatives: { name: string; ratios: Record<string, number> }[] };
    expect(c.baseline).toBe('Solid bar 120 x 200');
    expect(c.alternatives.map((a) => a.name)).toEqual(['Solid bar 120 x 200', 'Hollow box']); // sorted by A: 24000 < 40000
    close(c.alternatives[1]?.ratios.A, 40000 / 24000);
    close(c.alternatives[1]?.ratios.Ix, 1150e6 / 3 / 8e7);
  });

  it('a two-section file and a one-section (version 1) file give three alternatives; ratios to the square bar (A = 1e4 mm²)', () => {
    expect(runs.compareTwo?.err).toBe('');
    expect(runs.compareTwo?.code).toBe(0);
    const c = json(runs.compareTwo) as { alternatives: { name: string; ratios: Record<string, number> }[] };
    // Listed sorted by A (the default --sort): 1e4, 2.4e4, 4e4 mm².
    expect(c.alternatives.map((a) => a.name)).toEqual(['Square bar 100', 'Solid bar 120 x 200', 'Hollow box']);
    close(c.alternatives[1]?.ratios.A, 24000 / 10000);
    close(c.alternatives[2]?.ratios.A, 40000 / 10000);
  });
});
