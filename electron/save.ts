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
 * What the file is stays what it was:
 * - a symbolic link is followed (through every hop) and its final target is written; the link
 *   stays a link, and the backup sits beside the target;
 * - an existing file keeps its permission bits (a 0600 file stays 0600, whatever the umask);
 *   a new file gets the usual 0666 less the umask. Owner and group are not carried over.
 * - every temporary file is created exclusively ('wx', or COPYFILE_EXCL for the backup's copy)
 *   under a random name, so nothing planted in the folder (a file or a link at a guessed name)
 *   is ever opened or followed.
 *
 * Not guaranteed: durability of the folder entry on file systems that ignore directory fsync
 * (we try it and ignore EISDIR/EPERM/EINVAL where the platform refuses, as on Windows); network
 * file systems whose rename is not atomic.
 */
import { randomBytes } from 'node:crypto';
import { constants as fsConstants, promises as nodeFs } from 'node:fs';
import path from 'node:path';

/** The few file operations a save needs; tests pass a failing double to exercise each error path. */
export interface SaveFs {
  open: typeof nodeFs.open;
  rename: typeof nodeFs.rename;
  copyFile: typeof nodeFs.copyFile;
  unlink: typeof nodeFs.unlink;
  stat: typeof nodeFs.stat;
  lstat: typeof nodeFs.lstat;
  readlink: typeof nodeFs.readlink;
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
/** More hops than this through symbolic links is a loop (Linux gives up at 40 too). */
const MAX_LINK_HOPS = 40;

export const backupPathFor = (target: string): string => `${target}.bak`;

/**
 * A fresh temporary name in the target's own folder (rename across folders would not be
 * atomic): `.NAME.PID.RANDOM.sectionsmith-tmp`, 64 random bits, so no one can plant a file there
 * in advance. The pid lets a later save remove the leftovers of a killed one.
 */
export function tempPathFor(target: string, pid: number): string {
  return path.join(path.dirname(target), `.${path.basename(target)}.${pid}.${randomBytes(8).toString('hex')}${TEMP_SUFFIX}`);
}

/** True when `name` (a bare file name) is a temporary file of `target` written by process `pid`. */
export function isTempOf(target: string, name: string, pid: number): boolean {
  return tempOwner(target, name) === pid;
}

/** The pid in a temporary file name of `target` (old `.NAME.PID.sectionsmith-tmp` names too), or null. */
function tempOwner(target: string, name: string): number | null {
  const prefix = `.${path.basename(target)}.`;
  if (!name.startsWith(prefix) || !name.endsWith(TEMP_SUFFIX)) return null;
  const match = /^(\d+)(?:\.[0-9a-f]+)?$/.exec(name.slice(prefix.length, -TEMP_SUFFIX.length));
  return match ? Number(match[1]) : null;
}

/** `text` is written as UTF-8; bytes (a PDF) are written as they are. */
export async function saveAtomically(requested: string, text: string | Uint8Array, options: SaveOptions = {}): Promise<SaveOutcome> {
  const fs = options.fs ?? nodeFs;
  if (!path.isAbsolute(requested)) throw new SaveError(`Could not save "${requested}": the path is not absolute.`, undefined);
  let target = requested;
  let temp: string | null = null;
  let stage = 'follow the link to the file';
  try {
    target = await linkTarget(fs, requested);
    stage = 'write the new version';
    await removeStaleTemps(fs, target);
    const previous = await existingFile(fs, target);
    const created = await createExclusive(fs, target);
    temp = created.path;
    const bytes = await writeFlushed(created.handle, text, previous ? previous.mode & 0o7777 : null);
    let backupPath: string | null = null;
    if (previous && options.keepBackup !== false) {
      stage = 'keep the previous version as a backup';
      backupPath = backupPathFor(target);
      await copyFlushed(fs, target, backupPath);
    }
    stage = 'replace the file';
    await fs.rename(temp, target);
    temp = null;
    await flushFolder(fs, path.dirname(target));
    return { path: target, backupPath, bytes };
  } catch (error) {
    if (temp !== null) await fs.unlink(temp).catch(() => undefined);
    if (error instanceof SaveError) throw error;
    const code = errorCode(error);
    const named = target === requested ? `"${requested}"` : `"${requested}" (a link to "${target}")`;
    throw new SaveError(`Could not save ${named} (failed to ${stage}): ${reasonFor(code, error)}. The file on disk is unchanged.`, code);
  }
}

/** The file a path finally names after following every symbolic link (the path itself when it is none). */
async function linkTarget(fs: SaveFs, start: string): Promise<string> {
  let current = start;
  for (let hop = 0; hop <= MAX_LINK_HOPS; hop += 1) {
    let info;
    try {
      info = await fs.lstat(current);
    } catch (error) {
      if (errorCode(error) === 'ENOENT') return current; // a new file (or a link to one not made yet)
      throw error;
    }
    if (!info.isSymbolicLink()) return current;
    current = path.resolve(path.dirname(current), await fs.readlink(current));
  }
  throw Object.assign(new Error(`more than ${MAX_LINK_HOPS} symbolic links in a row (a loop?)`), { code: 'ELOOP' });
}

/** Opens a new temporary file exclusively; a name already taken (by chance or by plan) gets another. */
async function createExclusive(fs: SaveFs, target: string): Promise<{ path: string; handle: nodeFs.FileHandle }> {
  for (let attempt = 0; ; attempt += 1) {
    const candidate = tempPathFor(target, process.pid);
    try {
      return { path: candidate, handle: await fs.open(candidate, 'wx', 0o666) };
    } catch (error) {
      if (errorCode(error) !== 'EEXIST' || attempt >= 4) throw error;
    }
  }
}

async function writeFlushed(handle: nodeFs.FileHandle, text: string | Uint8Array, mode: number | null): Promise<number> {
  try {
    // The old file's permission bits, set explicitly: open's mode is cut down by the umask.
    if (mode !== null) await handle.chmod(mode);
    const data = typeof text === 'string' ? Buffer.from(text, 'utf8') : text;
    await handle.writeFile(data);
    // Flush before rename: otherwise a power cut can leave the renamed file empty.
    await handle.sync();
    return data.byteLength;
  } finally {
    await handle.close();
  }
}

/** Copies `from` to `to` through an exclusive temporary copy (copyFile keeps the permission bits). */
async function copyFlushed(fs: SaveFs, from: string, to: string): Promise<void> {
  const temp = tempPathFor(to, process.pid);
  try {
    await fs.copyFile(from, temp, fsConstants.COPYFILE_EXCL);
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

/** The existing file's stat, or null when there is none yet. */
async function existingFile(fs: SaveFs, target: string): Promise<{ mode: number } | null> {
  try {
    const info = await fs.stat(target);
    if (info.isDirectory()) throw new SaveError(`Could not save "${target}": a folder of that name is in the way.`, 'EISDIR');
    return info;
  } catch (error) {
    if (errorCode(error) === 'ENOENT') return null;
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
  const folder = path.dirname(target);
  let names: string[];
  try {
    names = await fs.readdir(folder);
  } catch {
    return; // the folder problem is reported by the write that follows
  }
  for (const name of names) {
    const pid = tempOwner(target, name) ?? tempOwner(backupPathFor(target), name);
    // unlink removes a planted link itself, never the file it points to.
    if (pid !== null && pid !== process.pid && !processAlive(pid)) await fs.unlink(path.join(folder, name)).catch(() => undefined);
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
  ELOOP: 'the symbolic links go round in a loop',
};

function reasonFor(code: string | undefined, error: unknown): string {
  if (code && REASONS[code]) return `${REASONS[code]} (${code})`;
  return error instanceof Error ? error.message : String(error);
}
