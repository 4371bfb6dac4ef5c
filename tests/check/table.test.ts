/**
 * The section-table check against the published AISC Shapes Database v15.0 subset
 * (tests/fixtures/aisc-v15-subset.csv: AISC, Nov 2017; consistent with the Steel Construction
 * Manual, 15th ed.) and deliberately corrupted copies of it.
 *
 * Tolerances are those of tests/catalogue/aisc-subset.test.ts, for the same reasons (SOURCES.md
 * caveats): AISC prints dimensions and properties to 3 significant figures, so A within 1 % and
 * I, S, Z, r within 1.5 % (fillet r = kdes − tf, a modelling convention). Widened: S, C — toes
 * modelled sharp, y-axis values up to ~2.5 % high: 3 %; MC — the flange slope is not published:
 * A and x-axis 2 %, Iy and Sy 7 %, Zy 4 %, ry 3 %; L — no radii published: Z 2 %, the minor
 * principal moment Iz 2.5 % (rz = √(Iz/A) inside the 1.5 % base).
 */
import { readFileSync } from 'node:fs';
import Papa from 'papaparse';
import { describe, expect, it } from 'vitest';
import { checkTable, parseTolerances, TableInputError, tableCheckCsv, type Tolerances } from '../../core/check/index.ts';

const TEXT = readFileSync(new URL('../fixtures/aisc-v15-subset.csv', import.meta.url), 'utf8');
const TOLERANCES: Tolerances = parseTolerances(['1.5%', 'A=1%', 'S:Iy=3%', 'S:Sy=3%', 'S:Zy=3%', 'C:Iy=3%', 'C:Sy=3%', 'C:Zy=3%', 'MC:A=2%', 'MC:Ix=2%', 'MC:Sx=2%', 'MC:Zx=2%', 'MC:Iy=7%', 'MC:Sy=7%', 'MC:Zy=4%', 'MC:ry=3%', 'L:Zx=2%', 'L:Zy=2%', 'L:Iz=2.5%']);

/** The subset as arrays of cells, so a test can corrupt one cell. */
function cells(): string[][] {
  return Papa.parse<string[]>(TEXT, { header: false, skipEmptyLines: true }).data;
}
const unparse = (rows: string[][]): string => Papa.unparse(rows);
function withCell(designation: string, column: string, edit: (v: string) => string): string {
  const rows = cells();
  const c = rows[0]!.indexOf(column);
  const r = rows.findIndex((row) => row[0] === designation);
  rows[r]![c] = edit(rows[r]![c]!);
  return unparse(rows);
}

describe('check of the AISC v15.0 subset', () => {
  it('all 23 rows pass at the honest per-family tolerances, with A, Ix…ry compared on every row', () => {
    const result = checkTable(TEXT, { tolerances: TOLERANCES });
    expect(result.summary.rowsChecked).toBe(23);
    expect(result.rows.filter((r) => r.flagged).map((r) => [r.designation, r.findings])).toEqual([]);
    for (const r of result.rows) expect(r.properties.map((p) => p.symbol)).toEqual(expect.arrayContaining(['A', 'Ix', 'Iy', 'Sx', 'Sy', 'Zx', 'Zy', 'rx', 'ry']));
  });

  it('the same table in millimetres passes the same way (1 in = 25.4 mm exactly)', () => {
    const rows = cells();
    const header = rows[0]!;
    const converted = rows.map((row, i) =>
      row.map((v, j) => {
        const m = /_in(\d?)$/.exec(header[j]!);
        if (i === 0) return m ? header[j]!.replace(/_in(\d?)$/, '_mm$1') : v;
        return m && v !== '' ? String(Number(v) * 25.4 ** Number(m[1] || 1)) : v;
      }),
    );
    const result = checkTable(unparse(converted), { tolerances: TOLERANCES, unit: 'mm' });
    expect(result.unit).toBe('mm');
    expect(result.summary.rowsFlagged).toBe(0);
  });
});

describe('every deliberate corruption is found', () => {
  it('Ix of W14X90 raised 5 %: that row flagged, on Ix only, other rows pass', () => {
    const result = checkTable(withCell('W14X90', 'Ix_in4', (v) => String(Number(v) * 1.05)), { tolerances: TOLERANCES });
    const flagged = result.rows.filter((r) => r.flagged);
    expect(flagged.map((r) => r.designation)).toEqual(['W14X90']);
    expect(flagged[0]!.properties.filter((p) => p.flagged).map((p) => p.symbol)).toEqual(['Ix']);
  });

  it('the Ix and Iy columns swapped: exactly the rows whose table Ix ≠ Iy are flagged', () => {
    const rows = cells();
    const h = rows[0]!;
    const ix = h.indexOf('Ix_in4'), iy = h.indexOf('Iy_in4');
    h[ix] = 'Iy_in4';
    h[iy] = 'Ix_in4';
    const unequal = rows.slice(1).filter((r) => Math.abs(Number(r[ix]) / Number(r[iy]) - 1) > 0.03).map((r) => r[0]);
    const result = checkTable(unparse(rows), { tolerances: TOLERANCES });
    expect(result.rows.filter((r) => r.flagged).map((r) => r.designation)).toEqual(unequal);
    expect(unequal.length).toBeGreaterThan(15);
  });

  it('a typo in a designation (W14X90 → W14X99, W41X90, Q14X90) is flagged by the label check', () => {
    for (const typo of ['W14X99', 'W41X90', 'Q14X90']) {
      const result = checkTable(withCell('W14X90', 'label', () => typo), { tolerances: TOLERANCES });
      const flagged = result.rows.filter((r) => r.flagged);
      expect(flagged.map((r) => r.designation), typo).toEqual([typo]);
      expect(flagged[0]!.findings.join(' ')).toContain(typo);
    }
  });

  it('a non-numeric cell is bad input naming the row and the column', () => {
    const text = withCell('W21X44', 'Zx_in3', () => '95,4x');
    expect(() => checkTable(text)).toThrow(TableInputError);
    expect(() => checkTable(text)).toThrow(/row 4 \(W21X44\), column "Zx_in3": "95,4x" is not a number/);
  });

  it('an unknown type names the row and the column; a missing designation column is bad input', () => {
    expect(() => checkTable(withCell('W8X31', 'shape_type', () => 'IPE'))).toThrow(/row 1 \(W8X31\), column "shape_type": unknown type "IPE"/);
    const rows = cells();
    rows[0]![0] = 'item';
    expect(() => checkTable(unparse(rows))).toThrow(/no designation column/);
  });
});

describe('column mapping and the CSV report', () => {
  it('headers with bracketed units and a user override are read; a renamed column is ignored until mapped', () => {
    // W14X90, AISC v15.0: d 14.0, bf 14.5, tw 0.440, tf 0.710, kdes 1.31; A 26.5 in², Ix 999 in⁴.
    const text = 'designation,d [in],bf (in),tw,tf,kdes,A [in^2],I major\nW14X90,14,14.5,0.44,0.71,1.31,26.5,999\n';
    const plain = checkTable(text, { type: 'W', overrides: new Map() });
    expect(plain.rows[0]!.properties.map((p) => p.symbol)).toEqual(['A']);
    const mapped = checkTable(text, { type: 'W', overrides: new Map([['I major', 'Ix:in4']]) });
    expect(mapped.rows[0]!.properties.map((p) => p.symbol)).toEqual(['A', 'Ix']);
    expect(mapped.summary.rowsFlagged).toBe(0);
    // Stored mapping (plain data) reproduces the same reading without the override.
    const again = checkTable(text, { type: 'W', mapping: JSON.parse(JSON.stringify(mapped.mapping)) });
    expect(again.rows[0]!.properties.map((p) => p.symbol)).toEqual(['A', 'Ix']);
  });

  it('the CSV report defuses a formula-like designation and quotes commas (OWASP CSV injection, common practice)', () => {
    const text = 'designation,d,bf,tw,tf,kdes,A\n"=HYPERLINK(1,2)",14,14.5,0.44,0.71,1.31,26.5\n';
    const csv = tableCheckCsv(checkTable(text, { type: 'W', readLabels: false }));
    const [header, row] = csv.split('\r\n');
    expect(header).toContain('A table [in^2]');
    expect(row!.startsWith(`1,"'=HYPERLINK(1,2)",W,pass,`)).toBe(true);
    expect(row).toContain('Results are preliminary');
  });
});
