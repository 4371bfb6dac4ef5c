/**
 * Snapping in section coordinates. Targets: part vertices, edge midpoints, part centres, the
 * section centroid, and the grid. A point within `radius` of a target lands on it; otherwise
 * each axis may line up with a target's x or y (shown as a guide line), and what is left
 * rounds to the grid. The caller passes `suspended` (Alt held) to place freely.
 */
import type { PartOutline, Vec } from './geometry.ts';

export type SnapKind = 'vertex' | 'midpoint' | 'centre' | 'centroid' | 'grid';

export interface SnapTarget {
  readonly kind: Exclude<SnapKind, 'grid'>;
  readonly at: Vec;
}

export interface SnapSettings {
  /** Grid spacing, document unit. */
  readonly grid: number;
  readonly gridOn: boolean;
  readonly objectsOn: boolean;
  /** Capture distance in section units (the UI passes pixels ÷ zoom). */
  readonly radius: number;
}

export type Guide =
  | { readonly kind: 'point'; readonly at: Vec; readonly target: SnapKind }
  | { readonly kind: 'vertical'; readonly x: number; readonly from: Vec }
  | { readonly kind: 'horizontal'; readonly y: number; readonly from: Vec };

export interface SnapResult {
  readonly point: Vec;
  readonly guides: readonly Guide[];
}

export function snapTargets(outlines: readonly PartOutline[], exclude: ReadonlySet<string>, centroid: Vec | null): SnapTarget[] {
  const out: SnapTarget[] = [];
  for (const o of outlines) {
    if (exclude.has(o.partId)) continue;
    for (const v of o.vertices) out.push({ kind: 'vertex', at: v });
    out.push({ kind: 'centre', at: o.centre });
    if (o.circle) continue;
    for (const r of o.rings) {
      for (let i = 0; i < r.points.length; i++) {
        const a = r.points[i] as Vec;
        const b = r.points[(i + 1) % r.points.length] as Vec;
        out.push({ kind: 'midpoint', at: [(a[0] + b[0]) / 2, (a[1] + b[1]) / 2] });
      }
    }
  }
  if (centroid) out.push({ kind: 'centroid', at: centroid });
  return out;
}

/** Exact multiples of the grid: dividing first keeps 0.1-type spacings from drifting. */
export function roundToGrid(v: number, grid: number): number {
  if (!(grid > 0)) return v;
  const r = Math.round(v / grid) * grid;
  // Clean binary noise such as 0.30000000000000004 from the multiplication.
  return Number(r.toPrecision(12));
}

const KIND_RANK: Record<SnapTarget['kind'], number> = { vertex: 0, centroid: 1, centre: 2, midpoint: 3 };

export function snapPoint(p: Vec, targets: readonly SnapTarget[], s: SnapSettings, suspended: boolean): SnapResult {
  if (suspended) return { point: p, guides: [] };
  if (s.objectsOn) {
    let best: SnapTarget | null = null;
    let bestD = Infinity;
    for (const t of targets) {
      const d = Math.hypot(t.at[0] - p[0], t.at[1] - p[1]);
      // Within a hair of each other, prefer the more meaningful kind (a vertex over a midpoint).
      if (d <= s.radius && (d < bestD - 1e-12 * s.radius || (Math.abs(d - bestD) <= 1e-12 * s.radius && best && KIND_RANK[t.kind] < KIND_RANK[best.kind]))) {
        best = t;
        bestD = d;
      }
    }
    if (best) return { point: best.at, guides: [{ kind: 'point', at: best.at, target: best.kind }] };
  }
  const guides: Guide[] = [];
  let x = p[0];
  let y = p[1];
  let xDone = false;
  let yDone = false;
  if (s.objectsOn) {
    let bx: SnapTarget | null = null;
    let by: SnapTarget | null = null;
    for (const t of targets) {
      if (Math.abs(t.at[0] - p[0]) <= s.radius && (!bx || Math.abs(t.at[0] - p[0]) < Math.abs(bx.at[0] - p[0]))) bx = t;
      if (Math.abs(t.at[1] - p[1]) <= s.radius && (!by || Math.abs(t.at[1] - p[1]) < Math.abs(by.at[1] - p[1]))) by = t;
    }
    if (bx) {
      x = bx.at[0];
      xDone = true;
      guides.push({ kind: 'vertical', x, from: bx.at });
    }
    if (by) {
      y = by.at[1];
      yDone = true;
      guides.push({ kind: 'horizontal', y, from: by.at });
    }
  }
  if (s.gridOn) {
    if (!xDone) x = roundToGrid(x, s.grid);
    if (!yDone) y = roundToGrid(y, s.grid);
  }
  return { point: [x, y], guides };
}
