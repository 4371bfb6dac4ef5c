/** The part list: names, add or subtract, visibility, order; selection synced with the canvas. */
import type { ReactElement } from 'react';
import type { Editor, EditorState } from '../../editor/editor.ts';
import { CutoutRoleSelect } from '../joints/JointsPanel.tsx';
import { operationToggled } from '../joints/joints-model.ts';

export function PartsPanel({ editor, state }: { editor: Editor; state: EditorState }): ReactElement {
  const parts = state.doc.parts;
  return (
    <section className="parts" aria-label="Parts">
      <h2>Parts</h2>
      {parts.length === 0 && <p className="muted">No parts yet. Draw one, or type its dimensions below.</p>}
      <ol className="part-list" data-testid="part-list">
        {parts.map((p, i) => {
          const selected = state.selection.includes(p.id);
          return (
            <li key={p.id} className={selected ? 'selected' : ''} data-testid={`part-row-${i}`} data-part-id={p.id}>
              <button
                type="button"
                className="part-name"
                data-testid={`part-select-${i}`}
                onClick={(e) => editor.select(e.shiftKey ? (selected ? state.selection.filter((id) => id !== p.id) : [...state.selection, p.id]) : [p.id])}
              >
                <span className={`op-badge ${p.operation}`}>{p.operation === 'add' ? '+' : '−'}</span>
                <span className={p.visible ? '' : 'hidden-part'}>{p.name || `parts[${i}]`}</span>
                <span className="muted kind">{p.type === 'shape' ? (p.designation ?? p.shape) : p.type === 'rectangle' ? 'plate' : p.type === 'circle' ? 'round' : 'outline'}</span>
              </button>
              <span className="row-actions">
                {p.operation === 'subtract' && <CutoutRoleSelect editor={editor} id={p.id} role={p.cutoutRole ?? 'void'} testId={`part-role-${i}`} />}
                <button
                  type="button"
                  title={p.operation === 'add' ? 'Make this part a cut-out' : 'Make this part solid'}
                  data-testid={`part-operation-${i}`}
                  onClick={() => editor.updatePart(p.id, 'Change add/subtract', operationToggled)}
                >
                  {p.operation === 'add' ? 'cut' : 'solid'}
                </button>
                <button
                  type="button"
                  title={p.visible ? 'Hide (and leave out of the results)' : 'Show'}
                  data-testid={`part-visible-${i}`}
                  onClick={() => editor.updatePart(p.id, p.visible ? 'Hide part' : 'Show part', (q) => ({ ...q, visible: !q.visible }))}
                >
                  {p.visible ? 'hide' : 'show'}
                </button>
                <button type="button" title="Earlier in the list" disabled={i === 0} data-testid={`part-up-${i}`} onClick={() => editor.reorder(p.id, -1)}>
                  ↑
                </button>
                <button type="button" title="Later in the list" disabled={i === parts.length - 1} data-testid={`part-down-${i}`} onClick={() => editor.reorder(p.id, 1)}>
                  ↓
                </button>
              </span>
            </li>
          );
        })}
      </ol>
      <p className="muted small">Parts combine in list order: a cut-out removes material from the parts above it.</p>
    </section>
  );
}
