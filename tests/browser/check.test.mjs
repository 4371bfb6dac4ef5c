// Browser tests of the table-check view (renderer/app/check/CheckView.tsx) through the app's own menu.
// Reference: the published AISC Shapes Database v15.0 subset copied in tests/fixtures/aisc-v15-subset.csv
// (AISC, Nov 2017; consistent with the Steel Construction Manual, 15th ed.). Tolerances are those of
// tests/check/table.test.ts for the same reasons (SOURCES.md caveats: 3 significant figures, fillet
// r = kdes − tf; S and C toes sharp; MC flange slope not published; L radii not published).
import { spawnSync } from 'node:child_process';
import { readFileSync, writeFileSync } from 'node:fs';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import Papa from 'papaparse';
import { check, downloadText, menuItem, openApp, withoutFilePickers } from './harness.mjs';

const here = path.dirname(fileURLToPath(import.meta.url));
const SUBSET = readFileSync(path.join(here, '..', 'fixtures', 'aisc-v15-subset.csv'), 'utf8');
const BASE = '1.5%';
const EXTRA = 'A=1%, S:Iy=3%, S:Sy=3%, S:Zy=3%, C:Iy=3%, C:Sy=3%, C:Zy=3%, MC:A=2%, MC:Ix=2%, MC:Sx=2%, MC:Zx=2%, MC:Iy=7%, MC:Sy=7%, MC:Zy=4%, MC:ry=3%, L:Zx=2%, L:Zy=2%, L:Iz=2.5%';

const cells = () => Papa.parse(SUBSET, { header: false, skipEmptyLines: true }).data;
/** The subset with cells edited: edits = [[designation, column, new value], …]. */
function corrupted(edits) {
  const rows = cells();
  for (const [designation, column, value] of edits) {
    const r = rows.findIndex((row) => row[0] === designation);
    const c = rows[0].indexOf(column);
    check(r > 0 && c >= 0, `fixture has ${designation} / ${column}`);
    rows[r][c] = value;
  }
  return Papa.unparse(rows);
}

async function openCheck(page, baseUrl) {
  await withoutFilePickers(page);
  await openApp(page, baseUrl);
  await menuItem(page, 'File', 'check-table');
  await page.getByTestId('check-view').waitFor();
}

/** Imports `text` as `name` through the host's table open (the file input fallback without pickers). */
async function importTable(page, name, text) {
  const [chooser] = await Promise.all([page.waitForEvent('filechooser'), page.getByTestId('check-import').click()]);
  await chooser.setFiles({ name, mimeType: 'text/csv', buffer: Buffer.from(text) });
  await page.getByTestId('check-file').filter({ hasText: name }).waitFor();
}

async function setTolerances(page) {
  await page.getByTestId('check-tolerance').fill(BASE);
  await page.getByTestId('check-tolerance-extra').fill(EXTRA);
}

async function runCheck(page) {
  await page.getByTestId('check-run').click();
  await page.locator('[data-testid="check-summary"], [data-testid="check-error"]').first().waitFor({ timeout: 45_000 });
  const error = await page.getByTestId('check-error').count();
  if (error > 0) return { error: await page.getByTestId('check-error').innerText() };
  return {
    checked: Number(await page.getByTestId('summary-rows-checked').innerText()),
    flagged: Number(await page.getByTestId('summary-rows-flagged').innerText()),
  };
}

const flaggedRows = (page) => page.locator('[data-testid^="report-row-"][data-flagged="true"]').evaluateAll((rows) => rows.map((r) => r.querySelector('th')?.textContent));

export async function publishedSubsetAllPassAndEveryCorruptionOfACopyIsFlaggedOnItsCell({ page, baseUrl, artifactsDir }) {
  await openCheck(page, baseUrl);
  const caution = await page.getByTestId('check-caution').innerText();
  check(/licensed engineer/.test(caution) && /preliminary/.test(caution), `caution shown in the view, got "${caution}"`);
  await importTable(page, 'aisc-v15-subset.csv', SUBSET);
  // Detected mapping with units: A_in2 → A in², Ix_in4 → Ix in⁴ (suffix units), J_in4 listed as not checked.
  const header = cells()[0];
  const at = (h) => header.indexOf(h);
  check((await page.getByTestId(`map-target-${at('A_in2')}`).inputValue()) === 'A', 'A_in2 detected as A');
  check((await page.getByTestId(`map-unit-${at('Ix_in4')}`).inputValue()) === 'in4', 'Ix_in4 detected in in⁴');
  check((await page.getByTestId(`map-target-${at('J_in4')}`).inputValue()) === 'ignore', 'J_in4 not checked');
  await setTolerances(page);
  const all = await runCheck(page);
  check(all.checked === 23 && all.flagged === 0, `published subset: expected 23 checked, 0 flagged, got ${JSON.stringify(all)}`);
  await page.screenshot({ path: path.join(artifactsDir, 'subset-pass.png'), fullPage: false });

  // Corruptions: W14X90 A 26.5 → 27.9 in² (+5.3 %), HSS6X6X1/4 Ix 28.6 → 31.0 in⁴ (+8.4 %),
  // L4X4X1/2 thickness 0.5 → 0.45 in (every property of the rebuilt angle drops ~10 %).
  const bad = corrupted([['W14X90', 'A_in2', '27.9'], ['HSS6X6X1/4', 'Ix_in4', '31.0'], ['L4X4X1/2', 't_in', '0.45']]);
  await importTable(page, 'subset-corrupted.csv', bad);
  const note = await page.getByTestId('check-remember-note').innerText();
  check(/applied/.test(note), `the same headers bring back the remembered mapping, got "${note}"`);
  const some = await runCheck(page);
  check(some.checked === 23 && some.flagged === 3, `corrupted copy: expected 23 checked, 3 flagged, got ${JSON.stringify(some)}`);
  const rowOf = (d) => cells().findIndex((r) => r[0] === d); // row 1 = first below the header
  const cell = (d, k) => page.getByTestId(`cell-${rowOf(d)}-${k}`);
  check((await cell('W14X90', 'A').getAttribute('data-flagged')) === 'true', 'W14X90 A cell flagged');
  check((await cell('W14X90', 'Ix').getAttribute('data-flagged')) === 'false', 'W14X90 Ix cell not flagged');
  check((await cell('HSS6X6X1/4', 'Ix').getAttribute('data-flagged')) === 'true', 'HSS6X6X1/4 Ix cell flagged');
  check((await cell('L4X4X1/2', 'A').getAttribute('data-flagged')) === 'true', 'L4X4X1/2 A cell flagged (t changed)');
  // The A deviation of W14X90 against 27.9: its computed A is within 1 % of 26.5 (the pass above),
  // so computed/27.9 − 1 lies in [26.5·0.99/27.9 − 1, 26.5·1.01/27.9 − 1] = [−5.97 %, −4.07 %].
  const dev = Number(await cell('W14X90', 'A').getAttribute('data-deviation'));
  check(dev >= -0.0597 && dev <= -0.0407, `W14X90 A deviation in [−5.97 %, −4.07 %], got ${dev}`);
  const cellText = await cell('W14X90', 'A').innerText();
  check(/27\.9/.test(cellText), `the flagged cell shows the tabulated 27.9, got "${cellText}"`);
  // Every flagged entry of the worst-deviation list names one of the three corrupted rows.
  const worst = (await page.getByTestId('check-worst').innerText()).split('\n').filter((l) => /flagged/.test(l));
  check(worst.length > 0 && worst.every((l) => /W14X90|HSS6X6X1\/4|L4X4X1\/2/.test(l)), `worst deviations flagged only on corrupted rows, got ${JSON.stringify(worst)}`);

  await page.getByTestId('check-flagged-only').check();
  const shown = await page.locator('[data-testid^="report-row-"]').count();
  const names = await flaggedRows(page);
  check(shown === 3 && ['W14X90', 'HSS6X6X1/4', 'L4X4X1/2'].every((n) => names.includes(n)), `flagged-only shows the 3 corrupted rows, got ${shown}: ${names}`);
  await page.screenshot({ path: path.join(artifactsDir, 'corrupted-flagged.png'), fullPage: false });
}

export async function exportedReportHasOneLinePerRowWithStatusAndTheCaution({ page, baseUrl, artifactsDir }) {
  await openCheck(page, baseUrl);
  await importTable(page, 'subset-corrupted.csv', corrupted([['W14X90', 'A_in2', '27.9']]));
  await setTolerances(page);
  const r = await runCheck(page);
  check(r.flagged === 1, `one corrupted row flagged, got ${JSON.stringify(r)}`);
  const saved = await downloadText(page, artifactsDir, () => page.getByTestId('check-export').click());
  check(saved.name === 'subset-corrupted-check.csv', `report name, got ${saved.name}`);
  const report = Papa.parse(saved.text, { header: true, skipEmptyLines: true }).data;
  check(report.length === 23, `23 report lines, got ${report.length}`);
  const w = report.find((x) => x.designation === 'W14X90');
  check(w?.status === 'flagged' && report.filter((x) => x.status === 'pass').length === 22, `W14X90 flagged, 22 pass`);
  check(Number(w['A table [in^2]']) === 27.9, `tabulated A in the report, got ${w['A table [in^2]']}`);
  check(/licensed engineer/.test(w.caution), 'caution in every report line');
}

export async function aColumnCorrectedByDropdownIsUsedRememberedAndSavedForTheCommandLine({ page, baseUrl, artifactsDir }) {
  await openCheck(page, baseUrl);
  // W rows with the depth column renamed to a header no detection knows.
  const rows = cells();
  const keep = ['label', 'shape_type', 'd_in', 'bf_in', 'tw_in', 'tf_in', 'kdes_in', 'A_in2', 'Ix_in4'];
  const idx = keep.map((h) => rows[0].indexOf(h));
  const table = Papa.unparse([['label', 'shape_type', 'Column 3', ...keep.slice(3)], ...rows.slice(1).filter((r) => /^W\d/.test(r[0])).map((r) => idx.map((i) => r[i]))]);
  await importTable(page, 'w-renamed.csv', table);
  check((await page.getByTestId('map-target-2').inputValue()) === 'ignore', '"Column 3" is not detected');
  const before = await runCheck(page);
  const notChecked = Number(await page.getByTestId('summary-rows-not-checked').innerText());
  check(before.checked === 0 && before.flagged === 0 && notChecked === 7, `without d no W row can be built: all 7 not checked (with the reason), none passed or flagged, got ${JSON.stringify(before)}, not checked ${notChecked}`);
  await page.getByTestId('map-target-2').selectOption('d');
  check((await page.getByTestId('map-unit-2').inputValue()) === 'in', 'a corrected dimension takes the table unit, in');
  await page.getByTestId('check-tolerance').fill('1.5%');
  await page.getByTestId('check-tolerance-extra').fill('A=1%');
  const after = await runCheck(page);
  check(after.checked === 7 && after.flagged === 0, `with the corrected column all 7 W rows pass, got ${JSON.stringify(after)}`);
  check((await page.getByTestId('check-stale').count()) === 0, 'a fresh report is not marked out of date');
  // The mapping saved as JSON is the command line's --mapping file: the same table passes there too.
  const saved = await downloadText(page, artifactsDir, () => page.getByTestId('check-save-mapping').click());
  check(saved.name === 'w-renamed-mapping.json', `mapping file name, got ${saved.name}`);
  const depth = JSON.parse(saved.text).columns.find((c) => c.header === 'Column 3');
  check(depth?.role === 'dimension' && depth.symbol === 'd' && depth.unit === 'in', `saved mapping reads "Column 3" as d in inches, got ${JSON.stringify(depth)}`);
  const csv = path.join(artifactsDir, 'w-renamed.csv');
  writeFileSync(csv, table);
  const cli = spawnSync('node', [path.join(here, '..', '..', 'cli', 'sectionsmith.mjs'), 'check', csv, '--mapping', saved.file, '--tolerance', '1.5%', '--tolerance', 'A=1%'], { encoding: 'utf8' });
  check(cli.status === 0 && /7 rows: 7 pass, 0 flagged/.test(cli.stdout), `sectionsmith check --mapping with the saved file: exit ${cli.status}, ${cli.stdout.split('\n')[0]} ${cli.stderr}`);
  await page.getByTestId('check-tolerance').fill('2%');
  await page.getByTestId('check-stale').waitFor();
  // A new visit (same browser storage): the correction comes back for the same headers.
  await page.reload();
  await page.getByTestId('menu-file').waitFor({ timeout: 20_000 });
  await menuItem(page, 'File', 'check-table');
  await importTable(page, 'w-renamed-again.csv', table);
  check((await page.getByTestId('map-target-2').inputValue()) === 'd', 'the remembered mapping reads "Column 3" as d');
  // Issue 13: the same table with two columns added (Sx, and a notes column) keeps the correction,
  // and the view names the columns the remembered mapping did not know.
  const sx = rows[0].indexOf('Sx_in3');
  const wider = Papa.unparse([['label', 'shape_type', 'Column 3', ...keep.slice(3), 'Sx_in3', 'Notes'], ...rows.slice(1).filter((r) => /^W\d/.test(r[0])).map((r) => [...idx.map((i) => r[i]), r[sx], 'from the mill'])]);
  await importTable(page, 'w-renamed-wider.csv', wider);
  check((await page.getByTestId('map-target-2').inputValue()) === 'd', 'with columns added, the remembered mapping still reads "Column 3" as d');
  const wideNote = await page.getByTestId('check-remember-note').innerText();
  check(/9 of these 11 columns/.test(wideNote) && /"Sx_in3"/.test(wideNote) && /"Notes"/.test(wideNote), `the note names the columns it did not know, got "${wideNote}"`);
  check((await page.getByTestId('map-row-9').getAttribute('data-new-column')) === 'true' && (await page.getByTestId('map-row-2').getAttribute('data-new-column')) === null, 'the new columns are marked in the mapping, the known ones are not');
  check((await page.getByTestId('map-target-9').inputValue()) === 'Sx', 'the added Sx_in3 column is read from its header');
  const wide = await runCheck(page);
  check(wide.checked === 7 && wide.flagged === 0, `the wider table passes with the reused mapping, got ${JSON.stringify(wide)}`);
  await importTable(page, 'w-renamed-again.csv', table);
  check((await page.getByTestId('map-target-2').inputValue()) === 'd', 'the narrower table still finds its own mapping');
  await page.getByTestId('check-forget').click();
  check((await page.getByTestId('map-target-2').inputValue()) === 'ignore', 'forgetting returns to detection');
}

export async function badTablesGetAMessageNamingTheRowAndColumn({ page, baseUrl }) {
  await openCheck(page, baseUrl);
  await importTable(page, 'nan.csv', corrupted([['W8X31', 'A_in2', 'abc']]));
  const r = await runCheck(page);
  check(/row 1 \(W8X31\), column "A_in2": "abc" is not a number/.test(r.error ?? ''), `non-numeric cell named, got ${JSON.stringify(r)}`);
  // No type column: each row's family comes from its designation (W…, HP…, L…), and the
  // published rows pass at the families' default tolerances, as on the command line.
  const noType = Papa.unparse(cells().map((row) => row.filter((_, i) => i !== 1)));
  await importTable(page, 'no-type.csv', noType);
  const t = await runCheck(page);
  check(t.error === undefined && t.checked === 23 && t.flagged === 0, `families from the designations, all 23 published rows pass, got ${JSON.stringify(t)}`);
  // An unterminated quote is refused at import, naming the CSV problem.
  const [chooser] = await Promise.all([page.waitForEvent('filechooser'), page.getByTestId('check-import').click()]);
  await chooser.setFiles({ name: 'quote.csv', mimeType: 'text/csv', buffer: Buffer.from('label,shape_type,A_in2\n"W8X31,W,9.13\n') });
  const msg = await page.getByTestId('check-import-error').filter({ hasText: 'quote.csv' }).innerText();
  check(/quote\.csv/.test(msg) && /CSV/.test(msg), `unterminated quote reported with the file, got "${msg}"`);
  // Two columns set to one property: refused before the check, naming both columns.
  await importTable(page, 'ok.csv', SUBSET);
  const header = cells()[0];
  await page.getByTestId(`map-target-${header.indexOf('Sx_in3')}`).selectOption('Ix');
  const twice = await page.getByTestId('check-mapping-error').innerText();
  check(/columns "Ix_in4" and "Sx_in3" both map to Ix/.test(twice), `two columns on Ix named, got "${twice}"`);
  check((await page.getByTestId(`map-target-${header.indexOf('Sx_in3')}`).inputValue()) === 'Ix', 'the dropdown keeps what the user chose');
  check(await page.getByTestId('check-run').isDisabled(), 'the check waits for a consistent mapping');
  await page.getByTestId('check-reset').click();
  // A per-property tolerance naming an unknown property is refused before the check.
  await page.getByTestId('check-tolerance-extra').fill('Qx=2%');
  const tol = await page.getByTestId('check-tolerance-error').innerText();
  check(/unknown property "Qx"/.test(tol), `unknown tolerance property named, got "${tol}"`);
  check(await page.getByTestId('check-run').isDisabled(), 'the check waits for a valid tolerance');
}

export async function twoThousandRowsAreCheckedWhileThePageKeepsRenderingProgress({ page, baseUrl, artifactsDir }) {
  await openCheck(page, baseUrl);
  const rows = cells();
  const body = [];
  while (body.length < 2000) body.push(...rows.slice(1));
  const big = Papa.unparse([rows[0], ...body.slice(0, 2000)]);
  await importTable(page, 'subset-x2000.csv', big);
  await setTolerances(page);
  // Every progress value the page renders while the check runs: a check on the page's own thread
  // would leave no room to render any value between 0 and the end.
  await page.evaluate(() => {
    window.__progressSeen = [];
    new MutationObserver(() => {
      const bar = document.querySelector('[data-testid="check-progress"]');
      if (bar) window.__progressSeen.push(Number(bar.getAttribute('value')));
    }).observe(document.body, { subtree: true, childList: true, attributes: true, attributeFilter: ['value'] });
  });
  await page.getByTestId('check-run').click();
  await page.getByTestId('check-summary').waitFor({ timeout: 50_000 });
  const checked = Number(await page.getByTestId('summary-rows-checked').innerText());
  const flagged = Number(await page.getByTestId('summary-rows-flagged').innerText());
  const ms = Number(await page.getByTestId('summary-time').getAttribute('data-ms'));
  const between = await page.evaluate(() => [...new Set(window.__progressSeen.filter((v) => v > 0 && v < 2000))]);
  console.log(`    2,000 rows checked in the view's worker in ${ms} ms; ${between.length} progress values rendered meanwhile`);
  check(checked === 2000 && flagged === 0, `2000 rows, none flagged, got ${checked} / ${flagged}`);
  check(between.length >= 1, `the page rendered progress while the check ran, got ${JSON.stringify(between)}`);
  const pageText = await page.getByTestId('check-page').innerText();
  check(/rows 1–100 of 2000/.test(pageText), `the report shows a page of 100 rows, got "${pageText}"`);
  await page.screenshot({ path: path.join(artifactsDir, 'x2000.png') });
}

export async function aMillimetreTableWithoutUnitsPassesOnceItsUnitIsChosen({ page, baseUrl }) {
  await openCheck(page, baseUrl);
  // The W rows converted to mm (1 in = 25.4 mm exactly), headers without units: plain numbers.
  const rows = cells();
  const keep = [['label', 0], ['shape_type', 0], ['d_in', 1], ['bf_in', 1], ['tw_in', 1], ['tf_in', 1], ['kdes_in', 1], ['A_in2', 2], ['Ix_in4', 4], ['Zx_in3', 3]];
  const idx = keep.map(([h]) => rows[0].indexOf(h));
  const body = rows.slice(1).filter((r) => /^W\d/.test(r[0])).map((r) => idx.map((i, k) => (keep[k][1] === 0 ? r[i] : String(Number(r[i]) * 25.4 ** keep[k][1]))));
  const table = Papa.unparse([keep.map(([h]) => h.replace(/_in\d?$/, '')), ...body]);
  await importTable(page, 'w-metric.csv', table);
  await page.getByTestId('check-unit').selectOption('mm');
  check((await page.getByTestId('map-unit-8').inputValue()) === 'mm4', 'the Ix column without a unit takes the table unit, mm⁴');
  await page.getByTestId('check-tolerance').fill('1.5%');
  await page.getByTestId('check-tolerance-extra').fill('A=1%');
  const r = await runCheck(page);
  check(r.checked === 7 && r.flagged === 0, `the metric W rows pass, got ${JSON.stringify(r)}`);
  const head = await page.getByTestId('check-rows').locator('thead').innerText();
  check(/Ix \[mm⁴\]/.test(head), `report columns in mm⁴, got "${head}"`);
  // Rechecked as inches, the designations are read as AISC labels: the area in "in²" (really mm²)
  // gives a nominal weight 645 times the label's, so every row is flagged.
  await page.getByTestId('check-unit').selectOption('in');
  const wrong = await runCheck(page);
  check(wrong.flagged === 7, `read as inches every row is flagged by its label weight, got ${JSON.stringify(wrong)}`);
}
