/**
 * Shear stress from shear forces Vy and Vx: the largest τ = V·Q/(I·t) in each part and in the
 * parts at each joint, along straight cuts the engine chooses (Gere & Timoshenko, Mechanics of
 * Materials, the shear formula and shear flow in built-up and thin-walled beams), in the general
 * form for unsymmetric sections (docs/methods.md §9.1):
 *
 *   q = [(Vy·Iy − Vx·Ixy)·Qx + (Vx·Ix − Vy·Ixy)·Qy] / (Ix·Iy − Ixy²),   τ_i = n_i·q / Σ n_j·t_j
 *
 * Q (Qx = ∫Y dA, Qy = ∫X dA about the centroid) is that of the material the cut separates from
 * the rest; t_j is the width of part j where the cut crosses it; n = E/E_ref (transformed section,
 * docs/methods.md §6), so the flow across a cut through several materials is shared in proportion
 * to E·t (for one material τ = q/t, the shear formula exactly).
 *
 * Cuts: horizontal lines (y = c) and vertical lines (x = c) through each part, at the neutral
 * axes (the E-weighted centroid), next to each corner of the part and each end of its joints (a
 * small distance inside, so a cut at a joint gives the stress in the part on either side of it),
 * and at eight evenly spaced places across the part. A cut through a part runs only through that
 * part and the parts joined to it side by side along the cut (a contact segment crossing the
 * line): its cut-off material is what the parts' joints (every kind but "not connected") and
 * overlaps leave attached to the far side. Where that material is still attached to the near side
 * (a closed cell such as a box girder), or the part is crossed more than once (one channel cut
 * through both flanges), the cut runs along the whole line across the section, with the total
 * width of material cut: the flow is then shared in proportion to wall width, exact for a section
 * symmetric about the load's line and otherwise an assumption stated in `note`.
 *
 * Units: V in newtons; lengths in the document unit; q in N per document unit; τ in N per
 * document unit². Bending properties are those of all visible parts acting together (the
 * transformed section); fastener holes are left out (gross section, as for the joints).
 * Does not: find a peak between the cuts on a sloped or curved outline (the cuts include eight
 * across each part, and the neutral axis, where a rectangle, a circle and an I peak); cut along
 * sloped lines; analyse closed cells by compatibility (Bredt–Batho).
 */
import type { SectionDocument } from '../document/types.ts';
import { regionBounds, rotateRegion } from '../geometry/index.ts';
import type { Region } from '../geometry/types.ts';
import { regionCrossingsAt } from '../materials/widths.ts';
import { momentsBeyondLine } from '../properties/plastic.ts';
import type { ContactSegment, Joint } from './contacts.ts';
import { partsActingTogether } from './groups.ts';
import { jointShearFlows, partMaterials, transformed, type JointShearFlow, type PartMaterial, type ShearLoads, type TransformedSection } from './shear-flow.ts';

export type CutOrientation = 'horizontal' | 'vertical';

export interface ShearCut {
  /** horizontal: the line y = at; vertical: the line x = at (document unit). */
  readonly orientation: CutOrientation;
  readonly at: number;
  /** Labels of the parts the cut runs through; their widths add. */
  readonly crossed: readonly string[];
  /** Σ of the widths of material cut, document unit. */
  readonly width: number;
  /** What the cut separates: whole parts by label, or "label (above)", "label (right)" for the piece of a part cut. */
  readonly cutOff: readonly string[];
  /** Q of the cut-off material about the (E-weighted) centroid, document unit³. */
  readonly Qx: number;
  readonly Qy: number;
  /** Shear flow across the cut, N per document unit. */
  readonly q: number;
  readonly how: 'part' | 'whole line';
  readonly note: string;
}

export interface PartShear {
  /** Index into the composition's parts. */
  readonly index: number;
  readonly label: string;
  /** Largest |τ| found in the part, N per document unit² (0 when no load). */
  readonly tauMax: number;
  /** The cut where it occurs (null when the part was not cut). */
  readonly cut: ShearCut | null;
}

export interface JointShear {
  readonly joint: Joint;
  /** The joint's shear flow (core/joints/shear-flow.ts), N per document unit. */
  readonly q: number;
  /** |q| over the contact length: the average stress on the joint plane, N per document unit². */
  readonly tauJoint: number;
  /** |τ| in each of the two parts just inside the joint (joint.a, joint.b), or null where the joint is not straight along x or y. */
  readonly tauIn: readonly [number | null, number | null];
}

export interface ShearStressResult {
  readonly section: TransformedSection;
  readonly parts: readonly PartShear[];
  readonly joints: readonly JointShear[];
  /** Number of distinct cut lines tried. */
  readonly cuts: number;
  readonly method: string;
  readonly warnings: readonly string[];
}

export const SHEAR_CUTS_METHOD =
  'τ = V·Q/(I·t) along horizontal and vertical cuts through each part (at the neutral axes, beside each corner and joint, and at eight places across the part); a cut through a closed cell runs across the whole section with the total width of material cut.';

/** Samples across each part, and the most corner coordinates per part used before sampling instead. */
const SAMPLES = 8;
const MAX_CORNER_CUTS = 24;

interface Edge {
  readonly a: number;
  readonly b: number;
  /** Contact segments of a joint; null for an overlap. */
  readonly segments: readonly ContactSegment[] | null;
}

interface Model {
  readonly list: readonly PartMaterial[];
  readonly byIndex: ReadonlyMap<number, PartMaterial>;
  readonly s: TransformedSection & { readonly ox: number; readonly oy: number };
  readonly edges: readonly Edge[];
  readonly box: { readonly minX: number; readonly maxX: number; readonly minY: number; readonly maxY: number };
  readonly eps: number;
  readonly loads: ShearLoads;
  readonly rotated: Map<number, Region>;
  readonly acting: ReturnType<typeof partsActingTogether>;
  readonly flowWarnings: readonly string[];
}

function buildModel(doc: SectionDocument, loads: ShearLoads): Model | null {
  const acting = partsActingTogether(doc);
  if (acting.composition.diagnostics.length > 0) return null;
  const { list, warnings } = partMaterials(doc, acting.composition.parts);
  if (list.length === 0) return null;
  const s = transformed(list);
  const box = regionBounds(list.flatMap((p) => p.region));
  if (box === null) return null;
  const size = Math.max(box.maxX - box.minX, box.maxY - box.minY);
  const edges: Edge[] = [
    ...acting.joints.filter((j) => j.kind.type !== 'not-connected').map((j) => ({ a: j.a, b: j.b, segments: j.segments })),
    ...acting.overlaps.map((o) => ({ a: o.a, b: o.b, segments: null })),
  ];
  return { list, byIndex: new Map(list.map((p) => [p.index, p])), s, edges, box, eps: 1e-8 * size, loads, rotated: new Map(), acting, flowWarnings: warnings };
}

type Side = '+' | '-';

interface LineData {
  /** Per part crossed: width and the number of crossings. */
  readonly crossed: Map<number, { readonly width: number; readonly count: number }>;
  readonly plus: Map<number, { readonly A: number; readonly Qx: number; readonly Qy: number }>;
}

function crossingsOf(m: Model, p: PartMaterial, o: CutOrientation, c: number): number[] {
  let region = p.region;
  if (o === 'vertical') {
    // Rotated +90°: (x, y) → (−y, x), so the line x = c is the line y' = c.
    region = m.rotated.get(p.index) ?? rotateRegion(p.region, 90);
    m.rotated.set(p.index, region);
  }
  for (const nudge of [0, 1e-3, -1e-3, 1e-2]) {
    const xs = regionCrossingsAt(region, c + nudge * m.eps);
    if (xs !== null) return xs;
  }
  return [];
}

function lineData(m: Model, o: CutOrientation, c: number): LineData {
  const crossed = new Map<number, { width: number; count: number }>();
  for (const p of m.list) {
    const xs = crossingsOf(m, p, o, c);
    let width = 0;
    for (let k = 0; k + 1 < xs.length; k += 2) width += (xs[k + 1] as number) - (xs[k] as number);
    if (width > 0) crossed.set(p.index, { width, count: xs.length / 2 });
  }
  return { crossed, plus: new Map() };
}

/** Q about the centroid of the piece of part p on the + side of the line (above y = c, or right of x = c), exact (core/properties momentsBeyondLine). */
function plusPiece(m: Model, line: LineData, p: PartMaterial, o: CutOrientation, c: number): { A: number; Qx: number; Qy: number } {
  const cached = line.plus.get(p.index);
  if (cached) return cached;
  const raw = momentsBeyondLine(p.region, o, c, m.s.ox, m.s.oy);
  const out = centred(m, { ...raw, originX: m.s.ox, originY: m.s.oy });
  line.plus.set(p.index, out);
  return out;
}

function centred(m: Model, raw: { A: number; Qx: number; Qy: number; originX: number; originY: number }): { A: number; Qx: number; Qy: number } {
  // The raw integrals are about (originX, originY) = (ox, oy); move them to the centroid.
  return { A: raw.A, Qx: raw.Qx - raw.A * (m.s.cy - raw.originY), Qy: raw.Qy - raw.A * (m.s.cx - raw.originX) };
}

function flow(m: Model, Qx: number, Qy: number): number {
  const { Ix, Iy, Ixy } = m.s;
  const { Vx, Vy } = m.loads;
  return ((Vy * Iy - Vx * Ixy) * Qx + (Vx * Ix - Vy * Ixy) * Qy) / (Ix * Iy - Ixy * Ixy);
}

function segmentSide(seg: ContactSegment, o: CutOrientation, c: number): Side | 'straddle' {
  const [v0, v1] = o === 'horizontal' ? [seg.y0, seg.y1] : [seg.x0, seg.x1];
  if (Math.min(v0, v1) >= c) return '+';
  if (Math.max(v0, v1) <= c) return '-';
  return 'straddle';
}

function partSide(m: Model, p: PartMaterial, o: CutOrientation, c: number): Side {
  const q = centred(m, p.raw);
  const centre = o === 'horizontal' ? m.s.cy + q.Qx / q.A : m.s.cx + q.Qy / q.A;
  return centre >= c ? '+' : '-';
}

/** The cut through part k along the line, and τ in every part it crosses; null when k is not crossed. */
function cutThrough(m: Model, line: LineData, o: CutOrientation, c: number, k: number): { cut: ShearCut; tau: Map<number, number> } | null {
  if (!line.crossed.has(k)) return null;
  const S = new Set([k]);
  for (let grew = true; grew;) {
    grew = false;
    for (const e of m.edges) {
      const inA = S.has(e.a), inB = S.has(e.b);
      if (inA === inB) continue;
      const other = inA ? e.b : e.a;
      if (!line.crossed.has(other)) continue;
      if (e.segments === null || e.segments.some((g) => segmentSide(g, o, c) === 'straddle')) {
        S.add(other);
        grew = true;
      }
    }
  }
  let whole = [...S].some((i) => (line.crossed.get(i)?.count ?? 0) > 1);
  let members: number[] = [];
  if (!whole) {
    const parent = new Map<string, string>();
    const find = (x: string): string => {
      let r = x;
      while ((parent.get(r) ?? r) !== r) r = parent.get(r) as string;
      parent.set(x, r);
      return r;
    };
    const union = (x: string, y: string): void => void parent.set(find(x), find(y));
    const node = (i: number, side: Side): string => (S.has(i) ? `${i}${side}` : `${i}`);
    for (const e of m.edges) {
      if (e.segments !== null) {
        for (const g of e.segments) {
          const side = segmentSide(g, o, c);
          if (side === 'straddle') {
            union(node(e.a, '+'), node(e.b, '+'));
            union(node(e.a, '-'), node(e.b, '-'));
          } else union(node(e.a, side), node(e.b, side));
        }
      } else if (S.has(e.a) && S.has(e.b)) {
        union(node(e.a, '+'), node(e.b, '+'));
        union(node(e.a, '-'), node(e.b, '-'));
      } else {
        const pa = m.byIndex.get(e.a), pb = m.byIndex.get(e.b);
        if (!pa || !pb) continue;
        const side = S.has(e.a) ? partSide(m, pb, o, c) : partSide(m, pa, o, c);
        union(node(e.a, side), node(e.b, side));
      }
    }
    const root = find(`${k}+`);
    whole = [...S].some((i) => find(`${i}-`) === root);
    if (!whole) members = [...[...S].map((i) => `${i}+`), ...m.list.filter((p) => !S.has(p.index)).map((p) => `${p.index}`)].filter((n) => find(n) === root).map((n) => (n.endsWith('+') ? -1 - Number(n.slice(0, -1)) : Number(n)));
  }
  let cutSet: number[];
  if (whole) {
    cutSet = [...line.crossed.keys()];
    members = [...cutSet.map((i) => -1 - i), ...m.list.filter((p) => !line.crossed.has(p.index) && partSide(m, p, o, c) === '+').map((p) => p.index)];
  } else cutSet = [...S];
  // members: i ≥ 0 a whole part; −1 − i the + piece of part i.
  let Qx = 0, Qy = 0;
  const labels: string[] = [];
  const sideWord = o === 'horizontal' ? 'above' : 'right';
  for (const code of members.sort((x, y) => (x < 0 ? -1 - x : x) - (y < 0 ? -1 - y : y))) {
    const p = m.byIndex.get(code < 0 ? -1 - code : code);
    if (!p) continue;
    const q = code < 0 ? plusPiece(m, line, p, o, c) : centred(m, p.raw);
    if (q.A === 0) continue;
    Qx += p.n * q.Qx;
    Qy += p.n * q.Qy;
    labels.push(code < 0 ? `${p.label} (${sideWord})` : p.label);
  }
  const q = flow(m, Qx, Qy);
  let width = 0, nt = 0;
  for (const i of cutSet) {
    const w = line.crossed.get(i)?.width ?? 0;
    width += w;
    nt += (m.byIndex.get(i)?.n ?? 1) * w;
  }
  const tau = new Map<number, number>();
  for (const i of cutSet) tau.set(i, Math.abs(((m.byIndex.get(i)?.n ?? 1) * q) / nt));
  const crossed = cutSet.map((i) => m.byIndex.get(i)?.label ?? '');
  const note = whole
    ? 'cut along the whole line across the section (a closed cell, or a part crossed more than once): the flow is shared in proportion to wall width, exact when the section is symmetric about the load\'s line'
    : crossed.length > 1 ? 'cut through parts joined side by side: their widths add' : 'cut through one part';
  return { cut: { orientation: o, at: c, crossed, width, cutOff: labels, Qx, Qy, q, how: whole ? 'whole line' : 'part', note }, tau };
}

function linesFor(m: Model, p: PartMaterial, o: CutOrientation): number[] {
  const b = regionBounds(p.region);
  if (b === null) return [];
  const [lo, hi] = o === 'horizontal' ? [b.minY, b.maxY] : [b.minX, b.maxX];
  const inside = (c: number): boolean => c > lo && c < hi;
  const out: number[] = [];
  const axis = o === 'horizontal' ? m.s.cy : m.s.cx;
  if (inside(axis)) out.push(axis);
  const corners = new Set<number>();
  for (const poly of p.region) for (const ring of [poly.outer, ...poly.holes]) for (let i = o === 'horizontal' ? 1 : 0; i < ring.xy.length; i += 2) corners.add(ring.xy[i] as number);
  const list = [...corners];
  const use = list.length <= MAX_CORNER_CUTS ? list : Array.from({ length: MAX_CORNER_CUTS + 1 }, (_, i) => lo + ((hi - lo) * i) / MAX_CORNER_CUTS);
  // The ends of the part's joints always (a dense outline's corners are replaced by even steps, its joints are not).
  for (const e of m.edges) if (e.segments !== null && (e.a === p.index || e.b === p.index)) for (const g of e.segments) use.push(...(o === 'horizontal' ? [g.y0, g.y1] : [g.x0, g.x1]));
  for (const v of use) for (const c of [v - m.eps, v + m.eps]) if (inside(c)) out.push(c);
  for (let i = 0; i < SAMPLES; i++) out.push(lo + ((hi - lo) * (i + 0.5)) / SAMPLES);
  return out;
}

function jointTauIn(m: Model, joint: Joint, part: number, sign: 1 | -1, lines: Map<string, LineData>): number | null {
  let best: number | null = null;
  const tol = 1e-9 * Math.max(m.box.maxX - m.box.minX, m.box.maxY - m.box.minY);
  for (const g of joint.segments) {
    // Segments run along part a's outline with a's material on the left: the left normal is (−uy, ux).
    const dx = g.x1 - g.x0, dy = g.y1 - g.y0;
    let o: CutOrientation, c: number;
    if (Math.abs(dy) <= tol) [o, c] = ['horizontal', g.y0 + sign * Math.sign(dx) * m.eps];
    else if (Math.abs(dx) <= tol) [o, c] = ['vertical', g.x0 - sign * Math.sign(dy) * m.eps];
    else continue;
    const r = cutThrough(m, lineAt(m, lines, o, c), o, c, part);
    const t = r?.tau.get(part);
    if (t !== undefined) best = Math.max(best ?? 0, t);
  }
  return best;
}

function lineAt(m: Model, lines: Map<string, LineData>, o: CutOrientation, c: number): LineData {
  const key = `${o}:${c}`;
  let line = lines.get(key);
  if (!line) {
    line = lineData(m, o, c);
    lines.set(key, line);
  }
  return line;
}

/** τmax in each part and beside each joint, under Vy and Vx (newtons); null when the section cannot be composed. */
export function shearStresses(doc: SectionDocument, loads: ShearLoads): ShearStressResult | null {
  const m = buildModel(doc, loads);
  if (m === null) return null;
  const best = new Map<number, { tau: number; cut: ShearCut | null }>(m.list.map((p) => [p.index, { tau: 0, cut: null }]));
  const lines = new Map<string, LineData>();
  const seen = new Set<string>();
  for (const p of m.list) {
    for (const o of ['horizontal', 'vertical'] as const) {
      for (const c of linesFor(m, p, o)) {
        const key = `${o}:${c}`;
        if (seen.has(key)) continue;
        seen.add(key);
        const line = lineAt(m, lines, o, c);
        const done = new Set<number>();
        for (const k of line.crossed.keys()) {
          if (done.has(k)) continue;
          const r = cutThrough(m, line, o, c, k);
          if (!r) continue;
          for (const [i, t] of r.tau) {
            done.add(i);
            const b = best.get(i);
            if (b && (t > b.tau || b.cut === null)) best.set(i, { tau: t, cut: r.cut });
          }
        }
      }
    }
  }
  const flows = jointShearFlows(doc, loads);
  const byJoint = new Map<string, JointShearFlow>((flows?.flows ?? []).map((f) => [`${f.joint.a}:${f.joint.b}`, f]));
  const joints = m.acting.joints.map((joint): JointShear => {
    const f = byJoint.get(`${joint.a}:${joint.b}`);
    return { joint, q: f?.q ?? 0, tauJoint: f?.tau ?? 0, tauIn: [jointTauIn(m, joint, joint.a, 1, lines), jointTauIn(m, joint, joint.b, -1, lines)] };
  });
  return {
    section: { A: m.s.A, cx: m.s.cx, cy: m.s.cy, Ix: m.s.Ix, Iy: m.s.Iy, Ixy: m.s.Ixy },
    parts: m.list.map((p) => ({ index: p.index, label: p.label, tauMax: best.get(p.index)?.tau ?? 0, cut: best.get(p.index)?.cut ?? null })),
    joints, cuts: seen.size, method: SHEAR_CUTS_METHOD, warnings: [...m.acting.warnings, ...m.flowWarnings],
  };
}

export interface ShearProfile {
  readonly index: number;
  readonly label: string;
  /** Cuts across the part's shorter side, stepping along its longer side (a web: horizontal cuts up its height). */
  readonly orientation: CutOrientation;
  /** Each cut's position (y for horizontal cuts, x for vertical) with the flow across it (N per unit) and |τ| in this part (N per unit²). */
  readonly points: readonly { readonly at: number; readonly q: number; readonly tau: number }[];
}

/**
 * The shear flow and |τ| along each part, for drawing a shear-flow diagram of a thin-walled
 * section: `samples` cuts across each part (at least 2), from one end to the other, each just
 * inside the part's ends. Same cuts and rules as shearStresses.
 */
export function shearStressProfile(doc: SectionDocument, loads: ShearLoads, samples = 33): ShearProfile[] | null {
  const m = buildModel(doc, loads);
  if (m === null) return null;
  const n = Math.max(2, Math.floor(samples));
  const lines = new Map<string, LineData>();
  return m.list.map((p) => {
    const b = regionBounds(p.region);
    const o: CutOrientation = b !== null && b.maxX - b.minX > b.maxY - b.minY ? 'vertical' : 'horizontal';
    const [lo, hi] = b === null ? [0, 0] : o === 'horizontal' ? [b.minY + m.eps, b.maxY - m.eps] : [b.minX + m.eps, b.maxX - m.eps];
    const points = Array.from({ length: n }, (_, i) => lo + ((hi - lo) * i) / (n - 1)).map((c) => {
      const r = cutThrough(m, lineAt(m, lines, o, c), o, c, p.index);
      return { at: c, q: r?.cut.q ?? 0, tau: r?.tau.get(p.index) ?? 0 };
    });
    return { index: p.index, label: p.label, orientation: o, points };
  });
}

/** The cut through one part (index into the composition's parts) along y = c or x = c, with |τ| in that part; null when the line misses it. */
export function shearStressAt(doc: SectionDocument, loads: ShearLoads, orientation: CutOrientation, c: number, part: number): { readonly cut: ShearCut; readonly tau: number } | null {
  const m = buildModel(doc, loads);
  if (m === null) return null;
  const r = cutThrough(m, lineData(m, orientation, c), orientation, c, part);
  return r === null ? null : { cut: r.cut, tau: r.tau.get(part) ?? 0 };
}
