// A/B probe (not a test; run it by hand under the browser lock): CPU seconds of the browser's processes for opening the app and staying
// 10 s on the example, with and without the example's torsion.
import { appUrl, startHarness } from './harness.mjs';
const h = await startHarness();
const cdp = await h.browser.newBrowserCDPSession();
const cpu = async () => (await cdp.send('SystemInfo.getProcessInfo')).processInfo.reduce((s, p) => s + p.cpuTime, 0);
for (let round = 0; round < 2; round++) {
  for (const exampleTorsion of [true, false]) {
    const context = await h.browser.newContext({ viewport: { width: 1400, height: 900 } });
    const page = await context.newPage();
    const c0 = await cpu();
    const t0 = performance.now();
    await page.goto(appUrl(h.baseUrl, { exampleTorsion }));
    await page.locator('[data-testid="result-area"]').first().waitFor({ timeout: 60_000 });
    const open = performance.now() - t0;
    const c1 = await cpu();
    await page.waitForTimeout(10_000);
    const c2 = await cpu();
    console.log(`example torsion ${exampleTorsion ? 'on ' : 'off'}: open ${Math.round(open)} ms wall, ${(c1 - c0).toFixed(1)} s CPU; next 10 s: ${(c2 - c1).toFixed(1)} s CPU`);
    await context.close();
  }
}
await h.stop();
