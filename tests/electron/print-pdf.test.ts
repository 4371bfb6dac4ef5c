/**
 * Report to PDF in the main process (electron/print-pdf.ts), with fake Electron pieces: the
 * hidden window's secure options asserted literally (STYLE.md §13), the HTML locked by a
 * no-fetch policy, the page size left to the report's @page rule, the bytes handed to the atomic
 * save unchanged, and the window and temporary folder cleaned up on every path. Payloads of the
 * 'report:print-pdf' channel are checked like every other channel's.
 */
import { existsSync, mkdtempSync, readdirSync, readFileSync, rmSync } from 'node:fs';
import { promises as fs } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import type { BrowserWindowConstructorOptions, PrintToPDFOptions } from 'electron';
import { checkedArgs } from '../../electron/payloads.ts';
import { saveAtomically } from '../../electron/save.ts';
import { lockedReportHtml, pdfName, printReportToPdf, REPORT_CSP, reportWindowOptions, type PdfDeps } from '../../electron/print-pdf.ts';

const HTML = '<!DOCTYPE html>\n<html lang="en"><head><meta charset="utf-8"><title>Trailer frame</title></head><body><h1>Trailer frame</h1></body></html>\n';
const PDF_BYTES = new Uint8Array([0x25, 0x50, 0x44, 0x46, 0x2d]); // "%PDF-"

let temp: string;
beforeEach(() => {
  temp = mkdtempSync(path.join(os.tmpdir(), 'print-pdf-test-'));
});
afterEach(() => rmSync(temp, { recursive: true, force: true }));

function fakes(over: { target?: string | null; printFails?: boolean } = {}) {
  const log = { options: null as BrowserWindowConstructorOptions | null, loaded: '', loadedText: '', pdfOptions: null as PrintToPDFOptions | null, saved: null as null | { target: string; data: Uint8Array }, destroyed: 0, asked: '' };
  const deps: PdfDeps = {
    chooseTarget: async (name) => {
      log.asked = name;
      return over.target === undefined ? path.join(temp, 'out', 'trailer-report') : over.target;
    },
    createWindow: (options) => {
      log.options = options;
      return {
        loadFile: async (file) => {
          log.loaded = file;
          log.loadedText = readFileSync(file, 'utf8');
        },
        webContents: {
          printToPDF: async (o) => {
            log.pdfOptions = o;
            if (over.printFails) throw new Error('renderer gone');
            return PDF_BYTES;
          },
        },
        destroy: () => void (log.destroyed += 1),
      };
    },
    save: async (target, data) => {
      log.saved = { target, data };
    },
    fs,
    tempRoot: temp,
  };
  return { deps, log };
}

const leftovers = (): string[] => readdirSync(temp).filter((n) => n.startsWith('sectionsmith-report-'));

describe('report to PDF (main process)', () => {
  it('the hidden window has the secure options, no preload and JavaScript off, and is never shown', () => {
    const o = reportWindowOptions();
    expect(o.show).toBe(false);
    expect(o.webPreferences).toMatchObject({ contextIsolation: true, sandbox: true, nodeIntegration: false, nodeIntegrationInWorker: false, nodeIntegrationInSubFrames: false, webSecurity: true, allowRunningInsecureContent: false, webviewTag: false, javascript: false, devTools: false });
    expect(o.webPreferences).not.toHaveProperty('preload');
  });

  it('saves the printed bytes unchanged at the chosen path with .pdf added, from a file under the no-fetch policy, and cleans up', async () => {
    const { deps, log } = fakes();
    await expect(printReportToPdf(HTML, 'trailer-report.html', deps)).resolves.toBe(true);
    expect(log.asked).toBe('trailer-report.pdf');
    expect(log.saved?.target).toBe(path.join(temp, 'out', 'trailer-report.pdf'));
    expect(log.saved?.data).toBe(PDF_BYTES);
    expect(log.pdfOptions).toEqual({ printBackground: true, preferCSSPageSize: true });
    expect(log.loadedText).toContain(`<meta http-equiv="Content-Security-Policy" content="${REPORT_CSP}">`);
    expect(log.loadedText.indexOf('Content-Security-Policy')).toBeLessThan(log.loadedText.indexOf('<title>'));
    expect(log.loadedText).toContain('<h1>Trailer frame</h1>');
    expect(log.destroyed).toBe(1);
    expect(existsSync(log.loaded)).toBe(false);
    expect(leftovers()).toEqual([]);
  });

  it('a cancelled dialog returns false and opens no window', async () => {
    const { deps, log } = fakes({ target: null });
    await expect(printReportToPdf(HTML, 'x.pdf', deps)).resolves.toBe(false);
    expect(log.options).toBeNull();
    expect(log.saved).toBeNull();
  });

  it('a failed render says so, saves nothing, and still destroys the window and removes the temporary file', async () => {
    const { deps, log } = fakes({ printFails: true });
    await expect(printReportToPdf(HTML, 'x', deps)).rejects.toThrow(/could not be rendered to PDF: renderer gone/);
    expect(log.saved).toBeNull();
    expect(log.destroyed).toBe(1);
    expect(leftovers()).toEqual([]);
  });

  // Hardening finding 8: the policy went after the first match of /<head[^>]*>/, which a comment,
  // an attribute or a <header> element can hold, and a <meta> there is no policy at all. The
  // places below follow WHATWG HTML tree construction ("before html", "before head" modes).
  const META = `<meta http-equiv="Content-Security-Policy" content="${REPORT_CSP}">`;
  it('the policy goes after the real <head> start tag, not a "<head>" inside a comment or an attribute', () => {
    expect(lockedReportHtml('<!DOCTYPE html><!-- a <head> in a comment --><html><head><title>t</title>'))
      .toBe(`<!DOCTYPE html><!-- a <head> in a comment --><html><head>${META}<title>t</title>`);
    expect(lockedReportHtml('<!DOCTYPE html><html data-note="<head>" lang=en><HEAD class="x>y"><title>t</title>'))
      .toBe(`<!DOCTYPE html><html data-note="<head>" lang=en><HEAD class="x>y">${META}<title>t</title>`);
    expect(lockedReportHtml('\uFEFF<!doctype html>\n<!---->\n<head>\n<title>t</title>')).toBe(`\uFEFF<!doctype html>\n<!---->\n<head>${META}\n<title>t</title>`);
  });

  it('without a <head> tag the policy goes where the parser opens the head itself, never into a <header> of the body', () => {
    expect(lockedReportHtml('<!DOCTYPE html><html><body><header>Trailer frame</header></body></html>'))
      .toBe(`<!DOCTYPE html><html>${META}<body><header>Trailer frame</header></body></html>`);
    expect(lockedReportHtml('<!DOCTYPE html><p>x</p>')).toBe(`<!DOCTYPE html>${META}<p>x</p>`);
  });

  it('a comment or tag that never ends is refused before anything is asked', async () => {
    const { deps, log } = fakes();
    expect(() => lockedReportHtml('<!DOCTYPE html><!-- <head>')).toThrow(/a comment in its HTML never ends/);
    await expect(printReportToPdf('<!DOCTYPE html><html lang="en', 'x', deps)).rejects.toThrow(/never ends/);
    expect(log.asked).toBe('');
  });

  it('the atomic save writes bytes as they are (a PDF is not text)', async () => {
    const target = path.join(temp, 'bytes.pdf');
    const bytes = new Uint8Array([0x25, 0x50, 0x44, 0x46, 0xff, 0x00, 0xe2]);
    const outcome = await saveAtomically(target, bytes, { keepBackup: false });
    expect(outcome.bytes).toBe(7);
    expect([...readFileSync(target)]).toEqual([...bytes]);
  });

  it('names end in .pdf exactly once', () => {
    expect(pdfName('girder-report.html')).toBe('girder-report.pdf');
    expect(pdfName('girder.PDF')).toBe('girder.PDF');
    expect(pdfName('girder')).toBe('girder.pdf');
  });

  it('the channel takes a whole HTML report without scripts and a plain file name', () => {
    expect(checkedArgs('report:print-pdf', [HTML, 'trailer-report.pdf'])).toEqual([HTML, 'trailer-report.pdf']);
    expect(() => checkedArgs('report:print-pdf', ['<html></html>', 'a.pdf'])).toThrow(/starting with <!DOCTYPE html>/);
    expect(() => checkedArgs('report:print-pdf', [HTML.replace('</body>', '<script>x()</script></body>'), 'a.pdf'])).toThrow(/without scripts/);
    expect(() => checkedArgs('report:print-pdf', [HTML, '../a.pdf'])).toThrow(/without folders/);
    expect(() => checkedArgs('report:print-pdf', [HTML])).toThrow(/rejected payload/);
  });
});
