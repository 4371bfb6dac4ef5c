/**
 * The document path given on the command line, if any: `sectionsmith bridge.section.json`,
 * `electron out/electron/main.cjs bridge.section.json` in development, or the path the OS passes
 * when a .section.json file is opened from the file manager. Flags (-x, --x) and the app's own
 * entry script are skipped; the first remaining argument ending in .json or .geojson is taken,
 * resolved against the working folder.
 */
import path from 'node:path';

export function documentPathFromArgv(argv: readonly string[], cwd: string, defaultApp: boolean): string | null {
  // argv[0] is the executable; in development (defaultApp) argv[1] is the entry script.
  const args = argv.slice(defaultApp ? 2 : 1);
  const candidate = args.find((arg) => !arg.startsWith('-') && /\.(geo)?json$/i.test(arg));
  return candidate ? path.resolve(cwd, candidate) : null;
}
