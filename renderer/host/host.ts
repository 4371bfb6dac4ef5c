/**
 * The one small interface between the renderer and whatever hosts it: the Electron preload
 * (electron/preload.ts) or the browser build (renderer/host/browser-host.ts). Nothing else in
 * renderer/ may touch files, dialogs or the window.
 */
export interface OpenedFile {
  /** Display name, e.g. "footbridge-box.section.json". */
  readonly name: string;
  /** Opaque handle the host understands (a path in Electron, a file handle id in the browser); null when the host cannot save back. */
  readonly handle: string | null;
  readonly text: string;
}

export interface SaveResult {
  readonly name: string;
  readonly handle: string | null;
}

/** A recovery copy left by a window that did not end cleanly. */
export interface RecoveryCopy {
  readonly id: string;
  readonly text: string;
  /** When it was last written, ms since 1970 (0 when unknown). */
  readonly savedAt: number;
}

export interface ExportFile {
  readonly suggestedName: string;
  readonly mimeType: string;
  readonly text: string;
}

/** A derived file made of bytes (an XLSX workbook), saved where the user chooses. */
export interface ExportBytes {
  readonly suggestedName: string;
  readonly mimeType: typeof XLSX_MIME_TYPE;
  readonly bytes: Uint8Array;
}

export const XLSX_MIME_TYPE = 'application/vnd.openxmlformats-officedocument.spreadsheetml.sheet';

/**
 * Commands a host sends to the renderer (native menu items in Electron; a file handed over by the
 * OS arrives as 'open-launch-file', to be fetched with `launchFile()`). The editor runs them as if
 * the user had used its own buttons or keys.
 */
export const HOST_COMMANDS = [
  'new', 'open', 'save', 'save-as', 'export-svg', 'export-csv', 'export-xlsx', 'export-dxf', 'compare', 'print-report', 'check-table',
  'undo', 'redo', 'delete', 'zoom-in', 'zoom-out', 'zoom-fit', 'open-example', 'open-launch-file',
] as const;
export type HostCommand = (typeof HOST_COMMANDS)[number];

export interface Host {
  readonly kind: 'electron' | 'browser';
  /** Ask the user for a file and return its text; null if cancelled. */
  open(): Promise<OpenedFile | null>;
  /** Save to the given handle (atomic on desktop); throws an Error whose message says why on failure. */
  save(handle: string, text: string): Promise<SaveResult>;
  /** Ask for a place and save there; null if cancelled. */
  saveAs(suggestedName: string, text: string): Promise<SaveResult | null>;
  /** Export a derived file (SVG, CSV, HTML report); returns false if cancelled. */
  exportFile(file: ExportFile): Promise<boolean>;
  /** Export a derived file of bytes (XLSX); returns false if cancelled. Hosts that cannot save bytes leave it out. */
  exportBytes?(file: ExportBytes): Promise<boolean>;
  /** Ask before discarding unsaved changes; true = discard. */
  confirmDiscard(documentName: string): Promise<boolean>;
  recentFiles(): Promise<readonly { name: string; handle: string }[]>;
  /**
   * Write this window's own recovery copy of the unsaved document (debounced by the caller); null
   * clears it. It never touches another window's copy. Throws an Error saying why when the copy
   * cannot be kept (a full storage quota, a full disk).
   */
  writeRecovery(text: string | null): Promise<void>;
  /** Copies left by windows that ended without saving (never this window's, never a live window's), newest first. */
  readRecovery(): Promise<readonly RecoveryCopy[]>;
  /** Remove one left-behind copy once the user has answered for it (restored here, or thrown away). */
  discardRecovery(id: string): Promise<void>;
  setTitle(title: string): void;
  /** Tell the host whether there are unsaved changes (Electron asks before closing the window). */
  setUnsaved?(unsaved: boolean): void;
  /** Open an entry of recentFiles() without a dialog; null if it is gone. */
  openRecent?(handle: string): Promise<OpenedFile | null>;
  /** The document given on the command line or by the OS at start, once; null if none. */
  launchFile?(): Promise<OpenedFile | null>;
  /**
   * Render a report's HTML (core/report) to a PDF and save it where the user chooses; false if
   * cancelled. Hosts that cannot make PDFs leave it out (the browser build prints the HTML instead).
   */
  printToPdf?(html: string, suggestedName: string): Promise<boolean>;
  /**
   * Ask the user for a table (CSV or plain text) and return its text; null if cancelled. The
   * handle is null: a table is read, never saved back. Hosts without it leave it out.
   */
  openTable?(): Promise<OpenedFile | null>;
  /** A small setting kept between sessions (e.g. a remembered column mapping); null when none. */
  readSetting?(key: string): Promise<string | null>;
  /** Keep (text) or forget (null) a setting; throws an Error saying why when it cannot be kept. */
  writeSetting?(key: string, value: string | null): Promise<void>;
  /** Subscribe to host commands (menu items); returns the unsubscribe function. */
  onCommand?(listener: (command: HostCommand) => void): () => void;
}
