// Hostile input in the editor (issue 18, findings 2 and 8): a part far beyond the coordinate
// limit is refused on opening with the command line's own words and the open document kept; a
// placement typed out there is reported and does not freeze the page (the grid once stepped
// k + 1 === k beyond 2^53 and never ended).
import { appUrl, check, openApp, partCount, resultValue } from './harness.mjs';

const far = {
  format: 'sectionsmith-section', version: 3, name: 'far away', unit: 'mm', materials: [], defaultMaterial: null,
  sections: [{ id: 's1', name: 'A', parts: [
    { id: 'p1', name: 'deck plate', type: 'rectangle', operation: 'add', material: null, visible: true, placement: { x: 1e20, y: 0, rotationDeg: 0, mirror: false }, width: 300, height: 20 },
  ] }],
};

export async function aPartAt1e20IsRefusedOnOpeningWithTheLimitAndTheDocumentKept({ page, baseUrl }) {
  await openApp(page, baseUrl);
  const before = { parts: await partCount(page), area: await resultValue(page, 'area') };
  await page.getByTestId('open-document').setInputFiles({ name: 'far.section.json', mimeType: 'application/json', buffer: Buffer.from(JSON.stringify(far)) });
  const banner = page.getByTestId('error-banner');
  await banner.waitFor({ timeout: 10_000 });
  const message = await banner.textContent();
  check(/far\.section\.json/.test(message) && /deck plate/.test(message) && /1000000000|1e\+?9/.test(message), `the message names the file, the part and the limit: ${message}`);
  check((await partCount(page)) === before.parts, 'the open document keeps its parts');
  check((await resultValue(page, 'area')) === before.area, 'the open document keeps its area');
  // Finding 8: the numbers still shown are said to be the open document's, not the refused file's.
  const notice = await page.getByTestId('results-refused').textContent();
  check(/far\.section\.json was not opened/.test(notice) && /footbridge-box-girder\.section\.json/.test(notice), `the results say whose they are: ${notice}`);
  // An edit to the open document makes its numbers plainly current again.
  await page.getByTestId('part-select-0').click();
  await page.getByTestId('transform-delete').click();
  await page.getByTestId('results-refused').waitFor({ state: 'detached' });
}

export async function oneViewThatFailsToDrawLeavesTheRestOfTheEditorAndTheDocument({ page, baseUrl }) {
  // ?break-view=results makes the results view throw while it renders (a test hook in ErrorBoundary.tsx).
  await page.goto(`${appUrl(baseUrl)}&break-view=results`);
  const failed = page.getByTestId('view-error');
  await failed.waitFor({ timeout: 20_000 });
  check((await failed.getAttribute('data-view')) === 'results', 'the failed view is the results view, not the whole app');
  check(/results view could not be drawn/.test(await failed.textContent()), 'the view says it could not be drawn');
  // Everything else is drawn, around the same document: its parts, the drawing, the menus.
  await page.waitForFunction(() => document.querySelectorAll('[data-testid^="part-row-"]').length > 0);
  const parts = await partCount(page);
  check(await page.getByTestId('canvas').isVisible(), 'the drawing is still shown');
  check((await page.locator('[data-testid="result-area"]').count()) === 0, 'the failed view shows no numbers');
  // The document is live: an edit goes through and can be undone.
  await page.getByTestId('part-select-0').click();
  await page.getByTestId('transform-delete').click();
  await page.waitForFunction((n) => document.querySelectorAll('[data-testid^="part-row-"]').length === n - 1, parts);
  await page.getByTestId('undo').click();
  await page.waitForFunction((n) => document.querySelectorAll('[data-testid^="part-row-"]').length === n, parts);
}

export async function aPlacementTypedAt1e20IsReportedAndThePageStaysResponsive({ page, baseUrl }) {
  await openApp(page, baseUrl);
  await page.getByTestId('part-select-0').click();
  const x = page.getByTestId('selected-x');
  await x.fill('1e20');
  await x.press('Enter');
  await page.getByTestId('diagnostic').first().waitFor({ timeout: 10_000 });
  const text = await page.getByTestId('diagnostics').textContent();
  check(/1000000000|1e\+?9/.test(text), `the diagnostic names the limit: ${text}`);
  // The page still answers (a frozen page times out here).
  const alive = await page.evaluate(() => new Promise((resolve) => requestAnimationFrame(() => resolve(true))));
  check(alive === true, 'the page keeps drawing frames');
}

