/**
 * XLSX files for the commands: core's typed rows (core/export/xlsx.ts) written by write-excel-file
 * (MIT), whose Node entry point makes the bytes. core cannot: every entry point of the library
 * returns a Node Buffer or stream or a DOM Blob.
 */
import writeXlsxFile, { type SheetData } from 'write-excel-file/node';
import { xlsxSheetData, type SheetTable } from '../core/export/xlsx.ts';
import { writeOutputFile } from './output.ts';

/** The bytes of an .xlsx file holding `table` as its one worksheet. */
export async function xlsxBytes(table: SheetTable): Promise<Uint8Array> {
  const buffer = await writeXlsxFile(xlsxSheetData(table) as SheetData, { sheet: table.sheet }).toBuffer();
  return new Uint8Array(buffer.buffer, buffer.byteOffset, buffer.byteLength);
}

/** Writes `table` to `path` as XLSX, or throws BadInputError naming --flag (exit 2). */
export async function writeXlsxOutput(flag: string, path: string, table: SheetTable): Promise<void> {
  writeOutputFile(flag, path, await xlsxBytes(table));
}
