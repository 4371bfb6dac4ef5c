/**
 * Maps an app://sectionsmith/… request (Electron) or an http path (the loopback server of
 * static-server.mjs) to a file of the built renderer (dist/web), refusing anything outside that
 * folder and types it does not know. Plain functions so the traversal rules are unit-tested.
 */
import path from 'node:path';
import { APP_HOST, APP_SCHEME, responseHeaders } from './window-options.ts';

const CONTENT_TYPES: Readonly<Record<string, string>> = {
  '.html': 'text/html; charset=utf-8',
  '.js': 'text/javascript; charset=utf-8',
  '.mjs': 'text/javascript; charset=utf-8',
  '.css': 'text/css; charset=utf-8',
  '.json': 'application/json; charset=utf-8',
  '.svg': 'image/svg+xml',
  '.png': 'image/png',
  '.ico': 'image/x-icon',
  '.woff2': 'font/woff2',
  '.wasm': 'application/wasm',
  '.map': 'application/json; charset=utf-8',
  '.txt': 'text/plain; charset=utf-8',
};

export interface AppFile {
  readonly filePath: string;
  readonly contentType: string;
}

/** The file for `requestUrl` under `root`, or null (wrong origin, traversal, unknown type). */
export function appFileFor(root: string, requestUrl: string): AppFile | null {
  let url: URL;
  try {
    url = new URL(requestUrl);
  } catch {
    return null;
  }
  if (url.protocol !== `${APP_SCHEME}:` || url.host !== APP_HOST) return null;
  return webFileFor(root, url.pathname);
}

/** The file for a URL path (still percent-encoded) under `root`, or null (traversal, unknown type). */
export function webFileFor(root: string, encodedPath: string): AppFile | null {
  let relative: string;
  try {
    relative = decodeURIComponent(encodedPath);
  } catch {
    return null;
  }
  if (relative.includes('\0')) return null;
  if (relative === '/' || relative === '') relative = '/index.html';
  const resolvedRoot = path.resolve(root);
  const filePath = path.resolve(resolvedRoot, `.${relative}`);
  if (filePath !== resolvedRoot && !filePath.startsWith(resolvedRoot + path.sep)) return null;
  const contentType = CONTENT_TYPES[path.extname(filePath).toLowerCase()];
  return contentType ? { filePath, contentType } : null;
}

/**
 * The handler main gives to protocol.handle('app', …): the file of webFileFor's rules with the
 * app's headers (the CSP) on every answer, and a 404 that carries them too. `fetchFile` reads a
 * file by path (main: net.fetch of its file: URL; tests: a plain read).
 */
export function appProtocolHandler(root: string, fetchFile: (filePath: string) => Promise<Response>): (request: { readonly url: string }) => Promise<Response> {
  const notFound = (): Response => new Response('Not found', { status: 404, headers: responseHeaders('text/plain; charset=utf-8') });
  return async (request) => {
    const file = appFileFor(root, request.url);
    if (!file) return notFound();
    const response = await fetchFile(file.filePath).catch(() => null);
    if (!response?.ok) return notFound();
    return new Response(response.body, { status: 200, headers: responseHeaders(file.contentType) });
  };
}
