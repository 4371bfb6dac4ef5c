/**
 * SVG drawing of a section: the combined region (holes cut, arcs as exact SVG arc commands),
 * each part's outline with its name, the centroid, the centroidal x–y axes, the principal axes
 * with their angle, a small properties table in display units, and the caution.
 *
 * Coordinates: section coordinates are y up, SVG's are y down, so a point (x, y) is drawn at
 * (ox + s·(x − xMin), oy + s·(yMax − y)). The flip mirrors the sense of rotation, so an arc that
 * runs counter-clockwise in the section (bulge > 0) runs clockwise on screen: sweep-flag 1.
 * An arc of bulge b sweeps 4·atan(b); its radius is c·(1 + b²) / (4|b|) for chord c (DXF bulge
 * convention, core/geometry/types.ts); large-arc-flag is set when |b| > 1 (sweep over 180°).
 *
 * Text: every piece of user text (names) is XML-escaped, and characters XML 1.0 forbids are
 * replaced by U+FFFD, so the file is well-formed whatever the names hold.
 * Numbers in the table use 4 significant figures in the display units, round-off residue shown
 * as 0 (core/properties/catalogue.ts shownValue); the full-precision numbers are in the CSV export.
 */
import type { Region, Ring } from '../geometry/types.ts';
import { CAUTION } from '../member/check.ts';
import type { SectionProperties } from '../properties/types.ts';
import type { SectionResult } from '../section/index.ts';
import { defaultDisplaySet, formatSig, toDisplay, type DisplaySet } from '../units/index.ts';
import type { LengthUnit } from '../units/types.ts';
import { catalogueFor, PROPERTY_CATALOGUE, shownValue } from '../properties/catalogue.ts';
import type { JointsExport } from './joints.ts';

const DRAWING_TABLE = catalogueFor('drawing', PROPERTY_CATALOGUE);

export interface SvgInput {
  readonly name: string;
  readonly unit: LengthUnit;
  readonly section: Pick<SectionResult, 'region' | 'parts' | 'properties' | 'diagnostics'>;
  /** Display units of the table (default: core/units defaultDisplaySet of the unit). */
  readonly display?: DisplaySet;
  /** Joints (core/export/joints.ts): marked on the drawing (J1, J2 …) and listed below it with pieces, overlaps, q and τ. */
  readonly joints?: JointsExport | null;
}

const DRAW = 560;
const MARGIN = 24;
const TOP = 64;
const TABLE_X = MARGIN + DRAW + 40;
const WIDTH = TABLE_X + 330;
const ROW = 18;

/** XML text and attribute escaping; characters XML 1.0 cannot carry become U+FFFD. */
export function escapeXml(text: string): string {
  return text
    .replace(/[^\t\n\r\u0020-\uD7FF\uE000-\uFFFD\u{10000}-\u{10FFFF}]/gu, '\uFFFD')
    .replaceAll('&', '&amp;')
    .replaceAll('<', '&lt;')
    .replaceAll('>', '&gt;')
    .replaceAll('"', '&quot;')
    .replaceAll("'", '&apos;');
}

/** Shortest fixed text with 3 decimals (pixels). */
const px = (value: number): string => String(Math.round(value * 1000) / 1000);

interface Frame {
  readonly toX: (x: number) => number;
  readonly toY: (y: number) => number;
  readonly scale: number;
}

function frameFor(box: { xMin: number; xMax: number; yMin: number; yMax: number }): Frame {
  const w = Math.max(box.xMax - box.xMin, 1e-300);
  const h = Math.max(box.yMax - box.yMin, 1e-300);
  const scale = Math.min(DRAW / w, DRAW / h);
  const ox = MARGIN + (DRAW - scale * w) / 2;
  const oy = TOP + (DRAW - scale * h) / 2;
  return { toX: (x) => ox + scale * (x - box.xMin), toY: (y) => oy + scale * (box.yMax - y), scale };
}

/** Path data of one closed ring: M, then L for straight segments and A for arcs, then Z. */
export function ringPathData(ring: Ring, frame: Frame): string {
  const n = ring.xy.length / 2;
  const at = (i: number): [number, number] => [ring.xy[2 * (i % n)] ?? 0, ring.xy[2 * (i % n) + 1] ?? 0];
  const [x0, y0] = at(0);
  let d = `M${px(frame.toX(x0))} ${px(frame.toY(y0))}`;
  for (let i = 0; i < n; i++) {
    const [xs, ys] = at(i);
    const [xe, ye] = at(i + 1);
    const b = ring.bulge?.[i] ?? 0;
    const end = `${px(frame.toX(xe))} ${px(frame.toY(ye))}`;
    if (b === 0) {
      d += `L${end}`;
      continue;
    }
    const chord = Math.hypot(xe - xs, ye - ys);
    const radius = (frame.scale * chord * (1 + b * b)) / (4 * Math.abs(b));
    d += `A${px(radius)} ${px(radius)} 0 ${Math.abs(b) > 1 ? 1 : 0} ${b > 0 ? 1 : 0} ${end}`;
  }
  return `${d}Z`;
}

function regionPaths(region: Region, frame: Frame, attributes: string): string[] {
  return region.map((polygon) => {
    const d = [polygon.outer, ...polygon.holes].map((ring) => ringPathData(ring, frame)).join('');
    return `<path d="${d}" fill-rule="evenodd" ${attributes}/>`;
  });
}

/** A box holding every part (only used to frame the drawing when there are no properties). */
function regionBox(regions: readonly Region[]): { xMin: number; xMax: number; yMin: number; yMax: number } {
  const box = { xMin: Infinity, xMax: -Infinity, yMin: Infinity, yMax: -Infinity };
  for (const region of regions) {
    for (const polygon of region) {
      for (const ring of [polygon.outer, ...polygon.holes]) {
        const n = ring.xy.length / 2;
        for (let i = 0; i < n; i++) {
          const x = ring.xy[2 * i] ?? 0;
          const y = ring.xy[2 * i + 1] ?? 0;
          // An arc of radius r = chord·(1+b²)/(4|b|) stays within 2r of its start: grow by that (conservative).
          const b = Math.abs(ring.bulge?.[i] ?? 0);
          const xe = ring.xy[2 * ((i + 1) % n)] ?? 0;
          const ye = ring.xy[2 * ((i + 1) % n) + 1] ?? 0;
          const grow = b === 0 ? 0 : (2 * Math.hypot(xe - x, ye - y) * (1 + b * b)) / (4 * b);
          box.xMin = Math.min(box.xMin, x - grow);
          box.xMax = Math.max(box.xMax, x + grow);
          box.yMin = Math.min(box.yMin, y - grow);
          box.yMax = Math.max(box.yMax, y + grow);
        }
      }
    }
  }
  return Number.isFinite(box.xMin) ? box : { xMin: -1, xMax: 1, yMin: -1, yMax: 1 };
}

/** Principal axes along x and y (θ within round-off of 0° or 90°) would only redraw those axes. */
function hasPrincipalAxes(p: SectionProperties): boolean {
  return !p.isotropic && Math.min(Math.abs(p.thetaDeg), Math.abs(90 - Math.abs(p.thetaDeg))) > 1e-9 * 90;
}

function axesMarkup(p: SectionProperties, frame: Frame): string[] {
  const cx = frame.toX(p.cx);
  const cy = frame.toY(p.cy);
  const half = DRAW / 2 + 8;
  const out = [
    `<g id="centroidal-axes" stroke="#3a5a8c" stroke-width="0.8" stroke-dasharray="6 3">`,
    `<line x1="${px(MARGIN - 8)}" y1="${px(cy)}" x2="${px(MARGIN + DRAW + 8)}" y2="${px(cy)}"/>`,
    `<line x1="${px(cx)}" y1="${px(TOP - 8)}" x2="${px(cx)}" y2="${px(TOP + DRAW + 8)}"/>`,
    `</g>`,
    `<text x="${px(MARGIN + DRAW + 10)}" y="${px(cy + 4)}" font-size="12" fill="#3a5a8c">x</text>`,
    `<text x="${px(cx + 4)}" y="${px(TOP - 10)}" font-size="12" fill="#3a5a8c">y</text>`,
  ];
  if (hasPrincipalAxes(p)) {
    const t = (p.thetaDeg * Math.PI) / 180;
    // Screen direction of axis 1 is (cos θ, −sin θ): the y flip.
    const [ux, uy] = [Math.cos(t), -Math.sin(t)];
    out.push(
      `<g id="principal-axes" stroke="#a0522d" stroke-width="0.8" stroke-dasharray="2 3">`,
      `<line x1="${px(cx - half * ux)}" y1="${px(cy - half * uy)}" x2="${px(cx + half * ux)}" y2="${px(cy + half * uy)}"/>`,
      `<line x1="${px(cx + half * uy)}" y1="${px(cy - half * ux)}" x2="${px(cx - half * uy)}" y2="${px(cy + half * ux)}"/>`,
      `</g>`,
      `<text x="${px(cx + (half - 14) * ux)}" y="${px(cy + (half - 14) * uy - 4)}" font-size="12" fill="#a0522d">1</text>`,
      `<text x="${px(cx - (half - 14) * uy + 4)}" y="${px(cy + (half - 14) * ux)}" font-size="12" fill="#a0522d">2</text>`,
      `<text x="${px(cx + 10)}" y="${px(cy + 30)}" font-size="11" fill="#a0522d">θ = ${escapeXml(formatSig(p.thetaDeg, 4))}°</text>`,
    );
  }
  out.push(
    `<g id="centroid" stroke="#000" stroke-width="1" fill="none">`,
    `<circle cx="${px(cx)}" cy="${px(cy)}" r="5"/>`,
    `<line x1="${px(cx - 8)}" y1="${px(cy)}" x2="${px(cx + 8)}" y2="${px(cy)}"/><line x1="${px(cx)}" y1="${px(cy - 8)}" x2="${px(cx)}" y2="${px(cy + 8)}"/>`,
    `</g>`,
  );
  return out;
}

function tableMarkup(p: SectionProperties, unit: LengthUnit, display: DisplaySet): string[] {
  const out = [`<g id="properties" font-size="12">`, `<text x="${TABLE_X}" y="${TOP}" font-weight="bold">Section properties</text>`];
  DRAWING_TABLE.forEach((row, i) => {
    const shown = shownValue(row.kind, p[row.key], p);
    const value = row.kind === 'angle' || row.kind === 'ratio' ? shown : toDisplay(shown, unit, display[row.kind]);
    const unitText = row.kind === 'angle' ? '°' : row.kind === 'ratio' ? '' : display[row.kind].label;
    const y = TOP + (i + 1.5) * ROW;
    out.push(
      `<text x="${TABLE_X}" y="${px(y)}">${escapeXml(row.symbol)}</text>`,
      `<text x="${TABLE_X + 190}" y="${px(y)}" text-anchor="end">${escapeXml(formatSig(value, 4))}</text>`,
      `<text x="${TABLE_X + 198}" y="${px(y)}">${escapeXml(unitText)}</text>`,
    );
  });
  out.push('</g>');
  return out;
}

export function sectionSvg(input: SvgInput): string {
  const { section, unit } = input;
  const display = input.display ?? defaultDisplaySet(unit);
  const p = section.properties;
  const box = p ? { xMin: p.xMin, xMax: p.xMax, yMin: p.yMin, yMax: p.yMax } : regionBox(section.parts.map((c) => c.region));
  const frame = frameFor(box);
  const lines: string[] = [];
  const tableRows = p ? DRAWING_TABLE.length + 2 : 0;
  const partsTop = TOP + tableRows * ROW + 16;
  const jointLines = input.joints ? jointsText(input.joints) : [];
  const bottom = Math.max(TOP + DRAW + 24, partsTop + (section.parts.length + 1) * ROW) + jointLines.length * 15;
  const height = bottom + 40;
  lines.push(
    `<?xml version="1.0" encoding="UTF-8"?>`,
    `<svg xmlns="http://www.w3.org/2000/svg" width="${WIDTH}" height="${height}" viewBox="0 0 ${WIDTH} ${height}" font-family="sans-serif">`,
    `<title>${escapeXml(input.name)}</title>`,
    `<desc>Cross-section drawn by Sectionsmith, lengths in ${unit}, y up. ${escapeXml(CAUTION)}</desc>`,
    `<rect width="100%" height="100%" fill="#fff"/>`,
    `<text x="${MARGIN}" y="28" font-size="16" font-weight="bold">${escapeXml(input.name)}</text>`,
    `<text x="${MARGIN}" y="46" font-size="11" fill="#555">Section coordinates in ${unit}, y up; centroid marked ⊕; dashed: centroidal x–y axes${p && hasPrincipalAxes(p) ? ', dotted: principal axes 1–2' : ''}</text>`,
    `<g id="section" fill="#c9d6e8" stroke="#1d2b3a" stroke-width="1.2">`,
    ...regionPaths(section.region, frame, ''),
    `</g>`,
    `<g id="parts" fill="none" stroke-width="0.6">`,
  );
  for (const composed of section.parts) {
    const stroke = composed.part.operation === 'subtract' ? 'stroke="#b03030" stroke-dasharray="3 2"' : 'stroke="#555"';
    lines.push(`<g data-operation="${composed.part.operation}"><title>${escapeXml(composed.part.name)}</title>`, ...regionPaths(composed.region, frame, stroke), `</g>`);
  }
  lines.push(`</g>`);
  if (input.joints) lines.push(...jointMarkers(input.joints, frame));
  if (p) lines.push(...axesMarkup(p, frame), ...tableMarkup(p, unit, display));
  else lines.push(`<text x="${TABLE_X}" y="${TOP}" font-size="12" fill="#b03030">No properties: ${escapeXml(section.diagnostics[0]?.message ?? 'the geometry has problems')}</text>`);
  lines.push(`<g id="part-list" font-size="12"><text x="${TABLE_X}" y="${px(partsTop)}" font-weight="bold">Parts</text>`);
  section.parts.forEach((composed, i) => {
    const sign = composed.part.operation === 'subtract' ? '− ' : '+ ';
    lines.push(`<text x="${TABLE_X}" y="${px(partsTop + (i + 1) * ROW)}">${escapeXml(sign + composed.part.name)}</text>`);
  });
  lines.push(`</g>`);
  if (jointLines.length > 0) {
    const top = bottom - jointLines.length * 15;
    lines.push(`<g id="joints-table" font-size="11">`, ...jointLines.map((t, i) => `<text x="${MARGIN}" y="${px(top + i * 15)}"${i === 0 ? ' font-weight="bold"' : ''}>${escapeXml(t)}</text>`), `</g>`);
  }
  lines.push(`<text id="caution" x="${MARGIN}" y="${px(bottom + 16)}" font-size="11" fill="#555">${escapeXml(CAUTION)}</text>`, `</svg>`, '');
  return lines.join('\n');
}

/** Thick lines along each joint's contact segments, named J1, J2 … at the middle of the first. */
function jointMarkers(x: JointsExport, frame: Frame): string[] {
  const out = [`<g id="joints" stroke="#d9822b" stroke-width="3" stroke-linecap="round">`];
  for (const j of x.joints) {
    out.push(`<g data-joint="${escapeXml(j.name)}"><title>${escapeXml(`${j.name}: ${j.parts[0]} | ${j.parts[1]}, ${j.kindText}`)}</title>`);
    for (const s of j.segments) out.push(`<line x1="${px(frame.toX(s.x0))}" y1="${px(frame.toY(s.y0))}" x2="${px(frame.toX(s.x1))}" y2="${px(frame.toY(s.y1))}"/>`);
    out.push('</g>');
  }
  out.push('</g>', `<g id="joint-names" font-size="11" fill="#9a5a10">`);
  for (const j of x.joints) {
    const s = j.segments[0];
    if (s) out.push(`<text x="${px(frame.toX((s.x0 + s.x1) / 2) + 5)}" y="${px(frame.toY((s.y0 + s.y1) / 2) - 5)}">${escapeXml(j.name)}</text>`);
  }
  out.push('</g>');
  return out;
}

/** Lines of text under the drawing: joints, τmax per part, EI shares, warnings and notes (long ones wrapped). */
function jointsText(x: JointsExport): string[] {
  const u = x.units;
  const g = (v: number | null | undefined): string => (v === null || v === undefined ? '—' : formatSig(v, 4));
  const out: string[] = [];
  if (x.joints.length > 0) {
    out.push(x.shear ? `Joints under Vy = ${g(x.shear.Vy)} ${u.force}, Vx = ${g(x.shear.Vx)} ${u.force} (welds ${x.shear.method})` : 'Joints');
    for (const j of x.joints) {
      const s = j.shear;
      out.push(...wrap(`${j.name}  ${j.parts[0]} | ${j.parts[1]}  ${g(j.length)} ${x.unit}  ${j.kindText}${j.isDefault ? ' (default)' : ''}${s ? `  q = ${g(s.q)} ${u.q}  τ = ${g(s.tauJoint)} ${u.stress}  ${s.needs}` : ''}`, 150));
    }
  }
  if (x.shear) for (const p of x.shear.parts) out.push(...wrap(`τmax ${p.part} = ${g(p.tauMax)} ${u.stress}  (${p.where})`, 150));
  if (x.plies) for (const p of x.plies.plies) out.push(`EI share ${p.parts.join(' + ')}: ${formatSig(p.shareX * 100, 4)} % of a vertical load, ${formatSig(p.shareY * 100, 4)} % of a horizontal load`);
  const notes = [...x.warnings, ...(x.plies ? [x.plies.note] : []), ...x.notes];
  for (const n of notes) out.push(...wrap(n, 150));
  if (out.length > 0 && out[0] !== 'Joints' && !out[0]?.startsWith('Joints under')) out.unshift('Pieces and joints');
  return out;
}

function wrap(text: string, width: number): string[] {
  const words = text.split(' ');
  const out: string[] = [];
  let line = '';
  for (const w of words) {
    if (line.length > 0 && line.length + 1 + w.length > width) {
      out.push(line);
      line = w;
    } else line = line.length === 0 ? w : `${line} ${w}`;
  }
  if (line.length > 0) out.push(line);
  return out;
}
