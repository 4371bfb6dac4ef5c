/**
 * Materials: the document default and, through the selected part, each part's material
 * (core/materials built-in library or the document's own); the transformed section: E_ref,
 * modular ratios, EA, EI, weight per length and first-yield moments per material.
 * Core gives EA in N, EI in N·m², mass in kg/m; shown in kN, kN·m², kg/m, or for inch
 * documents kip, kip·in², lb/ft. data-value keeps core's SI number.
 */
import { useDeferredValue, useMemo, type ReactElement } from 'react';
import type { SectionDocument } from '../../core/document/types.ts';
import { BUILT_IN_MATERIALS, compositeProperties, materialPiecesFromDocument } from '../../core/materials/index.ts';
import { formatSig } from '../../core/units/index.ts';
import type { Editor } from '../editor/editor.ts';

export function materialChoices(doc: SectionDocument): { id: string; name: string }[] {
  const own = doc.materials.map((m) => ({ id: m.id, name: `${m.name} (this document)` }));
  return [...own, ...BUILT_IN_MATERIALS.filter((b) => !doc.materials.some((m) => m.id === b.id)).map((b) => ({ id: b.id, name: b.name }))];
}

const N_PER_KIP = 4448.2216152605; // 1 kip = 1000 lbf, 1 lbf = 4.4482216152605 N (exact by definition)
const M_PER_IN = 0.0254; // exact by definition

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

export function MaterialsPanel({ editor, doc: current, valid }: { editor: Editor; doc: SectionDocument; valid: boolean }): ReactElement {
  // A step behind a drag, so splitting by material never slows the drawing.
  const doc = useDeferredValue(current);
  const used = doc.defaultMaterial !== null || doc.parts.some((p) => p.material !== null);
  const composite = useMemo(() => {
    if (!used || !valid) return null;
    const r = materialPiecesFromDocument(doc);
    if (r.issues.length > 0 || r.diagnostics.length > 0 || r.pieces.length === 0) return { issues: [...r.issues, ...r.diagnostics.map((d) => d.message)], c: null };
    try {
      return { issues: [], c: compositeProperties(r.pieces, doc.unit) };
    } catch (err) {
      return { issues: [err instanceof Error ? err.message : String(err)], c: null };
    }
  }, [doc, used, valid]);
  const inch = doc.unit === 'in' || doc.unit === 'ft';
  const c = composite?.c ?? null;
  return (
    <section className="materials" aria-label="Materials" data-testid="materials-panel">
      <h2>Materials and stiffness</h2>
      <label className="field">
        <span>default material (parts without their own)</span>
        <select
          data-testid="default-material"
          value={doc.defaultMaterial ?? ''}
          onChange={(e) => editor.replaceDocument('Default material', (d) => ({ ...d, defaultMaterial: e.target.value === '' ? null : e.target.value }))}
        >
          <option value="">none</option>
          {materialChoices(doc).map((m) => (
            <option key={m.id} value={m.id}>
              {m.name}
            </option>
          ))}
        </select>
      </label>
      {!used && <p className="muted small">Choose a material to see EA, EI and weight; a part can have its own material (select it).</p>}
      {composite && composite.issues.length > 0 && (
        <ul className="diagnostics">
          {composite.issues.map((m, i) => (
            <li key={i}>{m}</li>
          ))}
        </ul>
      )}
      {c && (
        <div className="result-table">
          <table>
            <caption>Transformed section (E_ref = {formatSig(c.eRef / 1e9, 4)} GPa, {c.eRefFrom === 'given' ? 'chosen' : 'of the first part'})</caption>
            <tbody>
              <Row k="EA" symbol="EA" value={c.EA} shown={c.EA / (inch ? N_PER_KIP : 1000)} unit={inch ? 'kip' : 'kN'} label="axial stiffness" />
              <Row k="EIx" symbol="EIx" value={c.EIx} shown={inch ? c.EIx / M_PER_IN ** 2 / N_PER_KIP : c.EIx / 1000} unit={inch ? 'kip·in²' : 'kN·m²'} label="bending stiffness about x (E-weighted centroid)" />
              <Row k="EIy" symbol="EIy" value={c.EIy} shown={inch ? c.EIy / M_PER_IN ** 2 / N_PER_KIP : c.EIy / 1000} unit={inch ? 'kip·in²' : 'kN·m²'} label="bending stiffness about y" />
              <Row k="massPerLength" symbol="m" value={c.massPerLength} shown={inch ? c.weightPerLengthLbPerFt : c.massPerLength} unit={inch ? 'lb/ft' : 'kg/m'} label="mass (weight) per length" />
              <Row k="cxE" symbol="x̄E" value={c.cx} shown={c.cx} unit={doc.unit} label="E-weighted centroid x" />
              <Row k="cyE" symbol="ȳE" value={c.cy} shown={c.cy} unit={doc.unit} label="E-weighted centroid y" />
            </tbody>
          </table>
          <table>
            <caption>Per material piece</caption>
            <tbody>
              {c.pieces.map((p, i) => (
                <tr key={i} data-testid={`piece-${i}`}>
                  <th scope="row">{p.label}</th>
                  <td className="value" data-value={String(p.n)} title="modular ratio E_i / E_ref">
                    n {formatSig(p.n, 3)}
                  </td>
                  <td className="unit" colSpan={2} title="moment at first yield of this material, bending about x">
                    My,x {formatSig(p.firstYieldMx / 1000, 3)} kN·m
                  </td>
                </tr>
              ))}
            </tbody>
          </table>
        </div>
      )}
    </section>
  );
}
