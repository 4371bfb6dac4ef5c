// A tiny static file server for the built browser app (dist/web), loopback only: used by
// `npm start` when the Electron runtime is missing, and by the browser tests. GET and HEAD only;
// paths outside the root are refused; every response carries the headers it is given (the CSP).
import { createServer } from 'node:http';
import { promises as fs } from 'node:fs';
import path from 'node:path';

const TYPES = {
  '.html': 'text/html; charset=utf-8', '.js': 'text/javascript; charset=utf-8', '.mjs': 'text/javascript; charset=utf-8',
  '.css': 'text/css; charset=utf-8', '.json': 'application/json; charset=utf-8', '.svg': 'image/svg+xml',
  '.png': 'image/png', '.ico': 'image/x-icon', '.woff2': 'font/woff2', '.wasm': 'application/wasm',
  '.map': 'application/json; charset=utf-8', '.txt': 'text/plain; charset=utf-8',
};

function fileFor(root, url) {
  let pathname;
  try {
    pathname = decodeURIComponent(new URL(url, 'http://localhost').pathname);
  } catch {
    return null;
  }
  if (pathname.includes('\0')) return null;
  const file = path.resolve(root, `.${pathname === '/' ? '/index.html' : pathname}`);
  return file === root || file.startsWith(root + path.sep) ? file : null;
}

/** Serves `root` on 127.0.0.1 (and ::1 where present) from `port` upwards; resolves { port, close }. */
export async function serveStatic(root, { port = 5173, headers = {}, maxTries = 20 } = {}) {
  const resolvedRoot = path.resolve(root);
  const handler = async (request, response) => {
    if (request.method !== 'GET' && request.method !== 'HEAD') {
      response.writeHead(405, { Allow: 'GET, HEAD', ...headers }).end();
      return;
    }
    const file = fileFor(resolvedRoot, request.url ?? '/');
    const body = file ? await fs.readFile(file).catch(() => null) : null;
    if (!body) {
      response.writeHead(404, { 'Content-Type': 'text/plain; charset=utf-8', ...headers }).end('Not found');
      return;
    }
    const type = TYPES[path.extname(file).toLowerCase()] ?? 'application/octet-stream';
    response.writeHead(200, { 'Content-Type': type, 'Content-Length': body.length, 'Cache-Control': 'no-cache', 'X-Content-Type-Options': 'nosniff', ...headers });
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
