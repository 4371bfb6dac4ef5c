// Hostile input in the editor (issue 18, findings 2 and 8): a part far beyond the coordinate
// limit is refused on opening with the command line's own words and the open document kept; a
// placement typed out there is reported and does not freeze the page (the grid once stepped
// k + 1 === k beyond 2^53 and never ended).
import { check, openApp, partCount, resultValue } from './harness.mjs';

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

