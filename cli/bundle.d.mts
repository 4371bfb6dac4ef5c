// Types for cli/bundle.mjs (plain JavaScript so the launcher needs no TypeScript loader).
export interface BundleStamp {
  readonly recipe: number;
  readonly inputs: readonly (readonly [file: string, size: number, mtimeMs: number])[];
}
export const RECIPE: number;
export const CACHE_DIR: string;
export function stampIsCurrent(stamp: unknown, fingerprintOf: (file: string) => readonly [size: number, mtimeMs: number]): boolean;
export function bundleIsCurrent(): boolean;
export function buildBundle(): Promise<void>;
export function loadCli(): Promise<unknown>;
