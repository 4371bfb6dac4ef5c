/**
 * The member check: the section as a beam of a given span, supports and loads (core/member).
 * Deflection, span/deflection against a chosen common-practice limit, the largest moment and
 * the bending stress per material, with the deflected shape and the moment diagram drawn.
 * Inputs in the document unit and kN (kip for inch documents); core works in SI.
 */
import { useDeferredValue, useEffect, useMemo, useState, type ReactElement } from 'react';
import type { SectionDocument } from '../../../core/document/types.ts';
import { materialPiecesFromDocument } from '../../../core/materials/index.ts';
import { COMMON_DEFLECTION_RATIOS, LIMIT_CAUTION, STRESS_FACTOR_MEANING, SUPPORTS, sectionMemberCheck, type SectionMemberInput, type Support } from '../../../core/member/index.ts';
import { convertLength, formatSig } from '../../../core/units/index.ts';
import { parseNumber } from '../shell/numbers.ts';
import type { MemberCase } from '../report/report-input.ts';

const N_PER_KIP = 4448.2216152605; // exact by definition (1 lbf = 4.4482216152605 N)
const SUPPORT_NAMES: Readonly<Record<Support, string>> = { simple: 'simply supported', cantilever: 'cantilever (fixed at left)', fixed: 'fixed at both ends', propped: 'propped cantilever' };

function Plot({ xs, ys, label, unit, testid, flip, note }: { xs: readonly number[]; ys: readonly number[]; label: string; unit: string; testid: string; flip: boolean; note?: string }): ReactElement {
  const w = 320;
  // A 16 px band on top holds the label (and the sign convention), so the curve never runs under it.
  const band = 16;
  const h = 70 + band;
  const max = Math.max(1e-300, ...ys.map((v) => Math.abs(v)));
  const x0 = xs[0] ?? 0;
  const span = (xs[xs.length - 1] ?? 1) - x0 || 1;
  // Downward deflection and sagging moment drawn below the beam line, as engineers sketch them.
  const mid = band + (h - band) / 2;
  const half = (h - band) / 2 - 6;
  const pts = xs.map((x, i) => `${(((x - x0) / span) * (w - 20) + 10).toFixed(1)},${(mid + ((flip ? -1 : 1) * (ys[i] ?? 0) / max) * half).toFixed(1)}`);
  const peak = ys.reduce((a, b) => (Math.abs(b) > Math.abs(a) ? b : a), 0);
  const k = ys.indexOf(peak);
  const px = (((xs[k] ?? 0) - x0) / span) * (w - 20) + 10;
  const py = mid + ((flip ? -1 : 1) * peak / max) * half;
  return (
    <svg width={w} height={h} data-testid={testid} role="img" aria-label={label} className="plot" data-peak-y={py.toFixed(1)} data-axis-y={mid.toFixed(1)}>
      <line x1={10} y1={mid} x2={w - 10} y2={mid} stroke="#b9ae97" />
      <polyline points={pts.join(' ')} fill="none" stroke="#2f4257" strokeWidth={1.5} />
      <circle cx={px} cy={py} r={3} fill="#c0612b" />
      <text x={12} y={11} fontSize={10} fill="#51606e">
        {label}: {formatSig(peak, 4)} {unit}{note !== undefined ? ` (${note})` : ''}
      </text>
    </svg>
  );
}

/** `onCase` hears the load case whenever the open panel computes one (null when its inputs are unusable), for the report. */
export function MemberPanel({ doc: current, valid, onCase }: { doc: SectionDocument; valid: boolean; onCase?: (c: MemberCase | null) => void }): ReactElement {
  // Computed only while the panel is open, and a step behind a drag so dragging stays smooth.
  const doc = useDeferredValue(current);
  const [open, setOpen] = useState(false);
  const inch = doc.unit === 'in' || doc.unit === 'ft';
  const force = inch ? 'kip' : 'kN';
  const line = inch ? 'kip/ft' : 'kN/m';
  const [f, setF] = useState({ span: inch ? '240' : '6000', P: '10', a: '', w: '0', ratio: '360', self: false, support: 'simple' as Support });
  const set = (k: keyof typeof f, v: string | boolean): void => setF((o) => ({ ...o, [k]: v }));

  const outcome = useMemo(() => {
    if (!open) return { error: '' };
    if (!valid) return { error: 'The section needs valid geometry first.' };
    const nums: Record<string, number> = {};
    for (const [k, label] of [['span', 'span L'], ['P', 'point load P'], ['w', 'uniform load w'], ['ratio', 'limit L/…']] as const) {
      const r = parseNumber(f[k], label);
      if (!r.ok) return { error: r.message };
      nums[k] = r.value;
    }
    const a = f.a.trim() === '' ? (nums.span as number) / 2 : parseNumber(f.a, 'load position a');
    const at = typeof a === 'number' ? a : a.ok ? a.value : NaN;
    if (!Number.isFinite(at)) return { error: typeof a === 'number' ? 'bad position' : (a as { message: string }).message };
    const pieces = materialPiecesFromDocument(doc);
    if (pieces.issues.length > 0 || pieces.pieces.length === 0) return { error: `Materials: ${pieces.issues.join('; ') || 'choose a material (Materials and stiffness)'}` };
    const P = (nums.P as number) * (inch ? N_PER_KIP : 1000);
    // kip/ft → N/m: 1 kip/ft = 4448.2216152605 N / 0.3048 m (exact factors).
    const w = (nums.w as number) * (inch ? N_PER_KIP / 0.3048 : 1000);
    const input: SectionMemberInput = { span: nums.span as number, support: f.support, points: P !== 0 ? [{ P, a: at }] : [], uniform: w, selfWeight: f.self, limitRatio: nums.ratio as number };
    const r = sectionMemberCheck(pieces.pieces, doc.unit, input);
    return r.ok ? { result: r.result, input } : { error: r.issues.join(' ') };
  }, [doc, valid, f, inch, open]);
  useEffect(() => {
    if (open) onCase?.('input' in outcome && outcome.input ? { unit: doc.unit, input: outcome.input } : null);
  }, [open, outcome, doc.unit, onCase]);

  const lenOut = (m: number): number => convertLength(m, 'm', inch ? 'in' : 'mm');
  const lu = inch ? 'in' : 'mm';
  const mom = (nm: number): number => (inch ? nm / N_PER_KIP / 0.3048 : nm / 1000);
  const mu = inch ? 'kip·ft' : 'kN·m';
  const su = inch ? 'ksi' : 'MPa';
  const stress = (pa: number): number => (inch ? pa / 6894757.293168361 : pa / 1e6);
  const r = 'result' in outcome ? outcome.result : null;

  return (
    <details className="member" data-testid="member-panel" onToggle={(e) => setOpen(e.currentTarget.open)}>
      <summary>Member check: span, supports, loads, deflection</summary>
      <div className="grid4">
        <label className="field"><span>L ({doc.unit})</span><input data-testid="member-span" value={f.span} onChange={(e) => set('span', e.target.value)} /></label>
        <label className="field" style={{ gridColumn: 'span 3' }}>
          <span>supports</span>
          <select data-testid="member-support" value={f.support} onChange={(e) => set('support', e.target.value)}>
            {SUPPORTS.map((s) => <option key={s} value={s}>{SUPPORT_NAMES[s]}</option>)}
          </select>
        </label>
        <label className="field"><span>P ({force})</span><input data-testid="member-point" value={f.P} onChange={(e) => set('P', e.target.value)} /></label>
        <label className="field"><span>at a ({doc.unit})</span><input data-testid="member-point-at" value={f.a} placeholder="mid" onChange={(e) => set('a', e.target.value)} /></label>
        <label className="field"><span>w ({line})</span><input data-testid="member-uniform" value={f.w} onChange={(e) => set('w', e.target.value)} /></label>
        <label className="field"><span>limit L/</span><input data-testid="member-limit" list="deflection-ratios" value={f.ratio} onChange={(e) => set('ratio', e.target.value)} /></label>
      </div>
      <datalist id="deflection-ratios">{COMMON_DEFLECTION_RATIOS.map((n) => <option key={n} value={n} />)}</datalist>
      <label className="check"><input type="checkbox" data-testid="member-selfweight" checked={f.self} onChange={(e) => set('self', e.target.checked)} /> include self-weight</label>
      {'error' in outcome && outcome.error && <p className="error" data-testid="member-error">{outcome.error}</p>}
      {r && (
        <div className="result-table">
          <table>
            <tbody>
              <tr><th>δmax</th><td className="value" data-testid="result-deflectionMax" data-value={String(r.deflectionMax)}>{formatSig(lenOut(r.deflectionMax), 4)}</td><td className="unit">{lu}</td><td className="label">at {formatSig(lenOut(r.deflectionAt), 4)} {lu}</td></tr>
              <tr><th>L/δ</th><td className="value" data-testid="result-spanOverDeflection" data-value={String(r.spanOverDeflection)}>{formatSig(r.spanOverDeflection, 4)}</td><td className="unit" /><td className="label" data-testid="member-verdict">{r.limit ? `${r.limit.verdict} L/${r.limit.ratio}` : ''}</td></tr>
              <tr><th>Mmax</th><td className="value" data-testid="result-momentMax" data-value={String(r.momentMax)}>{formatSig(mom(r.momentMax), 4)}</td><td className="unit">{mu}</td><td className="label">at {formatSig(lenOut(r.momentAt), 4)} {lu}</td></tr>
              {r.stresses.map((s) => (
                <tr key={s.id}><th>σ</th><td className="value">{formatSig(stress(s.maxTension), 3)} / {formatSig(stress(s.maxCompression), 3)}</td><td className="unit">{su}</td><td className="label">{s.name}: tension / compression{s.strengthRatio !== undefined ? `, ${formatSig(100 * s.strengthRatio, 3)} % of ${s.strengthLabel}` : ''}</td></tr>
              ))}
            </tbody>
          </table>
          <p className={r.verdict.passes ? 'verdict ok' : 'verdict bad'} data-testid="member-overall-verdict" data-passes={r.verdict.passes ? 'true' : 'false'}>{r.verdict.summary}</p>
          <ul className="small" data-testid="member-criteria">
            {r.verdict.criteria.map((c) => (
              <li key={`${c.kind}${c.materialId ?? ''}`} className={c.status === 'fail' ? 'bad' : c.status === 'pass' ? 'ok' : 'muted'} data-testid="member-criterion" data-kind={c.kind} data-ratio={c.ratio === undefined ? '' : String(c.ratio)}>
                {c.status === 'not checked' ? `not checked: ${c.label} (${c.reason ?? ''})` : `${c.status === 'fail' ? 'FAILS' : 'passes'}: ${c.label} at ${formatSig((c.ratio ?? NaN) * 100, 3)} % of its limit (${c.limitBasis})`}
              </li>
            ))}
          </ul>
          <p className="muted small">{STRESS_FACTOR_MEANING}</p>
          {/* Deflection is downward positive: drawn below the beam line, so the shape sags under a downward load. */}
          <Plot xs={r.diagram.x.map(lenOut)} ys={r.diagram.deflection.map(lenOut)} label="deflected shape" unit={lu} testid="member-deflection-plot" flip={false} note="downward drawn down" />
          <Plot xs={r.diagram.x.map(lenOut)} ys={r.diagram.moment.map(mom)} label="bending moment" unit={mu} testid="member-moment-plot" flip={false} note="sagging + drawn below" />
          <p className="caution">{LIMIT_CAUTION}</p>
        </div>
      )}
    </details>
  );
}
