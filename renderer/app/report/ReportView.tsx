/**
 * The print-ready report over the whole window: the report HTML (core/report) shown as it will
 * print, in a frame that runs no scripts; a paper size; Print (the browser's print dialog for the
 * frame alone), Save HTML, and Save PDF where the host can make one (the desktop app).
 * `SectionReport` builds the report of the section now open (report-input.ts).
 */
import { useEffect, useMemo, useRef, useState, type ReactElement } from 'react';
import type { SectionDocument } from '../../../core/document/types.ts';
import { reportHtml, type ReportInput } from '../../../core/report/index.ts';
import type { DisplaySet } from '../../../core/units/index.ts';
import { getHost } from '../../host/index.ts';
import { fileStem, PAPER_SIZES, sectionReportInput, withPaperSize, type MemberCase, type PaperSize } from './report-input.ts';
import type { TorsionState } from '../../controller/torsion-client.ts';
import '../shell/overlays.css';
import { CAUTION } from '../../../core/member/check.ts';

/**
 * The previous value while `same(previous, next)` holds: the App makes a new display set and
 * section list on every render, and the views should not recompute for an equal one.
 */
export function useStable<T>(value: T, same: (a: T, b: T) => boolean): T {
  const kept = useRef(value);
  if (kept.current !== value && !same(kept.current, value)) kept.current = value;
  return kept.current;
}

export const sameDisplay = (a: DisplaySet, b: DisplaySet): boolean => (Object.keys(a) as (keyof DisplaySet)[]).every((q) => a[q].id === b[q].id);

/** Today's date as yyyy-mm-dd, local time (shown under the title). */
export function today(): string {
  const d = new Date();
  const two = (n: number): string => String(n).padStart(2, '0');
  return `${d.getFullYear()}-${two(d.getMonth() + 1)}-${two(d.getDate())}`;
}

interface ReportViewProps {
  readonly input: ReportInput;
  /** File name stem for saving, e.g. "footbridge-box-girder". */
  readonly stem: string;
  readonly notes?: readonly string[];
  readonly onClose: () => void;
}

export function ReportView({ input, stem, notes = [], onClose }: ReportViewProps): ReactElement {
  const host = useMemo(() => getHost(), []);
  const [paper, setPaper] = useState<PaperSize>(() => (navigator.language === 'en-US' || navigator.language === 'en-CA' ? 'Letter' : 'A4'));
  const [status, setStatus] = useState<{ kind: 'info' | 'error'; text: string } | null>(null);
  const html = useMemo(() => withPaperSize(reportHtml(input), paper), [input, paper]);
  const frame = useRef<HTMLIFrameElement>(null);

  // Written into an about:blank frame (it inherits the app's policy; srcdoc would count as a framed page).
  useEffect(() => {
    const doc = frame.current?.contentDocument;
    if (!doc) return;
    doc.open();
    doc.write(html);
    doc.close();
  }, [html]);

  useEffect(() => {
    const onKey = (e: KeyboardEvent): void => {
      if (e.key === 'Escape') onClose();
    };
    window.addEventListener('keydown', onKey);
    return () => window.removeEventListener('keydown', onKey);
  }, [onClose]);

  const attempt = async (what: string, work: () => Promise<boolean>): Promise<void> => {
    try {
      if (await work()) setStatus({ kind: 'info', text: `${what} saved.` });
    } catch (err) {
      setStatus({ kind: 'error', text: `${what} was not saved: ${err instanceof Error ? err.message : String(err)}` });
    }
  };

  return (
    <div className="overlay" role="dialog" aria-modal="true" aria-label="Report" data-testid="report-view">
      <header className="overlay-bar">
        <strong>Report: {input.title}</strong>
        <label>
          paper{' '}
          <select data-testid="report-paper" value={paper} onChange={(e) => setPaper(e.target.value as PaperSize)}>
            {PAPER_SIZES.map((p) => (
              <option key={p} value={p}>
                {p === 'A4' ? 'A4' : 'US Letter'}
              </option>
            ))}
          </select>
        </label>
        <button type="button" data-testid="report-print" onClick={() => frame.current?.contentWindow?.print()}>
          Print…
        </button>
        {host.printToPdf && (
          <button type="button" data-testid="report-save-pdf" onClick={() => void attempt('The PDF', () => host.printToPdf!(html, `${stem}-report.pdf`))}>
            Save PDF…
          </button>
        )}
        <button type="button" data-testid="report-save-html" onClick={() => void attempt('The HTML report', () => host.exportFile({ suggestedName: `${stem}-report.html`, mimeType: 'text/html', text: html }))}>
          Save HTML…
        </button>
        <button type="button" className="overlay-close" data-testid="report-close" onClick={onClose}>
          Close
        </button>
      </header>
      <p className="caution overlay-caution" data-testid="report-caution">
        {CAUTION}
      </p>
      {notes.map((n) => (
        <p key={n} className="muted overlay-note" data-testid="report-note">
          {n}
        </p>
      ))}
      {status && (
        <p className={status.kind === 'error' ? 'error overlay-note' : 'overlay-note'} role={status.kind === 'error' ? 'alert' : 'status'} data-testid="report-status">
          {status.text}
        </p>
      )}
      <div className="report-paper-back">
        {/* No scripts run in the report (sandbox without allow-scripts); same origin so Print reaches it. */}
        <iframe ref={frame} className="report-frame" title="Report preview" data-testid="report-frame" sandbox="allow-same-origin allow-modals" />
      </div>
    </div>
  );
}

interface SectionReportProps {
  readonly doc: SectionDocument;
  readonly fileName: string;
  readonly display: DisplaySet;
  readonly sig: number;
  readonly torsion: TorsionState;
  readonly member: MemberCase | null;
  /** The file's own name (a file of several sections), shown before the section's. */
  readonly fileTitle?: string;
  readonly onClose: () => void;
}

/** The report of the section now open; torsion only when solved for this very document. */
export function SectionReport({ doc, fileName, display, sig, torsion, member, fileTitle = '', onClose }: SectionReportProps): ReactElement {
  const solved = torsion.kind === 'done' && torsion.doc === doc ? torsion.result : null;
  const units = useStable(display, sameDisplay);
  const built = useMemo(() => sectionReportInput({ doc, display: units, sig, torsion: solved, member, date: today(), fileTitle }), [doc, units, sig, solved, member, fileTitle]);
  if (!built.ok) {
    return (
      <div className="overlay" role="dialog" aria-modal="true" aria-label="Report" data-testid="report-view">
        <header className="overlay-bar">
          <strong>No report: the section needs attention</strong>
          <button type="button" className="overlay-close" data-testid="report-close" onClick={onClose}>
            Close
          </button>
        </header>
        <ul className="error overlay-note" data-testid="report-errors">
          {built.errors.map((e) => (
            <li key={e}>{e}</li>
          ))}
        </ul>
      </div>
    );
  }
  const notes = [
    ...(solved ? [] : [torsion.kind === 'failed' ? `Torsion was not computed (${torsion.message}); the report leaves J and Cw out.` : torsion.kind === 'cancelled' ? 'Torsion was stopped before it finished; the report leaves J and Cw out.' : 'Torsion is still being computed; J, Cw and the mesh note appear here when it finishes.']),
    ...(member ? [] : ['No member check: give this section a span and loads under "Member check" to include one.']),
  ];
  return <ReportView input={built.input} stem={fileStem(fileName)} notes={notes} onClose={onClose} />;
}
