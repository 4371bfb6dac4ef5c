/** Fakes for the app controller's tests: a host in memory, timers driven by hand, a torsion runner that records. */
import { readFileSync } from 'node:fs';
import { resolve } from 'node:path';
import type { SectionDocument } from '../../core/document/types.ts';
import { AppController, type Timers, type TorsionRunner } from '../../renderer/controller/controller.ts';
import type { TorsionState } from '../../renderer/controller/torsion-client.ts';
import type { ExportBytes, ExportFile, Host, HostCommand, OpenedFile, RecoveryCopy, SaveResult } from '../../renderer/host/host.ts';

export const EXAMPLE_TEXT = readFileSync(resolve(__dirname, '../../assets/examples/footbridge-box-girder.section.json'), 'utf8');

/** Timers that run only when the test advances the clock. */
export class ManualTimers implements Timers {
  private now = 0;
  private next = 1;
  private readonly due = new Map<number, { at: number; fn: () => void }>();
  set(fn: () => void, ms: number): unknown {
    const id = this.next++;
    this.due.set(id, { at: this.now + ms, fn });
    return id;
  }
  clear(handle: unknown): void {
    this.due.delete(handle as number);
  }
  get pending(): number {
    return this.due.size;
  }
  advance(ms: number): void {
    const until = this.now + ms;
    for (;;) {
      const first = [...this.due.entries()].filter(([, t]) => t.at <= until).sort((a, b) => a[1].at - b[1].at)[0];
      if (!first) break;
      this.due.delete(first[0]);
      this.now = first[1].at;
      first[1].fn();
    }
    this.now = until;
  }
}

export class RecordingTorsion implements TorsionRunner {
  readonly solved: SectionDocument[] = [];
  cancels = 0;
  constructor(readonly report: (s: TorsionState) => void) {}
  solve(doc: SectionDocument): void {
    this.solved.push(doc);
  }
  cancel(): void {
    this.cancels++;
  }
}

export interface FakeHost extends Host {
  readonly settings: Map<string, string>;
  /** This window's own recovery copy. */
  recovery: string | null;
  readonly recoveryWrites: (string | null)[];
  /** Copies left by earlier windows (what readRecovery offers), and the IDs discarded so far. */
  left: RecoveryCopy[];
  readonly discarded: string[];
  /** When set, writeRecovery fails with this message (a full storage quota). */
  recoveryFailure: string | null;
  readonly exported: ExportFile[];
  /** Files of bytes (XLSX) given to exportBytes. */
  readonly exportedBytes: ExportBytes[];
  readonly saved: { handle: string | null; suggested: string | null; text: string }[];
  readonly titles: string[];
  nextOpen: OpenedFile | null;
  launch: OpenedFile | null;
  discardAnswer: boolean;
  discardAsked: string[];
  saveAsResult: SaveResult | null;
  recent: Map<string, OpenedFile>;
  send(c: HostCommand | string): void;
}

export function fakeHost(): FakeHost {
  let listener: ((c: HostCommand) => void) | null = null;
  const host: FakeHost = {
    kind: 'browser',
    settings: new Map(),
    recovery: null,
    recoveryWrites: [],
    left: [],
    discarded: [],
    recoveryFailure: null,
    exported: [],
    exportedBytes: [],
    saved: [],
    titles: [],
    nextOpen: null,
    launch: null,
    discardAnswer: true,
    discardAsked: [],
    saveAsResult: { name: 'saved.section.json', handle: 'h-1' },
    recent: new Map(),
    open: async () => host.nextOpen,
    save: async (handle, text) => {
      host.saved.push({ handle, suggested: null, text });
      return { name: 'saved.section.json', handle };
    },
    saveAs: async (suggested, text) => {
      host.saved.push({ handle: null, suggested, text });
      return host.saveAsResult;
    },
    exportFile: async (file) => {
      host.exported.push(file);
      return true;
    },
    exportBytes: async (file) => {
      host.exportedBytes.push(file);
      return true;
    },
    confirmDiscard: async (name) => {
      host.discardAsked.push(name);
      return host.discardAnswer;
    },
    recentFiles: async () => [...host.recent.entries()].map(([handle, f]) => ({ name: f.name, handle })),
    openRecent: async (handle) => host.recent.get(handle) ?? null,
    writeRecovery: async (text) => {
      if (host.recoveryFailure !== null) throw new Error(host.recoveryFailure);
      host.recoveryWrites.push(text);
      host.recovery = text;
    },
    readRecovery: async () => [...host.left],
    discardRecovery: async (id) => {
      host.discarded.push(id);
      host.left = host.left.filter((c) => c.id !== id);
    },
    setTitle: (t) => void host.titles.push(t),
    launchFile: async () => {
      const f = host.launch;
      host.launch = null;
      return f;
    },
    readSetting: async (key) => host.settings.get(key) ?? null,
    writeSetting: async (key, value) => {
      if (value === null) host.settings.delete(key);
      else host.settings.set(key, value);
    },
    onCommand: (l) => {
      listener = l;
      return () => {
        listener = null;
      };
    },
    send: (c) => listener?.(c as HostCommand),
  };
  return host;
}

export interface Rig {
  readonly c: AppController;
  readonly host: FakeHost;
  readonly timers: ManualTimers;
  readonly torsion: RecordingTorsion;
}

/** A controller over fakes, with a canvas of 800 × 600 px unless `sized` is false. */
export function rig(setup: (h: FakeHost) => void = () => undefined, sized = true): Rig {
  const host = fakeHost();
  setup(host);
  const timers = new ManualTimers();
  let torsion: RecordingTorsion | null = null;
  const c = new AppController({
    host,
    exampleText: EXAMPLE_TEXT,
    timers,
    torsion: (report) => (torsion = new RecordingTorsion(report)),
  });
  if (sized) c.setSize(800, 600);
  return { c, host, timers, torsion: torsion as unknown as RecordingTorsion };
}

/** Let pending promise callbacks run. */
export const settle = async (): Promise<void> => {
  for (let i = 0; i < 5; i++) await Promise.resolve();
};
