/** Label requests for the placer (labels.ts), sized by measuring their text the way Konva draws it. */
import type { LabelRequest } from './labels.ts';

export type StyledLabel = LabelRequest & { readonly fontSize: number; readonly colour: string; readonly style: string };

let measureContext: CanvasRenderingContext2D | null = null;

/** A label of `text` at `fontSize` (Konva's default Arial), with 2 px of padding round it. */
export function label(id: string, text: string, anchor: readonly [number, number], offsets: readonly (readonly [number, number])[], priority: number, fontSize = 11, colour = '', style = ''): StyledLabel {
  measureContext ??= document.createElement('canvas').getContext('2d');
  let w = text.length * fontSize * 0.6;
  if (measureContext) {
    measureContext.font = `${style} ${fontSize}px Arial`;
    w = measureContext.measureText(text).width;
  }
  return { id, text, anchor, offsets, width: Math.ceil(w) + 4, height: fontSize + 4, priority, fontSize, colour, style };
}
