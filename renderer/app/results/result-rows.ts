/**
 * What the results panel shows: each SectionProperties key (the same keys as
 * `sectionsmith props --json`) with its trade symbol, a plain description and its dimension.
 */
import type { SectionProperties } from '../../../core/properties/types.ts';
import type { Quantity } from '../../../core/units/index.ts';

export type RowQuantity = Quantity | 'angle' | 'ratio';

export interface ResultRow {
  readonly key: keyof SectionProperties;
  readonly symbol: string;
  readonly label: string;
  readonly quantity: RowQuantity;
}

export interface ResultGroup {
  readonly title: string;
  readonly rows: readonly ResultRow[];
}

export const RESULT_GROUPS: readonly ResultGroup[] = [
  {
    title: 'Area and centroid',
    rows: [
      { key: 'area', symbol: 'A', label: 'area', quantity: 'area' },
      { key: 'cx', symbol: 'x̄', label: 'centroid x', quantity: 'length' },
      { key: 'cy', symbol: 'ȳ', label: 'centroid y', quantity: 'length' },
    ],
  },
  {
    title: 'Second moments about the centroid',
    rows: [
      { key: 'Ix', symbol: 'Ix', label: 'about the x axis', quantity: 'inertia' },
      { key: 'Iy', symbol: 'Iy', label: 'about the y axis', quantity: 'inertia' },
      { key: 'Ixy', symbol: 'Ixy', label: 'product, +∫XY dA', quantity: 'inertia' },
      { key: 'Ip', symbol: 'Ip', label: 'polar, Ix + Iy (not J)', quantity: 'inertia' },
    ],
  },
  {
    title: 'Principal axes',
    rows: [
      { key: 'I1', symbol: 'I1', label: 'major', quantity: 'inertia' },
      { key: 'I2', symbol: 'I2', label: 'minor', quantity: 'inertia' },
      { key: 'thetaDeg', symbol: 'θ', label: 'axis 1 from +x, CCW', quantity: 'angle' },
    ],
  },
  {
    title: 'Radii of gyration',
    rows: [
      { key: 'rx', symbol: 'rx', label: '√(Ix/A)', quantity: 'length' },
      { key: 'ry', symbol: 'ry', label: '√(Iy/A)', quantity: 'length' },
      { key: 'r1', symbol: 'r1', label: 'major', quantity: 'length' },
      { key: 'r2', symbol: 'r2', label: 'minor', quantity: 'length' },
    ],
  },
  {
    title: 'Elastic section moduli',
    rows: [
      { key: 'SxTop', symbol: 'Sx top', label: 'Ix / (ymax − ȳ)', quantity: 'modulus' },
      { key: 'SxBottom', symbol: 'Sx bot', label: 'Ix / (ȳ − ymin)', quantity: 'modulus' },
      { key: 'SyLeft', symbol: 'Sy left', label: 'Iy / (x̄ − xmin)', quantity: 'modulus' },
      { key: 'SyRight', symbol: 'Sy right', label: 'Iy / (xmax − x̄)', quantity: 'modulus' },
      { key: 'S1Plus', symbol: 'S1 +', label: 'about axis 1, + side', quantity: 'modulus' },
      { key: 'S1Minus', symbol: 'S1 −', label: 'about axis 1, − side', quantity: 'modulus' },
      { key: 'S2Plus', symbol: 'S2 +', label: 'about axis 2, + side', quantity: 'modulus' },
      { key: 'S2Minus', symbol: 'S2 −', label: 'about axis 2, − side', quantity: 'modulus' },
    ],
  },
  {
    title: 'Plastic',
    rows: [
      { key: 'Zx', symbol: 'Zx', label: 'plastic modulus, x', quantity: 'modulus' },
      { key: 'Zy', symbol: 'Zy', label: 'plastic modulus, y', quantity: 'modulus' },
      { key: 'Z1', symbol: 'Z1', label: 'about axis 1', quantity: 'modulus' },
      { key: 'Z2', symbol: 'Z2', label: 'about axis 2', quantity: 'modulus' },
      { key: 'pnaY', symbol: 'y PNA', label: 'plastic neutral axis (x bending)', quantity: 'length' },
      { key: 'pnaX', symbol: 'x PNA', label: 'plastic neutral axis (y bending)', quantity: 'length' },
      { key: 'shapeFactorX', symbol: 'Zx/Sx', label: 'shape factor, x', quantity: 'ratio' },
      { key: 'shapeFactorY', symbol: 'Zy/Sy', label: 'shape factor, y', quantity: 'ratio' },
    ],
  },
  {
    title: 'Extents',
    rows: [
      { key: 'xMin', symbol: 'xmin', label: 'leftmost', quantity: 'length' },
      { key: 'xMax', symbol: 'xmax', label: 'rightmost', quantity: 'length' },
      { key: 'yMin', symbol: 'ymin', label: 'lowest', quantity: 'length' },
      { key: 'yMax', symbol: 'ymax', label: 'highest', quantity: 'length' },
    ],
  },
];
