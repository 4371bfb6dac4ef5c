// Browser tests of the editor's layout at 1400 × 900 and 1920 × 1080 (renderer/app/shell): the
// selected part's editor is in view without scrolling, the side panels use a wide screen, no two
// labels on the drawing overlap (renderer/app/canvas/labels.ts, read from the labels' DOM mirror),
// an empty alternative shows nothing left over, and (through the harness) no console error.
// Screenshots of each size go to the test's artifacts folder.
import path from 'node:path';
import { check, menuItem, openApp } from './harness.mjs';

const SIZES = [
  { width: 1400, height: 900 },
  { width: 1920, height: 1080 },
];

/** Every pair of label boxes on the canvas, with the names of any two that overlap. */
async function overlappingLabels(page) {
  return page.evaluate(() => {
    const boxes = [...document.querySelectorAll('[data-testid="canvas-label"]')].map((li) => {
      const [x, y, w, h] = li.getAttribute('data-box').split(' ').map(Number);
      return { id: li.getAttribute('data-label'), x, y, w, h };
    });
    const bad = [];
    for (let i = 0; i < boxes.length; i++)
      for (let j = i + 1; j < boxes.length; j++) {
        const a = boxes[i], b = boxes[j];
        if (a.x < b.x + b.w && b.x < a.x + a.w && a.y < b.y + b.h && b.y < a.y + a.h) bad.push(`${a.id} × ${b.id}`);
      }
    return { count: boxes.length, bad };
  });
}

async function showOverlay(page, key) {
  await page.getByTestId('menu-view').click();
  const box = page.getByTestId(`overlay-${key}`);
  if (!(await box.isChecked())) await box.check();
  await page.getByTestId('menu-view').click();
}

/** One size per test: the example opens on a first start only, so each size needs a fresh browser profile. */
async function layoutAt(size, { page, baseUrl, artifactsDir }) {
  {
    await page.setViewportSize(size);
    await openApp(page, baseUrl);
    await showOverlay(page, 'pna');
    await showOverlay(page, 'fibres');
    // Select the last part in the list (the lowest row), as a user scrolling down would.
    const rows = await page.locator('[data-testid^="part-select-"]').count();
    await page.getByTestId(`part-select-${rows - 1}`).click();
    const panel = page.getByTestId('selection-panel');
    await panel.waitFor();
    const where = await page.evaluate(() => {
      const el = document.querySelector('[data-testid="selection-panel"]');
      const name = el.querySelector('input');
      const r = el.getBoundingClientRect();
      const n = name.getBoundingClientRect();
      const left = document.querySelector('aside.left');
      return { top: r.top, nameBottom: n.bottom, scroll: left.scrollTop, inner: window.innerHeight, right: document.querySelector('aside.right').getBoundingClientRect().width };
    });
    check(where.scroll === 0, `${size.width}: the left column should not need scrolling, scrollTop ${where.scroll}`);
    check(where.top >= 0 && where.nameBottom <= where.inner, `${size.width}: the selected part's editor should be in view: top ${where.top}, its first field ends at ${where.nameBottom} of ${where.inner}`);
    if (size.width === 1920) check(where.right > 420, `1920: the right panel should use the width, got ${where.right} px`);
    const labels = await overlappingLabels(page);
    check(labels.count >= 4, `${size.width}: expected the centroid, axis and PNA labels on the drawing, found ${labels.count}`);
    check(labels.bad.length === 0, `${size.width}: canvas labels overlap: ${labels.bad.join(', ')}`);
    await page.screenshot({ path: path.join(artifactsDir, `layout-${size.width}x${size.height}.png`) });
  }
}

export async function at1400x900TheSelectedPartsEditorIsInViewAndLabelsDoNotOverlap(t) {
  await layoutAt(SIZES[0], t);
}

export async function at1920x1080TheSelectedPartsEditorIsInViewThePanelsUseTheWidthAndLabelsDoNotOverlap(t) {
  await layoutAt(SIZES[1], t);
}

export async function theStressLegendNeverCoversALabel({ page, baseUrl, artifactsDir }) {
  await openApp(page, baseUrl);
  await page.locator('summary', { hasText: 'Normal stress and kern' }).click();
  await page.getByTestId('stress-Mx').fill('500');
  await page.getByTestId('stress-N').fill('-200');
  await page.locator('[data-testid="canvas-label"][data-label="stress-max"]').waitFor({ state: 'attached', timeout: 20_000 });
  const labels = await overlappingLabels(page);
  check(labels.bad.length === 0, `labels overlap with the stress map on: ${labels.bad.join(', ')}`);
  await page.screenshot({ path: path.join(artifactsDir, 'stress-labels.png') });
}

export async function anEmptyAlternativeShowsNothingLeftOver({ page, baseUrl }) {
  await openApp(page, baseUrl);
  await page.getByTestId('section-add').click();
  await page.waitForFunction(() => document.querySelectorAll('[data-testid^="part-row-"]').length === 0);
  await page.waitForFunction(() => document.querySelectorAll('[data-testid="canvas-label"]').length === 0, null, { timeout: 10_000 });
  const stale = await page.locator('[data-testid="result-area"]').count();
  check(stale === 0, `an empty alternative should show no values from the previous one, found ${stale} area value(s)`);
}

export async function theShortcutSheetListsTheKeysUnderHelp({ page, baseUrl }) {
  await openApp(page, baseUrl);
  await menuItem(page, 'Help', 'shortcuts');
  const sheet = page.getByTestId('shortcut-sheet');
  await sheet.waitFor();
  const text = await sheet.textContent();
  check(/Ctrl\+C/.test(text) && /Copy/.test(text) && /Ctrl\+V/.test(text) && /Paste/.test(text), `the sheet should list copy and paste: ${text.slice(0, 200)}`);
  await page.getByTestId('shortcut-sheet-close').click();
}
