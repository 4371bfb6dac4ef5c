// Browser test of DXF import by drag and drop (renderer/app/shell/App.tsx, DxfImportDialog.tsx):
// a DXF file dropped on the drawing opens the import dialog (layers, unit, parts); Import shows
// its properties. Fixtures: tests/fixtures/dxf/ (written by hand). Expected values: annulus
// A = π(ro² − ri²) (Roark, Table A.1); rectangle A = b·h.
import { readFileSync } from 'node:fs';
import { check, openApp, resultValue } from './harness.mjs';

const fixture = (name) => readFileSync(new URL(`../fixtures/dxf/${name}`, import.meta.url), 'utf8');
const rel = (got, want) => Math.abs(got - want) / Math.abs(want);

/** Drops a file with `text` named `name` on the drawing, as the OS does on a drag from a folder. */
async function dropFile(page, name, text) {
  const transfer = await page.evaluateHandle(([n, t]) => {
    const dt = new DataTransfer();
    dt.items.add(new File([t], n, { type: 'application/dxf' }));
    return dt;
  }, [name, text]);
  await page.dispatchEvent('[data-testid="drawing-drop"]', 'dragover', { dataTransfer: transfer });
  await page.dispatchEvent('[data-testid="drawing-drop"]', 'drop', { dataTransfer: transfer });
}

async function areaBecomes(page, want) {
  await page.waitForFunction((a) => Math.abs(Number(document.querySelector('[data-testid="result-area"]')?.getAttribute('data-value')) - a) <= 1e-12 * a, want, { timeout: 10_000 });
}

export async function aDxfDroppedOnTheDrawingIsImportedAfterTheDialogAndItsPropertiesRead({ page, baseUrl, artifactsDir }) {
  await openApp(page, baseUrl);
  await dropFile(page, 'pipe-lwpolyline.dxf', fixture('pipe-lwpolyline.dxf'));
  await page.getByTestId('dxf-dialog').waitFor();
  check((await page.getByTestId('dxf-unit').inputValue()) === 'mm', 'the unit should come from $INSUNITS (mm)');
  check(await page.getByTestId('dxf-unit').isDisabled(), 'the unit select should be fixed when the file has $INSUNITS');
  await page.screenshot({ path: `${artifactsDir}/dxf-import-dialog.png` });
  await page.getByTestId('dxf-import').click();
  const want = Math.PI * (50 ** 2 - 40 ** 2);
  await areaBecomes(page, want);
  const got = await resultValue(page, 'area');
  check(rel(got, want) <= 1e-12, `A of the dropped pipe: expected ${want}, got ${got}`);
  check((await page.getByTestId('document-unit').inputValue()) === 'mm', 'the document unit should be the drawing\'s (mm)');
  await page.screenshot({ path: `${artifactsDir}/dxf-imported-pipe.png` });
}

export async function aDxfWithoutAUnitAsksForOneAndABadDrawingLeavesTheDocumentAsItWas({ page, baseUrl }) {
  await openApp(page, baseUrl);
  const before = await resultValue(page, 'area');
  await dropFile(page, 'open.dxf', fixture('error-open-chain.dxf'));
  await page.getByTestId('dxf-import').click();
  const errors = await page.getByTestId('dxf-errors').innerText();
  check(/LINE handle [0-9A-F]+ on layer "PROFILE".*does not close/.test(errors), `the error should name the entity, got ${errors}`);
  await page.getByTestId('dxf-cancel').click();
  check((await resultValue(page, 'area')) === before, 'a failed import must leave the document unchanged');
  await dropFile(page, 'plain.dxf', fixture('error-no-unit.dxf'));
  check(!(await page.getByTestId('dxf-unit').isDisabled()), 'without $INSUNITS the unit is asked for');
  await page.getByTestId('dxf-unit').selectOption('in');
  await page.getByTestId('dxf-import').click();
  await areaBecomes(page, 5000);
  check((await page.getByTestId('document-unit').inputValue()) === 'in', 'the document unit should be the one chosen (in)');
}
