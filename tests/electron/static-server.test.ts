import { mkdirSync, mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { request } from 'node:http';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { webFileFor } from '../../electron/app-files.ts';
import { serveStatic, type StaticServer } from '../../electron/static-server.mjs';

let folder = '';
let server: StaticServer;

/** A raw GET (no URL normalisation, unlike fetch), so "../" reaches the server as written. */
function get(rawPath: string, method = 'GET'): Promise<{ status: number; headers: Record<string, unknown>; body: string }> {
  return new Promise((resolve, reject) => {
    const req = request({ host: '127.0.0.1', port: server.port, path: rawPath, method }, (res) => {
      let body = '';
      res.setEncoding('utf8').on('data', (c: string) => (body += c)).on('end', () => resolve({ status: res.statusCode ?? 0, headers: res.headers, body }));
    });
    req.on('error', reject);
    req.end();
  });
}

beforeAll(async () => {
  folder = mkdtempSync(path.join(tmpdir(), 'sectionsmith-static-'));
  mkdirSync(path.join(folder, 'web', 'assets'), { recursive: true });
  writeFileSync(path.join(folder, 'web', 'index.html'), '<!doctype html><title>app</title>');
  writeFileSync(path.join(folder, 'web', 'assets', 'a.js'), 'export {}');
  writeFileSync(path.join(folder, 'secret.txt'), 'outside the root');
  server = await serveStatic((pathname) => webFileFor(path.join(folder, 'web'), pathname), { port: 4391, headers: { 'Content-Security-Policy': "default-src 'none'" } });
});
afterAll(async () => {
  await server.close();
  rmSync(folder, { recursive: true, force: true });
});

describe('static server for the browser build', () => {
  it('serves index.html at / and files with their content type and the given CSP header', async () => {
    const index = await get('/');
    expect(index.status).toBe(200);
    expect(index.body).toContain('<title>app</title>');
    expect(index.headers['content-security-policy']).toBe("default-src 'none'");
    const script = await get('/assets/a.js');
    expect(script.headers['content-type']).toBe('text/javascript; charset=utf-8');
  });

  it('refuses paths outside its root, plain or percent-encoded, and methods other than GET and HEAD', async () => {
    expect((await get('/../secret.txt')).status).toBe(404);
    expect((await get('/%2e%2e/secret.txt')).status).toBe(404);
    expect((await get('/assets/..%2f..%2fsecret.txt')).status).toBe(404);
    expect((await get('/', 'POST')).status).toBe(405);
  });
});
