/**
 * The desktop window's security settings, asserted literally (STYLE.md §13, Electron's own
 * security checklist, common practice): if anyone loosens one, this fails.
 */
import { mkdirSync, mkdtempSync, promises as fs, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { appFileFor, appProtocolHandler } from '../../electron/app-files.ts';
import { canSaveBack, createGrantedPaths } from '../../electron/granted-paths.ts';
import { claimSingleInstance, type InstanceApp } from '../../electron/instance.ts';
import { CHANNELS } from '../../electron/channels.ts';
import { assertTrustedSender, guarded, type SenderLike } from '../../electron/ipc-guard.ts';
import { documentPathFromArgv } from '../../electron/launch-file.ts';
import { plainRemoteMessage } from '../../electron/remote-error.ts';
import { menuTemplate } from '../../electron/menu.ts';
import { checkedArgs, checkedDocumentText, PAYLOADS, RejectedMessage } from '../../electron/payloads.ts';
import {
  APP_ENTRY_URL, applySessionPolicy, CONTENT_SECURITY_POLICY, denyPermissionCheck, denyPermissionRequest, denyWindowOpen,
  isAppUrl, isNavigationAllowed, lockDown, PRIVILEGED_SCHEMES, responseHeaders, windowOptions, type LockableContents,
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
  });

  it('developer tools are off unless asked for (main asks only when the build is not packaged)', () => {
    expect(prefs?.devTools).toBe(false);
    expect(windowOptions('/p.cjs', { devTools: false }).webPreferences?.devTools).toBe(false);
    expect(windowOptions('/p.cjs', { devTools: true }).webPreferences?.devTools).toBe(true);
  });
});

// Hardening finding 8: these were regular expressions over main.ts; now the functions main uses
// are run against fake web contents, a fake session and real files.
describe('lock-down of every web contents', () => {
  /** A web contents double: records listeners and the window-open handler. */
  function fakeContents() {
    const listeners = new Map<string, (event: { preventDefault(): void }, url?: string) => void>();
    let openHandler: (() => { action: 'deny' }) | null = null;
    const contents: LockableContents = {
      on: (name: string, listener: (event: { preventDefault(): void }, url: string) => void) => listeners.set(name, listener as never),
      setWindowOpenHandler: (handler) => void (openHandler = handler),
    };
    /** Fires an event; true when the listener prevented it. */
    const fire = (name: string, url?: string): boolean => {
      let prevented = false;
      const listener = listeners.get(name);
      if (!listener) throw new Error(`no listener for ${name}`);
      listener({ preventDefault: () => void (prevented = true) }, url);
      return prevented;
    };
    return { contents, fire, openHandler: () => openHandler };
  }

  it('a navigation or redirect away from the app is prevented, a reload of the app is not', () => {
    const { contents, fire } = fakeContents();
    lockDown(contents);
    expect(fire('will-navigate', 'app://sectionsmith/index.html')).toBe(false);
    expect(fire('will-navigate', 'https://example.com/')).toBe(true);
    expect(fire('will-navigate', 'file:///home/eng/girder.section.json')).toBe(true);
    expect(fire('will-redirect', 'app://sectionsmith/index.html')).toBe(false);
    expect(fire('will-redirect', 'http://127.0.0.1:8080/')).toBe(true);
    expect(fire('will-navigate', 'not a url')).toBe(true);
  });

  it('a webview is never attached and every new window is denied', () => {
    const { contents, fire, openHandler } = fakeContents();
    lockDown(contents);
    expect(fire('will-attach-webview')).toBe(true);
    expect(openHandler()?.()).toEqual({ action: 'deny' });
  });

  it('the session answers every permission request and check with no', () => {
    const set: { request: typeof denyPermissionRequest | null; check: typeof denyPermissionCheck | null } = { request: null, check: null };
    applySessionPolicy({ setPermissionRequestHandler: (h) => void (set.request = h), setPermissionCheckHandler: (h) => void (set.check = h) });
    const answers: boolean[] = [];
    for (const permission of ['media', 'fullscreen', 'clipboard-sanitized-write', 'pointerLock']) set.request?.(null, permission, (granted) => answers.push(granted));
    expect(answers).toEqual([false, false, false, false]);
    expect(set.check?.()).toBe(false);
  });
});

describe('app:// protocol handler', () => {
  const root = mkdtempSync(path.join(tmpdir(), 'sectionsmith-web-'));
  writeFileSync(path.join(root, 'index.html'), '<!DOCTYPE html><title>app</title>');
  mkdirSync(path.join(root, 'assets'));
  writeFileSync(path.join(root, 'assets', 'index-1.js'), 'console.log(1)');
  writeFileSync(path.join(path.dirname(root), `${path.basename(root)}-secret.js`), 'secret');
  afterAll(() => {
    rmSync(root, { recursive: true, force: true });
    rmSync(path.join(path.dirname(root), `${path.basename(root)}-secret.js`), { force: true });
  });
  const handler = appProtocolHandler(root, async (filePath) => new Response(await fs.readFile(filePath)));

  it('serves the app\'s files with their type and the CSP on every answer', async () => {
    const page = await handler({ url: 'app://sectionsmith/' });
    expect(page.status).toBe(200);
    expect(await page.text()).toBe('<!DOCTYPE html><title>app</title>');
    expect(page.headers.get('content-type')).toBe('text/html; charset=utf-8');
    expect(page.headers.get('content-security-policy')).toBe(CONTENT_SECURITY_POLICY);
    const script = await handler({ url: 'app://sectionsmith/assets/index-1.js' });
    expect(script.headers.get('content-type')).toBe('text/javascript; charset=utf-8');
    expect(script.headers.get('x-content-type-options')).toBe('nosniff');
  });

  it('answers 404, still with the CSP, for traversal, another host, an unknown type and a missing file', async () => {
    for (const url of [
      `app://sectionsmith/%2e%2e/${path.basename(root)}-secret.js`,
      `app://sectionsmith/..%2f${path.basename(root)}-secret.js`,
      'app://other/index.html',
      'app://sectionsmith/run.sh',
      'app://sectionsmith/missing.js',
      'https://sectionsmith/index.html',
    ]) {
      const answer = await handler({ url });
      expect([url, answer.status]).toEqual([url, 404]);
      expect(answer.headers.get('content-security-policy')).toBe(CONTENT_SECURITY_POLICY);
      expect(await answer.text()).toBe('Not found');
    }
  });
});

describe('granted paths: the renderer saves only where the app can save back', () => {
  const sectionText = JSON.stringify({ format: 'sectionsmith-section', version: 2, name: 'n', unit: 'mm', materials: [], defaultMaterial: null, sections: [] });
  it('a .section.json document, or a Sectionsmith document under a plain .json name, is granted when opened', () => {
    const granted = createGrantedPaths();
    expect(granted.opened('/w/girder.section.json', sectionText)).toBe(true);
    expect(granted.opened('/w/girder.json', sectionText)).toBe(true);
    expect(granted.opened('/w/GIRDER.SECTION.JSON', sectionText)).toBe(true);
    expect(granted.has('/w/girder.section.json') && granted.has('/w/girder.json')).toBe(true);
  });

  it('a GeoJSON, a DXF or a .json that is not a Sectionsmith document is read but never granted', () => {
    const granted = createGrantedPaths();
    const geojson = '{"type":"Polygon","coordinates":[[[0,0],[1,0],[1,1],[0,0]]]}';
    expect(granted.opened('/w/deck.geojson', geojson)).toBe(false);
    expect(granted.opened('/w/deck.json', geojson)).toBe(false);
    expect(granted.opened('/w/plate.dxf', '0\nSECTION\n')).toBe(false);
    expect(granted.opened('/w/notes.json', '{"format": ')).toBe(false);
    expect(granted.opened('/w/tricky.geojson', sectionText)).toBe(false);
    for (const p of ['/w/deck.geojson', '/w/deck.json', '/w/plate.dxf', '/w/notes.json', '/w/tricky.geojson']) expect(granted.has(p)).toBe(false);
    expect(canSaveBack('/w/deck.section.json.bak', sectionText)).toBe(false);
  });

  it('a place chosen in Save As is granted', () => {
    const granted = createGrantedPaths();
    expect(granted.has('/w/new.section.json')).toBe(false);
    granted.chosen('/w/new.section.json');
    expect(granted.has('/w/new.section.json')).toBe(true);
  });
});

describe('single instance', () => {
  /** An Electron app double whose lock is held (or not) and which records quit and the second-instance listener. */
  function fakeApp(lock: boolean) {
    const log = { quit: 0, listener: null as null | ((event: unknown, argv: string[], cwd: string) => void) };
    const app: InstanceApp = {
      requestSingleInstanceLock: () => lock,
      quit: () => void (log.quit += 1),
      on: (_name, listener) => void (log.listener = listener),
    };
    return { app, log };
  }

  it('the first instance goes on and receives the command line of a later start', () => {
    const { app, log } = fakeApp(true);
    const seen: [readonly string[], string][] = [];
    expect(claimSingleInstance(app, (argv, cwd) => seen.push([argv, cwd]))).toBe(true);
    expect(log.quit).toBe(0);
    log.listener?.({}, ['/opt/Sectionsmith/sectionsmith', 'rail.section.json'], '/home/eng');
    expect(seen).toEqual([[['/opt/Sectionsmith/sectionsmith', 'rail.section.json'], '/home/eng']]);
  });

  it('a second instance quits at once and registers nothing', () => {
    const { app, log } = fakeApp(false);
    expect(claimSingleInstance(app, () => { throw new Error('not called'); })).toBe(false);
    expect(log.quit).toBe(1);
    expect(log.listener).toBeNull();
  });
});

describe('IPC channels', () => {
  it('are one list of named verbs, each with a payload schema, and no generic pipe', () => {
    expect(CHANNELS.map((c) => c.name)).toEqual([
      'document:open', 'document:open-recent', 'document:launch-file', 'document:save', 'document:save-as',
      'export:save', 'export:save-bytes', 'report:print-pdf', 'dialog:confirm-discard', 'recent:list', 'recovery:write', 'recovery:read', 'recovery:discard',
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
    const xlsx = 'application/vnd.openxmlformats-officedocument.spreadsheetml.sheet';
    expect(() => checkedArgs('export:save-bytes', [{ suggestedName: '../x.xlsx', mimeType: xlsx, bytes: new Uint8Array(2) }])).toThrow(/without folders/);
    expect(() => checkedArgs('export:save-bytes', [{ suggestedName: 'x.xlsx', mimeType: 'text/csv', bytes: new Uint8Array(2) }])).toThrow(/the XLSX type/);
    expect(() => checkedArgs('export:save-bytes', [{ suggestedName: 'x.xlsx', mimeType: xlsx, bytes: 'PK' }])).toThrow(/bytes \(a Uint8Array\)/);
    expect(checkedArgs('export:save-bytes', [{ suggestedName: 'compare.xlsx', mimeType: xlsx, bytes: new Uint8Array([80, 75]) }])).toHaveLength(1);
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
