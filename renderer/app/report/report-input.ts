/**
 * What goes into the printable report of the section now open (core/report's ReportInput):
 * the annotated drawing from core/export, the properties in the chosen display units and
 * figures, the torsion constants when the finite-element solve of this very document is done
 * (with its mesh size and error estimate for the method notes), the materials of the parts,
 * and the member check of the section's stored member case (core/document: MemberInputs).
 *
 * Units: the document's length unit in; tables in the display set given. Forces, line loads,
 * moments and stresses in the document's unit system (core/units/systems.ts): kN, kN/m, kN·m and
 * MPa for metric documents; kip, kip/ft, kip·ft and ksi for inch and foot documents. Every factor
 * comes from core/units.
 * Pure: no DOM, no clock (the caller passes the date).
 */
import type { SectionDocument } from '../../../core/document/types.ts';
import { sectionSvg } from '../../../core/export/index.ts';
import { jointsExport } from '../../../core/export/joints.ts';
import type { ShearLoads } from '../../../core/joints/index.ts';
import { materialPiecesFromDocument } from '../../../core/materials/index.ts';
import { LIMIT_CAUTION, sectionMemberCheck, type SectionMemberInput, type Support } from '../../../core/member/index.ts';
import type { SectionProperties } from '../../../core/properties/types.ts';
import type { ReportInput, ReportTable } from '../../../core/report/index.ts';
import { sectionFromDocument } from '../../../core/section/index.ts';
import type { TorsionResult } from '../../../core/torsion/types.ts';
import { convertLength, formatSig, fromSI, unitSystem, type DisplaySet, type LengthUnit } from '../../../core/units/index.ts';
import { propertyGroups, torsionRows } from '../results/result-rows.ts';

/** The member panel's load case: span and positions in `unit`, forces in N, line loads in N/m. */
export interface MemberCase {
  readonly unit: LengthUnit;
  readonly input: SectionMemberInput;
}

export interface SectionReportOptions {
  readonly doc: SectionDocument;
  readonly display: DisplaySet;
  readonly sig: number;
  /** The torsion result, only when it was computed for `doc` itself. */
  readonly torsion: TorsionResult | null;
  readonly member: MemberCase | null;
  readonly date?: string;
  /** The file's own name, put before the section's when they differ. */
  readonly fileTitle?: string;
  /** Shear forces Vy, Vx (N) for the joints' q and τ (core/export/joints.ts); absent: joints, pieces and overlaps only. */
  readonly shear?: ShearLoads | null;
}

export type SectionReport = { readonly ok: true; readonly input: ReportInput } | { readonly ok: false; readonly errors: readonly string[] };

/** Units of the member lines: the document's unit system (core/units/systems.ts). */
export interface ForceUnits {
  readonly force: string;
  readonly line: string;
  readonly moment: string;
  readonly stress: string;
  /** Deflections and positions along the member in the report: in or mm. */
  readonly length: LengthUnit;
}

export function forceUnitsFor(unit: LengthUnit): ForceUnits {
  const s = unitSystem(unit);
  return { force: s.units.force, line: s.units.lineLoad, moment: s.units.moment, stress: s.units.stress, length: s.deflection as LengthUnit };
}

const SUPPORT_WORDS: Readonly<Record<Support, string>> = { simple: 'simply supported', cantilever: 'cantilever fixed at the left end', fixed: 'fixed at both ends', propped: 'propped cantilever' };

/** The catalogue's report groups as report tables (three tables, so none is longer than a page). */
export function propertyTables(p: SectionProperties, unit: LengthUnit, display: DisplaySet, sig: number): ReportTable[] {
  const columns = ['symbol', 'value', 'unit', 'meaning'];
  const textColumns = [3];
  const groups = propertyGroups('report', p, unit, display, sig);
  const rows = (titles: readonly string[]): string[][] =>
    groups.filter((g) => titles.includes(g.title)).flatMap((g) => g.rows.map((row) => [row.symbol, row.text, row.unit, row.meaning]));
  return [
    { title: 'Area, centroid, second moments and radii of gyration', columns, rows: rows(['Area and centroid', 'Second moments about the centroid', 'Principal axes', 'Radii of gyration']), textColumns },
    { title: 'Elastic and plastic moduli', columns, rows: rows(['Elastic section moduli', 'Plastic']), textColumns },
    { title: 'Extents', columns, rows: rows(['Extents']), textColumns },
  ];
}

/** The catalogue's torsion rows; separate pieces get J only, with a row saying why. */
export function torsionTable(t: TorsionResult, p: SectionProperties, unit: LengthUnit, display: DisplaySet, sig: number): ReportTable {
  const rows = torsionRows('report', t, p, unit, display, sig).map((r) => [r.symbol, r.text, r.unit, r.meaning]);
  return {
    title: 'Torsion (finite elements)',
    columns: ['symbol', 'value', 'unit', 'meaning'],
    textColumns: [3],
    // Separate pieces twist on their own: J adds, and there is no shared shear centre or Cw.
    rows: t.components > 1 ? [...rows, ['Cw, xs, ys', '—', '', 'none: the pieces are separate, so there is no shared shear centre or warping constant']] : rows,
  };
}

const noMaterialAssigned = (doc: SectionDocument): boolean => doc.defaultMaterial === null && doc.parts.every((p) => p.material === null);

/** One line per material piece (E, density, strength), then the composite stiffness and weight; [] when no part has a material. */
export function materialLines(doc: SectionDocument): string[] {
  if (noMaterialAssigned(doc)) return [];
  const found = materialPiecesFromDocument(doc);
  if (found.issues.length > 0 || found.pieces.length === 0) return [`Materials are incomplete, so no stiffness or weight is reported: ${found.issues.join('; ') || 'no material pieces'}.`];
  const u = forceUnitsFor(doc.unit);
  // Densities in the document's unit system (lb/ft³ or kg/m³, core/units).
  const density = unitSystem(doc.unit).units.density;
  const s = (pa: number): string => `${formatSig(fromSI(pa, 'stress', u.stress), 4)} ${u.stress}`;
  return found.pieces.map((piece, i) => {
    const m = piece.material;
    const strength = Number.isFinite(m.fy) ? `, ${m.strengthBasis === 'yield' ? 'fy' : m.strengthBasis === 'tensile' ? 'tensile strength' : 'reference Fb'} = ${s(m.fy)}` : '';
    return `${piece.label ?? `piece ${i + 1}`}: ${m.name}; E = ${s(m.E)}, G = ${s(m.G)}, density ${formatSig(fromSI(m.density, 'density', density), 4)} ${density}${strength}`;
  });
}

/** The member panel's case recomputed for `doc`: loads, deflection against the limit, moment, stresses; [] without a case. */
export function memberLines(doc: SectionDocument, member: MemberCase | null): string[] {
  if (member === null) return [];
  const found = materialPiecesFromDocument(doc);
  if (found.issues.length > 0 || found.pieces.length === 0) return [`The member check needs a material for every part: ${found.issues.join('; ') || 'no material pieces'}.`];
  const L = (v: number): number => convertLength(v, member.unit, doc.unit);
  const input: SectionMemberInput = { ...member.input, span: L(member.input.span), points: member.input.points.map((p) => ({ P: p.P, a: L(p.a) })) };
  const r = sectionMemberCheck(found.pieces, doc.unit, input);
  if (!r.ok) return [`The member check could not run: ${r.issues.join('; ')}.`];
  const u = forceUnitsFor(doc.unit);
  const g = (v: number, n = 4): string => formatSig(v, n);
  const force = (n: number): string => `${g(fromSI(n, 'force', u.force))} ${u.force}`;
  const line = (npm: number): string => `${g(fromSI(npm, 'lineLoad', u.line))} ${u.line}`;
  const stress = (pa: number): string => `${g(fromSI(pa, 'stress', u.stress), 3)} ${u.stress}`;
  const len = (metres: number): string => `${g(convertLength(metres, 'm', u.length))} ${u.length}`;
  const docLen = (v: number): string => `${g(v)} ${doc.unit}`;
  const loads = [
    ...input.points.map((p) => `point load ${force(p.P)} at ${docLen(p.a)} from the left end`),
    `uniform load ${line(input.uniform)}`,
    ...(input.live !== undefined && (input.live.uniform !== 0 || input.live.points.length > 0)
      ? [`live uniform load ${line(input.live.uniform)}`, ...input.live.points.map((p) => `live point load ${force(p.P)} at ${docLen(p.a)} from the left end`)]
      : ['no live load']),
    input.selfWeight ? `self-weight ${line(r.selfWeight ?? 0)} included` : 'self-weight not included',
  ];
  const res = r.result;
  const pct = (x: number | undefined): string => (x === undefined ? '—' : `${g(100 * x, 3)} %`);
  const lines = [
    `Beam ${SUPPORT_WORDS[input.support]}, span ${docLen(input.span)}; ${loads.join('; ')}.`,
    `Largest deflection ${len(Math.abs(res.deflectionMax))} at ${len(res.deflectionAt)}; span / deflection = ${g(res.spanOverDeflection)}.`,
    ...(res.limit ? [`${res.limit.passes ? 'Within' : 'Exceeds'} the common-practice limit L/${res.limit.ratio} (allowed ${len(res.limit.allowed)}).`] : []),
    ...(res.liveDeflectionMax !== undefined && res.liveLimit ? [`Live-load deflection ${len(Math.abs(res.liveDeflectionMax))}: ${res.liveLimit.passes ? 'within' : 'exceeds'} the common-practice limit L/${res.liveLimit.ratio} (allowed ${len(res.liveLimit.allowed)}).`] : []),
    `Largest bending moment ${g(Math.abs(fromSI(res.momentMax, 'moment', u.moment)))} ${u.moment} at ${len(res.momentAt)}.`,
    ...res.stresses.map((s) => `Bending stress in ${s.name}: tension ${stress(s.maxTension)}, compression ${stress(-s.maxCompression)}${s.strengthRatio !== undefined ? ` (${g(100 * s.strengthRatio, 3)} % of the ${s.strengthLabel})` : ''}.`),
    ...res.verdict.criteria.map((c) => (c.status === 'not checked' ? `Not checked: ${c.label} (${c.reason ?? ''}).` : `${c.status === 'fail' ? 'FAILS' : 'Passes'}: ${c.label} at ${pct(c.ratio)} of its limit (${c.limitBasis}).`)),
    `Verdict: ${res.verdict.summary}.`,
    LIMIT_CAUTION,
  ];
  return lines;
}

/** "File — section" when the file names itself apart from the section, else the section's name. */
export function reportTitle(fileTitle: string, sectionName: string): string {
  const f = fileTitle.trim(), s = sectionName.trim();
  if (f === '' || f === s) return s || 'Untitled section';
  return s === '' ? f : `${f} — ${s}`;
}

/** The ReportInput of one section, or the geometry problems that prevent it. */
export function sectionReportInput(o: SectionReportOptions): SectionReport {
  const section = sectionFromDocument(o.doc);
  const p = section.properties;
  if (p === null) return { ok: false, errors: section.diagnostics.length > 0 ? section.diagnostics.map((d) => d.message) : ['the section has no area: draw or open a section first'] };
  const tables = propertyTables(p, o.doc.unit, o.display, o.sig);
  if (o.torsion) tables.splice(2, 0, torsionTable(o.torsion, p, o.doc.unit, o.display, o.sig));
  const joints = jointsExport({ doc: o.doc, loads: o.shear ?? null });
  return {
    ok: true,
    input: {
      title: reportTitle(o.fileTitle ?? '', o.doc.name),
      drawings: [sectionSvg({ name: o.doc.name, unit: o.doc.unit, section, display: o.display, joints })],
      tables,
      joints,
      materials: materialLines(o.doc),
      memberChecks: memberLines(o.doc, o.member),
      torsion: o.torsion ? { meshElements: o.torsion.meshElements, jRelativeError: o.torsion.jRelativeError } : null,
      ...(o.date !== undefined ? { date: o.date } : {}),
    },
  };
}

export const PAPER_SIZES = ['A4', 'Letter'] as const;
export type PaperSize = (typeof PAPER_SIZES)[number];

/** The report HTML with its page size fixed (a later @page rule wins over core/report's `size: auto`). */
export function withPaperSize(html: string, paper: PaperSize): string {
  const rule = `<style>@page { size: ${paper === 'A4' ? 'A4' : 'letter'}; }</style>`;
  const at = html.indexOf('</head>');
  if (at < 0) throw new Error('the report HTML has no </head>');
  return `${html.slice(0, at)}${rule}${html.slice(at)}`;
}

/** A file name stem from a document or file name ("footbridge-box-girder.section.json" → "footbridge-box-girder"). */
export function fileStem(name: string): string {
  return name.replace(/\.(section\.json|geojson|json)$/i, '').replace(/[^\w.-]+/g, '-').replace(/^-+|-+$/g, '') || 'section';
}
