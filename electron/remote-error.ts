/**
 * Electron prefixes an error thrown by a main-process handler with
 * "Error invoking remote method 'CHANNEL': Error: " (or the error class name, such as RejectedMessage) when it reaches the page; the user needs only
 * the reason main gave (e.g. "Could not save … the disk is full"). Used by the preload.
 */
const REMOTE_PREFIX = /^Error invoking remote method '[^']+': (?:\w*(?:Error|Message): )?/;

export function plainRemoteMessage(message: string): string {
  return message.replace(REMOTE_PREFIX, '');
}
