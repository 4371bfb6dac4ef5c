/** Small documents of our own for the export tests (dimensions in inches). */
import type { Part, SectionDocument } from '../../core/document/types.ts';

const at = (x: number, y: number) => ({ x, y, rotationDeg: 0, mirror: false });

export function rectangle(id: string, name: string, width: number, height: number, x = 0, y = 0, operation: 'add' | 'subtract' = 'add'): Part {
  return { id, name, type: 'rectangle', width, height, placement: at(x, y), operation, material: null, visible: true };
}

export function circle(id: string, name: string, diameter: number, x = 0, y = 0, operation: 'add' | 'subtract' = 'add'): Part {
  return { id, name, type: 'circle', diameter, placement: at(x, y), operation, material: null, visible: true };
}

export function document(name: string, parts: readonly Part[]): SectionDocument {
  return { format: 'sectionsmith-section', version: 1, name, unit: 'in', parts, materials: [], defaultMaterial: null };
}
