// Recovery without gaps in the browser build (issue 18 §2 and hardening finding 4): every window
// keeps its own copy, written one frame after each committed edit and flushed when the page is
// hidden; the next start offers the copies of windows that are gone, and only those.
import { check, openApp, partCount } from './harness.mjs';
import { typePlate } from './editor-support.mjs';

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
