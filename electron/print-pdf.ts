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

/** The report with the no-fetch policy as the first thing in its head. */
export function lockedReportHtml(html: string): string {
  const head = /<head[^>]*>/i.exec(html);
  if (!head) throw new Error('The report could not be printed: its HTML has no <head>.');
  const at = head.index + head[0].length;
  return `${html.slice(0, at)}<meta http-equiv="Content-Security-Policy" content="${REPORT_CSP}">${html.slice(at)}`;
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
