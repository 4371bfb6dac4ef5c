// Browser tests of the host (renderer/host/browser-host.ts) through the app's own UI: saving
// (download fallback and File System Access handles), reopening, export, a broken file, recovery.
import { check, downloadText, menuItem, openApp, partCount, resultValue, withoutFilePickers } from './harness.mjs';

const same = (what, got, expected) => check(Object.is(got, expected), `${what}: expected ${expected}, got ${got}`);

export async function saveAsDownloadThenReopenGivesTheSameDocumentAndNumbers({ page, baseUrl, artifactsDir }) {
  await withoutFilePickers(page);
  await openApp(page, baseUrl);
  const before = { area: await resultValue(page, 'area'), Ix: await resultValue(page, 'Ix'), Iy: await resultValue(page, 'Iy'), parts: await partCount(page) };
  check(before.parts > 0 && before.area > 0, `the example should open on first start, got ${before.parts} parts, area ${before.area}`);
  const saved = await downloadText(page, artifactsDir, () => page.getByTestId('save').click());
  check(saved.name.endsWith('.section.json'), `download name should end in .section.json, got ${saved.name}`);
  const json = JSON.parse(saved.text);
  same('saved format', json.format, 'sectionsmith-section');
  same('saved part count', json.sections[0].parts.length, before.parts);

  await menuItem(page, 'File', 'new');
  await page.waitForFunction(() => document.querySelectorAll('[data-testid^="part-row-"]').length === 0);
  await page.getByTestId('open-document').setInputFiles(saved.file);
  await page.waitForFunction((n) => document.querySelectorAll('[data-testid^="part-row-"]').length === n, before.parts);
  same('reopened area', await resultValue(page, 'area'), before.area);
  same('reopened Ix', await resultValue(page, 'Ix'), before.Ix);
  same('reopened Iy', await resultValue(page, 'Iy'), before.Iy);
  // Saving the reopened document again writes exactly the same text.
  const again = await downloadText(page, artifactsDir, () => menuItem(page, 'File', 'save-as'));
  same('text after save, reopen, save', again.text, saved.text);
}

/** File System Access pickers replaced by handles in the origin-private file system (real FileSystemFileHandles). */
async function withPrivateFilePickers(page) {
  await page.addInitScript(() => {
    window.__pickerCalls = 0;
    const root = () => navigator.storage.getDirectory();
    window.showSaveFilePicker = async ({ suggestedName }) => {
      window.__pickerCalls += 1;
      return (await root()).getFileHandle(suggestedName, { create: true });
    };
    window.showOpenFilePicker = async () => {
      window.__pickerCalls += 1;
      return [await (await root()).getFileHandle(window.__openName)];
    };
  });
}

const privateFileText = (page, name) => page.evaluate(async (n) => (await (await (await navigator.storage.getDirectory()).getFileHandle(n)).getFile()).text(), name);

export async function saveThroughAFileHandleWritesBackToTheSameFileWithoutAskingAgain({ page, baseUrl }) {
  await withPrivateFilePickers(page);
  await openApp(page, baseUrl);
  const parts = await partCount(page);
  await menuItem(page, 'File', 'save-as');
  await page.waitForFunction(() => window.__pickerCalls === 1 && /\.section\.json/.test(document.querySelector('[data-testid="doc-title"]')?.textContent ?? ''));
  const name = (await page.getByTestId('doc-title').textContent()).replace(/^[•\s]+/, '').trim();
  check(name.endsWith('.section.json'), `title should show the saved file name, got ${JSON.stringify(name)}`);
  await page.waitForFunction(async (n) => {
    try { return (await (await (await navigator.storage.getDirectory()).getFileHandle(n)).getFile()).size > 0; } catch { return false; }
  }, name);
  same('parts in the saved file', JSON.parse(await privateFileText(page, name)).sections[0].parts.length, parts);

  // Change the document (delete the first part), then Save: no picker, same file, new content.
  await page.getByTestId('part-select-0').click();
  await page.getByTestId('transform-delete').click();
  await page.waitForFunction((n) => document.querySelectorAll('[data-testid^="part-row-"]').length === n - 1, parts);
  check((await page.title()).includes('•'), `the title should mark unsaved changes, got ${JSON.stringify(await page.title())}`);
  await page.getByTestId('save').click();
  await page.waitForFunction(() => !document.title.includes('•'));
  same('picker calls after Save', await page.evaluate(() => window.__pickerCalls), 1);
  same('parts in the file after Save', JSON.parse(await privateFileText(page, name)).sections[0].parts.length, parts - 1);

  // Open it again through the open picker.
  await menuItem(page, 'File', 'new');
  await page.evaluate((n) => { window.__openName = n; }, name);
  await menuItem(page, 'File', 'open');
  await page.waitForFunction((n) => document.querySelectorAll('[data-testid^="part-row-"]').length === n, parts - 1);
}

export async function exportSvgAndCsvCarryTheShownNumbersTheCautionAndOpenInTheBrowser({ page, baseUrl, artifactsDir }) {
  await withoutFilePickers(page);
  await openApp(page, baseUrl);
  const unit = await page.getByTestId('document-unit').inputValue();
  const area = await resultValue(page, 'area');
  const Ix = await resultValue(page, 'Ix');
  const csv = await downloadText(page, artifactsDir, () => menuItem(page, 'File', 'export-csv'));
  check(csv.name.endsWith('.csv'), `CSV name: ${csv.name}`);
  const [header, values] = csv.text.trim().split('\r\n').map((line) => line.split(','));
  const cell = (h) => values[header.indexOf(h)];
  check(header.includes(`area [${unit}^2]`), `CSV header should have "area [${unit}^2]": ${header.slice(0, 6).join(' | ')}`);
  same('CSV area (full precision)', Number(cell(`area [${unit}^2]`)), area);
  same('CSV Ix (full precision)', Number(cell(`Ix [${unit}^4]`)), Ix);
  check(/preliminary/.test(csv.text), 'CSV should carry the caution');

  const svg = await downloadText(page, artifactsDir, () => menuItem(page, 'File', 'export-svg'));
  check(svg.name.endsWith('.svg'), `SVG name: ${svg.name}`);
  const opened = await page.evaluate(async (text) => {
    const parsed = new DOMParser().parseFromString(text, 'image/svg+xml');
    const broken = parsed.getElementsByTagName('parsererror').length > 0;
    const image = new Image();
    const url = URL.createObjectURL(new Blob([text], { type: 'image/svg+xml' }));
    const loaded = await new Promise((resolve) => { image.onload = () => resolve(image.naturalWidth); image.onerror = () => resolve(0); image.src = url; });
    return { broken, width: loaded, caution: parsed.getElementById('caution')?.textContent ?? '', paths: parsed.querySelectorAll('#section path').length };
  }, svg.text);
  check(!opened.broken, 'the SVG should parse without errors');
  check(opened.width > 0, 'the SVG should load as an image in Chromium');
  check(/preliminary/.test(opened.caution), `the SVG caution: ${opened.caution}`);
  check(opened.paths > 0, 'the SVG should draw the section');
}

export async function aBrokenFileShowsAClearMessageAndLeavesTheCurrentDocumentAsItWas({ page, baseUrl }) {
  await openApp(page, baseUrl);
  const before = { title: await page.getByTestId('doc-title').textContent(), parts: await partCount(page), area: await resultValue(page, 'area') };
  await page.getByTestId('open-document').setInputFiles({ name: 'broken.section.json', mimeType: 'application/json', buffer: Buffer.from('{"format": "sectionsmith-section", "version": 1, "parts": [') });
  const banner = page.getByTestId('error-banner');
  await banner.waitFor({ timeout: 10_000 });
  const message = await banner.textContent();
  check(/broken\.section\.json/.test(message), `the message should name the file: ${message}`);
  check(/line \d+|column \d+|JSON|end of/i.test(message), `the message should say what is wrong: ${message}`);
  same('title after the broken file', await page.getByTestId('doc-title').textContent(), before.title);
  same('parts after the broken file', await partCount(page), before.parts);
  same('area after the broken file', await resultValue(page, 'area'), before.area);

  await page.getByTestId('open-document').setInputFiles({ name: 'wrong-unit.section.json', mimeType: 'application/json', buffer: Buffer.from(JSON.stringify({ format: 'sectionsmith-section', version: 1, name: 'x', unit: 'furlong', parts: [], materials: [], defaultMaterial: null })) });
  await page.waitForFunction(() => /unit/.test(document.querySelector('[data-testid="error-banner"]')?.textContent ?? '') && /furlong/.test(document.querySelector('[data-testid="error-banner"]')?.textContent ?? ''));
  same('parts after the invalid document', await partCount(page), before.parts);
}

export async function unsavedWorkIsOfferedBackInTheNextSession({ page, baseUrl, context }) {
  await openApp(page, baseUrl);
  const parts = await partCount(page);
  await page.getByTestId('part-select-0').click();
  await page.getByTestId('transform-delete').click();
  await page.waitForFunction((n) => document.querySelectorAll('[data-testid^="part-row-"]').length === n - 1, parts);
  // The recovery text is written shortly after the change (the app debounces it).
  await page.waitForFunction(() => Object.keys(localStorage).some((k) => k.startsWith('sectionsmith.recovery.') && (localStorage.getItem(k) ?? '').includes('sectionsmith-section')), null, { timeout: 10_000 });
  // The window goes away without saving; the next session in the same browser profile is offered its work.
  await page.close();
  const next = await context.newPage();
  await next.goto(baseUrl);
  await next.getByTestId('recovery-offer').waitFor({ timeout: 15_000 });
  await next.getByTestId('recovery-restore').click();
  await next.waitForFunction((n) => document.querySelectorAll('[data-testid^="part-row-"]').length === n - 1, parts);
}

export async function aSaveTheBrowserRefusesSaysWhyAndLeavesTheDocumentUnsaved({ page, baseUrl }) {
  // A file handle whose writes are refused, as for a read-only or locked file.
  await page.addInitScript(() => {
    window.showSaveFilePicker = async ({ suggestedName }) => ({
      kind: 'file',
      name: suggestedName,
      getFile: async () => new File([''], suggestedName),
      createWritable: async () => { throw new DOMException('refused', 'NoModificationAllowedError'); },
    });
  });
  await openApp(page, baseUrl);
  await page.getByTestId('part-select-0').click();
  await page.getByTestId('transform-delete').click();
  await page.waitForFunction(() => document.title.includes('•'));
  await menuItem(page, 'File', 'save-as');
  const banner = page.getByTestId('error-banner');
  await banner.waitFor({ timeout: 10_000 });
  const message = await banner.textContent();
  check(/locked or read-only/.test(message) && /unchanged/.test(message), `the message should say why the save failed: ${message}`);
  check((await page.title()).includes('•'), `the document should still be marked unsaved, title ${JSON.stringify(await page.title())}`);
}

export async function exportThroughAFileHandleWritesTheChosenFile({ page, baseUrl }) {
  await withPrivateFilePickers(page);
  await openApp(page, baseUrl);
  const unit = await page.getByTestId('document-unit').inputValue();
  const area = await resultValue(page, 'area');
  await menuItem(page, 'File', 'export-csv');
  await page.waitForFunction(async () => {
    for await (const name of (await navigator.storage.getDirectory()).keys()) if (name.endsWith('.csv')) return true;
    return false;
  });
  const csv = await page.evaluate(async () => {
    const root = await navigator.storage.getDirectory();
    for await (const [name, handle] of root.entries()) if (name.endsWith('.csv')) return (await handle.getFile()).text();
    return '';
  });
  const [header, values] = csv.trim().split('\r\n').map((line) => line.split(','));
  same('CSV area written through the handle', Number(values[header.indexOf(`area [${unit}^2]`)]), area);
}
