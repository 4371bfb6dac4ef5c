// XLSX from the editor (renderer/controller/xlsx.ts: core's rows through write-excel-file's
// universal entry, as the compare view, the table check and File → Export properties save them)
// read back by unzipping and parsing the sheet (tests/export/unzip.ts). Expected values: a
// rectangle b × h has Ix = b·h³/12 (Gere & Timoshenko, Appendix D), exact here in doubles.
import { describe, expect, it } from 'vitest';
import { columnHeading, compareDocuments } from '../../core/compare/index.ts';
import type { SectionDocument } from '../../core/document/index.ts';
import { comparisonSheet } from '../../core/export/xlsx.ts';
import { saveXlsx, xlsxWorkbookBytes } from '../../renderer/controller/xlsx.ts';
import { XLSX_MIME_TYPE, type ExportBytes } from '../../renderer/host/host.ts';
import { firstSheetCells, unzip } from './unzip.ts';

const bar = (name: string, width: number): SectionDocument => ({
  format: 'sectionsmith-section', version: 1, name, unit: 'mm', materials: [], defaultMaterial: null,
  parts: [{ id: 'p', name: 'bar', type: 'rectangle', width, height: 100, operation: 'add', material: null, visible: true, placement: { x: 0, y: 0, rotationDeg: 0, mirror: false } }],
});

describe('XLSX from the editor, read back', () => {
  it('comparison: caution in A1, Ix per alternative as a number, a formula-like name as text', async () => {
    const c = compareDocuments([bar('=1+1', 30), bar('wide', 90)], { beam: null });
    const cells = firstSheetCells(unzip(await xlsxWorkbookBytes(comparisonSheet(c))));
    expect(cells.get('A1')?.text).toMatch(/^CAUTION:/);
    const heading = columnHeading('Ix', 'mm');
    const col = [...cells.values()].find((x) => x.text === heading)?.ref.replace(/\d+$/, '');
    expect(col).toBeDefined();
    const rows = [3, 4].map((r) => ({ name: cells.get(`A${r}`), ix: cells.get(`${col}${r}`) }));
    expect(rows.find((r) => r.name?.text === '=1+1')?.name?.type).toBe('text');
    expect(rows.find((r) => r.name?.text === '=1+1')?.ix).toMatchObject({ type: 'number', text: String((30 * 100 ** 3) / 12) });
    expect(rows.find((r) => r.name?.text === 'wide')?.ix).toMatchObject({ type: 'number', text: String((90 * 100 ** 3) / 12) });
  });

  it('saveXlsx hands the host the XLSX type, the name and the same bytes; a host without the verb is told so', async () => {
    const c = compareDocuments([bar('a', 30), bar('b', 90)], { beam: null });
    const given: ExportBytes[] = [];
    const ok = await saveXlsx({ exportBytes: (f) => (given.push(f), Promise.resolve(true)) }, comparisonSheet(c), 'girder-comparison.xlsx');
    expect(ok).toBe(true);
    expect(given[0]?.mimeType).toBe(XLSX_MIME_TYPE);
    expect(given[0]?.suggestedName).toBe('girder-comparison.xlsx');
    expect(firstSheetCells(unzip(given[0]?.bytes ?? new Uint8Array())).get('A1')?.text).toMatch(/^CAUTION:/);
    await expect(saveXlsx({}, comparisonSheet(c), 'x.xlsx')).rejects.toThrow(/cannot save XLSX/);
  });
});
