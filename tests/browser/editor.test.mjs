// Browser tests of the editor (tests/browser/run.mjs runs each exported function in a fresh
// context). Closed forms: rectangle I = b·h³/12 and S = b·h²/6, circle I = π·d⁴/64, the
// parallel-axis theorem for composites (Gere & Timoshenko, Mechanics of Materials, §12.3–12.5);
// rectangle Z = b·h²/4 (common practice).
import { check, menuItem, openApp } from './harness.mjs';
import { discardIfAsked, newSection, rel, resultValue, screenOf, typePlate, typeRound } from './editor-support.mjs';

const near = (what, got, want, tol) => check(rel(got, want) <= tol, `${what}: expected ${want} (±${tol} relative), got ${got}`);

export async function exampleOpensOnFirstStartWithResultsAndTheCaution({ page, baseUrl }) {
  await openApp(page, baseUrl);
  const rows = await page.getByTestId('part-list').locator('li').count();
  check(rows === 5, `example part count: expected 5, got ${rows}`);
  const caution = await page.getByTestId('caution').innerText();
  check(/verify with a licensed engineer/i.test(caution), `caution text missing, got "${caution}"`);
  // The girder is symmetric about the y axis, so x̄ = 0 up to round-off (symmetry identity).
  const cx = await resultValue(page, 'cx');
  check(Math.abs(cx) < 1e-9, `x̄ of a symmetric section: expected 0, got ${cx}`);
}

export async function typedPlate100x200GivesClosedFormAreaIxIySxZx({ page, baseUrl }) {
  await openApp(page, baseUrl);
  await newSection(page);
  await typePlate(page, { b: 100, h: 200 });
  await page.getByTestId('result-Ix').waitFor();
  near('A = b·h', await resultValue(page, 'area'), 100 * 200, 1e-12);
  near('Ix = b·h³/12', await resultValue(page, 'Ix'), (100 * 200 ** 3) / 12, 1e-12);
  near('Iy = h·b³/12', await resultValue(page, 'Iy'), (200 * 100 ** 3) / 12, 1e-12);
  near('Sx = b·h²/6', await resultValue(page, 'SxTop'), (100 * 200 ** 2) / 6, 1e-12);
  near('Zx = b·h²/4', await resultValue(page, 'Zx'), (100 * 200 ** 2) / 4, 1e-9);
}

export async function subtractedHoleGivesParallelAxisAreaCentroidAndIx({ page, baseUrl }) {
  await openApp(page, baseUrl);
  await newSection(page);
  await typePlate(page, { b: 100, h: 200 });
  await typeRound(page, { d: 20, x: 0, y: 50, cut: true });
  const Ar = 100 * 200;
  const Ah = (Math.PI * 20 ** 2) / 4;
  const A = Ar - Ah;
  const cy = -(50 * Ah) / A;
  const Ix = (100 * 200 ** 3) / 12 + Ar * cy ** 2 - ((Math.PI * 20 ** 4) / 64 + Ah * (50 - cy) ** 2);
  await page.waitForFunction((a) => Math.abs(Number(document.querySelector('[data-testid="result-area"]')?.getAttribute('data-value')) - a) < 1e-6, A);
  near('A = b·h − π·d²/4', await resultValue(page, 'area'), A, 1e-12);
  near('ȳ by first moments', await resultValue(page, 'cy'), cy, 1e-9);
  near('Ix by the parallel-axis theorem', await resultValue(page, 'Ix'), Ix, 1e-12);
}

export async function draggingACornerChangesResultsAndUndoRedoWalkThem({ page, baseUrl }) {
  await openApp(page, baseUrl);
  await newSection(page);
  await typePlate(page, { b: 100, h: 200 });
  await page.getByTestId('zoom-fit').click();
  const before = await resultValue(page, 'area');
  await page.getByTestId('tool-vertex').click();
  const from = await screenOf(page, 50, 100);
  const to = await screenOf(page, 70, 80);
  await page.mouse.move(from.x, from.y);
  await page.mouse.down();
  await page.mouse.move((from.x + to.x) / 2, (from.y + to.y) / 2, { steps: 3 });
  await page.mouse.move(to.x, to.y, { steps: 3 });
  await page.mouse.up();
  const after = await resultValue(page, 'area');
  check(after !== before, `area should change when the corner moves (${before} → ${after})`);
  await page.getByTestId('undo').click();
  check((await resultValue(page, 'area')) === before, 'undo restores the area exactly');
  await page.getByTestId('redo').click();
  check((await resultValue(page, 'area')) === after, 'redo gives the dragged area again');
  await page.locator('body').click({ position: { x: 700, y: 880 } });
  await page.keyboard.press('Control+z');
  check((await resultValue(page, 'area')) === before, 'Ctrl+Z undoes too');
}

export async function dragEndingOutsideTheCanvasStillEndsAsOneStep({ page, baseUrl }) {
  await openApp(page, baseUrl);
  await newSection(page);
  await typePlate(page, { b: 100, h: 200 });
  await page.getByTestId('zoom-fit').click();
  await page.getByTestId('tool-vertex').click();
  const from = await screenOf(page, 50, 100);
  await page.mouse.move(from.x, from.y);
  await page.mouse.down();
  await page.mouse.move(from.x + 20, 5, { steps: 5 }); // over the menu bar
  await page.mouse.up();
  const state = await page.getByTestId('canvas').getAttribute('data-tool-state');
  check(state === 'vertex.idle', `gesture should end when the button is released off the canvas, state is ${state}`);
  const title = await page.getByTestId('undo').getAttribute('title');
  check(title === 'Undo Move vertex', `one undo step for the drag, got "${title}"`);
}

export async function selfIntersectingOutlineShowsDiagnosticAndKeepsStaleResults({ page, baseUrl }) {
  await openApp(page, baseUrl);
  await newSection(page);
  await typePlate(page, { b: 100, h: 200 });
  const valid = await resultValue(page, 'Ix');
  await page.getByTestId('tool-polygon').click();
  await page.locator('summary', { hasText: 'Outline by points' }).click();
  // A bow tie: its edges cross, which core reports as a self-intersection.
  for (const [x, y] of [[200, 0], [300, 100], [300, 0], [200, 100]]) {
    await page.getByTestId('entry-point-x').fill(String(x));
    await page.getByTestId('entry-point-y').fill(String(y));
    await page.getByTestId('entry-point-add').click();
  }
  await page.getByTestId('entry-point-close').click();
  await page.getByTestId('diagnostics').waitFor();
  const words = await page.getByTestId('diagnostic').first().innerText();
  check(words.length > 10, `diagnostic should say what is wrong, got "${words}"`);
  check((await page.getByTestId('results-panel').getAttribute('data-stale')) === 'true', 'results marked stale');
  check((await resultValue(page, 'Ix')) === valid, 'the last valid Ix stays visible');
  await page.getByTestId('undo').click();
  check((await page.getByTestId('results-panel').getAttribute('data-stale')) === 'false', 'after undo the results are current again');
}

export async function unitChangeConvertsLengthsAndKeepsThePhysicalSection({ page, baseUrl }) {
  await openApp(page, baseUrl);
  await newSection(page);
  await typePlate(page, { b: 254, h: 508 }); // 10 in × 20 in exactly (1 in = 25.4 mm by definition)
  await page.getByTestId('document-unit').selectOption('in');
  await page.waitForFunction(() => document.querySelector('[data-testid="document-unit"]')?.value === 'in');
  near('A after mm → in, 10 × 20 in', await resultValue(page, 'area'), 200, 1e-12);
  near('Ix after mm → in, 10·20³/12 in⁴', await resultValue(page, 'Ix'), (10 * 20 ** 3) / 12, 1e-12);
}

export async function frameTimeWhileDraggingTheExampleIsReported({ page, baseUrl }) {
  await openApp(page, baseUrl);
  await menuItem(page, 'Help', 'open-example');
  await discardIfAsked(page);
  await page.getByTestId('tool-select').click();
  const start = await screenOf(page, 0, 410);
  await page.evaluate(() => {
    window.__frames = [];
    const tick = (t) => {
      window.__frames.push(t);
      window.__raf = requestAnimationFrame(tick);
    };
    window.__raf = requestAnimationFrame(tick);
  });
  await page.mouse.move(start.x, start.y);
  await page.mouse.down();
  const recompute = [];
  for (let k = 1; k <= 60; k++) {
    await page.mouse.move(start.x + k * 2, start.y - k);
    recompute.push(Number(await page.getByTestId('recompute-ms').getAttribute('data-value')));
  }
  await page.mouse.up();
  const frames = await page.evaluate(() => {
    cancelAnimationFrame(window.__raf);
    return window.__frames;
  });
  const gaps = frames.slice(1).map((t, i) => t - frames[i]);
  const mean = gaps.reduce((a, b) => a + b, 0) / gaps.length;
  const sorted = [...gaps].sort((a, b) => a - b);
  const p95 = sorted[Math.floor(0.95 * (sorted.length - 1))];
  const rc = recompute.reduce((a, b) => a + b, 0) / recompute.length;
  console.log(`    editor drag: ${gaps.length} frames, mean ${mean.toFixed(1)} ms, p95 ${p95.toFixed(1)} ms; recompute mean ${rc.toFixed(2)} ms, max ${Math.max(...recompute).toFixed(2)} ms`);
  check(mean < 50, `mean frame time while dragging: expected under 50 ms, got ${mean.toFixed(1)} ms`);
}

export async function catalogueShapeStaysParametricAndADimensionChangeUpdatesResultsAsOneStep({ page, baseUrl }) {
  await openApp(page, baseUrl);
  await newSection(page);
  await page.getByTestId('document-unit').selectOption('in');
  await page.locator('summary', { hasText: 'Standard parts' }).click();
  await page.getByTestId('catalogue-search').fill('W14X90');
  await page.getByTestId('catalogue-result-0').click();
  await page.getByTestId('result-Ix').waitFor();
  // AISC Shapes Database v15.0, W14X90: Ix = 999 in⁴; the fillet model (r = kdes − tf) is expected within 1.5 %.
  near('W14X90 Ix against AISC v15.0 (999 in⁴)', await resultValue(page, 'Ix'), 999, 0.015);
  const before = await resultValue(page, 'Ix');
  await page.getByTestId('param-tf').fill('0.9');
  await page.getByTestId('param-tf').press('Enter');
  const after = await resultValue(page, 'Ix');
  check(after > before, `thicker flanges must raise Ix (${before} → ${after})`);
  const undoTitle = await page.getByTestId('undo').getAttribute('title');
  check(undoTitle === 'Undo Change dimension', `one undo step for the typed dimension, got "${undoTitle}"`);
  await page.getByTestId('undo').click();
  check((await resultValue(page, 'Ix')) === before, 'undo restores the catalogue dimensions');
  await page.getByTestId('part-select-0').click();
  await page.getByTestId('convert-to-outline').click();
  const kind = await page.getByTestId('part-row-0').innerText();
  check(/outline/.test(kind), `after converting, the part is an outline, got "${kind}"`);
  near('Ix unchanged by converting (arcs kept exactly)', await resultValue(page, 'Ix'), before, 1e-9);
}

export async function torsionRunsInTheBackgroundAndMatchesTheThinStripClosedForm({ page, baseUrl }) {
  await openApp(page, baseUrl);
  await newSection(page);
  // A 200 × 10 strip: J = (b·t³/3)(1 − 0.630·t/b) (Roark, Table 10.7, case 4; Timoshenko & Goodier §109).
  await typePlate(page, { b: 200, h: 10 });
  await page.waitForFunction(() => document.querySelector('[data-testid="torsion"]')?.getAttribute('data-state') === 'done', null, { timeout: 40_000 });
  const J = await resultValue(page, 'J');
  near('J of a 200 × 10 strip', J, ((200 * 10 ** 3) / 3) * (1 - (0.63 * 10) / 200), 0.01);
}

export async function oneSteelMaterialGivesEIEqualToETimesIAndSteelWeight({ page, baseUrl }) {
  await openApp(page, baseUrl);
  await page.getByTestId('default-material').selectOption('astm-a992');
  await page.getByTestId('result-EIx').waitFor();
  // One material: EI = E·I (identity). E = 29,000 ksi for structural steel (AISC 360 §B4, common practice); 1 psi = 6894.757293168361 Pa.
  const E = 29_000_000 * 6894.757293168361;
  const IxM4 = (await resultValue(page, 'Ix')) * 1e-12; // mm⁴ → m⁴, exact factor
  near('EIx = E·Ix (N·m²)', await resultValue(page, 'EIx'), E * IxM4, 1e-6);
  // Steel density 490 lb/ft³ ≈ 7850 kg/m³ (AISC Manual, common practice): mass = ρ·A.
  const Am2 = (await resultValue(page, 'area')) * 1e-6;
  near('mass per length ≈ 7850 kg/m³ · A', await resultValue(page, 'massPerLength'), 7850 * Am2, 0.002);
}

export async function memberCheckOfTheGirderMatchesTheUniformLoadClosedForm({ page, baseUrl }) {
  await openApp(page, baseUrl);
  await page.getByTestId('default-material').selectOption('astm-a992');
  await page.getByTestId('result-EIx').waitFor();
  await page.locator('summary', { hasText: 'Member check' }).click();
  // The example's own case carries a live load and the self-weight: cleared, so w alone acts.
  await page.getByTestId('member-live-uniform').fill('0');
  await page.getByTestId('member-selfweight').uncheck();
  await page.getByTestId('member-span').fill('24000');
  await page.getByTestId('member-point').fill('0');
  await page.getByTestId('member-uniform').fill('20');
  await page.getByTestId('result-deflectionMax').waitFor();
  const EI = await resultValue(page, 'EIx');
  // Simply supported, uniform w: δ = 5wL⁴/(384 EI), M = wL²/8 (AISC Manual Table 3-23, case 1; Roark Table 8.1).
  const w = 20_000;
  const L = 24;
  near('δmax = 5wL⁴/384EI', Math.abs(await resultValue(page, 'deflectionMax')), (5 * w * L ** 4) / (384 * EI), 1e-6);
  near('Mmax = wL²/8', Math.abs(await resultValue(page, 'momentMax')), (w * L ** 2) / 8, 1e-9);
  const verdict = await page.getByTestId('member-verdict').innerText();
  check(/L\/360/.test(verdict), `the verdict names the limit, got "${verdict}"`);
}

export async function stressOfATypedPlateUnderMxFollowsTheFlexureFormulaAndItsKernIsTheMiddleThirdRhombus({ page, baseUrl }) {
  await openApp(page, baseUrl);
  await newSection(page);
  await typePlate(page, { b: 100, h: 200 });
  await page.getByTestId('result-Ix').waitFor();
  await page.locator('summary', { hasText: 'Normal stress and kern' }).click();
  await page.getByTestId('stress-Mx').fill('50');
  await page.getByTestId('result-sigmaMax').waitFor();
  const unit = await page.getByTestId('result-sigmaMax').getAttribute('data-unit');
  check(unit === 'MPa', `stresses of a millimetre document read in MPa, got ${unit}`);
  // Flexure formula σ = M·c/I (Gere & Timoshenko, Mechanics of Materials, §5.5); no materials, so E does not enter.
  // M = 50 kN·m = 5e7 N·mm, c = h/2 = 100 mm, I = b·h³/12 mm⁴; N/mm² = MPa exactly.
  const I = (100 * 200 ** 3) / 12;
  const sigma = (5e7 * 100) / I;
  near('σmax = +M·c/I (tension at +y)', await resultValue(page, 'sigmaMax'), sigma, 1e-12);
  near('σmin = −M·c/I', await resultValue(page, 'sigmaMin'), -sigma, 1e-12);
  // Middle-third rule (common practice; Gere & Timoshenko, eccentric axial loads): the kern of a b × h rectangle
  // is the rhombus with half-diagonals b/6 along x and h/6 along y, about the centroid (here the origin).
  const kern = JSON.parse(await page.getByTestId('kern-vertices').getAttribute('data-value'));
  check(kern.length === 4, `the kern of a rectangle has 4 corners, got ${kern.length}`);
  const want = [[100 / 6, 0], [0, 200 / 6], [-100 / 6, 0], [0, -200 / 6]];
  for (const [x, y] of want) {
    const hit = kern.some(([kx, ky]) => Math.abs(kx - x) < 1e-9 && Math.abs(ky - y) < 1e-9);
    check(hit, `kern corner (${x}, ${y}) expected among ${JSON.stringify(kern)}`);
  }
  // The overlay switches sit with the others under View and were turned on by opening the panel.
  await page.getByTestId('menu-view').click();
  check(await page.getByTestId('overlay-stress').isChecked(), 'the stress map overlay is on after opening the panel');
  check(await page.getByTestId('overlay-kern').isChecked(), 'the kern overlay is on after opening the panel');
}
