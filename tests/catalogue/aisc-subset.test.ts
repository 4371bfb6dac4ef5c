/**
 * Every shape of tests/fixtures/aisc-v15-subset.csv rebuilt from the catalogue (published
 * dimensions only) and checked against the TABULATED properties of the AISC Shapes Database
 * v15.0 (AISC, Nov 2017; consistent with the Steel Construction Manual, 15th ed.).
 *
 * Tolerance budget (SOURCES.md caveats): AISC rounds dimensions and properties to 3 significant
 * figures, so A within 1 % and I, S, Z, r within 1.5 % (W, HP, WT, HSS, Pipe; fillet r = kdes − tf,
 * a modelling convention). Widened, and why:
 *   S, C — flange toes and their roundings are not published and are modelled sharp, which
 *     leaves the y-axis values (Iy, Sy, Zy) up to ~2.5 % high: 3 %.
 *   MC — the flange slope varies and is not published; parallel flanges at the average tf put
 *     material too far out: A, x-axis 2 %, Iy and Sy 7 %, Zy 4 %, ry 3 %.
 *   L — the database states no root or toe radii; the sharp model gives Z within 2 % and the
 *     minor principal moment within 2.5 %.
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

const BASE: Readonly<Record<string, number>> = { A: 0.01, Ix: 0.015, Iy: 0.015, Sx: 0.015, Sy: 0.015, Zx: 0.015, Zy: 0.015, rx: 0.015, ry: 0.015 };
const WIDENED: Readonly<Record<string, Readonly<Record<string, number>>>> = {
  S: { Iy: 0.03, Sy: 0.03, Zy: 0.03 },
  C: { Iy: 0.03, Sy: 0.03, Zy: 0.03 },
  MC: { A: 0.02, Ix: 0.02, Sx: 0.02, Zx: 0.02, Iy: 0.07, Sy: 0.07, Zy: 0.04, ry: 0.03 },
  L: { Zx: 0.02, Zy: 0.02 },
};

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
    const limits = { ...BASE, ...(WIDENED[type] ?? {}) };
    it(`${label}: A, Ix, Iy, Sx, Sy, Zx, Zy, rx, ry within ${type in WIDENED ? 'the widened budget' : '1 % (A) and 1.5 %'} of the table`, () => {
      const p = rebuilt(label);
      for (const check of CHECKS) {
        const table = Number(row[check.column]);
        const got = check.value(p);
        // AISC Shapes Database v15.0, tabulated value.
        expect(Math.abs(got / table - 1), `${label} ${check.name}: computed ${got.toPrecision(5)}, table ${table}`).toBeLessThanOrEqual(limits[check.name]!);
      }
    });
  }

  for (const row of ROWS.filter((r) => r['shape_type'] === 'L')) {
    const label = row['label']!;
    it(`${label}: principal moments within 1.5 % (major) and 2.5 % (minor), tan α within 1 %, centroid within 1 %`, () => {
      const p = rebuilt(label);
      // AISC v15.0: Iw (renamed Iw_major_principal_in4) is the major principal moment, Iz the minor.
      const major = Number(row['Iw_major_principal_in4']);
      const minor = Number(row['Iz_minor_principal_in4']);
      expect(Math.abs(p.I1 / major - 1), `I1 ${p.I1} vs ${major}`).toBeLessThanOrEqual(0.015);
      expect(Math.abs(p.I2 / minor - 1), `I2 ${p.I2} vs ${minor}`).toBeLessThanOrEqual(0.025);
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
