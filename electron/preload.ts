/**
 * Preload (sandboxed, context-isolated): exposes the Host of renderer/host/host.ts as
 * `window.sectionsmithHost`, each function one named channel of electron/channels.ts.
 * Never exposes ipcRenderer, a generic invoke or any Node API (STYLE.md §12). Main validates
 * every argument again; the preload only shapes the calls.
 *
 * Bundled to CommonJS (out/electron/preload.cjs) because sandboxed preloads cannot load ES modules.
 */
import { contextBridge, ipcRenderer } from 'electron';
import { HOST_COMMANDS, type Host, type HostCommand, type OpenedFile, type RecoveryCopy, type SaveResult } from '../renderer/host/host.ts';
import type { InvokeChannel, SendChannel } from './channels.ts';
import { plainRemoteMessage } from './remote-error.ts';

const invoke = <T>(channel: InvokeChannel, ...args: unknown[]): Promise<T> =>
  (ipcRenderer.invoke(channel, ...args) as Promise<T>).catch((error: unknown) => {
    throw new Error(error instanceof Error ? plainRemoteMessage(error.message) : String(error));
  });
const send = (channel: SendChannel, ...args: unknown[]): void => ipcRenderer.send(channel, ...args);
const isHostCommand = (value: unknown): value is HostCommand => (HOST_COMMANDS as readonly unknown[]).includes(value);

const host: Host = {
  kind: 'electron',
  open: () => invoke<OpenedFile | null>('document:open'),
  save: (handle, text) => invoke<SaveResult>('document:save', handle, text),
  saveAs: (suggestedName, text) => invoke<SaveResult | null>('document:save-as', suggestedName, text),
  exportFile: (file) => invoke<boolean>('export:save', { suggestedName: file.suggestedName, mimeType: file.mimeType, text: file.text }),
  exportBytes: (file) => invoke<boolean>('export:save-bytes', { suggestedName: file.suggestedName, mimeType: file.mimeType, bytes: file.bytes }),
  printToPdf: (html, suggestedName) => invoke<boolean>('report:print-pdf', html, suggestedName),
  confirmDiscard: (documentName) => invoke<boolean>('dialog:confirm-discard', documentName),
  recentFiles: () => invoke<{ name: string; handle: string }[]>('recent:list'),
  writeRecovery: (text) => invoke<void>('recovery:write', text),
  readRecovery: () => invoke<RecoveryCopy[]>('recovery:read'),
  discardRecovery: (id) => invoke<void>('recovery:discard', id),
  setTitle: (title) => send('window:set-title', title),
  setUnsaved: (unsaved) => send('window:set-unsaved', unsaved),
  openRecent: (handle) => invoke<OpenedFile | null>('document:open-recent', handle),
  launchFile: () => invoke<OpenedFile | null>('document:launch-file'),
  openTable: () => invoke<OpenedFile | null>('table:open'),
  readSetting: (key) => invoke<string | null>('settings:read', key),
  writeSetting: (key, value) => invoke<void>('settings:write', key, value),
  onCommand(listener) {
    const relay = (_event: unknown, command: unknown): void => {
      if (isHostCommand(command)) listener(command);
    };
    ipcRenderer.on('menu:command', relay);
    return () => void ipcRenderer.removeListener('menu:command', relay);
  },
};

contextBridge.exposeInMainWorld('sectionsmithHost', host);
