/**
 * Web Worker: Saint-Venant torsion J, shear centre and Cw of the document's section
 * (core/torsion, finite elements). Runs off the page's thread so the editor never waits; the
 * page terminates this worker when a newer edit makes the solve stale.
 * Messages in: { id, doc }. Out: { id, kind: 'progress', fraction } | { id, kind: 'done', result }
 * | { id, kind: 'failed', message }.
 */
import type { SectionDocument } from '../../core/document/types.ts';
import { regionFromDocument } from '../../core/section/index.ts';
import { torsionOfDocument } from '../app/joints/joint-torsion.ts';
import type { TorsionResult } from '../../core/torsion/types.ts';

export type TorsionRequest = { readonly id: number; readonly doc: SectionDocument };
export type TorsionReply =
  | { readonly id: number; readonly kind: 'progress'; readonly fraction: number }
  | { readonly id: number; readonly kind: 'done'; readonly result: TorsionResult; readonly millis: number }
  | { readonly id: number; readonly kind: 'failed'; readonly message: string };

const post = (reply: TorsionReply): void => (self as unknown as { postMessage: (m: TorsionReply) => void }).postMessage(reply);

self.addEventListener('message', (event: MessageEvent<TorsionRequest>) => {
  const { id, doc } = event.data;
  const t0 = performance.now();
  try {
    const composed = regionFromDocument(doc);
    if (composed.diagnostics.length > 0) {
      post({ id, kind: 'failed', message: 'the geometry has problems; see the list above' });
      return;
    }
    let last = 0;
    // Parts joined only by "not connected" joints twist separately (renderer/app/joints/joint-torsion.ts).
    const result = torsionOfDocument(doc, {
      onProgress: (fraction) => {
        const now = performance.now();
        if (now - last > 100) {
          last = now;
          post({ id, kind: 'progress', fraction });
        }
      },
    });
    post({ id, kind: 'done', result, millis: performance.now() - t0 });
  } catch (err) {
    post({ id, kind: 'failed', message: err instanceof Error ? err.message : String(err) });
  }
});
