/**
 * Standard parts: a palette of part types (core/parts) and a catalogue search (core/catalogue),
 * and the parameter panel of a selected standard part: its dimensions by trade symbol, changed
 * live, until the user converts it to an outline. Dimensions are in the document unit; the
 * catalogue and the part defaults are in inches and are converted through core/units
 * (catalogueParamsInUnit, shared with the assemblies of ./AssemblyPicker.tsx, shown below).
 */
import { useMemo, useState, type ReactElement } from 'react';
import type { Part, PolygonPart, SectionDocument, ShapePart } from '../../../core/document/types.ts';
import { findShapes, searchCatalogue, STEEL_LBFT_PER_IN2, type CatalogueEntry, type Family } from '../../../core/catalogue/index.ts';
import { weightAgreement } from '../../../core/catalogue/measure.ts';
import { defaultParams, getPartType, partTypes } from '../../../core/parts/index.ts';
import type { ParamSpec } from '../../../core/parts/index.ts';
import { regionIntegrals } from '../../../core/properties/index.ts';
import { localRegion } from '../../../core/section/index.ts';
import { formatSig, type LengthUnit } from '../../../core/units/index.ts';
import type { Editor, EditorState } from '../../editor/editor.ts';
import { uniquePartId } from '../../editor/transforms.ts';
import { AssemblyPicker } from './AssemblyPicker.tsx';
import { catalogueParamsInUnit as paramsInUnit } from './assembly-model.ts';
import { parseNumber } from '../shell/numbers.ts';

const FAMILIES: readonly Family[] = ['W', 'S', 'HP', 'C', 'MC', 'L', '2L', 'WT', 'HSS', 'Pipe', 'lumber'];

function shapePart(doc: SectionDocument, id: string, shape: string, params: Record<string, number>, name: string, designation?: string): ShapePart {
  return {
    id, name, type: 'shape', shape, params, operation: 'add', material: null, visible: true,
    placement: { x: 0, y: 0, rotationDeg: 0, mirror: false },
    ...(designation !== undefined ? { designation } : {}),
  };
}

/** The exact outline of a standard part as outline parts (arcs kept as bulges), same placement. */
export function polygonsOfShape(part: ShapePart, unit: LengthUnit, doc: SectionDocument): PolygonPart[] | string {
  const { region, diagnostics } = localRegion(part, unit);
  if (diagnostics.length > 0) return diagnostics.map((d) => d.message).join(' ');
  const pts = (xy: Float64Array): [number, number][] => Array.from({ length: xy.length / 2 }, (_, i) => [xy[2 * i] as number, xy[2 * i + 1] as number]);
  let working = doc;
  return region.map((poly, k) => {
    const id = k === 0 ? part.id : uniquePartId(working);
    const outer = pts(poly.outer.xy);
    const p: PolygonPart = {
      id, name: region.length === 1 ? part.name : `${part.name} ${k + 1}`, type: 'polygon', operation: part.operation, material: part.material, visible: part.visible, placement: part.placement,
      outer,
      ...(poly.outer.bulge ? { outerBulges: Array.from(poly.outer.bulge) } : {}),
      holes: poly.holes.map((h) => pts(h.xy)),
      ...(poly.holes.some((h) => h.bulge) ? { holeBulges: poly.holes.map((h) => (h.bulge ? Array.from(h.bulge) : new Array<number>(h.xy.length / 2).fill(0))) } : {}),
    };
    working = { ...working, parts: [...working.parts, p] };
    return p;
  });
}

/**
 * Lumber: the NDS Supplement Table 1B gives approximate weights per foot for wood densities of
 * 25 to 50 lb/ft³ (from memory); the catalogue shows the 35 lb/ft³ column's rule, A·35/144.
 */
const LUMBER_PCF = 35;

/**
 * Tabulated weight beside the weight computed from the rebuilt area (steel, 490 lb/ft³; HSS and
 * Pipe at their nominal wall); for lumber, the density-based weight of the dressed b·d beside the
 * one from the rebuilt area.
 */
function weightText(e: CatalogueEntry): string {
  if (e.family === 'lumber') {
    const built = getPartType(e.shape)?.region(e.params);
    const b = e.dimensions['b'];
    const d = e.dimensions['d'];
    if (built === undefined || built.diagnostics.length > 0 || b === undefined || d === undefined) return '';
    const area = regionIntegrals(built.region).A;
    return ` · at ${LUMBER_PCF} lb/ft³: ${formatSig((b * d * LUMBER_PCF) / 144, 3)} lb/ft (b·d), computed ${formatSig((area * LUMBER_PCF) / 144, 3)}`;
  }
  if (e.nominalWeight === undefined) return '';
  const a = weightAgreement(e);
  const computed = a === undefined || !Number.isFinite(a.area) ? '' : `, computed ${formatSig(a.area * STEEL_LBFT_PER_IN2, 3)}`;
  return ` · W ${formatSig(e.nominalWeight, 3)} lb/ft${computed}`;
}

export function PartsPalette({ editor, state, onPlaced }: { editor: Editor; state: EditorState; onPlaced?: () => void }): ReactElement {
  const unit = state.doc.unit;
  const [typeId, setTypeId] = useState('i-shape');
  const [text, setText] = useState('');
  const [family, setFamily] = useState<Family | ''>('');
  // Typed text: closest matches first (lumber first for a lumber size); a family alone: catalogue order.
  const found = useMemo(
    () => (text.trim() === '' ? (family === '' ? [] : searchCatalogue({ family, limit: 40 })) : findShapes(text, undefined, 400).filter((e) => family === '' || e.family === family).slice(0, 40)),
    [text, family],
  );

  const addType = (): void => {
    const type = getPartType(typeId);
    if (!type) return;
    editor.addPart(`Add ${type.label}`, (doc, id) => shapePart(doc, id, type.id, paramsInUnit(type.id, defaultParams(type), unit), `${type.label} ${doc.parts.length + 1}`));
  };
  const place = (e: CatalogueEntry): void => {
    editor.addPart(`Add ${e.designation}`, (doc, id) => shapePart(doc, id, e.shape, paramsInUnit(e.shape, e.params, unit), e.designation, e.designation));
  };

  return (
    <>
    <details className="palette">
      <summary>Standard parts and catalogue</summary>
      <div className="grid4">
        <label className="field" style={{ gridColumn: 'span 3' }}>
          <span>part type</span>
          <select data-testid="palette-type" value={typeId} onChange={(e) => setTypeId(e.target.value)}>
            {partTypes().map((t) => (
              <option key={t.id} value={t.id}>
                {t.label}
              </option>
            ))}
          </select>
        </label>
        <button type="button" data-testid="palette-add" onClick={addType}>Add</button>
      </div>
      <div className="grid4">
        <label className="field" style={{ gridColumn: 'span 3' }}>
          <span>catalogue: designation</span>
          <input
            data-testid="catalogue-search"
            value={text}
            placeholder="W14X90, HSS6X6, 2x10… (Enter adds the first)"
            onChange={(e) => setText(e.target.value)}
            onKeyDown={(e) => {
              if (e.key === 'Enter' && found[0] !== undefined) place(found[0]);
            }}
            spellCheck={false}
          />
        </label>
        <label className="field">
          <span>family</span>
          <select data-testid="catalogue-family" value={family} onChange={(e) => setFamily(e.target.value as Family | '')}>
            <option value="">any</option>
            {FAMILIES.map((f) => (
              <option key={f} value={f}>
                {f}
              </option>
            ))}
          </select>
        </label>
      </div>
      {found.length > 0 && (
        <ul className="catalogue-results" data-testid="catalogue-results">
          {found.map((e, i) => (
            <li key={e.designation}>
              <button type="button" data-testid={`catalogue-result-${i}`} title={`${e.source}. ${e.modelling.join(' ')}`} onClick={() => place(e)}>
                <strong>{e.designation}</strong>
                <span className="muted" data-testid={`catalogue-result-text-${i}`} data-family={e.family}>
                  d {formatSig(e.depth, 3)} in{weightText(e)}
                </span>
              </button>
            </li>
          ))}
        </ul>
      )}
      <p className="muted small">Catalogue dimensions as published (AISC Shapes Database v15.0; NDS Supplement dressed lumber); properties are always computed from the geometry.</p>
    </details>
    <AssemblyPicker editor={editor} state={state} {...(onPlaced ? { onPlaced } : {})} />
    </>
  );
}

/** The dimensions of a selected standard part, by trade symbol, changed live. */
export function ShapeParameters({ editor, part, unit }: { editor: Editor; part: ShapePart; unit: LengthUnit }): ReactElement {
  const type = getPartType(part.shape);
  const [error, setError] = useState('');
  const [texts, setTexts] = useState<Record<string, string>>({});
  if (!type) return <p className="error">Unknown part type "{part.shape}".</p>;
  const edit = (spec: ParamSpec, raw: string): void => {
    setTexts((t) => ({ ...t, [spec.key]: raw }));
    if (raw.trim() === '' && spec.optional) {
      setError('');
      editor.livePart(part.id, (p) => {
        if (p.type !== 'shape') return p;
        const { [spec.key]: _gone, ...rest } = p.params;
        return { ...p, params: rest };
      });
      return;
    }
    const r = parseNumber(raw, `${spec.key} (${spec.label})`);
    if (!r.ok) return setError(r.message);
    setError('');
    // A designation no longer describes the part once a dimension changes.
    editor.livePart(part.id, (p): Part => {
      if (p.type !== 'shape') return p;
      const { designation: _d, ...rest } = p;
      return { ...rest, params: { ...p.params, [spec.key]: r.value } };
    });
  };
  const finish = (): void => {
    setTexts({});
    editor.commitLive('Change dimension');
  };
  const convert = (): void => {
    const polys = polygonsOfShape(part, unit, state(editor));
    if (typeof polys === 'string') return setError(polys);
    editor.replaceDocument('Convert to outline', (doc) => ({ ...doc, parts: doc.parts.flatMap((p) => (p.id === part.id ? polys : [p])) }));
  };
  return (
    <div className="shape-params" data-testid="shape-params">
      <p className="muted small">
        {type.label}
        {part.designation ? ` — ${part.designation}` : ''}. Dimensions in {unit}
        {type.regionUnit === 'in' ? ' (nominal lumber sizes in inches)' : ''}.
      </p>
      <div className="grid2">
        {type.params.map((spec) => {
          const value = part.params[spec.key];
          return (
            <label key={spec.key} className="field" title={spec.label}>
              <span>
                {spec.key}
                {spec.optional ? ' (opt.)' : ''}
              </span>
              <input
                data-testid={`param-${spec.key}`}
                value={texts[spec.key] ?? (value === undefined ? '' : String(value))}
                placeholder={spec.defaultRule ?? ''}
                onChange={(e) => edit(spec, e.target.value)}
                onBlur={finish}
                onKeyDown={(e) => {
                  if (e.key === 'Enter') finish();
                  if (e.key === 'Escape') {
                    setTexts({});
                    editor.cancelLive();
                  }
                }}
              />
            </label>
          );
        })}
      </div>
      {error && <p className="error" role="alert">{error}</p>}
      <button type="button" data-testid="convert-to-outline" onClick={convert} title="Replace the parametric part by its exact outline (arcs kept)">
        Convert to outline
      </button>
    </div>
  );
}

const state = (editor: Editor): SectionDocument => editor.getState().doc;
