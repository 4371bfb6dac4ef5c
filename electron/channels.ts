/**
 * Every IPC channel between the renderer and the main process, in one list (STYLE.md §12).
 * Each is a named verb with its own payload schema (electron/payloads.ts); there is no generic
 * pipe. `invoke` channels are renderer → main requests with a reply; `send` channels are
 * renderer → main notifications; `event` channels are main → renderer.
 */
export const CHANNELS = [
  { name: 'document:open', direction: 'invoke' },
  { name: 'document:open-recent', direction: 'invoke' },
  { name: 'document:launch-file', direction: 'invoke' },
  { name: 'document:save', direction: 'invoke' },
  { name: 'document:save-as', direction: 'invoke' },
  { name: 'export:save', direction: 'invoke' },
  { name: 'export:save-bytes', direction: 'invoke' },
  { name: 'report:print-pdf', direction: 'invoke' },
  { name: 'dialog:confirm-discard', direction: 'invoke' },
  { name: 'recent:list', direction: 'invoke' },
  { name: 'recovery:write', direction: 'invoke' },
  { name: 'recovery:read', direction: 'invoke' },
  { name: 'recovery:discard', direction: 'invoke' },
  { name: 'table:open', direction: 'invoke' },
  { name: 'settings:read', direction: 'invoke' },
  { name: 'settings:write', direction: 'invoke' },
  { name: 'window:set-title', direction: 'send' },
  { name: 'window:set-unsaved', direction: 'send' },
  { name: 'menu:command', direction: 'event' },
] as const;

export type Channel = (typeof CHANNELS)[number]['name'];
export type InvokeChannel = Extract<(typeof CHANNELS)[number], { direction: 'invoke' }>['name'];
export type SendChannel = Extract<(typeof CHANNELS)[number], { direction: 'send' }>['name'];

/** What main sends on 'menu:command': the contract's list (renderer/host/host.ts), not a copy of it. */
export { HOST_COMMANDS, type HostCommand } from '../renderer/host/host.ts';
