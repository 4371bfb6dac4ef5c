// Builds the desktop app: main and preload bundled by esbuild to out/electron/ (CommonJS: a
// sandboxed preload cannot load ES modules), and the renderer by vite to dist/web.
// `node electron/build.mjs` runs it; electron/launch.mjs imports `buildDesktop`.
import { build as esbuild } from 'esbuild';
import { build as viteBuild } from 'vite';
import { existsSync, readdirSync, readFileSync, rmSync, statSync, writeFileSync } from 'node:fs';
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

// What the browser build is made from: its sources, the engine, the example documents, and the
// installed packages (through the lock file).
const BUILD_INPUT_FOLDERS = ['renderer', 'core', path.join('assets', 'examples')];
const BUILD_INPUT_FILES = ['package.json', 'package-lock.json', 'tsconfig.json'];
const BUILD_STAMP = '.sectionsmith-inputs.json';

/** Path, size and mtime of every input file, in a fixed order. */
function buildInputs() {
  const out = [];
  const visit = (relative) => {
    const full = path.join(ROOT, relative);
    const stat = statSync(full, { throwIfNoEntry: false });
    if (stat === undefined) return;
    if (stat.isDirectory()) {
      for (const name of readdirSync(full).sort()) visit(path.join(relative, name));
    } else out.push(`${relative} ${stat.size} ${stat.mtimeMs}`);
  };
  for (const f of [...BUILD_INPUT_FOLDERS, ...BUILD_INPUT_FILES]) visit(f);
  return out;
}

/**
 * Builds the browser app unless WEB_ROOT already holds a build of exactly these inputs (every
 * file's size and mtime, recorded beside the build). Resolves true when it built. A changed,
 * added or removed file rebuilds; SECTIONSMITH_REBUILD=1 always does.
 */
export async function buildRendererIfChanged() {
  const inputs = JSON.stringify(buildInputs());
  const stamp = path.join(WEB_ROOT, BUILD_STAMP);
  if (process.env.SECTIONSMITH_REBUILD !== '1' && existsSync(path.join(WEB_ROOT, 'index.html')) && existsSync(stamp) && readFileSync(stamp, 'utf8') === inputs) return false;
  rmSync(stamp, { force: true });
  await buildRenderer();
  writeFileSync(stamp, inputs);
  return true;
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
