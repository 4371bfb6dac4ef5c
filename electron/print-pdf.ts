/**
 * A report (core/report HTML) as a PDF, in the main process: ask where to save it, load the HTML
 * in a hidden window with the app's secure options (plus JavaScript off and no preload, so the
 * page has no bridge and runs nothing), call webContents.printToPDF with the page size of the
 * report's own @page rule, and save the bytes with the atomic save (electron/save.ts).
 *
 * The HTML is written to a temporary file and loaded from there (a data: URL is limited to about
 * 2 MB, which a report of a large section can exceed); the file gets a Content-Security-Policy
 * that forbids every fetch and script, so nothing in a report can reach the network. The window
 * is destroyed and the temporary folder removed whatever happens.
 *
 * Written against the few Electron pieces it uses (passed in), so it is tested under Node.
 */
import type { BrowserWindowConstructorOptions, PrintToPDFOptions } from 'electron';
import path from 'node:path';
import { windowOptions } from './window-options.ts';

export interface PdfWindow {
  loadFile(filePath: string): Promise<void>;
  readonly webContents: { printToPDF(options: PrintToPDFOptions): Promise<Uint8Array> };
  destroy(): void;
}

export interface PdfDeps {
  /** Ask where to save; null when cancelled. */
  chooseTarget(suggestedName: string): Promise<string | null>;
  createWindow(options: BrowserWindowConstructorOptions): PdfWindow;
  save(target: string, data: Uint8Array): Promise<unknown>;
  readonly fs: {
    mkdtemp(prefix: string): Promise<string>;
    writeFile(file: string, text: string, encoding: 'utf8'): Promise<void>;
    rm(folder: string, options: { recursive: true; force: true }): Promise<void>;
  };
  readonly tempRoot: string;
}

/** No fetches, no scripts, no frames: styles inline and images from data: only. */
export const REPORT_CSP = "default-src 'none'; style-src 'unsafe-inline'; img-src data:; font-src data:";

export const PDF_OPTIONS: PrintToPDFOptions = { printBackground: true, preferCSSPageSize: true };

/** The hidden window: the app's secure web preferences, no preload, JavaScript off, never shown. */
export function reportWindowOptions(): BrowserWindowConstructorOptions {
  const { webPreferences = {} } = windowOptions('');
  const { preload: _none, ...secure } = webPreferences;
  return { show: false, width: 900, height: 1200, webPreferences: { ...secure, javascript: false, devTools: false } };
}

/**
 * The report with the no-fetch policy as the first thing in its head. The place is found the way
 * an HTML parser finds it (WHATWG HTML, tree construction: "before html" and "before head"
 * insertion modes), not by searching for "<head": leading whitespace, comments and the doctype are
 * skipped, then an <html> start tag and a <head> start tag when present (attributes may hold ">"
 * in quotes). Whatever comes next, a <meta> put there is parsed into the document's head, with
 * or without explicit <html> and <head> tags. A "<head" inside a comment or a <header> cannot
 * move it. A comment or tag that never ends is refused.
 */
export function lockedReportHtml(html: string): string {
  const at = headContentStart(html);
  return `${html.slice(0, at)}<meta http-equiv="Content-Security-Policy" content="${REPORT_CSP}">${html.slice(at)}`;
}

/** The offset where the head's first child goes. */
export function headContentStart(html: string): number {
  let i = html.charCodeAt(0) === 0xfeff ? 1 : 0;
  let sawHtml = false;
  for (;;) {
    while (i < html.length && ' \t\n\f\r'.includes(html.charAt(i))) i += 1;
    const rest = html.slice(i, i + 10);
    if (rest.startsWith('<!--')) {
      // "<!-->" and "<!--->" close at once (abrupt closing of an empty comment).
      if (html.startsWith('>', i + 4)) i += 5;
      else if (html.startsWith('->', i + 4)) i += 6;
      else {
        const end = html.indexOf('-->', i + 4);
        if (end < 0) throw new Error('The report could not be printed: a comment in its HTML never ends.');
        i = end + 3;
      }
    } else if (/^<!doctype/i.test(rest)) {
      const end = html.indexOf('>', i);
      if (end < 0) throw new Error('The report could not be printed: its doctype never ends.');
      i = end + 1;
    } else if (!sawHtml && /^<html[\t\n\f\r />]/i.test(rest)) {
      i = startTagEnd(html, i);
      sawHtml = true;
    } else if (/^<head[\t\n\f\r />]/i.test(rest)) {
      return startTagEnd(html, i);
    } else {
      return i;
    }
  }
}

/** The offset just past the start tag at `from`; ">" inside a quoted attribute value does not end it. */
function startTagEnd(html: string, from: number): number {
  let quote = '';
  for (let i = from + 1; i < html.length; i += 1) {
    const c = html.charAt(i);
    if (quote) {
      if (c === quote) quote = '';
    } else if (c === '>') {
      return i + 1;
    } else if ((c === '"' || c === "'") && /=[\t\n\f\r ]*$/.test(html.slice(Math.max(from, i - 16), i))) {
      quote = c;
    }
  }
  throw new Error('The report could not be printed: a tag at the start of its HTML never ends.');
}

/** "girder-report.html" → "girder-report.pdf"; a chosen path without .pdf gets it. */
export const pdfName = (name: string): string => (/\.pdf$/i.test(name) ? name : `${name.replace(/\.(html?|section\.json|json)$/i, '')}.pdf`);

/** True when saved, false when the user cancelled; throws an Error saying why otherwise. */
export async function printReportToPdf(html: string, suggestedName: string, deps: PdfDeps): Promise<boolean> {
  const locked = lockedReportHtml(html);
  const chosen = await deps.chooseTarget(pdfName(suggestedName));
  if (chosen === null) return false;
  const target = pdfName(chosen);
  const folder = await deps.fs.mkdtemp(path.join(deps.tempRoot, 'sectionsmith-report-'));
  let win: PdfWindow | null = null;
  try {
    const file = path.join(folder, 'report.html');
    await deps.fs.writeFile(file, locked, 'utf8');
    win = deps.createWindow(reportWindowOptions());
    await win.loadFile(file);
    let pdf: Uint8Array;
    try {
      pdf = await win.webContents.printToPDF(PDF_OPTIONS);
    } catch (error) {
      throw new Error(`The report could not be rendered to PDF: ${error instanceof Error ? error.message : String(error)}`);
    }
    await deps.save(target, pdf);
    return true;
  } finally {
    win?.destroy();
    await deps.fs.rm(folder, { recursive: true, force: true }).catch(() => undefined);
  }
}
