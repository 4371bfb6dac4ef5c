/**
 * Compare alternatives, over the whole window: the outlines at one common scale, a table of
 * values in the display units with ratios to a baseline (click a row's name to make it the
 * baseline), efficiency measures, EI, weight and the deflection of a shared span and load, sort
 * by clicking any column heading, targets with the lightest passing alternative marked and the
 * reason each other one fails, CSV and SVG export, and the report. The logic is compare-model.ts.
 *
 * Alternatives: the sections of the open document (given by the App), plus section files the
 * user adds here through the host's open call (kept until the view closes).
 */
import { useEffect, useMemo, useState, type ReactElement } from 'react';
import { comparisonSvg } from '../../../core/compare/index.ts';
import { allSectionViews } from '../../../core/document/index.ts';
import type { DisplaySet, LengthUnit } from '../../../core/units/index.ts';
import { getHost } from '../../host/index.ts';
import { compareUnits, comparisonFiles, comparisonReportInput, compareModel, DEFAULT_INPUTS, nextSort, shownNumber, shownRatio, type CompareEntry, type CompareInputs } from './compare-model.ts';
import { documentFromText } from '../../controller/files.ts';
import { fileStem } from '../report/report-input.ts';
import { ReportView, sameDisplay, today, useStable } from '../report/ReportView.tsx';
import '../shell/overlays.css';
import { CAUTION } from '../../../core/member/check.ts';
import { comparisonSheet } from '../../../core/export/xlsx.ts';
import { saveXlsx } from '../../controller/xlsx.ts';

interface Props {
  /** The open document's sections, in order. */
  readonly sections: readonly CompareEntry[];
  readonly fileName: string;
  readonly display: DisplaySet;
  readonly sig: number;
  readonly onClose: () => void;
}

export function CompareView({ sections, fileName, display, sig, onClose }: Props): ReactElement {
  const host = useMemo(() => getHost(), []);
  const [added, setAdded] = useState<readonly CompareEntry[]>([]);
  const [inputs, setInputs] = useState<CompareInputs>(DEFAULT_INPUTS);
  const [status, setStatus] = useState<{ kind: 'info' | 'error'; title: string; lines: readonly string[] } | null>(null);
  const [reporting, setReporting] = useState(false);
  const given = useStable(sections, (a, b) => a.length === b.length && a.every((e, i) => e.name === b[i]?.name && e.doc === b[i]?.doc));
  const units = useStable(display, sameDisplay);
  const entries = useMemo(() => [...given, ...added], [given, added]);
  const model = useMemo(() => compareModel(entries, inputs, units), [entries, inputs, units]);
  const set = (k: keyof CompareInputs, v: string): void => setInputs((o) => ({ ...o, [k]: v }));
  const unit: LengthUnit = model.ok ? model.comparison.unit : (entries[0]?.doc.unit ?? 'mm');
  const cu = compareUnits(unit);

  useEffect(() => {
    const onKey = (e: KeyboardEvent): void => {
      if (e.key === 'Escape' && !reporting) onClose();
    };
    window.addEventListener('keydown', onKey);
    return () => window.removeEventListener('keydown', onKey);
  }, [onClose, reporting]);

  const addFile = async (): Promise<void> => {
    try {
      const f = await host.open();
      if (!f) return;
      const r = documentFromText(f.text, f.name, unit);
      if (!r.ok) return setStatus({ kind: 'error', title: `${f.name} was not added.`, lines: r.errors });
      // Every section of the added file; names carry the file's name when it holds several.
      const views = allSectionViews(r.file);
      const named = views.map((v) => ({ name: views.length === 1 ? v.name.trim() || fileStem(f.name) : `${r.file.name.trim() || fileStem(f.name)}: ${v.name}`, doc: v.doc }));
      setAdded((a) => [...a, ...named]);
      // The note of an older file version speaks of saving, which adding to a comparison never does.
      setStatus({ kind: 'info', title: `Added ${f.name} (${named.length} section${named.length === 1 ? '' : 's'}).`, lines: r.note?.startsWith('GeoJSON') ? [r.note] : [] });
    } catch (err) {
      setStatus({ kind: 'error', title: 'No file was added.', lines: [err instanceof Error ? err.message : String(err)] });
    }
  };

  const exportFile = async (kind: 'csv' | 'svg'): Promise<void> => {
    if (!model.ok) return;
    const file = comparisonFiles(model, fileStem(fileName))[kind];
    try {
      if (await host.exportFile(file)) setStatus({ kind: 'info', title: `Exported ${file.suggestedName}.`, lines: [] });
    } catch (err) {
      setStatus({ kind: 'error', title: `Export of ${file.suggestedName} failed.`, lines: [err instanceof Error ? err.message : String(err)] });
    }
  };

  const exportXlsx = async (): Promise<void> => {
    if (!model.ok) return;
    const name = `${fileStem(fileName)}-comparison.xlsx`;
    try {
      if (await saveXlsx(host, comparisonSheet({ ...model.comparison, alternatives: model.rows }, model.pick), name)) setStatus({ kind: 'info', title: `Exported ${name}.`, lines: [] });
    } catch (err) {
      setStatus({ kind: 'error', title: `Export of ${name} failed.`, lines: [err instanceof Error ? err.message : String(err)] });
    }
  };

  const drawing = useMemo(() => (model.ok ? comparisonSvg(model.docs, model.comparison.unit) : ''), [model]);
  const report = useMemo(() => (reporting && model.ok ? comparisonReportInput(model, sig, today()) : null), [reporting, model, sig]);
  const addedCount = added.length;
  return (
    <div className="overlay" role="dialog" aria-modal="true" aria-label="Compare alternatives" data-testid="compare-view">
      <header className="overlay-bar">
        <strong>Compare alternatives</strong>
        <span className="muted" data-testid="compare-count">
          {entries.length} alternative{entries.length === 1 ? '' : 's'}
        </span>
        <button type="button" data-testid="compare-add-file" onClick={() => void addFile()}>
          Add a section file…
        </button>
        <button type="button" data-testid="compare-export-csv" disabled={!model.ok} onClick={() => void exportFile('csv')}>
          Export CSV…
        </button>
        <button type="button" data-testid="compare-export-xlsx" disabled={!model.ok} onClick={() => void exportXlsx()}>
          Export XLSX…
        </button>
        <button type="button" data-testid="compare-export-svg" disabled={!model.ok} onClick={() => void exportFile('svg')}>
          Export SVG…
        </button>
        <button type="button" data-testid="compare-report" disabled={!model.ok} onClick={() => setReporting(true)}>
          Print report…
        </button>
        <button type="button" className="overlay-close" data-testid="compare-close" onClick={onClose}>
          Close
        </button>
      </header>
      <p className="caution overlay-caution" data-testid="compare-caution">
        {CAUTION}
      </p>
      {status && (
        <div className={status.kind === 'error' ? 'error overlay-note' : 'overlay-note'} role={status.kind === 'error' ? 'alert' : 'status'} data-testid="compare-status">
          <strong>{status.title}</strong>
          {status.lines.map((l) => (
            <div key={l}>{l}</div>
          ))}
        </div>
      )}
      <div className="overlay-body">
        <section className="compare-inputs" aria-label="Shared beam and targets">
          <label className="field">
            <span>shared span ({unit})</span>
            <input data-testid="compare-span" value={inputs.span} placeholder="none" onChange={(e) => set('span', e.target.value)} />
          </label>
          <label className="field">
            <span>uniform load ({cu.lineLoad})</span>
            <input data-testid="compare-load" value={inputs.load} placeholder="none" onChange={(e) => set('load', e.target.value)} />
          </label>
          <label className="field">
            <span>target Ix ≥ ({display.inertia.label})</span>
            <input data-testid="compare-min-ix" value={inputs.minIx} placeholder="none" onChange={(e) => set('minIx', e.target.value)} />
          </label>
          <label className="field">
            <span>target deflection ≤ span /</span>
            <input data-testid="compare-ratio" list="compare-ratios" value={inputs.ratio} placeholder="none" onChange={(e) => set('ratio', e.target.value)} />
          </label>
          <label className="field">
            <span>live part of the load ({cu.lineLoad})</span>
            <input data-testid="compare-live" value={inputs.live} placeholder="none" onChange={(e) => set('live', e.target.value)} />
          </label>
          <label className="field">
            <span>target live-load deflection ≤ span /</span>
            <input data-testid="compare-live-ratio" list="compare-ratios" value={inputs.liveRatio} placeholder="none" onChange={(e) => set('liveRatio', e.target.value)} />
          </label>
          <label className="field">
            <span>target Sx (smaller fibre) ≥ ({display.modulus.label})</span>
            <input data-testid="compare-min-sx" value={inputs.minSx} placeholder="none" onChange={(e) => set('minSx', e.target.value)} />
          </label>
          <label className="field">
            <span>target Zx ≥ ({display.modulus.label})</span>
            <input data-testid="compare-min-zx" value={inputs.minZx} placeholder="none" onChange={(e) => set('minZx', e.target.value)} />
          </label>
          <label className="field">
            <span>target EIx ≥ ({cu.flexuralStiffness})</span>
            <input data-testid="compare-min-ei" value={inputs.minEI} placeholder="none" onChange={(e) => set('minEI', e.target.value)} />
          </label>
          <label className="field">
            <span>target depth ≤ ({display.length.lengthUnit})</span>
            <input data-testid="compare-max-depth" value={inputs.maxDepth} placeholder="none" onChange={(e) => set('maxDepth', e.target.value)} />
          </label>
          <label className="field check">
            <input type="checkbox" data-testid="compare-stress" checked={inputs.stress} onChange={(e) => setInputs((x) => ({ ...x, stress: e.target.checked }))} />
            <span>target bending stress ≤ limit in every material</span>
          </label>
          <label className="field">
            <span>stress limit factor (× strength basis)</span>
            <input data-testid="compare-stress-factor" value={inputs.stressFactor} placeholder="1 (default)" onChange={(e) => set('stressFactor', e.target.value)} />
          </label>
          <datalist id="compare-ratios">
            {[360, 240, 180].map((n) => (
              <option key={n} value={n} />
            ))}
          </datalist>
          <p className="muted small">Simply supported, self-weight not included. Deflection, EI, weight and stress need materials on every part. Deflection limits: L/360 live and L/240 total are the IBC Table 1604.3 ratios for floor members (common practice).</p>
          <p className="muted small" data-testid="compare-stress-meaning">{model.ok ? model.stressMeaning : ''}</p>
        </section>
        {model.excluded.length > 0 && (
          <ul className="error" data-testid="compare-excluded">
            {model.excluded.map((x) => (
              <li key={x}>Left out: {x}</li>
            ))}
          </ul>
        )}
        {!model.ok && (
          <ul className="error" data-testid="compare-errors">
            {model.errors.map((x) => (
              <li key={x}>{x}</li>
            ))}
          </ul>
        )}
        {model.ok && (
          <>
            {model.inputErrors.length > 0 && (
              <ul className="error" data-testid="compare-input-errors">
                {model.inputErrors.map((x) => (
                  <li key={x}>{x}</li>
                ))}
              </ul>
            )}
            {/* Trusted markup: core/compare builds it and escapes every name. */}
            <div className="compare-drawing" data-testid="compare-drawing" dangerouslySetInnerHTML={{ __html: drawing }} />
            <div className="compare-table-wrap">
              <table className="compare-table" data-testid="compare-table">
                <thead>
                  <tr>
                    <th scope="col">alternative</th>
                    {model.columns.map((c) => (
                      <th
                        key={c.key}
                        scope="col"
                        data-testid={`compare-sort-${c.key}`}
                        aria-sort={inputs.sortBy === c.key ? (inputs.descending ? 'descending' : 'ascending') : 'none'}
                        title={`${c.meaning}: click to sort`}
                        onClick={() => setInputs((o) => nextSort(o, c.key))}
                      >
                        {c.symbol}
                        {inputs.sortBy === c.key ? (inputs.descending ? ' ▼' : ' ▲') : ''}
                        <div className="unit">{c.unit}</div>
                      </th>
                    ))}
                  </tr>
                </thead>
                <tbody>
                  {model.rows.map((a) => {
                    const base = a.name === model.comparison.baseline;
                    const best = a.name === model.lightest;
                    const verdict = model.verdicts.find((v) => v.name === a.name);
                    return (
                      <tr key={a.name} data-testid="compare-row" data-name={a.name} className={[base ? 'baseline' : '', best ? 'lightest' : '', verdict && !verdict.passes ? 'failing' : ''].join(' ').trim()}>
                        <th scope="row">
                          <button type="button" className="linkish" data-testid="compare-baseline" title="Make this the baseline of the ratios" onClick={() => setInputs((o) => ({ ...o, baseline: a.name }))}>
                            {a.name}
                          </button>
                          {base && <span className="tag" data-testid="compare-baseline-tag">baseline</span>}
                          {best && <span className="tag ok" data-testid="compare-lightest-tag">lightest meeting targets</span>}
                        </th>
                        {model.columns.map((c) => (
                          <td key={c.key} data-testid={`compare-${c.key}`} data-value={a.values[c.key] === null ? '' : String(c.toShown(a.values[c.key]!))} data-ratio={a.ratios[c.key] === null ? '' : String(a.ratios[c.key])}>
                            {shownNumber(a.values[c.key], c, sig)}
                            {!base && <div className="ratio">{shownRatio(a.ratios[c.key])}</div>}
                          </td>
                        ))}
                      </tr>
                    );
                  })}
                </tbody>
              </table>
            </div>
            <p className="muted small">Ratios are to the baseline; click a name to change it. Click a heading to sort (again to reverse).</p>
            <p className="small" data-testid="compare-stiffness">
              Stiffness ranking ({model.stiffnessNote}): {model.stiffnessRanking.map((n, i) => `${i + 1}. ${n}`).join(', ')}
            </p>
            {model.rows.some((a) => a.notes.length > 0) && (
              <ul className="muted small" data-testid="compare-notes">
                {model.rows.flatMap((a) => a.notes.map((n) => <li key={`${a.name}${n}`}>{a.name}: {n}</li>))}
              </ul>
            )}
            {model.targetsSet && (
              <div className="compare-verdict" data-testid="compare-verdict">
                <p data-testid="compare-lightest">
                  {model.lightest === null ? 'No alternative meets every target.' : <>Lightest meeting every target (by {model.lightestBy === 'weight' ? 'weight' : 'area; not every alternative has a weight'}): <strong>{model.lightest}</strong></>}
                </p>
                <ul>
                  {model.verdicts.filter((v) => !v.passes).map((v) => (
                    <li key={v.name} data-testid="compare-fails" data-name={v.name}>
                      {v.name} fails: {v.reasons.join('; ')}
                    </li>
                  ))}
                </ul>
              </div>
            )}
            {addedCount > 0 && (
              <p className="muted small">
                {addedCount} added file{addedCount === 1 ? '' : 's'}:{' '}
                {added.map((a, i) => (
                  <button key={`${a.name}${i}`} type="button" className="linkish" data-testid="compare-remove" title="Remove from the comparison" onClick={() => setAdded((xs) => xs.filter((_, k) => k !== i))}>
                    remove {a.name}
                  </button>
                ))}
              </p>
            )}
          </>
        )}
      </div>
      {report && <ReportView input={report} stem={`${fileStem(fileName)}-comparison`} onClose={() => setReporting(false)} />}
    </div>
  );
}
