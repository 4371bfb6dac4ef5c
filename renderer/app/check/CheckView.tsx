/**
 * Checking a manufacturer's section table (issue: "Check a section table"): import a CSV through
 * the host, choose the table unit and the shape type, see each column's detected meaning and unit
 * and correct it, run the check in a worker (core/check: each row rebuilt with the parts library
 * and its tabulated properties compared), then read the summary, the worst deviations and the
 * per-row report with the flagged values marked, filter to flagged rows and export the report CSV.
 * The mapping is remembered per header signature through the host's settings.
 */
import { useEffect, useMemo, useRef, useState, type ReactElement } from 'react';
import {
  CAUTION, CHECKED_PROPERTIES, MappingError, mapColumns, parseTable, parseTolerances, roleFromTarget, splitHeader, TABLE_FAMILIES, TableInputError, tableCheckCsv,
  type ColumnMapping, type RowCheck, type TableCheck, type TableFamily, type Tolerances,
} from '../../../core/check/index.ts';
import { formatSig, LENGTH_UNITS, type LengthUnit } from '../../../core/units/index.ts';
import type { Host } from '../../host/host.ts';
import { tableCheckSheet } from '../../../core/export/xlsx.ts';
import { saveXlsx } from '../../controller/xlsx.ts';
import { CheckClient, type CheckState } from './check-client.ts';
import { MAPPING_INDEX_KEY, mappingKey, newColumns, powerOf, readRemembered, rememberedIndex, rememberedText, rememberedWithin, symbolOf, targetChoices, targetText, unitChoices, unitTextOf, viewMessage, type RememberedCheck } from './check-model.ts';
import './check-view.css';

const PAGE = 100;
const SUPER: Readonly<Record<number, string>> = { 1: '', 2: '²', 3: '³', 4: '⁴' };
/** A tabulated value as the table printed it (up to 6 significant figures, no padding zeros); computed values get 4. */
const tabulatedText = (v: number): string => String(Number(v.toPrecision(6)));
const pct = (v: number): string => (Number.isFinite(v) ? `${v >= 0 ? '+' : '−'}${Math.abs(v * 100).toFixed(2)} %` : '∞');

interface Table {
  readonly name: string;
  readonly text: string;
  readonly headers: readonly string[];
  readonly rows: number;
  readonly firstRow: readonly string[];
}

interface Props {
  readonly host: Host;
  readonly onClose: () => void;
}

/**
 * Tolerance text of the view: empty for each family's own default (as the command line with no
 * --tolerance: the defaults under which the published AISC rows pass), "1.5%" for one base for
 * all, "Zx=2%, MC:Iy=7%" for the rest (core/check tolerance.ts).
 */
function tolerancesOf(base: string, extra: string): Tolerances {
  const specs = [...(base.trim() === '' ? [] : [base.trim()]), ...extra.split(/[,;]/).map((s) => s.trim()).filter((s) => s !== '')];
  return parseTolerances(specs);
}

export function CheckView({ host, onClose }: Props): ReactElement {
  const [table, setTable] = useState<Table | null>(null);
  const [importError, setImportError] = useState<{ title: string; message: string } | null>(null);
  const [unit, setUnit] = useState<LengthUnit>('in');
  const [type, setType] = useState<TableFamily | ''>('');
  const [baseTolerance, setBaseTolerance] = useState('');
  const [extraTolerance, setExtraTolerance] = useState('');
  const [ownLabels, setOwnLabels] = useState(false);
  const [remembered, setRemembered] = useState<ColumnMapping | null>(null);
  // The headers the remembered mapping was made for (fewer than the table's when columns were added), and the columns it did not know.
  const [rememberedFrom, setRememberedFrom] = useState<readonly string[] | null>(null);
  const [unknownColumns, setUnknownColumns] = useState<readonly string[]>([]);
  const [rememberNote, setRememberNote] = useState<string | null>(null);
  const [edits, setEdits] = useState<Record<string, string>>({});
  const [state, setState] = useState<CheckState>({ kind: 'idle' });
  const [flaggedOnly, setFlaggedOnly] = useState(false);
  const [page, setPage] = useState(0);
  const [exportNote, setExportNote] = useState<string | null>(null);
  // What the running check was started with: a finished check is remembered under its headers.
  const started = useRef<{ headers: readonly string[]; unit: LengthUnit; type: TableFamily | null } | null>(null);
  const client = useMemo(
    () =>
      new CheckClient((next) => {
        setState(next);
        const run = started.current;
        if (next.kind !== 'done' || !run || !host.writeSetting) return;
        const write = host.writeSetting.bind(host);
        const remember = async (): Promise<void> => {
          await write(mappingKey(run.headers), rememberedText(run.headers, { mapping: next.result.mapping, unit: run.unit, type: run.type }));
          const index = (await host.readSetting?.(MAPPING_INDEX_KEY).catch(() => null)) ?? null;
          await write(MAPPING_INDEX_KEY, rememberedIndex(index, run.headers));
        };
        remember().then(
          () => setRememberNote('This mapping is remembered for tables with the same headers, and for tables with these columns and more.'),
          (err: unknown) => setRememberNote(`The mapping could not be remembered: ${err instanceof Error ? err.message : String(err)}`),
        );
      }),
    [host],
  );
  useEffect(() => () => client.cancel(), [client]);
  const root = useRef<HTMLDivElement>(null);
  useEffect(() => root.current?.focus(), []);

  const importTable = async (): Promise<void> => {
    setExportNote(null);
    let file;
    try {
      file = host.openTable ? await host.openTable() : await host.open();
    } catch (err) {
      setImportError({ title: 'The table could not be opened.', message: err instanceof Error ? err.message : String(err) });
      return;
    }
    if (!file) return;
    client.cancel();
    setState({ kind: 'idle' });
    setPage(0);
    let parsed;
    try {
      parsed = parseTable(file.text);
    } catch (err) {
      setTable(null);
      setImportError({ title: `${file.name} is not a table this check can read.`, message: err instanceof TableInputError ? viewMessage(err.message) : String(err) });
      return;
    }
    if (parsed.rows.length === 0) {
      setTable(null);
      setImportError({ title: `${file.name} has no rows.`, message: 'Expected a header row and at least one row of shapes below it.' });
      return;
    }
    setImportError(null);
    setEdits({});
    const found = await findRemembered(parsed.headers);
    const stored = found?.remembered ?? null;
    setRemembered(stored?.mapping ?? null);
    setRememberedFrom(found?.headers ?? null);
    const unknown = found ? newColumns(parsed.headers, found.headers) : [];
    setUnknownColumns(unknown);
    if (stored) {
      setUnit(stored.unit);
      setType(stored.type ?? '');
    }
    setRememberNote(
      !found
        ? null
        : unknown.length === 0
          ? 'The column mapping last used for a table with these headers is applied.'
          : `The column mapping remembered for a table with ${found.headers.length} of these ${parsed.headers.length} columns is applied. Columns it did not know (read from their headers; check them below): ${unknown.map((h) => `"${h}"`).join(', ')}.`,
    );
    setTable({ name: file.name, text: file.text, headers: parsed.headers, rows: parsed.rows.length, firstRow: parsed.rows[0] ?? [] });
  };

  /**
   * The mapping remembered for exactly these headers, else the one remembered for the widest
   * table whose every column this one still has (columns were added); null when none.
   */
  async function findRemembered(headers: readonly string[]): Promise<{ headers: readonly string[]; remembered: RememberedCheck } | null> {
    const read = async (key: string): Promise<string | null> => (await host.readSetting?.(key).catch(() => null)) ?? null;
    const exact = readRemembered(headers, await read(mappingKey(headers)));
    if (exact) return { headers: headers.map((h) => h.trim()), remembered: exact };
    for (const narrower of rememberedWithin(headers, await read(MAPPING_INDEX_KEY))) {
      const stored = readRemembered(narrower, await read(mappingKey(narrower)));
      if (stored) return { headers: narrower, remembered: stored };
    }
    return null;
  }

  // The mapping the check will use: the user's corrections, then the remembered mapping, then detection.
  const mapping = useMemo((): { ok: true; mapping: ColumnMapping } | { ok: false; message: string } | null => {
    if (!table) return null;
    try {
      return { ok: true, mapping: mapColumns(table.headers, unit, new Map(Object.entries(edits)), remembered ?? undefined) };
    } catch (err) {
      return { ok: false, message: err instanceof MappingError ? viewMessage(err.message) : String(err) };
    }
  }, [table, unit, edits, remembered]);

  // What the dropdowns show: the mapping itself, or, while two columns claim one role, each column as the user set it.
  const shownMapping = useMemo((): ColumnMapping | null => {
    if (!table || !mapping) return null;
    if (mapping.ok) return mapping.mapping;
    const base = mapColumns(table.headers, unit, new Map(), remembered ?? undefined);
    return {
      columns: base.columns.map((c) => {
        const edit = (Object.hasOwn(edits, c.header) ? edits[c.header] : undefined);
        if (edit === undefined) return c;
        try {
          return { header: c.header, ...roleFromTarget(edit, unit, c.header) };
        } catch {
          return c;
        }
      }),
    };
  }, [table, mapping, unit, edits, remembered]);

  const tolerances = useMemo((): { ok: true; value: Tolerances } | { ok: false; message: string } => {
    try {
      return { ok: true, value: tolerancesOf(baseTolerance, extraTolerance) };
    } catch (err) {
      return { ok: false, message: err instanceof Error ? viewMessage(err.message) : String(err) };
    }
  }, [baseTolerance, extraTolerance]);

  const hasTypeColumn = mapping?.ok === true && mapping.mapping.columns.some((c) => c.role === 'type');

  const changeUnit = (next: LengthUnit): void => {
    setUnit(next);
    if (remembered) {
      // Remembered columns carry the unit they were read in; with another table unit they are detected afresh.
      setRemembered(null);
      setRememberedFrom(null);
      setUnknownColumns([]);
      setRememberNote('The table unit changed, so the remembered mapping is set aside; the next check remembers the new one.');
    }
  };

  const setColumn = (header: string, symbol: string, unitText: string): void => {
    setEdits((e) => ({ ...e, [header]: targetText(symbol, unitText, unit) }));
  };

  // What the shown report was made with; a later change of the mapping or the options marks it as out of date.
  const inputs = JSON.stringify([table?.name, mapping?.ok === true ? mapping.mapping : null, unit, type, baseTolerance, extraTolerance, ownLabels]);
  const [ranWith, setRanWith] = useState<string | null>(null);

  const run = (): void => {
    if (!table || mapping?.ok !== true || !tolerances.ok) return;
    setRanWith(inputs);
    setPage(0);
    setExportNote(null);
    started.current = { headers: table.headers, unit, type: type === '' ? null : type };
    client.run(
      table.text,
      { unit, ...(type !== '' ? { type } : {}), overrides: new Map(Object.entries(edits)), ...(remembered ? { mapping: remembered } : {}), tolerances: tolerances.value, ...(ownLabels ? { readLabels: false } : {}) },
      table.rows,
    );
  };

  const forget = async (): Promise<void> => {
    if (!table) return;
    await host.writeSetting?.(mappingKey(rememberedFrom ?? table.headers), null).catch(() => undefined);
    setRemembered(null);
    setRememberedFrom(null);
    setUnknownColumns([]);
    setEdits({});
    setRememberNote('The remembered mapping is forgotten; the columns are read afresh.');
  };

  const stemOf = (name: string | undefined): string => (name ?? 'table').replace(/\.(csv|txt)$/i, '').replace(/[^\w.-]+/g, '-') || 'table';

  /** The mapping as `sectionsmith check --save-map` writes it, for `--mapping FILE` on the command line. */
  const saveMapping = async (m: ColumnMapping): Promise<void> => {
    const file = { suggestedName: `${stemOf(table?.name)}-mapping.json`, mimeType: 'application/json', text: `${JSON.stringify(m, null, 2)}\n` };
    try {
      if (await host.exportFile(file)) setRememberNote(`Saved ${file.suggestedName}; use it with sectionsmith check --mapping ${file.suggestedName}.`);
    } catch (err) {
      setRememberNote(`The mapping was not saved: ${err instanceof Error ? err.message : String(err)}`);
    }
  };

  const exportReport = async (result: TableCheck, kind: 'csv' | 'xlsx' = 'csv'): Promise<void> => {
    if (kind === 'xlsx') {
      const name = `${stemOf(table?.name)}-check.xlsx`;
      try {
        if (await saveXlsx(host, tableCheckSheet(result), name)) setExportNote(`Exported ${name}`);
      } catch (err) {
        setExportNote(`The report was not exported: ${err instanceof Error ? err.message : String(err)}`);
      }
      return;
    }
    const file = { suggestedName: `${stemOf(table?.name)}-check.csv`, mimeType: 'text/csv', text: tableCheckCsv(result) };
    try {
      if (await host.exportFile(file)) setExportNote(`Exported ${file.suggestedName}`);
    } catch (err) {
      setExportNote(`The report was not exported: ${err instanceof Error ? err.message : String(err)}`);
    }
  };

  return (
    <div
      className="check-back"
      onKeyDown={(e) => {
        e.stopPropagation(); // the editor's shortcuts do not act on the drawing behind this view
        if (e.key === 'Escape') onClose();
      }}
    >
      <div className="check-view" role="dialog" aria-modal="true" aria-labelledby="check-title" data-testid="check-view" tabIndex={-1} ref={root}>
        <header className="check-head">
          <h1 id="check-title">Check a section table</h1>
          <span className="muted small">Each row is rebuilt from its dimensions with the parts library; deviation = computed / table − 1.</span>
          <button type="button" className="check-close" data-testid="check-close" aria-label="Close the table check" onClick={onClose}>
            ×
          </button>
        </header>
        <p className="check-caution" data-testid="check-caution">
          <strong>Caution.</strong> {CAUTION}
        </p>

        <section className="check-step">
          <div className="check-row">
            <button type="button" data-testid="check-import" onClick={() => void importTable()}>
              Import a CSV table…
            </button>
            {table && (
              <span data-testid="check-file">
                <strong>{table.name}</strong> <span className="muted">— {table.rows} rows, {table.headers.length} columns</span>
              </span>
            )}
            {!table && !importError && <span className="muted">A designation column, a shape type column (or a type chosen below), dimension columns and tabulated properties.</span>}
          </div>
          {importError && (
            <div className="check-error" role="alert" data-testid="check-import-error">
              <strong>{importError.title}</strong> {importError.message}
            </div>
          )}
        </section>

        {table && mapping && (
          <section className="check-step">
            <div className="check-row options">
              <label>
                Plain numbers are in
                <select data-testid="check-unit" value={unit} onChange={(e) => changeUnit(e.target.value as LengthUnit)}>
                  {LENGTH_UNITS.map((u) => (
                    <option key={u} value={u}>
                      {u}
                    </option>
                  ))}
                </select>
              </label>
              <label>
                Shape type
                <select data-testid="check-type" value={type} onChange={(e) => setType(e.target.value as TableFamily | '')}>
                  <option value="">{hasTypeColumn ? 'from the type column' : 'choose one…'}</option>
                  {TABLE_FAMILIES.map((f) => (
                    <option key={f} value={f}>
                      {f}
                      {hasTypeColumn ? ' where the type cell is empty' : ''}
                    </option>
                  ))}
                </select>
              </label>
              <label>
                Tolerance
                <input data-testid="check-tolerance" value={baseTolerance} size={5} placeholder="per family" onChange={(e) => setBaseTolerance(e.target.value)} />
              </label>
              <label className="wide">
                Per property (and family)
                <input data-testid="check-tolerance-extra" value={extraTolerance} placeholder="Zx=2%, MC:Iy=7%" onChange={(e) => setExtraTolerance(e.target.value)} />
              </label>
              <label className="tick">
                <input type="checkbox" data-testid="check-own-labels" checked={ownLabels} onChange={(e) => setOwnLabels(e.target.checked)} />
                maker&apos;s own designations (not read as AISC labels)
              </label>
            </div>
            {!tolerances.ok && (
              <div className="check-error" role="alert" data-testid="check-tolerance-error">
                {tolerances.message}
              </div>
            )}
            <MappingTable table={table} mapping={shownMapping} edits={edits} unknown={unknownColumns} onColumn={setColumn} />
            {!mapping.ok && (
              <div className="check-error" role="alert" data-testid="check-mapping-error">
                {mapping.message}
              </div>
            )}
            <div className="check-row">
              <button type="button" className="primary" data-testid="check-run" disabled={!mapping.ok || !tolerances.ok || state.kind === 'running'} onClick={run}>
                Check {table.rows} rows
              </button>
              {state.kind === 'running' && (
                <>
                  <progress data-testid="check-progress" max={state.total} value={state.done} />
                  <span className="muted">
                    {state.done} of {state.total}
                  </span>
                  <button type="button" data-testid="check-cancel" onClick={() => client.cancel()}>
                    Cancel
                  </button>
                </>
              )}
              <button type="button" data-testid="check-reset" disabled={Object.keys(edits).length === 0} onClick={() => setEdits({})}>
                Undo my corrections
              </button>
              <button type="button" data-testid="check-forget" disabled={remembered === null} onClick={() => void forget()}>
                Forget the remembered mapping
              </button>
              <button type="button" data-testid="check-save-mapping" disabled={!mapping.ok} title="The same JSON as sectionsmith check --save-map; read it back with --mapping FILE" onClick={() => mapping.ok && void saveMapping(mapping.mapping)}>
                Save the mapping (JSON)…
              </button>
              {rememberNote && (
                <span className="muted small" data-testid="check-remember-note">
                  {rememberNote}
                </span>
              )}
            </div>
          </section>
        )}

        {state.kind === 'failed' && (
          <div className="check-error" role="alert" data-testid="check-error">
            <strong>{state.badInput ? 'The table could not be checked.' : 'The check stopped with an internal error (please report it).'}</strong> {viewMessage(state.message)}
          </div>
        )}

        {state.kind === 'done' && ranWith !== inputs && (
          <p className="check-stale" role="status" data-testid="check-stale">
            The mapping or the options changed since this report was made: check the rows again to bring it up to date.
          </p>
        )}
        {state.kind === 'done' && (
          <Report
            result={state.result}
            millis={state.millis}
            flaggedOnly={flaggedOnly}
            onFlaggedOnly={(v) => {
              setFlaggedOnly(v);
              setPage(0);
            }}
            page={page}
            onPage={setPage}
            onExport={() => void exportReport(state.result)}
            onExportXlsx={() => void exportReport(state.result, 'xlsx')}
            exportNote={exportNote}
          />
        )}
      </div>
    </div>
  );
}

function MappingTable({ table, mapping, edits, unknown, onColumn }: { table: Table; mapping: ColumnMapping | null; edits: Readonly<Record<string, string>>; unknown: readonly string[]; onColumn: (header: string, symbol: string, unitText: string) => void }): ReactElement {
  const groups = targetChoices();
  return (
    <div className="check-scroll mapping">
      <table className="check-table" data-testid="check-mapping">
        <thead>
          <tr>
            <th>column</th>
            <th>holds</th>
            <th>unit</th>
            <th>first row</th>
            <th>note</th>
          </tr>
        </thead>
        <tbody>
          {table.headers.map((header, i) => {
            const col = mapping?.columns[i];
            const symbol = col ? symbolOf(col) : 'ignore';
            const power = powerOf(symbol);
            const unitText = col ? unitTextOf(col) : '';
            const ownUnit = splitHeader(header).unitText;
            const corrected = (Object.hasOwn(edits, header) ? edits[header] : undefined) !== undefined;
            const reading = corrected ? 'corrected' : col?.role === 'ignore' ? col.why : ownUnit !== null ? `unit from the header (${ownUnit})` : power !== null ? 'unit: the table unit' : '';
            const isNew = !corrected && unknown.includes(header.trim());
            const note = isNew ? `new: not in the remembered mapping, read from its header${reading === '' ? '' : `; ${reading}`}` : reading;
            return (
              <tr key={header} data-testid={`map-row-${i}`} data-new-column={isNew ? 'true' : undefined} className={col?.role === 'ignore' ? 'ignored' : corrected ? 'corrected' : isNew ? 'new-column' : ''}>
                <th scope="row">{header}</th>
                <td>
                  <select data-testid={`map-target-${i}`} aria-label={`what column ${header} holds`} value={symbol} onChange={(e) => onColumn(header, e.target.value, unitText)}>
                    {groups.map((g) => (
                      <optgroup key={g.group} label={g.group}>
                        {g.choices.map((c) => (
                          <option key={c.value} value={c.value}>
                            {c.label}
                          </option>
                        ))}
                      </optgroup>
                    ))}
                  </select>
                </td>
                <td>
                  {power !== null && (
                    <select data-testid={`map-unit-${i}`} aria-label={`unit of column ${header}`} value={unitText} onChange={(e) => onColumn(header, symbol, e.target.value)}>
                      {unitChoices(power).map((c) => (
                        <option key={c.value} value={c.value}>
                          {c.label}
                        </option>
                      ))}
                    </select>
                  )}
                </td>
                <td className="num">{table.firstRow[i] ?? ''}</td>
                <td className="muted small">{note}</td>
              </tr>
            );
          })}
        </tbody>
      </table>
    </div>
  );
}

interface ReportProps {
  readonly result: TableCheck;
  readonly millis: number;
  readonly flaggedOnly: boolean;
  readonly onFlaggedOnly: (v: boolean) => void;
  readonly page: number;
  readonly onPage: (p: number) => void;
  readonly onExport: () => void;
  readonly onExportXlsx: () => void;
  readonly exportNote: string | null;
}

function Report({ result, millis, flaggedOnly, onFlaggedOnly, page, onPage, onExport, onExportXlsx, exportNote }: ReportProps): ReactElement {
  const s = result.summary;
  const symbols = Object.keys(CHECKED_PROPERTIES).filter((k) => result.rows.some((r) => r.properties.some((p) => p.symbol === k)));
  const shown = flaggedOnly ? result.rows.filter((r) => r.flagged) : result.rows;
  const pages = Math.max(1, Math.ceil(shown.length / PAGE));
  const at = Math.min(page, pages - 1);
  const unitOf = (symbol: string): string => `${result.unit}${SUPER[CHECKED_PROPERTIES[symbol]?.power ?? 1] ?? ''}`;
  return (
    <section className="check-step report" data-testid="check-report">
      <div className="check-summary" data-testid="check-summary">
        <div className="tile">
          <span className="big" data-testid="summary-rows-checked">
            {s.rowsChecked}
          </span>
          rows checked ({s.rowsPassed} pass)
        </div>
        <div className={s.rowsFlagged > 0 ? 'tile bad' : 'tile good'}>
          <span className="big" data-testid="summary-rows-flagged">
            {s.rowsFlagged}
          </span>
          rows flagged
        </div>
        <div className={s.rowsNotChecked > 0 ? 'tile bad' : 'tile'}>
          <span className="big" data-testid="summary-rows-not-checked">
            {s.rowsNotChecked}
          </span>
          rows not checked{s.rowsChecked === 0 ? ': nothing was checked, so nothing passed' : ''}
        </div>
        <div className="tile">
          <span className="big">{s.propertiesChecked}</span>
          values compared, {s.propertiesFlagged} beyond tolerance
        </div>
        <div className="tile">
          <span className="big" data-testid="summary-time" data-ms={Math.round(millis)}>
            {(millis / 1000).toFixed(2)} s
          </span>
          to check, in {result.unit}
        </div>
        <div className="worst">
          <strong>Worst deviation of each property</strong>
          <table className="check-table compact" data-testid="check-worst">
            <tbody>
              {s.worst.map((w) => (
                <tr key={w.symbol} className={w.flagged ? 'flagged' : ''}>
                  <th scope="row">{w.symbol}</th>
                  <td className="num">{pct(w.deviation)}</td>
                  <td>
                    row {w.row} {w.designation}
                  </td>
                  <td>{w.flagged ? 'flagged' : 'within tolerance'}</td>
                </tr>
              ))}
            </tbody>
          </table>
        </div>
      </div>
      {result.ignoredColumns.length > 0 && (
        <details className="small muted">
          <summary>{result.ignoredColumns.length} columns not used: not known to the check, or known but not checked</summary>
          <ul>
            {result.ignoredColumns.map((c) => (
              <li key={c.header}>
                {c.header}: {c.why}
              </li>
            ))}
          </ul>
        </details>
      )}
      <div className="check-row">
        <label className="tick">
          <input type="checkbox" data-testid="check-flagged-only" checked={flaggedOnly} onChange={(e) => onFlaggedOnly(e.target.checked)} /> flagged rows only
        </label>
        <button type="button" data-testid="check-export" onClick={onExport}>
          Export the report (CSV)…
        </button>
        <button type="button" data-testid="check-export-xlsx" onClick={onExportXlsx}>
          Export the report (XLSX)…
        </button>
        {exportNote && (
          <span className="muted small" data-testid="check-export-note">
            {exportNote}
          </span>
        )}
        <span className="pager">
          <button type="button" data-testid="check-page-prev" disabled={at === 0} onClick={() => onPage(at - 1)}>
            ‹
          </button>
          <span data-testid="check-page">
            rows {shown.length === 0 ? 0 : at * PAGE + 1}–{Math.min(shown.length, (at + 1) * PAGE)} of {shown.length}
          </span>
          <button type="button" data-testid="check-page-next" disabled={at >= pages - 1} onClick={() => onPage(at + 1)}>
            ›
          </button>
        </span>
      </div>
      <div className="check-scroll rows">
        <table className="check-table results" data-testid="check-rows">
          <thead>
            <tr>
              <th>row</th>
              <th>designation</th>
              <th>type</th>
              <th>status</th>
              {symbols.map((k) => (
                <th key={k} title={CHECKED_PROPERTIES[k]?.what}>
                  {k} [{unitOf(k)}]
                  <span className="sub">table · computed · deviation</span>
                </th>
              ))}
            </tr>
          </thead>
          <tbody>
            {shown.slice(at * PAGE, (at + 1) * PAGE).map((r) => (
              <ReportRow key={r.row} row={r} symbols={symbols} />
            ))}
          </tbody>
        </table>
        {shown.length === 0 && <p className="muted">No row is flagged.</p>}
      </div>
      <p className="check-caution small">{result.caution}</p>
    </section>
  );
}

function ReportRow({ row, symbols }: { row: RowCheck; symbols: readonly string[] }): ReactElement {
  return (
    <>
      <tr data-testid={`report-row-${row.row}`} data-flagged={row.flagged ? 'true' : 'false'} className={row.flagged ? 'flagged-row' : ''}>
        <td className="num">{row.row}</td>
        <th scope="row">{row.designation}</th>
        <td title={row.familyFrom === 'designation' ? 'family read from the designation' : undefined}>{row.family ?? '?'}</td>
        <td className={row.status === 'flagged' ? 'verdict bad' : row.status === 'pass' ? 'verdict good' : 'verdict muted'} data-testid={`status-${row.row}`}>{row.status}</td>
        {symbols.map((k) => {
          const p = row.properties.find((q) => q.symbol === k);
          if (!p) return <td key={k} className="muted">—</td>;
          return (
            <td key={k} className={p.flagged ? 'value flagged' : 'value'} data-testid={`cell-${row.row}-${k}`} data-flagged={p.flagged ? 'true' : 'false'} data-deviation={p.deviation} title={`tolerance ${(p.tolerance * 100).toFixed(2)} %`}>
              <span className="pair">
                {tabulatedText(p.tabulated)} · {formatSig(p.computed, 4)}
              </span>
              <span className="dev">{pct(p.deviation)}</span>
            </td>
          );
        })}
      </tr>
      {(row.findings.length > 0 || row.notCheckedReason !== undefined) && (
        <tr className="findings-row" data-testid={`findings-${row.row}`}>
          <td />
          <td colSpan={symbols.length + 3} className="findings small">
            {[...row.findings, ...(row.notCheckedReason !== undefined ? [`not checked: ${row.notCheckedReason}`] : [])].join(' · ')}
          </td>
        </tr>
      )}
    </>
  );
}
