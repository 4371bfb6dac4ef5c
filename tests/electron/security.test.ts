/**
 * The desktop window's security settings, asserted literally (STYLE.md §13, Electron's own
 * security checklist, common practice): if anyone loosens one, this fails.
 */
import { readFileSync } from 'node:fs';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { appFileFor } from '../../electron/app-files.ts';
import { CHANNELS } from '../../electron/channels.ts';
import { assertTrustedSender, guarded, type SenderLike } from '../../electron/ipc-guard.ts';
import { documentPathFromArgv } from '../../electron/launch-file.ts';
import { plainRemoteMessage } from '../../electron/remote-error.ts';
import { menuTemplate } from '../../electron/menu.ts';
import { checkedArgs, checkedDocumentText, PAYLOADS, RejectedMessage } from '../../electron/payloads.ts';
import {
  APP_ENTRY_URL, CONTENT_SECURITY_POLICY, denyPermissionCheck, denyPermissionRequest, denyWindowOpen,
  isAppUrl, isNavigationAllowed, PRIVILEGED_SCHEMES, responseHeaders, windowOptions,
} from '../../electron/window-options.ts';
import { HOST_COMMANDS } from '../../renderer/host/host.ts';
import { parseDocument, serialiseDocument } from '../../core/document/index.ts';

const electronDir = path.join(import.meta.dirname, '..', '..', 'electron');

describe('window options', () => {
  const prefs = windowOptions('/app/out/electron/preload.cjs').webPreferences;

  it('isolate the page: contextIsolation and sandbox on, Node integration off everywhere, web security on', () => {
    expect(prefs?.contextIsolation).toBe(true);
    expect(prefs?.sandbox).toBe(true);
    expect(prefs?.nodeIntegration).toBe(false);
    expect(prefs?.nodeIntegrationInWorker).toBe(false);
    expect(prefs?.nodeIntegrationInSubFrames).toBe(false);
    expect(prefs?.webSecurity).toBe(true);
    expect(prefs?.allowRunningInsecureContent).toBe(false);
    expect(prefs?.webviewTag).toBe(false);
    expect(prefs?.experimentalFeatures).toBe(false);
    expect(prefs?.preload).toBe('/app/out/electron/preload.cjs');
  });

  it('load the app from app://sectionsmith/, a scheme registered as standard and secure', () => {
    expect(APP_ENTRY_URL).toBe('app://sectionsmith/index.html');
    expect(PRIVILEGED_SCHEMES).toEqual([{ scheme: 'app', privileges: { standard: true, secure: true, supportFetchAPI: true, codeCache: true } }]);
    expect(readFileSync(path.join(electronDir, 'main.ts'), 'utf8')).toMatch(/win\.loadURL\(APP_ENTRY_URL\)/);
  });

  it('send a strict CSP on every app response: nothing by default, scripts only from the app, no objects, framing or forms', () => {
    expect(CONTENT_SECURITY_POLICY).toBe(
      "default-src 'none'; script-src 'self'; style-src 'self' 'unsafe-inline'; img-src 'self' data: blob:; font-src 'self'; connect-src 'self'; worker-src 'self'; manifest-src 'self'; object-src 'none'; base-uri 'none'; form-action 'none'; frame-ancestors 'none'",
    );
    expect(CONTENT_SECURITY_POLICY).not.toMatch(/unsafe-eval|script-src[^;]*unsafe-inline|\*/);
    expect(responseHeaders('text/html')['Content-Security-Policy']).toBe(CONTENT_SECURITY_POLICY);
    expect(responseHeaders('text/html')['X-Content-Type-Options']).toBe('nosniff');
  });

  it('deny navigation away from the app, every new window and every permission', () => {
    expect(isNavigationAllowed('app://sectionsmith/index.html')).toBe(true);
    expect(isNavigationAllowed('https://example.com/')).toBe(false);
    expect(isNavigationAllowed('file:///etc/passwd')).toBe(false);
    expect(isNavigationAllowed('app://elsewhere/index.html')).toBe(false);
    expect(denyWindowOpen()).toEqual({ action: 'deny' });
    const answers: boolean[] = [];
    for (const permission of ['media', 'geolocation', 'notifications', 'clipboard-read', 'openExternal']) denyPermissionRequest(null, permission, (granted) => answers.push(granted));
    expect(answers).toEqual([false, false, false, false, false]);
    expect(denyPermissionCheck()).toBe(false);
    const main = readFileSync(path.join(electronDir, 'main.ts'), 'utf8');
    expect(main).toMatch(/setPermissionRequestHandler\(denyPermissionRequest\)/);
    expect(main).toMatch(/setPermissionCheckHandler\(denyPermissionCheck\)/);
    expect(main).toMatch(/setWindowOpenHandler\(denyWindowOpen\)/);
    expect(main).toMatch(/'will-navigate'/);
    // …applied to every web contents when it is created.
    expect(main).toMatch(/app\.on\('web-contents-created', \(_event, contents\) => lockDown\(contents\)\)/);
  });
});

describe('IPC channels', () => {
  it('are one list of named verbs, each with a payload schema, and no generic pipe', () => {
    expect(CHANNELS.map((c) => c.name)).toEqual([
      'document:open', 'document:open-recent', 'document:launch-file', 'document:save', 'document:save-as',
      'export:save', 'report:print-pdf', 'dialog:confirm-discard', 'recent:list', 'recovery:write', 'recovery:read',
      'table:open', 'settings:read', 'settings:write',
      'window:set-title', 'window:set-unsaved', 'menu:command',
    ]);
    expect(Object.keys(PAYLOADS).sort()).toEqual(CHANNELS.map((c) => c.name).sort());
  });

  it('main registers every renderer-to-main channel through the guard and no handler any other way', () => {
    const main = readFileSync(path.join(electronDir, 'main.ts'), 'utf8');
    for (const channel of CHANNELS.filter((c) => c.direction === 'invoke')) expect(main).toContain(`handle('${channel.name}'`);
    for (const channel of CHANNELS.filter((c) => c.direction === 'send')) expect(main).toContain(`listen('${channel.name}'`);
    // The only raw registrations are the two inside handle() and listen(), which pass the guarded function.
    expect(main.match(/ipcMain\.(handle|on|once|handleOnce)\(/g)).toEqual(['ipcMain.handle(', 'ipcMain.on(']);
  });

  it('the preload exposes named functions only, never ipcRenderer itself', () => {
    const preload = readFileSync(path.join(electronDir, 'preload.ts'), 'utf8');
    expect(preload).toMatch(/contextBridge\.exposeInMainWorld\('sectionsmithHost', host\)/);
    expect(preload.match(/exposeInMainWorld/g)).toHaveLength(1);
    expect(preload).not.toMatch(/exposeInMainWorld\([^)]*ipcRenderer/);
  });
});

describe('sender check', () => {
  const event = (url: string, id = 7, parent: unknown = null): SenderLike => ({ senderFrame: { url, parent }, sender: { id } });

  it('accepts the app page of the trusted window', () => {
    expect(() => assertTrustedSender('recent:list', event('app://sectionsmith/index.html'), 7)).not.toThrow();
  });

  it('rejects another origin, another window, a sub-frame and a vanished frame, naming the channel', () => {
    expect(() => assertTrustedSender('recent:list', event('https://evil.example/'), 7)).toThrow(/recent:list: rejected: sender "https:\/\/evil.example\/" is not the app/);
    expect(() => assertTrustedSender('recent:list', event('file:///tmp/x.html'), 7)).toThrow(RejectedMessage);
    expect(() => assertTrustedSender('recent:list', event('app://sectionsmith/index.html', 8), 7)).toThrow(/not the app window/);
    expect(() => assertTrustedSender('recent:list', event('app://sectionsmith/index.html', 7, {}), 7)).toThrow(/sub-frame/);
    expect(() => assertTrustedSender('recent:list', { senderFrame: null, sender: { id: 7 } }, 7)).toThrow(/frame is gone/);
    expect(() => assertTrustedSender('recent:list', event('app://sectionsmith/index.html'), null)).toThrow(/not the app window/);
  });

  it('a guarded handler never runs for an untrusted sender or a bad payload', () => {
    let calls = 0;
    const handler = guarded('window:set-title', () => 7, () => void (calls += 1));
    expect(() => handler(event('https://evil.example/'), 'title')).toThrow(RejectedMessage);
    expect(() => handler(event('app://sectionsmith/index.html'), 42)).toThrow(RejectedMessage);
    handler(event('app://sectionsmith/index.html'), 'footbridge box girder • unsaved');
    expect(calls).toBe(1);
  });
});

describe('payload validation', () => {
  it('rejects wrong types, extra arguments and missing arguments', () => {
    expect(() => checkedArgs('document:save', ['/home/a.section.json'])).toThrow(/document:save: rejected payload/);
    expect(() => checkedArgs('document:save', ['/home/a.section.json', 5])).toThrow(/at argument 1: expected text/);
    expect(() => checkedArgs('recent:list', ['extra'])).toThrow(RejectedMessage);
    expect(() => checkedArgs('window:set-unsaved', ['yes'])).toThrow(/expected true or false/);
    expect(checkedArgs('window:set-unsaved', [true])).toEqual([true]);
  });

  it('an export or save-as name may not carry folders', () => {
    expect(() => checkedArgs('export:save', [{ suggestedName: '../../.bashrc', mimeType: 'text/csv', text: 'x' }])).toThrow(/without folders/);
    expect(() => checkedArgs('document:save-as', ['C:\\Windows\\x.section.json', '{}'])).toThrow(/without folders/);
    expect(() => checkedArgs('export:save', [{ suggestedName: 'a.exe', mimeType: 'application/x-msdownload', text: 'x' }])).toThrow(/one of image\/svg\+xml/);
    expect(checkedArgs('export:save', [{ suggestedName: 'trailer frame.svg', mimeType: 'image/svg+xml', text: '<svg/>' }])).toHaveLength(1);
  });

  it('document text written to disk must pass core/document validation, and the refusal says what is wrong', () => {
    const good = JSON.stringify({ format: 'sectionsmith-section', version: 3, name: 'n', unit: 'mm', materials: [], defaultMaterial: null, sections: [{ id: 's1', name: 'n', parts: [] }] });
    expect(checkedDocumentText(good)).toBe(good);
    expect(() => checkedDocumentText('{"format": ')).toThrow(/document:save: the text is not JSON/);
    expect(() => checkedDocumentText(JSON.stringify({ format: 'sectionsmith-section', version: 3, name: 'n', unit: 'furlong', materials: [], defaultMaterial: null, sections: [{ id: 's1', name: 'n', parts: [] }] }))).toThrow(/unit: expected a length unit/);
    // An older layout is read (and migrated) on opening, but never written.
    expect(() => checkedDocumentText(JSON.stringify({ format: 'sectionsmith-section', version: 1, name: 'n', unit: 'mm', parts: [], materials: [], defaultMaterial: null }))).toThrow(/version: expected 3, got 1/);
  });
});

describe('refusals reaching the page', () => {
  it("lose Electron's remote-method prefix and keep main's reason word for word", () => {
    const reason = 'Could not save "/w/a.section.json" (failed to write the new version): the disk is full (ENOSPC). The file on disk is unchanged.';
    expect(plainRemoteMessage(`Error invoking remote method 'document:save': Error: ${reason}`)).toBe(reason);
    expect(plainRemoteMessage(`Error invoking remote method 'document:save': RejectedMessage: document:save: rejected payload`)).toBe('document:save: rejected payload');
    expect(plainRemoteMessage('already plain')).toBe('already plain');
  });
});

describe('documents the app writes pass the save check', () => {
  it('the shipped example, read and serialised by core/document, is accepted by document:save', () => {
    const file = path.join(import.meta.dirname, '..', '..', 'assets', 'examples', 'footbridge-box-girder.section.json');
    const parsed = parseDocument(readFileSync(file, 'utf8'), 'footbridge-box-girder.section.json');
    if (!parsed.ok) throw new Error(parsed.errors.map((e) => e.message).join('; '));
    const text = serialiseDocument(parsed.file);
    expect(checkedDocumentText(text)).toBe(text);
  });
});

describe('app protocol files', () => {
  it('maps app://sectionsmith/ paths into the web root and refuses traversal, other hosts and unknown types', () => {
    expect(appFileFor('/app/web', 'app://sectionsmith/')).toEqual({ filePath: '/app/web/index.html', contentType: 'text/html; charset=utf-8' });
    expect(appFileFor('/app/web', 'app://sectionsmith/assets/index-1.js')?.filePath).toBe('/app/web/assets/index-1.js');
    expect(appFileFor('/app/web', 'app://sectionsmith/%2e%2e/%2e%2e/etc/passwd')).toBeNull();
    expect(appFileFor('/app/web', 'app://sectionsmith/..%2f..%2fsecret.js')).toBeNull();
    expect(appFileFor('/app/web', 'app://other/index.html')).toBeNull();
    expect(appFileFor('/app/web', 'app://sectionsmith/run.sh')).toBeNull();
    expect(isAppUrl('app://sectionsmith/x')).toBe(true);
  });
});

describe('menu and command line', () => {
  it('has the usual accelerators, each item sending a host command', () => {
    const sent: string[] = [];
    const template = menuTemplate((c) => sent.push(c), 'linux');
    const items = template.flatMap((m) => (Array.isArray(m.submenu) ? m.submenu : []));
    const accel = (label: string) => items.find((i) => i.label === label)?.accelerator;
    expect(accel('New Section')).toBe('CmdOrCtrl+N');
    expect(accel('Open…')).toBe('CmdOrCtrl+O');
    expect(accel('Save')).toBe('CmdOrCtrl+S');
    expect(accel('Save As…')).toBe('CmdOrCtrl+Shift+S');
    expect(accel('Undo')).toBe('CmdOrCtrl+Z');
    expect(accel('Redo')).toBe('Ctrl+Y');
    expect(accel('Delete Selected Parts')).toBe('Delete');
    expect(accel('Zoom In')).toBe('CmdOrCtrl+=');
    expect(accel('Zoom Out')).toBe('CmdOrCtrl+-');
    for (const i of items) if (typeof i.click === 'function') (i.click as () => void)();
    for (const command of sent) expect(HOST_COMMANDS).toContain(command);
    expect(new Set(sent)).toEqual(new Set(HOST_COMMANDS.filter((c) => c !== 'open-launch-file')));
  });

  it('takes the first .json argument after the entry script as the document to open', () => {
    expect(documentPathFromArgv(['/usr/bin/electron', 'out/electron/main.cjs', '--inspect', 'box.section.json'], '/home/eng', true)).toBe('/home/eng/box.section.json');
    expect(documentPathFromArgv(['/opt/Sectionsmith/sectionsmith', '/data/rail.geojson'], '/', false)).toBe('/data/rail.geojson');
    expect(documentPathFromArgv(['/opt/Sectionsmith/sectionsmith', '--no-sandbox'], '/', false)).toBeNull();
  });
});
