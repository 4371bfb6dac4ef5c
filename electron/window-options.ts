/**
 * The secure settings of the desktop window, written out in one place and asserted literally in
 * tests/electron/security.test.ts (STYLE.md §13). Nothing here imports Electron at run time.
 *
 * - The page runs with contextIsolation, the Chromium sandbox, no Node integration and web
 *   security on; its only bridge is the preload's named functions (electron/preload.ts).
 * - The app is served from the custom protocol app://sectionsmith/ (registered standard + secure),
 *   never from file://, with a strict Content-Security-Policy on every response.
 * - Navigation away from the app, new windows and every permission request are denied
 *   (`lockDown` on every web contents, `applySessionPolicy` on the session).
 * - Developer tools are there in development only; a packaged build has none.
 */
import type { BrowserWindowConstructorOptions, CustomScheme } from 'electron';

export const APP_SCHEME = 'app';
export const APP_HOST = 'sectionsmith';
export const APP_ORIGIN = `${APP_SCHEME}://${APP_HOST}`;
export const APP_ENTRY_URL = `${APP_ORIGIN}/index.html`;

/**
 * Only the app's own files; no inline or eval'd script, no plugins, no framing, no form posts,
 * no network. Styles allow 'unsafe-inline' only because React sets style attributes; scripts never do.
 */
export const CONTENT_SECURITY_POLICY = [
  "default-src 'none'",
  "script-src 'self'",
  "style-src 'self' 'unsafe-inline'",
  "img-src 'self' data: blob:",
  "font-src 'self'",
  "connect-src 'self'",
  "worker-src 'self'",
  "manifest-src 'self'",
  "object-src 'none'",
  "base-uri 'none'",
  "form-action 'none'",
  "frame-ancestors 'none'",
].join('; ');

/** For protocol.registerSchemesAsPrivileged, before the app is ready. */
export const PRIVILEGED_SCHEMES: readonly CustomScheme[] = [
  { scheme: APP_SCHEME, privileges: { standard: true, secure: true, supportFetchAPI: true, codeCache: true } },
];

export interface WindowChoices {
  /** Developer tools: true only when running from the source tree (`!app.isPackaged`). Default false. */
  readonly devTools?: boolean;
}

export function windowOptions(preloadPath: string, choices: WindowChoices = {}): BrowserWindowConstructorOptions {
  return {
    width: 1400,
    height: 900,
    minWidth: 800,
    minHeight: 560,
    show: false,
    title: 'Sectionsmith',
    backgroundColor: '#ffffff',
    webPreferences: {
      preload: preloadPath,
      contextIsolation: true,
      sandbox: true,
      nodeIntegration: false,
      nodeIntegrationInWorker: false,
      nodeIntegrationInSubFrames: false,
      webSecurity: true,
      allowRunningInsecureContent: false,
      experimentalFeatures: false,
      webviewTag: false,
      navigateOnDragDrop: false,
      spellcheck: false,
      devTools: choices.devTools === true,
    },
  };
}

/** True for a URL of the app itself (the only origin allowed to talk to main or be shown). */
export function isAppUrl(url: string): boolean {
  try {
    const parsed = new URL(url);
    return parsed.protocol === `${APP_SCHEME}:` && parsed.host === APP_HOST;
  } catch {
    return false;
  }
}

/** will-navigate: the page may reload itself, but never go anywhere else. */
export function isNavigationAllowed(url: string): boolean {
  return isAppUrl(url);
}

/** setWindowOpenHandler: no new windows, ever (links to the web are not part of the app). */
export const denyWindowOpen = (): { action: 'deny' } => ({ action: 'deny' });

/** setPermissionRequestHandler / setPermissionCheckHandler: camera, notifications, … all refused. */
export const denyPermissionRequest = (_webContents: unknown, _permission: string, callback: (granted: boolean) => void): void => callback(false);
export const denyPermissionCheck = (): boolean => false;

/** Headers added to every app:// response. */
export function responseHeaders(contentType: string): Record<string, string> {
  return {
    'Content-Type': contentType,
    'Content-Security-Policy': CONTENT_SECURITY_POLICY,
    'X-Content-Type-Options': 'nosniff',
    'Cross-Origin-Opener-Policy': 'same-origin',
    'Referrer-Policy': 'no-referrer',
  };
}

/** The few parts of a WebContents that lockDown uses (Electron's own type satisfies it). */
export interface LockableContents {
  on(event: 'will-navigate' | 'will-redirect', listener: (event: { preventDefault(): void }, url: string) => void): unknown;
  on(event: 'will-attach-webview', listener: (event: { preventDefault(): void }) => void): unknown;
  setWindowOpenHandler(handler: () => { action: 'deny' }): void;
}

/**
 * Applied to every web contents when it is created (app 'web-contents-created'): it may reload
 * the app but never navigate or redirect anywhere else, never attach a webview, never open a window.
 */
export function lockDown(contents: LockableContents): void {
  contents.on('will-navigate', (event, url) => {
    if (!isNavigationAllowed(url)) event.preventDefault();
  });
  contents.on('will-redirect', (event, url) => {
    if (!isNavigationAllowed(url)) event.preventDefault();
  });
  contents.on('will-attach-webview', (event) => event.preventDefault());
  contents.setWindowOpenHandler(denyWindowOpen);
}

/** The parts of an Electron Session whose permission answers we set. */
export interface PermissionSession {
  setPermissionRequestHandler(handler: typeof denyPermissionRequest): void;
  setPermissionCheckHandler(handler: typeof denyPermissionCheck): void;
}

/** Every permission request and check of the session is refused. */
export function applySessionPolicy(session: PermissionSession): void {
  session.setPermissionRequestHandler(denyPermissionRequest);
  session.setPermissionCheckHandler(denyPermissionCheck);
}
