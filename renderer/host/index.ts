/**
 * The renderer's one way to its host: the Electron preload's `window.sectionsmithHost` when the
 * page runs in the desktop app, otherwise the browser host (created once).
 */
import { createBrowserHost, type BrowserHost } from './browser-host.ts';
import type { Host } from './host.ts';

declare global {
  interface Window {
    /** Exposed by electron/preload.ts through contextBridge; absent in a plain browser. */
    readonly sectionsmithHost?: Host;
  }
}

let browserHost: BrowserHost | null = null;

export function getHost(): Host {
  if (window.sectionsmithHost) return window.sectionsmithHost;
  browserHost ??= createBrowserHost(window);
  return browserHost;
}

/** The browser host, for UI that replaces its confirm dialog; null inside Electron. */
export function getBrowserHost(): BrowserHost | null {
  if (window.sectionsmithHost) return null;
  browserHost ??= createBrowserHost(window);
  return browserHost;
}

export type { BrowserHost } from './browser-host.ts';
export * from './host.ts';
