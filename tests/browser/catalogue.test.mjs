// Browser tests of finding a shape in the palette's catalogue search (renderer/app/parts/PartsPalette.tsx)
// and of the timber assemblies of the assembly picker (renderer/app/parts/AssemblyPicker.tsx), issue 16.
// References: AISC Shapes Database v15.0 (W14X90: W 90 lb/ft, A 26.5 in²; HSS6X6X1/4: W 19.02 lb/ft);
// steel 490 lb/ft³ (AISC Manual, common practice), so W = A·490/144; NDS Supplement 2018 Table 1A
// dressed sizes (2x10 = 1.5 × 9.25 in) and Table 1B's weight per foot at a wood density of 35 lb/ft³,
// A·35/144 (from memory); glulam depth = laminations × thickness (ANSI A190.1; NDS Supplement
// Table 1C, 1-1/2 in western laminations, from memory); I-joist Ix = [b·D³ − (b − tw)·hw³]/12
// (Gere & Timoshenko, §12.5; common practice); exact unit definitions (25.4 mm per inch).
import { check, openApp, partCount, resultValue } from './harness.mjs';
import { newSection, rel } from './editor-support.mjs';

const MM2_PER_IN2 = 25.4 ** 2;

async function openCatalogue(page) {
  const box = page.locator('details.palette', { hasText: 'Standard parts and catalogue' });
  if ((await box.getAttribute('open')) === null) await box.locator('summary').click();
}

/** Types `text` in the search and returns the listed results: designation, family and the line of text. */
async function search(page, text) {
  await page.getByTestId('catalogue-search').fill(text);
  await page.getByTestId('catalogue-result-0').waitFor({ timeout: 10_000 });
  const count = await page.locator('[data-testid^="catalogue-result-text-"]').count();
  const out = [];
  for (let i = 0; i < count; i++) {
    const line = page.getByTestId(`catalogue-result-text-${i}`);
    out.push({ designation: await page.getByTestId(`catalogue-result-${i}`).locator('strong').innerText(), family: await line.getAttribute('data-family'), text: await line.innerText() });
  }
  return out;
}

/** The last number of "… computed N" in a result line. */
const computedOf = (text) => Number(/computed ([\d.]+)/.exec(text)?.[1]);

export async function typedSizesListTheClosestMatchFirstAndLumberBeforeSteel({ page, baseUrl }) {
  await openApp(page, baseUrl);
  await openCatalogue(page);
  for (const typed of ['2x10', '2 x 10']) {
    const found = await search(page, typed);
    check(found[0]?.designation === '2x10', `"${typed}": 2x10 first, got ${found.slice(0, 3).map((f) => f.designation).join(', ')}`);
    const lastLumber = found.map((f) => f.family).lastIndexOf('lumber');
    const firstSteel = found.findIndex((f) => f.family !== 'lumber');
    check(firstSteel === -1 || firstSteel > lastLumber, `"${typed}": every lumber size before any steel shape, got ${found.map((f) => `${f.designation}(${f.family})`).join(', ')}`);
    // Density-based weight beside the computed one: 1.5 × 9.25 × 35/144 = 3.37 lb/ft (NDS Table 1B rule, from memory).
    const line = found[0].text;
    check(/at 35 lb\/ft³: 3\.37 lb\/ft/.test(line) && Math.abs(computedOf(line) - (1.5 * 9.25 * 35) / 144) < 0.01, `2x10 weight at 35 lb/ft³ and the computed one, got "${line}"`);
  }
  for (const typed of ['W14x90', 'w14 90']) {
    const found = await search(page, typed);
    check(found[0]?.designation === 'W14X90', `"${typed}": W14X90 first, got ${found.slice(0, 3).map((f) => f.designation).join(', ')}`);
    const line = found[0].text;
    // Tabulated W 90 lb/ft beside the weight of the rebuilt area: within 1 % of 90 (AISC A 26.5 in² × 490/144 = 90.2).
    check(/W 90(\.0)? lb\/ft/.test(line) && rel(computedOf(line), 90) < 0.01, `W14X90 tabulated and computed weight, got "${line}"`);
  }
  const hss = await search(page, 'HSS6x6x1/4');
  check(hss[0]?.designation === 'HSS6X6X1/4', `"HSS6x6x1/4": HSS6X6X1/4 first, got ${hss.slice(0, 3).map((f) => f.designation).join(', ')}`);
  check(/W 19\.0 lb\/ft/.test(hss[0].text) && rel(computedOf(hss[0].text), 19.02) < 0.01, `HSS6X6X1/4 W 19.02 lb/ft beside the weight at the nominal wall, got "${hss[0].text}"`);
}

export async function enterAddsTheFirstMatch({ page, baseUrl }) {
  await openApp(page, baseUrl);
  await newSection(page);
  await openCatalogue(page);
  await page.getByTestId('catalogue-search').fill('w14 90');
  await page.getByTestId('catalogue-result-0').waitFor();
  await page.getByTestId('catalogue-search').press('Enter');
  await page.waitForFunction(() => document.querySelectorAll('[data-testid="part-list"] [data-testid^="part-row-"]').length === 1);
  const names = await page.getByTestId('part-list').innerText();
  check(names.includes('W14X90'), `Enter added W14X90, parts: ${names}`);
  // The new section is in millimetres: A of the rebuilt W14X90 within 1 % of the published 26.5 in².
  await page.waitForFunction(() => Number(document.querySelector('[data-testid="result-area"]')?.getAttribute('data-value')) > 0);
  const area = await resultValue(page, 'area');
  check(rel(area, 26.5 * MM2_PER_IN2) < 0.01, `A of W14X90 within 1 % of 26.5 in² = ${26.5 * MM2_PER_IN2} mm², got ${area}`);
  // Lumber first for a lumber size: Enter on "2 x 10" adds the 2x10, not a steel shape.
  await page.getByTestId('catalogue-search').fill('2 x 10');
  await page.getByTestId('catalogue-result-0').waitFor();
  await page.getByTestId('catalogue-search').press('Enter');
  await page.waitForFunction(() => document.querySelectorAll('[data-testid="part-list"] [data-testid^="part-row-"]').length === 2);
  check((await page.getByTestId('part-list').innerText()).includes('2x10'), 'Enter on "2 x 10" added the 2x10');
}

async function openAssembly(page, kind) {
  const box = page.getByTestId('assemblies');
  if ((await box.getAttribute('open')) === null) await box.locator('summary').click();
  await page.getByTestId('assembly-kind').selectOption(kind);
}

async function placeAndWait(page, parts) {
  const before = await partCount(page);
  await page.getByTestId('assembly-place').click();
  await page.waitForFunction((n) => document.querySelectorAll('[data-testid="part-list"] [data-testid^="part-row-"]').length === n, before + parts, { timeout: 10_000 });
}

export async function timberAssembliesArePlacedFromThePickerWithTheirSources({ page, baseUrl }) {
  await openApp(page, baseUrl);
  await newSection(page);
  // Glulam, millimetre defaults: 130 wide, 8 laminations of 38.1 mm (1-1/2 in): A = 130 × 304.8 mm².
  await openAssembly(page, 'glulam');
  const source = await page.getByTestId('assembly-source').innerText();
  check(/ANSI A190\.1/.test(source) && /NDS Supplement/.test(source), `glulam names its sources, got "${source}"`);
  await placeAndWait(page, 1);
  await page.waitForFunction(() => Number(document.querySelector('[data-testid="result-area"]')?.getAttribute('data-value')) > 0);
  check(rel(await resultValue(page, 'area'), 130 * 8 * 38.1) < 1e-12, `glulam A = 130 × 304.8 mm², got ${await resultValue(page, 'area')}`);
  check(rel(await resultValue(page, 'Ix'), (130 * 304.8 ** 3) / 12) < 1e-12, 'glulam Ix = b·d³/12');
  // A wood I-joist: three parts (two flanges and a web), each with its own material choice.
  await newSection(page);
  await openAssembly(page, 'wood-i-joist');
  check(/common practice/.test(await page.getByTestId('assembly-source').innerText()), 'the I-joist names common practice as its source');
  check((await page.getByTestId('assembly-material-joist-flange').count()) === 1 && (await page.getByTestId('assembly-material-joist-web').count()) === 1, 'flange and web materials chosen apart');
  await placeAndWait(page, 3);
  const names = await page.getByTestId('part-list').innerText();
  check(['I-joist top flange', 'I-joist web', 'I-joist bottom flange'].every((n) => names.includes(n)), `I-joist part names, got ${names}`);
  // Metric defaults: depth 302, flanges 58 × 38, web 9.5.
  const hw = 302 - 2 * 38;
  check(rel(await resultValue(page, 'Ix'), (58 * 302 ** 3 - (58 - 9.5) * hw ** 3) / 12) < 1e-9, 'I-joist Ix = [b·D³ − (b − tw)·hw³]/12');
  // Multi-ply: three 2x10 plies, each its own part; A = 3 × 38.1 × 234.95 mm² (NDS Table 1A, 1.5 × 9.25 in).
  await newSection(page);
  await openAssembly(page, 'multi-ply');
  check(/Table 1A/.test(await page.getByTestId('assembly-source').innerText()), 'multi-ply names NDS Supplement Table 1A');
  await placeAndWait(page, 3);
  check(rel(await resultValue(page, 'area'), 3 * 38.1 * 234.95) < 1e-9, `3-ply 2x10 A, got ${await resultValue(page, 'area')}`);
}
