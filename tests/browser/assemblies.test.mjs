// Browser tests of the palette's assemblies (renderer/app/parts/AssemblyPicker.tsx): placing a plate
// girder and a flitch beam, and refusing bad input. References: plate areas b·t; the doubly
// symmetric I, Ix = [B·D³ − (B − tw)·h³]/12 (Gere & Timoshenko, Mechanics of Materials, §12.5;
// common practice); transformed section EI = Σ E_i·I_i about a common centroid (Gere & Timoshenko,
// composite beams); dressed 2x12 = 1.5 × 11.25 in (NDS Supplement 2018 Table 1A); E = 29,000 ksi
// for steel (AISC 360-16, common practice), E = 1,600,000 psi for Douglas Fir-Larch No. 2 (NDS
// Supplement Table 4A, from memory); exact unit definitions (25.4 mm per inch, 1 lbf = 4.4482216152605 N).
import path from 'node:path';
import { check, openApp, partCount } from './harness.mjs';
import { fillAssembly, newSection, openAssemblies, rel, resultValue } from './editor-support.mjs';

const near = (what, got, want, tol) => check(rel(got, want) <= tol, `${what}: expected ${want} (±${tol} relative), got ${got}`);
const PA_PER_PSI = 4.4482216152605 / 0.0254 ** 2;

async function waitForArea(page, area) {
  await page.waitForFunction((a) => Math.abs(Number(document.querySelector('[data-testid="result-area"]')?.getAttribute('data-value')) - a) <= 1e-9 * a, area, { timeout: 10_000 });
}

export async function aPlacedPlateGirderGivesAreaAndIxOfTheClosedFormInOneUndoStep({ page, baseUrl, artifactsDir }) {
  await openApp(page, baseUrl);
  await newSection(page);
  await openAssemblies(page, 'plate-girder');
  // Footbridge girder, mm: web 1200 × 12, flanges 400 × 25.
  await fillAssembly(page, { webH: 1200, webT: 12, topB: 400, topT: 25, bottomB: 400, bottomT: 25 });
  const A = 1200 * 12 + 2 * 400 * 25;
  const preview = await page.getByTestId('assembly-preview').innerText();
  check(preview.includes('3 parts') && preview.includes('34400'), `preview: expected 3 parts and A 34400, got "${preview}"`);
  await page.getByTestId('assemblies').screenshot({ path: path.join(artifactsDir, 'plate-girder-form.png') });
  await page.getByTestId('assembly-place').click();
  await waitForArea(page, A);
  near('A = Σ b·t', await resultValue(page, 'area'), A, 1e-12);
  near('Ix = [B·D³ − (B − tw)·h³]/12', await resultValue(page, 'Ix'), (400 * 1250 ** 3 - 388 * 1200 ** 3) / 12, 1e-12);
  near('x̄ = 0 by symmetry', Math.abs(await resultValue(page, 'cx')) + 1, 1, 1e-9);
  check((await partCount(page)) === 3, `parts after placing: expected 3, got ${await partCount(page)}`);
  const names = await page.getByTestId('part-list').locator('li').allInnerTexts();
  check(['web plate', 'top flange plate', 'bottom flange plate'].every((n) => names.some((t) => t.includes(n))), `part names: got ${JSON.stringify(names)}`);
  const selected = await page.locator('[data-testid="part-list"] li.selected').count();
  check(selected === 3, `selected after placing: expected all 3, got ${selected}`);
  await page.screenshot({ path: path.join(artifactsDir, 'plate-girder-placed.png') });
  await page.getByTestId('undo').click();
  check((await partCount(page)) === 0, `one undo removes the whole girder: got ${await partCount(page)} parts`);
}

export async function badInputIsNamedNextToItsFieldAndLeavesTheDocumentUnchanged({ page, baseUrl, artifactsDir }) {
  await openApp(page, baseUrl);
  await newSection(page);
  await openAssemblies(page, 'plate-girder');
  await fillAssembly(page, { webT: '-12' });
  const message = await page.getByTestId('assembly-error-webT').innerText();
  check(message.includes('thickness tw') && message.includes('greater than 0'), `web thickness message: got "${message}"`);
  await page.getByTestId('assembly-place').click();
  const refused = await page.getByTestId('assembly-refused').innerText();
  check(/nothing placed/i.test(refused), `refusal: got "${refused}"`);
  check((await partCount(page)) === 0, `bad input placed ${await partCount(page)} parts`);
  check(!(await page.getByTestId('undo').isEnabled()), 'bad input made an undo step');
  await openAssemblies(page, 'cover-plated-i');
  await fillAssembly(page, { shape: 'W14X9' });
  await page.getByTestId('assembly-catalogue-results').waitFor();
  const shapeMessage = await page.getByTestId('assembly-error-shape').innerText();
  check(shapeMessage.includes('"W14X9" is not in the catalogue'), `designation message: got "${shapeMessage}"`);
  await page.getByTestId('assemblies').screenshot({ path: path.join(artifactsDir, 'cover-plated-search.png') });
  await page.getByTestId('assembly-catalogue-result-0').click();
  check((await page.getByTestId('assembly-error-shape').count()) === 0, 'picking a catalogue result clears the designation message');
}

export async function aFlitchBeamInADocumentWithMaterialsGetsLumberAndSteelAndShowsEI({ page, baseUrl, artifactsDir }) {
  await openApp(page, baseUrl);
  await newSection(page);
  await page.getByTestId('default-material').selectOption('df-l-no2');
  await openAssemblies(page, 'flitch-beam');
  await fillAssembly(page, { lumber: '2x12', plies: 2, plateT: 12, plateDepth: '' });
  const timber = await page.getByTestId('assembly-material-timber').inputValue();
  const steel = await page.getByTestId('assembly-material-steel').inputValue();
  check(timber === 'df-l-no2' && steel === 'astm-a36', `role materials: expected df-l-no2 and astm-a36, got ${timber} and ${steel}`);
  await page.getByTestId('assemblies').screenshot({ path: path.join(artifactsDir, 'flitch-form.png') });
  await page.getByTestId('assembly-place').click();
  // Two dressed 2x12 plies, 38.1 × 285.75 mm, and one 12 × 285.75 mm plate.
  const b = 1.5 * 25.4;
  const d = 11.25 * 25.4;
  await waitForArea(page, 2 * b * d + 12 * d);
  await page.getByTestId('result-EIx').waitFor({ timeout: 10_000 });
  const m = 1e-3;
  const ei = 1.6e6 * PA_PER_PSI * 2 * (b * m * (d * m) ** 3) / 12 + 29e6 * PA_PER_PSI * (12 * m * (d * m) ** 3) / 12;
  near('EIx = E_wood·I_plies + E_steel·I_plate (N·m²)', await resultValue(page, 'EIx'), ei, 1e-9);
  await page.getByTestId('result-EIx').scrollIntoViewIfNeeded();
  await page.screenshot({ path: path.join(artifactsDir, 'flitch-placed.png') });
}

export async function aCoverPlatedW14X90WithFlangeHolesChangesTheAreaByThePlateLessTheHoleStrips({ page, baseUrl, artifactsDir }) {
  await openApp(page, baseUrl);
  await newSection(page);
  await page.getByTestId('document-unit').selectOption('in');
  await openAssemblies(page, 'cover-plated-i');
  // The W14X90 on its own first (plates and holes cleared).
  await fillAssembly(page, { shape: 'W14X90', topB: '', topT: '', bottomB: '', bottomT: '', holeD: '' });
  await page.getByTestId('assembly-place').click();
  await page.waitForFunction(() => document.querySelectorAll('[data-testid^="part-row-"]').length === 1);
  const alone = await resultValue(page, 'area');
  await page.getByTestId('undo').click();
  await page.waitForFunction(() => document.querySelectorAll('[data-testid^="part-row-"]').length === 0);
  // A 16 × 3/4 in top plate; two 15/16 in holes per flange at the published W14X90 gauge WGi = 5 1/2 in
  // (AISC v15.0), through the flange (tf = 0.71 in) and, on top, the plate as well.
  await fillAssembly(page, { topB: 16, topT: '3/4', holeD: '15/16', holeColumns: 2, holeGauge: '' });
  await page.getByTestId('assembly-place').click();
  await page.waitForFunction(() => document.querySelectorAll('[data-testid^="part-row-"]').length === 6);
  const dh = 15 / 16;
  const change = 16 * 0.75 - 2 * dh * (0.71 + 0.75) - 2 * dh * 0.71;
  // The holes are fastener holes: the gross area gains the plate only; the net area loses the strips too.
  near('gross ΔA = b·t (exact arithmetic)', (await resultValue(page, 'area')) - alone, 16 * 0.75, 1e-9);
  const area = await resultValue(page, 'net-area');
  near('net ΔA = b·t − Σ hole strips (exact arithmetic)', area - alone, change, 1e-9);
  await page.screenshot({ path: path.join(artifactsDir, 'cover-plated-placed.png') });
}
