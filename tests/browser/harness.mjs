// Browser test harness: builds the web app once (reused while its inputs are unchanged), serves dist/web on 127.0.0.1 with the desktop
// app's own CSP (electron/window-options.ts, so a CSP break shows up here too), and drives
// Chromium through playwright-core (tests/browser/browser.mjs says which one). Each test gets a
// fresh browser context (empty storage, downloads accepted) and fails on an uncaught page error or
// any console error (CSP violations included).
import { mkdirSync } from 'node:fs';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { buildRendererIfChanged, ROOT } from '../../electron/build.mjs';
import { serveWebBuild } from '../../electron/serve-web.mjs';
import { launchTestBrowser } from './browser.mjs';

export const ARTIFACTS = path.join(ROOT, 'tests', 'browser', 'artifacts');
export const TEST_TIMEOUT_MS = 60_000;

/** Builds, serves and launches; returns what the tests need and a stop function. */
export async function startHarness() {
  // The build and the browser's launch (its first unpacking, for the packaged one) overlap.
  // An unchanged build is reused (electron/build.mjs buildRendererIfChanged).
  const buildStarted = performance.now();
  const [launched, built] = await Promise.allSettled([launchTestBrowser(), buildRendererIfChanged().then((did) => ({ did, ms: Math.round(performance.now() - buildStarted) }))]);
  if (built.status === 'rejected') {
    if (launched.status === 'fulfilled') await launched.value.browser.close();
    throw built.reason;
  }
  if (launched.status === 'rejected') throw launched.reason;
  const { browser, name, launchMs } = launched.value;
  const server = await serveWebBuild({ port: 4317 });
  console.log(`browser: ${name}, launched in ${launchMs} ms; web app ${built.value.did ? `built in ${built.value.ms} ms` : 'unchanged since its last build, reused'}`);
  mkdirSync(ARTIFACTS, { recursive: true });
  return {
    browser,
    baseUrl: `http://127.0.0.1:${server.port}/`,
    async stop() {
      await browser.close();
      await server.close();
    },
  };
}

/**
 * Runs one test function in a fresh context; resolves { ok, ms, error }. A test that needs longer
 * than TEST_TIMEOUT_MS says so on the function: `myTest.timeoutMs = 150_000`.
 */
export async function runOne(harness, name, test) {
  const limit = Number.isFinite(test.timeoutMs) ? test.timeoutMs : TEST_TIMEOUT_MS;
  const context = await harness.browser.newContext({ acceptDownloads: true, viewport: { width: 1400, height: 900 } });
  const page = await context.newPage();
  const problems = [];
  page.on('pageerror', (error) => problems.push(`uncaught page error: ${error.message}`));
  page.on('console', (message) => {
    // Any console error fails the test (a CSP violation is named as such).
    if (message.type() === 'error') problems.push(/Content.Security.Policy|Refused to/i.test(message.text()) ? `CSP violation: ${message.text()}` : `console error: ${message.text()}`);
  });
  const artifactsDir = path.join(ARTIFACTS, name.replace(/[^\w.-]+/g, '_'));
  mkdirSync(artifactsDir, { recursive: true });
  const started = performance.now();
  let error = null;
  let timer;
  try {
    await Promise.race([
      test({ page, baseUrl: harness.baseUrl, artifactsDir, context }),
      new Promise((_, reject) => {
        timer = setTimeout(() => reject(new Error(`timed out after ${limit} ms`)), limit);
      }),
    ]);
    if (problems.length > 0) throw new Error(problems.join('\n'));
  } catch (caught) {
    error = caught instanceof Error ? caught : new Error(String(caught));
    await page.screenshot({ path: path.join(artifactsDir, 'failure.png') }).catch(() => undefined);
  } finally {
    clearTimeout(timer);
    await context.close().catch(() => undefined);
  }
  return { ok: error === null, ms: Math.round(performance.now() - started), error };
}

/** Every tests/browser/*.test.mjs file, in name order, optionally only those containing `filter`. */
export async function testFiles(filter) {
  const { readdirSync } = await import('node:fs');
  const folder = path.dirname(fileURLToPath(import.meta.url));
  return readdirSync(folder)
    .filter((f) => f.endsWith('.test.mjs') && (!filter || f.includes(filter)))
    .sort()
    .map((f) => path.join(folder, f));
}

/** Tiny assertion helper for browser tests: throws "what: expected …, got …". */
export function check(condition, message) {
  if (!condition) throw new Error(message);
}

// ---- helpers shared by the host tests ----

/**
 * The app's address for a test. The example opened on first start is not solved for torsion
 * (`?example-torsion=off`): its solve takes seconds of CPU that most tests never look at. Pass
 * { exampleTorsion: true } where a test reads the example's J, Cw or shear centre; any other
 * document (File › New, then parts) is solved as always.
 */
export function appUrl(baseUrl, { exampleTorsion = false } = {}) {
  return exampleTorsion ? baseUrl : `${baseUrl}?example-torsion=off`;
}

/** Opens the app (see appUrl for the options) and waits until the results panel shows an area. */
export async function openApp(page, baseUrl, options = {}) {
  await page.goto(appUrl(baseUrl, options));
  await page.locator('[data-testid="result-area"]').first().waitFor({ timeout: 20_000 });
}

/** The full-precision value of a result (data-value of data-testid="result-KEY"). */
export async function resultValue(page, key) {
  const text = await page.locator(`[data-testid="result-${key}"]`).first().getAttribute('data-value');
  return Number(text);
}

export async function partCount(page) {
  return page.locator('[data-testid="part-list"] [data-testid^="part-row-"]').count();
}

/** Runs an item of the page's own menu bar, e.g. menuItem(page, 'File', 'save-as'). */
export async function menuItem(page, menu, action) {
  await page.getByTestId(`menu-${menu.toLowerCase()}`).click();
  await page.getByTestId(`menu-${action}`).click();
}

/** Removes the File System Access pickers before the app loads: the host falls back to downloads. */
export async function withoutFilePickers(page) {
  await page.addInitScript(() => {
    delete window.showOpenFilePicker;
    delete window.showSaveFilePicker;
  });
}

/** Runs `action` and returns the text of the download it starts, saved under artifactsDir. */
export async function downloadText(page, artifactsDir, action) {
  const { readFile } = await import('node:fs/promises');
  const [download] = await Promise.all([page.waitForEvent('download', { timeout: 15_000 }), action()]);
  const file = path.join(artifactsDir, download.suggestedFilename());
  await download.saveAs(file);
  return { name: download.suggestedFilename(), file, text: await readFile(file, 'utf8') };
}
