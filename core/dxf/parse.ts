/**
 * The one adapter over `dxf-parser` (MIT): DXF text → plain entity records.
 *
 * Why this parser: typed, MIT, one dependency; in a trial it read LWPOLYLINE and R12 POLYLINE
 * bulges, ARC radii and $INSUNITS bit for bit (issue 14). It splits the file into group codes and
 * values, reads the HEADER, the BLOCKS and POLYLINE/VERTEX/SEQEND sequences. Its own readers of
 * some entities drop what a section needs (CIRCLE and ELLIPSE lose the extrusion direction, SPLINE
 * its weights, LWPOLYLINE stops at a vertex id 91, and an entity type it does not know vanishes
 * without a trace), so every other entity is read here from its raw groups by a small handler
 * registered with the parser. Nothing else in the project imports dxf-parser.
 *
 * Coordinates are the file's own (each entity in its object coordinate system, OCS); nothing is
 * transformed, joined or unit-converted here: core/dxf/curves.ts does that.
 * Accepts ASCII DXF only (R12 to 2018 share the group-code syntax); a binary DXF is refused.
 * Errors: returns `{ ok: false, message }` naming what the parser could not read.
 */
import DxfParser from 'dxf-parser';

/** A group code and its value as the parser typed it (number for numeric codes, else text). */
export type DxfGroup = readonly [code: number, value: number | string | boolean];

export interface DxfPoint3 {
  readonly x: number;
  readonly y: number;
  readonly z: number;
}

/** One entity: its type, handle (as written; null when the file has none), layer and raw groups. */
export interface DxfEntityRecord {
  readonly type: string;
  readonly handle: string | null;
  readonly layer: string;
  readonly paperSpace: boolean;
  /** Every group of the entity after its type (raw entities), in file order. */
  readonly groups: readonly DxfGroup[];
  /** POLYLINE only: its VERTEX records (x, y, bulge, flags) as the parser read them. */
  readonly vertices?: readonly { readonly x: number; readonly y: number; readonly bulge: number; readonly flags: number }[];
  /** POLYLINE only: the header flags (70) and extrusion direction (210/220/230). */
  readonly polylineFlags?: number;
  readonly polylineNormal?: DxfPoint3;
}

export interface DxfBlockRecord {
  readonly name: string;
  readonly base: DxfPoint3;
  readonly entities: readonly DxfEntityRecord[];
}

export interface DxfDrawing {
  /** Header variables by name ($INSUNITS → number, $EXTMIN → point, …). */
  readonly header: Readonly<Record<string, unknown>>;
  readonly entities: readonly DxfEntityRecord[];
  readonly blocks: ReadonlyMap<string, DxfBlockRecord>;
}

export type DxfParseResult = { readonly ok: true; readonly drawing: DxfDrawing } | { readonly ok: false; readonly message: string };

/** Entity types read from raw groups here (POLYLINE is left to the parser: it owns VERTEX/SEQEND). */
const RAW_TYPES = [
  'LINE', 'ARC', 'CIRCLE', 'ELLIPSE', 'SPLINE', 'LWPOLYLINE', 'INSERT',
  // Read only to be counted as ignored, or refused as geometry (core/dxf/curves.ts decides).
  'TEXT', 'MTEXT', 'DIMENSION', 'HATCH', 'LEADER', 'MLEADER', 'MULTILEADER', 'POINT', 'SOLID', 'TRACE', '3DFACE',
  'ATTDEF', 'ATTRIB', 'VIEWPORT', 'XLINE', 'RAY', 'IMAGE', 'WIPEOUT', 'REGION', '3DSOLID', 'BODY', 'SURFACE',
  'MESH', 'TOLERANCE', 'MLINE', 'SHAPE', 'OLE2FRAME', 'OLEFRAME', 'ACAD_TABLE', 'HELIX', 'ARCALIGNEDTEXT',
  'PDFUNDERLAY', 'DWFUNDERLAY', 'DGNUNDERLAY', 'LIGHT', 'SECTION', 'ACAD_PROXY_ENTITY',
] as const;

interface Scanner {
  next(): { code: number; value: number | string | boolean };
  isEOF(): boolean;
}

interface RawParsed {
  type: string;
  handle?: string;
  layer?: string;
  inPaperSpace?: boolean;
  groups: DxfGroup[];
}

/** A parser entity handler (the shape dxf-parser instantiates) that keeps every group. */
function rawHandler(type: string): new () => { ForEntityName: string; parseEntity(scanner: Scanner, curr: { value: unknown }): RawParsed } {
  return class {
    ForEntityName = type;
    parseEntity(scanner: Scanner, _curr: { value: unknown }): RawParsed {
      const entity: RawParsed = { type, groups: [] };
      let g = scanner.next();
      while (!scanner.isEOF() && g.code !== 0) {
        if (g.code === 5) entity.handle = String(g.value);
        else if (g.code === 8) entity.layer = String(g.value);
        else if (g.code === 67) entity.inPaperSpace = g.value !== 0;
        entity.groups.push([g.code, g.value]);
        g = scanner.next();
      }
      return entity;
    }
  };
}

const num = (v: unknown, fallback = 0): number => (typeof v === 'number' && Number.isFinite(v) ? v : fallback);

function point3(v: unknown): DxfPoint3 {
  const p = (v ?? {}) as { x?: unknown; y?: unknown; z?: unknown };
  return { x: num(p.x), y: num(p.y), z: num(p.z) };
}

/** The parser's record of one entity → ours (raw entities keep their groups; POLYLINE its vertices). */
function entityRecord(e: Record<string, unknown>): DxfEntityRecord {
  const type = String(e.type);
  // dxf-parser invents a numeric handle when the file has none; a handle from the file is text.
  const handle = typeof e.handle === 'string' ? e.handle : null;
  const layer = typeof e.layer === 'string' ? e.layer : '0';
  const paperSpace = e.inPaperSpace === true;
  if (Array.isArray(e.groups)) return { type, handle, layer, paperSpace, groups: e.groups as DxfGroup[] };
  if (type === 'POLYLINE') {
    const vertices = (Array.isArray(e.vertices) ? e.vertices : []).map((v: Record<string, unknown>) => ({
      x: num(v.x, Number.NaN), y: num(v.y, Number.NaN), bulge: num(v.bulge),
      flags: (v.curveFittingVertex === true ? 1 : 0) | (v.splineVertex === true ? 8 : 0) | (v.polyfaceMeshVertex === true ? 128 : 0) | (v.splineControlPoint === true ? 16 : 0) | (v.threeDPolylineVertex === true ? 32 : 0),
    }));
    const polylineFlags = (e.shape === true ? 1 : 0) | (e.includesCurveFitVertices === true ? 2 : 0) | (e.includesSplineFitVertices === true ? 4 : 0)
      | (e.is3dPolyline === true ? 8 : 0) | (e.is3dPolygonMesh === true ? 16 : 0) | (e.isPolyfaceMesh === true ? 64 : 0);
    const normal = e.extrusionDirection === undefined ? { x: 0, y: 0, z: 1 } : point3(e.extrusionDirection);
    return { type, handle, layer, paperSpace, groups: [], vertices, polylineFlags, polylineNormal: normal };
  }
  // A type the parser reads itself and we do not use (e.g. VERTEX outside a POLYLINE): counted as ignored.
  return { type, handle, layer, paperSpace, groups: [] };
}

function entityRecords(list: unknown): DxfEntityRecord[] {
  return (Array.isArray(list) ? list : []).filter((e): e is Record<string, unknown> => typeof e === 'object' && e !== null).map(entityRecord);
}

/** Reads DXF text into plain records (no geometry yet). */
export function parseDxfText(text: string): DxfParseResult {
  if (text.startsWith('AutoCAD Binary DXF')) {
    return { ok: false, message: 'this is a binary DXF; save it as ASCII DXF (any version R12 to 2018) and open that' };
  }
  if (!/^\s*0\s*[\r\n]+\s*SECTION\b/.test(text) && !/^\s*999\s*[\r\n]/.test(text)) {
    return { ok: false, message: 'not an ASCII DXF file: it does not begin with a "0 / SECTION" group' };
  }
  const parser = new DxfParser();
  for (const type of RAW_TYPES) parser.registerEntityHandler(rawHandler(type) as never);
  let parsed: unknown;
  try {
    parsed = parser.parseSync(text);
  } catch (err) {
    return { ok: false, message: `the DXF could not be read: ${err instanceof Error ? err.message : String(err)}` };
  }
  if (typeof parsed !== 'object' || parsed === null) return { ok: false, message: 'the DXF could not be read: the parser returned nothing' };
  const dxf = parsed as { header?: unknown; entities?: unknown; blocks?: unknown };
  const blocks = new Map<string, DxfBlockRecord>();
  for (const b of Object.values((dxf.blocks ?? {}) as Record<string, Record<string, unknown>>)) {
    if (typeof b.name !== 'string') continue;
    blocks.set(b.name, { name: b.name, base: point3(b.position), entities: entityRecords(b.entities) });
  }
  return { ok: true, drawing: { header: (dxf.header ?? {}) as Record<string, unknown>, entities: entityRecords(dxf.entities), blocks } };
}
