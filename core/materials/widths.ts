/**
 * Widths of the section cut by a horizontal line, per piece, and the transformed (equivalent)
 * width n_i·b_i of the transformed section (Gere & Timoshenko, Mechanics of Materials: the
 * transformed-section method widens each material by its modular ratio).
 *
 * Method: the boundary crossings of the line y = c (straight segments and exact arcs), sorted;
 * the material lies between alternate crossings (even–odd rule; holes are rings like any other).
 * A line that passes exactly through a vertex or an arc end is moved by ±1e−9 of the section
 * height and the two widths are averaged, so a width at a corner height is the mean of the
 * widths just above and below. Units: the document unit. Source: docs/methods.md §2.4 (arc points).
 */
import { arcContainsAngle, regionBounds } from '../geometry/bounds.ts';
import { arcOfSegment, ringVertexCount } from '../geometry/ring.ts';
import type { Region, Ring } from '../geometry/types.ts';
import type { MaterialPiece } from './composite.ts';

/** x of each crossing of y = c with the ring, or null when c passes through a segment end. */
function ringCrossings(ring: Ring, c: number): number[] | null {
  const { xy } = ring;
  const n = ringVertexCount(ring);
  const xs: number[] = [];
  for (let i = 0; i < n; i++) {
    const j = i + 1 === n ? 0 : i + 1;
    const x0 = xy[2 * i] ?? 0, y0 = xy[2 * i + 1] ?? 0, x1 = xy[2 * j] ?? 0, y1 = xy[2 * j + 1] ?? 0;
    if (y0 === c) return null;
    const arc = arcOfSegment(ring, i);
    if (arc === null) {
      if (y0 > c !== y1 > c) xs.push(x0 + ((c - y0) * (x1 - x0)) / (y1 - y0));
      continue;
    }
    const h = (c - arc.cy) / arc.r;
    if (Math.abs(h) >= 1) continue;
    const t = Math.asin(h);
    for (const phi of [t, Math.PI - t]) if (arcContainsAngle(arc, phi)) xs.push(arc.cx + arc.r * Math.cos(phi));
  }
  return xs;
}

/** Sorted x of every crossing of the line y = c with the region's rings (material between alternate crossings), or null when c passes through a segment end. */
export function regionCrossingsAt(region: Region, c: number): number[] | null {
  const xs: number[] = [];
  for (const p of region) {
    for (const ring of [p.outer, ...p.holes]) {
      const r = ringCrossings(ring, c);
      if (r === null) return null;
      xs.push(...r);
    }
  }
  return xs.sort((a, b) => a - b);
}

function widthAt(region: Region, c: number): number | null {
  const xs = regionCrossingsAt(region, c);
  if (xs === null) return null;
  let w = 0;
  for (let k = 0; k + 1 < xs.length; k += 2) w += (xs[k + 1] as number) - (xs[k] as number);
  return w;
}

/** Width of the region cut by the line y = c (document unit). */
export function regionWidthAt(region: Region, c: number): number {
  const direct = widthAt(region, c);
  if (direct !== null) return direct;
  const b = regionBounds(region);
  const nudge = b === null ? 1e-9 : 1e-9 * Math.max(b.maxY - b.minY, Number.MIN_VALUE);
  return ((widthAt(region, c - nudge) ?? 0) + (widthAt(region, c + nudge) ?? 0)) / 2;
}

export interface TransformedWidth {
  readonly y: number;
  readonly pieces: readonly { readonly label: string; readonly width: number; readonly n: number; readonly transformedWidth: number }[];
  readonly width: number;
  readonly transformedWidth: number;
}

/** Actual and transformed widths at each height, with n_i = E_i / eRef. */
export function transformedWidths(pieces: readonly MaterialPiece[], eRef: number, heights: readonly number[]): TransformedWidth[] {
  return heights.map((y) => {
    const rows = pieces.map((p, i) => {
      const width = regionWidthAt(p.region, y);
      const n = p.material.E / eRef;
      return { label: p.label ?? String(i + 1), width, n, transformedWidth: n * width };
    });
    return { y, pieces: rows, width: rows.reduce((s, r) => s + r.width, 0), transformedWidth: rows.reduce((s, r) => s + r.transformedWidth, 0) };
  });
}
