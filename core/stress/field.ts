/**
 * A sampled normal-stress field for drawing a colour map (the palette belongs to the editor).
 *
 * Two forms:
 *  - `stressGradients`: per piece, the exact linear field as its extreme values and their
 *    points (a linear gradient fill clipped to the piece's outline reproduces it exactly);
 *  - `stressGrid`: cell-centre values on an nx × ny grid over the section's bounds, NaN outside
 *    the material, with the piece index of each cell.
 * Point location is exact for arcs: a point is inside a ring when the even–odd rule over the
 * chords, toggled by each circular segment (between chord and arc) that contains it, says so.
 * Units: lengths of the section; stress in the stiffness' force/length². Points exactly on a
 * boundary may fall either way. Source: docs/methods.md §6, §9.1; even–odd rule (common practice).
 */
import { regionBounds } from '../geometry/bounds.ts';
import { arcOfSegment, ringVertexCount } from '../geometry/ring.ts';
import type { Region, Ring } from '../geometry/types.ts';
import { invariant } from '../invariant.ts';
import { stressAt, stressExtremes, type StrainPlane, type StressExtremes } from './normal-stress.ts';

export interface StressPiece {
  readonly region: Region;
  /** Modulus of the piece (1 for a single-material stiffness). */
  readonly E: number;
}

/** Even–odd parity of a ring at (x, y), arcs included. */
function ringParity(ring: Ring, x: number, y: number): boolean {
  const { xy } = ring;
  const n = ringVertexCount(ring);
  let inside = false;
  for (let i = 0; i < n; i++) {
    const j = i + 1 === n ? 0 : i + 1;
    const x0 = xy[2 * i] ?? 0, y0 = xy[2 * i + 1] ?? 0, x1 = xy[2 * j] ?? 0, y1 = xy[2 * j + 1] ?? 0;
    if (y0 > y !== y1 > y && x < x0 + ((y - y0) * (x1 - x0)) / (y1 - y0)) inside = !inside;
    const arc = arcOfSegment(ring, i);
    if (arc === null) continue;
    const tm = arc.t0 + arc.sweep / 2;
    const mx = arc.cx + arc.r * Math.cos(tm), my = arc.cy + arc.r * Math.sin(tm);
    const side = (px: number, py: number): number => (x1 - x0) * (py - y0) - (y1 - y0) * (px - x0);
    // Between chord and arc: inside the circle and on the arc's side of the chord.
    if (Math.hypot(x - arc.cx, y - arc.cy) < arc.r && side(x, y) * side(mx, my) > 0) inside = !inside;
  }
  return inside;
}

/** True when (x, y) lies in the region (outer rings minus holes). */
export function regionContains(region: Region, x: number, y: number): boolean {
  return region.some((p) => ringParity(p.outer, x, y) && !p.holes.some((h) => ringParity(h, x, y)));
}

export interface PieceGradient extends StressExtremes {
  readonly piece: number;
}

export function stressGradients(plane: StrainPlane, pieces: readonly StressPiece[]): PieceGradient[] {
  return pieces.map((p, piece) => ({ piece, ...stressExtremes(plane, p.E, p.region) }));
}

export interface StressGrid {
  readonly nx: number;
  readonly ny: number;
  readonly minX: number;
  readonly minY: number;
  readonly cellWidth: number;
  readonly cellHeight: number;
  /** Row-major from the bottom row up: value of cell (i, j) at [j·nx + i]; NaN outside. */
  readonly values: Float64Array;
  /** Piece index per cell, −1 outside. */
  readonly piece: Int32Array;
  readonly min: number;
  readonly max: number;
}

export function stressGrid(plane: StrainPlane, pieces: readonly StressPiece[], nx: number, ny: number): StressGrid {
  invariant(Number.isInteger(nx) && Number.isInteger(ny) && nx > 0 && ny > 0 && nx * ny <= 4_000_000, 'stressGrid: nx, ny must be positive integers with nx·ny ≤ 4e6');
  const bounds = regionBounds(pieces.flatMap((p) => p.region));
  invariant(bounds !== null, 'stressGrid: no pieces');
  const cellWidth = (bounds.maxX - bounds.minX) / nx, cellHeight = (bounds.maxY - bounds.minY) / ny;
  const values = new Float64Array(nx * ny).fill(NaN);
  const piece = new Int32Array(nx * ny).fill(-1);
  let min = Infinity, max = -Infinity;
  for (let j = 0; j < ny; j++) {
    const y = bounds.minY + (j + 0.5) * cellHeight;
    for (let i = 0; i < nx; i++) {
      const x = bounds.minX + (i + 0.5) * cellWidth;
      const k = pieces.findIndex((p) => regionContains(p.region, x, y));
      if (k < 0) continue;
      const value = stressAt(plane, (pieces[k] as StressPiece).E, x, y);
      values[j * nx + i] = value;
      piece[j * nx + i] = k;
      if (value < min) min = value;
      if (value > max) max = value;
    }
  }
  return { nx, ny, minX: bounds.minX, minY: bounds.minY, cellWidth, cellHeight, values, piece, min, max };
}
