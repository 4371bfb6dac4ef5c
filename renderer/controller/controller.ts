/**
 * The application controller: plain TypeScript between the host (files, settings, recovery,
 * window title) and the headless editor (renderer/editor). It owns the open document's file
 * work (new, open, save, export, recovery, the example on first start), the commands by id
 * (commands.ts) and the keyboard map (keymap.ts), the view (zoom and pan), the clipboard, and
 * the background work (torsion by finite elements, started a moment after the drawing settles).
 * React components subscribe to `getState()` and the editor's state, render, and call `run(id)`
 * or a named method; they hold no application logic.
 *
 * Timers and the torsion worker come in through ControllerDeps, so tests drive it with fakes.
 */
import { allSectionViews, newSectionFile, serialiseDocument, withInputsKept, type SectionDocument, type SectionFile } from '../../core/document/index.ts';
import type { CutoutRole, Part } from '../../core/document/types.ts';
import { propertiesCsv, sectionSvg } from '../../core/export/index.ts';
import { jointsCsv, jointsExport } from '../../core/export/joints.ts';
import { propertiesSheet } from '../../core/export/xlsx.ts';
import { saveXlsx } from './xlsx.ts';
import { getPartType } from '../../core/parts/index.ts';
import { sectionFromDocument } from '../../core/section/index.ts';
import { convertLength, defaultDisplaySet, plainDisplaySet, type DisplaySet, type LengthUnit } from '../../core/units/index.ts';
import { Editor } from '../editor/editor.ts';
import { outlineBox, type Vec } from '../editor/geometry.ts';
import { scaleDocumentLengths, uniquePartId } from '../editor/transforms.ts';
import type { Host, HostCommand, RecoveryCopy } from '../host/host.ts';
import { COMMANDS, isCommandId, type CommandId, type CommandTarget, type ShownView } from './commands.ts';
import { documentFromText } from './files.ts';
import { documentFromDxf, importDxf, looksLikeDxf, sectionDxf, cutParts, summariseDxf, type DxfSummary } from '../../core/dxf/index.ts';
import { CAUTION } from '../../core/member/check.ts';
import { keyAction, type KeyInput } from './keymap.ts';
import { createResultsCache, sameSection, shapeOutlineResolver, type Results } from './results.ts';
import { outlineFromPointList } from './point-list.ts';
import type { ThirdColumn } from '../../core/parts/points.ts';
import type { TorsionState } from './torsion-client.ts';
import { fitView, zoomAt, type View } from './view.ts';

export const EXAMPLE_NAME = 'footbridge-box-girder.section.json';
/** Host setting: the example has been shown once (it opens on first start only). */
export const SEEN_EXAMPLE_SETTING = 'seenExample';
export const DISPLAY_SETTING = 'displayUnits';
export const FIGURES_SETTING = 'figures';
/** The recovery copy is written this long after a committed edit: one animation frame at 60 Hz. */
export const RECOVERY_DELAY_MS = 16;
export const TORSION_DELAY_MS = 400;
/** Information notes clear themselves after this long; errors stay until dismissed. */
export const NOTE_LIFETIME_MS = 6000;

export const DISPLAY_CHOICES: readonly { id: string; label: string; set: (doc: LengthUnit) => DisplaySet }[] = [
  { id: 'document', label: 'document unit (scaled)', set: (u) => defaultDisplaySet(u) },
  { id: 'in', label: 'in, in², in³, in⁴', set: () => plainDisplaySet('in') },
  { id: 'mm-scaled', label: 'mm, 10³ mm³, 10⁶ mm⁴', set: () => defaultDisplaySet('mm') },
  { id: 'mm', label: 'mm, mm², mm³, mm⁴', set: () => plainDisplaySet('mm') },
  { id: 'cm', label: 'cm, cm², cm³, cm⁴', set: () => plainDisplaySet('cm') },
  { id: 'm', label: 'm, m², m³, m⁴', set: () => plainDisplaySet('m') },
];
export const FIGURE_CHOICES: readonly number[] = [3, 4, 5, 6];

/** What the canvas draws on top of the parts (View menu). */
export interface Overlays {
  readonly centroid: boolean;
  readonly axes: boolean;
  readonly principal: boolean;
  readonly pna: boolean;
  readonly fibres: boolean;
  readonly dimensions: boolean;
  /** Colour map of the normal stress, extremes and neutral axis (needs forces in the stress panel). */
  readonly stress: boolean;
  readonly kern: boolean;
}

export interface Banner {
  readonly kind: 'error' | 'info';
  readonly title: string;
  readonly lines: readonly string[];
}

export interface AppState {
  readonly banner: Banner | null;
  /** Text of unsaved work from an earlier session, offered until answered. */
  /** The recovery copy on offer now (others left behind wait their turn). */
  readonly recovery: RecoveryCopy | null;
  readonly shown: ShownView | null;
  readonly view: View;
  readonly size: { readonly width: number; readonly height: number };
  readonly overlays: Overlays;
  readonly displayId: string;
  readonly sig: number;
  readonly torsion: TorsionState;
  /** The document name waiting for a discard answer (the in-page dialog), or null. */
  readonly asking: string | null;
  /** Parts on the clipboard (Copy, Cut), or 0. */
  readonly clipboardParts: number;
  /** The host's recent files (File menu), newest first; read again when the menu opens. */
  readonly recent: readonly { readonly name: string; readonly handle: string }[];
  /** A DXF drawing waiting for the user's choices (unit, layers, parts) before it is imported, or null. */
  readonly dxf: DxfPrompt | null;
  /**
   * A file that was refused while another document stayed open: the results on screen are that
   * document's, not the refused file's, and the views say so until the open document changes.
   */
  readonly refused: { readonly file: string; readonly shown: string } | null;
  /** The coordinates dialog (a point list pasted or typed for a new outline), or null. */
  readonly points: PointsPrompt | null;
}

/** What the coordinates dialog holds: the list as text, what a third column means, and why the last try failed. */
export interface PointsPrompt {
  readonly text: string;
  /** 'auto': from the header ("bulge", "radius"), else a third column is refused. */
  readonly third: 'auto' | ThirdColumn;
  readonly errors: readonly string[];
}

/** What the DXF import dialog shows and the user chooses; the open document is untouched until Import. */
export interface DxfPrompt {
  readonly name: string;
  readonly text: string;
  readonly summary: DxfSummary;
  /** The drawing's unit: the file's ($INSUNITS) when it has one, else the user's choice. */
  readonly unit: LengthUnit;
  readonly layers: readonly string[];
  readonly grouping: 'parts' | 'one';
  /** What holes inside outlines are: voids (missing along the member) or fastener holes (net section only). */
  readonly holes: CutoutRole;
  /** Why the last Import failed (entity, handle, layer, what is wrong), if it did. */
  readonly errors: readonly string[];
}

/** One timer source (window's in the app; fake ones in tests). */
export interface Timers {
  set(fn: () => void, ms: number): unknown;
  clear(handle: unknown): void;
}

/** The torsion solver in the background: one solve at a time, a newer one cancels the older. */
export interface TorsionRunner {
  solve(doc: SectionDocument): void;
  cancel(): void;
}

export interface ControllerDeps {
  readonly host: Host;
  /** The example document's text (assets/examples). */
  readonly exampleText: string;
  /** Makes the torsion runner, given where to report its state. */
  readonly torsion: (onState: (s: TorsionState) => void) => TorsionRunner;
  readonly timers?: Timers;
  /**
   * false: the example file gets no automatic torsion while it is open as the example (browser
   * tests, `?example-torsion=off`, spare the CPU its solve takes); every other document gets it.
   */
  readonly exampleTorsion?: boolean;
}

const isLengthParam = (shape: string, key: string): boolean => {
  const spec = getPartType(shape)?.params.find((p) => p.key === key);
  return spec === undefined || spec.quantity === undefined || spec.quantity === 'length';
};

const errorText = (err: unknown): string => (err instanceof Error ? err.message : String(err));

export class AppController implements CommandTarget {
  readonly editor: Editor;
  private readonly host: Host;
  private readonly timers: Timers;
  private readonly exampleText: string;
  private readonly torsionRunner: TorsionRunner;
  private readonly compute = createResultsCache();
  private readonly listeners = new Set<() => void>();
  private state: AppState;
  private pendingFit = true;
  /** The example was loaded and waits to be seen (marked seen once the canvas has shown it). */
  private exampleWaiting = false;
  private readonly exampleTorsion: boolean;
  /** The open-file record the example was loaded with (the editor keeps it until New, Open or Save). */
  private exampleOpenFile: { name: string; handle: null } | null = null;
  private clipboard: readonly Part[] = [];
  private pasteCount = 0;
  private lastDoc: SectionDocument | null = null;
  private lastGesture = false;
  private lastTitle = '';
  private wasDirty = false;
  private torsionTimer: unknown = null;
  private recoveryTimer: unknown = null;
  /** Copies left by earlier windows, after the one on offer. */
  private recoveryQueue: RecoveryCopy[] = [];
  private noteTimer: unknown = null;
  private answerDiscard: ((yes: boolean) => void) | null = null;
  private unsubscribeEditor: (() => void) | null = null;
  private unsubscribeHost: (() => void) | null = null;
  private started = false;
  /** The document that was open when a file was refused (the refusal note lasts while it is). */
  private refusedOver: SectionDocument | null = null;

  constructor(deps: ControllerDeps) {
    this.host = deps.host;
    this.exampleText = deps.exampleText;
    this.exampleTorsion = deps.exampleTorsion ?? true;
    this.timers = deps.timers ?? { set: (fn, ms) => globalThis.setTimeout(fn, ms), clear: (h) => globalThis.clearTimeout(h as ReturnType<typeof setTimeout>) };
    const holder: { ed: Editor | null } = { ed: null };
    const resolver = shapeOutlineResolver(() => holder.ed?.getState().doc.unit ?? 'mm');
    this.editor = holder.ed = new Editor(newSectionFile('mm'), { resolveShape: resolver });
    this.state = {
      banner: null,
      recovery: null,
      shown: null,
      view: { scale: 0.5, ox: 400, oy: 300 },
      size: { width: 0, height: 0 },
      overlays: { centroid: true, axes: true, principal: true, pna: false, fibres: false, dimensions: true, stress: false, kern: false },
      displayId: 'document',
      sig: 4,
      torsion: { kind: 'idle' },
      asking: null,
      clipboardParts: 0,
      recent: [],
      dxf: null,
      refused: null,
      points: null,
    };
    this.torsionRunner = deps.torsion((torsion) => this.set({ torsion }));
    this.attach();
  }

  /** Listen to the editor and the host's menu commands (again, after dispose: React may remount). */
  private attach(): void {
    this.unsubscribeEditor ??= this.editor.subscribe(() => this.editorChanged());
    this.unsubscribeHost ??= this.host.onCommand?.((c) => void this.runHostCommand(c)) ?? null;
    this.editorChanged();
  }

  // ---- subscription -------------------------------------------------------------------------

  subscribe = (fn: () => void): (() => void) => {
    this.listeners.add(fn);
    return () => this.listeners.delete(fn);
  };

  getState = (): AppState => this.state;

  private set(patch: Partial<AppState>): void {
    this.state = { ...this.state, ...patch };
    for (const fn of this.listeners) fn();
  }

  /** Stop timers, the worker and subscriptions (the page is going away, or a test ends). */
  dispose(): void {
    for (const t of [this.torsionTimer, this.recoveryTimer, this.noteTimer]) if (t !== null) this.timers.clear(t);
    this.torsionTimer = this.recoveryTimer = this.noteTimer = null;
    this.torsionRunner.cancel();
    this.unsubscribeEditor?.();
    this.unsubscribeHost?.();
    this.unsubscribeEditor = this.unsubscribeHost = null;
  }

  // ---- derived results ----------------------------------------------------------------------

  /** The active section's properties and diagnostics (memoised by document). */
  results(doc: SectionDocument = this.editor.getState().doc): Results {
    return this.compute(doc);
  }

  /** The display set chosen under "Show results in", for the document's unit. */
  display(): DisplaySet {
    const choice = DISPLAY_CHOICES.find((d) => d.id === this.state.displayId) ?? (DISPLAY_CHOICES[0] as (typeof DISPLAY_CHOICES)[number]);
    return choice.set(this.editor.getState().doc.unit);
  }

  /** Every section of the file as { name, doc }, the active one as the editor's own view. */
  sectionViews(): { name: string; doc: SectionDocument }[] {
    const st = this.editor.getState();
    return allSectionViews(st.sectionFile).map((v, i) => (st.sectionFile.sections[i]?.id === st.activeSection ? { name: v.name, doc: st.doc } : v));
  }

  /** The file's display name (file name once saved or opened, else the document's name). */
  documentName(): string {
    const st = this.editor.getState();
    return st.file?.name ?? st.sectionFile.name;
  }

  // ---- reacting to edits --------------------------------------------------------------------

  private editorChanged(): void {
    const st = this.editor.getState();
    const title = `${st.dirty ? '• ' : ''}${this.documentName()} — Sectionsmith`;
    if (title !== this.lastTitle) {
      this.lastTitle = title;
      this.host.setTitle(title);
      this.host.setUnsaved?.(st.dirty);
    }
    if (this.state.refused !== null && st.doc !== this.refusedOver) {
      this.refusedOver = null;
      this.set({ refused: null });
    }
    if (st.doc !== this.lastDoc && st.gesture === this.lastGesture && this.lastDoc !== null && sameSection(this.lastDoc, st.doc)) {
      // Only a member or stress input changed: the section, its properties and its torsion stand.
      this.lastDoc = st.doc;
      const t = this.state.torsion;
      if (t.kind === 'done') this.set({ torsion: { ...t, doc: st.doc } });
      else if (t.kind === 'running' || this.torsionTimer !== null) this.scheduleTorsion();
      this.scheduleRecovery();
    } else if (st.doc !== this.lastDoc || st.gesture !== this.lastGesture) {
      const docChanged = st.doc !== this.lastDoc;
      this.lastDoc = st.doc;
      this.lastGesture = st.gesture;
      const p = this.results(st.doc).properties;
      // The section centroid is a snap target.
      this.editor.setCentroid(p ? [p.cx, p.cy] : null);
      this.scheduleTorsion();
      if (docChanged) this.scheduleRecovery();
    } else this.scheduleRecovery();
  }

  /**
   * Torsion a moment after the drawing settles: any newer edit cancels a running solve, since
   * its answer would describe an older section. Nothing runs on a section without properties.
   */
  private scheduleTorsion(): void {
    if (this.torsionTimer !== null) this.timers.clear(this.torsionTimer);
    this.torsionTimer = null;
    this.torsionRunner.cancel();
    const st = this.editor.getState();
    if (st.gesture || !this.results(st.doc).properties) return;
    if (!this.exampleTorsion && st.file !== null && st.file === this.exampleOpenFile) return;
    const doc = st.doc;
    this.torsionTimer = this.timers.set(() => {
      this.torsionTimer = null;
      this.torsionRunner.solve(doc);
    }, TORSION_DELAY_MS);
  }

  /**
   * The user's Cancel: stops the solve now running (the worker is terminated) or about to start;
   * the state says 'cancelled' until the next edit or solveTorsionNow. A finished result stays.
   */
  cancelTorsion(): void {
    if (this.torsionTimer !== null) this.timers.clear(this.torsionTimer);
    this.torsionTimer = null;
    const kind = this.state.torsion.kind;
    if (kind !== 'running' && kind !== 'idle') return;
    this.torsionRunner.cancel();
    this.set({ torsion: { kind: 'cancelled' } });
  }

  /** Solves the section now, without the settling delay (after a cancel). */
  solveTorsionNow(): void {
    if (this.torsionTimer !== null) this.timers.clear(this.torsionTimer);
    this.torsionTimer = null;
    const st = this.editor.getState();
    if (st.gesture || !this.results(st.doc).properties) return;
    this.torsionRunner.solve(st.doc);
  }

  /**
   * This window's recovery copy is written one frame after each committed edit (not during a
   * drag: the gesture's end commits it), and flushed at once when the page is hidden or goes away
   * (flushRecovery). It is cleared when the work becomes clean again (saved, or undone back to the
   * saved state). Copies left by earlier windows are separate (host.readRecovery), so writing goes
   * on while they are on offer and never touches them.
   */
  private scheduleRecovery(): void {
    const st = this.editor.getState();
    if (st.gesture || (!st.dirty && !this.wasDirty)) return;
    // A pending write reads the state when it runs, so it is not restarted by a newer edit.
    this.recoveryTimer ??= this.timers.set(() => {
      this.recoveryTimer = null;
      this.writeRecoveryNow();
    }, RECOVERY_DELAY_MS);
  }

  private writeRecoveryNow(): Promise<void> {
    const now = this.editor.getState();
    this.wasDirty = now.dirty;
    return this.host.writeRecovery(now.dirty ? serialiseDocument(now.sectionFile) : null).catch((err: unknown) => this.error('Unsaved work could not be kept for recovery.', [errorText(err)]));
  }

  /** Write a pending recovery copy now (the page is being hidden or unloaded). */
  flushRecovery(): void {
    if (this.recoveryTimer === null) return;
    this.timers.clear(this.recoveryTimer);
    this.recoveryTimer = null;
    void this.writeRecoveryNow();
  }

  // ---- notes --------------------------------------------------------------------------------

  /** An information note: it clears itself after NOTE_LIFETIME_MS. */
  note(title: string, lines: readonly string[] = []): void {
    this.showBanner({ kind: 'info', title, lines });
  }

  /** An error: it stays until dismissed or replaced. */
  error(title: string, lines: readonly string[] = []): void {
    this.showBanner({ kind: 'error', title, lines });
  }

  private showBanner(banner: Banner | null): void {
    if (this.noteTimer !== null) this.timers.clear(this.noteTimer);
    this.noteTimer = null;
    if (banner?.kind === 'info') {
      this.noteTimer = this.timers.set(() => {
        this.noteTimer = null;
        if (this.state.banner === banner) this.set({ banner: null });
      }, NOTE_LIFETIME_MS);
    }
    this.set({ banner });
  }

  dismissBanner(): void {
    this.showBanner(null);
  }

  // ---- start-up -----------------------------------------------------------------------------

  /**
   * First start: open the file the host was given, else the example (once: it is marked seen only
   * after it has shown, so a reload during start-up shows it again); offer recovery if a previous
   * session ended without saving. Host commands (menu items) are listened to from here on.
   */
  async start(): Promise<void> {
    this.attach();
    if (this.started) return; // a second mount of the same controller: start-up is done once
    this.started = true;
    const [launched, left, seen, displayId, figures] = await Promise.all([
      this.host.launchFile?.() ?? Promise.resolve(null),
      this.host.readRecovery(),
      this.readSetting(SEEN_EXAMPLE_SETTING),
      this.readSetting(DISPLAY_SETTING),
      this.readSetting(FIGURES_SETTING),
    ]);
    if (displayId !== null && DISPLAY_CHOICES.some((d) => d.id === displayId)) this.set({ displayId });
    if (figures !== null && FIGURE_CHOICES.includes(Number(figures))) this.set({ sig: Number(figures) });
    if (launched) this.openText(launched.text, launched.name, launched.handle);
    else if (seen === null) {
      const ex = this.exampleFile();
      if (ex) {
        this.loadDoc(ex, (this.exampleOpenFile = { name: EXAMPLE_NAME, handle: null }));
        this.exampleWaiting = true;
        this.markExampleSeenIfShown();
      }
    }
    this.recoveryQueue = [...left];
    this.set({ recovery: this.recoveryQueue.shift() ?? null });
  }

  private async readSetting(key: string): Promise<string | null> {
    try {
      return (await this.host.readSetting?.(key)) ?? null;
    } catch {
      return null; // an unreadable setting is the default, not a reason to refuse to start
    }
  }

  private writeSetting(key: string, value: string | null): void {
    this.host.writeSetting?.(key, value).catch((err: unknown) => this.error('A setting could not be kept.', [errorText(err)]));
  }

  private markExampleSeenIfShown(): void {
    if (!this.exampleWaiting || this.pendingFit) return;
    this.exampleWaiting = false;
    this.writeSetting(SEEN_EXAMPLE_SETTING, '1');
  }

  private exampleFile(): SectionFile | null {
    const r = documentFromText(this.exampleText, EXAMPLE_NAME, 'mm');
    return r.ok ? r.file : null;
  }

  // ---- documents ----------------------------------------------------------------------------

  private loadDoc(doc: SectionDocument | SectionFile, file: { name: string; handle: string | null } | null, dirty = false): void {
    this.editor.load(doc, file, dirty);
    this.clipboardReset();
    this.pendingFit = true;
    this.fitIfReady();
  }

  private clipboardReset(): void {
    this.pasteCount = 0;
  }

  /** Ask before discarding unsaved changes (true = go ahead). */
  async confirmDiscard(): Promise<boolean> {
    const st = this.editor.getState();
    if (!st.dirty) return true;
    return this.host.confirmDiscard(st.file?.name ?? st.doc.name);
  }

  /** The in-page discard dialog (installed by the shell for the browser host). */
  askDiscard(name: string): Promise<boolean> {
    this.answerDiscard?.(false);
    return new Promise<boolean>((resolve) => {
      this.answerDiscard = resolve;
      this.set({ asking: name });
    });
  }

  answerAsking(yes: boolean): void {
    const answer = this.answerDiscard;
    this.answerDiscard = null;
    this.set({ asking: null });
    answer?.(yes);
  }

  /**
   * A DXF drawing: read its unit and layers, and ask (the shell's DXF dialog) which layers, which
   * unit when the file has none, and one part per loop or loops united; nothing changes until Import.
   */
  openDxf(text: string, name: string): boolean {
    const s = summariseDxf(text);
    if (!s.ok) {
      this.error(`Could not open ${name}. The current document is unchanged.`, [s.message]);
      this.markRefused(name);
      return false;
    }
    const unit = s.summary.unit ?? this.editor.getState().doc.unit;
    this.set({ dxf: { name, text, summary: s.summary, unit, layers: s.summary.layers.map((l) => l.name), grouping: 'parts', holes: 'void', errors: [] } });
    return true;
  }

  /** The user changed a choice in the DXF dialog. */
  chooseDxf(patch: Partial<Pick<DxfPrompt, 'unit' | 'layers' | 'grouping' | 'holes'>>): void {
    const d = this.state.dxf;
    if (d) this.set({ dxf: { ...d, ...patch, errors: [] } });
  }

  cancelDxf(): void {
    this.set({ dxf: null });
  }

  /** Import the drawing with the choices made; errors stay in the dialog and the document is unchanged. */
  importChosenDxf(): boolean {
    const d = this.state.dxf;
    if (!d) return false;
    if (d.layers.length === 0) {
      this.set({ dxf: { ...d, errors: ['Choose at least one layer.'] } });
      return false;
    }
    const all = d.layers.length === d.summary.layers.length;
    const r = importDxf(d.text, { unit: d.unit, grouping: d.grouping, ...(all ? {} : { layers: d.layers }) });
    if (!r.ok) {
      this.set({ dxf: { ...d, errors: r.errors.map((e) => e.message) } });
      return false;
    }
    const made = documentFromDxf(r.value, d.name.replace(/\.dxf$/i, '') || 'Imported drawing', d.grouping, d.holes);
    this.set({ dxf: null });
    this.loadDoc(made.file, { name: d.name, handle: null });
    this.note(`Imported ${d.name}: ${made.file.sections[0]?.parts.length ?? 0} part(s), unit ${r.value.unit}`, [...r.value.notes, ...made.notes]);
    return true;
  }

  /** Open text as a document; bad text leaves the current document as it was and says why. */
  openText(text: string, name: string, handle: string | null): boolean {
    if (/\.dxf$/i.test(name) || looksLikeDxf(text)) return this.openDxf(text, name);
    const r = documentFromText(text, name, this.editor.getState().doc.unit);
    if (!r.ok) {
      this.error(`Could not open ${name}. The current document is unchanged.`, r.errors);
      this.markRefused(name);
      return false;
    }
    this.loadDoc(r.file, { name, handle: r.note?.startsWith('GeoJSON') ? null : handle });
    if (r.note) this.note(`Opened ${name}`, [r.note]);
    else this.showBanner(null);
    return true;
  }

  /** The results on screen stay the open document's: say so, naming the refused file. */
  private markRefused(file: string): void {
    this.refusedOver = this.editor.getState().doc;
    this.set({ refused: { file, shown: this.documentName() } });
  }

  /** A file dropped or chosen in the page (no handle: saving it is a Save As). */
  async openGiven(text: string, name: string): Promise<void> {
    if (await this.confirmDiscard()) this.openText(text, name, null);
  }

  async newDocument(): Promise<void> {
    if (await this.confirmDiscard()) this.loadDoc(newSectionFile(this.editor.getState().doc.unit), null);
  }

  async openWithPicker(): Promise<void> {
    if (!(await this.confirmDiscard())) return;
    try {
      const f = await this.host.open();
      if (f) this.openText(f.text, f.name, f.handle);
    } catch (err) {
      this.error('Could not open the file. The current document is unchanged.', [errorText(err)]);
    }
  }

  /** Read the host's recent-files list into the state (the File menu shows it). */
  async refreshRecent(): Promise<void> {
    try {
      this.set({ recent: await this.host.recentFiles() });
    } catch {
      this.set({ recent: [] }); // the list is a convenience: without it the menu simply has none
    }
  }

  /** An entry of the host's recent-files list. */
  async openRecent(handle: string, name: string): Promise<void> {
    if (!this.host.openRecent || !(await this.confirmDiscard())) return;
    try {
      const f = await this.host.openRecent(handle);
      if (f) this.openText(f.text, f.name, f.handle);
      else this.error(`${name} is no longer available. The current document is unchanged.`);
    } catch (err) {
      this.error(`Could not open ${name}. The current document is unchanged.`, [errorText(err)]);
    }
  }

  async openExample(): Promise<void> {
    if (!(await this.confirmDiscard())) return;
    const ex = this.exampleFile();
    if (ex) this.loadDoc(ex, (this.exampleOpenFile = { name: EXAMPLE_NAME, handle: null }));
  }

  async openLaunchFile(): Promise<void> {
    const f = await this.host.launchFile?.();
    if (f && (await this.confirmDiscard())) this.openText(f.text, f.name, f.handle);
  }

  async save(as: boolean): Promise<void> {
    const st = this.editor.getState();
    const text = serialiseDocument(st.sectionFile);
    try {
      const suggested = st.file?.name ?? `${st.sectionFile.name.replace(/[^\w.-]+/g, '-') || 'section'}.section.json`;
      const r = !as && st.file?.handle ? await this.host.save(st.file.handle, text) : await this.host.saveAs(suggested, text);
      if (!r) return;
      this.editor.markSaved({ name: r.name, handle: r.handle });
      await this.host.writeRecovery(null);
      this.wasDirty = false;
      this.note(`Saved ${r.name}`);
    } catch (err) {
      this.error('The document was not saved.', [errorText(err)]);
    }
  }

  /** The section as a DXF drawing: outline, each part laid flat for cutting, centroid, axes and a property table with the caution. */
  async exportDxf(): Promise<void> {
    const st = this.editor.getState();
    const section = sectionFromDocument(st.doc);
    if (!section.properties) {
      this.error('Nothing was exported: the section has no valid properties.', section.diagnostics.map((d) => d.message));
      return;
    }
    const base = (st.file?.name ?? st.doc.name).replace(/\.(section\.json|geojson|json|dxf)$/i, '').replace(/[^\w.-]+/g, '-') || 'section';
    const text = sectionDxf({ name: st.doc.name, unit: st.doc.unit, region: section.region, properties: section.properties, parts: cutParts(st.doc), centroid: true, axes: true, table: true, caution: CAUTION });
    const file = { suggestedName: `${base}.dxf`, mimeType: 'application/dxf', text };
    try {
      if (await this.host.exportFile(file)) this.note(`Exported ${file.suggestedName}`, ['Layers: SECTION (outline), PART-… (each part laid flat, for cutting), CENTROID, PRINCIPAL-AXES, PROPERTIES (with the caution).']);
    } catch (err) {
      this.error(`Export of ${file.suggestedName} failed.`, [errorText(err)]);
    }
  }

  async exportAs(kind: 'svg' | 'csv' | 'xlsx'): Promise<void> {
    const st = this.editor.getState();
    const section = sectionFromDocument(st.doc);
    if (!section.properties) {
      this.error('Nothing was exported: the section has no valid properties.', section.diagnostics.map((d) => d.message));
      return;
    }
    const base = (st.file?.name ?? st.doc.name).replace(/\.(section\.json|geojson|json)$/i, '').replace(/[^\w.-]+/g, '-') || 'section';
    const torsion = this.state.torsion;
    // Joints, separate pieces and overlaps go into both exports (core/export/joints.ts).
    const joints = jointsExport({ doc: st.doc });
    const csvInput = { name: st.doc.name, unit: st.doc.unit, properties: section.properties, torsion: torsion.kind === 'done' && torsion.doc === st.doc ? torsion.result : null };
    if (kind === 'xlsx') {
      const name = `${base}.xlsx`;
      try {
        if (await saveXlsx(this.host, propertiesSheet(csvInput), name)) this.note(`Exported ${name}`);
      } catch (err) {
        this.error(`Export of ${name} failed.`, [errorText(err)]);
      }
      return;
    }
    const file =
      kind === 'svg'
        ? { suggestedName: `${base}.svg`, mimeType: 'image/svg+xml', text: sectionSvg({ name: st.doc.name, unit: st.doc.unit, section, display: this.display(), joints }) }
        : {
            suggestedName: `${base}.csv`,
            mimeType: 'text/csv',
            text: propertiesCsv(csvInput) + (joints ? jointsCsv(joints) : ''),
          };
    try {
      if (await this.host.exportFile(file)) this.note(`Exported ${file.suggestedName}`);
    } catch (err) {
      this.error(`Export of ${file.suggestedName} failed.`, [errorText(err)]);
    }
  }

  // ---- recovery offer -----------------------------------------------------------------------

  /**
   * Restore the copy on offer into this window. Unsaved work here is not replaced without asking;
   * the copy leaves the host only after this window's own copy holds it.
   */
  async restoreRecovery(): Promise<void> {
    const copy = this.state.recovery;
    if (copy === null) return;
    const r = documentFromText(copy.text, 'recovered work', this.editor.getState().doc.unit);
    if (!r.ok) {
      this.error('The recovered work could not be read.', r.errors);
      return;
    }
    if (!(await this.confirmDiscard()) || this.state.recovery !== copy) return;
    this.loadDoc(r.file, null, true);
    if (this.recoveryTimer !== null) this.timers.clear(this.recoveryTimer);
    this.recoveryTimer = null;
    await this.writeRecoveryNow();
    this.nextRecoveryOffer();
    await this.host.discardRecovery(copy.id).catch((err: unknown) => this.error('The restored copy could not be removed from recovery.', [errorText(err)]));
  }

  discardRecovery(): void {
    const copy = this.state.recovery;
    if (copy === null) return;
    this.nextRecoveryOffer();
    this.host.discardRecovery(copy.id).catch((err: unknown) => this.error('The recovery copy could not be removed.', [errorText(err)]));
  }

  private nextRecoveryOffer(): void {
    this.set({ recovery: this.recoveryQueue.shift() ?? null });
  }

  // ---- commands -----------------------------------------------------------------------------

  /** Run a command by id (menus, buttons, keys). */
  async run(id: CommandId): Promise<void> {
    await COMMANDS[id].run(this);
  }

  /** A host menu item; ids the editor does not know are refused with a message, never ignored silently. */
  async runHostCommand(id: HostCommand | string): Promise<void> {
    if (isCommandId(id)) await this.run(id);
    else this.error(`The menu sent a command this editor does not know: ${id}.`);
  }

  /** A key press: returns true when it was ours (the caller then prevents the browser's default). */
  keyDown(k: KeyInput): boolean {
    const action = keyAction(k);
    if (!action) return false;
    if (action.kind === 'tool-key') return this.editor.key(action.key) || true;
    if (action.id.startsWith('nudge-') && this.editor.getState().selection.length === 0) return false;
    // Ctrl+V with the outline tool, or with no parts copied, is the browser's own paste: its text
    // (a point list from a spreadsheet) arrives through pasteText.
    if (action.id === 'paste' && (this.editor.getState().toolId === 'polygon' || this.clipboard.length === 0)) return false;
    void this.run(action.id);
    return true;
  }

  show(view: ShownView | null): void {
    this.set({ shown: view });
  }

  // ---- view ---------------------------------------------------------------------------------

  setSize(width: number, height: number): void {
    if (width === this.state.size.width && height === this.state.size.height) return;
    this.set({ size: { width, height } });
    this.fitIfReady();
  }

  setView(view: View): void {
    this.set({ view });
  }

  private fitIfReady(): void {
    if (!this.pendingFit || this.state.size.width <= 100) return;
    this.pendingFit = false;
    this.fit();
    this.markExampleSeenIfShown();
  }

  fit(): void {
    const { width, height } = this.state.size;
    this.set({ view: fitView(outlineBox(this.editor.outlines()), width, height, 70) });
  }

  zoomBy(factor: number): void {
    const { width, height } = this.state.size;
    this.set({ view: zoomAt(this.state.view, factor, [width / 2, height / 2]) });
  }

  setOverlays(overlays: Overlays): void {
    this.set({ overlays });
  }

  setDisplay(displayId: string): void {
    if (!DISPLAY_CHOICES.some((d) => d.id === displayId)) return;
    this.set({ displayId });
    this.writeSetting(DISPLAY_SETTING, displayId);
  }

  setFigures(sig: number): void {
    if (!FIGURE_CHOICES.includes(sig)) return;
    this.set({ sig });
    this.writeSetting(FIGURES_SETTING, String(sig));
  }

  /** Change the document unit: every length is converted exactly, so the section keeps its size. */
  changeUnit(unit: LengthUnit): void {
    const from = this.editor.getState().doc.unit;
    if (unit === from) return;
    // Member and stress inputs are physical quantities (SI): they stay as they are; a section still
    // on the default member case gets it written in first, so its span does not change either.
    this.editor.replaceAllSections(`Document unit ${from} → ${unit}`, (doc) => ({ ...scaleDocumentLengths(withInputsKept(doc), (v) => convertLength(v, from, unit), isLengthParam), unit }));
    this.set({ view: { ...this.state.view, scale: this.state.view.scale / convertLength(1, from, unit) } });
  }

  // ---- clipboard and copies -----------------------------------------------------------------

  /** The offset of a copy from its original: one grid step right and one down. */
  private copyOffset(): Vec {
    const step = this.editor.getState().snap.grid;
    return [step, -step];
  }

  copy(): void {
    const st = this.editor.getState();
    const parts = st.doc.parts.filter((p) => st.selection.includes(p.id));
    if (parts.length === 0) return;
    this.clipboard = parts;
    this.pasteCount = 0;
    this.set({ clipboardParts: parts.length });
  }

  cut(): void {
    if (this.editor.getState().selection.length === 0) return;
    this.copy();
    this.pasteCount = -1; // the first paste goes back where the parts were
    this.editor.run('Cut', (doc, sel) => ({ doc: { ...doc, parts: doc.parts.filter((p) => !sel.includes(p.id)) }, selection: [] }));
  }

  /**
   * Text pasted on the drawing (not into a field): with the outline tool, or when it reads as a
   * point list, it becomes an outline at once; a list with errors opens the coordinates dialog
   * with the text and what is wrong, so nothing typed is lost. True when the text was taken.
   */
  pasteText(text: string): boolean {
    if (text.trim() === '') return false;
    const outlineTool = this.editor.getState().toolId === 'polygon';
    const made = outlineFromPointList(text, 'auto', this.editor.getState().doc, 'add');
    if (made.ok) {
      this.addPastedOutline(made.part, made.note);
      return true;
    }
    if (!outlineTool) return false;
    this.set({ points: { text, third: 'auto', errors: made.errors } });
    return true;
  }

  /** Opens the coordinates dialog (Edit → Paste coordinates). */
  openPoints(): void {
    this.set({ points: this.state.points ?? { text: '', third: 'auto', errors: [] } });
  }

  choosePoints(patch: Partial<Pick<PointsPrompt, 'text' | 'third'>>): void {
    const p = this.state.points;
    if (p) this.set({ points: { ...p, ...patch, errors: [] } });
  }

  cancelPoints(): void {
    this.set({ points: null });
  }

  /** Adds (or cuts) the dialog's list as an outline; errors stay in the dialog and the document is unchanged. */
  addPoints(operation: 'add' | 'subtract'): boolean {
    const p = this.state.points;
    if (!p) return false;
    const made = outlineFromPointList(p.text, p.third, this.editor.getState().doc, operation);
    if (!made.ok) {
      this.set({ points: { ...p, errors: made.errors } });
      return false;
    }
    this.set({ points: null });
    this.addPastedOutline(made.part, made.note);
    return true;
  }

  private addPastedOutline(part: Part, note: string): void {
    this.editor.addPart(part.operation === 'subtract' ? 'Cut pasted outline' : 'Paste outline', (_doc, id) => ({ ...part, id }));
    this.note(note);
  }

  /** Paste the clipboard's parts: each paste one offset further, selected, as one undo step. */
  paste(): void {
    if (this.clipboard.length === 0) return;
    this.pasteCount++;
    const [ox, oy] = this.copyOffset();
    const dx = ox * this.pasteCount;
    const dy = oy * this.pasteCount;
    const parts = this.clipboard;
    this.editor.run(parts.length === 1 ? 'Paste part' : 'Paste parts', (doc) => {
      let out = doc;
      const ids: string[] = [];
      for (const p of parts) {
        const id = uniquePartId(out);
        ids.push(id);
        out = { ...out, parts: [...out.parts, { ...p, id, placement: { ...p.placement, x: p.placement.x + dx, y: p.placement.y + dy } }] };
      }
      return { doc: out, selection: ids };
    });
  }

  /** Duplicate the selection one offset away (a copy exactly on top would add nothing). */
  duplicate(): void {
    const [dx, dy] = this.copyOffset();
    this.editor.duplicateSelection(dx, dy);
  }

  nudge(dx: number, dy: number): void {
    this.editor.moveSelectionBy(dx, dy);
  }
}
