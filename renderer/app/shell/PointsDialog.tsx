/**
 * The coordinates dialog (Edit → Paste coordinates, or a pasted list that needs fixing): a point
 * list as copied from a spreadsheet, one x y per line (tab, comma, semicolon or space between,
 * an optional header row, an optional third column of bulges or arc radii), in the document's
 * unit. Add makes it an outline part; Cut makes it a cut-out. Errors (line, column, point, what
 * is wrong) stay here with the text, and the document is unchanged until a list is accepted.
 */
import type { ReactElement } from 'react';
import type { LengthUnit } from '../../../core/units/index.ts';
import type { AppController, PointsPrompt } from '../../controller/controller.ts';

/** The text of a paste on the page outside a text field, or null (a field takes its own paste). */
export function pastedText(e: ClipboardEvent): string | null {
  const target = e.target as HTMLElement | null;
  if (target && (target.tagName === 'INPUT' || target.tagName === 'TEXTAREA' || target.isContentEditable)) return null;
  return e.clipboardData?.getData('text/plain') ?? null;
}

export function PointsDialog({ prompt, unit, controller }: { readonly prompt: PointsPrompt; readonly unit: LengthUnit; readonly controller: AppController }): ReactElement {
  return (
    <div className="modal-back">
      <div className="modal" role="dialog" aria-modal="true" aria-labelledby="points-title" data-testid="points-dialog">
        <p id="points-title">
          <strong>Outline from coordinates</strong>
        </p>
        <p className="muted small">
          One point per line, x and y in {unit}, separated by tabs (as a spreadsheet copies), commas, semicolons or spaces; a header row is skipped. A third column is a bulge or an arc radius to the next point.
        </p>
        <textarea
          data-testid="points-text"
          rows={10}
          cols={40}
          spellCheck={false}
          value={prompt.text}
          placeholder={'x\ty\n0\t0\n200\t0\n200\t10\n0\t10'}
          onChange={(e) => controller.choosePoints({ text: e.target.value })}
        />
        <label>
          Third column{' '}
          <select data-testid="points-third" value={prompt.third} onChange={(e) => controller.choosePoints({ third: e.target.value === 'bulge' || e.target.value === 'radius' ? e.target.value : 'auto' })}>
            <option value="auto">as the header says (bulge or radius)</option>
            <option value="bulge">bulge, tan(sweep/4)</option>
            <option value="radius">arc radius (+ counter-clockwise)</option>
          </select>
        </label>
        {prompt.errors.length > 0 && (
          <ul className="errors" role="alert" data-testid="points-errors">
            {prompt.errors.slice(0, 8).map((e, i) => (
              <li key={i}>{e}</li>
            ))}
          </ul>
        )}
        <div className="buttons">
          <button type="button" data-testid="points-add" onClick={() => controller.addPoints('add')}>
            Add outline
          </button>
          <button type="button" data-testid="points-cut" onClick={() => controller.addPoints('subtract')}>
            Cut opening
          </button>
          <button type="button" data-testid="points-cancel" onClick={() => controller.cancelPoints()}>
            Cancel
          </button>
        </div>
      </div>
    </div>
  );
}
