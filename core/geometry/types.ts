/**
 * Geometry contract shared by every core module.
 *
 * Coordinates are SECTION coordinates: x to the right, y up, in the document's length unit.
 * Screen coordinates (y down) never enter core/; the renderer converts at its boundary.
 *
 * A Ring is a closed chain of segments over n vertices, stored flat for speed:
 * vertex i is (xy[2i], xy[2i+1]); segment i runs from vertex i to vertex (i + 1) mod n.
 * The closing vertex is NOT repeated. `bulge[i]`, when present, makes segment i a circular arc:
 * bulge = tan(sweep / 4) (the DXF bulge convention): 0 is a straight edge, > 0 an arc running
 * counter-clockwise about its centre, < 0 clockwise; |bulge| = 1 is a semicircle. A full circle is
 * two segments with bulge 1 each (outer ring) or −1 each (hole).
 *
 * Winding after normalisation: outer rings counter-clockwise (positive signed area), holes
 * clockwise (negative signed area). Properties rely on it; normaliseRegion enforces it.
 */

export type Point = readonly [x: number, y: number];

export interface Ring {
  readonly xy: Float64Array;
  readonly bulge?: Float64Array | undefined;
}

export interface Polygon {
  readonly outer: Ring;
  readonly holes: readonly Ring[];
}

/** A set of polygons with holes; pieces do not overlap (they may touch). */
export type Region = readonly Polygon[];

/** Angles in degrees and in radians are distinct types (STYLE.md §4). */
export type Degrees = number & { readonly __angleUnit: 'degrees' };
export type Radians = number & { readonly __angleUnit: 'radians' };
export const degrees = (value: number): Degrees => value as Degrees;
export const radians = (value: number): Radians => value as Radians;
export const toRadians = (a: Degrees): Radians => ((a * Math.PI) / 180) as Radians;
export const toDegrees = (a: Radians): Degrees => ((a * 180) / Math.PI) as Degrees;

/** What is wrong with the user's geometry, and where (STYLE.md §5). */
export type DiagnosticCode =
  | 'too-few-points'
  | 'zero-area'
  | 'self-intersection'
  | 'hole-outside'
  | 'overlap'
  | 'non-finite'
  | 'too-large'
  | 'too-small'
  | 'bad-bulge'
  | 'boolean-failed'
  | 'bad-parameter'
  | 'empty-section';

export interface Diagnostic {
  readonly code: DiagnosticCode;
  /** One plain sentence naming what is wrong and where. */
  readonly message: string;
  /** The part's name (or index as text) when the problem belongs to a document part. */
  readonly part?: string;
  /** Index of the polygon within the part's region. */
  readonly polygon?: number;
  /** -1 for the outer ring, 0.. for holes. */
  readonly ring?: number;
  readonly vertex?: number;
  /** Where to point on the canvas, section coordinates. */
  readonly at?: Point;
}
