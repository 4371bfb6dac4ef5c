// Browser tests of the printable report (File › Print report…). Closed forms for a 100 × 200 mm
// plate: A = b·h, Ix = b·h³/12, Sx = b·h²/6 (Gere & Timoshenko, Mechanics of Materials, §12.3,
// §5.4); Zx = b·h²/4 (common practice). Paper sizes: A4 is 210 × 297 mm (ISO 216), US Letter
// 8.5 × 11 in; 1 pt = 1/72 in and 1 in = 25.4 mm exactly.
import { readFileSync } from 'node:fs';
import path from 'node:path';
import { ROOT } from '../../electron/build.mjs';
import { check, menuItem, openApp } from './harness.mjs';
import { newSection, typePlate } from './editor-support.mjs';
import { printedPages, reportFrameHtml } from './pdf-pages.mjs';

const CAUTION = /Results are preliminary; verify with a licensed engineer and the local building code, which govern\./;
const mmToPt = (mm) => (mm / 25.4) * 72;

/** The value and unit cells of the report table row whose first cell is `symbol`. */
async function reportRow(page, symbol) {
  return page.evaluate((s) => {
    const doc = document.querySelector('[data-testid="report-frame"]').contentDocument;
    const row = [...doc.querySelectorAll('tr')].find((r) => r.cells[0]?.textContent === s);
    return row ? [...row.cells].map((c) => c.textContent) : null;
  }, symbol);
}

export async function reportOfATypedPlateTabulatesClosedFormValuesInDisplayUnitsWithTheCaution({ page, baseUrl }) {
  await openApp(page, baseUrl);
  await newSection(page);
  await typePlate(page, { b: 100, h: 200 });
  await page.getByTestId('result-Ix').waitFor();
  await menuItem(page, 'File', 'print-report');
  const html = await reportFrameHtml(page);
  // mm documents show 10³ mm³ and 10⁶ mm⁴ (core/units defaultDisplaySet), 4 figures by default.
  const expect = { A: ['20000', 'mm²'], Ix: ['66.67', '10⁶ mm⁴'], 'Sx top': ['666.7', '10³ mm³'], Zx: ['1000', '10³ mm³'] };
  for (const [symbol, [value, unit]] of Object.entries(expect)) {
    const row = await reportRow(page, symbol);
    check(row !== null, `report row ${symbol}: missing`);
    check(row[1] === value && row[2] === unit, `report row ${symbol}: expected ${value} ${unit}, got ${row[1]} ${row[2]}`);
  }
  check((html.match(new RegExp(CAUTION.source, 'g')) ?? []).length >= 2, 'the report carries the caution at its top and its end');
  check(/Green&apos;s theorem|Green's theorem/.test(html), 'method note on Green\'s theorem present');
  check(!/<script/i.test(html), 'the report holds no script');
  check(await page.getByTestId('report-caution').isVisible(), 'the report view shows the caution');
}

export async function exampleReportPrintsToFewA4PagesWithEveryTableWholeAndTheCautionOnTheFirstAndLastPage({ page, baseUrl, artifactsDir, context }) {
  await openApp(page, baseUrl, { exampleTorsion: true });
  // Wait for the finite-element torsion of the example, so the report has J, Cw and the mesh note.
  await page.locator('[data-testid="torsion"][data-state="done"]').waitFor({ timeout: 45_000 });
  await menuItem(page, 'File', 'print-report');
  await page.getByTestId('report-paper').selectOption('A4');
  await page.waitForFunction(() => /size: A4/.test(document.querySelector('[data-testid="report-frame"]')?.contentDocument?.head?.innerHTML ?? ''));
  const html = await reportFrameHtml(page);
  check(/finite elements \(6-node triangles\), \d+ elements, estimated relative error of J/.test(html), 'method note names the mesh element count and the error estimate');
  check(/Torsion \(finite elements\)/.test(html), 'torsion table present');
  const { pages } = await printedPages(context, html, artifactsDir, 'example-a4');
  check(pages.length >= 1 && pages.length <= 4, `example report: expected 1 to 4 A4 pages, got ${pages.length}`);
  for (const [i, p] of pages.entries()) {
    check(Math.abs(p.widthPt - mmToPt(210)) < 1 && Math.abs(p.heightPt - mmToPt(297)) < 1, `page ${i + 1}: expected A4 (${mmToPt(210).toFixed(1)} × ${mmToPt(297).toFixed(1)} pt), got ${p.widthPt} × ${p.heightPt}`);
  }
  // pdf.js splits words at glyph runs ("( fi nite"), so texts are compared with every space removed.
  const flat = (t) => t.normalize('NFKC').replace(/\s+/g, '');
  const caution = flat('Results are preliminary; verify with a licensed engineer and the local building code, which govern.');
  check(flat(pages[0].text).includes(caution), 'the caution is on the first page');
  check(flat(pages.at(-1).text).includes(caution), 'the caution is on the last page');
  // A table kept whole: its heading and its last row are printed on the same page.
  const whole = [
    // Last rows by their catalogue meanings (core/properties/catalogue.ts): r2, Zy/Sy and ys.
    ['Area, centroid, second moments and radii of gyration', 'radius of gyration, axis 2'],
    ['Elastic and plastic moduli', 'shape factor Zy / Sy,min'],
    ['Torsion (finite elements)', 'shear centre y (Trefftz)'],
  ];
  for (const [title, last] of whole) {
    const at = pages.findIndex((p) => flat(p.text).includes(flat(title)));
    const end = pages.findIndex((p) => flat(p.text).includes(flat(last)));
    check(at >= 0 && at === end, `table "${title}": heading on page ${at + 1}, last row on page ${end + 1}`);
  }
  console.log(`    example report: ${pages.length} A4 page(s); pages drawn to ${artifactsDir}`);
}

export async function letterPaperGivesUsLetterPagesAndPrintReachesTheReportFrame({ page, baseUrl, artifactsDir, context }) {
  await openApp(page, baseUrl);
  await menuItem(page, 'File', 'print-report');
  await page.getByTestId('report-paper').selectOption('Letter');
  await page.waitForFunction(() => /size: letter/.test(document.querySelector('[data-testid="report-frame"]')?.contentDocument?.head?.innerHTML ?? ''));
  const { pages } = await printedPages(context, await reportFrameHtml(page), artifactsDir, 'example-letter');
  check(Math.abs(pages[0].widthPt - 8.5 * 72) < 1 && Math.abs(pages[0].heightPt - 11 * 72) < 1, `US Letter page: expected 612 × 792 pt, got ${pages[0].widthPt} × ${pages[0].heightPt}`);
  // The Print button calls print() on the frame's own window (stubbed: a real dialog would block).
  await page.evaluate(() => {
    const w = document.querySelector('[data-testid="report-frame"]').contentWindow;
    w.print = () => {
      window.__printedTitle = w.document.querySelector('h1')?.textContent ?? '';
    };
  });
  await page.getByTestId('report-print').click();
  const printed = await page.evaluate(() => window.__printedTitle);
  // The example file's name, then its first section's, as the example file holds them.
  const example = JSON.parse(readFileSync(path.join(ROOT, 'assets', 'examples', 'footbridge-box-girder.section.json'), 'utf8'));
  const title = `${example.name} — ${example.sections[0].name}`;
  check(printed === title, `print() ran on the report frame: expected ${JSON.stringify(title)}, got ${JSON.stringify(printed)}`);
  check((await page.getByTestId('report-save-pdf').count()) === 0, 'the browser build offers no PDF button (its host has no printToPdf)');
}

// A steel plate opened from a file (E = 29,000 ksi, ν = 0.3, 7850 kg/m³: common practice for
// structural steel), 100 × 200 mm, 6 m simply supported under 2 kN/m: δ = 5·w·L⁴/(384·E·I)
// (Roark, Table 8.1 case 2e), M = w·L²/8 = 9 kN·m (statics); 1 psi = 6894.757293168 Pa exactly.
const STEEL_PLATE = JSON.stringify({
  format: 'sectionsmith-section', version: 1, name: 'Mezzanine edge plate', unit: 'mm', defaultMaterial: 'a992',
  materials: [{ id: 'a992', name: 'ASTM A992 steel', kind: 'steel', stressUnit: 'ksi', E: 29000, nu: 0.3, density: 7850, fy: 50, strengthBasis: 'yield' }],
  parts: [{ id: 'p', name: 'plate', type: 'rectangle', operation: 'add', material: null, visible: true, placement: { x: 0, y: 0, rotationDeg: 0, mirror: false }, width: 100, height: 200 }],
});

export async function reportCarriesTheMaterialAndTheMemberPanelsCaseWithClosedFormDeflectionAndMoment({ page, baseUrl, artifactsDir, context }) {
  await openApp(page, baseUrl);
  await page.getByTestId('open-document').setInputFiles({ name: 'edge-plate.section.json', mimeType: 'application/json', buffer: Buffer.from(STEEL_PLATE) });
  await page.waitForFunction(() => Math.abs(Number(document.querySelector('[data-testid="result-area"]')?.getAttribute('data-value')) - 20000) < 1e-6);
  await page.getByTestId('member-panel').locator('summary').click();
  await page.getByTestId('member-span').fill('6000');
  await page.getByTestId('member-point').fill('0');
  await page.getByTestId('member-uniform').fill('2');
  await page.getByTestId('member-limit').fill('360');
  await page.getByTestId('result-deflectionMax').waitFor();
  await menuItem(page, 'File', 'print-report');
  const html = await reportFrameHtml(page);
  const E = 29000e3 * 6894.757293168;
  const I = (100 * 200 ** 3) / 12 / 1e12;
  const delta = ((5 * 2000 * 6 ** 4) / (384 * E * I)) * 1000; // mm
  const got = Number(/Largest deflection ([\d.]+) mm/.exec(html)?.[1]);
  check(Math.abs(got - delta) / delta < 5e-4, `report deflection: expected ${delta.toPrecision(4)} mm (4 figures), got ${got}`);
  check(html.includes('Largest bending moment 9.000 kN·m'), 'report moment wL²/8 = 9 kN·m');
  check(html.includes('Within the common-practice limit L/360'), 'report names the L/360 verdict');
  check(/plate: ASTM A992 steel; E = 199900 MPa/.test(html), 'report lists the material with E = 29000 ksi = 199900 MPa (4 figures)');
  const { pages } = await printedPages(context, html, artifactsDir, 'steel-plate');
  check(pages.length <= 3, `steel plate report: expected at most 3 pages, got ${pages.length}`);
}
