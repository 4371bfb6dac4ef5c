/**
 * Arc flattening for the mesher (docs/methods.md §2.4 bulge convention, §2.6 flattening).
 *
 * A ring segment with bulge b = tan(sweep/4) is replaced by n equal-angle chords with
 * n = ceil(|sweep| / maxSweep). The chord polygon is inscribed in the arc: its area and J are
 * smaller than the arc region's (docs/methods.md §7.8: ΔJ/J ≈ −Δφ²/3 for a full circle). Exact arcs are
 * kept for every integral property elsewhere; only the mesh uses chords.
 * Private to core/mesh: it returns plain coordinate lists, not geometry Rings.
 */
import type { Ring } from '../geometry/types.ts';
import { outside } from '../invariant.ts';

export interface FlatRing {
  /** Vertex coordinates, closing vertex not repeated. */
  readonly xy: number[];
  /** Largest sweep per chord used in this ring, radians (0 without arcs). */
  readonly maxChordSweep: number;
  /** Per vertex: 1 when it lies on an arc (an arc's end or a chord point), else 0. */
  readonly onArc: number[];
}

/** Chord points strictly between P_s and P_e of the bulge arc, appended to `out`. */
function appendArcInterior(
  out: number[],
  xs: number,
  ys: number,
  xe: number,
  ye: number,
  bulge: number,
  maxSweep: number,
): number {
  const sweep = 4 * Math.atan(bulge);
  const dx = xe - xs;
  const dy = ye - ys;
  const k = (1 - bulge * bulge) / (4 * bulge);
  // Centre = chord midpoint + k · left normal (docs/methods.md §2.4).
  const cx = (xs + xe) / 2 - k * dy;
  const cy = (ys + ye) / 2 + k * dx;
  const r = Math.hypot(xs - cx, ys - cy);
  const t0 = Math.atan2(ys - cy, xs - cx);
  const n = Math.max(1, Math.ceil(Math.abs(sweep) / maxSweep - 1e-9));
  for (let i = 1; i < n; i++) {
    const t = t0 + (sweep * i) / n;
    out.push(cx + r * Math.cos(t), cy + r * Math.sin(t));
  }
  return Math.abs(sweep) / n;
}

/** The ring as a closed polyline; arcs become chords of sweep ≤ maxSweep (radians). */
export function flattenRingChords(ring: Ring, maxSweep: number): FlatRing {
  const src = ring.xy;
  const count = src.length / 2;
  const out: number[] = [];
  const onArc: number[] = [];
  let maxChordSweep = 0;
  for (let i = 0; i < count; i++) {
    const xs = src[2 * i] ?? outside(src, 2 * i);
    const ys = src[2 * i + 1] ?? outside(src, 2 * i + 1);
    const b = (ring.bulge ? (ring.bulge[i] ?? outside(ring.bulge, i)) : 0);
    const before = (ring.bulge ? (ring.bulge[(i + count - 1) % count] ?? outside(ring.bulge, (i + count - 1) % count)) : 0);
    out.push(xs, ys);
    onArc.push(b !== 0 || before !== 0 ? 1 : 0);
    if (b !== 0) {
      const j = (i + 1) % count;
      const used = appendArcInterior(out, xs, ys, (src[2 * j] ?? outside(src, 2 * j)), (src[2 * j + 1] ?? outside(src, 2 * j + 1)), b, maxSweep);
      maxChordSweep = Math.max(maxChordSweep, used);
      while (onArc.length < out.length / 2) onArc.push(1);
    }
  }
  return { xy: out, maxChordSweep, onArc };
}

/** Signed area of a closed polyline (shoelace); > 0 when counter-clockwise. */
export function polylineSignedArea(xy: readonly number[]): number {
  const n = xy.length / 2;
  let twice = 0;
  for (let i = 0; i < n; i++) {
    const j = (i + 1) % n;
    twice += (xy[2 * i] ?? outside(xy, 2 * i)) * (xy[2 * j + 1] ?? outside(xy, 2 * j + 1)) - (xy[2 * j] ?? outside(xy, 2 * j)) * (xy[2 * i + 1] ?? outside(xy, 2 * i + 1));
  }
  return twice / 2;
}
