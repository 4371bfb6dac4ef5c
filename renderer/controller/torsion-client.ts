/**
 * Page side of the torsion worker: one solve at a time; a newer document terminates a running
 * solve (the result would be stale) and starts afresh. Results are derived data, never stored.
 */
import type { SectionDocument } from '../../core/document/types.ts';
import type { TorsionResult } from '../../core/torsion/types.ts';
import type { TorsionReply } from './torsion.worker.ts';

export type TorsionState =
  | { readonly kind: 'idle' }
  | { readonly kind: 'running'; readonly fraction: number }
  /** Stopped by the user (Cancel); the next edit or Solve starts afresh. */
  | { readonly kind: 'cancelled' }
  | { readonly kind: 'done'; readonly result: TorsionResult; readonly millis: number; readonly doc: SectionDocument }
  | { readonly kind: 'failed'; readonly message: string };

export class TorsionClient {
  private worker: Worker | null = null;
  private id = 0;
  private doc: SectionDocument | null = null;

  constructor(private readonly onState: (s: TorsionState) => void) {}

  solve(doc: SectionDocument): void {
    this.cancel();
    this.doc = doc;
    const id = ++this.id;
    const worker = new Worker(new URL('./torsion.worker.ts', import.meta.url), { type: 'module' });
    this.worker = worker;
    worker.onmessage = (e: MessageEvent<TorsionReply>) => {
      const m = e.data;
      if (m.id !== this.id) return;
      if (m.kind === 'progress') this.onState({ kind: 'running', fraction: m.fraction });
      else {
        this.onState(m.kind === 'done' ? { kind: 'done', result: m.result, millis: m.millis, doc } : { kind: 'failed', message: m.message });
        worker.terminate();
        if (this.worker === worker) this.worker = null;
      }
    };
    worker.onerror = (e) => {
      this.onState({ kind: 'failed', message: e.message || 'the torsion worker stopped' });
      worker.terminate();
    };
    this.onState({ kind: 'running', fraction: 0 });
    worker.postMessage({ id, doc });
  }

  /** Stop a running solve (a newer edit makes it stale). */
  cancel(): void {
    if (this.worker) {
      this.worker.terminate();
      this.worker = null;
      this.onState({ kind: 'idle' });
    }
  }

  get lastDoc(): SectionDocument | null {
    return this.doc;
  }
}
