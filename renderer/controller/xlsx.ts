/**
 * XLSX from the editor: core's typed rows (core/export/xlsx.ts, the same rows the command line
 * writes) made into a workbook by write-excel-file, the library cli/xlsx.ts uses, through its
 * `universal` entry (a Blob; no Node), and saved through the host's `exportBytes` verb.
 */
import writeXlsxFile, { type SheetData } from 'write-excel-file/universal';
import { xlsxSheetData, type SheetTable } from '../../core/export/xlsx.ts';
import { XLSX_MIME_TYPE, type Host } from '../host/host.ts';

/** The bytes of an .xlsx file holding `table` as its one worksheet. */
export async function xlsxWorkbookBytes(table: SheetTable): Promise<Uint8Array> {
  const blob = await writeXlsxFile(xlsxSheetData(table) as SheetData, { sheet: table.sheet }).toBlob();
  return new Uint8Array(await blob.arrayBuffer());
}

/** Saves `table` as `suggestedName` through the host; false when cancelled. Throws, saying why, when the host cannot save bytes. */
export async function saveXlsx(host: Pick<Host, 'exportBytes'>, table: SheetTable, suggestedName: string): Promise<boolean> {
  if (!host.exportBytes) throw new Error('this host cannot save XLSX files (no exportBytes); export CSV instead');
  return host.exportBytes({ suggestedName, mimeType: XLSX_MIME_TYPE, bytes: await xlsxWorkbookBytes(table) });
}
