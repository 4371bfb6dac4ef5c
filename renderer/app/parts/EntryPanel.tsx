/**
 * Typed, exact input: plates, rounds and outline points by their numbers, the selected part's
 * own dimensions, and transforms of the selection. Values are in the document unit; lengths may
 * carry their own ("4 in", "13'-9\""), read by core/units readQuantity; defaults follow the unit
 * (entry-model.ts).
 */
import { useEffect, useRef, useState, type ReactElement } from 'react';
import type { Part } from '../../../core/document/types.ts';
import type { Editor, EditorState } from '../../editor/editor.ts';
import { parseNumber } from '../shell/numbers.ts';
import { ShapeParameters } from './PartsPalette.tsx';
import { materialChoices } from '../materials/MaterialsPanel.tsx';
import { withPartMaterial } from '../materials/material-form.ts';
import type { LengthUnit } from '../../../core/units/index.ts';
import { entryDefaults, fieldsForUnit, readEntryLength } from './entry-model.ts';
import type { CommandId } from '../../controller/commands.ts';

type Fields = Record<string, string>;

function useFields(initial: Fields): [Fields, (k: string, v: string) => void, (fn: (old: Fields) => Fields) => void] {
  const [f, setF] = useState(initial);
  return [f, (k, v) => setF((old) => ({ ...old, [k]: v })), setF];
}

/** Fields that hold a plain number; every other field is a length (core/units readQuantity, bare numbers in the document unit). */
const PLAIN_NUMBERS = new Set(['rotate-angle', 'array-count']);

/** Parse named fields (lengths in the document unit); report the first bad one. */
function read(f: Fields, keys: readonly [string, string][], onError: (m: string) => void, unit: LengthUnit): Record<string, number> | null {
  const out: Record<string, number> = {};
  for (const [k, label] of keys) {
    const r = PLAIN_NUMBERS.has(k) ? parseNumber(f[k] ?? '', label) : readEntryLength(f[k] ?? '', label, unit);
    if (!r.ok) {
      onError(r.message);
      return null;
    }
    out[k] = r.value;
  }
  onError('');
  return out;
}

function Field({ id, label, f, set, title }: { id: string; label: string; f: Fields; set: (k: string, v: string) => void; title?: string }): ReactElement {
  return (
    <label className="field" title={title}>
      <span>{label}</span>
      <input data-testid={`entry-${id}`} value={f[id] ?? ''} onChange={(e) => set(id, e.target.value)} inputMode="decimal" spellCheck={false} />
    </label>
  );
}

function SelectedPart({ editor, part, unit }: { editor: Editor; part: Part; unit: LengthUnit }): ReactElement {
  const [error, setError] = useState('');
  const commit = (label: string, text: string, apply: (v: number) => Part | null): void => {
    const r = readEntryLength(text, label, unit);
    if (!r.ok) return setError(r.message);
    const next = apply(r.value);
    if (!next) return setError(`${label} must be greater than zero`);
    setError('');
    editor.updatePart(part.id, `Change ${label}`, () => next);
  };
  const num = (label: string, testid: string, value: number, apply: (v: number) => Part | null): ReactElement => (
    <label className="field" key={`${part.id}-${testid}-${value}`}>
      <span>{label}</span>
      <input
        data-testid={`selected-${testid}`}
        defaultValue={String(value)}
        onKeyDown={(e) => {
          if (e.key === 'Enter') commit(label, e.currentTarget.value, apply);
        }}
        onBlur={(e) => {
          if (e.currentTarget.value !== String(value)) commit(label, e.currentTarget.value, apply);
        }}
      />
    </label>
  );
  const pl = part.placement;
  return (
    <div className="selected-part" data-testid="selected-part">
      <label className="field wide">
        <span>name</span>
        <input
          key={`${part.id}-name-${part.name}`}
          data-testid="selected-name"
          defaultValue={part.name}
          onBlur={(e) => {
            const name = e.currentTarget.value.trim();
            if (name !== part.name) editor.updatePart(part.id, 'Rename part', (q) => ({ ...q, name }));
          }}
        />
      </label>
      <label className="field wide">
        <span>material</span>
        <select
          data-testid="selected-material"
          value={part.material ?? ''}
          onChange={(e) => editor.replaceDocument('Part material', (d) => withPartMaterial(d, part.id, e.target.value === '' ? null : e.target.value))}
        >
          <option value="">document default</option>
          {materialChoices(editor.getState().doc).map((m) => (
            <option key={m.id} value={m.id}>
              {m.name}
            </option>
          ))}
        </select>
      </label>
      {part.type === 'shape' && <ShapeParameters editor={editor} part={part} unit={unit} />}
      <div className="grid2">
        {part.type === 'rectangle' && num(`b (${unit})`, 'width', part.width, (v) => (v > 0 ? { ...part, width: v } : null))}
        {part.type === 'rectangle' && num(`h (${unit})`, 'height', part.height, (v) => (v > 0 ? { ...part, height: v } : null))}
        {part.type === 'circle' && num(`d (${unit})`, 'diameter', part.diameter, (v) => (v > 0 ? { ...part, diameter: v } : null))}
        {num(`x (${unit})`, 'x', pl.x, (v) => ({ ...part, placement: { ...pl, x: v } }))}
        {num(`y (${unit})`, 'y', pl.y, (v) => ({ ...part, placement: { ...pl, y: v } }))}
        {num('rotation (°)', 'rotation', pl.rotationDeg, (v) => ({ ...part, placement: { ...pl, rotationDeg: v } }))}
      </div>
      {error && <p className="error" role="alert">{error}</p>}
    </div>
  );
}

export function EntryPanel({ editor, state }: { editor: Editor; state: EditorState }): ReactElement {
  const unit = state.doc.unit;
  const [f, set, replace] = useFields(entryDefaults(unit));
  // A new document unit: defaults follow it, typed sizes keep their physical value (entry-model.ts).
  const shownUnit = useRef(unit);
  useEffect(() => {
    if (shownUnit.current === unit) return;
    const from = shownUnit.current;
    shownUnit.current = unit;
    replace((old) => fieldsForUnit(old, from, unit));
  }, [unit, replace]);
  const [error, setError] = useState('');
  const draft = state.tool.draft;
  const drafted = draft?.kind === 'polygon' ? draft.points.length : 0;

  const addRect = (operation: 'add' | 'subtract'): void => {
    const v = read(f, [['rect-width', 'width b'], ['rect-height', 'height h'], ['rect-x', 'centre x'], ['rect-y', 'centre y']], setError, unit);
    if (!v) return;
    if (!((v['rect-width'] as number) > 0 && (v['rect-height'] as number) > 0)) return setError('a plate needs a width and a height greater than zero');
    editor.addRectangle({ width: v['rect-width'] as number, height: v['rect-height'] as number, x: v['rect-x'] as number, y: v['rect-y'] as number, operation });
  };
  const addCircle = (operation: 'add' | 'subtract'): void => {
    const v = read(f, [['circle-diameter', 'diameter d'], ['circle-x', 'centre x'], ['circle-y', 'centre y']], setError, unit);
    if (!v) return;
    if (!((v['circle-diameter'] as number) > 0)) return setError('a round needs a diameter greater than zero');
    editor.addCircle({ diameter: v['circle-diameter'] as number, x: v['circle-x'] as number, y: v['circle-y'] as number, operation });
  };
  const addPoint = (): void => {
    const v = read(f, [['point-x', 'point x'], ['point-y', 'point y']], setError, unit);
    if (v) editor.typedPoint([v['point-x'] as number, v['point-y'] as number]);
  };

  return (
    <section className="entry" aria-label="Typed input">
      <h2>Exact input <span className="muted">({unit})</span></h2>
      <details open>
        <summary>Plate (b × h, centred)</summary>
        <div className="grid4">
          <Field id="rect-width" label="b" f={f} set={set} title="width" />
          <Field id="rect-height" label="h" f={f} set={set} title="height" />
          <Field id="rect-x" label="x" f={f} set={set} title="centre x" />
          <Field id="rect-y" label="y" f={f} set={set} title="centre y" />
        </div>
        <div className="buttons">
          <button type="button" data-testid="entry-rect-add" onClick={() => addRect('add')}>Add plate</button>
          <button type="button" data-testid="entry-rect-subtract" onClick={() => addRect('subtract')}>Cut opening</button>
        </div>
      </details>
      <details open>
        <summary>Round (d, centre)</summary>
        <div className="grid4">
          <Field id="circle-diameter" label="d" f={f} set={set} title="diameter" />
          <Field id="circle-x" label="x" f={f} set={set} title="centre x" />
          <Field id="circle-y" label="y" f={f} set={set} title="centre y" />
        </div>
        <div className="buttons">
          <button type="button" data-testid="entry-circle-add" onClick={() => addCircle('add')}>Add round bar</button>
          <button type="button" data-testid="entry-circle-subtract" onClick={() => addCircle('subtract')}>Cut hole</button>
        </div>
      </details>
      <details>
        <summary>Outline by points {drafted > 0 && <span className="muted">({drafted} so far)</span>}</summary>
        <div className="grid4">
          <Field id="point-x" label="x" f={f} set={set} />
          <Field id="point-y" label="y" f={f} set={set} />
        </div>
        <div className="buttons">
          <button type="button" data-testid="entry-point-add" onClick={addPoint}>Add point</button>
          <button type="button" data-testid="entry-point-close" disabled={drafted < 3} onClick={() => editor.key('Enter')}>Close outline</button>
        </div>
      </details>
      {error && <p className="error" role="alert" data-testid="entry-error">{error}</p>}
    </section>
  );
}

const ALIGN: readonly [CommandId, string, string][] = [
  ['align-left', '⇤ left', 'Align left edges'],
  ['align-centre-x', 'centre ↔', 'Align centres on a vertical line'],
  ['align-right', 'right ⇥', 'Align right edges'],
  ['align-top', '⤒ top', 'Align top edges'],
  ['align-centre-y', 'middle ↕', 'Align middles on a horizontal line'],
  ['align-bottom', '⤓ bottom', 'Align bottom edges'],
];
const SPREAD: readonly [CommandId, string, string][] = [
  ['touch-x', 'touch ↔', 'Side by side, each touching the next (plies)'],
  ['touch-y', 'touch ↕', 'Stacked, each touching the next'],
  ['distribute-x', 'centres ↔', 'Equal spacing of centres, left to right (3 or more)'],
  ['distribute-y', 'centres ↕', 'Equal spacing of centres, bottom to top (3 or more)'],
  ['space-x', 'gaps ↔', 'Equal gaps, left to right (3 or more)'],
  ['space-y', 'gaps ↕', 'Equal gaps, bottom to top (3 or more)'],
];

/**
 * The selection's editor: the selected part's own fields (name, size, material, placement), then
 * moving, turning, mirroring, copies and arrays, align and spread for several parts. It sits at
 * the top of the left column so it is in view as soon as something is selected.
 */
export function SelectionPanel({ editor, state, run }: { editor: Editor; state: EditorState; run: (id: CommandId) => void }): ReactElement | null {
  const unit = state.doc.unit;
  const [f, set] = useFields({ 'move-dx': '0', 'move-dy': '0', 'moveto-x': '0', 'moveto-y': '0', 'rotate-angle': '15', 'array-count': '2', 'array-dx': '0', 'array-dy': '0' });
  const [error, setError] = useState('');
  const sel = state.selection;
  const selectedPart = sel.length === 1 ? state.doc.parts.find((p) => p.id === sel[0]) : undefined;
  const transform = (keys: [string, string][], fn: (v: Record<string, number>) => void): void => {
    setError('');
    const v = read(f, keys, setError, unit);
    if (v) fn(v);
  };
  if (sel.length === 0) return null;
  return (
    <section className="selection-panel" aria-label="Selected parts" data-testid="selection-panel">
      {selectedPart && <SelectedPart editor={editor} part={selectedPart} unit={unit} />}
      {sel.length > 0 && (
        <details open className="transforms">
          <summary>Move, turn, mirror ({sel.length} selected)</summary>
          <div className="grid4">
            <Field id="move-dx" label="Δx" f={f} set={set} />
            <Field id="move-dy" label="Δy" f={f} set={set} />
            <button type="button" data-testid="transform-move-by" onClick={() => transform([['move-dx', 'Δx'], ['move-dy', 'Δy']], (v) => editor.moveSelectionBy(v['move-dx'] as number, v['move-dy'] as number))}>Move by</button>
          </div>
          <div className="grid4">
            <Field id="moveto-x" label="x" f={f} set={set} title="new centre x" />
            <Field id="moveto-y" label="y" f={f} set={set} title="new centre y" />
            <button type="button" data-testid="transform-move-to" onClick={() => transform([['moveto-x', 'x'], ['moveto-y', 'y']], (v) => editor.moveSelectionTo(v['moveto-x'] as number, v['moveto-y'] as number))}>Centre to</button>
          </div>
          <div className="grid4">
            <Field id="rotate-angle" label="θ°" f={f} set={set} title="angle, counter-clockwise" />
            <button type="button" data-testid="transform-rotate" onClick={() => transform([['rotate-angle', 'angle']], (v) => editor.rotateSelection(v['rotate-angle'] as number))}>Turn</button>
            <button type="button" data-testid="transform-rotate-ccw90" title="90° counter-clockwise" onClick={() => editor.rotateSelection(90)}>⟲ 90°</button>
            <button type="button" data-testid="transform-rotate-cw90" title="90° clockwise" onClick={() => editor.rotateSelection(-90)}>⟳ 90°</button>
          </div>
          <div className="buttons">
            <button type="button" data-testid="transform-mirror-lr" onClick={() => editor.mirrorSelection('left-right')}>Mirror ↔</button>
            <button type="button" data-testid="transform-mirror-tb" onClick={() => editor.mirrorSelection('top-bottom')}>Mirror ↕</button>
            <button type="button" data-testid="transform-duplicate" title="A copy one grid step away (Ctrl+D)" onClick={() => run('duplicate')}>Duplicate</button>
            <button type="button" data-testid="transform-delete" onClick={() => run('delete')}>Delete</button>
          </div>
          <div className="grid4" aria-label="Array">
            <Field id="array-count" label="copies" f={f} set={set} title="number of copies" />
            <Field id="array-dx" label="pitch x" f={f} set={set} title="step between copies along x" />
            <Field id="array-dy" label="pitch y" f={f} set={set} title="step between copies along y" />
            <button
              type="button"
              data-testid="transform-array"
              title="Copies at a pitch, e.g. plies of a built-up member"
              onClick={() =>
                transform([['array-count', 'copies'], ['array-dx', 'pitch x'], ['array-dy', 'pitch y']], (v) => {
                  const n = v['array-count'] as number;
                  if (!Number.isInteger(n) || n < 1 || n > 200) return setError('copies must be a whole number from 1 to 200');
                  if (v['array-dx'] === 0 && v['array-dy'] === 0) return setError('give a pitch: with 0 and 0 every copy would lie on the original');
                  editor.arraySelection(n, v['array-dx'] as number, v['array-dy'] as number);
                })
              }
            >
              Array
            </button>
          </div>
          {sel.length > 1 && (
            <div className="buttons align-row" aria-label="Align">
              <span className="muted">Align</span>
              {ALIGN.map(([id, text, title]) => (
                <button key={id} type="button" data-testid={id} title={title} onClick={() => run(id)}>
                  {text}
                </button>
              ))}
            </div>
          )}
          {sel.length > 1 && (
            <div className="buttons align-row" aria-label="Distribute">
              <span className="muted">Spread</span>
              {SPREAD.map(([id, text, title]) => (
                <button key={id} type="button" data-testid={id} title={title} onClick={() => run(id)} disabled={sel.length < 3 && !id.startsWith('touch')}>
                  {text}
                </button>
              ))}
            </div>
          )}
        </details>
      )}
      {error && <p className="error" role="alert" data-testid="selection-error">{error}</p>}
    </section>
  );
}
