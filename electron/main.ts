/**
 * Electron main process: one window running the renderer from app://sectionsmith/, the native
 * menu, and the handlers behind the preload's named functions. Main owns every dialog and every
 * path: the renderer only ever holds paths main handed to it (open, save as, recent, command line),
 * and main refuses to read or write any other. The logic that deserves tests lives in plain
 * modules beside this one (save, recovery, payloads, ipc-guard, window-options, app-files, menu,
 * launch-file, recent-files); this file wires them to Electron.
 *
 * Bundled by electron/build.mjs to out/electron/main.cjs; the renderer build is read from dist/web.
 */
import { app, BrowserWindow, dialog, ipcMain, Menu, net, protocol, session, type IpcMainInvokeEvent } from 'electron';
import { promises as fs } from 'node:fs';
import path from 'node:path';
import { pathToFileURL } from 'node:url';
import { appProtocolHandler } from './app-files.ts';
import type { InvokeChannel, HostCommand, SendChannel } from './channels.ts';
import { createGrantedPaths, DOCUMENT_EXTENSION } from './granted-paths.ts';
import { claimSingleInstance } from './instance.ts';
import { guarded } from './ipc-guard.ts';
import { exportBytes } from './export-bytes.ts';
import { documentPathFromArgv } from './launch-file.ts';
import { menuTemplate } from './menu.ts';
import { printReportToPdf } from './print-pdf.ts';
import { checkedDocumentText, MAX_TEXT_BYTES, type PayloadOf } from './payloads.ts';
import { readRecentFiles, withRecent, writeRecentFiles, type RecentFile } from './recent-files.ts';
import { createRecoveryStore } from './recovery.ts';
import { saveAtomically } from './save.ts';
import { createSettingsStore } from './settings.ts';
import { APP_ENTRY_URL, APP_SCHEME, applySessionPolicy, lockDown, PRIVILEGED_SCHEMES, windowOptions } from './window-options.ts';

const WEB_ROOT = path.join(__dirname, '..', '..', 'dist', 'web');
const PRELOAD = path.join(__dirname, 'preload.cjs');

protocol.registerSchemesAsPrivileged([...PRIVILEGED_SCHEMES]);

let window: BrowserWindow | null = null;
/** Paths the user chose, or opened as documents the app can save back: the only ones the renderer may save to. */
const grantedPaths = createGrantedPaths();
let launchPath = documentPathFromArgv(process.argv, process.cwd(), process.defaultApp === true);
let unsaved = false;
let closeConfirmed = false;

// This window's own copy, under a fresh ID; copies of earlier windows are offered, never overwritten.
const recovery = createRecoveryStore(path.join(app.getPath('userData'), 'recovery'));
const recentListFile = path.join(app.getPath('userData'), 'recent-files.json');
const settings = createSettingsStore(app.getPath('userData'));
let recent: RecentFile[] = [];

function sendCommand(command: HostCommand): void {
  window?.webContents.send('menu:command', command);
}

function handle<C extends InvokeChannel>(channel: C, handler: (...args: PayloadOf<C>) => unknown): void {
  const checked = guarded(channel, () => window?.webContents.id ?? null, handler);
  ipcMain.handle(channel, (event: IpcMainInvokeEvent, ...args: unknown[]) => checked(event, ...args));
}

function listen<C extends SendChannel>(channel: C, handler: (...args: PayloadOf<C>) => void): void {
  const checked = guarded(channel, () => window?.webContents.id ?? null, handler);
  ipcMain.on(channel, (event, ...args: unknown[]) => {
    try {
      checked(event, ...args);
    } catch (error) {
      console.error(String(error)); // a notification has no reply to carry the refusal
    }
  });
}

async function readDocumentFile(filePath: string): Promise<{ name: string; handle: string | null; text: string }> {
  const info = await fs.stat(filePath);
  if (!info.isFile()) throw new Error(`"${filePath}" is not a file.`);
  if (info.size > MAX_TEXT_BYTES) throw new Error(`"${filePath}" is ${info.size} bytes; the largest document this build opens is ${MAX_TEXT_BYTES} bytes.`);
  const text = await fs.readFile(filePath, 'utf8');
  // A GeoJSON or DXF drawing is read, never written over: its Save asks for a place (handle null).
  const savable = grantedPaths.opened(filePath, text);
  await rememberRecent(filePath);
  return { name: path.basename(filePath), handle: savable ? filePath : null, text };
}

async function rememberRecent(filePath: string): Promise<void> {
  recent = withRecent(recent, filePath);
  app.addRecentDocument(filePath);
  await writeRecentFiles(recentListFile, recent).catch((error: unknown) => console.error(`recent files not stored: ${String(error)}`));
}

async function saveDocument(filePath: string, text: string): Promise<{ name: string; handle: string }> {
  await saveAtomically(filePath, checkedDocumentText(text));
  grantedPaths.chosen(filePath);
  await rememberRecent(filePath);
  return { name: path.basename(filePath), handle: filePath };
}

function defaultFolder(): string {
  const last = recent[0]?.handle;
  return last ? path.dirname(last) : app.getPath('documents');
}

const EXPORT_FILTERS: Readonly<Record<string, { name: string; extensions: string[] }>> = {
  'image/svg+xml': { name: 'SVG drawing', extensions: ['svg'] },
  'text/csv': { name: 'CSV table', extensions: ['csv'] },
  'text/html': { name: 'HTML report', extensions: ['html'] },
  'application/json': { name: 'JSON', extensions: ['json'] },
  'text/plain': { name: 'Text', extensions: ['txt'] },
  'application/dxf': { name: 'DXF drawing', extensions: ['dxf'] },
};

function registerHandlers(): void {
  handle('document:open', async () => {
    if (!window) return null;
    const choice = await dialog.showOpenDialog(window, {
      title: 'Open a section',
      defaultPath: defaultFolder(),
      properties: ['openFile'],
      filters: [{ name: 'Sectionsmith section, GeoJSON or DXF drawing', extensions: ['json', 'geojson', 'dxf'] }, { name: 'All files', extensions: ['*'] }],
    });
    const chosen = choice.filePaths[0];
    return choice.canceled || !chosen ? null : readDocumentFile(chosen);
  });
  handle('document:open-recent', async (filePath) => {
    if (!recent.some((r) => r.handle === filePath)) throw new Error(`"${filePath}" is not in the recent files list.`);
    return readDocumentFile(filePath);
  });
  handle('document:launch-file', async () => {
    const filePath = launchPath;
    launchPath = null; // handed over once; a reload does not reopen it over the user's work
    return filePath ? readDocumentFile(filePath) : null;
  });
  handle('document:save', async (filePath, text) => {
    if (!grantedPaths.has(filePath)) throw new Error(`Saving to "${filePath}" was refused: choose the place with Save As first.`);
    return saveDocument(filePath, text);
  });
  handle('document:save-as', async (suggestedName, text) => {
    if (!window) return null;
    checkedDocumentText(text);
    const choice = await dialog.showSaveDialog(window, {
      title: 'Save the section as',
      defaultPath: path.join(defaultFolder(), suggestedName),
      filters: [{ name: 'Sectionsmith section', extensions: ['section.json'] }],
    });
    if (choice.canceled || !choice.filePath) return null;
    const filePath = choice.filePath.endsWith(DOCUMENT_EXTENSION) ? choice.filePath : `${choice.filePath.replace(/\.json$/i, '')}${DOCUMENT_EXTENSION}`;
    return saveDocument(filePath, text);
  });
  handle('export:save', async (file) => {
    if (!window) return false;
    const filter = EXPORT_FILTERS[file.mimeType];
    const choice = await dialog.showSaveDialog(window, {
      title: 'Export',
      defaultPath: path.join(defaultFolder(), file.suggestedName),
      ...(filter ? { filters: [filter] } : {}),
    });
    if (choice.canceled || !choice.filePath) return false;
    await saveAtomically(choice.filePath, file.text, { keepBackup: false });
    return true;
  });
  handle('export:save-bytes', async (file) => {
    const owner = window;
    if (!owner) return false;
    return exportBytes(file, {
      chooseTarget: async (name, filter) => {
        const choice = await dialog.showSaveDialog(owner, { title: 'Export', defaultPath: path.join(defaultFolder(), name), filters: [filter] });
        return choice.canceled || !choice.filePath ? null : choice.filePath;
      },
      save: (filePath, bytes) => saveAtomically(filePath, bytes, { keepBackup: false }),
    });
  });
  handle('report:print-pdf', async (html, suggestedName) => {
    const owner = window;
    if (!owner) return false;
    return printReportToPdf(html, suggestedName, {
      chooseTarget: async (name) => {
        const choice = await dialog.showSaveDialog(owner, { title: 'Save the report as PDF', defaultPath: path.join(defaultFolder(), name), filters: [{ name: 'PDF document', extensions: ['pdf'] }] });
        return choice.canceled || !choice.filePath ? null : choice.filePath;
      },
      createWindow: (options) => new BrowserWindow(options),
      save: (target, data) => saveAtomically(target, data, { keepBackup: false }),
      fs,
      tempRoot: app.getPath('temp'),
    });
  });
  handle('dialog:confirm-discard', async (documentName) => (window ? confirmDiscard(window, documentName) : false));
  handle('recent:list', async () => recent);
  handle('recovery:write', async (text) => (text === null ? recovery.clear() : recovery.write(text)));
  handle('recovery:read', async () => recovery.leftBehind());
  handle('recovery:discard', async (id) => recovery.discard(id));
  handle('table:open', async () => {
    if (!window) return null;
    const choice = await dialog.showOpenDialog(window, {
      title: 'Import a table of shapes',
      defaultPath: defaultFolder(),
      properties: ['openFile'],
      filters: [{ name: 'Table of shapes (CSV)', extensions: ['csv', 'txt'] }, { name: 'All files', extensions: ['*'] }],
    });
    const chosen = choice.filePaths[0];
    if (choice.canceled || !chosen) return null;
    // Read only: the path is not granted for saving and not listed among recent documents.
    const info = await fs.stat(chosen);
    if (!info.isFile()) throw new Error(`"${chosen}" is not a file.`);
    if (info.size > MAX_TEXT_BYTES) throw new Error(`"${chosen}" is ${info.size} bytes; the largest table this build reads is ${MAX_TEXT_BYTES} bytes.`);
    return { name: path.basename(chosen), handle: null, text: await fs.readFile(chosen, 'utf8') };
  });
  handle('settings:read', async (key) => settings.read(key));
  handle('settings:write', async (key, value) => settings.write(key, value));
  listen('window:set-title', (title) => window?.setTitle(title));
  listen('window:set-unsaved', (value) => {
    unsaved = value;
    window?.setDocumentEdited(value);
  });
}

/** Main's own question before changes are lost; `documentName` null when closing the window. */
async function confirmDiscard(owner: BrowserWindow, documentName: string | null): Promise<boolean> {
  const answer = await dialog.showMessageBox(owner, {
    type: 'warning',
    buttons: ['Discard Changes', 'Cancel'],
    defaultId: 1,
    cancelId: 1,
    message: documentName === null ? 'The section has unsaved changes.' : `"${documentName || 'Untitled section'}" has unsaved changes.`,
    detail: 'If you continue, the changes since the last save are lost.',
  });
  return answer.response === 0;
}

function createWindow(): void {
  // Developer tools only when running from the source tree, never in a packaged build.
  const win = new BrowserWindow(windowOptions(PRELOAD, { devTools: !app.isPackaged }));
  window = win; // its web contents were locked down on 'web-contents-created'
  win.once('ready-to-show', () => win.show());
  win.on('close', (event) => {
    if (!unsaved || closeConfirmed) return;
    event.preventDefault();
    void confirmDiscard(win, null).then((discard) => {
      if (!discard) return;
      closeConfirmed = true;
      win.close();
    });
  });
  win.on('closed', () => {
    window = null;
  });
  void win.loadURL(APP_ENTRY_URL);
}

/** Everything the first instance does; a second instance never gets here (electron/instance.ts). */
function startPrimary(): void {
  // Every web contents (the window's, and any a future feature creates) is locked down at birth.
  app.on('web-contents-created', (_event, contents) => lockDown(contents));

  // macOS passes files opened from Finder this way, before or after ready.
  app.on('open-file', (event, filePath) => {
    event.preventDefault();
    launchPath = filePath;
    if (window) sendCommand('open-launch-file');
  });

  app.on('window-all-closed', () => app.quit());

  // A clean exit (saved, or changes knowingly discarded) removes this window's recovery copy, and no other.
  app.on('will-quit', (event) => {
    event.preventDefault();
    void recovery.clear().finally(() => app.exit(0));
  });

  void app.whenReady().then(async () => {
    applySessionPolicy(session.defaultSession);
    recent = await readRecentFiles(recentListFile);
    protocol.handle(APP_SCHEME, appProtocolHandler(WEB_ROOT, (filePath) => net.fetch(pathToFileURL(filePath).toString())));
    registerHandlers();
    Menu.setApplicationMenu(Menu.buildFromTemplate(menuTemplate(sendCommand, process.platform)));
    createWindow();
  });
}

// A second start (the file manager opening another document, say) hands its command line to the
// running instance, which shows its window and opens the file there (asking before it replaces
// unsaved work), and quits before it creates anything of its own.
const primary = claimSingleInstance(app, (argv, workingDirectory) => {
  const filePath = documentPathFromArgv(argv, workingDirectory, process.defaultApp === true);
  if (filePath) launchPath = filePath;
  if (!window) return;
  if (window.isMinimized()) window.restore();
  window.focus();
  if (filePath) sendCommand('open-launch-file');
});
if (primary) startPrimary();
