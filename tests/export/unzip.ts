// A minimal ZIP reader for tests (PKWARE APPNOTE 6.3.x: end of central directory, central
// directory headers, local headers; stored or deflated entries), so XLSX files are read back
// without a library of their own.
import { inflateRawSync } from 'node:zlib';

export function unzip(bytes: Uint8Array): Map<string, string> {
  const view = new DataView(bytes.buffer, bytes.byteOffset, bytes.byteLength);
  let eocd = bytes.length - 22;
  while (eocd >= 0 && view.getUint32(eocd, true) !== 0x06054b50) eocd--;
  if (eocd < 0) throw new Error('not a ZIP file: no end of central directory');
  const count = view.getUint16(eocd + 10, true);
  let at = view.getUint32(eocd + 16, true);
  const files = new Map<string, string>();
  for (let i = 0; i < count; i++) {
    if (view.getUint32(at, true) !== 0x02014b50) throw new Error(`bad central directory header at ${at}`);
    const method = view.getUint16(at + 10, true);
    const size = view.getUint32(at + 20, true);
    const nameLength = view.getUint16(at + 28, true);
    const extra = view.getUint16(at + 30, true);
    const comment = view.getUint16(at + 32, true);
    const local = view.getUint32(at + 42, true);
    const name = new TextDecoder().decode(bytes.subarray(at + 46, at + 46 + nameLength));
    const start = local + 30 + view.getUint16(local + 26, true) + view.getUint16(local + 28, true);
    const raw = bytes.subarray(start, start + size);
    files.set(name, new TextDecoder().decode(method === 8 ? inflateRawSync(raw) : raw));
    at += 46 + nameLength + extra + comment;
  }
  return files;
}

export interface XlsxCellRead {
  readonly ref: string;
  readonly type: 'number' | 'text';
  readonly text: string;
}

const unescape = (s: string): string => s.replace(/&lt;/g, '<').replace(/&gt;/g, '>').replace(/&quot;/g, '"').replace(/&apos;/g, "'").replace(/&amp;/g, '&');

/** Cells of the first worksheet, by reference ("A1"), with shared and inline strings resolved. */
export function firstSheetCells(files: Map<string, string>): Map<string, XlsxCellRead> {
  const sheet = files.get('xl/worksheets/sheet1.xml');
  if (sheet === undefined) throw new Error(`no xl/worksheets/sheet1.xml in ${[...files.keys()].join(', ')}`);
  const shared = [...(files.get('xl/sharedStrings.xml') ?? '').matchAll(/<si>([\s\S]*?)<\/si>/g)].map((m) => unescape([...(m[1] ?? '').matchAll(/<t[^>]*>([\s\S]*?)<\/t>/g)].map((t) => t[1] ?? '').join('')));
  const cells = new Map<string, XlsxCellRead>();
  for (const m of sheet.matchAll(/<c r="([A-Z]+[0-9]+)"([^>]*?)(?:\/>|>([\s\S]*?)<\/c>)/g)) {
    const ref = m[1] ?? '', attrs = m[2] ?? '', body = m[3] ?? '';
    const t = /\bt="([^"]+)"/.exec(attrs)?.[1];
    if (/<f[ >]/.test(body)) throw new Error(`cell ${ref} holds a formula: ${body}`);
    if (t === 's') cells.set(ref, { ref, type: 'text', text: shared[Number(/<v>([^<]*)<\/v>/.exec(body)?.[1])] ?? '' });
    else if (t === 'inlineStr' || t === 'str') cells.set(ref, { ref, type: 'text', text: unescape([...body.matchAll(/<t[^>]*>([\s\S]*?)<\/t>/g)].map((x) => x[1] ?? '').join('')) });
    else if (t === undefined || t === 'n') { const v = /<v>([^<]*)<\/v>/.exec(body)?.[1]; if (v !== undefined) cells.set(ref, { ref, type: 'number', text: v }); }
    else cells.set(ref, { ref, type: 'text', text: body });
  }
  return cells;
}

/** "A".."Z", "AA".. for a 0-based column index. */
export function columnName(index: number): string {
  let n = index + 1, out = '';
  while (n > 0) {
    const r = (n - 1) % 26;
    out = String.fromCharCode(65 + r) + out;
    n = Math.floor((n - 1) / 26);
  }
  return out;
}
