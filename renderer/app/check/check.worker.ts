/**
 * Web Worker: the section-table check (core/check checkTable) off the page's thread, so the view
 * stays responsive while thousands of rows are rebuilt and integrated. One request per worker;
 * the page terminates the worker to cancel.
 * Messages in: { id, text, options }. Out: { id, kind: 'progress', done, total }
 * | { id, kind: 'done', result, millis } | { id, kind: 'failed', message, badInput }.
 */
import { checkTable, MappingError, TableInputError, type CheckOptions, type TableCheck } from '../../../core/check/index.ts';

export type CheckRequest = { readonly id: number; readonly text: string; readonly options: Omit<CheckOptions, 'onProgress'> };
export type CheckReply =
  | { readonly id: number; readonly kind: 'progress'; readonly done: number; readonly total: number }
  | { readonly id: number; readonly kind: 'done'; readonly result: TableCheck; readonly millis: number }
  | { readonly id: number; readonly kind: 'failed'; readonly message: string; readonly badInput: boolean };

const post = (reply: CheckReply): void => (self as unknown as { postMessage: (m: CheckReply) => void }).postMessage(reply);

self.addEventListener('message', (event: MessageEvent<CheckRequest>) => {
  const { id, text, options } = event.data;
  const t0 = performance.now();
  let last = 0;
  try {
    const result = checkTable(text, {
      ...options,
      onProgress: (done, total) => {
        const now = performance.now();
        if (now - last > 80) {
          last = now;
          post({ id, kind: 'progress', done, total });
        }
      },
    });
    post({ id, kind: 'done', result, millis: performance.now() - t0 });
  } catch (err) {
    const badInput = err instanceof TableInputError || err instanceof MappingError;
    post({ id, kind: 'failed', message: err instanceof Error ? err.message : String(err), badInput });
  }
});
