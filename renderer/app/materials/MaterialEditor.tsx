/**
 * The document's own materials: a list with edit, duplicate and delete, and a form to add or
 * change one (name, kind, E, G or ν, density, yield or reference strength, optional fu, Emin,
 * Fb, a source and a note). The form keeps the typed text; the document changes only when
 * every field reads and the material schema accepts it, as one undo step. The parsing and the
 * document changes are in ./material-form.ts.
 */
import { useState, type ReactElement } from 'react';
import type { SectionDocument } from '../../../core/document/types.ts';
import { BUILT_IN_MATERIALS, MATERIAL_KINDS, STRENGTH_BASES, STRESS_UNITS, validateMaterial, type Material } from '../../../core/materials/index.ts';
import type { Editor } from '../../editor/editor.ts';
import {
  blankDraft,
  DENSITY_UNITS,
  draftFromMaterial,
  draftFromStored,
  draftInDensityUnit,
  draftInStressUnit,
  FIELD_LABELS,
  imperialUnit,
  materialFromDraft,
  materialUse,
  planMaterialDelete,
  withMaterial,
  type DraftOrigin,
  type FieldErrors,
  type MaterialDraft,
  type NumberField,
} from './material-form.ts';
import './material-editor.css';

const KIND_NAMES: Readonly<Record<(typeof MATERIAL_KINDS)[number], string>> = {
  steel: 'steel', aluminium: 'aluminium', 'sawn-lumber': 'sawn lumber', 'engineered-wood': 'engineered wood', plastic: 'plastic', other: 'other',
};
const BASIS_NAMES: Readonly<Record<(typeof STRENGTH_BASES)[number], string>> = {
  yield: 'yield strength (metals)', 'reference-bending': 'reference bending value (wood)', tensile: 'tensile strength (plastics)',
};
/** Which strength fy usually is for a kind (common practice): yield for metals, the NDS reference bending value for wood, tensile for plastics. */
const KIND_BASIS: Partial<Record<(typeof MATERIAL_KINDS)[number], (typeof STRENGTH_BASES)[number]>> = {
  steel: 'yield', aluminium: 'yield', 'sawn-lumber': 'reference-bending', 'engineered-wood': 'reference-bending', plastic: 'tensile',
};
const DENSITY_NAMES: Readonly<Record<(typeof DENSITY_UNITS)[number], string>> = { 'kg/m3': 'kg/m³', 'lb/ft3': 'lb/ft³' };

interface FormState {
  readonly editingId: string | null;
  readonly draft: MaterialDraft;
  readonly origin: DraftOrigin | null;
  readonly errors: FieldErrors;
  /** Errors are shown (and kept up to date) once the user has tried to save. */
  readonly tried: boolean;
  readonly title: string;
}

/** A stored document material read as a Material, or null when its fields do not pass. */
function asMaterial(raw: unknown): Material | null {
  return validateMaterial(raw).material ?? null;
}

function NumberInput({ form, field, unit, onText }: { form: FormState; field: NumberField; unit: string; onText: (f: NumberField, t: string) => void }): ReactElement {
  const error = form.tried ? form.errors[field] : undefined;
  const source = form.origin?.material.sources?.[field];
  const unchanged = form.origin !== null && form.draft.text[field] === form.origin.shown[field];
  return (
    <div className={error ? 'mf-field bad' : 'mf-field'}>
      <label htmlFor={`mf-${field}`}>{FIELD_LABELS[field]}</label>
      <span className="mf-input">
        <input
          id={`mf-${field}`}
          data-testid={`mf-${field}`}
          value={form.draft.text[field]}
          aria-invalid={error ? true : undefined}
          aria-describedby={error ? `mf-${field}-error` : undefined}
          onChange={(e) => onText(field, e.target.value)}
        />
        <span className="mf-unit">{unit}</span>
      </span>
      {error && (
        <span className="mf-error" id={`mf-${field}-error`} role="alert" data-testid={`mf-error-${field}`}>
          {error}
        </span>
      )}
      {source && unchanged && (
        <span className="mf-source" title={source}>
          source: {source}
        </span>
      )}
    </div>
  );
}

function MaterialForm({ form, onChange, onSave, onCancel }: { form: FormState; onChange: (f: FormState) => void; onSave: () => void; onCancel: () => void }): ReactElement {
  const d = form.draft;
  const set = (draft: MaterialDraft): void => onChange({ ...form, draft });
  const text = (f: NumberField, t: string): void => set({ ...d, text: { ...d.text, [f]: t } });
  const num = (f: NumberField, unit: string): ReactElement => <NumberInput form={form} field={f} unit={unit} onText={text} />;
  const nameError = form.tried ? form.errors.name : undefined;
  return (
    <form
      className="material-form"
      data-testid="material-form"
      aria-label={form.title}
      noValidate
      onSubmit={(e) => {
        e.preventDefault();
        onSave();
      }}
    >
      <h3>{form.title}</h3>
      <div className={nameError ? 'mf-field bad' : 'mf-field'}>
        <label htmlFor="mf-name">name</label>
        <input id="mf-name" data-testid="mf-name" value={d.name} onChange={(e) => set({ ...d, name: e.target.value })} aria-invalid={nameError ? true : undefined} />
        {nameError && (
          <span className="mf-error" role="alert" data-testid="mf-error-name">
            {nameError}
          </span>
        )}
      </div>
      <div className="mf-row">
        <label className="field">
          <span>kind</span>
          <select
            data-testid="mf-kind"
            value={d.kind}
            onChange={(e) => {
              const kind = e.target.value as MaterialDraft['kind'];
              // The usual strength for the kind; the user may still choose another below.
              set({ ...d, kind, strengthBasis: KIND_BASIS[kind] ?? d.strengthBasis });
            }}
          >
            {MATERIAL_KINDS.map((k) => (
              <option key={k} value={k}>
                {KIND_NAMES[k]}
              </option>
            ))}
          </select>
        </label>
        <label className="field">
          <span>stresses in</span>
          <select data-testid="mf-stress-unit" value={d.stressUnit} onChange={(e) => set(draftInStressUnit(d, e.target.value as MaterialDraft['stressUnit']))}>
            {STRESS_UNITS.map((u) => (
              <option key={u} value={u}>
                {u}
              </option>
            ))}
          </select>
        </label>
        <label className="field">
          <span>density in</span>
          <select data-testid="mf-density-unit" value={d.densityUnit} onChange={(e) => set(draftInDensityUnit(d, e.target.value as MaterialDraft['densityUnit']))}>
            {DENSITY_UNITS.map((u) => (
              <option key={u} value={u}>
                {DENSITY_NAMES[u]}
              </option>
            ))}
          </select>
        </label>
      </div>
      <p className="muted small">Changing a unit converts the numbers typed so far. A number may carry its own unit, e.g. “200 GPa”.</p>
      {num('E', d.stressUnit)}
      <p className="muted small mf-hint">Give G or ν (or both); G = E / (2(1 + ν)) is used when only ν is given.</p>
      <div className="mf-pair">
        {num('G', d.stressUnit)}
        {num('nu', '—')}
      </div>
      {num('density', DENSITY_NAMES[d.densityUnit])}
      <label className="field">
        <span>the strength fy is a</span>
        <select data-testid="mf-basis" value={d.strengthBasis} onChange={(e) => set({ ...d, strengthBasis: e.target.value as MaterialDraft['strengthBasis'] })}>
          {STRENGTH_BASES.map((b) => (
            <option key={b} value={b}>
              {BASIS_NAMES[b]}
            </option>
          ))}
        </select>
      </label>
      {num('fy', d.stressUnit)}
      <details className="mf-optional" open={d.text.fu !== '' || d.text.Emin !== '' || d.text.Fb !== '' || undefined}>
        <summary>optional: fu, Emin, Fb</summary>
        {num('fu', d.stressUnit)}
        {num('Emin', d.stressUnit)}
        {num('Fb', d.stressUnit)}
      </details>
      <label className="field">
        <span>source of the values you type or change (kept with each of them)</span>
        <input data-testid="mf-source" value={d.source} placeholder="e.g. mill certificate, supplier data sheet" onChange={(e) => set({ ...d, source: e.target.value })} />
      </label>
      <label className="mf-check">
        <input type="checkbox" data-testid="mf-from-memory" checked={d.fromMemory} onChange={(e) => set({ ...d, fromMemory: e.target.checked })} /> some values are from memory, not read from a source
      </label>
      <label className="field">
        <span>note</span>
        <input data-testid="mf-note" value={d.note} onChange={(e) => set({ ...d, note: e.target.value })} />
      </label>
      {form.tried && form.errors.form && (
        <p className="mf-error" role="alert" data-testid="mf-error-form">
          {form.errors.form}
        </p>
      )}
      {form.tried && Object.keys(form.errors).length > 0 && (
        <p className="mf-summary" data-testid="mf-not-saved">
          Not saved: {Object.keys(form.errors).length} field{Object.keys(form.errors).length === 1 ? '' : 's'} to correct. The document is unchanged.
        </p>
      )}
      <div className="buttons">
        <button type="submit" data-testid="mf-save">
          {form.editingId === null ? 'Add to this document' : 'Save changes'}
        </button>
        <button type="button" data-testid="mf-cancel" onClick={onCancel}>
          Cancel
        </button>
      </div>
    </form>
  );
}

export function MaterialEditor({ editor, doc }: { editor: Editor; doc: SectionDocument }): ReactElement {
  const [form, setForm] = useState<FormState | null>(null);
  const [copyFrom, setCopyFrom] = useState('');
  const [deleting, setDeleting] = useState<string | null>(null);
  const densityUnit = imperialUnit(doc) ? 'lb/ft3' : 'kg/m3';

  const open = (m: Material | null, editingId: string | null, title: string, name?: string): void => {
    setDeleting(null);
    if (m === null) return setForm({ editingId, draft: blankDraft(doc), origin: null, errors: {}, tried: false, title });
    const { draft, origin } = draftFromMaterial(m, densityUnit, name);
    setForm({ editingId, draft, origin, errors: {}, tried: false, title });
  };
  /** An entry whose stored fields do not pass: the form opens with what can be read and every problem named. */
  const repair = (raw: SectionDocument['materials'][number]): void => {
    setDeleting(null);
    const { draft, origin } = draftFromStored(raw, doc);
    const r = materialFromDraft(draft, origin, raw.id, doc);
    setForm({ editingId: raw.id, draft, origin, errors: r.ok ? {} : r.errors, tried: true, title: `Repair "${raw.name}" (its stored values do not pass)` });
  };
    const change = (f: FormState): void => {
    if (!f.tried) return setForm(f);
    const r = materialFromDraft(f.draft, f.origin, f.editingId, doc);
    setForm({ ...f, errors: r.ok ? {} : r.errors });
  };
  const save = (): void => {
    if (!form) return;
    const r = materialFromDraft(form.draft, form.origin, form.editingId, doc);
    if (!r.ok) return setForm({ ...form, errors: r.errors, tried: true });
    editor.replaceDocument(form.editingId === null ? `Add material ${r.material.name}` : `Edit material ${r.material.name}`, (d) => withMaterial(d, r.material));
    setForm(null);
  };
  const sources = [
    ...doc.materials.map((m) => ({ value: `doc:${m.id}`, label: `${m.name} (this document)`, material: asMaterial(m) })),
    ...BUILT_IN_MATERIALS.map((m) => ({ value: `lib:${m.id}`, label: m.name, material: m as Material | null })),
  ];
  const plan = deleting !== null ? planMaterialDelete(doc, deleting) : null;

  return (
    <div className="material-editor" data-testid="material-editor">
      <h3>This document's materials</h3>
      {doc.materials.length === 0 && <p className="muted small">None yet. Add one, or start from a library material; choosing a library material for a part also copies it here.</p>}
      <ul className="material-list">
        {doc.materials.map((raw) => {
          const m = asMaterial(raw);
          const use = materialUse(doc, raw.id);
          const uses = [
            use.isDefault ? 'default' : '',
            use.parts.length > 0 ? `${use.parts.length} part${use.parts.length === 1 ? '' : 's'}` : '',
            use.isReference ? 'E_ref' : '',
          ].filter((s) => s !== '');
          return (
            <li key={raw.id} data-testid={`material-row-${raw.id}`}>
              <span className="material-name" title={raw.id}>
                {raw.name}
                <span className="muted small">
                  {m ? ` E ${m.E} ${m.stressUnit}` : ' its stored values do not pass the checks; Repair shows which'}
                  {uses.length > 0 ? ` · ${uses.join(', ')}` : ''}
                </span>
              </span>
              <span className="row-actions">
                <button type="button" data-testid={`material-edit-${raw.id}`} onClick={() => (m ? open(m, raw.id, `Edit "${raw.name}"`) : repair(raw))}>
                  {m ? 'Edit' : 'Repair'}
                </button>
                <button type="button" data-testid={`material-duplicate-${raw.id}`} disabled={m === null} onClick={() => m && open(m, null, `New material from "${raw.name}"`, `${raw.name} (copy)`)}>
                  Duplicate
                </button>
                <button type="button" data-testid={`material-delete-${raw.id}`} onClick={() => (setForm(null), setDeleting(raw.id))}>
                  Delete
                </button>
              </span>
            </li>
          );
        })}
      </ul>
      {plan && deleting !== null && (
        <div className={plan.ok ? 'mf-confirm' : 'mf-confirm refused'} role={plan.ok ? 'dialog' : 'alert'} data-testid="material-delete-box">
          {plan.ok ? (
            <>
              <p data-testid="material-delete-message">
                Delete “{doc.materials.find((m) => m.id === deleting)?.name}” from this document?
                {plan.summary.length > 0 ? ` Then ${plan.summary.join('; ')}.` : ' No part uses it.'}
              </p>
              <div className="buttons">
                <button
                  type="button"
                  data-testid="material-delete-confirm"
                  onClick={() => {
                    const name = doc.materials.find((m) => m.id === deleting)?.name ?? deleting;
                    editor.replaceDocument(`Delete material ${name}`, plan.apply);
                    setDeleting(null);
                  }}
                >
                  {plan.summary.some((s) => s.includes('will use')) ? 'Delete and reassign' : 'Delete'}
                </button>
                <button type="button" data-testid="material-delete-cancel" onClick={() => setDeleting(null)}>
                  Keep it
                </button>
              </div>
            </>
          ) : (
            <>
              <p data-testid="material-delete-message">{plan.message}</p>
              <button type="button" data-testid="material-delete-cancel" onClick={() => setDeleting(null)}>
                OK
              </button>
            </>
          )}
        </div>
      )}
      {form === null && (
        <div className="mf-start">
          <button type="button" data-testid="material-new" onClick={() => open(null, null, 'New material')}>
            New material…
          </button>
          <span className="mf-copy">
            <select data-testid="material-copy-from" value={copyFrom} onChange={(e) => setCopyFrom(e.target.value)} aria-label="material to start from">
              <option value="">start from…</option>
              {sources.map((s) => (
                <option key={s.value} value={s.value} disabled={s.material === null}>
                  {s.label}
                </option>
              ))}
            </select>
            <button
              type="button"
              data-testid="material-copy"
              disabled={copyFrom === ''}
              onClick={() => {
                const s = sources.find((x) => x.value === copyFrom);
                if (s?.material) open(s.material, null, `New material from "${s.material.name}"`, `${s.material.name} (copy)`);
              }}
            >
              Copy to edit
            </button>
          </span>
        </div>
      )}
      {form && <MaterialForm form={form} onChange={change} onSave={save} onCancel={() => setForm(null)} />}
    </div>
  );
}
