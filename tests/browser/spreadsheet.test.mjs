// Browser tests of spreadsheet exchange in the editor: a point list pasted on the drawing with
// the outline tool becomes an outline (renderer/controller/point-list.ts through the CLI's reader
// core/parts/points.ts), and the compare view saves an XLSX workbook (a ZIP: it starts "PK").
// Closed form: a 200 × 10 rectangle has A = b·h = 2000 (exact arithmetic).
import { readFile } from 'node:fs/promises';
import path from 'node:path';
import { check, menuItem, openApp, withoutFilePickers } from './harness.mjs';
import { newSection, resultValue } from './editor-support.mjs';

async function pasteOnCanvas(page, text) {
  await page.getByTestId('canvas').focus();
  await page.evaluate((t) => {
    const data = new DataTransfer();
    data.setData('text/plain', t);
    document.querySelector('[data-testid="canvas"]').dispatchEvent(new ClipboardEvent('paste', { clipboardData: data, bubbles: true, cancelable: true }));
  }, text);
}

export async function aPointListPastedWithTheOutlineToolBecomesAnOutline({ page, baseUrl }) {
  await openApp(page, baseUrl);
  await newSection(page);
  await page.getByTestId('tool-polygon').click();
  // As a spreadsheet copies two columns: tab-separated, with a header row.
  await pasteOnCanvas(page, 'x\ty\n0\t0\n200\t0\n200\t10\n0\t10\n');
  await page.waitForFunction(() => document.querySelectorAll('[data-testid^="part-row-"]').length === 1);
  await page.getByTestId('result-area').waitFor();
  const area = await resultValue(page, 'area');
  check(area === 2000, `pasted 200 × 10 outline: expected A = 2000, got ${area}`);
  // A list with a mistake opens the dialog with the text and the line and column named.
  await pasteOnCanvas(page, '0 0\n100 0\n100 5o\n');
  const errors = page.getByTestId('points-errors');
  await errors.waitFor();
  const text = await errors.innerText();
  check(/line 3, column 2/.test(text), `the error should name line 3, column 2: ${text}`);
  check((await page.getByTestId('points-text').inputValue()).includes('5o'), 'the pasted text should stay in the dialog');
  await page.getByTestId('points-text').fill('0 0\n100 0\n100 50\n');
  await page.getByTestId('points-add').click();
  await page.waitForFunction(() => document.querySelectorAll('[data-testid^="part-row-"]').length === 2);
}

export async function theCompareViewSavesAnXlsxWorkbook({ page, baseUrl, artifactsDir }) {
  await withoutFilePickers(page);
  await openApp(page, baseUrl);
  await menuItem(page, 'File', 'compare');
  await page.getByTestId('compare-view').waitFor();
  const [download] = await Promise.all([page.waitForEvent('download', { timeout: 15_000 }), page.getByTestId('compare-export-xlsx').click()]);
  check(/\.xlsx$/.test(download.suggestedFilename()), `expected an .xlsx name, got ${download.suggestedFilename()}`);
  const file = path.join(artifactsDir, download.suggestedFilename());
  await download.saveAs(file);
  const bytes = await readFile(file);
  check(bytes[0] === 0x50 && bytes[1] === 0x4b, 'an XLSX file is a ZIP archive and starts with "PK"');
  check(bytes.includes(Buffer.from('xl/worksheets/sheet1.xml')), 'the workbook should hold a worksheet');
}
