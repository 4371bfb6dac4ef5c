// Browser tests of the drawing's dimension lines (renderer/app/canvas/DimensionLines.tsx) and
// of the one precision rule of dimension labels (core/units/dimension.ts: 1 decimal in mm).
// Sizes are exact arithmetic: 7.44 in = 188.976 mm and 15 in = 381 mm (1 in = 25.4 mm).
import path from 'node:path';
import { check, openApp } from './harness.mjs';
import { newSection, typePlate } from './editor-support.mjs';

/** The drawing's labels from their DOM mirror: id → text. */
async function canvasLabels(page) {
  return page.evaluate(() => Object.fromEntries([...document.querySelectorAll('[data-testid="canvas-label"]')].map((li) => [li.getAttribute('data-label'), li.textContent])));
}

export async function dimensionLabelsShareOnePrecisionAndTheSelectedPartIsDimensioned({ page, baseUrl, artifactsDir }) {
  await openApp(page, baseUrl);
  await newSection(page);
  // 381 × 188.976: the "381 sits next to 188.976".
  await typePlate(page, { b: 381, h: 188.976 });
  await page.getByTestId('zoom-fit').click();
  await page.locator('[data-testid="canvas-label"][data-label="height"]').waitFor({ state: 'attached' });
  let labels = await canvasLabels(page);
  check(labels.width === '381.0' && labels.height === '189.0', `overall dimensions should both have one decimal (mm): width "${labels.width}", height "${labels.height}"`);
  await page.getByTestId('part-select-0').click();
  await page.locator('[data-testid="canvas-label"][data-label="part-depth"]').waitFor({ state: 'attached' });
  labels = await canvasLabels(page);
  check(labels['part-width'] === '381.0', `selected part's width: expected "381.0", got "${labels['part-width']}"`);
  check(labels['part-depth'] === '189.0', `selected part's depth: expected "189.0", got "${labels['part-depth']}"`);
  for (const [id, text] of Object.entries(labels)) {
    if (!/^(width|height|part-)/.test(id)) continue;
    check(/^-?\d+\.\d$/.test(text), `dimension label ${id} should have exactly one decimal in mm, got "${text}"`);
  }
  await page.screenshot({ path: path.join(artifactsDir, 'dimensions-selected-plate.png') });
  // Nothing selected: the part's dimension lines go.
  await page.keyboard.press('Escape');
  await page.waitForFunction(() => document.querySelector('[data-testid="canvas-label"][data-label="part-width"]') === null, null, { timeout: 5000 });
}

export async function inAnInchDocumentDimensionLabelsHaveThreeDecimals({ page, baseUrl }) {
  await openApp(page, baseUrl);
  await newSection(page);
  await page.getByTestId('document-unit').selectOption('in');
  await typePlate(page, { b: 15, h: 7.44 });
  await page.getByTestId('part-select-0').click();
  await page.locator('[data-testid="canvas-label"][data-label="part-depth"]').waitFor({ state: 'attached' });
  const labels = await canvasLabels(page);
  check(labels['part-width'] === '15.000' && labels['part-depth'] === '7.440', `inch labels: expected 15.000 and 7.440, got ${labels['part-width']} and ${labels['part-depth']}`);
  check(labels.width === '15.000', `overall width in inches: expected 15.000, got ${labels.width}`);
}
