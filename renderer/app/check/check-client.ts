/**
 * Page side of the table-check worker (check.worker.ts): one check at a time; starting another
 * or cancelling terminates the running one. Progress and the outcome arrive through `onState`.
 */
import type { CheckOptions, TableCheck } from '../../../core/check/index.ts';
import type { CheckReply } from './check.worker.ts';

export type CheckState =
  | { readonly kind: 'idle' }
  | { readonly kind: 'running'; readonly done: number; readonly total: number }
  | { readonly kind: 'done'; readonly result: TableCheck; readonly millis: number }
  | { readonly kind: 'failed'; readonly message: string; readonly badInput: boolean };

export class CheckClient {
  private worker: Worker | null = null;
  private id = 0;

  constructor(private readonly onState: (s: CheckState) => void) {}

  run(text: string, options: Omit<CheckOptions, 'onProgress'>, total: number): void {
    this.cancel();
    const id = ++this.id;
    const worker = new Worker(new URL('./check.worker.ts', import.meta.url), { type: 'module' });
    this.worker = worker;
    const finish = (): void => {
      worker.terminate();
      if (this.worker === worker) this.worker = null;
    };
    worker.onmessage = (e: MessageEvent<CheckReply>) => {
      const m = e.data;
      if (m.id !== this.id) return;
      if (m.kind === 'progress') return this.onState({ kind: 'running', done: m.done, total: m.total });
      this.onState(m.kind === 'done' ? { kind: 'done', result: m.result, millis: m.millis } : { kind: 'failed', message: m.message, badInput: m.badInput });
      finish();
    };
    worker.onerror = (e) => {
      this.onState({ kind: 'failed', message: e.message || 'the table-check worker stopped', badInput: false });
      finish();
    };
    this.onState({ kind: 'running', done: 0, total });
    worker.postMessage({ id, text, options });
  }

  cancel(): void {
    if (this.worker) {
      this.worker.terminate();
      this.worker = null;
      this.onState({ kind: 'idle' });
    }
  }
}
