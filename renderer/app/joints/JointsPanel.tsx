/**
 * Joints, cut-outs and shear flow in the editor: separate pieces and overlaps said plainly
 * (JointsNotes, under the properties), and a panel listing every cut-out with its role, every
 * joint with its length, parts and kind (a kind editor for the chosen one, kinds kept in the
 * document), and, for typed shears Vy and Vx, the shear flow q each joint carries with the
 * fillet weld or fastener pitch it needs. View logic in joints-model.ts; engine in core/joints.
 */
import { useMemo, useState, useSyncExternalStore, type ReactElement } from 'react';
import type { CutoutRole, JointKind, SectionDocument } from '../../../core/document/types.ts';
import { jointKindText, type DesignMethod } from '../../../core/joints/index.ts';
import { convertLength, formatSig } from '../../../core/units/index.ts';
import { readQuantity } from '../../../core/units/quantity.ts';
import type { Editor } from '../../editor/editor.ts';
import {
  JOINTS_CAUTION, METHOD_TEXT, ROLE_TEXT, cutoutRows, jointDesign, jointsOverview, setCutoutRole, setJointKind, shearUnits,
  type JointDesignRow, type ShearField, type ShearTexts,
} from './joints-model.ts';
import type { JointsStore } from './joints-store.ts';
import './joints.css';

/** Separate pieces and overlaps, said wherever the properties are shown. */
export function JointsNotes({ doc }: { readonly doc: SectionDocument }): ReactElement | null {
  const o = jointsOverview(doc);
  if (!o.ready || (o.piecesNote === null && o.overlapNotes.length === 0)) return null;
  return (
    <div className="joints-notes" role="status">
      {o.piecesNote !== null && (
        <p className="warning" data-testid="pieces-note" data-pieces={String(Math.max(o.groups.length, o.composition.region.length))}>
          {o.piecesNote}
        </p>
      )}
      {o.overlapNotes.map((n, i) => (
        <p key={i} className="warning" data-testid={`overlap-note-${i}`}>
          {n}
        </p>
      ))}
    </div>
  );
}

/** A role picker for one cut-out (also used in the part list). */
export function CutoutRoleSelect({ editor, id, role, testId }: { editor: Editor; id: string; role: CutoutRole; testId: string }): ReactElement {
  return (
    <select className="cutout-role" data-testid={testId} value={role} title="What this cut-out is: a fastener hole counts only in the net section; a void runs along the member" onChange={(e) => setCutoutRole(editor, id, e.target.value as CutoutRole)}>
      <option value="fastener-hole">{ROLE_TEXT['fastener-hole']}</option>
      <option value="void">{ROLE_TEXT.void}</option>
    </select>
  );
}

type KindChoice = 'default' | 'fillet-both-sides' | 'fillet-one-side' | 'groove' | 'fastened' | 'glued' | 'not-connected';

const KIND_CHOICES: readonly [KindChoice, string][] = [
  ['default', 'default'],
  ['fillet-both-sides', 'welded: fillet welds both sides'],
  ['fillet-one-side', 'welded: fillet weld one side'],
  ['groove', 'welded: groove weld'],
  ['fastened', 'fastened at a pitch (bolts, nails, screws)'],
  ['glued', 'glued'],
  ['not-connected', 'not connected'],
];

function choiceOf(kind: JointKind, isDefault: boolean): KindChoice {
  if (isDefault) return 'default';
  return kind.type === 'welded' ? kind.weld : kind.type;
}

function kindOf(choice: KindChoice, current: JointKind): JointKind | null {
  switch (choice) {
    case 'default':
      return null;
    case 'fillet-both-sides':
    case 'fillet-one-side':
    case 'groove':
      return { type: 'welded', weld: choice };
    case 'fastened':
      return current.type === 'fastened' ? current : { type: 'fastened', fastener: 'bolt', rows: 1 };
    case 'glued':
      return { type: 'glued' };
    case 'not-connected':
      return { type: 'not-connected' };
  }
}

function KindEditor({ editor, doc, row }: { editor: Editor; doc: SectionDocument; row: JointDesignRow }): ReactElement {
  const j = row.joint;
  const kind = j.kind;
  const [pitchText, setPitchText] = useState(kind.type === 'fastened' && kind.pitch !== undefined ? String(kind.pitch) : '');
  const [error, setError] = useState('');
  const set = (k: JointKind | null): void => {
    setError('');
    setJointKind(editor, j.partIds, k);
  };
  const commitPitch = (): void => {
    if (kind.type !== 'fastened') return;
    if (pitchText.trim() === '') {
      const { pitch: _gone, ...rest } = kind;
      return set(rest);
    }
    const r = readQuantity(pitchText, { label: 'pitch', kind: 'length', unit: doc.unit });
    if (!r.ok) return setError(r.message);
    if (!(r.si > 0)) return setError(`pitch: "${pitchText}" must be greater than 0`);
    const pitch = convertLength(r.si, 'm', doc.unit);
    setPitchText(`${formatSig(pitch, 6)} ${doc.unit}`);
    set({ ...kind, pitch });
  };
  return (
    <div className="joint-kind-editor" data-testid="joint-kind-editor">
      <label>
        Kind of joint
        <select data-testid="joint-kind" value={choiceOf(kind, j.isDefault)} onChange={(e) => set(kindOf(e.target.value as KindChoice, kind))}>
          {KIND_CHOICES.map(([v, text]) => (
            <option key={v} value={v}>
              {v === 'default' ? `default (${jointKindText(kind)})` : text}
            </option>
          ))}
        </select>
      </label>
      {j.isDefault && <p className="muted small">{j.defaultReason}</p>}
      {kind.type === 'fastened' && !j.isDefault && (
        <div className="grid3">
          <label>
            fastener
            <select data-testid="joint-fastener" value={kind.fastener} onChange={(e) => set({ ...kind, fastener: e.target.value as 'bolt' | 'nail' | 'screw' })}>
              <option value="bolt">bolts</option>
              <option value="nail">nails</option>
              <option value="screw">screws</option>
            </select>
          </label>
          <label>
            rows
            <select data-testid="joint-rows" value={kind.rows} onChange={(e) => set({ ...kind, rows: Number(e.target.value) })}>
              {Array.from({ length: 8 }, (_, i) => i + 1).map((n) => (
                <option key={n} value={n}>
                  {n}
                </option>
              ))}
            </select>
          </label>
          <label>
            pitch (optional)
            <input
              data-testid="joint-pitch"
              value={pitchText}
              placeholder={`in ${doc.unit}`}
              onChange={(e) => setPitchText(e.target.value)}
              onBlur={commitPitch}
              onKeyDown={(e) => {
                if (e.key === 'Enter') commitPitch();
              }}
            />
          </label>
        </div>
      )}
      {error !== '' && (
        <p className="error" data-testid="joint-kind-error">
          {error}
        </p>
      )}
    </div>
  );
}

const fmt = (v: number | null, sig = 3): string => (v === null || Number.isNaN(v) ? '—' : v === Infinity ? 'any' : formatSig(v, sig));

function DesignCells({ row, units, method }: { row: JointDesignRow; units: ReturnType<typeof shearUnits>; method: DesignMethod }): ReactElement {
  const w = row.weld, f = row.fastener;
  const lines: string[] = [];
  if (w !== null) {
    lines.push(`fillet leg ≥ ${fmt(w.requiredShown)} ${units.leg} (${method}, ${w.lines} line${w.lines === 1 ? '' : 's'})`);
    if (w.minimumShown !== null && w.thinnerShown !== null) lines.push(`Table J2.4 minimum ${fmt(w.minimumShown)} ${units.leg} for the thinner part, ${fmt(w.thinnerShown)} ${units.leg}`);
    else lines.push('Table J2.4 minimum: thickness at the joint could not be measured');
    lines.push(`intermittent: ${fmt(w.legShown)} ${units.leg} leg, ${fmt(w.segmentShown)} ${units.leg} long at pitch ≤ ${fmt(w.pitchShown)} ${units.leg}`);
  }
  if (f !== null) {
    lines.push(f.largestPitchShown === null ? `type the capacity per fastener to get the largest pitch (${f.rows} row${f.rows === 1 ? '' : 's'})` : `largest pitch s = n·R/q = ${fmt(f.largestPitchShown)} ${units.leg} (${f.rows} row${f.rows === 1 ? '' : 's'})`);
    if (f.pitchShown !== null && f.pitchOk !== null) lines.push(`your pitch ${fmt(f.pitchShown)} ${units.leg}: ${f.pitchOk ? 'within' : 'MORE than'} the largest pitch`);
  }
  return (
    <td className="design" data-testid={`joint-design-${row.key}`}>
      {lines.map((l, i) => (
        <div key={i} className={l.includes('MORE than') ? 'error' : ''}>
          {l}
        </div>
      ))}
      {row.note !== '' && <div className="muted small">{row.note}</div>}
    </td>
  );
}

function QuantityInput({ field, label, store, unit, error, title }: { field: ShearField; label: string; store: JointsStore; unit: string; error: string | undefined; title: string }): ReactElement {
  const value = useSyncExternalStore(store.subscribe, store.getState)[field];
  return (
    <label title={title}>
      {label}
      <input
        data-testid={`joints-${field}`}
        value={value.text}
        placeholder={unit}
        aria-invalid={error !== undefined}
        // A bare number means the unit the field had when it was typed, for good.
        onChange={(e) => store.set({ [field]: { text: e.target.value, unit } })}
      />
      {error !== undefined && (
        <span className="error" data-testid={`joints-error-${field}`}>
          {error}
        </span>
      )}
    </label>
  );
}

export function JointsPanel({ editor, doc, store }: { readonly editor: Editor; readonly doc: SectionDocument; readonly store: JointsStore }): ReactElement {
  const ui = useSyncExternalStore(store.subscribe, store.getState);
  const overview = jointsOverview(doc);
  const cutouts = cutoutRows(doc);
  const units = shearUnits(doc.unit);
  const texts: ShearTexts = { Vy: ui.Vy, Vx: ui.Vx, fexx: ui.fexx, capacity: ui.capacity, method: ui.method };
  const design = useMemo(() => jointDesign(doc, texts), [doc, ui.Vy, ui.Vx, ui.fexx, ui.capacity, ui.method]);
  const selected = design.rows.find((r) => r.key === ui.selected) ?? null;
  const hasFlow = design.rows.some((r) => r.flow !== null);
  return (
    <details className="joints-panel" data-testid="joints-panel">
      <summary>Joints, cut-outs and shear flow ({overview.joints.length} joint{overview.joints.length === 1 ? '' : 's'})</summary>
      {!overview.ready && <p className="muted">{overview.problem === null ? 'The geometry needs attention before joints can be found.' : `Joints could not be found: ${overview.problem}`}</p>}
      {cutouts.length > 0 && (
        <section aria-label="Cut-outs">
          <h3>Cut-outs</h3>
          <ol className="cutout-list">
            {cutouts.map((c) => (
              <li key={c.id} data-testid={`cutout-row-${c.index}`} data-role={c.role}>
                <span>{c.label}</span> <CutoutRoleSelect editor={editor} id={c.id} role={c.role} testId={`cutout-role-${c.index}`} />
              </li>
            ))}
          </ol>
          <p className="muted small">A fastener hole is deducted in the net section only (An, Ix,net …); stiffness, deflection, torsion and plastic moduli use the gross section. A void is missing along the whole member.</p>
        </section>
      )}
      <section aria-label="Joints">
        <h3>Joints</h3>
        {overview.ready && overview.joints.length === 0 && <p className="muted">No two parts meet along a line.</p>}
        {overview.joints.length > 0 && (
          <table className="joint-list" data-testid="joint-list">
            <thead>
              <tr>
                <th>parts</th>
                <th>length</th>
                <th>kind</th>
                {hasFlow && <th>q ({units.q})</th>}
              </tr>
            </thead>
            <tbody>
              {design.rows.map((r, i) => (
                <tr
                  key={r.key}
                  data-testid={`joint-row-${i}`}
                  data-key={r.key}
                  data-selected={r.key === ui.selected ? 'true' : 'false'}
                  data-q={String(r.qShown)}
                  className={r.key === ui.selected ? 'selected' : ''}
                  onClick={() => store.set({ selected: r.key === ui.selected ? null : r.key })}
                >
                  <td>
                    {r.joint.labels[0]} | {r.joint.labels[1]}
                  </td>
                  <td className="value" data-value={String(r.joint.length)}>
                    {formatSig(r.joint.length, 4)} {doc.unit}
                  </td>
                  <td>
                    {jointKindText(r.joint.kind)}
                    {r.joint.isDefault && <span className="muted"> (default)</span>}
                  </td>
                  {hasFlow && <td className="value">{fmt(Math.abs(r.qShown), 4)}</td>}
                </tr>
              ))}
            </tbody>
          </table>
        )}
        {overview.joints.length > 0 && selected === null && <p className="muted small">Choose a joint in the list to set its kind; it is drawn on the drawing.</p>}
        {selected !== null && <KindEditor key={selected.key + JSON.stringify(selected.joint.kind)} editor={editor} doc={doc} row={selected} />}
      </section>
      {overview.joints.length > 0 && (
        <section aria-label="Shear flow">
          <h3>Shear flow q = V·Q/I at each joint</h3>
          <div className="grid2">
            <QuantityInput field="Vy" label="Vy (vertical shear)" store={store} unit={units.force} error={design.errors.Vy} title="Shear along y, e.g. 100 kN or 22 kip; a bare number is in the unit shown" />
            <QuantityInput field="Vx" label="Vx (horizontal shear)" store={store} unit={units.force} error={design.errors.Vx} title="Shear along x" />
            <QuantityInput field="fexx" label="FEXX (electrode)" store={store} unit={units.stress} error={design.errors.fexx} title="Electrode classification strength, e.g. 70 ksi (E70XX) or 490 MPa" />
            <QuantityInput field="capacity" label="capacity per fastener" store={store} unit={units.force} error={design.errors.capacity} title="Design shear capacity of one fastener for your method and code (your number)" />
          </div>
          <label>
            Weld strength by{' '}
            <select data-testid="joints-method" value={ui.method} onChange={(e) => store.set({ method: e.target.value as DesignMethod })}>
              <option value="LRFD">{METHOD_TEXT.LRFD}</option>
              <option value="ASD">{METHOD_TEXT.ASD}</option>
            </select>
          </label>
          {design.needLoads && <p className="muted">Type Vy or Vx to see the shear flow each joint must carry.</p>}
          {hasFlow && (
            <table className="joint-design" data-testid="joint-design">
              <thead>
                <tr>
                  <th>joint</th>
                  <th>q ({units.q})</th>
                  <th>τ avg ({units.stress})</th>
                  <th>what it needs</th>
                </tr>
              </thead>
              <tbody>
                {design.rows.map((r) => (
                  <tr key={r.key} className={r.key === ui.selected ? 'selected' : ''}>
                    <td>
                      {r.joint.labels[0]} | {r.joint.labels[1]}
                    </td>
                    <td className="value" data-testid={`joint-q-${r.key}`} data-value={String(r.qShown)}>
                      {fmt(Math.abs(r.qShown), 4)}
                    </td>
                    <td className="value">{fmt(r.tauShown, 3)}</td>
                    <DesignCells row={r} units={units} method={ui.method} />
                  </tr>
                ))}
              </tbody>
            </table>
          )}
          {design.warnings.map((w, i) => (
            <p key={i} className="warning small">
              {w}
            </p>
          ))}
          <label className="small">
            <input type="checkbox" data-testid="joints-diagram" checked={ui.diagram} onChange={(e) => store.set({ diagram: e.target.checked })} /> draw the shear-flow diagram on plate walls
          </label>
          <p className="muted small">q assumes the parts act together in bending (E-weighted section with several materials; the general form with Ixy for unsymmetric sections). Sizes are in {units.leg}, q in {units.q}.</p>
          <p className="caution small" data-testid="joints-caution">
            {JOINTS_CAUTION}
          </p>
        </section>
      )}
    </details>
  );
}

