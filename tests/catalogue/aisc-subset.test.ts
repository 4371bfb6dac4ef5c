/**
 * Every shape of tests/fixtures/aisc-v15-subset.csv, and the values quoted in issue 16
 * (tests/fixtures/aisc-v15-quoted.csv), rebuilt from the catalogue (published dimensions and the
 * family rules of core/catalogue/conventions.ts, docs/catalogue-conventions.md) and checked
 * against the TABULATED properties of the AISC Shapes Database v15.0 (AISC, Nov 2017; consistent
 * with the Steel Construction Manual, 15th ed.).
 *
 * Tolerance (issue 16): A within 1 %, I, S, Z, r within 1.5 % for EVERY family — no family has a
 * widened budget. The published values that the rebuilt geometry does not reproduce are listed
 * in NOT_REPRODUCED with the reason, and the test holds that they are still outside (so the list
 * cannot go stale) and that docs/catalogue-conventions.md names them.
 */
import { readFileSync } from 'node:fs';
import Papa from 'papaparse';
import { describe, expect, it } from 'vitest';
import { partFromDesignation } from '../../core/catalogue/index.ts';
import { getPartType } from '../../core/parts/index.ts';
import { sectionProperties } from '../../core/properties/index.ts';
import type { SectionProperties } from '../../core/properties/types.ts';

type Row = Record<string, string>;
const ROWS = Papa.parse<Row>(readFileSync(new URL('../fixtures/aisc-v15-subset.csv', import.meta.url), 'utf8'), { header: true, skipEmptyLines: true }).data;

interface Check {
  readonly name: string;
  readonly column: string;
  readonly value: (p: SectionProperties) => number;
}

const CHECKS: readonly Check[] = [
  { name: 'A', column: 'A_in2', value: (p) => p.area },
  { name: 'Ix', column: 'Ix_in4', value: (p) => p.Ix },
  { name: 'Iy', column: 'Iy_in4', value: (p) => p.Iy },
  { name: 'Sx', column: 'Sx_in3', value: (p) => Math.min(p.SxTop, p.SxBottom) },
  { name: 'Sy', column: 'Sy_in3', value: (p) => Math.min(p.SyLeft, p.SyRight) },
  { name: 'Zx', column: 'Zx_in3', value: (p) => p.Zx },
  { name: 'Zy', column: 'Zy_in3', value: (p) => p.Zy },
  { name: 'rx', column: 'rx_in', value: (p) => p.rx },
  { name: 'ry', column: 'ry_in', value: (p) => p.ry },
];

const LIMITS: Readonly<Record<string, number>> = { A: 0.01, Ix: 0.015, Iy: 0.015, Sx: 0.015, Sy: 0.015, Zx: 0.015, Zy: 0.015, rx: 0.015, ry: 0.015, Iw: 0.015, Iz: 0.015 };

/**
 * Published values no family rule tried reproduces, by "LABEL PROPERTY". The minor principal
 * moment of L4X4X1/2 is 1.8 % above the table with the angle rule (root 3/4·(kdes − t), toe
 * r/2): a toe radius of 3/8·t meets it, but puts L6X4X3/8 Zy 1.85 % above the table and more angle
 * weights outside (docs/catalogue-conventions.md); the database states no radii.
 */
const NOT_REPRODUCED: Readonly<Record<string, string>> = {
  'L4X4X1/2 Iz': 'minor principal moment of an equal-leg angle: set by the heel and both toes, whose radii are not published; no one toe rule meets it and the published Zy of L6X4X3/8',
};

const QUOTED = Papa.parse<Row>(readFileSync(new URL('../fixtures/aisc-v15-quoted.csv', import.meta.url), 'utf8'), { header: true, skipEmptyLines: true }).data;
const DOCS = readFileSync(new URL('../../docs/catalogue-conventions.md', import.meta.url), 'utf8');

/** Asserts one published value: within its limit, or listed in NOT_REPRODUCED and still outside it. */
function expectReproduced(label: string, name: string, got: number, table: number): void {
  const off = Math.abs(got / table - 1);
  const listed = NOT_REPRODUCED[`${label} ${name}`];
  const what = `${label} ${name}: computed ${got.toPrecision(5)}, table ${table} (${((got / table - 1) * 100).toFixed(2)} %)`;
  if (listed === undefined) expect(off, what).toBeLessThanOrEqual(LIMITS[name]!);
  else {
    expect(off, `${what} is listed as not reproduced (${listed}) but now agrees: take it off the list`).toBeGreaterThan(LIMITS[name]!);
    expect(DOCS, `docs/catalogue-conventions.md names ${label}`).toContain(label);
  }
}

function rebuilt(label: string): SectionProperties {
  const part = partFromDesignation(label);
  if (!part.ok) throw new Error(part.message);
  const built = getPartType(part.shape)!.region(part.params);
  expect(built.diagnostics).toEqual([]);
  return sectionProperties(built.region);
}

describe('AISC Shapes Database v15.0 subset rebuilt from published dimensions', () => {
  it('covers every family of the subset (W, HP, S, C, MC, L, WT, HSS, PIPE) in 23 shapes', () => {
    expect(ROWS).toHaveLength(23);
    expect(new Set(ROWS.map((r) => r['shape_type']))).toEqual(new Set(['W', 'HP', 'S', 'C', 'MC', 'L', 'WT', 'HSS', 'PIPE']));
  });

  for (const row of ROWS) {
    const label = row['label']!;
    const type = row['shape_type']!;
    it(`${label} (${type}): A within 1 %, Ix, Iy, Sx, Sy, Zx, Zy, rx, ry within 1.5 % of the table, or listed as not reproduced`, () => {
      const p = rebuilt(label);
      // AISC Shapes Database v15.0, tabulated values.
      for (const check of CHECKS) expectReproduced(label, check.name, check.value(p), Number(row[check.column]));
    });
  }

  for (const row of QUOTED) {
    const label = row['label']!;
    const name = row['property']!;
    it(`${label} ${name} as quoted in issue 16 (${row['table']}): within ${name === 'A' ? '1' : '1.5'} % or listed as not reproduced`, () => {
      const check = CHECKS.find((c) => c.name === name)!;
      // AISC Shapes Database v15.0, tabulated value quoted in issue 16.
      expectReproduced(label, name, check.value(rebuilt(label)), Number(row['table']));
    });
  }

  for (const row of ROWS.filter((r) => r['shape_type'] === 'L')) {
    const label = row['label']!;
    it(`${label}: principal moments within 1.5 % or listed, tan α within 1 %, centroid within 1 %`, () => {
      const p = rebuilt(label);
      // AISC v15.0: Iw (renamed Iw_major_principal_in4) is the major principal moment, Iz the minor.
      const major = Number(row['Iw_major_principal_in4']);
      const minor = Number(row['Iz_minor_principal_in4']);
      expectReproduced(label, 'Iw', p.I1, major);
      expectReproduced(label, 'Iz', p.I2, minor);
      // tan α: the principal axes lean by α (< 45°) from the geometric axes (AISC v15.0 column tan_alpha).
      const tanAlpha = Number(row['tan_alpha']);
      const tanFromMinor = Math.abs(Math.tan(((p.thetaDeg + 90) * Math.PI) / 180));
      const got = Math.min(Math.abs(Math.tan((p.thetaDeg * Math.PI) / 180)), tanFromMinor);
      expect(Math.abs(got / tanAlpha - 1), `tan α ${got} vs ${tanAlpha}`).toBeLessThanOrEqual(0.01);
      // x̄ from the back of the longer leg and ȳ from the back of the shorter leg (heel at the origin).
      expect(Math.abs(p.cx / Number(row['x_bar_in']) - 1)).toBeLessThanOrEqual(0.01);
      expect(Math.abs(p.cy / Number(row['y_bar_in']) - 1)).toBeLessThanOrEqual(0.01);
    });
  }

  it('rectangular HSS use tdes and outside corner radius 2·tdes (the catalogue part says so)', () => {
    const part = partFromDesignation('HSS12X6X1/2');
    expect(part.ok && part.params).toEqual({ H: 12, B: 6, t: 0.465, r: 0.93 });
  });

  it('round HSS use the nominal OD of the label (6.625), not the printed 6.63', () => {
    const part = partFromDesignation('HSS6.625X0.280');
    expect(part.ok && part.params).toEqual({ OD: 6.625, t: 0.26 });
  });
});
