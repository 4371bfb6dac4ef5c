// Serves the built browser app (dist/web) on loopback with the desktop app's own headers and file
// rules (electron/window-options.ts responseHeaders, electron/app-files.ts webFileFor), so the
// browser build runs under the same CSP as the desktop window. Used by launch.mjs and the browser tests.
import { tsImport } from 'tsx/esm/api';
import { WEB_ROOT } from './build.mjs';
import { serveStatic } from './static-server.mjs';

export async function serveWebBuild({ port }) {
  const { responseHeaders } = await tsImport('./window-options.ts', import.meta.url);
  const { webFileFor } = await tsImport('./app-files.ts', import.meta.url);
  const { 'Content-Type': _type, ...headers } = responseHeaders('text/html');
  return serveStatic((pathname) => webFileFor(WEB_ROOT, pathname), { port, headers });
}
