// Which Chromium the browser tests drive, chosen by launching it, not by finding a file.
//
// 1. Debian's chromium (/usr/bin/chromium), when it is there and launches.
// 2. Otherwise the headless Chromium inside the @sparticuz/chromium dev dependency (brotli-packed
//    in its npm tarball, so `npm ci` brings it and nothing is downloaded). The first launch unpacks
//    it into node_modules/.cache/sectionsmith-chromium/VERSION/ (about 7 s on an idle machine;
//    later runs reuse it). It brings the few shared libraries it needs (NSS, NSPR, expat) and a
//    font, so it runs on a machine with no browser packages at all.
//
// SECTIONSMITH_BROWSER chooses instead: `npm` (the packaged Chromium only), `system` (Debian's
// only), or the path of a Chromium executable. Whatever is chosen must launch, or the run stops
// with the reason.
import { existsSync, mkdirSync, readFileSync, renameSync, rmSync, writeFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import path from 'node:path';
import { chromium } from 'playwright-core';
import { ROOT } from '../../electron/build.mjs';

export const SYSTEM_CHROMIUM = '/usr/bin/chromium';
export const CHROMIUM_ARGS = ['--headless', '--no-sandbox', '--disable-gpu', '--disable-background-networking', '--disable-component-update', '--disable-sync', '--no-first-run', '--disable-quic'];
const LAUNCH_TIMEOUT_MS = 60_000;

/**
 * Launches the browser the tests use; resolves { browser, name, launchMs }.
 * `choice` is SECTIONSMITH_BROWSER's value (undefined: system if it launches, else npm).
 */
export async function launchTestBrowser(choice = process.env.SECTIONSMITH_BROWSER) {
  const started = performance.now();
  const done = (browser, name) => ({ browser, name, launchMs: Math.round(performance.now() - started) });
  if (choice === 'npm') return done(await launchPackaged(), packagedName());
  if (choice === 'system') return done(await launchExecutable(SYSTEM_CHROMIUM), `Debian chromium (${SYSTEM_CHROMIUM})`);
  if (choice) return done(await launchExecutable(path.resolve(choice)), choice);
  let systemFailure = `${SYSTEM_CHROMIUM} is not installed`;
  if (existsSync(SYSTEM_CHROMIUM)) {
    try {
      return done(await launchExecutable(SYSTEM_CHROMIUM), `Debian chromium (${SYSTEM_CHROMIUM})`);
    } catch (error) {
      systemFailure = `${SYSTEM_CHROMIUM} did not launch (${firstLine(error)})`;
    }
  }
  try {
    return done(await launchPackaged(), `${packagedName()}; ${systemFailure}`);
  } catch (error) {
    throw new Error(`no Chromium launched: ${systemFailure}, and the one in @sparticuz/chromium failed too (${firstLine(error)}). Run \`npm ci\` again, or set SECTIONSMITH_BROWSER to a Chromium executable.`);
  }
}

/** A Chromium executable by path, with the tests' flags; throws when it does not launch. */
async function launchExecutable(executablePath, env) {
  if (!existsSync(executablePath)) throw new Error(`${executablePath} does not exist`);
  return chromium.launch({ executablePath, args: CHROMIUM_ARGS, headless: true, timeout: LAUNCH_TIMEOUT_MS, ...(env ? { env } : {}) });
}

const require = createRequire(import.meta.url);
// The package exports only its entry (build/index.js); its folder is two levels up from there.
const packageFolder = () => path.resolve(path.dirname(require.resolve('@sparticuz/chromium')), '..');
const packagedVersion = () => JSON.parse(readFileSync(path.join(packageFolder(), 'package.json'), 'utf8')).version;
const packagedName = () => `Chromium from @sparticuz/chromium ${packagedVersion()}`;

/** The packaged Chromium, unpacked on first use, launched with its own libraries and fonts. */
async function launchPackaged() {
  const folder = await unpackedChromium();
  return launchExecutable(path.join(folder, 'chromium'), {
    ...process.env,
    LD_LIBRARY_PATH: [path.join(folder, 'al2023', 'lib'), process.env.LD_LIBRARY_PATH].filter(Boolean).join(':'),
    FONTCONFIG_PATH: path.join(folder, 'fontconfig'),
  });
}

/**
 * node_modules/.cache/sectionsmith-chromium/VERSION/ with chromium, its GL libraries, al2023/lib
 * (NSS, NSPR, expat) and fonts/. Unpacked into a private folder first and renamed into place, so
 * two test runs starting together never see a half-unpacked browser.
 */
export async function unpackedChromium() {
  const cache = path.join(ROOT, 'node_modules', '.cache', 'sectionsmith-chromium');
  const folder = path.join(cache, packagedVersion());
  if (existsSync(path.join(folder, 'complete'))) return folder;
  const { inflate } = await import('@sparticuz/chromium');
  const staging = path.join(cache, `.unpacking-${process.pid}`);
  rmSync(staging, { recursive: true, force: true });
  mkdirSync(staging, { recursive: true });
  const bin = path.join(packageFolder(), 'bin');
  // inflate() unpacks into os.tmpdir(), which it reads once, synchronously, when called: point
  // TMPDIR at the staging folder for exactly those calls.
  const saved = process.env.TMPDIR;
  const pending = [];
  try {
    process.env.TMPDIR = staging;
    for (const archive of ['chromium.br', 'swiftshader.tar.br', 'al2023.tar.br', 'fonts.tar.br']) pending.push(inflate(path.join(bin, archive)));
  } finally {
    if (saved === undefined) delete process.env.TMPDIR;
    else process.env.TMPDIR = saved;
  }
  await Promise.all(pending);
  // The package's fonts.conf names Lambda's folders; ours names the unpacked font and the system's.
  mkdirSync(path.join(staging, 'fontconfig'));
  writeFileSync(path.join(staging, 'fontconfig', 'fonts.conf'), [
    '<?xml version="1.0"?>',
    '<!DOCTYPE fontconfig SYSTEM "fonts.dtd">',
    '<fontconfig>',
    `  <dir>${path.join(folder, 'fonts', 'fonts')}</dir>`,
    '  <dir>/usr/share/fonts</dir>',
    '  <dir>/usr/local/share/fonts</dir>',
    `  <cachedir>${path.join(folder, 'fontconfig', 'cache')}</cachedir>`,
    '</fontconfig>',
    '',
  ].join('\n'));
  writeFileSync(path.join(staging, 'complete'), `${packagedName()}\n`);
  // Only a rename puts a folder there, with 'complete' in it; anything else is a broken leftover.
  if (existsSync(folder) && !existsSync(path.join(folder, 'complete'))) rmSync(folder, { recursive: true, force: true });
  try {
    renameSync(staging, folder);
  } catch (error) {
    rmSync(staging, { recursive: true, force: true });
    // Another run finished first: use its copy. An old incomplete folder is replaced.
    if (existsSync(path.join(folder, 'complete'))) return folder;
    throw error;
  }
  return folder;
}

const firstLine = (error) => String(error instanceof Error ? error.message : error).split('\n')[0];
