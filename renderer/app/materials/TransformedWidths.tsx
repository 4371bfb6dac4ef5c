/**
 * Transformed (equivalent) widths of the section (core/materials/widths.ts): at each height the
 * actual width b = Σ b_i and the transformed width Σ n_i·b_i with n_i = E_i / E_ref (Gere &
 * Timoshenko, the transformed-section method). Listed at the middle of each band between piece
 * edges and at the E-weighted centroid, and drawn as a profile symmetric about a vertical line
 * (transformed width filled, actual width dashed), y up. Widths in the document unit.
 */
import { useMemo, type ReactElement } from 'react';
import { transformedWidths, type CompositeProperties, type MaterialPiece } from '../../../core/materials/index.ts';
import { formatSig } from '../../../core/units/index.ts';

const PLOT_W = 330;
const PLOT_H = 170;
const SAMPLES = 160;

/** Heights for the table: the middle of each band between distinct piece edges, and the E-weighted centroid. */
function tableHeights(c: CompositeProperties): { y: number; what: string }[] {
  const edges = [...new Set(c.pieces.flatMap((p) => [p.yBottom, p.yTop]))].sort((a, b) => b - a);
  const rows: { y: number; what: string }[] = [];
  for (let i = 0; i + 1 < edges.length; i++) rows.push({ y: ((edges[i] as number) + (edges[i + 1] as number)) / 2, what: 'mid-band' });
  const near = rows.find((r) => Math.abs(r.y - c.cy) <= 1e-9 * Math.max(1, Math.abs((edges[0] ?? 0) - (edges[edges.length - 1] ?? 0))));
  if (near) near.what = 'mid-band · E-centroid';
  else rows.push({ y: c.cy, what: 'E-centroid' });
  return rows.sort((a, b) => b.y - a.y);
}

export function TransformedWidths({ pieces, c, unit }: { pieces: readonly MaterialPiece[]; c: CompositeProperties; unit: string }): ReactElement {
  const { rows, profile, top, bottom } = useMemo(() => {
    const top = Math.max(...c.pieces.map((p) => p.yTop));
    const bottom = Math.min(...c.pieces.map((p) => p.yBottom));
    const ys = Array.from({ length: SAMPLES + 1 }, (_, i) => top - ((top - bottom) * i) / SAMPLES);
    // Just inside each piece edge too, so steps in width are drawn as steps.
    const eps = (top - bottom) * 1e-6;
    for (const p of c.pieces) ys.push(p.yTop - eps, p.yBottom + eps, p.yTop + eps, p.yBottom - eps);
    const inside = ys.filter((y) => y <= top && y >= bottom).sort((a, b) => b - a);
    const heights = tableHeights(c);
    return { rows: heights.map((h, i) => ({ ...h, w: transformedWidths(pieces, c.eRef, [h.y])[0]!, i })), profile: transformedWidths(pieces, c.eRef, inside), top, bottom };
  }, [pieces, c]);
  const widest = Math.max(1e-300, ...profile.map((r) => Math.max(r.width, r.transformedWidth)));
  const height = top - bottom || 1;
  // One scale for both directions, so the picture keeps the section's proportions where it can.
  const scale = Math.min((PLOT_W - 20) / widest, (PLOT_H - 20) / height);
  const cx = PLOT_W / 2;
  const py = (y: number): number => 10 + (top - y) * scale + ((PLOT_H - 20) - height * scale) / 2;
  const outline = (w: (r: (typeof profile)[number]) => number): string => {
    const right = profile.map((r) => `${(cx + (w(r) * scale) / 2).toFixed(1)},${py(r.y).toFixed(1)}`);
    const left = [...profile].reverse().map((r) => `${(cx - (w(r) * scale) / 2).toFixed(1)},${py(r.y).toFixed(1)}`);
    return [...right, ...left].join(' ');
  };
  return (
    <div className="widths" data-testid="transformed-widths">
      <svg width={PLOT_W} height={PLOT_H} className="widths-plot" role="img" aria-label="transformed section: equivalent widths n·b (filled) and actual widths b (dashed)" data-testid="widths-plot">
        <polygon points={outline((r) => r.transformedWidth)} fill="#f3e2d6" stroke="#c0612b" strokeWidth={1.2} />
        <polygon points={outline((r) => r.width)} fill="none" stroke="#2f4257" strokeDasharray="4 3" strokeWidth={1} />
        <line x1={8} x2={PLOT_W - 8} y1={py(c.cy)} y2={py(c.cy)} stroke="#51606e" strokeWidth={0.8} strokeDasharray="2 2" />
        <text x={10} y={py(c.cy) - 3} fontSize={10} fill="#51606e">
          E-weighted centroid
        </text>
        <text x={10} y={PLOT_H - 4} fontSize={10} fill="#51606e">
          filled: n·b (to E_ref) · dashed: b
        </text>
      </svg>
      <table>
        <caption>Widths b and n·b (to E_ref) at heights y, {unit}; E-centroid = E-weighted centroid</caption>
        <thead>
          <tr>
            <th scope="col">y</th>
            <th scope="col">b</th>
            <th scope="col">n·b</th>
            <th scope="col" className="label">where</th>
          </tr>
        </thead>
        <tbody>
          {rows.map((r) => (
            <tr key={r.i} data-testid={`width-row-${r.i}`} title={r.w.pieces.filter((p) => p.width > 0).map((p) => `${p.label}: b ${formatSig(p.width, 4)}, n ${formatSig(p.n, 4)}`).join('; ')}>
              <td className="value">{formatSig(r.y, 4)}</td>
              <td className="value" data-testid={`width-b-${r.i}`} data-value={String(r.w.width)}>
                {formatSig(r.w.width, 4)}
              </td>
              <td className="value" data-testid={`width-nb-${r.i}`} data-value={String(r.w.transformedWidth)}>
                {formatSig(r.w.transformedWidth, 4)}
              </td>
              <td className="label">{r.what}</td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
