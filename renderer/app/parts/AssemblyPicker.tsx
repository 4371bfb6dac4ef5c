/**
 * Assemblies in the palette: pick a built-up section (plate girder, rolled I with cover plates,
 * two channels, double angles, flitch beam, bolt holes), type its dimensions in the document
 * unit (catalogue search for the rolled member), see each problem next to its field, and place
 * every piece at once as one undo step, selected together, with materials by role.
 * The logic is in ./assembly-model.ts; this component only keeps the typed text and renders.
 */
import { useMemo, useState, type ReactElement } from 'react';
import type { SectionDocument } from '../../../core/document/types.ts';
import { CAUTION } from '../../../core/member/index.ts';
import { sectionFromDocument } from '../../../core/section/index.ts';
import { formatSig } from '../../../core/units/index.ts';
import type { Editor, EditorState } from '../../editor/editor.ts';
import {
  ASSEMBLIES, assemblyCatalogueSearch, assemblySpec, buildAssembly, defaultRoleMaterial, defaultTexts, documentUsesMaterials, missingRoleMaterials, placeAssembly, placeAssemblyStep, roleMaterialChoices,
  type AssemblyField, type AssemblyId, type AssemblySpec, type Role,
} from './assembly-model.ts';
import type { BuiltUpPiece } from '../../../core/parts/index.ts';
import './assembly.css';

const ROLE_LABEL: Readonly<Record<Role, string>> = { steel: 'steel pieces', timber: 'lumber plies', engineered: 'engineered wood', 'joist-flange': 'flanges', 'joist-web': 'web (OSB, plywood)' };

/** Area of the pieces on their own, for the line above the Place button (bolt holes alone have none). */
function piecesArea(doc: SectionDocument, pieces: readonly BuiltUpPiece[]): number | null {
  if (!pieces.some((p) => p.operation === 'add')) return null;
  const alone = placeAssembly({ ...doc, parts: [], materials: [], defaultMaterial: null }, pieces, {}).doc;
  return sectionFromDocument(alone).properties?.area ?? null;
}

function groupsOf(spec: AssemblySpec): { name: string; fields: AssemblyField[] }[] {
  const groups: { name: string; fields: AssemblyField[] }[] = [];
  for (const f of spec.fields) {
    const last = groups[groups.length - 1];
    if (last?.name === f.group) last.fields.push(f);
    else groups.push({ name: f.group, fields: [f] });
  }
  return groups;
}

function DesignationField({ field, text, onText }: { field: AssemblyField; text: string; onText: (t: string) => void }): ReactElement {
  const found = useMemo(() => assemblyCatalogueSearch(text, field.families ?? [], 8), [text, field.families]);
  const exact = found.some((e) => e.designation.toUpperCase() === text.trim().toUpperCase().replace(/\s+/g, ''));
  return (
    <>
      <input data-testid={`assembly-field-${field.key}`} value={text} spellCheck={false} placeholder={`${(field.families ?? []).join(', ')}…`} onChange={(e) => onText(e.target.value)} />
      {!exact && found.length > 0 && (
        <ul className="catalogue-results assembly-results" data-testid="assembly-catalogue-results">
          {found.map((e, i) => (
            <li key={e.designation}>
              <button type="button" data-testid={`assembly-catalogue-result-${i}`} title={`${e.source}. ${e.modelling.join(' ')}`} onClick={() => onText(e.designation)}>
                <strong>{e.designation}</strong>
                <span className="muted">d {formatSig(e.depth, 3)} in{e.nominalWeight !== undefined ? ` · ${formatSig(e.nominalWeight, 3)} lb/ft` : ''}</span>
              </button>
            </li>
          ))}
        </ul>
      )}
    </>
  );
}

function Field({ field, text, error, unit, onText }: { field: AssemblyField; text: string; error: string | undefined; unit: string; onText: (t: string) => void }): ReactElement {
  const wide = field.kind === 'designation' || field.kind === 'choice';
  const measured = field.kind === 'length' || field.kind === 'gap' || field.kind === 'position';
  return (
    <div className={`assembly-field${wide ? ' wide' : ''}${error ? ' bad' : ''}`}>
      <label>
        <span>
          {field.label}
          {measured ? `, ${unit}` : ''}
        </span>
        {field.kind === 'designation' ? null : field.kind === 'choice' ? (
          <select data-testid={`assembly-field-${field.key}`} value={text} onChange={(e) => onText(e.target.value)}>
            {(field.choices ?? []).map((c) => (
              <option key={c.value} value={c.value}>
                {c.label}
              </option>
            ))}
          </select>
        ) : (
          <input data-testid={`assembly-field-${field.key}`} value={text} placeholder={field.placeholder ?? ''} inputMode="decimal" onChange={(e) => onText(e.target.value)} />
        )}
      </label>
      {field.kind === 'designation' && <DesignationField field={field} text={text} onText={onText} />}
      {error && (
        <p className="assembly-error" data-testid={`assembly-error-${field.key}`} role="alert">
          {error}
        </p>
      )}
    </div>
  );
}

/** `onPlaced` runs after the pieces are placed (the app fits the view to the section). */
export function AssemblyPicker({ editor, state, onPlaced }: { editor: Editor; state: EditorState; onPlaced?: () => void }): ReactElement {
  const doc = state.doc;
  const unit = doc.unit;
  const [kind, setKind] = useState<AssemblyId>('plate-girder');
  // Typed text per assembly and document unit, so changing the unit never reads old numbers in the new unit.
  const [typed, setTyped] = useState<Record<string, Record<string, string>>>({});
  const [chosen, setChosen] = useState<Partial<Record<Role, string>>>({});
  const [attempted, setAttempted] = useState(false);
  const [placedNote, setPlacedNote] = useState('');
  const spec = assemblySpec(kind);
  const formKey = `${unit}|${kind}`;
  const defaults = useMemo(() => defaultTexts(spec, unit), [spec, unit]);
  const texts = typed[formKey] ?? defaults;
  const built = useMemo(() => buildAssembly(kind, texts, unit), [kind, texts, unit]);
  const area = useMemo(() => (built.pieces.length > 0 ? piecesArea(doc, built.pieces) : null), [doc, built.pieces]);
  const usesMaterials = documentUsesMaterials(doc);

  const materialFor = (role: Role): string | null => {
    const choices = roleMaterialChoices(doc, role);
    const pick = chosen[role];
    if (pick === '') return null;
    if (pick !== undefined && choices.some((c) => c.id === pick)) return pick;
    return defaultRoleMaterial(doc, role, kind, texts);
  };
  const missing = missingRoleMaterials(doc, spec, Object.fromEntries(spec.roles.map((r) => [r, materialFor(r)])));
  const problems = Object.keys(built.fieldErrors).length + built.errors.length + missing.length;

  const setText = (key: string, value: string): void => {
    setPlacedNote('');
    setTyped((t) => ({ ...t, [formKey]: { ...texts, [key]: value } }));
  };
  const place = (): void => {
    setAttempted(true);
    if (problems > 0 || built.pieces.length === 0) return setPlacedNote('');
    const materials = Object.fromEntries(spec.roles.map((r) => [r, materialFor(r)]));
    const ids = placeAssemblyStep(editor, `Place ${spec.label.toLowerCase()}`, built.pieces, materials);
    setAttempted(false);
    setPlacedNote(`Placed ${ids.length} parts, selected together (one undo step).`);
    onPlaced?.();
  };

  return (
    <details className="palette assemblies" data-testid="assemblies">
      <summary>Assemblies (built-up sections)</summary>
      <label className="field">
        <span>assembly</span>
        <select
          data-testid="assembly-kind"
          value={kind}
          onChange={(e) => {
            setKind(e.target.value as AssemblyId);
            setAttempted(false);
            setPlacedNote('');
          }}
        >
          {ASSEMBLIES.map((a) => (
            <option key={a.id} value={a.id}>
              {a.label}
            </option>
          ))}
        </select>
      </label>
      <p className="muted small assembly-summary">{spec.summary} Dimensions in {unit}.</p>
      {spec.source !== undefined && (
        <p className="muted small" data-testid="assembly-source">
          Source: {spec.source}.
        </p>
      )}
      {groupsOf(spec).map((g) => (
        <fieldset key={g.name} className="assembly-group">
          <legend>{g.name}</legend>
          <div className="assembly-fields">
            {g.fields.map((f) => (
              <Field key={f.key} field={f} text={texts[f.key] ?? ''} error={built.fieldErrors[f.key]} unit={unit} onText={(t) => setText(f.key, t)} />
            ))}
          </div>
        </fieldset>
      ))}
      {spec.roles.length > 0 && (
        <fieldset className="assembly-group">
          <legend>materials</legend>
          <div className="assembly-fields">
            {spec.roles.map((role) => (
              <div key={role} className="assembly-field wide">
                <label>
                  <span>{ROLE_LABEL[role]}</span>
                  <select data-testid={`assembly-material-${role}`} value={materialFor(role) ?? ''} onChange={(e) => setChosen((c) => ({ ...c, [role]: e.target.value }))}>
                    <option value="">{usesMaterials ? 'none (the document default)' : 'none (this document uses no materials)'}</option>
                    {roleMaterialChoices(doc, role).map((m) => (
                      <option key={m.id} value={m.id}>
                        {m.name}
                      </option>
                    ))}
                  </select>
                </label>
              </div>
            ))}
          </div>
        </fieldset>
      )}
      {[...built.errors, ...missing].map((e) => (
        <p key={e} className="assembly-error" data-testid="assembly-errors" role="alert">
          {e}
        </p>
      ))}
      <div className="assembly-place">
        <span className="muted small" data-testid="assembly-preview">
          {problems > 0
            ? `${problems} ${problems === 1 ? 'problem' : 'problems'} to correct`
            : `${built.pieces.length} parts${area !== null ? ` · A ${formatSig(area, 5)} ${unit}²` : ''}`}
        </span>
        <button type="button" data-testid="assembly-place" onClick={place}>
          Place
        </button>
      </div>
      {attempted && problems > 0 && (
        <p className="assembly-error" data-testid="assembly-refused" role="alert">
          Nothing placed: correct the {problems === 1 ? 'field' : 'fields'} marked above. The document is unchanged.
        </p>
      )}
      {placedNote && (
        <p className="muted small" data-testid="assembly-placed">
          {placedNote}
        </p>
      )}
      <p className="muted small">{CAUTION}</p>
    </details>
  );
}
