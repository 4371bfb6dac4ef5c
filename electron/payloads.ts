/**
 * Payload schemas for every channel of electron/channels.ts, with valibot (the library core uses),
 * and the document check that uses core/document's own schema. The main process runs every
 * incoming message through `checkedArgs` before acting on it (electron/ipc-guard.ts).
 */
import * as v from 'valibot';
import { validateDocument } from '../core/document/schema.ts';
import { XLSX_MIME_TYPE } from '../renderer/host/host.ts';
import type { Channel } from './channels.ts';
import { isRecoveryId } from './recovery.ts';
import { SETTING_KEY, SETTING_KEY_MAX, SETTING_VALUE_MAX } from './settings.ts';

/** Largest text accepted over IPC or read from disk (a document of many thousand vertices is < 5 MB). */
export const MAX_TEXT_BYTES = 64 * 1024 * 1024;

const text = v.pipe(v.string('text'), v.maxLength(MAX_TEXT_BYTES, `text of at most ${MAX_TEXT_BYTES} characters`));
const handle = v.pipe(v.string('a file handle'), v.minLength(1, 'a non-empty file handle'), v.maxLength(4096, 'a file handle of at most 4096 characters'));
/** A file name only: no folders (main owns paths), no control characters. */
const fileName = v.pipe(
  v.string('a file name'),
  v.minLength(1, 'a non-empty file name'),
  v.maxLength(255, 'a file name of at most 255 characters'),
  v.regex(/^[^/\\:*?"<>|\p{Cc}]+$/u, 'a file name without folders or the characters / \\ : * ? " < > |'),
  v.check((name) => name !== '.' && name !== '..', 'a file name, not . or ..'),
);
const settingKey = v.pipe(
  v.string('a setting key'),
  v.minLength(1, 'a non-empty setting key'),
  v.maxLength(SETTING_KEY_MAX, `a setting key of at most ${SETTING_KEY_MAX} characters`),
  v.regex(SETTING_KEY, 'a setting key of letters, digits and . _ : -'),
);
const settingValue = v.nullable(v.pipe(v.string('text or null'), v.maxLength(SETTING_VALUE_MAX, `a setting of at most ${SETTING_VALUE_MAX} characters`)));
const shortText = v.pipe(v.string('text'), v.maxLength(500, 'text of at most 500 characters'));

export const EXPORT_MIME_TYPES = ['image/svg+xml', 'text/csv', 'text/html', 'application/json', 'text/plain', 'application/dxf'] as const;

/** A report of core/report: a whole HTML document, and never a script (the PDF window runs none either). */
const reportHtml = v.pipe(
  text,
  v.startsWith('<!DOCTYPE html>', 'an HTML report starting with <!DOCTYPE html>'),
  v.check((html) => !/<script/i.test(html), 'an HTML report without scripts'),
);

const exportFile = v.strictObject({
  suggestedName: fileName,
  mimeType: v.picklist(EXPORT_MIME_TYPES, `one of ${EXPORT_MIME_TYPES.join(', ')}`),
  text,
});

/** Largest file of bytes (an XLSX workbook) accepted for saving. */
export const MAX_EXPORT_BYTES = 64 * 1024 * 1024;

const exportBytes = v.strictObject({
  suggestedName: fileName,
  mimeType: v.literal(XLSX_MIME_TYPE, `the XLSX type ${XLSX_MIME_TYPE}`),
  bytes: v.pipe(v.instance(Uint8Array, 'bytes (a Uint8Array)'), v.check((b) => b.byteLength <= MAX_EXPORT_BYTES, `at most ${MAX_EXPORT_BYTES} bytes`)),
});

/** Arguments of each channel, as a tuple; a channel without arguments takes an empty tuple. */
export const PAYLOADS = {
  'document:open': v.strictTuple([]),
  'document:open-recent': v.strictTuple([handle]),
  'document:launch-file': v.strictTuple([]),
  'document:save': v.strictTuple([handle, text]),
  'document:save-as': v.strictTuple([fileName, text]),
  'export:save': v.strictTuple([exportFile]),
  'export:save-bytes': v.strictTuple([exportBytes]),
  'report:print-pdf': v.strictTuple([reportHtml, fileName]),
  'dialog:confirm-discard': v.strictTuple([shortText]),
  'recent:list': v.strictTuple([]),
  'recovery:write': v.strictTuple([v.nullable(text)]),
  'recovery:read': v.strictTuple([]),
  'recovery:discard': v.strictTuple([v.pipe(v.string('a recovery copy ID'), v.check(isRecoveryId, 'a recovery copy ID (letters, digits and -)'))]),
  'table:open': v.strictTuple([]),
  'settings:read': v.strictTuple([settingKey]),
  'settings:write': v.strictTuple([settingKey, settingValue]),
  'window:set-title': v.strictTuple([shortText]),
  'window:set-unsaved': v.strictTuple([v.boolean('true or false')]),
  'menu:command': v.strictTuple([]),
} as const satisfies Record<Channel, v.GenericSchema>;

export type PayloadOf<C extends Channel> = v.InferOutput<(typeof PAYLOADS)[C]>;

/** A message the main process refused; its text names the channel and what was wrong. */
export class RejectedMessage extends Error {
  override readonly name = 'RejectedMessage';
}

export function checkedArgs<C extends Channel>(channel: C, args: readonly unknown[]): PayloadOf<C> {
  const result = v.safeParse(PAYLOADS[channel], args);
  if (result.success) return result.output as PayloadOf<C>;
  const first = result.issues[0];
  const where = first?.path?.map((p) => String(p.key)).join('.') ?? '';
  throw new RejectedMessage(`${channel}: rejected payload${where ? ` at argument ${where}` : ''}: expected ${first?.message ?? 'valid arguments'}`);
}

/** Document text to be written to disk must be a valid current-version document (core/document/schema.ts). */
export function checkedDocumentText(text: string): string {
  let value: unknown;
  try {
    value = JSON.parse(text);
  } catch (error) {
    throw new RejectedMessage(`document:save: the text is not JSON (${error instanceof Error ? error.message : String(error)})`);
  }
  const validation = validateDocument(value);
  if (!validation.ok) throw new RejectedMessage(`document:save: the text is not a valid Sectionsmith document: ${validation.issues.slice(0, 3).map((i) => i.message).join('; ')}`);
  return text;
}
