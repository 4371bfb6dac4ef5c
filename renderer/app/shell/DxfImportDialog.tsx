/**
 * The DXF import dialog: the drawing's layers (with how many boundary entities each holds), its
 * unit (from $INSUNITS, or chosen here when the file has none), and one part per outer loop or
 * loops that touch united into one part, and what the holes are (voids, or fastener holes that
 * count in the net section only). The open document is untouched until Import succeeds;
 * an import error (entity, handle, layer and what is wrong) is shown here.
 */
import type { ReactElement } from 'react';
import { LENGTH_UNITS, type LengthUnit } from '../../../core/units/index.ts';
import type { AppController, DxfPrompt } from '../../controller/controller.ts';

export function DxfImportDialog({ prompt, controller }: { readonly prompt: DxfPrompt; readonly controller: AppController }): ReactElement {
  const fileUnit = prompt.summary.unit;
  const toggle = (name: string, on: boolean): void => {
    const next = on ? [...prompt.layers, name] : prompt.layers.filter((l) => l !== name);
    controller.chooseDxf({ layers: prompt.summary.layers.map((l) => l.name).filter((l) => next.includes(l)) });
  };
  return (
    <div className="modal-back">
      <div className="modal" role="dialog" aria-modal="true" aria-labelledby="dxf-title" data-testid="dxf-dialog">
        <p id="dxf-title">
          <strong>Import {prompt.name}</strong>
        </p>
        <fieldset>
          <legend>Layers to read</legend>
          {prompt.summary.layers.length === 0 && <p className="muted small">No lines, arcs, circles, polylines, ellipses or splines in model space.</p>}
          {prompt.summary.layers.map((l) => (
            <label key={l.name} style={{ display: 'block' }}>
              <input type="checkbox" data-testid={`dxf-layer-${l.name}`} checked={prompt.layers.includes(l.name)} onChange={(e) => toggle(l.name, e.target.checked)} /> {l.name}{' '}
              <span className="muted">({l.entities} {l.entities === 1 ? 'entity' : 'entities'})</span>
            </label>
          ))}
        </fieldset>
        <label>
          Drawing unit{' '}
          <select data-testid="dxf-unit" value={prompt.unit} disabled={fileUnit !== null} onChange={(e) => controller.chooseDxf({ unit: e.target.value as LengthUnit })}>
            {LENGTH_UNITS.map((u) => (
              <option key={u} value={u}>
                {u}
              </option>
            ))}
          </select>
        </label>
        <p className="muted small" data-testid="dxf-unit-note">
          {fileUnit !== null ? `From the file (${prompt.summary.unitNote}).` : `${prompt.summary.unitNote}: say which unit its coordinates are in.`}
        </p>
        <label>
          Several outer outlines become{' '}
          <select data-testid="dxf-grouping" value={prompt.grouping} onChange={(e) => controller.chooseDxf({ grouping: e.target.value === 'one' ? 'one' : 'parts' })}>
            <option value="parts">one part each</option>
            <option value="one">one part (where they touch)</option>
          </select>
        </label>
        <label>
          Holes inside outlines are{' '}
          <select data-testid="dxf-holes" value={prompt.holes} onChange={(e) => controller.chooseDxf({ holes: e.target.value === 'fastener-hole' ? 'fastener-hole' : 'void' })}>
            <option value="void">voids along the member (every property)</option>
            <option value="fastener-hole">fastener holes (net section only)</option>
          </select>
        </label>
        {prompt.errors.length > 0 && (
          <ul className="errors" role="alert" data-testid="dxf-errors">
            {prompt.errors.slice(0, 8).map((e, i) => (
              <li key={i}>{e}</li>
            ))}
          </ul>
        )}
        <div className="buttons">
          <button type="button" data-testid="dxf-import" onClick={() => controller.importChosenDxf()}>
            Import
          </button>
          <button type="button" data-testid="dxf-cancel" onClick={() => controller.cancelDxf()}>
            Cancel
          </button>
        </div>
      </div>
    </div>
  );
}
