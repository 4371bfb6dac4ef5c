// Helpers for the editor's browser tests: where a section point is on screen, and reading
// result values (data-value holds the full-precision number in the document unit).

/** Screen position of section point (x, y): the canvas publishes its view as data-view (screen y is down). */
export async function screenOf(page, x, y) {
  const canvas = page.getByTestId('canvas');
  const box = await canvas.boundingBox();
  const view = JSON.parse(await canvas.getAttribute('data-view'));
  return { x: box.x + view.ox + x * view.scale, y: box.y + view.oy - y * view.scale };
}

export async function resultValue(page, key) {
  const text = await page.getByTestId(`result-${key}`).getAttribute('data-value');
  return Number(text);
}

/** Starts from an empty millimetre document (the example opens on first start). */
export async function newSection(page) {
  await page.getByTestId('menu-file').click();
  await page.getByTestId('menu-new').click();
  // Either the in-page question appears (unsaved changes) or the document empties at once: wait
  // for whichever comes, rather than a fixed 1.5 s for a question that is not coming.
  await page.waitForFunction(() => document.querySelector('[data-testid="confirm-discard-yes"]') !== null || document.querySelectorAll('[data-testid^="part-row-"]').length === 0);
  if (await page.getByTestId('confirm-discard-yes').count() > 0) await page.getByTestId('confirm-discard-yes').click();
  await page.waitForFunction(() => document.querySelectorAll('[data-testid^="part-row-"]').length === 0);
}

/** Answers the in-page "discard unsaved changes?" dialog with yes, when it appears. */
export async function discardIfAsked(page) {
  const yes = page.getByTestId('confirm-discard-yes');
  await yes.waitFor({ timeout: 1500 }).then(() => yes.click(), () => undefined);
}

export async function typePlate(page, { b, h, x = 0, y = 0, cut = false }) {
  await page.getByTestId('entry-rect-width').fill(String(b));
  await page.getByTestId('entry-rect-height').fill(String(h));
  await page.getByTestId('entry-rect-x').fill(String(x));
  await page.getByTestId('entry-rect-y').fill(String(y));
  await page.getByTestId(cut ? 'entry-rect-subtract' : 'entry-rect-add').click();
}

export async function typeRound(page, { d, x = 0, y = 0, cut = false }) {
  await page.getByTestId('entry-circle-diameter').fill(String(d));
  await page.getByTestId('entry-circle-x').fill(String(x));
  await page.getByTestId('entry-circle-y').fill(String(y));
  await page.getByTestId(cut ? 'entry-circle-subtract' : 'entry-circle-add').click();
}

/** Relative difference, for comparing against closed forms. */
export const rel = (got, want) => Math.abs(got - want) / Math.max(Math.abs(want), 1e-300);


/** Opens the assemblies section and picks an assembly kind. */
export async function openAssemblies(page, kind) {
  const box = page.getByTestId('assemblies');
  if ((await box.getAttribute('open')) === null) await box.locator('summary').click();
  await page.getByTestId('assembly-kind').selectOption(kind);
}

/** Fills the assembly form: text boxes typed, drop-downs chosen, by field key. */
export async function fillAssembly(page, values) {
  for (const [key, value] of Object.entries(values)) {
    const field = page.getByTestId(`assembly-field-${key}`);
    if ((await field.evaluate((e) => e.tagName)) === 'SELECT') await field.selectOption(String(value));
    else await field.fill(String(value));
  }
}
