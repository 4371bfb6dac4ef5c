// XLSX exports (core/export/xlsx.ts rows, written by write-excel-file through cli/xlsx.ts) read
// back by unzipping the file and parsing the sheet's XML (tests/export/unzip.ts): the caution in
// row 1, units in the headings, numbers stored as numbers whose text reads back as the same
// double, formula-looking text stored as text (no <f> element). Expected numbers: a circle of
// diameter 1, A = π/4 and Ix = π/64 (Roark, Table A.1), computed here from Math.PI.
import { mkdtempSync, readFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { COMMANDS, parseFlags } from '../../cli/main.ts';
import { xlsxBytes } from '../../cli/xlsx.ts';
import { columnHeading, compareDocuments } from '../../core/compare/index.ts';
import type { SectionDocument } from '../../core/document/index.ts';
import { comparisonSheet, propertiesSheet } from '../../core/export/xlsx.ts';
import { sectionProperties } from '../../core/properties/index.ts';
import { columnName, firstSheetCells, unzip } from './unzip.ts';

const CIRCLE = [{ outer: { xy: Float64Array.of(0.5, 0, -0.5, 0), bulge: Float64Array.of(1, 1) }, holes: [] }];

function headerIndex(cells: ReturnType<typeof firstSheetCells>, heading: string): number {
  for (let i = 0; i < 200; i++) if (cells.get(`${columnName(i)}2`)?.text === heading) return i;
  throw new Error(`no heading ${heading}`);
}

describe('XLSX tables read back', () => {
  it('properties: the caution in A1, units in the headings, A and Ix as numbers at full precision, a formula-like name as text', async () => {
    const p = sectionProperties(CIRCLE);
    const cells = firstSheetCells(unzip(await xlsxBytes(propertiesSheet({ name: '=SUM(A1:A9)', unit: 'in', properties: p }))));
    expect(cells.get('A1')).toMatchObject({ type: 'text', text: expect.stringMatching(/^CAUTION: Results are preliminary/) as string });
    expect(cells.get('A3')).toEqual({ ref: 'A3', type: 'text', text: '=SUM(A1:A9)' });
    const area = cells.get(`${columnName(headerIndex(cells, 'area [in^2]'))}3`);
    expect(area?.type).toBe('number');
    expect(Number(area?.text)).toBe(p.area);
    expect(Math.abs(p.area - Math.PI / 4) / (Math.PI / 4)).toBeLessThan(1e-15);
    const ix = cells.get(`${columnName(headerIndex(cells, 'Ix [in^4]'))}3`);
    expect(ix?.type).toBe('number');
    expect(Number(ix?.text)).toBe(p.Ix);
  });

  it('comparison: one row per alternative with values and ratios as numbers', async () => {
    const bar = (name: string, width: number): SectionDocument => ({
      format: 'sectionsmith-section', version: 1, name, unit: 'mm', materials: [], defaultMaterial: null,
      parts: [{ id: 'p', name: 'bar', type: 'rectangle', width, height: 100, operation: 'add', material: null, visible: true, placement: { x: 0, y: 0, rotationDeg: 0, mirror: false } }],
    });
    const c = compareDocuments([bar('narrow', 30), bar('wide', 90)], { beam: null });
    const cells = firstSheetCells(unzip(await xlsxBytes(comparisonSheet(c))));
    expect(cells.get('A1')?.text).toMatch(/^CAUTION:/);
    const col = columnName(headerIndex(cells, columnHeading('Ix', 'mm')));
    const rows = [3, 4].map((r) => ({ name: cells.get(`A${r}`)?.text, ix: cells.get(`${col}${r}`) }));
    // Ix = b·h³/12 (Gere & Timoshenko, Appendix D).
    expect(rows.find((r) => r.name === 'narrow')?.ix).toMatchObject({ type: 'number', text: String((30 * 100 ** 3) / 12) });
    expect(rows.find((r) => r.name === 'wide')?.ix).toMatchObject({ type: 'number', text: String((90 * 100 ** 3) / 12) });
  });

  it('table check (sectionsmith check --xlsx): the same numbers as the CSV report, as numbers', async () => {
    const dir = mkdtempSync(join(tmpdir(), 'sectionsmith-xlsx-'));
    const command = COMMANDS.find((c) => c.name === 'check');
    if (!command) throw new Error('no check command');
    const table = new URL('../fixtures/aisc-v15-subset.csv', import.meta.url).pathname;
    const csvOut = join(dir, 'report.csv'), xlsxOut = join(dir, 'report.xlsx');
    const { positionals, flags, lists } = parseFlags(command, [table, '--out', csvOut, '--xlsx', xlsxOut]);
    await command.run(positionals, flags, { out: () => {}, err: () => {}, readFile: (p) => readFileSync(p, 'utf8') }, lists);
    const cells = firstSheetCells(unzip(readFileSync(xlsxOut)));
    expect(cells.get('A1')?.text).toMatch(/^CAUTION:/);
    const csvLines = readFileSync(csvOut, 'utf8').trim().split(/\r\n/);
    const header = (csvLines[0] ?? '').split(',');
    const ixTable = header.indexOf('Ix table [in^4]');
    expect(ixTable).toBeGreaterThan(0);
    expect(cells.get(`${columnName(ixTable)}2`)?.text).toBe('Ix table [in^4]');
    // Row 1 of the CSV data is row 3 of the sheet; its numbers are the CSV's numbers exactly.
    const first = (csvLines[1] ?? '').split(',');
    const value = cells.get(`${columnName(ixTable)}3`);
    expect(value?.type).toBe('number');
    expect(Number(value?.text)).toBe(Number(first[ixTable]));
  });
});
