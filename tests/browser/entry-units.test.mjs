// Browser test of the exact-input form in an inch document (issue 11 item 4: an inch document
// offered a 100 × 200 plate, which is a 100 × 200 inch plate) and of lengths typed with their unit.
// References: plate area b·h and a round's area π·d²/4 (exact arithmetic); 1 in = 25.4 mm exactly
// (NIST SP 811, Appendix B.8).
import { check, openApp } from './harness.mjs';
import { newSection, rel, resultValue } from './editor-support.mjs';

export async function anInchDocumentOffersAFourByEightInchPlateAndReadsAHoleTypedInMillimetres({ page, baseUrl }) {
  await openApp(page, baseUrl);
  await newSection(page);
  check((await page.getByTestId('entry-rect-width').inputValue()) === '100', 'a mm document offers a 100 mm wide plate');
  await page.getByTestId('document-unit').selectOption('in');
  await page.waitForFunction(() => document.querySelector('[data-testid="entry-rect-width"]')?.value === '4');
  check((await page.getByTestId('entry-rect-height').inputValue()) === '8', 'and 8 in deep');
  check((await page.getByTestId('entry-circle-diameter').inputValue()) === '0.75', 'and a 3/4 in round');
  await page.getByTestId('entry-rect-add').click();
  await page.waitForFunction(() => Number(document.querySelector('[data-testid="result-area"]')?.getAttribute('data-value')) === 32);
  // A 25.4 mm hole typed in millimetres into the inch form is a 1 in hole: A = 32 − π/4 in².
  await page.getByTestId('entry-circle-diameter').fill('25.4 mm');
  await page.getByTestId('entry-circle-subtract').click();
  await page.waitForFunction(() => Number(document.querySelector('[data-testid="result-area"]')?.getAttribute('data-value')) < 32);
  const area = await resultValue(page, 'area');
  check(rel(area, 32 - Math.PI / 4) <= 1e-9, `area 32 − π/4 in², got ${area}`);
  // The centroid of the centred plate and hole is 0, shown as 0.
  check((await page.getByTestId('result-cx').innerText()).trim() === '0', 'x̄ shown as 0');
  // A force typed as a length is refused, naming the field and the text.
  await page.getByTestId('entry-rect-width').fill('10 kN');
  await page.getByTestId('entry-rect-add').click();
  const error = await page.getByTestId('entry-error').innerText();
  check(/width b: "10 kN" is a force, not a length/.test(error), `refusal names the field and the text: ${error}`);
}
