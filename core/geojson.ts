/**
 * Reading GeoJSON (RFC 7946) as a section region.
 *
 * Accepts a Polygon, a MultiPolygon, a Feature whose geometry is one of those, or a
 * FeatureCollection of such Features. Coordinates are read as lengths in a unit the caller
 * states (GeoJSON has no length unit; the file's coordinates are NOT longitudes/latitudes here).
 * Per RFC 7946 §3.1.6 each linear ring lists ≥ 4 positions with the first repeated as the last;
 * the first ring of a polygon is its outer boundary, the others are holes. A third coordinate
 * (elevation) is allowed and ignored. The closing position is dropped in the Region (the
 * geometry contract does not repeat it).
 *
 * Winding is NOT trusted or changed here (RFC 7946 asks for CCW outer rings, but files in the
 * wild vary): core/geometry's normaliseRegion orients rings. Nothing is validated beyond the
 * structure: self-intersections, holes outside and overlaps are for validateRegion.
 * Errors name the JSON path, e.g. features[3].geometry.coordinates[0][5].
 */
import type { Polygon, Region, Ring } from './geometry/types.ts';
import { tooManyVertices } from './document/schema.ts';
import { ringVertexCount } from './geometry/ring.ts';

export interface GeoJsonIssue {
  readonly path: string;
  readonly message: string;
}

export type GeoJsonResult =
  | {
      readonly ok: true;
      readonly region: Region;
      /** JSON path of each polygon's coordinates (same order as region), to map diagnostics back. */
      readonly sources: readonly string[];
      readonly vertexCount: number;
    }
  | { readonly ok: false; readonly errors: readonly GeoJsonIssue[] };

/** Stop after this many problems: a broken million-vertex file should not print a million lines. */
const MAX_ISSUES = 20;

const GEOJSON_TYPES = ['Polygon', 'MultiPolygon', 'Feature', 'FeatureCollection'];

function describe(value: unknown): string {
  if (value === undefined) return 'nothing (the key is missing)';
  if (value === null) return 'null';
  if (typeof value === 'string') return JSON.stringify(value.length > 40 ? `${value.slice(0, 37)}...` : value);
  if (Array.isArray(value)) return `an array of ${value.length} item${value.length === 1 ? '' : 's'}`;
  if (typeof value === 'object') return 'an object';
  return String(value);
}

/** True when the value looks like GeoJSON this module reads (a `type` it knows). */
export function isGeoJson(value: unknown): boolean {
  return typeof value === 'object' && value !== null && GEOJSON_TYPES.includes(String((value as { type?: unknown }).type));
}

/** Appends to `issues` (until MAX_ISSUES) and returns false, so callers can `return bad(...)`. */
function bad(issues: GeoJsonIssue[], path: string, message: string): false {
  if (issues.length < MAX_ISSUES) issues.push({ path, message: `${path}: ${message}` });
  return false;
}

function readRing(value: unknown, path: string, issues: GeoJsonIssue[]): Ring | null {
  if (!Array.isArray(value)) return bad(issues, path, `expected a linear ring (an array of positions), got ${describe(value)}`) || null;
  const n = value.length;
  if (n < 4) return bad(issues, path, `expected a linear ring of at least 4 positions (RFC 7946 §3.1.6: 3 corners and the first repeated), got ${n}`) || null;
  const xy = new Float64Array(2 * (n - 1));
  let fine = true;
  for (let i = 0; i < n; i++) {
    const p: unknown = value[i];
    if (!Array.isArray(p) || p.length < 2 || p.length > 3) {
      fine = bad(issues, `${path}[${i}]`, `expected a position [x, y], got ${describe(p)}`);
      continue;
    }
    const x: unknown = p[0];
    const y: unknown = p[1];
    if (typeof x !== 'number' || !Number.isFinite(x) || typeof y !== 'number' || !Number.isFinite(y)) {
      fine = bad(issues, `${path}[${i}]`, `expected a position of finite numbers, got [${describe(x)}, ${describe(y)}]`);
      continue;
    }
    if (i < n - 1) {
      xy[2 * i] = x;
      xy[2 * i + 1] = y;
    } else if (x !== xy[0] || y !== xy[1]) {
      fine = bad(issues, `${path}[${i}]`, `expected the ring to close on its first position [${xy[0]}, ${xy[1]}] (RFC 7946 §3.1.6), got [${x}, ${y}]`);
    }
  }
  return fine ? { xy } : null;
}

function readPolygon(value: unknown, path: string, issues: GeoJsonIssue[]): Polygon | null {
  if (!Array.isArray(value)) return bad(issues, path, `expected polygon coordinates (an array of linear rings), got ${describe(value)}`) || null;
  if (value.length === 0) return bad(issues, path, 'expected at least one linear ring (the outer boundary), got an empty array') || null;
  const rings = value.map((ring: unknown, k) => readRing(ring, `${path}[${k}]`, issues));
  const [outer, ...holes] = rings;
  if (!outer || holes.some((h) => h === null)) return null;
  return { outer, holes: holes as Ring[] };
}

interface Collected {
  readonly polygons: Polygon[];
  readonly sources: string[];
}

function readGeometry(value: unknown, path: string, issues: GeoJsonIssue[], out: Collected): void {
  if (typeof value !== 'object' || value === null) {
    bad(issues, path, `expected a Polygon or MultiPolygon geometry, got ${describe(value)}`);
    return;
  }
  const g = value as { type?: unknown; coordinates?: unknown };
  const at = path ? `${path}.coordinates` : 'coordinates';
  if (g.type === 'Polygon') {
    const polygon = readPolygon(g.coordinates, at, issues);
    if (polygon) {
      out.polygons.push(polygon);
      out.sources.push(at);
    }
  } else if (g.type === 'MultiPolygon') {
    if (!Array.isArray(g.coordinates)) {
      bad(issues, at, `expected an array of polygons, got ${describe(g.coordinates)}`);
      return;
    }
    g.coordinates.forEach((c: unknown, k) => {
      const polygon = readPolygon(c, `${at}[${k}]`, issues);
      if (polygon) {
        out.polygons.push(polygon);
        out.sources.push(`${at}[${k}]`);
      }
    });
  } else {
    bad(issues, path ? `${path}.type` : 'type', `expected "Polygon" or "MultiPolygon" (a section is an area), got ${describe(g.type)}`);
  }
}

function readFeature(value: unknown, path: string, issues: GeoJsonIssue[], out: Collected): void {
  if (typeof value !== 'object' || value === null || (value as { type?: unknown }).type !== 'Feature') {
    bad(issues, path, `expected a Feature, got ${describe(value)}`);
    return;
  }
  const geometry = (value as { geometry?: unknown }).geometry;
  readGeometry(geometry, path ? `${path}.geometry` : 'geometry', issues, out);
}

/** Reads a parsed GeoJSON value into a Region (not normalised, not validated). */
export function regionFromGeoJson(value: unknown): GeoJsonResult {
  const issues: GeoJsonIssue[] = [];
  const out: Collected = { polygons: [], sources: [] };
  const type = typeof value === 'object' && value !== null ? (value as { type?: unknown }).type : undefined;
  if (type === 'FeatureCollection') {
    const features = (value as { features?: unknown }).features;
    if (!Array.isArray(features)) bad(issues, 'features', `expected an array of Features, got ${describe(features)}`);
    else features.forEach((f: unknown, k) => readFeature(f, `features[${k}]`, issues, out));
  } else if (type === 'Feature') {
    readFeature(value, '', issues, out);
  } else if (type === 'Polygon' || type === 'MultiPolygon') {
    readGeometry(value, '', issues, out);
  } else {
    bad(issues, 'type', `expected one of ${GEOJSON_TYPES.map((t) => `"${t}"`).join(', ')}, got ${describe(type)}`);
  }
  if (issues.length === 0 && out.polygons.length === 0) bad(issues, type === 'FeatureCollection' ? 'features' : '(top level)', 'expected at least one polygon, found none');
  if (issues.length > 0) return { ok: false, errors: issues };
  let vertexCount = 0;
  for (const p of out.polygons) {
    vertexCount += ringVertexCount(p.outer);
    for (const h of p.holes) vertexCount += ringVertexCount(h);
  }
  const tooMany = tooManyVertices(vertexCount, 'the file holds', 'vertices');
  if (tooMany !== null) return { ok: false, errors: [{ path: '(top level)', message: tooMany }] };
  return { ok: true, region: out.polygons, sources: out.sources, vertexCount };
}

/** The JSON path of a ring or vertex of a region read by regionFromGeoJson (ring −1 = outer). */
export function geoJsonPathOf(sources: readonly string[], polygon: number, ring?: number, vertex?: number): string {
  const base = sources[polygon] ?? `polygon ${polygon}`;
  if (ring === undefined) return base;
  const withRing = `${base}[${ring + 1}]`;
  return vertex === undefined ? withRing : `${withRing}[${vertex}]`;
}
