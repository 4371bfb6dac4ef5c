/**
 * Saving a derived file of bytes (an XLSX workbook) for the desktop host: the user picks the
 * place in main's save dialog, the bytes are written atomically (no backup: an export is made
 * again from the document). A plain function with its Electron pieces as parameters, so it is
 * tested under Node (tests/electron/export-bytes.test.ts). The payload was checked already
 * (electron/payloads.ts: a file name without folders, the XLSX type, at most MAX_EXPORT_BYTES).
 */
export interface ExportBytesDeps {
  /** Main's save dialog: the chosen path, or null when cancelled. */
  readonly chooseTarget: (suggestedName: string, filter: { name: string; extensions: string[] }) => Promise<string | null>;
  readonly save: (filePath: string, bytes: Uint8Array) => Promise<unknown>;
}

export const XLSX_FILTER = { name: 'Excel workbook (XLSX)', extensions: ['xlsx'] };

/** Asks where, writes the bytes there, and says whether it did (false: cancelled). The chosen path ends in .xlsx. */
export async function exportBytes(file: { readonly suggestedName: string; readonly bytes: Uint8Array }, deps: ExportBytesDeps): Promise<boolean> {
  const chosen = await deps.chooseTarget(file.suggestedName, XLSX_FILTER);
  if (chosen === null || chosen === '') return false;
  const target = /\.xlsx$/i.test(chosen) ? chosen : `${chosen}.xlsx`;
  await deps.save(target, file.bytes);
  return true;
}
