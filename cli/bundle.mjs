// The command-line tool's start-up: cli/main.ts and what it imports, bundled by esbuild into one
// ES module under node_modules/.cache/sectionsmith-cli/, so a run does not pay for compiling
// TypeScript module by module (tsx alone takes about half a second before main.ts starts).
//
// The bundle is rebuilt whenever it could be stale: esbuild's metafile lists every input
// (our sources and the libraries they import) and we keep each one's size and mtime beside the
// bundle; one stat per input on every run tells whether anything changed. A bundle is written to
// a temporary name and renamed, so runs started together never read half a file. If the bundle
// cannot be built or stored (no esbuild, read-only install), `loadCli` returns null and the
// launcher falls back to running the sources through tsx.
import { mkdirSync, readFileSync, renameSync, statSync, writeFileSync } from 'node:fs';
import path from 'node:path';
import { fileURLToPath, pathToFileURL } from 'node:url';

const ROOT = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..');
const ENTRY = path.join(ROOT, 'cli', 'main.ts');
export const CACHE_DIR = path.join(ROOT, 'node_modules', '.cache', 'sectionsmith-cli');
const BUNDLE = path.join(CACHE_DIR, 'cli.mjs');
const STAMP = path.join(CACHE_DIR, 'inputs.json');
/** Changes to this file or the esbuild options below must also invalidate old bundles. */
export const RECIPE = 2;

function fingerprint(file) {
  const s = statSync(file);
  return [s.size, s.mtimeMs];
}

/**
 * True when `stamp` (as stored beside a bundle) lists the same inputs, sizes and mtimes that
 * `fingerprintOf(file)` gives now; false for any mismatch, a missing file, or a stamp of another recipe.
 */
export function stampIsCurrent(stamp, fingerprintOf) {
  if (stamp?.recipe !== RECIPE || !Array.isArray(stamp.inputs) || stamp.inputs.length === 0) return false;
  try {
    for (const [file, size, mtimeMs] of stamp.inputs) {
      const [s, m] = fingerprintOf(file);
      if (s !== size || m !== mtimeMs) return false;
    }
  } catch {
    return false;
  }
  return true;
}

/** True when the stored bundle was built from exactly the files now on disk. */
export function bundleIsCurrent() {
  try {
    statSync(BUNDLE);
    return stampIsCurrent(JSON.parse(readFileSync(STAMP, 'utf8')), (file) => fingerprint(path.join(ROOT, file)));
  } catch {
    return false;
  }
}

/** Builds the bundle and its stamp; throws when esbuild is missing or fails. */
export async function buildBundle() {
  const { build } = await import('esbuild');
  const started = Date.now();
  const result = await build({
    entryPoints: [ENTRY],
    bundle: true,
    platform: 'node',
    format: 'esm',
    target: 'node20',
    write: false,
    metafile: true,
    logLevel: 'silent',
    tsconfig: path.join(ROOT, 'tsconfig.json'),
    // main.ts finds package.json next to its own folder; keep that true inside the bundle.
    define: { 'import.meta.url': JSON.stringify(pathToFileURL(ENTRY).href) },
    // Some libraries are CommonJS and call require(); give the ES module bundle one.
    banner: { js: "import { createRequire as __sectionsmithRequire } from 'node:module'; const require = __sectionsmithRequire(import.meta.url);" },
  });
  const code = result.outputFiles[0]?.text;
  if (code === undefined) throw new Error('esbuild produced no output');
  const inputs = Object.keys(result.metafile.inputs).map((file) => [file, ...fingerprint(path.join(ROOT, file))]);
  // A source saved while esbuild read it may be newer than what was bundled: do not trust this build.
  const edited = inputs.find(([, , mtimeMs]) => mtimeMs >= started - 2000);
  if (edited) throw new Error(`${edited[0]} changed while the command-line tool was being bundled`);
  mkdirSync(CACHE_DIR, { recursive: true });
  const unique = `.${process.pid}.${Date.now()}`;
  writeFileSync(BUNDLE + unique, code);
  renameSync(BUNDLE + unique, BUNDLE);
  writeFileSync(STAMP + unique, JSON.stringify({ recipe: RECIPE, inputs }));
  renameSync(STAMP + unique, STAMP);
}

/** The bundled cli/main.ts module, built first if needed; null when bundling is not possible here. */
export async function loadCli() {
  if (process.env.SECTIONSMITH_NO_BUNDLE === '1') return null;
  try {
    if (!bundleIsCurrent()) await buildBundle();
    return await import(pathToFileURL(BUNDLE).href);
  } catch {
    return null;
  }
}
