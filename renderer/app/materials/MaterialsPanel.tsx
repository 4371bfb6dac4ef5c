/**
 * Materials: the document default and, through the selected part, each part's material
 * (core/materials built-in library or the document's own, edited in ./MaterialEditor.tsx); the
 * transformed section: E_ref (the first part's material, a chosen material, or a typed value,
 * stored in the document), modular ratios, EA, EI, principal EI, weight per length, first-yield
 * and plastic moments per material, and on request the transformed (equivalent) widths.
 * Core gives EA in N, EI in N·m², mass in kg/m, moments in N·m; shown in kN, kN·m², kg/m, kN·m,
 * or for inch documents kip, kip·in², lb/ft, kip·ft. data-value keeps core's SI number.
 */
import { useDeferredValue, useMemo, useState, type ReactElement } from 'react';
import type { SectionDocument } from '../../../core/document/types.ts';
import {
  BUILT_IN_MATERIALS,
  compositeProperties,
  documentReferenceModulus,
  materialPiecesFromDocument,
  parseQuantity,
  plasticCapacity,
  QuantityError,
  STRESS_UNITS,
  type CompositeProperties,
  type MaterialPiece,
  type StressUnit,
} from '../../../core/materials/index.ts';
import { CAUTION } from '../../../core/member/index.ts';
import { formatSig, fromSI, toDisplay, unitSystem, type DisplaySet } from '../../../core/units/index.ts';
import type { Editor } from '../../editor/editor.ts';
import { MaterialEditor } from './MaterialEditor.tsx';
import { imperialUnit, withDefaultMaterial, withMaterialStored } from './material-form.ts';
import { parseNumber } from '../shell/numbers.ts';
import { TransformedWidths } from './TransformedWidths.tsx';
import './material-editor.css';

export function materialChoices(doc: SectionDocument): { id: string; name: string }[] {
  const own = doc.materials.map((m) => ({ id: m.id, name: `${m.name} (this document)` }));
  // A library material already in the document (same id, or the same name under another id) is listed once.
  const inDocument = (b: { id: string; name: string }): boolean => doc.materials.some((m) => m.id === b.id || m.name.trim().toLowerCase() === b.name.trim().toLowerCase());
  return [...own, ...BUILT_IN_MATERIALS.filter((b) => !inDocument(b)).map((b) => ({ id: b.id, name: b.name }))];
}


function Row({ k, symbol, value, shown, unit, label }: { k: string; symbol: string; value: number; shown: number; unit: string; label: string }): ReactElement {
  return (
    <tr title={label}>
      <th scope="row">{symbol}</th>
      <td className="value" data-testid={`result-${k}`} data-value={String(value)}>
        {formatSig(shown, 4)}
      </td>
      <td className="unit">{unit}</td>
      <td className="label">{label}</td>
    </tr>
  );
}

type Computed = { issues: string[]; c: null } | { issues: string[]; c: CompositeProperties; pieces: readonly MaterialPiece[]; names: readonly string[]; mp: { x: number; y: number; cautions: string[] } | null };

function compute(doc: SectionDocument): Computed {
  const r = materialPiecesFromDocument(doc);
  if (r.issues.length > 0 || r.diagnostics.length > 0 || r.pieces.length === 0) return { issues: [...r.issues, ...r.diagnostics.map((d) => d.message)], c: null };
  const ref = documentReferenceModulus(doc);
  if (!ref.ok) return { issues: [ref.message], c: null };
  try {
    const c = compositeProperties(r.pieces, doc.unit, ref.eRef);
    let mp: { x: number; y: number; cautions: string[] } | null = null;
    try {
      const px = plasticCapacity(r.pieces, doc.unit, 0);
      const py = plasticCapacity(r.pieces, doc.unit, -90);
      mp = { x: px.Mp, y: py.Mp, cautions: [...new Set([...px.cautions, ...py.cautions])] };
    } catch (err) {
      mp = { x: NaN, y: NaN, cautions: [`Plastic moment not computed: ${err instanceof Error ? err.message : String(err)}`] };
    }
    return { issues: [], c, pieces: r.pieces, names: r.pieces.map((p) => p.material.name), mp };
  } catch (err) {
    return { issues: [err instanceof Error ? err.message : String(err)], c: null };
  }
}

/** The E_ref choice: first part's material, a document material, or a typed modulus with its unit. */
function ReferenceChoice({ editor, doc, c }: { editor: Editor; doc: SectionDocument; c: CompositeProperties | null }): ReactElement {
  const inch = imperialUnit(doc);
  const defaultUnit: StressUnit = inch ? 'ksi' : 'MPa';
  const ref = doc.referenceModulus;
  const selected = ref === undefined ? '' : 'material' in ref ? `material:${ref.material}` : 'typed';
  const [typing, setTyping] = useState(false);
  const [text, setText] = useState(ref !== undefined && !('material' in ref) ? `${ref.value} ${ref.unit}` : '');
  const [error, setError] = useState('');
  const used = new Set(c?.pieces.map((p) => p.materialId) ?? []);
  const choices = [...doc.materials.map((m) => ({ id: m.id, name: m.name })), ...BUILT_IN_MATERIALS.filter((b) => used.has(b.id) && !doc.materials.some((m) => m.id === b.id))];
  const commit = (t: string): void => {
    try {
      const q = parseQuantity(t, STRESS_UNITS, defaultUnit, 'E_ref');
      if (!(q.value > 0)) throw new QuantityError(`E_ref: the reference modulus must be greater than 0, got "${t}"`);
      setError('');
      const same = ref !== undefined && !('material' in ref) && ref.value === q.value && ref.unit === q.unit;
      if (!same) editor.replaceDocument('Reference modulus', (d) => ({ ...d, referenceModulus: { value: q.value, unit: q.unit } }));
      setTyping(false);
    } catch (err) {
      if (!(err instanceof QuantityError)) throw err;
      setError(`${err.message}. The document is unchanged.`);
    }
  };
  const showTyped = typing || selected === 'typed';
  return (
    <div className="eref">
      <label className="field">
        <span>reference modulus E_ref (transformed section, modular ratios n = E / E_ref)</span>
        <select
          data-testid="eref-choice"
          value={typing ? 'typed' : selected}
          onChange={(e) => {
            const v = e.target.value;
            setError('');
            if (v === 'typed') return setTyping(true);
            setTyping(false);
            if (v === '') return editor.replaceDocument('Reference modulus: first part', (d) => {
              const { referenceModulus: _drop, ...rest } = d;
              return rest;
            });
            const id = v.slice('material:'.length);
            editor.replaceDocument('Reference modulus', (d) => ({ ...withMaterialStored(d, id), referenceModulus: { material: id } }));
          }}
        >
          <option value="">E of the first part's material (default)</option>
          {choices.map((m) => (
            <option key={m.id} value={`material:${m.id}`}>
              E of {m.name}
              {used.has(m.id) ? '' : ' (not in this section)'}
            </option>
          ))}
          <option value="typed">a value I type</option>
        </select>
      </label>
      {showTyped && (
        <div className={error ? 'mf-field bad' : 'mf-field'}>
          <label htmlFor="eref-value">E_ref, a number in {defaultUnit} or with its unit ({STRESS_UNITS.join(', ')}); Enter to apply</label>
          <span className="mf-input">
            <input
              id="eref-value"
              data-testid="eref-value"
              value={text}
              placeholder={inch ? '29000' : '200000'}
              onChange={(e) => setText(e.target.value)}
              onKeyDown={(e) => {
                if (e.key === 'Enter') commit(e.currentTarget.value);
              }}
              onBlur={(e) => {
                if (e.currentTarget.value.trim() !== '') commit(e.currentTarget.value);
              }}
            />
          </span>
          {error && (
            <span className="mf-error" role="alert" data-testid="eref-error">
              {error}
            </span>
          )}
        </div>
      )}
    </div>
  );
}

/** Mp with the plastic neutral axis at a typed angle (0° = bending about x, 90° about y), per-material yield forces balanced. */
function PlasticAtAngle({ pieces, unit, moment, toMoment }: { pieces: readonly MaterialPiece[]; unit: SectionDocument['unit']; moment: string; toMoment: (nm: number) => number }): ReactElement {
  const [text, setText] = useState('30');
  const r = useMemo(() => {
    const a = parseNumber(text, 'angle of the plastic neutral axis');
    if (!a.ok) return { error: a.message };
    if (Math.abs(a.value) > 360) return { error: `angle of the plastic neutral axis: ${a.value}° is outside −360…360°` };
    try {
      return { p: plasticCapacity(pieces, unit, a.value) };
    } catch (err) {
      return { error: err instanceof Error ? err.message : String(err) };
    }
  }, [pieces, unit, text]);
  return (
    <div className="mp-angle">
      <label className="field">
        <span>plastic moment with the neutral axis at θ (degrees CCW from +x)</span>
        <input data-testid="mp-angle" value={text} onChange={(e) => setText(e.target.value)} />
      </label>
      {'error' in r ? (
        <span className="mf-error" role="alert">
          {r.error}
        </span>
      ) : (
        <span className="mp-angle-value" data-testid="result-MpAngle" data-value={String(r.p.Mp)}>
          Mp = {formatSig(toMoment(r.p.Mp), 4)} {moment}
          <span className="muted small"> (PNA at distance {formatSig(r.p.d, 4)} {unit} from the origin along its normal)</span>
        </span>
      )}
    </div>
  );
}

export function MaterialsPanel({ editor, doc: current, valid, display }: { editor: Editor; doc: SectionDocument; valid: boolean; display?: DisplaySet }): ReactElement {
  // A step behind a drag, so splitting by material never slows the drawing.
  const doc = useDeferredValue(current);
  const [showWidths, setShowWidths] = useState(false);
  const used = doc.defaultMaterial !== null || doc.parts.some((p) => p.material !== null);
  const composite = useMemo(() => (used && valid ? compute(doc) : null), [doc, used, valid]);
  const inch = imperialUnit(doc);
  const c = composite?.c ?? null;
  // Forces, EI, moments and E in the document's unit system; every factor from core/units.
  const sys = unitSystem(doc.unit).units;
  const k = {
    force: sys.force, EI: sys.flexuralStiffness, moment: sys.moment, Eunit: sys.stress,
    f: (n: number) => fromSI(n, 'force', sys.force), ei: (v: number) => fromSI(v, 'flexuralStiffness', sys.flexuralStiffness),
    m: (v: number) => fromSI(v, 'moment', sys.moment), E: (pa: number) => fromSI(pa, 'stress', sys.stress),
  };
  const u = doc.unit;
  // Lengths, areas and second moments read in the display unit the results panel uses (data-value keeps the document unit).
  const inDisplay = (v: number, q: 'length' | 'area' | 'inertia'): number => (display ? toDisplay(v, u, display[q]) : v);
  const unitOf = (q: 'length' | 'area' | 'inertia'): string => (display ? display[q].label : q === 'length' ? u : q === 'area' ? `${u}²` : `${u}⁴`);
  const refNote = c === null ? '' : c.eRefFrom === 'first piece' ? 'of the first part' : doc.referenceModulus && 'material' in doc.referenceModulus ? 'chosen material' : 'typed';
  return (
    <section className="materials" aria-label="Materials" data-testid="materials-panel">
      <h2>Materials and stiffness</h2>
      <label className="field">
        <span>default material (parts without their own)</span>
        <select data-testid="default-material" value={doc.defaultMaterial ?? ''} onChange={(e) => editor.replaceDocument('Default material', (d) => withDefaultMaterial(d, e.target.value === '' ? null : e.target.value))}>
          <option value="">none</option>
          {materialChoices(doc).map((m) => (
            <option key={m.id} value={m.id}>
              {m.name}
            </option>
          ))}
        </select>
      </label>
      {!used && <p className="muted small">Choose a material to see EA, EI and weight; a part can have its own material (select it).</p>}
      {used && <ReferenceChoice key={JSON.stringify(doc.referenceModulus ?? null)} editor={editor} doc={current} c={c} />}
      {composite && composite.issues.length > 0 && (
        <ul className="diagnostics" data-testid="materials-issues">
          {composite.issues.map((m, i) => (
            <li key={i}>{m}</li>
          ))}
        </ul>
      )}
      {composite?.c && (
        <div className="result-table">
          <table>
            <caption data-testid="eref-caption">
              Transformed section (E_ref = {formatSig(k.E(composite.c.eRef), 5)} {k.Eunit}, {refNote})
            </caption>
            <tbody>
              <Row k="EA" symbol="EA" value={composite.c.EA} shown={k.f(composite.c.EA)} unit={k.force} label="axial stiffness Σ E_i A_i" />
              <Row k="EIx" symbol="EIx" value={composite.c.EIx} shown={k.ei(composite.c.EIx)} unit={k.EI} label="bending stiffness about x (E-weighted centroid)" />
              <Row k="EIy" symbol="EIy" value={composite.c.EIy} shown={k.ei(composite.c.EIy)} unit={k.EI} label="bending stiffness about y" />
              <Row k="EIxy" symbol="EIxy" value={composite.c.EIxy} shown={k.ei(composite.c.EIxy)} unit={k.EI} label="E-weighted product (+∫E·XY dA)" />
              <Row k="EI1" symbol="EI1" value={composite.c.EI1} shown={k.ei(composite.c.EI1)} unit={k.EI} label="major principal bending stiffness" />
              <Row k="EI2" symbol="EI2" value={composite.c.EI2} shown={k.ei(composite.c.EI2)} unit={k.EI} label="minor principal bending stiffness" />
              <Row k="thetaEIDeg" symbol="θE" value={composite.c.thetaDeg} shown={composite.c.thetaDeg} unit="°" label="angle of the EI1 axis, CCW from +x" />
              <Row k="massPerLength" symbol="m" value={composite.c.massPerLength} shown={inch ? composite.c.weightPerLengthLbPerFt : composite.c.massPerLength} unit={inch ? 'lb/ft' : 'kg/m'} label="mass (weight) per length" />
              <Row k="cxE" symbol="x̄E" value={composite.c.cx} shown={inDisplay(composite.c.cx, 'length')} unit={unitOf('length')} label="E-weighted centroid x" />
              <Row k="cyE" symbol="ȳE" value={composite.c.cy} shown={inDisplay(composite.c.cy, 'length')} unit={unitOf('length')} label="E-weighted centroid y" />
              <Row k="transformedArea" symbol="A_tr" value={composite.c.transformedArea} shown={inDisplay(composite.c.transformedArea, 'area')} unit={unitOf('area')} label="transformed area EA / E_ref" />
              <Row k="transformedIx" symbol="Ix,tr" value={composite.c.transformedIx} shown={inDisplay(composite.c.transformedIx, 'inertia')} unit={unitOf('inertia')} label="transformed Ix = EIx / E_ref" />
              <Row k="transformedIy" symbol="Iy,tr" value={composite.c.transformedIy} shown={inDisplay(composite.c.transformedIy, 'inertia')} unit={unitOf('inertia')} label="transformed Iy = EIy / E_ref" />
              {composite.mp && Number.isFinite(composite.mp.x) && (
                <>
                  <Row k="MpxMaterials" symbol="Mp,x" value={composite.mp.x} shown={k.m(composite.mp.x)} unit={k.moment} label="plastic moment about x, yield forces balanced per material" />
                  <Row k="MpyMaterials" symbol="Mp,y" value={composite.mp.y} shown={k.m(composite.mp.y)} unit={k.moment} label="plastic moment about y" />
                </>
              )}
            </tbody>
          </table>
          <table className="pieces">
            <caption>Per material piece: n = E_i / E_ref; moment at first yield of that material, bending about x and about y</caption>
            <thead>
              <tr>
                <th scope="col">part · material</th>
                <th scope="col">n</th>
                <th scope="col">My,x ({k.moment})</th>
                <th scope="col">My,y ({k.moment})</th>
              </tr>
            </thead>
            <tbody>
              {composite.c.pieces.map((p, i) => (
                <tr key={i} data-testid={`piece-${i}`}>
                  <th scope="row">
                    {p.label}
                    <span className="muted small piece-material">{composite.names[i]}</span>
                  </th>
                  <td className="value nowrap" data-testid={`piece-n-${i}`} data-value={String(p.n)} title="modular ratio E_i / E_ref">
                    {formatSig(p.n, 4)}
                  </td>
                  <td className="value nowrap" data-testid={`piece-myx-${i}`} data-value={String(p.firstYieldMx)}>
                    {formatSig(k.m(p.firstYieldMx), 3)}
                  </td>
                  <td className="value nowrap" data-testid={`piece-myy-${i}`} data-value={String(p.firstYieldMy)}>
                    {formatSig(k.m(p.firstYieldMy), 3)}
                  </td>
                </tr>
              ))}
            </tbody>
          </table>
          <PlasticAtAngle pieces={composite.pieces} unit={u} moment={k.moment} toMoment={k.m} />
          {composite.mp && composite.mp.cautions.length > 0 && (
            <ul className="muted small" data-testid="materials-cautions">
              {composite.mp.cautions.map((m, i) => (
                <li key={i}>{m}</li>
              ))}
            </ul>
          )}
          <label className="widths-toggle">
            <input type="checkbox" data-testid="widths-toggle" checked={showWidths} onChange={(e) => setShowWidths(e.target.checked)} /> show transformed (equivalent) widths
          </label>
          {showWidths && <TransformedWidths pieces={composite.pieces} c={composite.c} unit={u} />}
          <p className="caution">{CAUTION}</p>
        </div>
      )}
      <MaterialEditor editor={editor} doc={current} />
    </section>
  );
}
