/**
 * The stress panel: N, Mx, My (Vx, Vy for the average shear), stored with the section as
 * physical quantities and typed through core/units (any unit, or a bare number in the unit
 * shown); the largest and smallest normal stress with where they occur, the neutral axis, the
 * kern, and the map's legend. The numbers come from ./stress.ts (core/stress); the map itself is
 * drawn on the canvas.
 */
import { useState, type ReactElement } from 'react';
import { stressInputsOf } from '../../../core/document/inputs.ts';
import type { SectionDocument } from '../../../core/document/types.ts';
import { CAUTION } from '../../../core/member/index.ts';
import { formatSig } from '../../../core/units/index.ts';
import { QuantityInput } from '../shell/QuantityInput.tsx';
import type { InputEditing } from '../shell/quantity-text.ts';
import { LEGEND_GRADIENT, stressFields, stressUnits, toStressUnit, type StressKey, type StressOutcome } from './stress.ts';
import { ShearStressRows } from '../joints/ShearStressRows.tsx';

interface Props {
  readonly doc: SectionDocument;
  readonly editing: InputEditing;
  readonly outcome: StressOutcome | null;
  readonly onOpen: (open: boolean) => void;
}

export function StressPanel({ doc, editing, outcome, onOpen }: Props): ReactElement {
  const u = stressUnits(doc);
  const fields = stressFields(doc);
  const stored = stressInputsOf(doc);
  const [problems, setProblems] = useState<Partial<Record<StressKey, string>>>({});
  const shownProblems = Object.values(problems).filter((m): m is string => m !== undefined);
  const field = (key: StressKey, testid: string): ReactElement => (
    <QuantityInput
      field={fields[key]}
      si={stored[key]}
      testid={testid}
      onLive={(si) => editing.live((d) => ({ ...d, stress: { ...stressInputsOf(d), [key]: si ?? 0 } }))}
      onCommit={() => editing.commit(`Set ${key}`)}
      onCancel={() => editing.cancel()}
      onProblem={(m) => setProblems((o) => ({ ...o, [key]: m ?? undefined }))}
    />
  );
  const v = outcome?.ok && shownProblems.length === 0 ? outcome.view : null;
  const s = (pa: number): number => toStressUnit(pa, u.stress);
  const at = (p: readonly [number, number]): string => `at (${formatSig(p[0], 4)}, ${formatSig(p[1], 4)}) ${doc.unit}`;
  return (
    <details className="member" data-testid="stress-panel" onToggle={(e) => onOpen(e.currentTarget.open)}>
      <summary>Normal stress and kern</summary>
      <p className="muted small">
        N &gt; 0 is tension. Mx &gt; 0 puts tension at +y, My &gt; 0 puts tension at +x (moments about the centroid). A bare number is read in the unit shown; or type one, e.g. “250 N·m”. The forces are kept with this section and saved in the file.
      </p>
      <div className="grid4">
        {field('N', 'stress-N')}
        {field('Mx', 'stress-Mx')}
        {field('My', 'stress-My')}
        <span />
        {field('Vx', 'stress-Vx')}
        {field('Vy', 'stress-Vy')}
      </div>
      <ShearStressRows doc={doc} Vx={stored.Vx} Vy={stored.Vy} />
      {shownProblems.length > 0 && (
        <p className="error" data-testid="stress-error">
          {shownProblems.join(' ')} The section keeps its earlier value.
        </p>
      )}
      {shownProblems.length === 0 && outcome && !outcome.ok && (
        <p className="error" data-testid="stress-error">
          {outcome.message}
        </p>
      )}
      {v && (
        <div className="result-table">
          <table>
            <tbody>
              <tr>
                <th>σmax</th>
                <td className="value" data-testid="result-sigmaMax" data-value={String(s(v.max))} data-unit={u.stress}>{formatSig(s(v.max), 4)}</td>
                <td className="unit">{u.stress}</td>
                <td className="label">{at(v.maxAt)}</td>
              </tr>
              <tr>
                <th>σmin</th>
                <td className="value" data-testid="result-sigmaMin" data-value={String(s(v.min))} data-unit={u.stress}>{formatSig(s(v.min), 4)}</td>
                <td className="unit">{u.stress}</td>
                <td className="label">{at(v.minAt)}</td>
              </tr>
              {v.withMaterials && v.perPiece.length > 1 &&
                v.perPiece.map((q, i) => (
                  <tr key={`piece${i}`}>
                    <th>σ in</th>
                    <td className="value" data-testid={`result-sigmaPiece-${i}`}>{formatSig(s(q.max), 4)} / {formatSig(s(q.min), 4)}</td>
                    <td className="unit">{u.stress}</td>
                    <td className="label">{q.label}: largest / smallest</td>
                  </tr>
                ))}
              <tr>
                <th>neutral axis</th>
                <td className="value" data-testid="result-neutralAxis">{v.axis.exists ? `${formatSig(Math.abs(v.axis.angleDeg) < 1e-9 ? 0 : v.axis.angleDeg, 4)}°` : 'none'}</td>
                <td className="unit" />
                <td className="label">{v.axis.exists ? `through (${formatSig(v.axis.point[0], 4)}, ${formatSig(v.axis.point[1], 4)}), from +x` : 'uniform stress (no bending)'}</td>
              </tr>
              {(v.tauX !== 0 || v.tauY !== 0) && (
                <tr>
                  <th>τ avg</th>
                  <td className="value" data-testid="result-tauAverage">{formatSig(s(v.tauX), 4)} / {formatSig(s(v.tauY), 4)}</td>
                  <td className="unit">{u.stress}</td>
                  <td className="label">Vx/A, Vy/A (nominal, not the peak)</td>
                </tr>
              )}
              <tr>
                <th>kern</th>
                <td className="value" data-testid="kern-vertices" data-value={JSON.stringify(v.kern)}>{v.kern.length} corners</td>
                <td className="unit" />
                <td className="label">a compressive N inside it causes no tension</td>
              </tr>
            </tbody>
          </table>
          <div className="legend" data-testid="stress-legend">
            <div className="legend-bar" style={{ background: LEGEND_GRADIENT }} />
            <div className="legend-ticks">
              <span>−{formatSig(s(v.scale), 3)}</span>
              <span>0</span>
              <span>+{formatSig(s(v.scale), 3)} {u.stress}</span>
            </div>
            <div className="legend-ticks muted small">
              <span>compression</span>
              <span>tension</span>
            </div>
          </div>
          <p className="muted small">
            {v.withMaterials ? 'Stress in each material: σ = E·ε over the transformed section.' : 'No materials: the geometric section, so stresses do not depend on E.'} Show the map and the kern under View.
          </p>
        </div>
      )}
      <p className="caution">{CAUTION}</p>
    </details>
  );
}
