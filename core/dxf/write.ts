/**
 * DXF export: a section (and, on request, each part for cutting) as an ASCII DXF (AutoCAD 2018
 * syntax) through `@tarikjabiri/dxf` (MIT, no dependencies; the only module that imports it).
 *
 * Layers (each only when asked for, except the outline):
 *   SECTION           the section's outline and holes: closed LWPOLYLINEs, arcs as bulges (exact);
 *   PART-<name>       each visible added part laid flat in its own coordinates, with the holes
 *                     that later cut-outs make in it, placed side by side below the section so a
 *                     fabricator can nest them; its name as TEXT on the same layer;
 *   CENTROID          a POINT at the centroid and a TEXT label;
 *   PRINCIPAL-AXES    the two principal axes as XLINEs (construction lines) through the centroid;
 *   PROPERTIES        a small table of properties in display units, and the caution, as TEXT.
 * None of the annotation layers holds a LINE, ARC or polyline, so re-importing the whole file
 * reads only the section (and the parts, when written: choose the SECTION layer to get the section).
 * Units: $INSUNITS is set from the document's unit; coordinates are written as they are (no
 *   conversion), each number in JavaScript's shortest round-trip form, so re-importing gives the
 *   same doubles.
 * Does not write: materials, dimensions, hatching.
 */
import { DxfWriter, Line, LWPolylineFlags, Units, point3d, type LWPolylineVertex } from '@tarikjabiri/dxf';
import type { Polygon, Region, Ring } from '../geometry/types.ts';
import { regionBounds } from '../geometry/index.ts';
import type { SectionProperties } from '../properties/types.ts';
import { catalogueFor, PROPERTY_CATALOGUE, shownValue } from '../properties/catalogue.ts';
import { defaultDisplaySet, formatSig, toDisplay, type DisplaySet, type LengthUnit } from '../units/index.ts';

export interface DxfCutPart {
  readonly name: string;
  /** The part in its own (local) coordinates, with its holes. */
  readonly region: Region;
}

export interface DxfExportInput {
  readonly name: string;
  readonly unit: LengthUnit;
  /** The section in section coordinates. */
  readonly region: Region;
  readonly properties?: SectionProperties | null;
  /** Parts laid flat for cutting; omitted or empty = no part layers. */
  readonly parts?: readonly DxfCutPart[];
  readonly centroid?: boolean;
  readonly axes?: boolean;
  readonly table?: boolean;
  readonly display?: DisplaySet;
  /** The caution written on the drawing with any property (required when a property layer is written). */
  readonly caution: string;
}

const UNITS: Readonly<Record<LengthUnit, Units>> = { in: Units.Inches, ft: Units.Feet, mm: Units.Millimeters, cm: Units.Centimeters, m: Units.Meters };

export const SECTION_LAYER = 'SECTION';

/** A construction line (XLINE: base point 10, unit direction 11), written through the library's LINE. */
class XLine extends Line {
  constructor(x: number, y: number, dx: number, dy: number, layerName: string) {
    super(point3d(x, y, 0), point3d(dx, dy, 0), { layerName });
    this.type = 'XLINE';
    this.subclassMarker = 'AcDbXline';
  }
}

/** Layer names may not hold < > / \ " : ; ? * | = ` (DXF reference, symbol table names). */
export function dxfLayerName(text: string): string {
  const clean = text.replace(/[<>/\\":;?*|=`]/g, '_').replace(/\s+/g, ' ').trim();
  return clean === '' ? 'UNNAMED' : clean.slice(0, 200);
}

function vertices(ring: Ring): LWPolylineVertex[] {
  const out: LWPolylineVertex[] = [];
  for (let k = 0; k < ring.xy.length / 2; k++) {
    const bulge = ring.bulge?.[k] ?? 0;
    out.push({ point: { x: ring.xy[2 * k] ?? 0, y: ring.xy[2 * k + 1] ?? 0 }, ...(bulge !== 0 ? { bulge } : {}) });
  }
  return out;
}

function addRegion(dxf: DxfWriter, region: Region, layerName: string): void {
  for (const polygon of region) {
    for (const ring of [polygon.outer, ...polygon.holes]) dxf.addLWPolyline(vertices(ring), { flags: LWPolylineFlags.Closed, layerName });
  }
}

function translated(region: Region, dx: number, dy: number): Region {
  const move = (ring: Ring): Ring => {
    const xy = Float64Array.from(ring.xy);
    for (let k = 0; k < xy.length; k += 2) {
      xy[k] = (xy[k] ?? 0) + dx;
      xy[k + 1] = (xy[k + 1] ?? 0) + dy;
    }
    return ring.bulge ? { xy, bulge: ring.bulge } : { xy };
  };
  return region.map((p: Polygon) => ({ outer: move(p.outer), holes: p.holes.map(move) }));
}

/** The parts in a row below the section, a gap of a tenth of the section's size apart. */
function addParts(dxf: DxfWriter, parts: readonly DxfCutPart[], below: number, size: number): void {
  const gap = size / 10;
  let x = 0;
  const taken = new Set<string>();
  for (const part of parts) {
    const b = regionBounds(part.region);
    if (b === null) continue;
    // One layer per part, even when two parts share a name.
    let layer = dxfLayerName(`PART-${part.name}`);
    for (let k = 2; taken.has(layer); k++) layer = dxfLayerName(`PART-${part.name} (${k})`);
    taken.add(layer);
    dxf.addLayer(layer, 3, 'CONTINUOUS');
    const dy = below - gap - b.maxY;
    addRegion(dxf, translated(part.region, x - b.minX, dy), layer);
    dxf.addText(point3d(x, dy + b.minY - gap / 2, 0), gap / 4, part.name, { layerName: layer });
    x += b.maxX - b.minX + gap;
  }
}

function addProperties(dxf: DxfWriter, input: DxfExportInput, p: SectionProperties, size: number): void {
  const size0 = size > 0 ? size : 1;
  if (input.centroid === true) {
    dxf.addLayer('CENTROID', 1, 'CONTINUOUS');
    dxf.addPoint(p.cx, p.cy, 0, { layerName: 'CENTROID' });
    dxf.addText(point3d(p.cx + size0 / 50, p.cy + size0 / 50, 0), size0 / 60, `centroid (${formatSig(p.cx, 6)}, ${formatSig(p.cy, 6)}) ${input.unit}`, { layerName: 'CENTROID' });
  }
  if (input.axes === true) {
    dxf.addLayer('PRINCIPAL-AXES', 5, 'CONTINUOUS');
    const t = (p.thetaDeg * Math.PI) / 180;
    for (const a of [t, t + Math.PI / 2]) dxf.modelSpace.addEntity(new XLine(p.cx, p.cy, Math.cos(a), Math.sin(a), 'PRINCIPAL-AXES'));
  }
  if (input.table === true) {
    dxf.addLayer('PROPERTIES', 7, 'CONTINUOUS');
    const display = input.display ?? defaultDisplaySet(input.unit);
    const h = size0 / 50;
    const x = p.xMax + size0 / 5;
    let y = p.yMax;
    const line = (text: string): void => {
      dxf.addText(point3d(x, y, 0), h, text, { layerName: 'PROPERTIES' });
      y -= 1.6 * h;
    };
    line(`${input.name}: section properties (${input.unit})`);
    for (const row of catalogueFor('drawing', PROPERTY_CATALOGUE)) {
      const shown = shownValue(row.kind, p[row.key], p);
      const value = row.kind === 'angle' || row.kind === 'ratio' ? shown : toDisplay(shown, input.unit, display[row.kind]);
      const unitText = row.kind === 'angle' ? 'deg' : row.kind === 'ratio' ? '' : display[row.kind].label;
      line(`${row.symbol} = ${formatSig(value, 4)} ${unitText}`.trim());
    }
    line(`CAUTION: ${input.caution}`);
  }
}

/** The DXF text of a section, with the optional layers asked for. */
export function sectionDxf(input: DxfExportInput): string {
  const dxf = new DxfWriter();
  dxf.setUnits(UNITS[input.unit]);
  dxf.addLayer(SECTION_LAYER, 7, 'CONTINUOUS');
  addRegion(dxf, input.region, SECTION_LAYER);
  const b = regionBounds(input.region);
  const size = b === null ? 0 : Math.max(b.maxX - b.minX, b.maxY - b.minY);
  if (input.parts !== undefined && input.parts.length > 0 && b !== null) addParts(dxf, input.parts, b.minY, size);
  const p = input.properties;
  if (p) addProperties(dxf, input, p, size);
  else if (input.table === true || input.centroid === true || input.axes === true) {
    dxf.addText(point3d(0, 0, 0), size / 50 || 1, `CAUTION: ${input.caution}`, { layerName: SECTION_LAYER });
  }
  return dxf.stringify();
}
