/**
 * τ in the stress panel: the largest shear stress τ = V·Q/(I·t) in each part and beside each
 * joint under the panel's Vx and Vy (core/joints shearStresses, along the cuts it chooses; the
 * general form with Ixy, E-weighted with several materials). A small component of the joints
 * feature, shown under the panel's own numbers; the shears are the panel's stored values (N).
 */
import { useMemo, type ReactElement } from 'react';
import type { SectionDocument } from '../../../core/document/types.ts';
import { SHEAR_CUTS_METHOD, shearStresses } from '../../../core/joints/index.ts';
import { convertLength, formatSig } from '../../../core/units/index.ts';
import { fromSI } from '../../../core/units/quantity.ts';
import { shearUnits } from './joints-model.ts';

/** Vx, Vy in newtons. */
export function ShearStressRows({ doc, Vx: vx, Vy: vy }: { readonly doc: SectionDocument; readonly Vx: number; readonly Vy: number }): ReactElement | null {
  const result = useMemo(() => {
    if (!Number.isFinite(vx) || !Number.isFinite(vy) || (vx === 0 && vy === 0)) return null;
    try {
      return shearStresses(doc, { Vx: vx, Vy: vy });
    } catch (err) {
      return { error: err instanceof Error ? err.message : String(err) };
    }
  }, [doc, vx, vy]);
  if (result === null) return null;
  if ('error' in result) return <p className="error" data-testid="shear-tau-error">Shear stress could not be computed: {result.error}</p>;
  const u = shearUnits(doc.unit).stress;
  const perArea = 1 / convertLength(1, doc.unit, 'm', 2);
  const shown = (tau: number): string => formatSig(fromSI(tau * perArea, 'stress', u), 4);
  return (
    <table className="shear-tau" data-testid="shear-tau">
      <caption>Shear stress τ = V·Q/(I·t)</caption>
      <tbody>
        {result.parts.map((p) => (
          <tr key={`p${p.index}`} data-testid={`tau-part-${p.index}`} data-value={String(fromSI(p.tauMax * perArea, 'stress', u))}>
            <th scope="row">τmax</th>
            <td className="value">{shown(p.tauMax)}</td>
            <td className="unit">{u}</td>
            <td className="label">{p.label}{p.cut !== null && p.cut.note !== '' ? ` (${p.cut.note})` : ''}</td>
          </tr>
        ))}
        {result.joints.map((j, i) => (
          <tr key={`j${i}`} data-testid={`tau-joint-${i}`}>
            <th scope="row">τ joint</th>
            <td className="value">{shown(j.tauJoint)}</td>
            <td className="unit">{u}</td>
            <td className="label">
              {j.joint.labels[0]} | {j.joint.labels[1]}: average on the joint; beside it {j.tauIn.map((t) => (t === null ? '—' : shown(t))).join(' and ')} {u}
            </td>
          </tr>
        ))}
        <tr>
          <td colSpan={4} className="muted small">{SHEAR_CUTS_METHOD}</td>
        </tr>
        {result.warnings.map((w, i) => (
          <tr key={`w${i}`}>
            <td colSpan={4} className="warning small">{w}</td>
          </tr>
        ))}
      </tbody>
    </table>
  );
}
