/**
 * What the command line writes: output files named by flags, and terminal text.
 *
 * An output path that cannot be written (a missing folder, a folder given as a file, no
 * permission) is the user's input, not a bug: writeOutputFile throws BadInputError naming the
 * flag, the path and the reason, and cli/main.ts turns that into exit 2.
 * Terminal text never carries control characters from user data (a part name holding an ANSI
 * escape could repaint or clear the user's terminal): terminalText keeps tab and newline only.
 */
import { writeFileSync } from 'node:fs';

/** Bad input found while a command runs; cli/main.ts prints its message and exits 2. */
export class BadInputError extends Error {
  override readonly name = 'BadInputError';
}

/** Why a file could not be written, by Node's error code. */
const WRITE_REASONS: ReadonlyMap<string, string> = new Map([
  ['ENOENT', 'its folder does not exist'],
  ['EISDIR', 'it is a folder, not a file'],
  ['ENOTDIR', 'a part of the path is not a folder'],
  ['EACCES', 'permission denied'],
  ['EPERM', 'permission denied'],
  ['EROFS', 'the file system is read-only'],
  ['ENOSPC', 'the disk is full'],
]);

/** Why a file could not be read, by Node's error code. */
const READ_REASONS: ReadonlyMap<string, string> = new Map([
  ['ENOENT', 'no such file'],
  ['EISDIR', 'it is a directory'],
  ['EACCES', 'permission denied'],
]);

/** A file system error in plain words for reading or writing a file; the error's own message otherwise. */
export function fileErrorReason(err: unknown, use: 'read' | 'write'): string {
  const code = (err as { code?: unknown } | null)?.code;
  const known = typeof code === 'string' ? (use === 'read' ? READ_REASONS : WRITE_REASONS).get(code) : undefined;
  return known ?? (err instanceof Error ? err.message : String(err));
}

/** Writes `text` to `path` (UTF-8), or throws BadInputError naming `--flag`, the path and why. */
export function writeOutputFile(flag: string, path: string, text: string | Uint8Array): void {
  try {
    writeFileSync(path, text, typeof text === 'string' ? 'utf8' : undefined);
  } catch (err) {
    throw new BadInputError(`--${flag} ${path}: cannot write the file: ${fileErrorReason(err, 'write')}`);
  }
}

// C0 controls except tab (9) and newline (10), DEL, and the C1 controls (U+0080–U+009F, which
// include the one-character CSI U+009B).
const CONTROL = /[\u0000-\u0008\u000b-\u001f\u007f-\u009f]/g;

/** Text safe to print to a terminal: control characters from user data removed. */
export function terminalText(text: string): string {
  return text.replace(CONTROL, '');
}
