/**
 * Crash recovery for the desktop host (main process only).
 *
 * While a document has unsaved changes the renderer hands its text over shortly after each change
 * (the host contract: debounced by the caller); `createRecoveryStore` writes it to one recovery file
 * in the app's data folder, atomically (saveAtomically without backup), so a kill leaves either the
 * previous recovery text or the new one, never a partial file. A clean save or a clean exit clears it.
 * On the next start, text still present means the last session did not end cleanly: the renderer
 * offers to restore it.
 *
 * `createDebouncedWriter` is the "shortly after each change" timer for callers without their own:
 * a change is written at most `delayMs` after it was made (the latest text wins, so a burst of
 * changes costs one write), and `flush` writes what is pending at once.
 */
import { promises as nodeFs } from 'node:fs';
import path from 'node:path';
import { errorCode, saveAtomically } from './save.ts';

export const RECOVERY_FILE_NAME = 'unsaved-work.section.json';

export interface RecoveryStore {
  readonly path: string;
  write(text: string): Promise<void>;
  /** Text left behind, or null when there is none (a clean previous exit). */
  read(): Promise<string | null>;
  clear(): Promise<void>;
}

export function createRecoveryStore(folder: string): RecoveryStore {
  const file = path.join(folder, RECOVERY_FILE_NAME);
  return {
    path: file,
    async write(text) {
      await nodeFs.mkdir(folder, { recursive: true });
      await saveAtomically(file, text, { keepBackup: false });
    },
    async read() {
      try {
        const text = await nodeFs.readFile(file, 'utf8');
        return text.length > 0 ? text : null;
      } catch (error) {
        if (errorCode(error) === 'ENOENT') return null;
        throw error;
      }
    },
    async clear() {
      await nodeFs.rm(file, { force: true });
    },
  };
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
