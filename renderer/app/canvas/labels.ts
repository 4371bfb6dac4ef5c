/**
 * Placing canvas labels so that none covers another or a reserved box (the stress legend, the
 * markers): a simple greedy rule. Labels are taken in priority order; each tries its preferred
 * offsets from its anchor first, then positions on rings around the anchor, and takes the first
 * box that stays on the canvas and overlaps nothing placed so far. A label with no free place
 * within the search is left out (and counted), never drawn on top of another. Screen pixels.
 */
export interface LabelBox {
  readonly x: number;
  readonly y: number;
  readonly width: number;
  readonly height: number;
}

export interface LabelRequest {
  readonly id: string;
  readonly text: string;
  /** The point the label belongs to. */
  readonly anchor: readonly [number, number];
  /** Preferred top-left offsets from the anchor, best first. */
  readonly offsets: readonly (readonly [number, number])[];
  readonly width: number;
  readonly height: number;
  /** Lower goes first (placed where it prefers). */
  readonly priority: number;
}

export interface PlacedLabel extends LabelBox {
  readonly id: string;
  readonly text: string;
}

export const overlaps = (a: LabelBox, b: LabelBox): boolean => a.x < b.x + b.width && b.x < a.x + a.width && a.y < b.y + b.height && b.y < a.y + a.height;

/** Offsets on rings around the anchor (8 directions, growing radius), after the preferred ones. */
function fallbackOffsets(w: number, h: number): [number, number][] {
  const out: [number, number][] = [];
  for (let r = 8; r <= 120; r += 12) {
    out.push([r, -h / 2], [-w - r, -h / 2], [-w / 2, r], [-w / 2, -h - r], [r, r], [-w - r, r], [r, -h - r], [-w - r, -h - r]);
  }
  return out;
}

export function placeLabels(requests: readonly LabelRequest[], reserved: readonly LabelBox[], width: number, height: number): { placed: PlacedLabel[]; leftOut: string[] } {
  const taken: LabelBox[] = [...reserved];
  const placed: PlacedLabel[] = [];
  const leftOut: string[] = [];
  const sorted = [...requests].sort((a, b) => a.priority - b.priority);
  for (const r of sorted) {
    let chosen: LabelBox | null = null;
    for (const [dx, dy] of [...r.offsets, ...fallbackOffsets(r.width, r.height)]) {
      const x = Math.max(2, Math.min(width - r.width - 2, r.anchor[0] + dx));
      const y = Math.max(2, Math.min(height - r.height - 2, r.anchor[1] + dy));
      const box = { x, y, width: r.width, height: r.height };
      if (!taken.some((t) => overlaps(t, box))) {
        chosen = box;
        break;
      }
    }
    if (chosen) {
      taken.push(chosen);
      placed.push({ id: r.id, text: r.text, ...chosen });
    } else leftOut.push(r.id);
  }
  return { placed, leftOut };
}

/**
 * A scale bar for the bottom-right corner: the round length (1, 2 or 5 × 10^k document units)
 * whose drawn length is nearest 120 px, so the drawing's scale reads as a length, not a ratio.
 */
export function scaleBar(pixelsPerUnit: number, width: number, height: number): { pixels: number; text: string; box: LabelBox } {
  const target = 120 / pixelsPerUnit;
  const k = Math.floor(Math.log10(target));
  let best = 10 ** k;
  for (const m of [1, 2, 5, 10]) if (Math.abs(m * 10 ** k - target) < Math.abs(best - target)) best = m * 10 ** k;
  const pixels = Math.round(best * pixelsPerUnit);
  const text = String(Number(best.toPrecision(3)));
  const boxWidth = Math.max(pixels + 12, 70);
  return { pixels, text, box: { x: width - boxWidth - 10, y: height - 36, width: boxWidth, height: 28 } };
}
