/**
 * The Host of the browser build (renderer/host/host.ts).
 *
 * Files: where the File System Access API is present (Chromium-based browsers), open and save go
 * through showOpenFilePicker / showSaveFilePicker and the file handles are kept by an id string,
 * in memory and in IndexedDB so recent files survive a reload; Save writes back to the same file.
 * Elsewhere a hidden file input opens and a download saves (handle null: every save is a Save As).
 * Writes through a handle are committed when the writable stream closes (the browser writes a
 * swap file first), so a failed save leaves the old file as it was.
 *
 * Recovery copies, the recent-files list and settings (under SETTINGS_PREFIX) live in localStorage;
 * handles in IndexedDB. Each window (tab) keeps its own recovery copy under RECOVERY_PREFIX + its
 * window ID (kept in sessionStorage, so a reload of the tab is the same window) and holds a Web
 * Lock named after that ID for as long as it lives. readRecovery offers every other copy whose
 * window holds no lock, i.e. whose window is gone; so no window overwrites or offers another live
 * window's copy. The single key of earlier versions (RECOVERY_KEY) is offered as the copy "legacy". Tables (openTable) are read through a picker or input limited to CSV/text.
 * confirmDiscard uses window.confirm until the UI installs its own dialog (setConfirmDiscard).
 * While there are unsaved changes, leaving the page asks first (beforeunload).
 */
import { XLSX_MIME_TYPE, type ExportBytes, type ExportFile, type Host, type OpenedFile, type RecoveryCopy, type SaveResult } from './host.ts';

// The parts of the File System Access API we use (not yet in TypeScript's DOM library).
interface PickerType { readonly description: string; readonly accept: Record<string, string[]> }
interface FileHandle {
  readonly kind: 'file';
  readonly name: string;
  getFile(): Promise<File>;
  createWritable(): Promise<{ write(data: string | Uint8Array): Promise<void>; close(): Promise<void>; abort(): Promise<void> }>;
  queryPermission?(options: { mode: 'read' | 'readwrite' }): Promise<PermissionState>;
  requestPermission?(options: { mode: 'read' | 'readwrite' }): Promise<PermissionState>;
}
interface PickerWindow {
  showOpenFilePicker?(options: { types: PickerType[]; multiple: false; excludeAcceptAllOption?: boolean }): Promise<FileHandle[]>;
  showSaveFilePicker?(options: { suggestedName: string; types: PickerType[] }): Promise<FileHandle>;
}

export const RECENT_KEY = 'sectionsmith.recentFiles';
/** The one recovery key of earlier versions, offered as the copy with ID "legacy". */
export const RECOVERY_KEY = 'sectionsmith.recovery';
/** A window's copy: RECOVERY_PREFIX + window ID; when it was written: RECOVERY_TIME_PREFIX + window ID. */
export const RECOVERY_PREFIX = 'sectionsmith.recovery.';
export const RECOVERY_TIME_PREFIX = 'sectionsmith.recovery-time.';
const WINDOW_ID_KEY = 'sectionsmith.window-id';
const WINDOW_LOCK_PREFIX = 'sectionsmith-window-';
const LEGACY_ID = 'legacy';
export const SETTINGS_PREFIX = 'sectionsmith.setting.';
const RECENT_LIMIT = 10;
const HANDLE_DB = 'sectionsmith-file-handles';

const DOCUMENT_TYPES: PickerType[] = [{ description: 'Sectionsmith section or GeoJSON', accept: { 'application/json': ['.json', '.geojson'] } }, { description: 'DXF drawing', accept: { 'application/dxf': ['.dxf'] } }];
const TABLE_TYPES: PickerType[] = [{ description: 'Table of shapes (CSV)', accept: { 'text/csv': ['.csv'], 'text/plain': ['.txt'] } }];
const SAVE_TYPES: PickerType[] = [{ description: 'Sectionsmith section', accept: { 'application/json': ['.json'] } }];
const EXPORT_TYPES: Readonly<Record<string, PickerType>> = {
  'image/svg+xml': { description: 'SVG drawing', accept: { 'image/svg+xml': ['.svg'] } },
  'text/csv': { description: 'CSV table', accept: { 'text/csv': ['.csv'] } },
  'text/html': { description: 'HTML report', accept: { 'text/html': ['.html'] } },
  'application/json': { description: 'JSON', accept: { 'application/json': ['.json'] } },
  'text/plain': { description: 'Text', accept: { 'text/plain': ['.txt'] } },
  'application/dxf': { description: 'DXF drawing', accept: { 'application/dxf': ['.dxf'] } },
  [XLSX_MIME_TYPE]: { description: 'Excel workbook (XLSX)', accept: { [XLSX_MIME_TYPE]: ['.xlsx'] } },
};

export interface BrowserHost extends Host {
  /** Replace the window.confirm fallback with the UI's own dialog. */
  setConfirmDiscard(ask: (documentName: string) => Promise<boolean>): void;
}

export function createBrowserHost(win: Window & typeof globalThis = window): BrowserHost {
  const pickers = win as unknown as PickerWindow;
  const handles = new Map<string, FileHandle>();
  const store = handleStore(win);
  const windowId = ownWindowId(win);
  const windowLock = holdWindowLock(win, windowId);
  let ask = (documentName: string): Promise<boolean> =>
    Promise.resolve(win.confirm(`"${documentName || 'Untitled section'}" has unsaved changes. Discard them?`));
  let unsaved = false;
  win.addEventListener('beforeunload', (event) => {
    if (unsaved) event.preventDefault();
  });

  const remember = async (handle: FileHandle): Promise<string> => {
    const id = win.crypto.randomUUID();
    handles.set(id, handle);
    await store.put(id, handle).catch(() => undefined); // without IndexedDB, recent files last for this session
    // The browser reveals no paths, so two recent entries of the same name are taken for one file.
    writeRecent(win.localStorage, [{ name: handle.name, handle: id }, ...readRecent(win.localStorage).filter((r) => r.name !== handle.name)]);
    return id;
  };
  const handleFor = async (id: string): Promise<FileHandle | null> => handles.get(id) ?? (await store.get(id).catch(() => null));

  return {
    kind: 'browser',
    async open() {
      if (!pickers.showOpenFilePicker) return openWithInput(win);
      const chosen = await cancellable(pickers.showOpenFilePicker({ types: DOCUMENT_TYPES, multiple: false }));
      const handle = chosen?.[0];
      if (!handle) return null;
      const text = await (await handle.getFile()).text();
      return { name: handle.name, handle: await remember(handle), text };
    },
    async openTable() {
      if (!pickers.showOpenFilePicker) return openWithInput(win, '.csv,.txt,text/csv,text/plain');
      const chosen = await cancellable(pickers.showOpenFilePicker({ types: TABLE_TYPES, multiple: false }));
      const handle = chosen?.[0];
      if (!handle) return null;
      return { name: handle.name, handle: null, text: await (await handle.getFile()).text() };
    },
    readSetting: async (key) => win.localStorage.getItem(SETTINGS_PREFIX + key),
    async writeSetting(key, value) {
      try {
        if (value === null) win.localStorage.removeItem(SETTINGS_PREFIX + key);
        else win.localStorage.setItem(SETTINGS_PREFIX + key, value);
      } catch (error) {
        throw new Error(`The setting could not be kept: ${storageReason(error)}.`);
      }
    },
    async save(id, text) {
      const handle = await handleFor(id);
      if (!handle) throw new Error('This browser no longer has access to the file; use Save As to choose it again.');
      await writeThrough(handle, text);
      return { name: handle.name, handle: id };
    },
    async saveAs(suggestedName, text): Promise<SaveResult | null> {
      if (!pickers.showSaveFilePicker) {
        download(win, suggestedName, 'application/json', text);
        return { name: suggestedName, handle: null };
      }
      const handle = await cancellable(pickers.showSaveFilePicker({ suggestedName, types: SAVE_TYPES }));
      if (!handle) return null;
      await writeThrough(handle, text);
      return { name: handle.name, handle: await remember(handle) };
    },
    async exportFile(file: ExportFile) {
      if (!pickers.showSaveFilePicker) {
        download(win, file.suggestedName, file.mimeType, file.text);
        return true;
      }
      const type = EXPORT_TYPES[file.mimeType];
      const handle = await cancellable(pickers.showSaveFilePicker({ suggestedName: file.suggestedName, types: type ? [type] : [] }));
      if (!handle) return false;
      await writeThrough(handle, file.text);
      return true;
    },
    async exportBytes(file: ExportBytes) {
      if (!pickers.showSaveFilePicker) {
        download(win, file.suggestedName, file.mimeType, file.bytes);
        return true;
      }
      const type = EXPORT_TYPES[file.mimeType];
      const handle = await cancellable(pickers.showSaveFilePicker({ suggestedName: file.suggestedName, types: type ? [type] : [] }));
      if (!handle) return false;
      await writeThrough(handle, file.bytes);
      return true;
    },
    confirmDiscard: (documentName) => ask(documentName),
    setConfirmDiscard(next) {
      ask = next;
    },
    async recentFiles() {
      const recent = readRecent(win.localStorage);
      const known = await Promise.all(recent.map(async (r) => (await handleFor(r.handle)) !== null));
      return recent.filter((_, i) => known[i]);
    },
    async openRecent(id): Promise<OpenedFile | null> {
      const handle = await handleFor(id);
      if (!handle) return null;
      await ensurePermission(handle, 'read');
      return { name: handle.name, handle: id, text: await (await handle.getFile()).text() };
    },
    async writeRecovery(text) {
      try {
        if (text === null) {
          win.localStorage.removeItem(RECOVERY_PREFIX + windowId);
          win.localStorage.removeItem(RECOVERY_TIME_PREFIX + windowId);
        } else {
          win.localStorage.setItem(RECOVERY_PREFIX + windowId, text);
          win.localStorage.setItem(RECOVERY_TIME_PREFIX + windowId, String(Date.now()));
        }
      } catch (error) {
        // A copy that could not be replaced whole is removed rather than left stale.
        if (text !== null) win.localStorage.removeItem(RECOVERY_PREFIX + windowId);
        throw new Error(`Unsaved work could not be kept for recovery: ${storageReason(error)}. Save the document to keep it.`);
      }
    },
    async readRecovery(): Promise<readonly RecoveryCopy[]> {
      await windowLock;
      const live = await liveWindows(win);
      const copies: RecoveryCopy[] = [];
      const legacy = win.localStorage.getItem(RECOVERY_KEY);
      if (legacy) copies.push({ id: LEGACY_ID, text: legacy, savedAt: 0 });
      for (let i = 0; i < win.localStorage.length; i += 1) {
        const key = win.localStorage.key(i);
        if (!key?.startsWith(RECOVERY_PREFIX)) continue;
        const id = key.slice(RECOVERY_PREFIX.length);
        if (id === windowId || live.has(id)) continue;
        const text = win.localStorage.getItem(key);
        if (text) copies.push({ id, text, savedAt: Number(win.localStorage.getItem(RECOVERY_TIME_PREFIX + id)) || 0 });
      }
      return copies.sort((a, b) => b.savedAt - a.savedAt);
    },
    async discardRecovery(id) {
      if (id === windowId) throw new Error("This window's own recovery copy is cleared by writing null, not discarded.");
      if (id === LEGACY_ID) win.localStorage.removeItem(RECOVERY_KEY);
      else {
        win.localStorage.removeItem(RECOVERY_PREFIX + id);
        win.localStorage.removeItem(RECOVERY_TIME_PREFIX + id);
      }
    },
    setTitle(title) {
      win.document.title = title;
    },
    setUnsaved(value) {
      unsaved = value;
    },
  };
}

/** The picker's promise, with the user's cancel (AbortError) as null. */
async function cancellable<T>(picking: Promise<T>): Promise<T | null> {
  try {
    return await picking;
  } catch (error) {
    if (error instanceof DOMException && error.name === 'AbortError') return null;
    throw error;
  }
}

async function ensurePermission(handle: FileHandle, mode: 'read' | 'readwrite'): Promise<void> {
  if (!handle.queryPermission || (await handle.queryPermission({ mode })) === 'granted') return;
  const answer = await handle.requestPermission?.({ mode });
  if (answer !== 'granted') throw new Error(`Permission to ${mode === 'read' ? 'read' : 'write'} "${handle.name}" was not given.`);
}

async function writeThrough(handle: FileHandle, text: string | Uint8Array): Promise<void> {
  try {
    await ensurePermission(handle, 'readwrite');
    const writable = await handle.createWritable();
    try {
      await writable.write(text);
    } catch (error) {
      await writable.abort(); // discard the swap file: the saved file stays as it was
      throw error;
    }
    await writable.close();
  } catch (error) {
    throw new Error(`Could not save "${handle.name}": ${storageReason(error)}. The file is unchanged.`);
  }
}

const STORAGE_REASONS: Readonly<Record<string, string>> = {
  QuotaExceededError: 'there is not enough storage space',
  NotAllowedError: 'the browser did not allow writing to it',
  NoModificationAllowedError: 'the file is locked or read-only',
  NotFoundError: 'the file or its folder no longer exists',
  InvalidStateError: 'the file changed on disk since it was opened',
  SecurityError: 'the browser blocked the access',
};

function storageReason(error: unknown): string {
  if (error instanceof DOMException) return STORAGE_REASONS[error.name] ?? `${error.name}: ${error.message}`;
  return error instanceof Error ? error.message : String(error);
}

function download(win: Window & typeof globalThis, name: string, mimeType: string, text: string | Uint8Array): void {
  const url = win.URL.createObjectURL(new Blob([typeof text === 'string' ? text : new Uint8Array(text)], { type: mimeType }));
  const link = win.document.createElement('a');
  link.href = url;
  link.download = name;
  link.style.display = 'none';
  win.document.body.append(link);
  link.click();
  link.remove();
  // Revoke later: revoking at once can cancel the download in some browsers.
  win.setTimeout(() => win.URL.revokeObjectURL(url), 60_000);
}

function openWithInput(win: Window, accept = '.json,.geojson,.dxf,application/json,application/geo+json'): Promise<OpenedFile | null> {
  return new Promise((resolve, reject) => {
    const input = win.document.createElement('input');
    input.type = 'file';
    input.accept = accept;
    input.addEventListener('change', () => {
      const file = input.files?.[0];
      if (!file) return resolve(null);
      file.text().then((text) => resolve({ name: file.name, handle: null, text }), reject);
    });
    input.addEventListener('cancel', () => resolve(null));
    input.click();
  });
}

function readRecent(storage: Storage): { name: string; handle: string }[] {
  try {
    const value: unknown = JSON.parse(storage.getItem(RECENT_KEY) ?? '[]');
    if (!Array.isArray(value)) return [];
    return value.filter((r): r is { name: string; handle: string } => typeof r?.name === 'string' && typeof r?.handle === 'string');
  } catch {
    return []; // a damaged list is replaced, not a reason to refuse to start
  }
}

function writeRecent(storage: Storage, list: readonly { name: string; handle: string }[]): void {
  try {
    storage.setItem(RECENT_KEY, JSON.stringify(list.slice(0, RECENT_LIMIT)));
  } catch {
    // Storage full or disabled: the recent list is a convenience, the save itself succeeded.
  }
}

/** File handles in IndexedDB (they are structured-cloneable; localStorage holds only text). */
function handleStore(win: Window): { put(id: string, handle: FileHandle): Promise<void>; get(id: string): Promise<FileHandle | null> } {
  const database = (): Promise<IDBDatabase> =>
    new Promise((resolve, reject) => {
      const request = win.indexedDB.open(HANDLE_DB, 1);
      request.onupgradeneeded = () => request.result.createObjectStore('handles');
      request.onsuccess = () => resolve(request.result);
      request.onerror = () => reject(request.error ?? new Error('IndexedDB unavailable'));
    });
  const run = async <T>(mode: IDBTransactionMode, work: (store: IDBObjectStore) => IDBRequest<T>): Promise<T> => {
    const db = await database();
    try {
      return await new Promise<T>((resolve, reject) => {
        const request = work(db.transaction('handles', mode).objectStore('handles'));
        request.onsuccess = () => resolve(request.result);
        request.onerror = () => reject(request.error ?? new Error('IndexedDB request failed'));
      });
    } finally {
      db.close();
    }
  };
  return {
    put: async (id, handle) => void (await run('readwrite', (s) => s.put(handle, id))),
    get: async (id) => ((await run('readonly', (s) => s.get(id))) as FileHandle | undefined) ?? null,
  };
}

/** This tab's window ID: kept in sessionStorage, so a reload is the same window and finds its own copy. */
function ownWindowId(win: Window & typeof globalThis): string {
  try {
    const kept = win.sessionStorage.getItem(WINDOW_ID_KEY);
    if (kept && /^[\w-]{1,64}$/.test(kept) && kept !== LEGACY_ID) return kept;
  } catch {
    // no sessionStorage: a fresh ID each load
  }
  const id = `${Date.now().toString(36)}-${Array.from(win.crypto.getRandomValues(new Uint8Array(6)), (b) => b.toString(16).padStart(2, '0')).join('')}`;
  try {
    win.sessionStorage.setItem(WINDOW_ID_KEY, id);
  } catch {
    // not kept: a reload then offers this copy as left behind, which loses nothing
  }
  return id;
}

/** Holds the Web Lock that marks this window as alive until the page goes away; resolves once held. */
function holdWindowLock(win: Window & typeof globalThis, id: string): Promise<void> {
  const locks = win.navigator.locks as LockManager | undefined;
  if (!locks) return Promise.resolve();
  return new Promise<void>((held) => {
    locks.request(`${WINDOW_LOCK_PREFIX}${id}`, { mode: 'exclusive' }, () => {
      held();
      return new Promise<void>(() => undefined); // released only when the page is gone
    }).catch(() => held());
  });
}

/** The IDs of windows alive now (holding their lock). Without Web Locks, none is known: every other copy is offered. */
async function liveWindows(win: Window & typeof globalThis): Promise<Set<string>> {
  const locks = win.navigator.locks as LockManager | undefined;
  if (!locks) return new Set();
  const state = await locks.query();
  return new Set([...(state.held ?? []), ...(state.pending ?? [])].map((l) => l.name ?? '').filter((n) => n.startsWith(WINDOW_LOCK_PREFIX)).map((n) => n.slice(WINDOW_LOCK_PREFIX.length)));
}
