/**
 * The one adapter to delaunator 5.1.0 and @kninnug/constrainautor 4.1.0 (STYLE.md §3): a
 * constrained Delaunay triangulation of a point set with segments. Library errors (an edge
 * crossing another constrained edge or passing through a point) mean the user's rings
 * intersect themselves or each other; they are rethrown as MeshInputError naming the place.
 * Triangles come back in Delaunator's order, which is CLOCKWISE in section coordinates (y up);
 * callers orient them.
 */
import Delaunator from 'delaunator';
// @ts-expect-error -- the package ships its TypeScript source as its types, and that source does
// not compile under this project's strict flags (noUncheckedIndexedAccess); the built ES module
// is imported instead and typed by the small interface below.
import ConstrainautorModule from '../../node_modules/@kninnug/constrainautor/lib/Constrainautor.mjs';
import { MeshInputError } from './types.ts';
import { outside } from '../invariant.ts';

/** The part of Constrainautor's API used here (see its README). */
interface ConstrainautorInstance {
  constrainOne(p1: number, p2: number): number;
  isConstrained(halfedge: number): boolean;
}
type ConstrainautorClass = new (del: { coords: Float64Array; triangles: Uint32Array; halfedges: Int32Array; hull: Uint32Array }) => ConstrainautorInstance;
const Constrainautor = ConstrainautorModule as ConstrainautorClass;

export interface ConstrainedTriangulation {
  readonly triangles: Uint32Array;
  /** Twin half-edge of each half-edge, −1 on the convex hull. */
  readonly halfedges: Int32Array;
  readonly isConstrained: (halfedge: number) => boolean;
}

export function constrainedTriangulation(
  coords: Float64Array,
  segA: readonly number[],
  segB: readonly number[],
): ConstrainedTriangulation {
  const del = new Delaunator(coords);
  if (del.triangles.length === 0) {
    throw new MeshInputError({ code: 'zero-area', message: 'all points of the region lie on one line' });
  }
  const con = new Constrainautor(del);
  for (let s = 0; s < segA.length; s++) {
    const a = segA[s] ?? outside(segA, s);
    const b = segB[s] ?? outside(segB, s);
    try {
      con.constrainOne(a, b);
    } catch (err) {
      const why = err instanceof Error ? err.message : String(err);
      const at: [number, number] = [(coords[2 * a] ?? outside(coords, 2 * a)), (coords[2 * a + 1] ?? outside(coords, 2 * a + 1))];
      throw new MeshInputError({
        code: 'self-intersection',
        message: `boundary edge from (${at[0]}, ${at[1]}) to (${coords[2 * b]}, ${coords[2 * b + 1]}) crosses another edge or a vertex (${why})`,
        at,
      });
    }
  }
  return { triangles: del.triangles, halfedges: del.halfedges, isConstrained: (e) => con.isConstrained(e) };
}
