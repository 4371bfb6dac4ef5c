// `npm start`: builds the desktop app, then launches Electron on it. Where the Electron runtime
// binary is missing (an offline install: node_modules/electron has no dist/), says so in one line
// and serves the same app for a browser on loopback instead. Extra arguments (a document path)
// are passed to Electron.
import { spawn } from 'node:child_process';
import { existsSync, readFileSync } from 'node:fs';
import path from 'node:path';
import { buildDesktop, OUT_ELECTRON, ROOT } from './build.mjs';
import { serveWebBuild } from './serve-web.mjs';

/** The Electron binary, or null when the runtime was never downloaded. */
function electronBinary() {
  const packageDir = path.join(ROOT, 'node_modules', 'electron');
  const pathFile = path.join(packageDir, 'path.txt');
  if (!existsSync(pathFile)) return null;
  const binary = path.join(packageDir, 'dist', readFileSync(pathFile, 'utf8').trim());
  return existsSync(binary) ? binary : null;
}

await buildDesktop();
const binary = electronBinary();
if (binary) {
  const child = spawn(binary, [path.join(OUT_ELECTRON, 'main.cjs'), ...process.argv.slice(2)], { stdio: 'inherit' });
  child.on('exit', (code, signal) => process.exit(code ?? (signal ? 1 : 0)));
} else {
  const server = await serveWebBuild({ port: 5173 });
  console.log(`Electron runtime not available on this machine (offline install); serving the same app for a browser at http://localhost:${server.port}/`);
  const stop = () => void server.close().then(() => process.exit(0));
  process.on('SIGINT', stop);
  process.on('SIGTERM', stop);
}
