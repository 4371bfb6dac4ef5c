// Builds the desktop app: main and preload bundled by esbuild to out/electron/ (CommonJS: a
// sandboxed preload cannot load ES modules), and the renderer by vite to dist/web.
// `node electron/build.mjs` runs it; electron/launch.mjs imports `buildDesktop`.
import { build as esbuild } from 'esbuild';
import { build as viteBuild } from 'vite';
import path from 'node:path';
import { fileURLToPath } from 'node:url';

export const ROOT = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..');
export const OUT_ELECTRON = path.join(ROOT, 'out', 'electron');
// SECTIONSMITH_WEB_OUT moves the browser build elsewhere, so two test runs on one machine do not
// overwrite each other's files.
export const WEB_ROOT = process.env.SECTIONSMITH_WEB_OUT ? path.resolve(process.env.SECTIONSMITH_WEB_OUT) : path.join(ROOT, 'dist', 'web');

export async function buildRenderer() {
  await viteBuild({ configFile: path.join(ROOT, 'renderer', 'vite.config.ts'), logLevel: 'error', build: { outDir: WEB_ROOT } });
}

export async function buildElectron() {
  await esbuild({
    entryPoints: { main: path.join(ROOT, 'electron', 'main.ts'), preload: path.join(ROOT, 'electron', 'preload.ts') },
    outdir: OUT_ELECTRON,
    outExtension: { '.js': '.cjs' },
    bundle: true,
    platform: 'node',
    format: 'cjs',
    target: 'node20',
    external: ['electron'],
    sourcemap: true,
    logLevel: 'warning',
  });
}

export async function buildDesktop() {
  await buildElectron();
  await buildRenderer();
}

if (process.argv[1] && path.resolve(process.argv[1]) === fileURLToPath(import.meta.url)) {
  await buildDesktop();
  console.log(`built ${path.relative(ROOT, OUT_ELECTRON)}/main.cjs, preload.cjs and ${path.relative(ROOT, WEB_ROOT)}/`);
}
