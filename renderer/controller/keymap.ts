/**
 * The keyboard map: which key chord runs which command (commands.ts), and which keys go to the
 * active tool (Escape, Enter, Delete, Backspace). Pure data and one lookup, so the shortcut sheet
 * (Help) and the menus read the same table the keys use.
 */
import type { CommandId } from './commands.ts';

/** A key press as the controller sees it (from a DOM KeyboardEvent, or a test). */
export interface KeyInput {
  /** KeyboardEvent.key, e.g. 'z', 'Z', 'ArrowLeft', '+'. */
  readonly key: string;
  /** Ctrl, or ⌘ on a Mac. */
  readonly mod: boolean;
  readonly shift: boolean;
  readonly alt: boolean;
  /** The focus is in a text box or a list: plain keys type there, and only some chords act. */
  readonly typing: boolean;
}

export interface KeyBinding {
  /** As shown to the user, e.g. 'Ctrl+Shift+S'. */
  readonly chord: string;
  readonly command: CommandId;
  /** Also while typing in a box (Ctrl+S saves from anywhere; Ctrl+Z undoes the box's own text instead). */
  readonly whileTyping?: boolean;
}

/** Every binding, in the order the shortcut sheet lists them. */
export const KEY_BINDINGS: readonly KeyBinding[] = [
  { chord: 'Ctrl+N', command: 'new', whileTyping: true },
  { chord: 'Ctrl+O', command: 'open', whileTyping: true },
  { chord: 'Ctrl+S', command: 'save', whileTyping: true },
  { chord: 'Ctrl+Shift+S', command: 'save-as', whileTyping: true },
  { chord: 'Ctrl+P', command: 'print-report', whileTyping: true },
  { chord: 'Ctrl+Z', command: 'undo' },
  { chord: 'Ctrl+Shift+Z', command: 'redo' },
  { chord: 'Ctrl+Y', command: 'redo' },
  { chord: 'Ctrl+C', command: 'copy' },
  { chord: 'Ctrl+X', command: 'cut' },
  { chord: 'Ctrl+V', command: 'paste' },
  { chord: 'Ctrl+D', command: 'duplicate', whileTyping: true },
  { chord: 'Ctrl+A', command: 'select-all' },
  { chord: '+', command: 'zoom-in' },
  { chord: '−', command: 'zoom-out' },
  { chord: '0', command: 'zoom-fit' },
  { chord: 'V', command: 'tool-select' },
  { chord: 'R', command: 'tool-rectangle' },
  { chord: 'C', command: 'tool-circle' },
  { chord: 'P', command: 'tool-polygon' },
  { chord: 'E', command: 'tool-vertex' },
  { chord: '←', command: 'nudge-left' },
  { chord: '→', command: 'nudge-right' },
  { chord: '↑', command: 'nudge-up' },
  { chord: '↓', command: 'nudge-down' },
  { chord: '?', command: 'shortcuts' },
];

/** Keys the active tool handles itself, with what they do (for the shortcut sheet). */
export const TOOL_KEY_HELP: readonly { readonly key: string; readonly does: string }[] = [
  { key: 'Escape', does: 'Cancel the drag or the outline being drawn; clear the selection' },
  { key: 'Enter', does: 'Close the outline being drawn' },
  { key: 'Delete', does: 'Delete the selected parts (with Corners: the chosen corner)' },
  { key: 'Backspace', does: 'Take back the last corner of an outline; otherwise as Delete' },
];
export const TOOL_KEYS: readonly string[] = TOOL_KEY_HELP.map((k) => k.key);

const KEY_NAMES: Readonly<Record<string, string>> = {
  ArrowLeft: '←', ArrowRight: '→', ArrowUp: '↑', ArrowDown: '↓', '=': '+', '-': '−', _: '−',
};

/** The chord text of a key press, in the table's spelling ('Ctrl+Shift+S', '←', 'V'). */
export function chordOf(k: KeyInput): string {
  const named = KEY_NAMES[k.key] ?? (k.key.length === 1 ? k.key.toUpperCase() : k.key);
  // Shift is part of the chord only with Ctrl: '+' and '?' are typed with Shift on many layouts.
  return `${k.mod ? 'Ctrl+' : ''}${k.mod && k.shift ? 'Shift+' : ''}${k.alt ? 'Alt+' : ''}${named}`;
}

export type KeyAction = { readonly kind: 'command'; readonly id: CommandId } | { readonly kind: 'tool-key'; readonly key: string };

/** What a key press does, or null when it is not ours (the page or the text box keeps it). */
export function keyAction(k: KeyInput): KeyAction | null {
  const chord = chordOf(k);
  const binding = KEY_BINDINGS.find((b) => b.chord === chord);
  if (binding) return k.typing && !binding.whileTyping ? null : { kind: 'command', id: binding.command };
  if (!k.mod && !k.alt && !k.typing && TOOL_KEYS.includes(k.key)) return { kind: 'tool-key', key: k.key };
  return null;
}

/** The shortcut of a command as shown in menus (its first binding), or ''. */
export function shortcutOf(id: CommandId): string {
  return KEY_BINDINGS.find((b) => b.command === id)?.chord ?? '';
}
