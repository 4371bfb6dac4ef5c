/**
 * The canvas view: section coordinates (y up, document unit) ↔ screen pixels (y down).
 * This is the one place the y axis flips (docs/methods.md §0): screen = (ox + x·s, oy − y·s).
 */
import type { Box, Vec } from '../editor/geometry.ts';

export interface View {
  /** Pixels per document unit. */
  readonly scale: number;
  /** Screen position of the section origin. */
  readonly ox: number;
  readonly oy: number;
}

export const toScreen = (v: View, p: Vec): Vec => [v.ox + p[0] * v.scale, v.oy - p[1] * v.scale];
export const toSection = (v: View, s: Vec): Vec => [(s[0] - v.ox) / v.scale, (v.oy - s[1]) / v.scale];

/** Zoom by `factor` keeping the section point under screen point `at` fixed. */
export function zoomAt(v: View, factor: number, at: Vec): View {
  const scale = Math.min(1e7, Math.max(1e-7, v.scale * factor));
  const f = scale / v.scale;
  return { scale, ox: at[0] - (at[0] - v.ox) * f, oy: at[1] - (at[1] - v.oy) * f };
}

/** The view that shows `box` centred with a margin, in a width × height canvas. */
export function fitView(box: Box | null, width: number, height: number, margin = 60): View {
  if (!box || width <= 0 || height <= 0) return { scale: 2, ox: width / 2, oy: height / 2 };
  const w = Math.max(box.xMax - box.xMin, 1e-9);
  const h = Math.max(box.yMax - box.yMin, 1e-9);
  const scale = Math.min((width - 2 * margin) / w, (height - 2 * margin) / h);
  const cx = (box.xMin + box.xMax) / 2;
  const cy = (box.yMin + box.yMax) / 2;
  return { scale, ox: width / 2 - cx * scale, oy: height / 2 + cy * scale };
}

/** At most this many grid lines or ruler ticks along one direction. */
export const MAX_GRID_LINES = 4000;

/**
 * The multiples k of `step` with a ≤ k·step ≤ b, at most MAX_GRID_LINES of them. Counted, never
 * stepped: beyond 2^53 (a part at 1e20 in a fitted view) k + 1 === k, and a loop that steps k
 * froze the editor.
 */
export function gridIndices(a: number, b: number, step: number): number[] {
  const first = Math.ceil(a / step);
  const count = Math.floor(b / step) - first + 1;
  if (!(count > 0) || !Number.isFinite(first)) return [];
  const n = Math.min(count, MAX_GRID_LINES);
  const out: number[] = [];
  for (let i = 0; i < n; i++) out.push(first + i);
  return out;
}

/** Grid spacing of 1, 2 or 5 × 10^k document units, at least `minPixels` apart on screen. */
export function gridStep(scale: number, minPixels = 14): number {
  const raw = minPixels / scale;
  const k = Math.floor(Math.log10(raw));
  for (const m of [1, 2, 5, 10]) {
    const step = m * 10 ** k;
    if (step >= raw) return Number(step.toPrecision(12));
  }
  return 10 ** (k + 1);
}
