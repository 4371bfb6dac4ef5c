/** Every section property with its symbol, value and unit; stale values marked; diagnostics in words; the caution. */
import type { ReactElement } from 'react';
import type { LengthUnit } from '../../core/units/index.ts';
import { formatSig, toDisplay, type DisplaySet } from '../../core/units/index.ts';
import type { SectionProperties } from '../../core/properties/types.ts';
import type { Results } from './results.ts';
import { RESULT_GROUPS, type ResultRow } from './result-rows.ts';

interface Props {
  readonly results: Results;
  readonly unit: LengthUnit;
  readonly display: DisplaySet;
  readonly sig: number;
  readonly onFocusDiagnostic?: (index: number) => void;
}

/**
 * Round-off residue (a centroid at 1e-14 mm on a symmetric section) reads as 0 on screen: a value
 * is shown as 0 when it is below 1e-9 of the section's own size in that dimension. The data-value
 * attribute keeps the full number.
 */
function cleaned(row: ResultRow, value: number, p: SectionProperties): number {
  const size = Math.max(p.xMax - p.xMin, p.yMax - p.yMin);
  const scale: Record<ResultRow['quantity'], number> = {
    length: size, area: p.area, modulus: size ** 3, inertia: p.Ip, warping: size ** 6, angle: 90, ratio: 1,
  };
  return Math.abs(value) < 1e-9 * scale[row.quantity] ? 0 : value;
}

function shown(row: ResultRow, value: number, unit: LengthUnit, display: DisplaySet, sig: number): { text: string; unit: string } {
  if (row.quantity === 'angle') return { text: formatSig(value, sig), unit: '°' };
  if (row.quantity === 'ratio') return { text: formatSig(value, sig), unit: '' };
  const d = display[row.quantity];
  return { text: formatSig(toDisplay(value, unit, d), sig), unit: d.label };
}

export function ResultsPanel({ results, unit, display, sig }: Props): ReactElement {
  const p = results.properties ?? results.stale;
  const stale = !results.properties && !!results.stale;
  return (
    <section className="results" aria-label="Section properties" data-testid="results-panel" data-stale={stale ? 'true' : 'false'}>
      <header className="results-head">
        <h2>Section properties</h2>
        <span className="muted" data-testid="recompute-ms" data-value={results.millis}>
          {formatSig(results.millis, 2)} ms
        </span>
      </header>
      {results.diagnostics.length > 0 && (
        <div className="diagnostics" role="alert" data-testid="diagnostics">
          <strong>{results.properties ? 'Note' : 'The geometry needs attention'}</strong>
          <ol>
            {results.diagnostics.map((d, i) => (
              <li key={i} data-testid="diagnostic">
                {d.message}
              </li>
            ))}
          </ol>
        </div>
      )}
      {stale && <p className="stale-note" data-testid="stale-note">Showing the last valid results: they no longer match the drawing.</p>}
      {results.hiddenParts > 0 && (
        <p className="muted">
          {results.hiddenParts} hidden part{results.hiddenParts === 1 ? ' is' : 's are'} left out of these numbers.
        </p>
      )}
      {!p && results.diagnostics.length === 0 && <p className="muted">Draw or open a section to see its properties.</p>}
      {p && (
        <div className={stale ? 'result-table stale' : 'result-table'}>
          {RESULT_GROUPS.map((g) => (
            <table key={g.title}>
              <caption>{g.title}</caption>
              <tbody>
                {g.rows.map((row) => {
                  const value = p[row.key];
                  if (typeof value !== 'number') return null;
                  const s = shown(row, cleaned(row, value, p), unit, display, sig);
                  return (
                    <tr key={row.key} title={row.label}>
                      <th scope="row">{row.symbol}</th>
                      <td className="value" data-testid={`result-${row.key}`} data-value={String(value)}>
                        {s.text}
                      </td>
                      <td className="unit">{s.unit}</td>
                      <td className="label">{row.label}</td>
                    </tr>
                  );
                })}
              </tbody>
            </table>
          ))}
        </div>
      )}
      <p className="caution" data-testid="caution">
        Preliminary results. Verify with a licensed engineer and the local building code, which govern.
      </p>
    </section>
  );
}
