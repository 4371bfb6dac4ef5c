/**
 * Crash recovery for the desktop host (main process only).
 *
 * While a document has unsaved changes the renderer hands its text over after each change (the
 * host contract: debounced by the caller); `createRecoveryStore` writes it to this window's own
 * recovery file in the app's data folder, `unsaved-ID.section.json`, atomically (saveAtomically
 * without backup), so a kill leaves either the previous recovery text or the new one, never a
 * partial file. A clean save or a clean exit removes this window's file and no other.
 *
 * Each window gets a fresh random ID, so no window, and no second instance of the app, can ever
 * overwrite or remove another one's copy. On the next start every copy that is not this window's
 * own is offered (`leftBehind`); main holds the single-instance lock (electron/instance.ts), so
 * no other live window writes into the folder at the same time, and every other copy was left by
 * a session that ended without saving. A copy leaves the folder only when the user has answered
 * for it (`discard`: restored into this window, whose own copy now holds it, or thrown away).
 * The single file of earlier versions, unsaved-work.section.json, is offered the same way.
 *
 * `createDebouncedWriter` is the "shortly after each change" timer for callers without their own:
 * a change is written at most `delayMs` after it was made (the latest text wins, so a burst of
 * changes costs one write), and `flush` writes what is pending at once.
 */
import { randomBytes } from 'node:crypto';
import { promises as nodeFs } from 'node:fs';
import path from 'node:path';
import { errorCode, saveAtomically } from './save.ts';

const PREFIX = 'unsaved-';
const SUFFIX = '.section.json';
/** What an ID may contain: it becomes part of a file name, and the renderer hands it back. */
const ID_PATTERN = /^[0-9a-z][0-9a-z-]{0,63}$/;

/** The file of a recovery copy; the earlier versions' one file is the copy with ID "work". */
export const recoveryFileName = (id: string): string => `${PREFIX}${id}${SUFFIX}`;
export const isRecoveryId = (id: string): boolean => ID_PATTERN.test(id);

/** A fresh window ID: time first (so names sort by age), then 48 random bits. */
export const newRecoveryId = (): string => `${Date.now().toString(36)}-${randomBytes(6).toString('hex')}`;

/** A copy left by a window that did not end cleanly. */
export interface RecoveryCopy {
  readonly id: string;
  readonly text: string;
  /** When it was last written (ms since 1970, the file's modification time). */
  readonly savedAt: number;
}

export interface RecoveryStore {
  /** This window's ID and file. */
  readonly id: string;
  readonly path: string;
  /** Replace this window's copy. */
  write(text: string): Promise<void>;
  /** This window's own copy, or null. */
  read(): Promise<string | null>;
  /** Remove this window's copy (a clean save or exit); never touches another's. */
  clear(): Promise<void>;
  /** Every other copy in the folder, newest first. */
  leftBehind(): Promise<RecoveryCopy[]>;
  /** Remove one left-behind copy, once the user has answered for it. Refuses this window's own ID and anything not an ID. */
  discard(id: string): Promise<void>;
}

export function createRecoveryStore(folder: string, id: string = newRecoveryId()): RecoveryStore {
  if (!isRecoveryId(id)) throw new Error(`"${id}" is not a recovery ID`);
  const fileOf = (copyId: string): string => path.join(folder, recoveryFileName(copyId));
  const file = fileOf(id);
  return {
    id,
    path: file,
    async write(text) {
      await nodeFs.mkdir(folder, { recursive: true });
      await saveAtomically(file, text, { keepBackup: false });
    },
    read: () => readCopy(file),
    async clear() {
      await nodeFs.rm(file, { force: true });
    },
    async leftBehind() {
      let names: string[];
      try {
        names = await nodeFs.readdir(folder);
      } catch (error) {
        if (errorCode(error) === 'ENOENT') return [];
        throw error;
      }
      const copies: RecoveryCopy[] = [];
      for (const name of names) {
        if (!name.startsWith(PREFIX) || !name.endsWith(SUFFIX)) continue;
        const copyId = name.slice(PREFIX.length, -SUFFIX.length);
        if (copyId === id || !isRecoveryId(copyId)) continue;
        const text = await readCopy(fileOf(copyId));
        if (text === null) continue;
        const info = await nodeFs.stat(fileOf(copyId)).catch(() => null);
        copies.push({ id: copyId, text, savedAt: info?.mtimeMs ?? 0 });
      }
      return copies.sort((a, b) => b.savedAt - a.savedAt);
    },
    async discard(copyId) {
      if (!isRecoveryId(copyId)) throw new Error(`"${copyId}" is not a recovery copy`);
      if (copyId === id) throw new Error('this window\'s own recovery copy is removed by clearing it, not by discarding it');
      await nodeFs.rm(fileOf(copyId), { force: true });
    },
  };
}

async function readCopy(file: string): Promise<string | null> {
  try {
    const text = await nodeFs.readFile(file, 'utf8');
    return text.length > 0 ? text : null;
  } catch (error) {
    if (errorCode(error) === 'ENOENT') return null;
    throw error;
  }
}

export interface DebouncedWriter {
  /** Schedule `text` (null = clear) to be written within the delay; a later call replaces the text. */
  schedule(text: string | null): void;
  /** Write whatever is pending now. */
  flush(): Promise<void>;
}

export function createDebouncedWriter(store: RecoveryStore, delayMs: number, onError: (error: unknown) => void): DebouncedWriter {
  let pending: { text: string | null } | null = null;
  let timer: ReturnType<typeof setTimeout> | null = null;
  let chain: Promise<void> = Promise.resolve();
  const writeNow = (): Promise<void> => {
    if (timer) clearTimeout(timer);
    timer = null;
    const job = pending;
    pending = null;
    if (!job) return chain;
    // Writes run one after another so an older text can never land after a newer one.
    chain = chain.then(() => (job.text === null ? store.clear() : store.write(job.text))).catch(onError);
    return chain;
  };
  return {
    schedule(text) {
      pending = { text };
      // The timer is not restarted: during a continuous drag the text is still written every delayMs.
      timer ??= setTimeout(() => void writeNow(), delayMs);
    },
    flush: writeNow,
  };
}
