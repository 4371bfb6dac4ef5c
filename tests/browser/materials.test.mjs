// Browser tests of the materials editor (renderer/app/materials/MaterialEditor.tsx, MaterialsPanel.tsx):
// adding, editing, duplicating and deleting a document's own materials, the reference modulus
// E_ref, transformed widths, and saving a document whose materials came from the library.
// References: EI = Σ E_i·I_i about the E-weighted centroid and n_i = E_i / E_ref (Gere &
// Timoshenko, Mechanics of Materials, the transformed-section method); rectangle I = b·h³/12;
// exact unit definitions (1 psi = 4.4482216152605 N / 0.0254² m²).
import path from 'node:path';
import { check, downloadText, menuItem, openApp, withoutFilePickers } from './harness.mjs';
import { newSection, rel, resultValue, typePlate } from './editor-support.mjs';

const near = (what, got, want, tol) => check(rel(got, want) <= tol, `${what}: expected ${want} (±${tol} relative), got ${got}`);
const PA_PER_PSI = 4.4482216152605 / 0.0254 ** 2;

async function materialRows(page) {
  return page.locator('[data-testid^="material-row-"]').count();
}

/** Modular ratio n of material piece i (data-value of piece-n-i). */
async function pieceN(page, i) {
  return Number(await page.getByTestId(`piece-n-${i}`).getAttribute('data-value'));
}

async function selectPart(page, index) {
  await page.getByTestId(`part-select-${index}`).click();
  await page.getByTestId('selected-material').waitFor();
}

/** A mezzanine flitch beam: a 100 × 200 mm timber (part 1) with a 10 × 200 mm steel plate beside it (part 2, x 50…60). */
async function flitchBeam(page) {
  await newSection(page);
  await typePlate(page, { b: 100, h: 200 });
  await typePlate(page, { b: 10, h: 200, x: 55 });
  await page.getByTestId('default-material').selectOption('df-l-no2');
  await selectPart(page, 1);
  await page.getByTestId('selected-material').selectOption('astm-a36');
  await page.getByTestId('piece-n-1').waitFor();
}

export async function aNewMaterialWithBadFieldsIsRefusedFieldByFieldKeepsTheTextThenSavesAsOneUndoStep({ page, baseUrl, artifactsDir }) {
  await openApp(page, baseUrl);
  await newSection(page);
  await typePlate(page, { b: 100, h: 200 });
  await page.getByTestId('material-new').click();
  await page.getByTestId('mf-name').fill('Trailer rail steel');
  await page.getByTestId('mf-E').fill('two hundred');
  await page.getByTestId('mf-nu').fill('0.7');
  await page.getByTestId('mf-density').fill('7850');
  await page.getByTestId('mf-fy').fill('');
  await page.getByTestId('mf-save').click();
  const eError = await page.getByTestId('mf-error-E').innerText();
  check(/^E \(modulus of elasticity\): .*"two hundred"/.test(eError), `E's message names the field and the text, got "${eError}"`);
  const nuError = await page.getByTestId('mf-error-nu').innerText();
  check(/below 0\.5/.test(nuError), `ν's message says the bound, got "${nuError}"`);
  check(/enter a value/.test(await page.getByTestId('mf-error-fy').innerText()), 'fy left blank is named');
  check((await page.getByTestId('mf-E').inputValue()) === 'two hundred', 'the typed text stays in the field');
  check((await materialRows(page)) === 0, 'the document is unchanged while the form has errors');
  check(/document is unchanged/.test(await page.getByTestId('mf-not-saved').innerText()), 'the form says nothing was saved');
  await page.getByTestId('material-form').screenshot({ path: path.join(artifactsDir, 'material-form-errors.png') });

  // Structural steel E = 200 000 MPa, ν = 0.3 (common practice, from memory); fy of our own.
  await page.getByTestId('mf-E').fill('200000');
  await page.getByTestId('mf-nu').fill('0.3');
  await page.getByTestId('mf-fy').fill('250');
  check((await page.getByTestId('mf-error-E').count()) === 0, 'a corrected field loses its message as it is typed');
  await page.getByTestId('mf-save').click();
  await page.getByTestId('material-row-trailer-rail-steel').waitFor();
  await page.getByTestId('default-material').selectOption('trailer-rail-steel');
  await page.getByTestId('result-EIx').waitFor();
  // One material: EIx = E·Ix = 2e11 Pa × (100·200³/12) mm⁴ × 1e-12 m⁴/mm⁴ (identity, exact arithmetic).
  near('EIx = E·b·h³/12', await resultValue(page, 'EIx'), 2e11 * ((100 * 200 ** 3) / 12) * 1e-12, 1e-12);
  // Plastic moment of a rectangle, Mp = fy·b·h²/4 (common practice): 250e6 Pa × 0.1 m × 0.2² m² / 4 = 250 000 N·m.
  near('Mp,x = fy·b·h²/4', await resultValue(page, 'MpxMaterials'), 250e6 * 0.1 * 0.2 ** 2 / 4, 1e-9);
  near('Mp,y = fy·h·b²/4', await resultValue(page, 'MpyMaterials'), 250e6 * 0.2 * 0.1 ** 2 / 4, 1e-9);
  await page.getByTestId('mp-angle').fill('90');
  await page.waitForFunction((want) => Math.abs(Number(document.querySelector('[data-testid="result-MpAngle"]')?.getAttribute('data-value')) - want) < 1e-6 * want, 250e6 * 0.2 * 0.1 ** 2 / 4);
  // First yield of one material: My = fy·S = fy·b·h²/6 (flexure formula).
  near('My,x = fy·b·h²/6', Number(await page.getByTestId('piece-myx-0').getAttribute('data-value')), 250e6 * 0.1 * 0.2 ** 2 / 6, 1e-9);
  await page.screenshot({ path: path.join(artifactsDir, 'materials-panel.png') });
  // Two undo steps: the default, then the material itself.
  await menuItem(page, 'Edit', 'undo');
  await page.getByTestId('result-EIx').waitFor({ state: 'detached' });
  await menuItem(page, 'Edit', 'undo');
  await page.getByTestId('material-row-trailer-rail-steel').waitFor({ state: 'detached' });
}

export async function aLibraryMaterialDuplicatedAndEditedKeepsItsOtherValuesAndDeletingItReassignsThePartToTheDefault({ page, baseUrl, artifactsDir }) {
  await openApp(page, baseUrl);
  await flitchBeam(page);
  // Choosing library materials copied both into the document.
  await page.getByTestId('material-row-df-l-no2').waitFor();
  await page.getByTestId('material-row-astm-a36').waitFor();
  await page.getByTestId('material-duplicate-astm-a36').click();
  check((await page.getByTestId('mf-name').inputValue()) === 'Steel ASTM A36 (Fy 36 ksi) (copy)', 'the duplicate is named as a copy');
  check((await page.getByTestId('mf-E').inputValue()) === '29000', 'the duplicate shows E = 29000 (ksi, the library value)');
  await page.getByTestId('material-editor').screenshot({ path: path.join(artifactsDir, 'duplicate-form.png') });
  await page.getByTestId('mf-name').fill('Plate steel, reduced E');
  await page.getByTestId('mf-E').fill('14500');
  await page.getByTestId('mf-save').click();
  await page.getByTestId('material-row-plate-steel-reduced-e').waitFor();
  await selectPart(page, 1);
  await page.getByTestId('selected-material').selectOption('plate-steel-reduced-e');
  // n of the plate to the timber's E: 14 500 ksi / 1 600 000 psi = 9.0625 (exact arithmetic; library values).
  await page.waitForFunction(() => Math.abs(Number(document.querySelector('[data-testid="piece-n-1"]')?.getAttribute('data-value')) - 9.0625) < 1e-12);

  await page.getByTestId('material-delete-plate-steel-reduced-e').click();
  await page.getByTestId('material-editor').screenshot({ path: path.join(artifactsDir, 'delete-box.png') });
  const message = await page.getByTestId('material-delete-message').innerText();
  check(/will use the document default, "Douglas Fir-Larch No\. 2"/.test(message), `the delete names the part and its new material, got "${message}"`);
  check(/Part 2|part/i.test(message), `the part is named, got "${message}"`);
  await page.getByTestId('material-delete-confirm').click();
  await page.getByTestId('material-row-plate-steel-reduced-e').waitFor({ state: 'detached' });
  // Both parts are timber now: one material, so n = 1 for each piece.
  await page.waitForFunction(() => Number(document.querySelector('[data-testid="piece-n-1"]')?.getAttribute('data-value')) === 1);

  // The default cannot go while parts rely on it.
  await page.getByTestId('material-delete-df-l-no2').click();
  const refused = await page.getByTestId('material-delete-message').innerText();
  check(/cannot be deleted: it is the document default/.test(refused), `deleting the default is refused, got "${refused}"`);
  check((await page.getByTestId('material-delete-confirm').count()) === 0, 'a refused delete offers no confirm button');
}

export async function eRefCanBeAMaterialOrATypedValueAndChangesNButNotEI({ page, baseUrl }) {
  await openApp(page, baseUrl);
  await flitchBeam(page);
  // Wait for the panel (a step behind edits) to show both pieces: EIx = E_t·100·200³/12 + E_s·10·200³/12
  // (transformed-section identity; E in Pa from psi, I in m⁴ from mm⁴), then use it as the reference.
  const EIwant = ((1.6e6 * PA_PER_PSI * 100 + 29e6 * PA_PER_PSI * 10) * 200 ** 3) / 12 / 1e12;
  await page.waitForFunction((want) => Math.abs(Number(document.querySelector('[data-testid="result-EIx"]')?.getAttribute('data-value')) / want - 1) < 1e-12, EIwant);
  const EI0 = await resultValue(page, 'EIx');
  // Default E_ref: the first part's (timber, 1 600 000 psi), so n_steel = 29 000 000 / 1 600 000 = 18.125 (exact).
  near('n of the steel, E_ref = timber', await pieceN(page, 1), 18.125, 1e-14);
  await page.getByTestId('eref-choice').selectOption('material:astm-a36');
  await page.waitForFunction(() => Number(document.querySelector('[data-testid="piece-n-1"]')?.getAttribute('data-value')) === 1);
  near('n of the timber, E_ref = steel: 1.6 / 29', await pieceN(page, 0), 1.6 / 29, 1e-14);
  // EI is an E-weighted sum: independent of E_ref (identity).
  near('EIx unchanged by E_ref', await resultValue(page, 'EIx'), EI0, 1e-12);
  near('A_tr = EA / E_ref with E_ref = steel: 100·200·(1.6/29) + 10·200', await resultValue(page, 'transformedArea'), 100 * 200 * (1.6 / 29) + 10 * 200, 1e-12);

  await page.getByTestId('eref-choice').selectOption('typed');
  await page.getByTestId('eref-value').fill('ten');
  await page.getByTestId('eref-value').press('Enter');
  const err = await page.getByTestId('eref-error').innerText();
  check(/E_ref: "ten" is not a number/.test(err) && /unchanged/.test(err), `a bad E_ref is named and nothing changes, got "${err}"`);
  check((await page.getByTestId('eref-value').inputValue()) === 'ten', 'the typed E_ref stays in the field');
  near('n unchanged after a bad E_ref', await pieceN(page, 1), 1, 0);
  await page.getByTestId('eref-value').fill('10 GPa');
  await page.getByTestId('eref-value').press('Enter');
  // n_timber = 1.6e6 psi × 6894.757… Pa/psi / 1e10 Pa (exact unit definitions).
  await page.waitForFunction((want) => Math.abs(Number(document.querySelector('[data-testid="piece-n-0"]')?.getAttribute('data-value')) - want) < 1e-12, (1.6e6 * PA_PER_PSI) / 1e10);
  const caption = await page.getByTestId('eref-caption').innerText();
  check(/E_ref = 10[ ,]?000 MPa, typed/.test(caption), `the caption shows the typed E_ref, got "${caption}"`);
  near('EIx still unchanged', await resultValue(page, 'EIx'), EI0, 1e-12);
}

export async function transformedWidthsShownOnRequestWidenTheSteelByItsModularRatio({ page, baseUrl, artifactsDir }) {
  await openApp(page, baseUrl);
  await flitchBeam(page);
  check((await page.getByTestId('transformed-widths').count()) === 0, 'widths are hidden until asked for');
  await page.getByTestId('widths-toggle').check();
  await page.getByTestId('widths-plot').waitFor();
  // Both pieces span the full depth: b = 100 + 10 = 110 mm; n·b = 100 + 18.125 × 10 = 281.25 mm (exact arithmetic).
  const b = Number(await page.getByTestId('width-b-0').getAttribute('data-value'));
  const nb = Number(await page.getByTestId('width-nb-0').getAttribute('data-value'));
  near('actual width', b, 110, 1e-12);
  near('transformed width', nb, 281.25, 1e-12);
  await page.getByTestId('transformed-widths').scrollIntoViewIfNeeded();
  await page.screenshot({ path: path.join(artifactsDir, 'transformed-widths.png') });
}

export async function aDocumentUsingLibraryMaterialsAndAChosenERefSavesAndReopensWithTheSameNumbers({ page, baseUrl, artifactsDir }) {
  await withoutFilePickers(page);
  await openApp(page, baseUrl);
  await flitchBeam(page);
  await page.getByTestId('eref-choice').selectOption('material:astm-a36');
  await page.waitForFunction(() => Number(document.querySelector('[data-testid="piece-n-1"]')?.getAttribute('data-value')) === 1);
  const EI = await resultValue(page, 'EIx');
  const saved = await downloadText(page, artifactsDir, () => menuItem(page, 'File', 'save-as'));
  const json = JSON.parse(saved.text);
  check(JSON.stringify(json.referenceModulus) === '{"material":"astm-a36"}', `the file stores the E_ref choice, got ${JSON.stringify(json.referenceModulus)}`);
  check(json.materials.length === 2, `the file holds both library materials it uses, got ${json.materials.length}`);
  await menuItem(page, 'File', 'new');
  await page.waitForFunction(() => document.querySelectorAll('[data-testid^="part-row-"]').length === 0);
  await page.getByTestId('open-document').setInputFiles(saved.file);
  await page.waitForFunction(() => document.querySelectorAll('[data-testid^="part-row-"]').length === 2);
  check((await page.getByTestId('error-banner').count()) === 0, 'the saved file opens without errors');
  await page.getByTestId('result-EIx').waitFor();
  near('EIx after reopening', await resultValue(page, 'EIx'), EI, 0);
  near('n of the steel after reopening (E_ref = steel)', await pieceN(page, 1), 1, 0);
}

export async function aFileWithABrokenMaterialSaysSoAndTheRepairFormNamesTheMissingFieldThenTheResultsAppear({ page, baseUrl }) {
  await openApp(page, baseUrl);
  const file = {
    format: 'sectionsmith-section', version: 2, name: 'trailer frame rail', unit: 'mm', defaultMaterial: 'rail-steel',
    // Hand-edited entry: fy missing. E = 200 000 MPa, ν = 0.3 for structural steel (common practice, from memory).
    materials: [{ id: 'rail-steel', name: 'Rail steel', kind: 'steel', stressUnit: 'MPa', E: 200000, nu: 0.3, density: 7850, strengthBasis: 'yield' }],
    sections: [{ id: 's1', name: 'rail', parts: [{ id: 'p1', name: 'web', type: 'rectangle', operation: 'add', material: null, visible: true, placement: { x: 0, y: 0, rotationDeg: 0, mirror: false }, width: 10, height: 150 }] }],
  };
  await page.getByTestId('open-document').setInputFiles({ name: 'rail.section.json', mimeType: 'application/json', buffer: Buffer.from(JSON.stringify(file)) });
  await page.getByTestId('materials-issues').waitFor();
  const issues = await page.getByTestId('materials-issues').innerText();
  check(/"rail-steel"/.test(issues) && /fy/.test(issues), `the panel names the material and the field, got "${issues}"`);
  await page.getByTestId('material-edit-rail-steel').click();
  check(/enter a value/.test(await page.getByTestId('mf-error-fy').innerText()), 'the repair form names fy at once');
  await page.getByTestId('mf-fy').fill('350');
  await page.getByTestId('mf-save').click();
  await page.getByTestId('result-EIx').waitFor();
  // EIx = E·b·h³/12 = 2e11 Pa × 10·150³/12 mm⁴ × 1e-12 (identity, exact arithmetic).
  near('EIx after the repair', await resultValue(page, 'EIx'), 2e11 * ((10 * 150 ** 3) / 12) * 1e-12, 1e-12);
}
