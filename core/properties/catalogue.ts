/**
 * The property catalogue: every reported property of a section, once — its key (the field of
 * SectionProperties or TorsionResult, and the JSON key everywhere), trade symbol, quantity kind,
 * meaning, the group it is listed under, and which views show it. The results panel, the CSV and
 * SVG exports, the report and the command line all read this list; adding a property to what is
 * shown is one line here (after computing it in core).
 *
 * Kinds are those of core/units: length powers (length, area, modulus, inertia, warping) convert
 * with the document unit; angles are degrees; ratios have no unit.
 * Residue: `shownValue` reads rounding residue as 0 through core/units' zeroWithinRounding, with
 * each kind's natural scale taken from the section itself (see residueScale).
 */
import { zeroWithinRounding, type Quantity } from '../units/index.ts';
import type { NetSectionProperties } from './net.ts';
import type { SectionProperties } from './types.ts';

export type CatalogueKind = Quantity | 'angle' | 'ratio';

/** Where a property is shown: editor results panel, CSV export, the drawings' small table (SVG and DXF exports), printed report, CLI table and JSON. */
export type PropertyView = 'panel' | 'csv' | 'drawing' | 'report' | 'cli';

export type NumericKey = { [K in keyof SectionProperties]: SectionProperties[K] extends number ? K : never }[keyof SectionProperties];
export type TorsionKey = 'J' | 'Cw' | 'xs' | 'ys';
export type NetKey = keyof NetSectionProperties;

export interface CatalogueEntry<K extends string = NumericKey> {
  readonly key: K;
  readonly symbol: string;
  readonly kind: CatalogueKind;
  readonly meaning: string;
  readonly group: string;
  readonly views: readonly PropertyView[];
}

const ALL: readonly PropertyView[] = ['panel', 'csv', 'drawing', 'report', 'cli'];
const NO_SVG: readonly PropertyView[] = ['panel', 'csv', 'report', 'cli'];

const G = {
  area: 'Area and centroid', second: 'Second moments about the centroid', principal: 'Principal axes', radii: 'Radii of gyration',
  elastic: 'Elastic section moduli', plastic: 'Plastic', extents: 'Extents', torsion: 'Torsion (finite elements)',
} as const;

const e = (key: NumericKey, symbol: string, kind: CatalogueKind, meaning: string, group: string, views = NO_SVG): CatalogueEntry => ({ key, symbol, kind, meaning, group, views });

/** Section properties, in the order every view lists them. */
export const PROPERTY_CATALOGUE: readonly CatalogueEntry[] = [
  e('area', 'A', 'area', 'area', G.area, ALL),
  e('cx', 'x̄', 'length', 'centroid x', G.area, ALL),
  e('cy', 'ȳ', 'length', 'centroid y', G.area, ALL),
  e('Ix', 'Ix', 'inertia', 'second moment about the centroidal x axis', G.second, ALL),
  e('Iy', 'Iy', 'inertia', 'second moment about the centroidal y axis', G.second, ALL),
  e('Ixy', 'Ixy', 'inertia', 'product of inertia, +∫XY dA', G.second, ALL),
  e('Ip', 'Ip', 'inertia', 'polar moment Ix + Iy (not J)', G.second),
  e('I1', 'I1', 'inertia', 'major principal moment', G.principal, ALL),
  e('I2', 'I2', 'inertia', 'minor principal moment', G.principal, ALL),
  e('thetaDeg', 'θ', 'angle', 'angle of axis 1, CCW from +x', G.principal, ALL),
  e('rx', 'rx', 'length', 'radius of gyration about x, √(Ix/A)', G.radii, ALL),
  e('ry', 'ry', 'length', 'radius of gyration about y, √(Iy/A)', G.radii, ALL),
  e('r1', 'r1', 'length', 'radius of gyration, axis 1', G.radii),
  e('r2', 'r2', 'length', 'radius of gyration, axis 2', G.radii),
  e('SxTop', 'Sx top', 'modulus', 'elastic modulus, x axis, top fibre: Ix / (ymax − ȳ)', G.elastic, ALL),
  e('SxBottom', 'Sx bot', 'modulus', 'elastic modulus, x axis, bottom fibre: Ix / (ȳ − ymin)', G.elastic, ALL),
  e('SyLeft', 'Sy left', 'modulus', 'elastic modulus, y axis, left fibre: Iy / (x̄ − xmin)', G.elastic, ALL),
  e('SyRight', 'Sy right', 'modulus', 'elastic modulus, y axis, right fibre: Iy / (xmax − x̄)', G.elastic, ALL),
  e('S1Plus', 'S1 +', 'modulus', 'elastic modulus, axis 1, + side', G.elastic),
  e('S1Minus', 'S1 −', 'modulus', 'elastic modulus, axis 1, − side', G.elastic),
  e('S2Plus', 'S2 +', 'modulus', 'elastic modulus, axis 2, + side', G.elastic),
  e('S2Minus', 'S2 −', 'modulus', 'elastic modulus, axis 2, − side', G.elastic),
  e('Zx', 'Zx', 'modulus', 'plastic modulus about x', G.plastic, ALL),
  e('Zy', 'Zy', 'modulus', 'plastic modulus about y', G.plastic, ALL),
  e('Z1', 'Z1', 'modulus', 'plastic modulus, axis 1', G.plastic),
  e('Z2', 'Z2', 'modulus', 'plastic modulus, axis 2', G.plastic),
  e('pnaY', 'y PNA', 'length', 'plastic neutral axis y (bending about x)', G.plastic),
  e('pnaX', 'x PNA', 'length', 'plastic neutral axis x (bending about y)', G.plastic),
  e('shapeFactorX', 'Zx/Sx', 'ratio', 'shape factor Zx / Sx,min', G.plastic),
  e('shapeFactorY', 'Zy/Sy', 'ratio', 'shape factor Zy / Sy,min', G.plastic),
  e('xMin', 'xmin', 'length', 'extent x min (leftmost)', G.extents),
  e('xMax', 'xmax', 'length', 'extent x max (rightmost)', G.extents),
  e('yMin', 'ymin', 'length', 'extent y min (lowest)', G.extents),
  e('yMax', 'ymax', 'length', 'extent y max (highest)', G.extents),
];

/** The finite-element torsion results (core/torsion), shown when they were computed. */
export const TORSION_CATALOGUE: readonly CatalogueEntry<TorsionKey>[] = [
  { key: 'J', symbol: 'J', kind: 'inertia', meaning: 'torsion constant (Saint-Venant, finite elements)', group: G.torsion, views: NO_SVG },
  { key: 'Cw', symbol: 'Cw', kind: 'warping', meaning: 'warping constant about the shear centre', group: G.torsion, views: NO_SVG },
  { key: 'xs', symbol: 'xs', kind: 'length', meaning: 'shear centre x (Trefftz)', group: G.torsion, views: NO_SVG },
  { key: 'ys', symbol: 'ys', kind: 'length', meaning: 'shear centre y (Trefftz)', group: G.torsion, views: NO_SVG },
];

/**
 * The net section (the gross section less its fastener holes, core/properties/net.ts), shown
 * beside the gross values where fastener holes exist (JSON: under "net", by these keys).
 */
const NET_VIEWS: readonly PropertyView[] = ['panel', 'cli'];
const net = (key: NetKey, symbol: string, kind: CatalogueKind, meaning: string): CatalogueEntry<NetKey> => ({ key, symbol, kind, meaning, group: 'Net section', views: NET_VIEWS });
export const NET_CATALOGUE: readonly CatalogueEntry<NetKey>[] = [
  net('area', 'An', 'area', 'net area (fastener holes deducted)'),
  net('cx', 'x̄ net', 'length', 'net centroid x (net neutral axis, y bending)'),
  net('cy', 'ȳ net', 'length', 'net centroid y (net neutral axis, x bending)'),
  net('Ix', 'Ix,net', 'inertia', 'net second moment about the net x axis'),
  net('Iy', 'Iy,net', 'inertia', 'net second moment about the net y axis'),
  net('Ixy', 'Ixy,net', 'inertia', 'net product of inertia'),
  net('SxTop', 'Sx,net top', 'modulus', 'net elastic modulus, x axis, top fibre: Ix,net / (ymax − ȳ net)'),
  net('SxBottom', 'Sx,net bot', 'modulus', 'net elastic modulus, x axis, bottom fibre: Ix,net / (ȳ net − ymin)'),
  net('SyLeft', 'Sy,net left', 'modulus', 'net elastic modulus, y axis, left fibre'),
  net('SyRight', 'Sy,net right', 'modulus', 'net elastic modulus, y axis, right fibre'),
];

/** The entries a view shows, in catalogue order. */
export function catalogueFor<K extends string>(view: PropertyView, list: readonly CatalogueEntry<K>[]): readonly CatalogueEntry<K>[] {
  return list.filter((x) => x.views.includes(view));
}

/** The groups of a list in order, each with its entries (the results panel and report tables). */
export function catalogueGroups<K extends string>(list: readonly CatalogueEntry<K>[]): { title: string; entries: CatalogueEntry<K>[] }[] {
  const groups: { title: string; entries: CatalogueEntry<K>[] }[] = [];
  for (const x of list) {
    const g = groups.find((y) => y.title === x.group);
    if (g) g.entries.push(x);
    else groups.push({ title: x.group, entries: [x] });
  }
  return groups;
}

/**
 * The natural scale of a kind for this section: its size (larger overall dimension) for
 * positions and lengths, A for areas, size³ for moduli, Ip for second moments, size⁶ for
 * warping, 90° for angles, 1 for ratios.
 */
export function residueScale(kind: CatalogueKind, p: SectionProperties): number {
  const size = Math.max(p.xMax - p.xMin, p.yMax - p.yMin);
  switch (kind) {
    case 'length': return size;
    case 'area': return p.area;
    case 'modulus': return size ** 3;
    case 'inertia': return p.Ip;
    case 'warping': return size ** 6;
    case 'angle': return 90;
    case 'ratio': return 1;
  }
}

/** A value as shown and exported: rounding residue (below 1e-9 of the kind's scale) is 0. */
export function shownValue(kind: CatalogueKind, value: number, p: SectionProperties): number {
  return zeroWithinRounding(value, residueScale(kind, p));
}
