/**
 * The alternatives of the open document: one tab per section (click to edit it), and buttons to
 * add an empty one, copy the current one, rename it, move it, or delete it (asked first, and
 * undoable). Every change goes through the editor's section commands (one undo step each);
 * switching tabs changes nothing in the file.
 */
import { useState, type ReactElement } from 'react';
import type { Editor, EditorState, SectionCommandResult } from '../../editor/editor.ts';
import './sections-bar.css';

export function SectionsBar({ editor, state }: { editor: Editor; state: EditorState }): ReactElement {
  const sections = state.sectionFile.sections;
  const index = Math.max(0, sections.findIndex((s) => s.id === state.activeSection));
  const active = sections[index];
  const [renaming, setRenaming] = useState<string | null>(null);
  const [asking, setAsking] = useState(false);
  const [message, setMessage] = useState<string | null>(null);

  const outcome = (r: SectionCommandResult): boolean => {
    setMessage(r.ok ? null : r.message);
    return r.ok;
  };
  const finishRename = (): void => {
    if (renaming === null || !active) return;
    if (outcome(editor.renameSection(active.id, renaming))) setRenaming(null);
  };

  return (
    <div className="sections-bar" role="tablist" aria-label="Alternatives (sections of this document)" data-testid="sections-bar">
      <span className="sections-label">Alternatives</span>
      {sections.map((s, i) =>
        renaming !== null && s.id === state.activeSection ? (
          <span key={s.id} className="section-rename">
            <input
              aria-label="Section name"
              data-testid="section-rename-input"
              value={renaming}
              autoFocus
              onChange={(e) => setRenaming(e.target.value)}
              onKeyDown={(e) => {
                if (e.key === 'Enter') finishRename();
                if (e.key === 'Escape') {
                  setRenaming(null);
                  setMessage(null);
                }
              }}
            />
            <button type="button" data-testid="section-rename-ok" onClick={finishRename}>
              OK
            </button>
          </span>
        ) : (
          <button
            key={s.id}
            type="button"
            role="tab"
            aria-selected={s.id === state.activeSection}
            className={s.id === state.activeSection ? 'section-tab active' : 'section-tab'}
            data-testid={`section-tab-${i}`}
            title={i === 0 ? `${s.name} (the first section: commands read it when no section is named)` : s.name}
            onClick={() => {
              setAsking(false);
              setRenaming(null);
              setMessage(null);
              editor.switchSection(s.id);
            }}
            onDoubleClick={() => setRenaming(s.name)}
          >
            {s.name}
          </button>
        ),
      )}
      <span className="section-actions">
        <button type="button" data-testid="section-add" title="A new, empty alternative" onClick={() => outcome(editor.addSection())}>
          + New
        </button>
        <button type="button" data-testid="section-duplicate" title="A copy of this alternative, to change" onClick={() => outcome(editor.addSection({ duplicate: true }))}>
          Copy
        </button>
        <button type="button" data-testid="section-rename" disabled={!active} onClick={() => active && setRenaming(active.name)}>
          Rename
        </button>
        <button type="button" data-testid="section-move-left" title="Earlier in the document" disabled={index === 0} onClick={() => active && editor.moveSection(active.id, -1)}>
          ←
        </button>
        <button type="button" data-testid="section-move-right" title="Later in the document" disabled={index >= sections.length - 1} onClick={() => active && editor.moveSection(active.id, 1)}>
          →
        </button>
        <button type="button" data-testid="section-delete" disabled={sections.length < 2} title={sections.length < 2 ? 'A document keeps at least one section' : 'Delete this alternative'} onClick={() => setAsking(true)}>
          Delete
        </button>
      </span>
      {asking && active && (
        <span className="section-ask" role="alertdialog" aria-label="Delete this alternative?" data-testid="section-delete-ask">
          Delete “{active.name}” and its {active.parts.length} part{active.parts.length === 1 ? '' : 's'}? Undo brings it back.
          <button
            type="button"
            data-testid="section-delete-yes"
            onClick={() => {
              setAsking(false);
              outcome(editor.deleteSection(active.id));
            }}
          >
            Delete
          </button>
          <button type="button" data-testid="section-delete-no" autoFocus onClick={() => setAsking(false)}>
            Keep
          </button>
        </span>
      )}
      {message && (
        <span className="section-message" role="alert" data-testid="section-message">
          {message}
        </span>
      )}
    </div>
  );
}
