// Typed quantities keep their meaning (issue 11): the reproductions replayed in the browser
// and checked against closed forms.
//
// Hand values (exact arithmetic on the example's plates, parallel-axis theorem; Gere & Timoshenko,
// Mechanics of Materials §12.5): base girder = 700 × 20 top flange at y = 410, two 12 × 800 webs at
// y = 0, a 520 × 25 bottom flange at y = −412.5 and a 12 × 120 stiffener at y = −340 (mm).
// E = 29,000 ksi (AISC 360-16 §B4, common practice); 1 psi = 6894.757293168361 Pa (NIST SP 811
// Appendix B.8, from the exact definitions of lbf and in). δ = 5wL⁴/384EI (AISC Manual Table 3-23
// case 1); σ = N/A + M·(y − ȳ)/I (Gere & Timoshenko §11.5).
import { check, menuItem, openApp } from './harness.mjs';
import { discardIfAsked, newSection, rel, resultValue } from './editor-support.mjs';

const KSI = 1000 * 6894.757293168361;
const E = 29_000 * KSI;
const PLATES = [[700, 20, 410], [12, 800, 0], [12, 800, 0], [520, 25, -412.5], [12, 120, -340]];
const A = PLATES.reduce((s, [b, h]) => s + b * h, 0);
const CY = PLATES.reduce((s, [b, h, y]) => s + b * h * y, 0) / A;
const IX_M4 = PLATES.reduce((s, [b, h, y]) => s + (b * h ** 3) / 12 + b * h * (y - CY) ** 2, 0) * 1e-12;

const inputValue = (page, id) => page.getByTestId(id).inputValue();

async function waitForValue(page, id, want) {
  await page.waitForFunction(([i, w]) => document.querySelector(`[data-testid="${i}"]`)?.value === w, [id, want], { timeout: 10_000 }).catch(() => undefined);
  const got = await inputValue(page, id);
  check(got === want, `${id}: expected "${want}", got "${got}"`);
}

/** Types into a box and leaves it (Tab), as a person does. */
async function type(page, id, text) {
  await page.getByTestId(id).fill(text);
  await page.getByTestId(id).press('Tab');
}

export async function memberAndStressInputsKeepTheirPhysicalValueWhenTheDocumentUnitChanges({ page, baseUrl }) {
  await openApp(page, baseUrl);
  await menuItem(page, 'Help', 'open-example');
  await discardIfAsked(page);
  // A992 steel on its parts (the example's default material; chosen again, as the user did).
  await page.getByTestId('default-material').selectOption('astm-a992');
  await page.locator('summary', { hasText: 'Member check' }).click();
  await waitForValue(page, 'member-span', '24000');
  await type(page, 'member-live-uniform', '0');
  await page.getByTestId('member-selfweight').uncheck();
  await type(page, 'member-span', '12000');
  await type(page, 'member-uniform', '15');
  await page.getByTestId('result-deflectionMax').waitFor();
  const want = (5 * 15_000 * 12 ** 4) / (384 * E * IX_M4);
  check(Math.abs(want * 1000 - 3.517) < 5e-4, `hand δ = 3.517 mm, got ${want * 1000}`);
  const before = await resultValue(page, 'deflectionMax');
  check(rel(before, want) < 1e-9, `δ = 5wL⁴/384EI = ${want} m, got ${before}`);

  await page.locator('summary', { hasText: 'Normal stress and kern' }).click();
  await type(page, 'stress-N', '-500');
  await type(page, 'stress-Mx', '1500');
  await page.getByTestId('result-sigmaMax').waitFor();
  const sigma = -500_000 / (A * 1e-6) + (1_500_000 * (420 - CY) * 1e-3) / IX_M4;
  check(Math.abs(sigma / 1e6 - 99.52) < 0.005, `hand σmax = 99.52 MPa, got ${sigma / 1e6}`);
  check(rel(await resultValue(page, 'sigmaMax'), sigma / 1e6) < 1e-9, 'σmax in MPa before the switch');

  await page.getByTestId('document-unit').selectOption('in');
  // 12 m / 0.0254 = 472.441 in; 15 kN/m = 1.02783 kip/ft; −500 kN = −112.404 kip; 1500 kN·m = 1106.34 kip·ft (exact factors).
  await waitForValue(page, 'member-span', '472.441');
  check(await page.getByTestId('member-span').getAttribute('data-unit') === 'in', 'L is shown in in');
  await waitForValue(page, 'member-uniform', '1.02783');
  check(await page.getByTestId('member-uniform').getAttribute('data-unit') === 'kip/ft', 'w is shown in kip/ft');
  await waitForValue(page, 'stress-N', '-112.404');
  await waitForValue(page, 'stress-Mx', '1106.34');
  await page.waitForFunction(() => document.querySelector('[data-testid="result-sigmaMax"]')?.getAttribute('data-unit') === 'ksi');
  const ksi = await resultValue(page, 'sigmaMax');
  check(rel(ksi, sigma / KSI) < 1e-9 && Math.abs(ksi - 14.43) < 0.005, `σmax = 14.43 ksi after the switch, got ${ksi}`);
  const after = await resultValue(page, 'deflectionMax');
  check(rel(after, want) < 1e-9, `δ keeps its physical value: ${want} m, got ${after}`);
  const shown = Number(await page.getByTestId('result-deflectionMax').getAttribute('data-shown'));
  check(rel(shown, want / 0.0254) < 1e-9, `δ is shown in in: ${want / 0.0254}, got ${shown}`);

  // Nonsense is refused by name and the document keeps its value.
  await page.getByTestId('member-span').fill('15 kN');
  const message = await page.getByTestId('member-error').innerText();
  check(/span L: "15 kN" is a force, not a length/.test(message), `the refusal names the box and the text, got "${message}"`);
  await page.getByTestId('member-span').press('Escape');
  await waitForValue(page, 'member-span', '472.441');
  check(rel(await resultValue(page, 'deflectionMax'), want) < 1e-9, 'the document kept its span');
}

export async function fileNewAndTheExampleStartFromTheirOwnInputsCarryingNothingOver({ page, baseUrl }) {
  await openApp(page, baseUrl);
  await menuItem(page, 'Help', 'open-example');
  await discardIfAsked(page);
  await page.locator('summary', { hasText: 'Member check' }).click();
  await page.locator('summary', { hasText: 'Normal stress and kern' }).click();
  await waitForValue(page, 'member-span', '24000'); // the example's own 24 m case
  await type(page, 'member-span', '9000');
  await type(page, 'stress-N', '-500');
  await newSection(page);
  // Defaults of a mm document: a 6 m span, no load, L/240 and L/360, stress factor 1; forces zero.
  await waitForValue(page, 'member-span', '6000');
  await waitForValue(page, 'member-uniform', '0');
  await waitForValue(page, 'member-limit', '240');
  await waitForValue(page, 'member-live-limit', '360');
  await waitForValue(page, 'stress-N', '0');
  await type(page, 'member-span', '7000');
  await menuItem(page, 'Help', 'open-example');
  await discardIfAsked(page);
  await waitForValue(page, 'member-span', '24000');
  await waitForValue(page, 'stress-N', '0');
  const verdict = await page.getByTestId('member-overall-verdict').innerText();
  check(/^PASSES: .* governs at/.test(verdict), `the example's own case gives a verdict naming what governs, got "${verdict}"`);
}
