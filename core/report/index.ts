/**
 * A printable HTML report (pure string, no scripts): one section or a comparison of several.
 * Print-ready CSS (@page A4 / Letter-neutral margins, page breaks kept out of tables), the
 * drawings (SVG from core/export or core/compare, embedded as given), a table of values with
 * units, the method notes, the materials, member check lines, and the caution. Every piece of
 * user text is escaped (core/export escapeXml).
 */
import { escapeXml } from '../export/svg.ts';
import { jointsReportTables, type JointsExport } from '../export/joints.ts';
import { CAUTION } from '../member/check.ts';

export interface ReportTable {
  readonly title: string;
  readonly columns: readonly string[];
  readonly rows: readonly (readonly string[])[];
  /** Indexes of columns holding words rather than numbers (set flush left); optional. */
  readonly textColumns?: readonly number[];
}

export interface TorsionNote {
  readonly meshElements: number;
  readonly jRelativeError: number;
}

export interface ReportInput {
  readonly title: string;
  /** SVG documents (trusted: produced by core/export or core/compare). */
  readonly drawings: readonly string[];
  readonly tables: readonly ReportTable[];
  readonly materials?: readonly string[];
  readonly memberChecks?: readonly string[];
  readonly torsion?: TorsionNote | null;
  /** Joints, pieces and overlaps, q and τ under a shear (core/export/joints.ts); tables follow the others. */
  readonly joints?: JointsExport | null;
  /** e.g. "2026-12-01" — given by the caller so the output is reproducible. */
  readonly date?: string;
}

const CSS = `@page { size: auto; margin: 16mm 14mm; }
body { font-family: "DejaVu Sans", Arial, sans-serif; font-size: 10pt; color: #111; margin: 0; }
h1 { font-size: 16pt; margin: 0 0 4mm; } h2 { font-size: 12pt; margin: 4mm 0 1.5mm; border-bottom: 1px solid #999; }
.caution { border: 2px solid #8a1c1c; color: #8a1c1c; padding: 2mm 3mm; margin: 3mm 0; font-weight: bold; break-inside: avoid; page-break-inside: avoid; }
table { border-collapse: collapse; width: 100%; font-size: 8.5pt; page-break-inside: avoid; break-inside: avoid; }
th, td { border: 1px solid #bbb; padding: 0.6mm 2mm; text-align: right; } th:first-child, td:first-child { text-align: left; }
th { background: #eef2f6; } th.text, td.text { text-align: left; }
.block { break-inside: avoid; page-break-inside: avoid; } h2 { break-after: avoid; page-break-after: avoid; }
.drawing svg { display: block; max-width: 100%; max-height: 115mm; width: auto; height: auto; margin: 0 auto; } .drawing { break-inside: avoid; }
@media print { .caution { -webkit-print-color-adjust: exact; print-color-adjust: exact; } }`;

export function reportHtml(input: ReportInput): string {
  const e = escapeXml;
  // Heading and table in one block that is not split across pages (a heading never ends a page).
  const cell = (t: ReportTable, tag: 'th' | 'td', text: string, i: number): string => `<${tag}${t.textColumns?.includes(i) ? ' class="text"' : ''}>${e(text)}</${tag}>`;
  const tables = [...input.tables, ...(input.joints ? jointsReportTables(input.joints) : [])].map((t) => `<section class="block"><h2>${e(t.title)}</h2>\n<table><thead><tr>${t.columns.map((c, i) => cell(t, 'th', c, i)).join('')}</tr></thead><tbody>\n${t.rows.map((r) => `<tr>${r.map((c, i) => cell(t, 'td', c, i)).join('')}</tr>`).join('\n')}\n</tbody></table></section>`);
  const methods = [
    'Area, centroid, second moments and elastic moduli: exact integrals over the boundary by Green\'s theorem, straight edges and circular arcs in closed form (no mesh).',
    'Plastic moduli: the plastic neutral axis splits the area in half; Z is the first moment of both halves about it.',
    input.torsion
      ? `Torsion J and warping Cw: finite elements (6-node triangles), ${input.torsion.meshElements} elements, estimated relative error of J ${(input.torsion.jRelativeError * 100).toPrecision(2)} %.`
      : 'Torsion constants are not part of this report (no finite-element run was passed in).',
  ];
  return [
    '<!DOCTYPE html>',
    '<html lang="en"><head><meta charset="utf-8">',
    `<title>${e(input.title)}</title>`,
    `<style>${CSS}</style></head><body>`,
    `<h1>${e(input.title)}</h1>`,
    input.date ? `<p>${e(input.date)}</p>` : '',
    `<div class="caution">CAUTION: ${e(CAUTION)}</div>`,
    ...input.drawings.map((svg) => `<div class="drawing">${svg.replace(/^<\?xml[^>]*>\s*/, '')}</div>`),
    ...tables,
    '<section class="block"><h2>Method</h2>',
    `<ul>${methods.map((m) => `<li>${e(m)}</li>`).join('')}</ul></section>`,
    '<section class="block"><h2>Materials</h2>',
    input.materials && input.materials.length > 0 ? `<ul>${input.materials.map((m) => `<li>${e(m)}</li>`).join('')}</ul>` : '<p>No materials: geometric properties only.</p>',
    '</section><section class="block"><h2>Member checks</h2>',
    input.memberChecks && input.memberChecks.length > 0 ? `<ul>${input.memberChecks.map((m) => `<li>${e(m)}</li>`).join('')}</ul>` : '<p>No member check in this report.</p>',
    '</section>',
    `<div class="caution">CAUTION: ${e(CAUTION)}</div>`,
    '</body></html>',
    '',
  ].join('\n');
}
