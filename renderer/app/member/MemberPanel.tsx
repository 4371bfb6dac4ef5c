/**
 * The member check: the section as a beam of a given span, supports and loads (core/member).
 * The case is stored with the section as physical quantities (core/document: MemberInputs, SI),
 * so it is saved, undone and kept through unit changes like any edit; every box reads through
 * core/units (a bare number in the unit shown, or any unit typed). Dead and live loads are given
 * apart, each deflection limit judged under its own load (IBC Table 1604.3 common practice:
 * L/240 total, L/360 live, editable); bending stress in every material against factor ×
 * strength basis or a typed allowable; shear stress at the neutral axis; each part's use ratio;
 * the governing criterion named, and any ratio over 100 % turns the whole verdict red. The
 * deflected shape and the moment diagram are drawn.
 */
import { useDeferredValue, useMemo, useState, type ReactElement } from 'react';
import { memberInputsOf } from '../../../core/document/inputs.ts';
import type { MemberInputs, MemberSupport, SectionDocument } from '../../../core/document/types.ts';
import { DEFLECTION_LIMIT_MEANING, LIMIT_CAUTION, STRESS_FACTOR_MEANING, SUPPORTS, type Support } from '../../../core/member/index.ts';
import { formatSig } from '../../../core/units/index.ts';
import { QuantityInput } from '../shell/QuantityInput.tsx';
import type { InputEditing } from '../shell/quantity-text.ts';
import { allowableFields, allowableOf, FIELD_RANGE, memberFields, memberOutcome, memberUnits, memberValue, readMemberField, sectionMaterials, shown, withAllowable, withMemberValue, type MemberFieldKey } from './member-model.ts';

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

export function MemberPanel({ doc: current, valid, editing }: { doc: SectionDocument; valid: boolean; editing: InputEditing }): ReactElement {
  // Computed only while the panel is open, and a step behind a drag so dragging stays smooth.
  const doc = useDeferredValue(current);
  const [open, setOpen] = useState(false);
  const [problems, setProblems] = useState<Readonly<Record<string, string>>>({});
  const problemList = Object.values(problems);
  const m = memberInputsOf(current);
  const fields = memberFields(current.unit);
  const u = memberUnits(current.unit);
  const edit = (fn: (m: MemberInputs) => MemberInputs): void => editing.live((d) => ({ ...d, member: fn(memberInputsOf(d)) }));
  const problem = (key: string) => (message: string | null): void =>
    setProblems((o) => {
      if (message === null) {
        const { [key]: _gone, ...rest } = o;
        return rest;
      }
      return { ...o, [key]: message };
    });
  const box = (key: MemberFieldKey, testid: string, caption: string, emptyMeans?: string): ReactElement => (
    <QuantityInput
      field={fields[key]}
      caption={caption}
      si={memberValue(m, key)}
      testid={testid}
      read={(t, f) => readMemberField(t, f, FIELD_RANGE[key])}
      {...(emptyMeans !== undefined ? { emptyMeans } : {})}
      onLive={(si) => edit((x) => withMemberValue(x, key, si))}
      onCommit={() => editing.commit(`Set ${fields[key].label}`)}
      onCancel={() => editing.cancel()}
      onProblem={problem(key)}
    />
  );
  const setNow = (label: string, fn: (m: MemberInputs) => MemberInputs): void => {
    edit(fn);
    editing.commit(label);
  };

  const outcome = useMemo(() => (open ? memberOutcome(doc, valid) : null), [open, doc, valid]);
  const materials = useMemo(() => (open && valid ? sectionMaterials(doc) : []), [open, valid, doc.parts, doc.materials, doc.defaultMaterial]);
  const k = shown(doc.unit);
  const r = outcome?.kind === 'done' && problemList.length === 0 ? outcome : null;
  const res = r?.result;
  const total = res?.verdict.criteria.find((c) => c.kind === 'deflection-total');
  const live = res?.verdict.criteria.find((c) => c.kind === 'deflection-live');
  const pct = (x: number | undefined): string => (x === undefined ? '—' : `${formatSig(100 * x, 3)} %`);

  return (
    <details className="member" data-testid="member-panel" onToggle={(e) => setOpen(e.currentTarget.open)}>
      <summary>Member check: span, supports, loads, deflection, stress</summary>
      <p className="muted small">A bare number is read in the unit shown, or type one (“40 ft”, “2 kip/ft”). The case is kept with this section and saved in the file.</p>
      <div className="grid4">
        {box('span', 'member-span', 'L')}
        <label className="field" style={{ gridColumn: 'span 3' }}>
          <span>supports</span>
          <select data-testid="member-support" value={m.support} onChange={(e) => setNow('Set supports', (x) => ({ ...x, support: e.target.value as MemberSupport }))}>
            {SUPPORTS.map((s) => <option key={s} value={s}>{SUPPORT_NAMES[s]}</option>)}
          </select>
        </label>
      </div>
      <p className="small" style={{ margin: '4px 0 0' }}>Dead and other loads (downward +)</p>
      <div className="grid4">
        {box('deadW', 'member-uniform', 'w')}
        {box('deadP', 'member-point', 'P')}
        {box('deadA', 'member-point-at', 'at a', m.support === 'cantilever' ? 'free end' : 'mid')}
        <span />
      </div>
      <p className="small" style={{ margin: '4px 0 0' }}>Live load (downward +)</p>
      <div className="grid4">
        {box('liveW', 'member-live-uniform', 'wL')}
        {box('liveP', 'member-live-point', 'PL')}
        {box('liveA', 'member-live-point-at', 'at a', m.support === 'cantilever' ? 'free end' : 'mid')}
        <span />
      </div>
      <div className="grid4">
        {box('totalLimit', 'member-limit', 'total: L/')}
        {box('liveLimit', 'member-live-limit', 'live: L/')}
        {box('stressFactor', 'member-stress-factor', 'stress factor')}
        <span />
      </div>
      <p className="muted small" data-testid="member-limit-meaning">Deflection limits: {DEFLECTION_LIMIT_MEANING}. Defaults L/240 and L/360; stress factor 1. {STRESS_FACTOR_MEANING}</p>
      {materials.length > 0 && (
        <div className="grid4" data-testid="member-allowables">
          {materials.flatMap((mat) => {
            const f = allowableFields(mat.name, current.unit);
            return (['bending', 'shear'] as const).map((which) => (
              <QuantityInput
                key={`${mat.id}-${which}`}
                field={f[which]}
                caption={`${which === 'bending' ? 'allowable σ' : 'allowable τ'}, ${mat.name}`}
                si={allowableOf(m, mat.id, which)}
                testid={`member-${which === 'bending' ? 'allowable' : 'shear-allowable'}-${mat.id}`}
                emptyMeans="factor × strength"
                read={(t, fl) => readMemberField(t, fl, 'positive')}
                onLive={(si) => edit((x) => withAllowable(x, mat.id, which, si))}
                onCommit={() => editing.commit(`Set ${f[which].label}`)}
                onCancel={() => editing.cancel()}
                onProblem={problem(`${mat.id}-${which}`)}
                className="field wide"
              />
            ));
          })}
        </div>
      )}
      <label className="check"><input type="checkbox" data-testid="member-selfweight" checked={m.selfWeight} onChange={(e) => { const on = e.target.checked; setNow(on ? 'Include self-weight' : 'Leave out self-weight', (x) => ({ ...x, selfWeight: on })); }} /> include self-weight</label>
      {problemList.length > 0 && <p className="error" data-testid="member-error">{problemList.join(' ')} The section keeps its earlier value.</p>}
      {problemList.length === 0 && outcome && outcome.kind !== 'done' && <p className={outcome.kind === 'error' ? 'error' : 'muted'} data-testid={outcome.kind === 'error' ? 'member-error' : 'member-no-load'}>{outcome.message}</p>}
      {r && res && (
        <div className="result-table">
          <p className={res.verdict.passes ? 'verdict ok' : 'verdict bad'} data-testid="member-overall-verdict" data-passes={res.verdict.passes ? 'true' : 'false'}>{res.verdict.summary}</p>
          <table>
            <tbody>
              <tr><th>δmax</th><td className="value" data-testid="result-deflectionMax" data-value={String(res.deflectionMax)} data-shown={String(k.deflection(res.deflectionMax))}>{formatSig(k.deflection(res.deflectionMax), 4)}</td><td className="unit">{u.deflection}</td><td className="label">total load, at {formatSig(k.length(res.deflectionAt), 4)} {u.length}</td></tr>
              <tr><th>L/δ</th><td className="value" data-testid="result-spanOverDeflection" data-value={String(res.spanOverDeflection)}>{formatSig(res.spanOverDeflection, 4)}</td><td className="unit" /><td className="label" data-testid="member-verdict">{total ? `${total.status === 'pass' ? 'within' : 'exceeds'} L/${m.totalLimit} (total, ${pct(total.ratio)})` : ''}; {live?.status === 'not checked' ? `live L/${m.liveLimit}: not checked (no live load)` : live ? `${live.status === 'pass' ? 'within' : 'exceeds'} L/${m.liveLimit} (live, ${pct(live.ratio)})` : ''}</td></tr>
              {res.liveDeflectionMax !== undefined && <tr><th>δlive</th><td className="value" data-testid="result-liveDeflectionMax" data-value={String(res.liveDeflectionMax)}>{formatSig(k.deflection(res.liveDeflectionMax), 4)}</td><td className="unit">{u.deflection}</td><td className="label">live load alone</td></tr>}
              <tr><th>Mmax</th><td className="value" data-testid="result-momentMax" data-value={String(res.momentMax)}>{formatSig(k.moment(res.momentMax), 4)}</td><td className="unit">{u.moment}</td><td className="label">at {formatSig(k.length(res.momentAt), 4)} {u.length}</td></tr>
              <tr><th>Vmax</th><td className="value" data-testid="result-shearMax" data-value={String(res.shearMax.value)}>{formatSig(k.force(Math.abs(res.shearMax.value)), 4)}</td><td className="unit">{u.force}</td><td className="label">at {formatSig(k.length(res.shearMax.at), 4)} {u.length}</td></tr>
              {r.parts.map((s, i) => (
                <tr key={`${s.name}${i}`} data-testid="member-part-use" data-ratio={s.ratio === undefined ? '' : String(s.ratio)} className={s.ratio !== undefined && s.ratio > 1 ? 'bad' : undefined}>
                  <th>σ</th>
                  <td className="value">{formatSig(k.stress(s.tension), 3)} / {formatSig(k.stress(s.compression), 3)}</td>
                  <td className="unit">{u.stress}</td>
                  <td className="label">{s.name}: tension / compression; use {pct(s.ratio)}{s.ratio === undefined ? ' (no limit: give the material a strength or type an allowable)' : ''}</td>
                </tr>
              ))}
              {res.shearStresses.map((t) => (
                <tr key={`tau-${t.materialId}`}><th>τ</th><td className="value">{formatSig(k.stress(t.tau), 3)}</td><td className="unit">{u.stress}</td><td className="label">at the neutral axis, V·Q/(I·t), in {r.materials.find((x) => x.id === t.materialId)?.name ?? t.materialId}</td></tr>
              ))}
            </tbody>
          </table>
          <ul className="small" data-testid="member-criteria">
            {res.verdict.criteria.map((c) => (
              <li key={`${c.kind}${c.materialId ?? ''}`} className={c.status === 'fail' ? 'bad' : c.status === 'pass' ? 'ok' : 'muted'} data-testid="member-criterion" data-kind={c.kind} data-status={c.status} data-ratio={c.ratio === undefined ? '' : String(c.ratio)}>
                {c === res.verdict.governing ? 'GOVERNS, ' : ''}
                {c.status === 'not checked' ? `not checked: ${c.label} (${c.reason ?? ''})` : `${c.status === 'fail' ? 'FAILS' : 'passes'}: ${c.label} at ${pct(c.ratio)} of its limit (${c.limitBasis})`}
              </li>
            ))}
          </ul>
          {/* Deflection is downward positive: drawn below the beam line, so the shape sags under a downward load. */}
          <Plot xs={res.diagram.x.map(k.length)} ys={res.diagram.deflection.map(k.deflection)} label="deflected shape" unit={u.deflection} testid="member-deflection-plot" flip={false} note="downward drawn down" />
          <Plot xs={res.diagram.x.map(k.length)} ys={res.diagram.moment.map(k.moment)} label="bending moment" unit={u.moment} testid="member-moment-plot" flip={false} note="sagging + drawn below" />
          <p className="caution">{LIMIT_CAUTION}</p>
        </div>
      )}
    </details>
  );
}
