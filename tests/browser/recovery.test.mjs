// Recovery without gaps in the browser build (issue 18 §2 and hardening finding 4): every window
// keeps its own copy, written one frame after each committed edit and flushed when the page is
// hidden; the next start offers the copies of windows that are gone, and only those.
import { readFileSync, writeFileSync } from 'node:fs';
import path from 'node:path';
import { appUrl, check, menuItem, openApp, partCount, withoutFilePickers } from './harness.mjs';
import { newSection, typePlate } from './editor-support.mjs';

/** Every window's recovery copy in the page's localStorage: { key: text }. */
const copies = (page) => page.evaluate(() => Object.fromEntries(Object.keys(localStorage).filter((k) => k.startsWith('sectionsmith.recovery.')).map((k) => [k, localStorage.getItem(k)])));

/** Kills the page's renderer, as a crash would: no pagehide, no unload, nothing more runs. */
async function crash(page) {
  const cdp = await page.context().newCDPSession(page);
  // Page.crash never answers (the renderer is gone); the page's 'crash' event says it happened.
  const crashed = page.waitForEvent('crash', { timeout: 10_000 });
  void cdp.send('Page.crash').catch(() => undefined);
  await crashed;
  await page.close().catch(() => undefined);
}

async function deleteFirstPart(page) {
  const parts = await partCount(page);
  await page.getByTestId('part-select-0').click();
  await page.getByTestId('transform-delete').click();
  await page.waitForFunction((n) => document.querySelectorAll('[data-testid^="part-row-"]').length === n - 1, parts);
  return parts - 1;
}

export async function anEditMade300msBeforeACrashIsInTheRecoveryCopy({ page, baseUrl, context }) {
  await openApp(page, baseUrl);
  const left = await deleteFirstPart(page);
  await page.waitForTimeout(300);
  await crash(page);
  const next = await context.newPage();
  await next.goto(baseUrl);
  await next.getByTestId('recovery-offer').waitFor({ timeout: 15_000 });
  await next.getByTestId('recovery-restore').click();
  await next.waitForFunction((n) => document.querySelectorAll('[data-testid^="part-row-"]').length === n, left);
}

export async function hidingThePageWritesThePendingEditAtOnce({ page, baseUrl }) {
  await openApp(page, baseUrl);
  // Timers stop here, so only the visibilitychange flush can write the copy.
  await page.evaluate(() => {
    window.setTimeout = () => 0;
  });
  const left = await deleteFirstPart(page);
  await page.evaluate(() => {
    Object.defineProperty(document, 'visibilityState', { value: 'hidden', configurable: true });
    document.dispatchEvent(new Event('visibilitychange'));
  });
  const texts = Object.values(await copies(page));
  check(texts.length === 1, `one recovery copy expected after hiding, got ${texts.length}`);
  const saved = JSON.parse(texts[0]);
  check(saved.sections[0].parts.length === left, `the copy should hold ${left} parts, got ${saved.sections[0].parts.length}`);
}

export async function restoreAsksBeforeReplacingUnsavedWorkAndEditsGoOnBeingKept({ page, baseUrl, context }) {
  await openApp(page, baseUrl);
  const left = await deleteFirstPart(page);
  await crash(page);
  const next = await context.newPage();
  await next.goto(baseUrl);
  await next.getByTestId('recovery-offer').waitFor({ timeout: 15_000 });
  // While the offer is unanswered, new work here is kept in this window's own copy.
  await next.getByTestId('menu-file').click();
  await next.getByTestId('menu-new').click();
  await next.waitForFunction(() => document.querySelectorAll('[data-testid^="part-row-"]').length === 0);
  await typePlate(next, { b: 50, h: 50 });
  await typePlate(next, { b: 50, h: 50, x: 100 });
  await next.waitForFunction(() => Object.values(Object.fromEntries(Object.keys(localStorage).filter((k) => k.startsWith('sectionsmith.recovery.')).map((k) => [k, localStorage.getItem(k)]))).some((t) => JSON.parse(t).sections[0].parts.length === 2));
  // Restore asks first; "no" keeps the two plates and the offer.
  await next.getByTestId('recovery-restore').click();
  await next.getByTestId('confirm-discard-no').click();
  check(await partCount(next) === 2, 'declining should keep the two plates');
  check(await next.getByTestId('recovery-offer').isVisible(), 'declining should keep the offer');
  await next.getByTestId('recovery-restore').click();
  await next.getByTestId('confirm-discard-yes').click();
  await next.waitForFunction((n) => document.querySelectorAll('[data-testid^="part-row-"]').length === n, left);
}

/** Every recovery copy as a parsed file: [{ key, parts }] (parts of its first section). */
const copiedParts = (page) => page.evaluate(() => Object.keys(localStorage).filter((k) => k.startsWith('sectionsmith.recovery.') && !k.startsWith('sectionsmith.recovery-time.')).map((k) => ({ key: k, parts: JSON.parse(localStorage.getItem(k)).sections[0].parts.length })));

export async function twoWindowsOnTwoDocumentsEachKeepTheirOwnCopyAndBothAreOfferedNextStart({ page, baseUrl, context }) {
  // Window A: the example, one part deleted.
  await openApp(page, baseUrl);
  const leftInA = await deleteFirstPart(page);
  // Window B, same browser profile: a new document with one typed plate.
  const b = await context.newPage();
  await b.goto(appUrl(baseUrl));
  await b.getByTestId('menu-file').waitFor();
  await newSection(b);
  await typePlate(b, { b: 50, h: 50 });
  await b.waitForFunction(() => document.querySelectorAll('[data-testid^="part-row-"]').length === 1);
  // B writing its copy must leave A's: two copies, one per window.
  await b.waitForFunction((n) => {
    const counts = Object.keys(localStorage).filter((k) => k.startsWith('sectionsmith.recovery.')).map((k) => JSON.parse(localStorage.getItem(k)).sections[0].parts.length);
    return counts.length === 2 && counts.includes(1) && counts.includes(n);
  }, leftInA, { timeout: 10_000 });
  await crash(page);
  await crash(b);
  // The next start offers both, one after the other, newest first; each restores whole.
  const next = await context.newPage();
  await next.goto(appUrl(baseUrl));
  await next.getByTestId('recovery-offer').waitFor({ timeout: 15_000 });
  await next.getByTestId('recovery-restore').click();
  await next.waitForFunction(() => document.querySelectorAll('[data-testid^="part-row-"]').length === 1);
  await next.getByTestId('recovery-offer').waitFor({ timeout: 5_000 });
  await next.getByTestId('recovery-restore').click();
  // The restored plate is unsaved work now, so replacing it asks first.
  await next.getByTestId('confirm-discard-yes').click();
  await next.waitForFunction((n) => document.querySelectorAll('[data-testid^="part-row-"]').length === n, leftInA);
  check((await next.getByTestId('recovery-offer').count()) === 0, 'no third copy is offered');
  const left = await copiedParts(next);
  check(left.length === 1 && left[0].parts === leftInA, `only this window's own copy remains, with ${leftInA} parts: ${JSON.stringify(left)}`);
}

/** An outline of n vertices on an ellipse 400 × 200 mm, full-precision coordinates (about 40 characters each). */
function bigDocument(n) {
  const outer = [];
  for (let i = 0; i < n; i++) {
    const t = (2 * Math.PI * i) / n;
    outer.push([200 * Math.cos(t), 100 * Math.sin(t)]);
  }
  return {
    format: 'sectionsmith-section', version: 3, name: 'dense outline', unit: 'mm', materials: [], defaultMaterial: null,
    sections: [{ id: 's1', name: 'A', parts: [
      { id: 'p1', name: 'dense ellipse', type: 'polygon', operation: 'add', material: null, visible: true, placement: { x: 0, y: 0, rotationDeg: 0, mirror: false }, outer, holes: [] },
    ] }],
  };
}

export async function aDocumentTooLargeForTheRecoveryStoreGetsABannerAndCanStillBeSaved({ page, baseUrl, artifactsDir }) {
  await withoutFilePickers(page);
  // Each step recomputes 300,000 vertices on the page's main thread: allow for a loaded machine.
  page.setDefaultTimeout(120_000);
  await openApp(page, baseUrl);
  const text = JSON.stringify(bigDocument(300_000));
  check(text.length > 10_000_000, `the document must exceed the browser's 5 M-character storage quota: ${text.length} characters`);
  // Given by path: the browser reads the file itself (a 12 MB buffer through the driver is slow).
  const file = path.join(artifactsDir, 'dense.section.json');
  writeFileSync(file, text);
  await page.getByTestId('open-document').setInputFiles(file, { timeout: 120_000 });
  await page.waitForFunction(() => document.querySelectorAll('[data-testid^="part-row-"]').length === 1, null, { timeout: 30_000 });
  // An edit makes it unsaved work: its recovery copy does not fit, and the page says so (no unhandled rejection: the harness fails on one).
  await typePlate(page, { b: 50, h: 20, x: 0, y: -150 });
  const banner = page.getByTestId('error-banner');
  await banner.waitFor({ timeout: 120_000 });
  const message = await banner.textContent();
  check(/could not be kept for recovery/i.test(message) && /save/i.test(message), `the banner says recovery failed and to save: ${message}`);
  check((await copiedParts(page)).length === 0, 'no partial or stale copy is left behind');
  // The work is still there and can be kept another way: Save writes all of it.
  // (downloadText's 15 s is short for writing 12 MB on a loaded machine.)
  const [download] = await Promise.all([page.waitForEvent('download', { timeout: 90_000 }), menuItem(page, 'File', 'save-as')]);
  const savedFile = path.join(artifactsDir, 'saved.section.json');
  await download.saveAs(savedFile);
  const parts = JSON.parse(readFileSync(savedFile, 'utf8')).sections[0].parts;
  check(parts.length === 2 && parts[0].outer.length === 300_000, `the saved file holds both parts and all 300,000 vertices: ${parts.length} parts, ${parts[0]?.outer?.length} vertices`);
  // Once the document fits again (the dense part deleted), the copy is written again.
  await page.getByTestId('part-select-0').click();
  await page.getByTestId('transform-delete').click();
  await page.waitForFunction(() => Object.keys(localStorage).some((k) => k.startsWith('sectionsmith.recovery.') && JSON.parse(localStorage.getItem(k) ?? 'null')?.sections?.[0]?.parts?.length === 1), null, { timeout: 120_000 });
}
// Opening, computing and saving 300,000 vertices takes a while on a loaded 2-core machine.
aDocumentTooLargeForTheRecoveryStoreGetsABannerAndCanStillBeSaved.timeoutMs = 300_000;
