/**
 * How the drawing tells materials apart: each material of the document its own fill from the
 * project's palette, in the order the materials are listed; past the palette's length the fills
 * repeat with a hatch (diagonal, then crossed, then horizontal), so no two materials share both
 * fill and hatch. Parts with no material take the document default's style. Drawing only.
 */
export type Hatch = 'none' | 'diagonal' | 'cross' | 'horizontal';

export interface MaterialStyle {
  readonly fill: string;
  readonly hatch: Hatch;
}

/** Our own muted fills, distinct in hue and lightness on the warm paper. */
export const MATERIAL_FILLS: readonly string[] = ['#8fa3b8', '#c9a46b', '#9bb48a', '#b78d9e', '#7fa9a6', '#c4b79a'];
const HATCHES: readonly Hatch[] = ['none', 'diagonal', 'cross', 'horizontal'];

/** A style per material id (in list order); ids beyond fills × hatches reuse the last combination's cycle. */
export function materialStyles(ids: readonly string[]): Map<string, MaterialStyle> {
  const out = new Map<string, MaterialStyle>();
  ids.forEach((id, i) => {
    const fill = MATERIAL_FILLS[i % MATERIAL_FILLS.length] as string;
    const hatch = HATCHES[Math.floor(i / MATERIAL_FILLS.length) % HATCHES.length] as Hatch;
    out.set(id, { fill, hatch });
  });
  return out;
}
