// Browser tests of the alternatives strip (renderer/app/sections/SectionsBar.tsx): several sections in one
// document, switched, added, copied, renamed, deleted and undone, saved and reopened with every
// section. Areas are sums of rectangles b·h; the centroid is ȳ = Σ A·y / Σ A (first moments;
// Gere & Timoshenko, Mechanics of Materials, §12.2).
import { check, downloadText, openApp, resultValue, withoutFilePickers } from './harness.mjs';
import { newSection, rel, typePlate } from './editor-support.mjs';

const near = (what, got, want, tol = 1e-12) => check(rel(got, want) <= tol, `${what}: expected ${want} (±${tol} relative), got ${got}`);
const same = (what, got, want) => check(JSON.stringify(got) === JSON.stringify(want), `${what}: expected ${JSON.stringify(want)}, got ${JSON.stringify(got)}`);

const tabNames = (page) => page.locator('[data-testid^="section-tab-"]').allInnerTexts();
const activeTab = (page) => page.locator('[data-testid^="section-tab-"][aria-selected="true"]').innerText();

/** Waits until the area shown is `want` (the results follow an edit or a switch). */
async function areaBecomes(page, want) {
  await page.waitForFunction((a) => Math.abs(Number(document.querySelector('[data-testid="result-area"]')?.getAttribute('data-value')) - a) <= 1e-9 * a, want, { timeout: 10_000 });
}

export async function theExampleHoldsThreeAlternativesAndEachTabShowsItsOwnArea({ page, baseUrl, artifactsDir }) {
  await openApp(page, baseUrl);
  same('tabs of the example', await tabNames(page), ['Base girder', 'Thicker flanges 30/35', 'Deeper webs 900']);
  // Flanges 700 × 20 and 520 × 25, two webs 12 × 800, a stiffener 12 × 120.
  near('A of the first alternative', await resultValue(page, 'area'), 700 * 20 + 2 * 12 * 800 + 520 * 25 + 12 * 120);
  await page.getByTestId('section-tab-1').click();
  await areaBecomes(page, 700 * 30 + 2 * 12 * 800 + 520 * 35 + 12 * 120);
  same('active tab', await activeTab(page), 'Thicker flanges 30/35');
  await page.getByTestId('section-tab-2').click();
  await areaBecomes(page, 700 * 20 + 2 * 12 * 900 + 520 * 25 + 12 * 120);
  check(!(await page.title()).includes('•'), `switching alternatives should not mark the file unsaved, got title ${JSON.stringify(await page.title())}`);
  await page.screenshot({ path: `${artifactsDir}/example-third-alternative.png` });
}

export async function aCopiedAlternativeIsEditedRenamedSavedAndReopenedBesideTheFirst({ page, baseUrl, artifactsDir }) {
  await withoutFilePickers(page);
  await openApp(page, baseUrl);
  await newSection(page);
  await typePlate(page, { b: 100, h: 200 });
  await areaBecomes(page, 100 * 200);
  await page.getByTestId('section-duplicate').click();
  same('tabs after the copy', await tabNames(page), ['Untitled section', 'Untitled section (copy)']);
  // A 100 × 50 cap plate on top of the copy: A = 20000 + 5000, ȳ = 5000·125 / 25000 = 25.
  await typePlate(page, { b: 100, h: 50, x: 0, y: 125 });
  await areaBecomes(page, 25000);
  near('ȳ of the copy with its cap plate', await resultValue(page, 'cy'), 25, 1e-12);
  await page.getByTestId('section-rename').click();
  await page.getByTestId('section-rename-input').fill('With cap plate');
  await page.getByTestId('section-rename-input').press('Enter');
  same('tabs after renaming', await tabNames(page), ['Untitled section', 'With cap plate']);
  await page.getByTestId('section-tab-0').click();
  await areaBecomes(page, 20000);
  await page.screenshot({ path: `${artifactsDir}/two-alternatives.png` });

  const saved = await downloadText(page, artifactsDir, () => page.getByTestId('save').click());
  const json = JSON.parse(saved.text);
  same('saved version', json.version, 3); // format version 3 (cut-out roles and joint kinds, issue 12)
  same('saved sections', json.sections.map((s) => [s.name, s.parts.length]), [['Untitled section', 1], ['With cap plate', 2]]);

  await newSection(page);
  same('tabs of a new document', await tabNames(page), ['Untitled section']);
  await page.getByTestId('open-document').setInputFiles(saved.file);
  await page.waitForFunction(() => document.querySelectorAll('[data-testid^="section-tab-"]').length === 2);
  same('tabs after reopening', await tabNames(page), ['Untitled section', 'With cap plate']);
  await areaBecomes(page, 20000);
  await page.getByTestId('section-tab-1').click();
  await areaBecomes(page, 25000);
}

export async function deletingAnAlternativeAsksFirstAndUndoBringsItBack({ page, baseUrl }) {
  await openApp(page, baseUrl);
  await page.getByTestId('section-tab-2').click();
  await page.getByTestId('section-delete').click();
  await page.getByTestId('section-delete-ask').waitFor();
  await page.getByTestId('section-delete-no').click();
  same('tabs after answering keep', (await tabNames(page)).length, 3);
  await page.getByTestId('section-delete').click();
  await page.getByTestId('section-delete-yes').click();
  same('tabs after deleting', await tabNames(page), ['Base girder', 'Thicker flanges 30/35']);
  same('active after deleting the last tab', await activeTab(page), 'Thicker flanges 30/35');
  check((await page.title()).includes('•'), 'deleting an alternative should mark the file unsaved');
  await page.getByTestId('undo').click();
  same('tabs after undo', await tabNames(page), ['Base girder', 'Thicker flanges 30/35', 'Deeper webs 900']);
  same('active after undo', await activeTab(page), 'Deeper webs 900');
  await areaBecomes(page, 700 * 20 + 2 * 12 * 900 + 520 * 25 + 12 * 120);
  // Down to one section, Delete is refused.
  await newSection(page);
  check(await page.getByTestId('section-delete').isDisabled(), 'Delete should be disabled when the document has one section');
}

export async function unsavedAlternativesComeBackWholeFromRecovery({ page, baseUrl, context }) {
  await openApp(page, baseUrl);
  await page.getByTestId('section-tab-1').click();
  await page.getByTestId('section-add').click();
  same('tabs after adding', await tabNames(page), ['Base girder', 'Thicker flanges 30/35', 'Alternative 4', 'Deeper webs 900']);
  await typePlate(page, { b: 100, h: 200 });
  await areaBecomes(page, 100 * 200);
  // The recovery text (written shortly after the change) holds every section.
  await page.waitForFunction(() => Object.keys(localStorage).some((k) => k.startsWith('sectionsmith.recovery.') && (localStorage.getItem(k) ?? '').includes('Alternative 4')), null, { timeout: 10_000 });
  await page.close(); // the window goes away without saving
  const next = await context.newPage();
  await next.goto(baseUrl);
  await next.getByTestId('recovery-offer').waitFor({ timeout: 15_000 });
  await next.getByTestId('recovery-restore').click();
  await next.waitForFunction(() => document.querySelectorAll('[data-testid^="section-tab-"]').length === 4);
  same('tabs after restoring', await tabNames(next), ['Base girder', 'Thicker flanges 30/35', 'Alternative 4', 'Deeper webs 900']);
  check((await next.title()).includes('•'), 'restored work is unsaved');
  await next.getByTestId('section-tab-2').click();
  await areaBecomes(next, 100 * 200);
}
