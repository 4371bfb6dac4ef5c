// A tiny static file server for the built browser app (dist/web), loopback only: used by
// `npm start` when the Electron runtime is missing, and by the browser tests. GET and HEAD only.
// Which file a path names (and the refusal of paths outside the root) is decided by the resolver
// it is given: electron/app-files.ts `webFileFor`, the same rules as the desktop app:// protocol.
// Every response carries the headers it is given (the CSP).
import { createServer } from 'node:http';
import { promises as fs } from 'node:fs';

/**
 * Serves files named by `resolveFile(encodedPathname) → { filePath, contentType } | null` on
 * 127.0.0.1 (and ::1 where present), from `port` upwards; resolves { port, close }.
 */
export async function serveStatic(resolveFile, { port = 5173, headers = {}, maxTries = 20 } = {}) {
  const handler = async (request, response) => {
    if (request.method !== 'GET' && request.method !== 'HEAD') {
      response.writeHead(405, { Allow: 'GET, HEAD', ...headers }).end();
      return;
    }
    const pathname = (request.url ?? '/').split(/[?#]/)[0];
    const file = resolveFile(pathname);
    const body = file ? await fs.readFile(file.filePath).catch(() => null) : null;
    if (!body) {
      response.writeHead(404, { 'Content-Type': 'text/plain; charset=utf-8', ...headers }).end('Not found');
      return;
    }
    response.writeHead(200, { 'Content-Type': file.contentType, 'Content-Length': body.length, 'Cache-Control': 'no-cache', 'X-Content-Type-Options': 'nosniff', ...headers });
    response.end(request.method === 'HEAD' ? undefined : body);
  };
  const listen = (server, host, p) => new Promise((resolve, reject) => {
    server.once('error', reject);
    server.listen(p, host, () => resolve(server));
  });
  for (let p = port; p < port + maxTries; p += 1) {
    const v4 = createServer(handler);
    try {
      await listen(v4, '127.0.0.1', p);
    } catch (error) {
      if (error.code === 'EADDRINUSE') continue;
      throw error;
    }
    // "localhost" may resolve to ::1 first; serve there too where the machine has IPv6.
    const v6 = await listen(createServer(handler), '::1', p).catch(() => null);
    return {
      port: p,
      close: () => Promise.all([v4, v6].filter(Boolean).map((s) => new Promise((r) => { s.closeAllConnections?.(); s.close(() => r()); }))),
    };
  }
  throw new Error(`no free port from ${port} to ${port + maxTries - 1} on 127.0.0.1`);
}
