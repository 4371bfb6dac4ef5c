/**
 * Atomic save for the desktop host (main process only).
 *
 * Contract: after `saveAtomically(path, text)` returns, `path` holds exactly `text`; if it throws,
 * `path` still holds exactly what it held before (or still does not exist). At no moment, not
 * even if the process is killed half way, does `path` hold a partial file: the new text is
 * written to a temporary file in the same folder, flushed to disk (fsync), and then renamed over
 * the target, and rename within one folder is atomic on POSIX file systems and on NTFS.
 * The previous version is kept as `NAME.bak`, itself replaced by copy + fsync + rename, so the
 * backup is never partial either.
 *
 * Not guaranteed: durability of the folder entry on file systems that ignore directory fsync
 * (we try it and ignore EISDIR/EPERM/EINVAL where the platform refuses, as on Windows); network
 * file systems whose rename is not atomic.
 */
import { promises as nodeFs } from 'node:fs';
import path from 'node:path';

/** The few file operations a save needs; tests pass a failing double to exercise each error path. */
export interface SaveFs {
  open: typeof nodeFs.open;
  rename: typeof nodeFs.rename;
  copyFile: typeof nodeFs.copyFile;
  unlink: typeof nodeFs.unlink;
  stat: typeof nodeFs.stat;
  readdir: typeof nodeFs.readdir;
}

export interface SaveOutcome {
  readonly path: string;
  /** Where the previous version now is, or null when there was no previous file. */
  readonly backupPath: string | null;
  readonly bytes: number;
}

/** A save that did not happen; `message` says why in plain words and names the file. */
export class SaveError extends Error {
  override readonly name = 'SaveError';
  constructor(message: string, readonly code: string | undefined) {
    super(message);
  }
}

export interface SaveOptions {
  /** Keep the previous version as NAME.bak (documents: yes; exports: no). Default true. */
  readonly keepBackup?: boolean;
  readonly fs?: SaveFs;
}

const TEMP_SUFFIX = '.sectionsmith-tmp';

export const backupPathFor = (target: string): string => `${target}.bak`;

/** Temporary name in the target's own folder (rename across folders would not be atomic). */
export function tempPathFor(target: string, pid: number): string {
  return path.join(path.dirname(target), `.${path.basename(target)}.${pid}${TEMP_SUFFIX}`);
}

/** `text` is written as UTF-8; bytes (a PDF) are written as they are. */
export async function saveAtomically(target: string, text: string | Uint8Array, options: SaveOptions = {}): Promise<SaveOutcome> {
  const fs = options.fs ?? nodeFs;
  if (!path.isAbsolute(target)) throw new SaveError(`Could not save "${target}": the path is not absolute.`, undefined);
  const temp = tempPathFor(target, process.pid);
  let stage = 'write the new version';
  try {
    await removeStaleTemps(fs, target);
    const bytes = await writeFlushed(fs, temp, text);
    const previous = await existingFile(fs, target);
    let backupPath: string | null = null;
    if (previous && options.keepBackup !== false) {
      stage = 'keep the previous version as a backup';
      backupPath = backupPathFor(target);
      await copyFlushed(fs, target, backupPath);
    }
    stage = 'replace the file';
    await fs.rename(temp, target);
    await flushFolder(fs, path.dirname(target));
    return { path: target, backupPath, bytes };
  } catch (error) {
    await fs.unlink(temp).catch(() => undefined);
    if (error instanceof SaveError) throw error;
    const code = errorCode(error);
    throw new SaveError(`Could not save "${target}" (failed to ${stage}): ${reasonFor(code, error)}. The file on disk is unchanged.`, code);
  }
}

async function writeFlushed(fs: SaveFs, file: string, text: string | Uint8Array): Promise<number> {
  const handle = await fs.open(file, 'w', 0o644);
  try {
    const data = typeof text === 'string' ? Buffer.from(text, 'utf8') : text;
    await handle.writeFile(data);
    // Flush before rename: otherwise a power cut can leave the renamed file empty.
    await handle.sync();
    return data.byteLength;
  } finally {
    await handle.close();
  }
}

async function copyFlushed(fs: SaveFs, from: string, to: string): Promise<void> {
  const temp = `${to}.${process.pid}${TEMP_SUFFIX}`;
  try {
    await fs.copyFile(from, temp);
    const handle = await fs.open(temp, 'r+');
    try {
      await handle.sync();
    } finally {
      await handle.close();
    }
    await fs.rename(temp, to);
  } catch (error) {
    await fs.unlink(temp).catch(() => undefined);
    throw error;
  }
}

async function existingFile(fs: SaveFs, target: string): Promise<boolean> {
  try {
    const info = await fs.stat(target);
    if (info.isDirectory()) throw new SaveError(`Could not save "${target}": a folder of that name is in the way.`, 'EISDIR');
    return true;
  } catch (error) {
    if (errorCode(error) === 'ENOENT') return false;
    throw error;
  }
}

async function flushFolder(fs: SaveFs, folder: string): Promise<void> {
  try {
    const handle = await fs.open(folder, 'r');
    try {
      await handle.sync();
    } finally {
      await handle.close();
    }
  } catch (error) {
    // Windows cannot open or fsync a folder; the rename has happened either way.
    if (!['EISDIR', 'EPERM', 'EINVAL', 'EACCES'].includes(errorCode(error) ?? '')) throw error;
  }
}

/** Temp files left by a save that was killed (its process is gone) are removed; live ones are left alone. */
async function removeStaleTemps(fs: SaveFs, target: string): Promise<void> {
  const prefix = `.${path.basename(target)}.`;
  let names: string[];
  try {
    names = await fs.readdir(path.dirname(target));
  } catch {
    return; // the folder problem is reported by the write that follows
  }
  for (const name of names) {
    if (!name.startsWith(prefix) || !name.endsWith(TEMP_SUFFIX)) continue;
    const pid = Number(name.slice(prefix.length, -TEMP_SUFFIX.length));
    if (Number.isInteger(pid) && pid !== process.pid && !processAlive(pid)) {
      await fs.unlink(path.join(path.dirname(target), name)).catch(() => undefined);
    }
  }
}

function processAlive(pid: number): boolean {
  try {
    process.kill(pid, 0);
    return true;
  } catch (error) {
    return errorCode(error) === 'EPERM';
  }
}

export function errorCode(error: unknown): string | undefined {
  if (typeof error === 'object' && error !== null && 'code' in error && typeof error.code === 'string') return error.code;
  return undefined;
}

const REASONS: Readonly<Record<string, string>> = {
  EACCES: 'permission denied',
  EPERM: 'the operation is not permitted',
  ENOSPC: 'the disk is full',
  EDQUOT: 'the disk quota is used up',
  EROFS: 'the disk is read-only',
  ENOENT: 'the folder does not exist',
  ENOTDIR: 'a part of the path is a file, not a folder',
  EISDIR: 'a folder of that name is in the way',
  EBUSY: 'the file is locked by another program',
  EMFILE: 'too many files are open',
  ENAMETOOLONG: 'the file name is too long',
  EIO: 'the disk reported an input/output error',
};

function reasonFor(code: string | undefined, error: unknown): string {
  if (code && REASONS[code]) return `${REASONS[code]} (${code})`;
  return error instanceof Error ? error.message : String(error);
}
