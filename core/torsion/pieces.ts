/**
 * Which material piece holds a point, for the G-weighted torsion of a section of several
 * materials (docs/methods.md §7.7). Each piece's rings are flattened with the mesh's own chord rule
 * (core/mesh/flatten.ts), so the test sees the same outline the mesh covers, and a point is
 * inside when a ray towards +x crosses the piece's rings an odd number of times. Edges are
 * bucketed by rows of y, so a query costs the edges of one row, not of the whole outline.
 * Pieces must not overlap (core/materials/document.ts resolves overlaps, later part wins).
 * Returns the index of the first piece holding the point, or −1 on none.
 */
import type { Region } from '../geometry/types.ts';
import { flattenRingChords } from '../mesh/flatten.ts';

interface Rows {
  readonly y0: number;
  readonly dy: number;
  readonly count: number;
  /** Per row, edges as flat (x1, y1, x2, y2) quadruples. */
  readonly edges: number[][];
}

function rowsOf(region: Region, maxSweep: number): Rows {
  const rings = region.flatMap((p) => [p.outer, ...p.holes]).map((r) => flattenRingChords(r, maxSweep).xy);
  let ymin = Infinity;
  let ymax = -Infinity;
  let edgeCount = 0;
  for (const xy of rings) {
    edgeCount += xy.length / 2;
    for (let i = 1; i < xy.length; i += 2) {
      ymin = Math.min(ymin, xy[i]!);
      ymax = Math.max(ymax, xy[i]!);
    }
  }
  const count = Math.max(1, Math.min(1024, Math.ceil(Math.sqrt(edgeCount))));
  const dy = (ymax - ymin) / count || 1;
  const edges: number[][] = Array.from({ length: count }, () => []);
  const rowOf = (y: number): number => Math.min(count - 1, Math.max(0, Math.floor((y - ymin) / dy)));
  for (const xy of rings) {
    const n = xy.length / 2;
    for (let i = 0; i < n; i++) {
      const j = (i + 1) % n;
      const x1 = xy[2 * i]!, y1 = xy[2 * i + 1]!, x2 = xy[2 * j]!, y2 = xy[2 * j + 1]!;
      for (let r = rowOf(Math.min(y1, y2)); r <= rowOf(Math.max(y1, y2)); r++) edges[r]!.push(x1, y1, x2, y2);
    }
  }
  return { y0: ymin, dy, count, edges };
}

function inside(rows: Rows, x: number, y: number): boolean {
  const r = Math.floor((y - rows.y0) / rows.dy);
  if (r < 0 || r >= rows.count) return false;
  const e = rows.edges[r]!;
  let odd = false;
  for (let k = 0; k < e.length; k += 4) {
    const x1 = e[k]!, y1 = e[k + 1]!, x2 = e[k + 2]!, y2 = e[k + 3]!;
    if (y1 > y !== y2 > y && x < x1 + ((y - y1) * (x2 - x1)) / (y2 - y1)) odd = !odd;
  }
  return odd;
}

export function pieceLocator(regions: readonly Region[], maxSweep: number): (x: number, y: number) => number {
  const rows = regions.map((r) => rowsOf(r, maxSweep));
  return (x, y) => rows.findIndex((r) => inside(r, x, y));
}
