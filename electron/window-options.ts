/**
 * The secure settings of the desktop window, written out in one place and asserted literally in
 * tests/electron/security.test.ts (STYLE.md §13). Nothing here imports Electron at run time.
 *
 * - The page runs with contextIsolation, the Chromium sandbox, no Node integration and web
 *   security on; its only bridge is the preload's named functions (electron/preload.ts).
 * - The app is served from the custom protocol app://sectionsmith/ (registered standard + secure),
 *   never from file://, with a strict Content-Security-Policy on every response.
 * - Navigation away from the app, new windows and every permission request are denied.
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

export function windowOptions(preloadPath: string): BrowserWindowConstructorOptions {
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
      devTools: true,
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
