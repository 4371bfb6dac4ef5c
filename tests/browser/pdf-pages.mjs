// Prints report HTML to PDF with Chromium (page.pdf, the same engine as Electron's printToPDF),
// then reads the PDF back with pdf.js: the page count, each page's text, and each page drawn to
// a PNG under the test's artifacts folder, so the pages can be looked at.
import { readFile, writeFile } from 'node:fs/promises';
import path from 'node:path';
import { ROOT } from '../../electron/build.mjs';

const PDFJS = path.join(ROOT, 'node_modules', 'pdfjs-dist', 'build');
const ORIGIN = 'http://pdf-pages.invalid';

/** { pdf: Buffer, pages: [{ text, png }] } for `html` printed on paper of the report's own @page size. */
export async function printedPages(context, html, artifactsDir, prefix) {
  const printer = await context.newPage();
  await printer.setContent(html, { waitUntil: 'load' });
  const pdf = await printer.pdf({ preferCSSPageSize: true, printBackground: true });
  await printer.close();
  await writeFile(path.join(artifactsDir, `${prefix}.pdf`), pdf);

  const reader = await context.newPage();
  const files = { '/pdf.min.mjs': 'pdf.min.mjs', '/pdf.worker.min.mjs': 'pdf.worker.min.mjs' };
  await reader.route(`${ORIGIN}/**`, async (route) => {
    const name = files[new URL(route.request().url()).pathname];
    if (!name) return route.fulfill({ status: 200, contentType: 'text/html', body: '<!DOCTYPE html><html><body></body></html>' });
    return route.fulfill({ status: 200, contentType: 'text/javascript', body: await readFile(path.join(PDFJS, name)) });
  });
  await reader.goto(`${ORIGIN}/index.html`);
  const pages = await reader.evaluate(async (base64) => {
    const lib = await import('/pdf.min.mjs');
    lib.GlobalWorkerOptions.workerSrc = '/pdf.worker.min.mjs';
    const data = Uint8Array.from(atob(base64), (c) => c.charCodeAt(0));
    const doc = await lib.getDocument({ data }).promise;
    const out = [];
    for (let n = 1; n <= doc.numPages; n += 1) {
      const page = await doc.getPage(n);
      const text = (await page.getTextContent()).items.map((i) => i.str).join(' ');
      const viewport = page.getViewport({ scale: 1.4 });
      const canvas = document.createElement('canvas');
      canvas.width = Math.ceil(viewport.width);
      canvas.height = Math.ceil(viewport.height);
      await page.render({ canvas, viewport }).promise;
      out.push({ text, png: canvas.toDataURL('image/png').split(',')[1], widthPt: page.view[2], heightPt: page.view[3] });
    }
    return out;
  }, pdf.toString('base64'));
  await reader.close();
  for (const [i, p] of pages.entries()) {
    await writeFile(path.join(artifactsDir, `${prefix}-page-${i + 1}.png`), Buffer.from(p.png, 'base64'));
    await writeFile(path.join(artifactsDir, `${prefix}-page-${i + 1}.txt`), p.text);
  }
  return { pdf, pages: pages.map(({ text, widthPt, heightPt }) => ({ text, widthPt, heightPt })) };
}

/** The report HTML shown in the report view's frame, as a document. */
export async function reportFrameHtml(page) {
  await page.getByTestId('report-frame').waitFor();
  await page.waitForFunction(() => document.querySelector('[data-testid="report-frame"]')?.contentDocument?.querySelector('h1') != null);
  return page.evaluate(() => `<!DOCTYPE html>\n${document.querySelector('[data-testid="report-frame"]').contentDocument.documentElement.outerHTML}`);
}
