/**
 * The application shell: menu bar, tools, drawing, part list, exact input and results.
 * It wires the headless editor to the host (files, title, recovery) and to core (results).
 */
import { useCallback, useDeferredValue, useEffect, useMemo, useRef, useState, useSyncExternalStore, type ReactElement } from 'react';
import { allSectionViews, newSectionFile, serialiseDocument, type SectionDocument, type SectionFile } from '../../../core/document/index.ts';
import { getPartType } from '../../../core/parts/index.ts';
import { propertiesCsv, sectionSvg } from '../../../core/export/index.ts';
import { sectionFromDocument } from '../../../core/section/index.ts';
import { convertLength, defaultDisplaySet, plainDisplaySet, LENGTH_UNITS, type DisplaySet, type LengthUnit } from '../../../core/units/index.ts';
import { Editor } from '../../editor/editor.ts';
import { outlineBox, type Vec } from '../../editor/geometry.ts';
import { scaleDocumentLengths } from '../../editor/transforms.ts';
import type { ToolId } from '../../editor/tools/tool.ts';
import { getBrowserHost, getHost, type HostCommand } from '../../host/index.ts';
import { Canvas, type Overlays } from '../canvas/Canvas.tsx';
import { EntryPanel } from '../parts/EntryPanel.tsx';
import { documentFromText } from './files.ts';
import { MenuBar, type MenuAction } from './MenuBar.tsx';
import { PartsPanel } from '../parts/PartsPanel.tsx';
import { PartsPalette } from '../parts/PartsPalette.tsx';
import { createResultsCache, shapeOutlineResolver } from '../results/results.ts';
import { ResultsPanel } from '../results/ResultsPanel.tsx';
import { MaterialsPanel } from '../materials/MaterialsPanel.tsx';
import { MemberPanel } from '../member/MemberPanel.tsx';
import { StressPanel } from '../stress/StressPanel.tsx';
import { CheckView } from '../check/CheckView.tsx';
import { CompareView } from '../compare/CompareView.tsx';
import { SectionsBar } from '../sections/SectionsBar.tsx';
import { SectionReport } from '../report/ReportView.tsx';
import type { MemberCase } from '../report/report-input.ts';
import { computeStress, type ForceTexts } from '../stress/stress.ts';
import { TorsionClient, type TorsionState } from '../results/torsion-client.ts';
import { fitView, zoomAt, type View } from '../canvas/view.ts';
import { formatSig } from '../../../core/units/index.ts';
import exampleText from '../../../assets/examples/footbridge-box-girder.section.json?raw';

const EXAMPLE_NAME = 'footbridge-box-girder.section.json';
const SEEN_KEY = 'sectionsmith.seenExample';
const RECOVERY_DELAY_MS = 1200;

const DISPLAY_CHOICES: readonly { id: string; label: string; set: (doc: LengthUnit) => DisplaySet }[] = [
  { id: 'document', label: 'document unit (scaled)', set: (u) => defaultDisplaySet(u) },
  { id: 'in', label: 'in, in², in³, in⁴', set: () => plainDisplaySet('in') },
  { id: 'mm-scaled', label: 'mm, 10³ mm³, 10⁶ mm⁴', set: () => defaultDisplaySet('mm') },
  { id: 'mm', label: 'mm, mm², mm³, mm⁴', set: () => plainDisplaySet('mm') },
  { id: 'cm', label: 'cm, cm², cm³, cm⁴', set: () => plainDisplaySet('cm') },
  { id: 'm', label: 'm, m², m³, m⁴', set: () => plainDisplaySet('m') },
];

const TOOLS: readonly { id: ToolId; label: string; key: string; hint: string }[] = [
  { id: 'select', label: 'Select', key: 'V', hint: 'Click a part to select it (Shift adds); drag to move. Hold Alt to place freely.' },
  { id: 'rectangle', label: 'Plate', key: 'R', hint: 'Drag corner to corner. Alt suspends snapping. Or type b × h under Exact input.' },
  { id: 'circle', label: 'Round', key: 'C', hint: 'Drag from the centre out. Or type d under Exact input.' },
  { id: 'polygon', label: 'Outline', key: 'P', hint: 'Click each corner; click the first again or press Enter to close. Backspace takes one back.' },
  { id: 'vertex', label: 'Corners', key: 'E', hint: 'Select an outline, then drag a corner, press on an edge to add one, Delete to remove the chosen one.' },
];

const isLengthParam = (shape: string, key: string): boolean => {
  const spec = getPartType(shape)?.params.find((p) => p.key === key);
  return spec === undefined || spec.quantity === undefined || spec.quantity === 'length';
};

function exampleDoc(): SectionFile | null {
  const r = documentFromText(exampleText, EXAMPLE_NAME, 'mm');
  return r.ok ? r.file : null;
}

interface Banner {
  readonly kind: 'error' | 'info';
  readonly title: string;
  readonly lines: readonly string[];
}

export function App(): ReactElement {
  const host = useMemo(() => getHost(), []);
  const editorRef = useRef<Editor | null>(null);
  if (!editorRef.current) {
    const holder: { ed: Editor | null } = { ed: null };
    const resolver = shapeOutlineResolver(() => holder.ed?.getState().doc.unit ?? 'mm');
    holder.ed = new Editor(newSectionFile('mm'), { resolveShape: resolver });
    editorRef.current = holder.ed;
  }
  const editor = editorRef.current;
  const state = useSyncExternalStore(editor.subscribe, editor.getState);
  const compute = useMemo(() => createResultsCache(), []);
  const results = compute(state.doc);
  const outlines = editor.outlines(state.doc);
  // Every section of the file as { name, doc } for the compare view; the active one is the editor's own view.
  const sectionViews = useMemo(
    () => allSectionViews(state.sectionFile).map((v, i) => (state.sectionFile.sections[i]?.id === state.activeSection ? { name: v.name, doc: state.doc } : v)),
    [state.sectionFile, state.activeSection, state.doc],
  );

  const [size, setSize] = useState({ width: 0, height: 0 });
  const [view, setView] = useState<View>({ scale: 0.5, ox: 400, oy: 300 });
  const [overlays, setOverlays] = useState<Overlays>({ centroid: true, axes: true, principal: true, pna: false, fibres: false, dimensions: true, stress: false, kern: false });
  const [displayId, setDisplayId] = useState('document');
  const [sig, setSig] = useState(4);
  const [banner, setBanner] = useState<Banner | null>(null);
  const [recovery, setRecovery] = useState<string | null>(null);
  const [cursor, setCursor] = useState<Vec | null>(null);
  const [pendingFit, setPendingFit] = useState(true);
  const [shown, setShown] = useState<'compare' | 'print-report' | 'check-table' | null>(null);
  const [memberCase, setMemberCase] = useState<MemberCase | null>(null);
  const display = (DISPLAY_CHOICES.find((d) => d.id === displayId) ?? DISPLAY_CHOICES[0])!.set(state.doc.unit);

  const fit = useCallback(() => {
    setView(fitView(outlineBox(editor.outlines()), size.width, size.height, 70));
  }, [editor, size]);

  useEffect(() => {
    if (pendingFit && size.width > 100) {
      fit();
      setPendingFit(false);
    }
  }, [pendingFit, fit, size]);

  // The section centroid is a snap target.
  useEffect(() => {
    editor.setCentroid(results.properties ? [results.properties.cx, results.properties.cy] : null);
  }, [editor, results.properties]);

  // Torsion by finite elements in a worker: started a moment after the drawing settles; any newer
  // edit cancels a running solve, since its answer would describe an older section.
  const [torsion, setTorsion] = useState<TorsionState>({ kind: 'idle' });
  const torsionClient = useMemo(() => new TorsionClient(setTorsion), []);
  const validDoc = results.properties ? state.doc : null;
  useEffect(() => {
    torsionClient.cancel();
    if (!validDoc || state.gesture) return undefined;
    const t = window.setTimeout(() => torsionClient.solve(validDoc), 400);
    return () => window.clearTimeout(t);
  }, [torsionClient, validDoc, state.gesture]);
  useEffect(() => () => torsionClient.cancel(), [torsionClient]);

  // Window title: document name and an unsaved marker.
  const docName = state.file?.name ?? state.sectionFile.name;
  useEffect(() => {
    host.setTitle(`${state.dirty ? '• ' : ''}${docName} — Sectionsmith`);
    host.setUnsaved?.(state.dirty);
  }, [host, docName, state.dirty]);

  // Recovery text shortly after each change; cleared when the work becomes clean again (saved,
  // or undone back to the saved state). A fresh start never clears it: that text may be the
  // previous session's, still on offer. While that offer is unanswered nothing is written, so
  // the earlier work is not overwritten by new edits; answering it resumes writing at once.
  const wasDirty = useRef(false);
  useEffect(() => {
    if (recovery !== null) return undefined;
    if (!state.dirty && !wasDirty.current) return undefined;
    const t = window.setTimeout(() => {
      wasDirty.current = state.dirty;
      void host.writeRecovery(state.dirty ? serialiseDocument(state.sectionFile) : null);
    }, RECOVERY_DELAY_MS);
    return () => window.clearTimeout(t);
  }, [host, state.sectionFile, state.dirty, recovery]);

  const loadDoc = useCallback(
    (doc: SectionDocument | SectionFile, file: { name: string; handle: string | null } | null, dirty = false) => {
      editor.load(doc, file, dirty);
      setPendingFit(true);
    },
    [editor],
  );

  const confirmDiscard = useCallback(async (): Promise<boolean> => {
    if (!editor.getState().dirty) return true;
    return host.confirmDiscard(editor.getState().file?.name ?? editor.getState().doc.name);
  }, [editor, host]);

  const openText = useCallback(
    (text: string, name: string, handle: string | null) => {
      const r = documentFromText(text, name, editor.getState().doc.unit);
      if (!r.ok) {
        setBanner({ kind: 'error', title: `Could not open ${name}. The current document is unchanged.`, lines: r.errors });
        return;
      }
      loadDoc(r.file, { name, handle: r.note?.startsWith('GeoJSON') ? null : handle });
      setBanner(r.note ? { kind: 'info', title: `Opened ${name}`, lines: [r.note] } : null);
    },
    [editor, loadDoc],
  );

  // First start: offer recovery if a previous session ended without saving, else show the example.
  useEffect(() => {
    let cancelled = false;
    void (async () => {
      const launched = await host.launchFile?.();
      const left = await host.readRecovery();
      if (cancelled) return;
      if (launched) openText(launched.text, launched.name, launched.handle);
      else if (window.localStorage.getItem(SEEN_KEY) === null) {
        window.localStorage.setItem(SEEN_KEY, '1');
        const ex = exampleDoc();
        if (ex) loadDoc(ex, { name: EXAMPLE_NAME, handle: null });
      }
      if (left) setRecovery(left);
    })();
    return () => {
      cancelled = true;
    };
  }, [host, loadDoc, openText]);

  const save = useCallback(
    async (as: boolean) => {
      const st = editor.getState();
      const text = serialiseDocument(st.sectionFile);
      try {
        const suggested = st.file?.name ?? `${st.sectionFile.name.replace(/[^\w.-]+/g, '-') || 'section'}.section.json`;
        const r = !as && st.file?.handle ? await host.save(st.file.handle, text) : await host.saveAs(suggested, text);
        if (!r) return;
        editor.markSaved({ name: r.name, handle: r.handle });
        await host.writeRecovery(null);
        setBanner({ kind: 'info', title: `Saved ${r.name}`, lines: [] });
      } catch (err) {
        setBanner({ kind: 'error', title: 'The document was not saved.', lines: [err instanceof Error ? err.message : String(err)] });
      }
    },
    [editor, host],
  );

  const torsionRef = useRef<TorsionState>({ kind: 'idle' });
  torsionRef.current = torsion;
  const exportAs = useCallback(
    async (kind: 'svg' | 'csv') => {
      const st = editor.getState();
      const section = sectionFromDocument(st.doc);
      if (!section.properties) {
        setBanner({ kind: 'error', title: 'Nothing was exported: the section has no valid properties.', lines: section.diagnostics.map((d) => d.message) });
        return;
      }
      const base = (st.file?.name ?? st.doc.name).replace(/\.(section\.json|geojson|json)$/i, '').replace(/[^\w.-]+/g, '-') || 'section';
      const file =
        kind === 'svg'
          ? { suggestedName: `${base}.svg`, mimeType: 'image/svg+xml', text: sectionSvg({ name: st.doc.name, unit: st.doc.unit, section, display }) }
          : { suggestedName: `${base}.csv`, mimeType: 'text/csv', text: propertiesCsv({ name: st.doc.name, unit: st.doc.unit, properties: section.properties, torsion: torsionRef.current.kind === 'done' && torsionRef.current.doc === st.doc ? torsionRef.current.result : null }) };
      try {
        if (await host.exportFile(file)) setBanner({ kind: 'info', title: `Exported ${file.suggestedName}`, lines: [] });
      } catch (err) {
        setBanner({ kind: 'error', title: `Export of ${file.suggestedName} failed.`, lines: [err instanceof Error ? err.message : String(err)] });
      }
    },
    [display, editor, host],
  );

  const run = useCallback(
    async (action: MenuAction | HostCommand) => {
      switch (action) {
        case 'new':
          if (await confirmDiscard()) loadDoc(newSectionFile(editor.getState().doc.unit), null);
          return;
        case 'open': {
          if (!(await confirmDiscard())) return;
          try {
            const f = await host.open();
            if (f) openText(f.text, f.name, f.handle);
          } catch (err) {
            setBanner({ kind: 'error', title: 'Could not open the file. The current document is unchanged.', lines: [err instanceof Error ? err.message : String(err)] });
          }
          return;
        }
        case 'save':
          return save(false);
        case 'save-as':
          return save(true);
        case 'export-svg':
        case 'export-csv':
          return exportAs(action === 'export-svg' ? 'svg' : 'csv');
        case 'undo':
          return editor.undo();
        case 'redo':
          return editor.redo();
        case 'delete':
          return editor.deleteSelection();
        case 'zoom-in':
          return setView((v) => zoomAt(v, 1.25, [size.width / 2, size.height / 2]));
        case 'zoom-out':
          return setView((v) => zoomAt(v, 0.8, [size.width / 2, size.height / 2]));
        case 'zoom-fit':
          return fit();
        case 'open-example': {
          if (!(await confirmDiscard())) return;
          const ex = exampleDoc();
          if (ex) loadDoc(ex, { name: EXAMPLE_NAME, handle: null });
          return;
        }
        case 'duplicate':
          return editor.duplicateSelection();
        case 'select-all':
          return editor.select(editor.getState().doc.parts.map((p) => p.id));
        case 'open-launch-file':
          return;
        case 'compare':
        case 'print-report':
        case 'check-table':
          return setShown(action);
      }
    },
    [confirmDiscard, editor, exportAs, fit, host, loadDoc, openText, save, size],
  );

  useEffect(() => host.onCommand?.((c) => void run(c)), [host, run]);

  // In-page confirm for the browser host (window.confirm otherwise).
  const [asking, setAsking] = useState<{ name: string; answer: (yes: boolean) => void } | null>(null);
  useEffect(() => {
    getBrowserHost()?.setConfirmDiscard((name) => new Promise<boolean>((resolve) => setAsking({ name, answer: resolve })));
  }, []);

  // Keyboard shortcuts.
  useEffect(() => {
    const onKey = (e: KeyboardEvent): void => {
      const target = e.target as HTMLElement | null;
      const typing = target && (target.tagName === 'INPUT' || target.tagName === 'TEXTAREA' || target.tagName === 'SELECT');
      const mod = e.ctrlKey || e.metaKey;
      const k = e.key.toLowerCase();
      if (mod && !e.altKey) {
        const map: Record<string, MenuAction> = { n: 'new', o: 'open', s: e.shiftKey ? 'save-as' : 'save', z: e.shiftKey ? 'redo' : 'undo', y: 'redo', d: 'duplicate', a: 'select-all' };
        const a = map[k];
        if (a && !(typing && (k === 'z' || k === 'y' || k === 'a'))) {
          e.preventDefault();
          void run(a);
        }
        return;
      }
      if (typing) return;
      if (e.key === '+' || e.key === '=') return void run('zoom-in');
      if (e.key === '-' || e.key === '_') return void run('zoom-out');
      if (e.key === '0') return void run('zoom-fit');
      if (['Escape', 'Enter', 'Delete', 'Backspace'].includes(e.key)) {
        e.preventDefault();
        editor.key(e.key);
        return;
      }
      const step = editor.getState().snap.grid;
      const arrows: Record<string, Vec> = { ArrowLeft: [-step, 0], ArrowRight: [step, 0], ArrowUp: [0, step], ArrowDown: [0, -step] };
      const arrow = arrows[e.key];
      if (arrow && editor.getState().selection.length > 0) {
        e.preventDefault();
        editor.moveSelectionBy(arrow[0], arrow[1]);
        return;
      }
      const tool = TOOLS.find((t) => t.key.toLowerCase() === k);
      if (tool) editor.setTool(tool.id);
    };
    window.addEventListener('keydown', onKey);
    return () => window.removeEventListener('keydown', onKey);
  }, [editor, run]);

  const changeUnit = (unit: LengthUnit): void => {
    const from = state.doc.unit;
    if (unit === from) return;
    editor.replaceAllSections(`Document unit ${from} → ${unit}`, (doc) => ({ ...scaleDocumentLengths(doc, (v) => convertLength(v, from, unit), isLengthParam), unit }));
    setView((v) => ({ ...v, scale: v.scale / convertLength(1, from, unit) }));
  };

  const activeTool = TOOLS.find((t) => t.id === state.toolId);
  const p = results.properties;

  // Normal stress under the panel's forces: computed while the panel is open or an overlay shows it,
  // a step behind a drag so dragging stays smooth.
  const [forces, setForces] = useState<ForceTexts>({ N: '', Mx: '', My: '', Vx: '', Vy: '' });
  const [stressOpen, setStressOpen] = useState(false);
  const stressShown = useRef(false);
  const stressDoc = useDeferredValue(state.doc);
  const stressCache = useMemo(() => createResultsCache(), []);
  const stressProps = stressDoc === state.doc ? p : stressCache(stressDoc).properties;
  const stressWanted = stressOpen || overlays.stress || overlays.kern;
  const stress = useMemo(() => (stressWanted ? computeStress(stressDoc, stressProps, forces) : null), [stressWanted, stressDoc, stressProps, forces]);

  return (
    <div className="app">
      <MenuBar
        onAction={(a) => void run(a)}
        canUndo={state.canUndo}
        canRedo={state.canRedo}
        undoLabel={state.undoLabel}
        redoLabel={state.redoLabel}
        overlays={overlays}
        onOverlays={setOverlays}
        onOpenFile={async (file) => {
          if (!(await confirmDiscard())) return;
          openText(await file.text(), file.name, null);
        }}
        title={`${state.dirty ? '• ' : ''}${docName}`}
      />
      {banner && (
        <div className={`banner ${banner.kind}`} role={banner.kind === 'error' ? 'alert' : 'status'} data-testid={banner.kind === 'error' ? 'error-banner' : 'info-banner'}>
          <strong>{banner.title}</strong>
          {banner.lines.length > 0 && (
            <ul>
              {banner.lines.slice(0, 8).map((l, i) => (
                <li key={i}>{l}</li>
              ))}
            </ul>
          )}
          <button type="button" className="close" data-testid="banner-close" onClick={() => setBanner(null)} aria-label="Dismiss">
            ×
          </button>
        </div>
      )}
      {recovery && (
        <div className="banner info" role="status" data-testid="recovery-offer">
          <strong>Unsaved work from an earlier session was found.</strong>
          <span className="buttons">
            <button
              type="button"
              data-testid="recovery-restore"
              onClick={() => {
                const r = documentFromText(recovery, 'recovered work', state.doc.unit);
                if (r.ok) loadDoc(r.file, null, true);
                else setBanner({ kind: 'error', title: 'The recovered work could not be read.', lines: r.errors });
                setRecovery(null);
              }}
            >
              Restore it
            </button>
            <button
              type="button"
              data-testid="recovery-discard"
              onClick={() => {
                void host.writeRecovery(null);
                setRecovery(null);
              }}
            >
              Discard it
            </button>
          </span>
        </div>
      )}
      <div className="workspace">
        <aside className="left">
          <div className="tools" role="toolbar" aria-label="Tools">
            {TOOLS.map((t) => (
              <button key={t.id} type="button" className={state.toolId === t.id ? 'tool active' : 'tool'} data-testid={`tool-${t.id}`} title={`${t.label} (${t.key})`} aria-pressed={state.toolId === t.id} onClick={() => editor.setTool(t.id)}>
                {t.label}
                <kbd>{t.key}</kbd>
              </button>
            ))}
          </div>
          <PartsPanel editor={editor} state={state} />
          <PartsPalette editor={editor} state={state} onPlaced={fit} />
          <EntryPanel editor={editor} state={state} />
        </aside>
        <main className="drawing">
          <SectionsBar editor={editor} state={state} />
          <Canvas
            editor={editor}
            state={state}
            outlines={outlines}
            properties={p ?? results.stale}
            shearCentre={torsion.kind === 'done' && torsion.doc === state.doc ? [torsion.result.xs, torsion.result.ys] : null}
            diagnostics={results.diagnostics}
            stress={stress?.ok && stressDoc === state.doc ? stress.view : null}
            overlays={overlays}
            view={view}
            onView={setView}
            onSize={(w, h) => setSize({ width: w, height: h })}
            onCursor={setCursor}
          />
          <footer className="status" data-testid="status">
            <span>{activeTool?.hint}</span>
            <span className="coords" data-testid="cursor">
              {cursor ? `x ${formatSig(cursor[0], 5)}  y ${formatSig(cursor[1], 5)} ${state.doc.unit}` : ''}
            </span>
            <label title="Snapping (hold Alt while dragging to suspend it)">
              <input type="checkbox" data-testid="snap-toggle" checked={state.snap.gridOn} onChange={(e) => editor.setSnapSettings({ gridOn: e.target.checked, objectsOn: e.target.checked })} /> snap
            </label>
            <span className="muted">grid {formatSig(state.snap.grid, 3)} {state.doc.unit}</span>
          </footer>
        </main>
        <aside className="right">
          <div className="units">
            <label>
              Document unit
              <select data-testid="document-unit" value={state.doc.unit} onChange={(e) => changeUnit(e.target.value as LengthUnit)}>
                {LENGTH_UNITS.map((u) => (
                  <option key={u} value={u}>
                    {u}
                  </option>
                ))}
              </select>
            </label>
            <label>
              Show results in
              <select data-testid="display-unit" value={displayId} onChange={(e) => setDisplayId(e.target.value)}>
                {DISPLAY_CHOICES.map((d) => (
                  <option key={d.id} value={d.id}>
                    {d.label}
                  </option>
                ))}
              </select>
            </label>
            <label>
              Figures
              <select data-testid="sig-figs" value={sig} onChange={(e) => setSig(Number(e.target.value))}>
                {[3, 4, 5, 6].map((n) => (
                  <option key={n} value={n}>
                    {n}
                  </option>
                ))}
              </select>
            </label>
            <p className="muted small">Changing the document unit converts every length exactly, so the section stays the same physical size. The display unit changes only how results read.</p>
          </div>
          <ResultsPanel results={results} unit={state.doc.unit} display={display} sig={sig} torsion={torsion} current={state.doc} />
          <MaterialsPanel editor={editor} doc={state.doc} valid={!!results.properties} display={display} />
          <StressPanel
            doc={state.doc}
            texts={forces}
            onTexts={setForces}
            outcome={stress}
            onOpen={(open) => {
              setStressOpen(open);
              // Opening the panel the first time shows the map and the kern; View switches them off.
              if (open && !stressShown.current) {
                stressShown.current = true;
                setOverlays((o) => ({ ...o, stress: true, kern: true }));
              }
            }}
          />
          <MemberPanel doc={state.doc} valid={!!results.properties} onCase={setMemberCase} />
        </aside>
      </div>
      {shown === 'compare' && <CompareView sections={sectionViews} fileName={docName} display={display} sig={sig} onClose={() => setShown(null)} />}
      {shown === 'check-table' && <CheckView host={host} onClose={() => setShown(null)} />}
      {shown === 'print-report' && <SectionReport doc={state.doc} fileName={docName} fileTitle={state.sectionFile.name} display={display} sig={sig} torsion={torsion} member={memberCase} onClose={() => setShown(null)} />}
      {asking && (
        <div className="modal-back">
          <div className="modal" role="dialog" aria-modal="true" data-testid="confirm-discard">
            <p>
              <strong>{asking.name}</strong> has changes that are not saved. Discard them?
            </p>
            <div className="buttons">
              <button type="button" data-testid="confirm-discard-yes" onClick={() => (asking.answer(true), setAsking(null))}>
                Discard changes
              </button>
              <button type="button" data-testid="confirm-discard-no" autoFocus onClick={() => (asking.answer(false), setAsking(null))}>
                Keep working
              </button>
            </div>
          </div>
        </div>
      )}
    </div>
  );
}
