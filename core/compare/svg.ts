/**
 * The alternatives' outlines side by side at one common scale (SVG): each combined region drawn
 * with core/export's ringPathData (arcs exact), its name under it, a scale note and the caution.
 * Section coordinates are y up; the drawing flips y (see core/export/svg.ts).
 */
import type { SectionDocument } from '../document/types.ts';
import { escapeXml, ringPathData } from '../export/svg.ts';
import { regionFromDocument } from '../section/index.ts';
import { convertLength, formatSig } from '../units/index.ts';
import type { LengthUnit } from '../units/types.ts';
import { CAUTION, CompareError } from './compare.ts';

const CELL = 260;
const GAP = 30;
const TOP = 40;

export function comparisonSvg(docs: readonly SectionDocument[], unit: LengthUnit): string {
  const items = docs.map((doc) => {
    const c = regionFromDocument(doc);
    if (c.diagnostics.length > 0) throw new CompareError(`"${doc.name}": ${c.diagnostics.map((d) => d.message).join('; ')}`);
    const f = convertLength(1, doc.unit, unit);
    let xMin = Infinity, xMax = -Infinity, yMin = Infinity, yMax = -Infinity;
    for (const p of c.region) for (let i = 0; i < p.outer.xy.length; i += 2) {
      xMin = Math.min(xMin, p.outer.xy[i]! * f); xMax = Math.max(xMax, p.outer.xy[i]! * f);
      yMin = Math.min(yMin, p.outer.xy[i + 1]! * f); yMax = Math.max(yMax, p.outer.xy[i + 1]! * f);
    }
    return { name: doc.name, region: c.region, f, xMin, xMax, yMin, yMax };
  });
  // Arcs may bulge past the vertices: leave 10 % room around the largest vertex box.
  const span = Math.max(...items.map((i) => Math.max(i.xMax - i.xMin, i.yMax - i.yMin))) * 1.1;
  const scale = (CELL - 20) / span;
  // At least wide enough for the scale note and the caution on one line each.
  const width = Math.max(items.length * CELL + (items.length + 1) * GAP, 640);
  const height = TOP + CELL + 90;
  const shapes = items.map((it, k) => {
    const cx = GAP + k * (CELL + GAP) + CELL / 2;
    const cy = TOP + CELL / 2;
    const mx = (it.xMin + it.xMax) / 2, my = (it.yMin + it.yMax) / 2;
    const frame = { toX: (x: number) => cx + (x * it.f - mx) * scale, toY: (y: number) => cy - (y * it.f - my) * scale, scale: scale * it.f };
    const d = it.region.map((p) => [p.outer, ...p.holes].map((r) => ringPathData(r, frame)).join(' ')).join(' ');
    return `<path d="${d}" fill="#c9d6e3" stroke="#1f3b57" stroke-width="1.2" fill-rule="evenodd"/>\n<text x="${cx}" y="${TOP + CELL + 22}" text-anchor="middle" font-size="14">${escapeXml(it.name)}</text>`;
  });
  const bar = 100 / scale;
  return [
    `<svg xmlns="http://www.w3.org/2000/svg" width="${width}" height="${height}" viewBox="0 0 ${width} ${height}" font-family="sans-serif">`,
    `<rect width="100%" height="100%" fill="#fff"/>`,
    `<text x="${GAP}" y="24" font-size="15">Alternatives at one scale: 100 px = ${escapeXml(formatSig(bar, 3))} ${unit}</text>`,
    ...shapes,
    `<text x="${GAP}" y="${height - 20}" font-size="11" fill="#8a1c1c">${escapeXml(CAUTION)}</text>`,
    '</svg>',
    '',
  ].join('\n');
}
