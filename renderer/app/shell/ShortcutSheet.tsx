/** Help → Keyboard shortcuts: every key binding and tool key, read from the keyboard map itself. */
import type { ReactElement } from 'react';
import { COMMANDS } from '../../controller/commands.ts';
import { KEY_BINDINGS, TOOL_KEY_HELP } from '../../controller/keymap.ts';

export function ShortcutSheet({ onClose }: { readonly onClose: () => void }): ReactElement {
  return (
    <div className="modal-back" onMouseDown={(e) => e.target === e.currentTarget && onClose()}>
      <div className="modal shortcut-sheet" role="dialog" aria-modal="true" aria-label="Keyboard shortcuts" data-testid="shortcut-sheet">
        <h2>Keyboard shortcuts</h2>
        <p className="muted small">Ctrl is ⌘ on a Mac. Letters and arrows act when the focus is not in a box.</p>
        <table>
          <tbody>
            {KEY_BINDINGS.map((b) => (
              <tr key={b.chord}>
                <td>
                  <kbd>{b.chord}</kbd>
                </td>
                <td>{COMMANDS[b.command].label}</td>
              </tr>
            ))}
            {TOOL_KEY_HELP.map((k) => (
              <tr key={k.key}>
                <td>
                  <kbd>{k.key}</kbd>
                </td>
                <td>{k.does}</td>
              </tr>
            ))}
          </tbody>
        </table>
        <div className="buttons">
          <button type="button" data-testid="shortcut-sheet-close" autoFocus onClick={onClose}>
            Close
          </button>
        </div>
      </div>
    </div>
  );
}
