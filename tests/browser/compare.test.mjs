// Browser tests of the compare view (File › Compare alternatives…). Closed forms for plates
// b × h: A = b·h, Ix = b·h³/12 (Gere & Timoshenko, Mechanics of Materials, §12.3); midspan
// deflection of a simply supported beam under a uniform load, 5·w·L⁴/(384·E·I) (Roark, Table 8.1
// case 2e); E = 29,000 ksi for ASTM A992 steel (AISC Specification, common practice), 1 psi =
// 6894.757293168 Pa (exact from the definitions of the pound-force and the inch).
import { check, downloadText, menuItem, openApp, withoutFilePickers } from './harness.mjs';
import { newSection, rel, typePlate } from './editor-support.mjs';
import { printedPages } from './pdf-pages.mjs';

const near = (what, got, want, tol) => check(rel(got, want) <= tol, `${what}: expected ${want} (±${tol} relative), got ${got}`);

// A second alternative in a file of its own: a 50 × 400 mm steel plate, A = 20000 mm² like the typed one
// (E = 29,000 ksi, ν = 0.3, 7850 kg/m³: common practice for structural steel).
const DEEP = JSON.stringify({
  format: 'sectionsmith-section', version: 1, name: 'Deep plate 50 x 400', unit: 'mm', defaultMaterial: 'a992',
  materials: [{ id: 'a992', name: 'ASTM A992 steel', kind: 'steel', stressUnit: 'ksi', E: 29000, nu: 0.3, density: 7850, fy: 50, strengthBasis: 'yield' }],
  parts: [{ id: 'p', name: 'plate', type: 'rectangle', operation: 'add', material: null, visible: true, placement: { x: 0, y: 0, rotationDeg: 0, mirror: false }, width: 50, height: 400 }],
});

/** The typed 100 × 200 plate (no material) and the deep steel plate added from a file. */
async function twoPlates(page, baseUrl) {
  await withoutFilePickers(page);
  await openApp(page, baseUrl);
  await newSection(page);
  await typePlate(page, { b: 100, h: 200 });
  await page.getByTestId('result-Ix').waitFor();
  await menuItem(page, 'File', 'compare');
  await page.getByTestId('compare-view').waitFor();
  const [chooser] = await Promise.all([page.waitForEvent('filechooser'), page.getByTestId('compare-add-file').click()]);
  await chooser.setFiles({ name: 'deep-plate.section.json', mimeType: 'application/json', buffer: Buffer.from(DEEP) });
  await page.locator('[data-testid="compare-row"][data-name="Deep plate 50 x 400"]').waitFor();
}

const row = (page, name) => page.locator(`[data-testid="compare-row"][data-name="${name}"]`);
const cell = async (page, name, key, attr = 'data-value') => Number(await row(page, name).getByTestId(`compare-${key}`).getAttribute(attr));
const order = async (page) => page.getByTestId('compare-row').evaluateAll((rows) => rows.map((r) => r.dataset.name));

export async function twoPlatesShowClosedFormValuesRatiosToAClickedBaselineAndSortByAnyColumn({ page, baseUrl }) {
  await twoPlates(page, baseUrl);
  const typed = (await order(page)).find((n) => n !== 'Deep plate 50 x 400');
  check((await page.getByTestId('compare-row').count()) === 2, 'two alternatives in the table');
  check(await page.getByTestId('compare-caution').isVisible(), 'the caution is shown');
  // mm work shows A in mm² and Ix in 10⁶ mm⁴ (core/units defaultDisplaySet).
  near('A of 100 × 200', await cell(page, typed, 'A'), 20000, 1e-12);
  near('Ix of 100 × 200 in 10⁶ mm⁴', await cell(page, typed, 'Ix'), (100 * 200 ** 3) / 12 / 1e6, 1e-12);
  near('Ix of 50 × 400 in 10⁶ mm⁴', await cell(page, 'Deep plate 50 x 400', 'Ix'), (50 * 400 ** 3) / 12 / 1e6, 1e-12);
  // The first alternative is the baseline: Ix ratio (50·400³)/(100·200³) = 4 exactly.
  near('Ix ratio of the deep plate', await cell(page, 'Deep plate 50 x 400', 'Ix', 'data-ratio'), 4, 1e-12);
  await row(page, 'Deep plate 50 x 400').getByTestId('compare-baseline').click();
  await row(page, 'Deep plate 50 x 400').getByTestId('compare-baseline-tag').waitFor();
  near('Ix ratio of the typed plate to the deep one', await cell(page, typed, 'Ix', 'data-ratio'), 0.25, 1e-12);
  await page.getByTestId('compare-sort-Ix').click();
  check((await order(page))[0] === typed, 'sorted by Ix ascending: the typed plate (smaller Ix) first');
  await page.getByTestId('compare-sort-Ix').click();
  check((await order(page))[0] === 'Deep plate 50 x 400', 'clicking Ix again sorts descending');
  check((await page.getByTestId('compare-sort-Ix').getAttribute('aria-sort')) === 'descending', 'the heading says it sorts descending');
  check((await page.locator('[data-testid="compare-drawing"] svg path').count()) === 2, 'both outlines are drawn');
}

export async function sharedSpanGivesTheClosedFormDeflectionAndTargetsPickTheLightestPassingWithReasons({ page, baseUrl, artifactsDir }) {
  await twoPlates(page, baseUrl);
  const typed = (await order(page)).find((n) => n !== 'Deep plate 50 x 400');
  await page.getByTestId('compare-span').fill('6000');
  await page.getByTestId('compare-load').fill('2');
  const E = 29000e3 * 6894.757293168; // Pa
  const I = (50 * 400 ** 3) / 12 / 1e12; // m⁴
  const delta = (5 * 2000 * 6 ** 4) / (384 * E * I); // m
  await page.waitForFunction(() => document.querySelector('[data-testid="compare-row"][data-name="Deep plate 50 x 400"] [data-testid="compare-deflection"]')?.getAttribute('data-value'));
  near('deflection of the deep steel plate, mm', await cell(page, 'Deep plate 50 x 400', 'deflection'), delta * 1000, 1e-6);
  // span/360 = 16.67 mm: the deep plate (δ ≈ 3.5 mm) passes; the typed plate has no material, so no deflection.
  await page.getByTestId('compare-ratio').fill('360');
  await page.getByTestId('compare-min-ix').fill('100');
  await page.getByTestId('compare-lightest').waitFor();
  const lightest = await page.getByTestId('compare-lightest').innerText();
  check(lightest.includes('Deep plate 50 x 400'), `lightest meeting Ix ≥ 100·10⁶ mm⁴ and L/360: expected the deep plate, got "${lightest}"`);
  check(await row(page, 'Deep plate 50 x 400').getByTestId('compare-lightest-tag').isVisible(), 'the lightest passing row is marked');
  const why = await page.locator(`[data-testid="compare-fails"][data-name="${typed}"]`).innerText();
  check(/Ix 66\.67 10⁶ mm⁴ is below the 100 10⁶ mm⁴/.test(why), `reason for the typed plate names its Ix (b·h³/12 = 66.67·10⁶ mm⁴): got "${why}"`);
  check(/no deflection/.test(why), `reason names the missing deflection: got "${why}"`);
  await page.screenshot({ path: `${artifactsDir}/compare-targets.png` });
  // Tighter: Ix ≥ 300·10⁶ mm⁴ excludes both (deep plate Ix = 266.7·10⁶ mm⁴).
  await page.getByTestId('compare-min-ix').fill('300');
  await page.waitForFunction(() => /No alternative meets/.test(document.querySelector('[data-testid="compare-lightest"]')?.textContent ?? ''));
  await page.getByTestId('compare-load').fill('two');
  check(/uniform load \(kN\/m\): "two" is not a number/.test(await page.getByTestId('compare-input-errors').innerText()), 'a bad load is named');
}

export async function comparisonExportsCsvAndSvgWithTheCautionAndPrintsAReport({ page, baseUrl, artifactsDir }) {
  await twoPlates(page, baseUrl);
  const csv = await downloadText(page, artifactsDir, () => page.getByTestId('compare-export-csv').click());
  check(csv.name.endsWith('-comparison.csv'), `CSV name: got ${csv.name}`);
  check(csv.text.split('\r\n')[0].includes('Ix (geometric) [mm^4]'), 'CSV header has Ix, says which Ix it is, with its unit');
  check(csv.text.includes('Deep plate 50 x 400') && /licensed engineer/.test(csv.text), 'CSV has both rows and the caution');
  // Ix of 50 × 400 at full precision in mm⁴: 50·400³/12 = 266666666.66…
  const deepLine = csv.text.split('\r\n').find((l) => l.startsWith('Deep plate'));
  near('CSV Ix of the deep plate, mm⁴', Number(deepLine.split(',')[3]), (50 * 400 ** 3) / 12, 1e-12);
  const svg = await downloadText(page, artifactsDir, () => page.getByTestId('compare-export-svg').click());
  check((svg.text.match(/<path /g) ?? []).length === 2 && /licensed engineer/.test(svg.text), 'SVG has two outlines and the caution');
  await page.getByTestId('compare-report').click();
  await page.waitForFunction(() => document.querySelector('[data-testid="report-frame"]')?.contentDocument?.querySelector('h1')?.textContent === 'Comparison of 2 alternatives');
  const text = await page.evaluate(() => document.querySelector('[data-testid="report-frame"]').contentDocument.body.textContent);
  check(/Results are preliminary; verify with a licensed engineer/.test(text), 'the comparison report carries the caution');
  check(text.includes('Deep plate 50 x 400'), 'the comparison report lists the alternatives');
  await page.getByTestId('report-close').click();
  await page.getByTestId('compare-view').waitFor();
}

export async function comparisonReportPrintsWithBothTablesWholeAndTheCaution({ page, baseUrl, artifactsDir, context }) {
  await twoPlates(page, baseUrl);
  await page.getByTestId('compare-span').fill('6000');
  await page.getByTestId('compare-load').fill('2');
  await page.getByTestId('compare-ratio').fill('360');
  await page.getByTestId('compare-report').click();
  await page.waitForFunction(() => document.querySelector('[data-testid="report-frame"]')?.contentDocument?.querySelector('h1') != null);
  const html = await page.evaluate(() => `<!DOCTYPE html>\n${document.querySelector('[data-testid="report-frame"]').contentDocument.documentElement.outerHTML}`);
  const { pages } = await printedPages(context, html, artifactsDir, 'comparison');
  const flat = (t) => t.normalize('NFKC').replace(/\s+/g, '');
  check(pages.length <= 3, `comparison report: expected at most 3 pages, got ${pages.length}`);
  check(flat(pages.at(-1).text).includes(flat('verify with a licensed engineer and the local building code, which govern.')), 'caution on the last page');
  for (const title of ['Properties (ratio to', 'Efficiency, stiffness, weight, deflection and stress', 'Targets']) {
    check(pages.some((p) => flat(p.text).includes(flat(title))), `comparison report has "${title}"`);
  }
}
