/**
 * The check every IPC message passes before main acts on it (STYLE.md §12): the sending frame
 * must be the app's own page (app://sectionsmith/, the main frame of our window), and the payload
 * must match the channel's schema. Written against the few fields it reads, so it is unit-tested
 * without the Electron runtime.
 */
import type { Channel } from './channels.ts';
import { checkedArgs, RejectedMessage, type PayloadOf } from './payloads.ts';
import { isAppUrl } from './window-options.ts';

export interface SenderLike {
  readonly senderFrame: { readonly url: string; readonly parent: unknown } | null;
  readonly sender: { readonly id: number };
}

/** Throws RejectedMessage unless the message comes from the app page of the trusted window. */
export function assertTrustedSender(channel: Channel, event: SenderLike, trustedWebContentsId: number | null): void {
  const frame = event.senderFrame;
  if (!frame) throw new RejectedMessage(`${channel}: rejected: the sending frame is gone`);
  if (!isAppUrl(frame.url)) throw new RejectedMessage(`${channel}: rejected: sender ${JSON.stringify(frame.url)} is not the app`);
  if (frame.parent !== null) throw new RejectedMessage(`${channel}: rejected: sender is a sub-frame, not the app page`);
  if (trustedWebContentsId === null || event.sender.id !== trustedWebContentsId) {
    throw new RejectedMessage(`${channel}: rejected: sender is not the app window`);
  }
}

/** Wraps a handler: sender check, then payload check, then the handler with typed arguments. */
export function guarded<C extends Channel, R>(
  channel: C,
  trustedWebContentsId: () => number | null,
  handler: (...args: PayloadOf<C>) => R,
): (event: SenderLike, ...args: unknown[]) => R {
  return (event, ...args) => {
    assertTrustedSender(channel, event, trustedWebContentsId());
    return handler(...checkedArgs(channel, args));
  };
}
