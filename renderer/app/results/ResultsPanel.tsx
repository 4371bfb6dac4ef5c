/** Every section property with its symbol, value and unit; stale values marked; diagnostics in words; the caution. */
import type { ReactElement } from 'react';
import type { LengthUnit } from '../../../core/units/index.ts';
import { formatSig, type DisplaySet } from '../../../core/units/index.ts';
import type { SectionProperties } from '../../../core/properties/types.ts';
import type { NetSectionProperties } from '../../../core/properties/index.ts';
import type { Results } from '../../controller/results.ts';
import type { TorsionState } from '../../controller/torsion-client.ts';
import type { SectionDocument } from '../../../core/document/types.ts';
import { netRows, propertyGroups, torsionRows, type ShownRow } from './result-rows.ts';
import { CAUTION } from '../../../core/member/check.ts';

interface Props {
  readonly results: Results;
  readonly unit: LengthUnit;
  readonly display: DisplaySet;
  readonly sig: number;
  readonly torsion: TorsionState;
  /** The document now shown: a torsion result for another one is stale. */
  readonly current: SectionDocument;
  /** Cancel and Solve now of the torsion solve (controller commands). */
  readonly onTorsion?: (id: 'torsion-cancel' | 'torsion-solve') => void;
}

/** One result: symbol, value (full precision in data-value), unit and meaning. */
function ResultRow({ row, stale = false }: { row: ShownRow; stale?: boolean }): ReactElement {
  return (
    <tr title={row.meaning} className={stale ? 'stale' : ''}>
      <th scope="row">{row.symbol}</th>
      <td className="value" data-testid={`result-${row.key}`} data-value={String(row.raw)}>
        {row.text}
      </td>
      <td className="unit">{row.unit}</td>
      <td className="label">{row.meaning}</td>
    </tr>
  );
}

function TorsionRows({ t, current, p, unit, display, sig, onTorsion }: { t: TorsionState; current: SectionDocument; p: SectionProperties; unit: LengthUnit; display: DisplaySet; sig: number; onTorsion?: ((id: 'torsion-cancel' | 'torsion-solve') => void) | undefined }): ReactElement {
  // Separate pieces twist on their own: J adds, and there is no shared shear centre or Cw.
  const separate = t.kind === 'done' && t.result.components > 1;
  const rows = t.kind === 'done' ? torsionRows('panel', t.result, p, unit, display, sig) : [];
  const stale = t.kind === 'done' && t.doc !== current;
  return (
    <table data-testid="torsion" data-state={t.kind}>
      <caption>Torsion (finite elements, in the background)</caption>
      <tbody>
        {t.kind === 'running' && (
          <tr>
            <td colSpan={4}>
              <progress max={1} value={t.fraction} data-testid="torsion-progress" /> solving… {Math.round(t.fraction * 100)} %{' '}
              {onTorsion && <button type="button" data-testid="torsion-cancel" onClick={() => onTorsion('torsion-cancel')}>Cancel</button>}
            </td>
          </tr>
        )}
        {t.kind === 'cancelled' && (
          <tr>
            <td colSpan={4} className="muted" data-testid="torsion-cancelled">
              stopped before it finished; the next edit solves again{' '}
              {onTorsion && <button type="button" data-testid="torsion-solve" onClick={() => onTorsion('torsion-solve')}>Solve now</button>}
            </td>
          </tr>
        )}
        {t.kind === 'idle' && (
          <tr>
            <td colSpan={4} className="muted">waiting for the drawing to settle</td>
          </tr>
        )}
        {t.kind === 'failed' && (
          <tr>
            <td colSpan={4} className="error">not computed: {t.message}</td>
          </tr>
        )}
        {rows.map((row) => (
          <ResultRow key={row.key} row={row} stale={stale} />
        ))}
        {separate && t.kind === 'done' && (
          <tr>
            <td colSpan={4} className="warning" data-testid="torsion-separate">
              {t.result.components} separate pieces: each twists on its own, so J is the sum of their J and the section has no shared shear centre or warping constant.
            </td>
          </tr>
        )}
        {t.kind === 'done' && (
          <tr>
            <td colSpan={4} className="muted small" data-testid="torsion-info">
              {t.result.meshElements} elements, estimated error of J {formatSig(100 * t.result.jRelativeError, 2)} %, {Math.round(t.millis)} ms
            </td>
          </tr>
        )}
      </tbody>
    </table>
  );
}

/** Net-section rows (fastener holes deducted), labelled net, beside the gross values. */
/** Net-section rows (fastener holes deducted), labelled net, beside the gross values; the list is the property catalogue's. */
function NetRows({ net, p, holes, unit, display, sig }: { net: NetSectionProperties; p: SectionProperties; holes: number; unit: LengthUnit; display: DisplaySet; sig: number }): ReactElement {
  return (
    <table data-testid="net-section">
      <caption>Net section ({holes} fastener hole{holes === 1 ? '' : 's'} deducted)</caption>
      <tbody>
        <tr>
          <td colSpan={4} className="muted small">
            Every other value here is the gross section: fastener holes exist only at the fasteners, so stiffness, deflection, torsion and plastic moduli ignore them.
          </td>
        </tr>
        {netRows('panel', net, p, unit, display, sig).map((row) => (
          <tr key={row.key} title={row.meaning}>
            <th scope="row">{row.symbol}</th>
            <td className="value" data-testid={`result-net-${row.key}`} data-value={String(row.raw)}>
              {row.text}
            </td>
            <td className="unit">{row.unit}</td>
            <td className="label">{row.meaning}</td>
          </tr>
        ))}
      </tbody>
    </table>
  );
}

export function ResultsPanel({ results, unit, display, sig, torsion, current, onTorsion }: Props): ReactElement {
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
      {/* First under the heading, so it is read before any number. */}
      <p className="caution" data-testid="caution">
        {CAUTION}
      </p>
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
          {propertyGroups('panel', p, unit, display, sig).map((g) => (
            <table key={g.title}>
              <caption>{g.title}</caption>
              <tbody>
                {g.rows.map((row) => (
                  <ResultRow key={row.key} row={row} />
                ))}
              </tbody>
            </table>
          ))}
          {results.properties && results.net && <NetRows net={results.net} p={results.properties} holes={results.fastenerHoles} unit={unit} display={display} sig={sig} />}
          {results.properties && <TorsionRows t={torsion} current={current} p={results.properties} unit={unit} display={display} sig={sig} onTorsion={onTorsion} />}
        </div>
      )}
    </section>
  );
}
