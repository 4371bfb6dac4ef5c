/**
 * The stress panel: N, Mx, My (Vx, Vy for the average shear) typed with units; the largest and
 * smallest normal stress with where they occur, the neutral axis, the kern, and the map's legend.
 * The numbers come from ./stress.ts (core/stress); the map itself is drawn on the canvas.
 */
import type { ReactElement } from 'react';
import type { SectionDocument } from '../../../core/document/types.ts';
import { CAUTION } from '../../../core/member/index.ts';
import { formatSig } from '../../../core/units/index.ts';
import { LEGEND_GRADIENT, stressUnits, toStressUnit, type ForceTexts, type StressOutcome } from './stress.ts';

interface Props {
  readonly doc: SectionDocument;
  readonly texts: ForceTexts;
  readonly onTexts: (t: ForceTexts) => void;
  readonly outcome: StressOutcome | null;
  readonly onOpen: (open: boolean) => void;
}

export function StressPanel({ doc, texts, onTexts, outcome, onOpen }: Props): ReactElement {
  const u = stressUnits(doc);
  const field = (key: keyof ForceTexts, label: string, unit: string, testid: string): ReactElement => (
    <label className="field">
      <span>
        {label} ({unit})
      </span>
      <input data-testid={testid} value={texts[key]} placeholder="0" onChange={(e) => onTexts({ ...texts, [key]: e.target.value })} />
    </label>
  );
  const v = outcome?.ok ? outcome.view : null;
  const s = (pa: number): number => toStressUnit(pa, u.stress);
  const at = (p: readonly [number, number]): string => `at (${formatSig(p[0], 4)}, ${formatSig(p[1], 4)}) ${doc.unit}`;
  return (
    <details className="member" data-testid="stress-panel" onToggle={(e) => onOpen(e.currentTarget.open)}>
      <summary>Normal stress and kern</summary>
      <p className="muted small">
        N &gt; 0 is tension. Mx &gt; 0 puts tension at +y, My &gt; 0 puts tension at +x (moments about the centroid). A bare number is read in the unit shown; or type one, e.g. “250 N·m”.
      </p>
      <div className="grid4">
        {field('N', 'N', u.force, 'stress-N')}
        {field('Mx', 'Mx', u.moment, 'stress-Mx')}
        {field('My', 'My', u.moment, 'stress-My')}
        <span />
        {field('Vx', 'Vx', u.force, 'stress-Vx')}
        {field('Vy', 'Vy', u.force, 'stress-Vy')}
      </div>
      {outcome && !outcome.ok && (
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
