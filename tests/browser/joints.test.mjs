// Browser tests of joints in the editor (renderer/app/joints/): cut-out roles, separate pieces and
// overlaps, the joints list with its kind editor, and the shear flow each joint carries.
// References: thin-walled monosymmetric I (common practice; e.g. AISC Design Guide 9): the shear
// centre h·I_bot/(I_top + I_bot) below the top flange's centre and Cw = h²·I_top·I_bot/(I_top + I_bot);
// rectangles b·h³/12 + A·d² (Gere & Timoshenko, Mechanics of Materials); q = V·Af·(d − tf)/2/Ix for a
// welded I's flange-to-web joint (Gere & Timoshenko); AISC 360-22 §J2.4 (Rn = 0.60·FEXX·0.707·w per
// unit length, φ = 0.75); fastener pitch s = n·R/q (common practice); exact arithmetic.
import path from 'node:path';
import { check, downloadText, menuItem, openApp, partCount, withoutFilePickers } from './harness.mjs';
import { fillAssembly, newSection, openAssemblies, rel, resultValue, typePlate } from './editor-support.mjs';

const near = (what, got, want, tol) => check(rel(got, want) <= tol, `${what}: expected ${want} (±${tol} relative), got ${got}`);

async function openJoints(page) {
  const box = page.getByTestId('joints-panel');
  if ((await box.getAttribute('open')) === null) await box.locator('summary').click();
}

/** Waits for a finished torsion solve of the document now shown, and returns ys and Cw. */
async function torsionDone(page) {
  await page.waitForFunction(() => {
    const t = document.querySelector('[data-testid="torsion"]');
    return t?.getAttribute('data-state') === 'done' && t.querySelector('tr.stale') === null;
  }, null, { timeout: 45_000 });
  const ys = await page.locator('[data-testid="result-ys"]').count() > 0 ? await resultValue(page, 'ys') : null;
  const Cw = await page.locator('[data-testid="result-Cw"]').count() > 0 ? await resultValue(page, 'Cw') : null;
  return { ys, Cw };
}

export async function boltHolesThroughTheBottomFlangeAreFastenerHolesSoTheShearCentreAndCwStayAndNetPropertiesShow({ page, baseUrl, artifactsDir }) {
  await openApp(page, baseUrl);
  await newSection(page);
  await openAssemblies(page, 'plate-girder');
  await fillAssembly(page, { webH: 1200, webT: 12, topB: 400, topT: 25, bottomB: 500, bottomT: 30 });
  await page.getByTestId('assembly-place').click();
  const before = await torsionDone(page);
  const h = 1227.5, It = (25 * 400 ** 3) / 12, Ib = (30 * 500 ** 3) / 12;
  const ys = 612.5 - (h * Ib) / (It + Ib); // −247.9 mm
  const Cw = (h * h * It * Ib) / (It + Ib); // 140.8 × 10¹² mm⁶
  check(Math.abs(before.ys - ys) < 0.005 * h, `ys without holes: expected ${ys} ± 0.5 % of h, got ${before.ys}`);
  near('Cw without holes', before.Cw, Cw, 0.005);
  const area = await resultValue(page, 'area');

  await openAssemblies(page, 'bolt-holes');
  await fillAssembly(page, { holeD: 22, axis: 'y', depth: 30, rows: 1, columns: 2, gauge: 140, x: 0, y: -615 });
  await page.getByTestId('assembly-place').click();
  await page.getByTestId('net-section').waitFor();
  // An = 14 400 + 10 000 + 15 000 − 2 × 22 × 30 = 38 080 mm² (exact arithmetic); the gross area stays.
  near('An', await resultValue(page, 'net-area'), 38_080, 1e-12);
  near('gross A unchanged by fastener holes', await resultValue(page, 'area'), area, 1e-15);
  const after = await torsionDone(page);
  near('ys unchanged by fastener holes', after.ys, before.ys, 1e-12);
  near('Cw unchanged by fastener holes', after.Cw, before.Cw, 1e-12);
  check((await page.getByTestId('pieces-note').count()) === 0, 'fastener holes do not cut the flange into pieces');
  await openJoints(page);
  const roles = await page.locator('[data-testid^="cutout-row-"]').evaluateAll((rows) => rows.map((r) => r.getAttribute('data-role')));
  check(JSON.stringify(roles) === '["fastener-hole","fastener-hole"]', `the bolt-hole assembly places fastener holes, got ${JSON.stringify(roles)}`);
  await page.getByTestId('joints-panel').screenshot({ path: path.join(artifactsDir, 'joints-cutouts.png') });

  // One hole made a void cuts the bottom flange through: the section falls into two pieces, and says why.
  const first = page.locator('[data-testid^="cutout-role-"]').first();
  await first.selectOption('void');
  const note = await page.getByTestId('pieces-note').innerText();
  check(/2 separate pieces/.test(note) && /no shared shear centre/.test(note), `pieces note: got "${note}"`);
  await torsionDone(page);
  check((await page.getByTestId('torsion-separate').count()) === 1, 'torsion says the pieces are separate');
  await page.getByTestId('undo').click();
  await page.getByTestId('pieces-note').waitFor({ state: 'detached' });
  check((await first.inputValue()) === 'fastener-hole', 'undo puts the role back');
}

export async function aDuplicateOnTopIsNamedWithItsAreaAndChannelsToeToToeShowTheirJoint({ page, baseUrl, artifactsDir }) {
  await openApp(page, baseUrl);
  await newSection(page);
  await typePlate(page, { b: 100, h: 20 });
  await page.getByTestId('transform-duplicate').click();
  // Duplicate lands a grid step away: put it back exactly on the original.
  await page.getByTestId('entry-moveto-x').fill('0');
  await page.getByTestId('entry-moveto-y').fill('0');
  await page.getByTestId('transform-move-to').click();
  const overlap = await page.getByTestId('overlap-note-0').innerText();
  check(/overlap by 2000 mm²/.test(overlap), `overlap note names the area 100 × 20 = 2000 mm², got "${overlap}"`);
  check(/Parts "[^"]+" and "[^"]+" overlap/.test(overlap), `the overlap note names both parts, got "${overlap}"`);
  check((await partCount(page)) === 2, 'both parts are kept (nothing merged)');

  await newSection(page);
  await openAssemblies(page, 'box-from-channels');
  await fillAssembly(page, { shape: 'C15X50', arrangement: 'toe-to-toe', gap: 0 });
  await page.getByTestId('assembly-place').click();
  await openJoints(page);
  await page.getByTestId('joint-row-0').waitFor();
  const row = await page.getByTestId('joint-row-0').innerText();
  check(/left channel \| right channel/.test(row) && /welded/.test(row) && /\(default\)/.test(row), `the toes' joint is listed as welded by default only, got "${row}"`);
  await page.getByTestId('joint-row-0').click();
  await page.getByTestId('joint-kind').selectOption('not-connected');
  const note = await page.getByTestId('pieces-note').innerText();
  check(/2 separate pieces/.test(note) && /not connected/.test(note), `not connected channels are two pieces, got "${note}"`);
  // Torsion follows: the two channels twist on their own (J summed, no shared shear centre or Cw).
  await torsionDone(page);
  check((await page.getByTestId('torsion-separate').count()) === 1, 'torsion treats not-connected channels as two pieces');
  check((await page.locator('[data-testid="result-ys"]').count()) === 0, 'no shared shear centre is shown');
  await page.getByTestId('joints-panel').screenshot({ path: path.join(artifactsDir, 'joints-channels.png') });
  await page.getByTestId('undo').click();
  check(/\(default\)/.test(await page.getByTestId('joint-row-0').innerText()), 'undo puts the default kind back');
}

export async function eachJointShowsItsShearFlowWeldAndFastenerPitchAndItsKindIsSaved({ page, baseUrl, artifactsDir }) {
  await withoutFilePickers(page);
  await openApp(page, baseUrl);
  await newSection(page);
  // Welded I of plates, mm: web 10 × 300, flanges 200 × 20 (d = 340, tf = 20).
  await typePlate(page, { b: 10, h: 300 });
  await typePlate(page, { b: 200, h: 20, y: 160 });
  await typePlate(page, { b: 200, h: 20, y: -160 });
  await openJoints(page);
  check((await page.locator('[data-testid^="joint-row-"]').count()) === 2, 'two flange-to-web joints');
  await page.getByTestId('joints-Vy').fill('100 kN');
  await page.getByTestId('joints-fexx').fill('490 MPa');
  const Ix = (10 * 300 ** 3) / 12 + 2 * ((200 * 20 ** 3) / 12 + 200 * 20 * 160 ** 2);
  const q = (100_000 * 200 * 20 * 160) / Ix; // N/mm, 281.24
  const qCell = page.locator('[data-testid^="joint-q-"]').first();
  await qCell.waitFor();
  near('q = V·Af·(d − tf)/2/Ix', Math.abs(Number(await qCell.getAttribute('data-value'))), q, 1e-9);
  const design = await page.locator('[data-testid^="joint-design-"]').first().innerText();
  // w = q / (2 · 0.75 · 0.60 · 0.707 · 490) = 0.902 mm; Table J2.4 minimum for the 10 mm web: 5 mm.
  check(/fillet leg ≥ 0\.902 mm \(LRFD, 2 lines\)/.test(design), `required fillet leg, got "${design}"`);
  check(/Table J2\.4 minimum 5(\.00)? mm for the thinner part, 10(\.0)? mm/.test(design), `minimum leg, got "${design}"`);
  await page.getByTestId('joints-method').selectOption('ASD');
  check(/ASD/.test(await page.locator('[data-testid^="joint-design-"]').first().innerText()), 'ASD is offered and labelled');
  check(/local code governs/.test(await page.getByTestId('joints-caution').innerText()), 'the caution says the local code governs');

  await page.getByTestId('joint-row-0').click();
  await page.getByTestId('joint-kind').selectOption('fastened');
  await page.getByTestId('joint-rows').selectOption('2');
  await page.getByTestId('joints-capacity').fill('20 kN');
  const pitchText = await page.locator('[data-testid^="joint-design-"]').first().innerText();
  const s = (2 * 20_000) / q; // 142.2 mm
  check(pitchText.includes(`largest pitch s = n·R/q = ${s.toPrecision(3)} mm (2 rows)`), `fastener pitch ${s.toPrecision(3)} mm, got "${pitchText}"`);
  await page.getByTestId('joints-Vy').fill('lots');
  check(/^Vy: .*"lots"/.test(await page.getByTestId('joints-error-Vy').innerText()), 'a bad shear is named with its text');
  await page.getByTestId('joints-Vy').fill('100 kN');
  await page.getByTestId('joints-diagram').check();
  // τ in the stress panel: the web's largest τ at the neutral axis, V·Q_NA/(I·t), Q_NA = 640 000 + 10·150²/2 = 752 500 mm³.
  await page.getByTestId('stress-panel').locator('summary').click();
  await page.getByTestId('stress-Vy').fill('100 kN');
  const tau = page.getByTestId('tau-part-0');
  await tau.waitFor();
  near('τmax in the web = V·Q/(I·t)', Number(await tau.getAttribute('data-value')), (100_000 * 752_500) / (Ix * 10), 1e-6);
  await page.screenshot({ path: path.join(artifactsDir, 'joints-shear-flow.png') });
  const saved = await downloadText(page, artifactsDir, () => menuItem(page, 'File', 'save-as'));
  const json = JSON.parse(saved.text);
  const joints = json.sections[0].joints;
  check(joints?.length === 1 && joints[0].kind.type === 'fastened' && joints[0].kind.rows === 2, `the file keeps the joint kind, got ${JSON.stringify(joints)}`);
}
