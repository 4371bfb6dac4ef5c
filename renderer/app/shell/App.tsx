/**
 * The application shell: menu bar, tools, drawing, part list, exact input and results. It renders
 * the app controller's state (renderer/controller) and the editor's, and dispatches commands; the
 * work itself (files, recovery, commands, keys, background torsion) lives in the controller.
 */
import { useDeferredValue, useEffect, useMemo, useRef, useState, useSyncExternalStore, type ReactElement } from 'react';
import { formatSig, LENGTH_UNITS, type LengthUnit } from '../../../core/units/index.ts';
import type { Vec } from '../../editor/geometry.ts';
import type { ToolId } from '../../editor/tools/tool.ts';
import { getBrowserHost, getHost } from '../../host/index.ts';
import { AppController, DISPLAY_CHOICES, FIGURE_CHOICES } from '../../controller/controller.ts';
import { createResultsCache } from '../../controller/results.ts';
import { TorsionClient } from '../../controller/torsion-client.ts';
import { Canvas } from '../canvas/Canvas.tsx';
import { EntryPanel, SelectionPanel } from '../parts/EntryPanel.tsx';
import { MenuBar } from './MenuBar.tsx';
import { RefusedNotice } from './RefusedNotice.tsx';
import { ErrorBoundary } from './ErrorBoundary.tsx';
import { ShortcutSheet } from './ShortcutSheet.tsx';
import { DxfImportDialog } from './DxfImportDialog.tsx';
import { PointsDialog, pastedText } from './PointsDialog.tsx';
import { PartsPanel } from '../parts/PartsPanel.tsx';
import { PartsPalette } from '../parts/PartsPalette.tsx';
import { ResultsPanel } from '../results/ResultsPanel.tsx';
import { MaterialsPanel } from '../materials/MaterialsPanel.tsx';
import { MemberPanel } from '../member/MemberPanel.tsx';
import { StressPanel } from '../stress/StressPanel.tsx';
import { CheckView } from '../check/CheckView.tsx';
import { CompareView } from '../compare/CompareView.tsx';
import { SectionsBar } from '../sections/SectionsBar.tsx';
import { SectionReport } from '../report/ReportView.tsx';
import { JointsNotes, JointsPanel } from '../joints/JointsPanel.tsx';
import { JointsLayer } from '../joints/JointsLayer.tsx';
import { JointsStore } from '../joints/joints-store.ts';
import { memberCaseOf } from '../member/member-model.ts';
import { computeStress } from '../stress/stress.ts';
import exampleText from '../../../assets/examples/footbridge-box-girder.section.json?raw';

const TOOLS: readonly { id: ToolId; label: string; key: string; hint: string }[] = [
  { id: 'select', label: 'Select', key: 'V', hint: 'Click a part to select it (Shift adds); drag to move. Hold Alt to place freely.' },
  { id: 'rectangle', label: 'Plate', key: 'R', hint: 'Drag corner to corner. Alt suspends snapping. Or type b × h under Exact input.' },
  { id: 'circle', label: 'Round', key: 'C', hint: 'Drag from the centre out. Or type d under Exact input.' },
  { id: 'polygon', label: 'Outline', key: 'P', hint: 'Click each corner; click the first again or press Enter to close. Backspace takes one back.' },
  { id: 'vertex', label: 'Corners', key: 'E', hint: 'Select an outline, then drag a corner, press on an edge to add one, Delete to remove the chosen one.' },
];

/** The DOM key event as the controller's key input. */
function keyInput(e: KeyboardEvent): Parameters<AppController['keyDown']>[0] {
  const target = e.target as HTMLElement | null;
  const typing = !!target && (target.tagName === 'INPUT' || target.tagName === 'TEXTAREA' || target.tagName === 'SELECT');
  return { key: e.key, mod: e.ctrlKey || e.metaKey, shift: e.shiftKey, alt: e.altKey, typing };
}

/** The app's controller: made once by main.tsx, outside React, so the document outlives any view. */
export function createAppController(): AppController {
  // `?example-torsion=off` (browser tests): the example opened at start is not solved for torsion.
  const exampleTorsion = new URLSearchParams(globalThis.location?.search ?? '').get('example-torsion') !== 'off';
  return new AppController({ host: getHost(), exampleText, torsion: (onState) => new TorsionClient(onState), exampleTorsion });
}

export function App({ controller: given }: { readonly controller?: AppController } = {}): ReactElement {
  const controller = useMemo(() => given ?? createAppController(), [given]);
  const editor = controller.editor;
  const state = useSyncExternalStore(editor.subscribe, editor.getState);
  const app = useSyncExternalStore(controller.subscribe, controller.getState);
  const results = controller.results(state.doc);
  const outlines = editor.outlines(state.doc);
  const sectionViews = useMemo(() => controller.sectionViews(), [controller, state.sectionFile, state.activeSection, state.doc]);
  const [cursor, setCursor] = useState<Vec | null>(null);
  const display = controller.display();
  const { overlays, torsion, banner, recovery, view } = app;
  const docName = controller.documentName();
  const joints = useMemo(() => new JointsStore(), [controller]);

  useEffect(() => {
    void controller.start();
    getBrowserHost()?.setConfirmDiscard((name) => controller.askDiscard(name));
    const onKey = (e: KeyboardEvent): void => {
      if (controller.keyDown(keyInput(e))) e.preventDefault();
    };
    window.addEventListener('keydown', onKey);
    // Text pasted on the drawing (not into a field): a point list becomes an outline.
    const onPaste = (e: ClipboardEvent): void => {
      const text = pastedText(e);
      if (text !== null && controller.pasteText(text)) e.preventDefault();
    };
    window.addEventListener('paste', onPaste);
    // The last edit reaches the recovery copy even if the page dies right after it is hidden.
    const flush = (): void => controller.flushRecovery();
    const onVisibility = (): void => {
      if (document.visibilityState === 'hidden') flush();
    };
    window.addEventListener('pagehide', flush);
    document.addEventListener('visibilitychange', onVisibility);
    return () => {
      window.removeEventListener('keydown', onKey);
      window.removeEventListener('paste', onPaste);
      window.removeEventListener('pagehide', flush);
      document.removeEventListener('visibilitychange', onVisibility);
      controller.dispose();
    };
  }, [controller]);

  const activeTool = TOOLS.find((t) => t.id === state.toolId);
  const p = results.properties;

  // Normal stress under the panel's forces: computed while the panel is open or an overlay shows it,
  // a step behind a drag so dragging stays smooth.
  const [stressOpen, setStressOpen] = useState(false);
  const stressShown = useRef(false);
  const stressDoc = useDeferredValue(state.doc);
  const stressCache = useMemo(() => createResultsCache(), []);
  const stressProps = stressDoc === state.doc ? p : stressCache(stressDoc).properties;
  const stressWanted = stressOpen || overlays.stress || overlays.kern;
  const stress = useMemo(() => (stressWanted ? computeStress(stressDoc, stressProps) : null), [stressWanted, stressDoc, stressProps]);
  const reportMember = useMemo(() => memberCaseOf(state.doc), [state.doc]);
  // The member and stress panels edit the section's stored inputs through the editor (one undo step per field edit).
  const inputEditing = useMemo(() => ({ live: editor.liveDocument.bind(editor), commit: editor.commitLive.bind(editor), cancel: editor.cancelLive.bind(editor) }), [editor]);

  return (
    <div className="app">
      <MenuBar
        onAction={(a) => void controller.run(a)}
        canUndo={state.canUndo}
        canRedo={state.canRedo}
        undoLabel={state.undoLabel}
        redoLabel={state.redoLabel}
        overlays={overlays}
        onOverlays={(o) => controller.setOverlays(o)}
        onOpenFile={async (file) => {
          await controller.openGiven(await file.text(), file.name);
        }}
        title={`${state.dirty ? '• ' : ''}${docName}`}
        recent={app.recent}
        onOpenRecent={(handle, name) => void controller.openRecent(handle, name)}
        onMenuOpen={(name) => {
          if (name === 'File') void controller.refreshRecent();
        }}
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
          <button type="button" className="close" data-testid="banner-close" onClick={() => controller.dismissBanner()} aria-label="Dismiss">
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
              onClick={() => void controller.restoreRecovery()}
            >
              Restore it
            </button>
            <button
              type="button"
              data-testid="recovery-discard"
              onClick={() => controller.discardRecovery()}
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
              <button key={t.id} type="button" className={state.toolId === t.id ? 'tool active' : 'tool'} data-testid={`tool-${t.id}`} title={`${t.label} (${t.key})`} aria-pressed={state.toolId === t.id} onClick={() => void controller.run(`tool-${t.id}`)}>
                {t.label}
                <kbd>{t.key}</kbd>
              </button>
            ))}
          </div>
          <SelectionPanel editor={editor} state={state} run={(id) => void controller.run(id)} />
          <PartsPanel editor={editor} state={state} />
          <PartsPalette editor={editor} state={state} onPlaced={() => controller.fit()} />
          <EntryPanel editor={editor} state={state} />
        </aside>
        <main
          className="drawing"
          data-testid="drawing-drop"
          onDragOver={(e) => {
            if (e.dataTransfer.types.includes('Files')) e.preventDefault();
          }}
          onDrop={(e) => {
            // A file dropped on the drawing opens as if chosen with File → Open (a DXF asks for layers and unit first).
            const file = e.dataTransfer.files[0];
            if (!file) return;
            e.preventDefault();
            void file.text().then((text) => controller.openGiven(text, file.name));
          }}
        >
          <SectionsBar editor={editor} state={state} />
          <Canvas
            editor={editor}
            state={state}
            outlines={outlines}
            properties={p ?? results.stale}
            shearCentre={torsion.kind === 'done' && torsion.doc === state.doc && torsion.result.components === 1 ? [torsion.result.xs, torsion.result.ys] : null}
            diagnostics={results.diagnostics}
            stress={stress?.ok && stressDoc === state.doc ? stress.view : null}
            overlays={overlays}
            layers={<JointsLayer doc={state.doc} view={view} store={joints} />}
            view={view}
            onView={(v) => controller.setView(v)}
            onSize={(w, h) => controller.setSize(w, h)}
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
              <select data-testid="document-unit" value={state.doc.unit} onChange={(e) => controller.changeUnit(e.target.value as LengthUnit)}>
                {LENGTH_UNITS.map((u) => (
                  <option key={u} value={u}>
                    {u}
                  </option>
                ))}
              </select>
            </label>
            <label>
              Show results in
              <select data-testid="display-unit" value={app.displayId} onChange={(e) => controller.setDisplay(e.target.value)}>
                {DISPLAY_CHOICES.map((d) => (
                  <option key={d.id} value={d.id}>
                    {d.label}
                  </option>
                ))}
              </select>
            </label>
            <label>
              Figures
              <select data-testid="sig-figs" value={app.sig} onChange={(e) => controller.setFigures(Number(e.target.value))}>
                {FIGURE_CHOICES.map((n) => (
                  <option key={n} value={n}>
                    {n}
                  </option>
                ))}
              </select>
            </label>
            <p className="muted small">Changing the document unit converts every length exactly, so the section stays the same physical size. The display unit changes only how results read.</p>
          </div>
          <RefusedNotice refused={app.refused} />
          <ErrorBoundary view="results">
            <ResultsPanel results={results} unit={state.doc.unit} display={display} sig={app.sig} torsion={torsion} current={state.doc} onTorsion={(id) => void controller.run(id)} />
          </ErrorBoundary>
          <ErrorBoundary view="joints">
            <JointsNotes doc={state.doc} />
            <JointsPanel editor={editor} doc={state.doc} store={joints} />
          </ErrorBoundary>
          <MaterialsPanel editor={editor} doc={state.doc} valid={!!results.properties} display={display} />
          <StressPanel
            doc={state.doc}
            editing={inputEditing}
            outcome={stress}
            onOpen={(open) => {
              setStressOpen(open);
              // Opening the panel the first time shows the map and the kern; View switches them off.
              if (open && !stressShown.current) {
                stressShown.current = true;
                controller.setOverlays({ ...controller.getState().overlays, stress: true, kern: true });
              }
            }}
          />
          <MemberPanel doc={state.doc} valid={!!results.properties} editing={inputEditing} />
        </aside>
      </div>
      {app.shown === 'compare' && <CompareView sections={sectionViews} fileName={docName} display={display} sig={app.sig} onClose={() => controller.show(null)} />}
      {app.shown === 'check-table' && <CheckView host={getHost()} onClose={() => controller.show(null)} />}
      {app.shown === 'print-report' && <SectionReport doc={state.doc} fileName={docName} fileTitle={state.sectionFile.name} display={display} sig={app.sig} torsion={torsion} member={reportMember} onClose={() => controller.show(null)} />}
      {app.shown === 'shortcuts' && <ShortcutSheet onClose={() => controller.show(null)} />}
      {app.dxf !== null && <DxfImportDialog prompt={app.dxf} controller={controller} />}
      {app.points !== null && <PointsDialog prompt={app.points} unit={state.doc.unit} controller={controller} />}
      {app.asking !== null && (
        <div className="modal-back">
          <div className="modal" role="dialog" aria-modal="true" data-testid="confirm-discard">
            <p>
              <strong>{app.asking}</strong> has changes that are not saved. Discard them?
            </p>
            <div className="buttons">
              <button type="button" data-testid="confirm-discard-yes" onClick={() => controller.answerAsking(true)}>
                Discard changes
              </button>
              <button type="button" data-testid="confirm-discard-no" autoFocus onClick={() => controller.answerAsking(false)}>
                Keep working
              </button>
            </div>
          </div>
        </div>
      )}
    </div>
  );
}
