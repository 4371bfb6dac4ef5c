/**
 * The properties an export lists, in order, with the length power of each (area 2, moduli 3,
 * second moments 4, warping 6; null for angles and pure numbers). Keys are those of
 * SectionProperties, which are also the keys of `sectionsmith props --json`.
 */
import type { SectionProperties } from '../properties/types.ts';
import type { Quantity } from '../units/index.ts';

export type NumericKey = { [K in keyof SectionProperties]: SectionProperties[K] extends number ? K : never }[keyof SectionProperties];

export interface PropertyRow {
  readonly key: NumericKey;
  /** Symbol for tables in the drawing. */
  readonly symbol: string;
  readonly quantity: Quantity | null;
  /** Unit when quantity is null ('deg' for the angle, '-' for ratios). */
  readonly plainUnit?: string;
}

export const PROPERTY_ROWS: readonly PropertyRow[] = [
  { key: 'area', symbol: 'A', quantity: 'area' },
  { key: 'cx', symbol: 'x̄', quantity: 'length' },
  { key: 'cy', symbol: 'ȳ', quantity: 'length' },
  { key: 'Ix', symbol: 'Ix', quantity: 'inertia' },
  { key: 'Iy', symbol: 'Iy', quantity: 'inertia' },
  { key: 'Ixy', symbol: 'Ixy', quantity: 'inertia' },
  { key: 'Ip', symbol: 'Ip', quantity: 'inertia' },
  { key: 'I1', symbol: 'I1', quantity: 'inertia' },
  { key: 'I2', symbol: 'I2', quantity: 'inertia' },
  { key: 'thetaDeg', symbol: 'θ', quantity: null, plainUnit: 'deg' },
  { key: 'rx', symbol: 'rx', quantity: 'length' },
  { key: 'ry', symbol: 'ry', quantity: 'length' },
  { key: 'r1', symbol: 'r1', quantity: 'length' },
  { key: 'r2', symbol: 'r2', quantity: 'length' },
  { key: 'SxTop', symbol: 'Sx,top', quantity: 'modulus' },
  { key: 'SxBottom', symbol: 'Sx,bot', quantity: 'modulus' },
  { key: 'SyLeft', symbol: 'Sy,left', quantity: 'modulus' },
  { key: 'SyRight', symbol: 'Sy,right', quantity: 'modulus' },
  { key: 'S1Plus', symbol: 'S1,+', quantity: 'modulus' },
  { key: 'S1Minus', symbol: 'S1,−', quantity: 'modulus' },
  { key: 'S2Plus', symbol: 'S2,+', quantity: 'modulus' },
  { key: 'S2Minus', symbol: 'S2,−', quantity: 'modulus' },
  { key: 'Zx', symbol: 'Zx', quantity: 'modulus' },
  { key: 'Zy', symbol: 'Zy', quantity: 'modulus' },
  { key: 'Z1', symbol: 'Z1', quantity: 'modulus' },
  { key: 'Z2', symbol: 'Z2', quantity: 'modulus' },
  { key: 'pnaY', symbol: 'PNA y', quantity: 'length' },
  { key: 'pnaX', symbol: 'PNA x', quantity: 'length' },
  { key: 'shapeFactorX', symbol: 'Zx/Sx', quantity: null, plainUnit: '-' },
  { key: 'shapeFactorY', symbol: 'Zy/Sy', quantity: null, plainUnit: '-' },
  { key: 'xMin', symbol: 'x min', quantity: 'length' },
  { key: 'xMax', symbol: 'x max', quantity: 'length' },
  { key: 'yMin', symbol: 'y min', quantity: 'length' },
  { key: 'yMax', symbol: 'y max', quantity: 'length' },
];

/** The rows shown in the drawing's small table (the CSV has every row). */
export const DRAWING_TABLE_KEYS: readonly NumericKey[] = ['area', 'cx', 'cy', 'Ix', 'Iy', 'Ixy', 'I1', 'I2', 'thetaDeg', 'SxTop', 'SxBottom', 'SyLeft', 'SyRight', 'Zx', 'Zy', 'rx', 'ry'];

/**
 * For display only (the drawing's 4-figure table, never the CSV): round-off residue such as a
 * centroid at 1e-14 mm on a symmetric section is shown as 0. A value counts as residue when it is
 * below 1e-9 of the section's own size in its dimension (size = the larger overall dimension;
 * area A; second moments Ip; angles 90°) — the same rule as the editor's results panel.
 */
export function displayedValue(row: PropertyRow, p: SectionProperties): number {
  const size = Math.max(p.xMax - p.xMin, p.yMax - p.yMin);
  const scale = row.quantity === null ? (row.plainUnit === 'deg' ? 90 : 1)
    : row.quantity === 'area' ? p.area
    : row.quantity === 'inertia' ? p.Ip
    : size ** ({ length: 1, modulus: 3, warping: 6 } as const)[row.quantity];
  const value = p[row.key];
  return Math.abs(value) < 1e-9 * scale ? 0 : value;
}
