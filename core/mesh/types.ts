/**
 * Contract of core/mesh: conforming quality triangle meshes of a Region, for the torsion finite
 * elements (docs/methods.md §7.8) and for the mesh view.
 *
 * Coordinates are SECTION coordinates (x right, y up) in the region's length unit. Triangles are
 * listed counter-clockwise, three node indices each. Arcs are replaced by chords before meshing
 * (docs/methods.md §2.6), so the mesh covers the inscribed polygon, not the exact arc region.
 */
import type { Diagnostic } from '../geometry/types.ts';

export interface TriangleMesh {
  /** Node coordinates, node i at (xy[2i], xy[2i + 1]). */
  readonly xy: Float64Array;
  /** Corner indices, triangle t is (triangles[3t], triangles[3t + 1], triangles[3t + 2]), CCW. */
  readonly triangles: Int32Array;
  /** Smallest interior angle over all triangles, degrees. */
  readonly minAngleDeg: number;
  /** Refinement rounds used (each round inserts a batch of points and re-triangulates). */
  readonly rounds: number;
  /** Points inserted by refinement (beyond the flattened boundary vertices). */
  readonly insertedPoints: number;
  /** Triangles still below the angle target when refinement stopped (0 when it met the target). */
  readonly badTriangles: number;
  /** Sharp re-entrant boundary corners found (interior angle > 190°): stresses there are unbounded. */
  readonly reentrantCorners: number;
  /** Largest arc sweep per chord actually used, radians (0 when the region has no arcs). */
  readonly maxChordSweep: number;
  /** What the simplification of dense chains changed (null when it was off or removed nothing). */
  readonly simplification: MeshSimplification | null;
}

/** The geometric change made by simplifying dense boundary chains for the mesh (core/mesh/simplify.ts). */
export interface MeshSimplification {
  /** Boundary points before and after. */
  readonly inputPoints: number;
  readonly keptPoints: number;
  /** Per replaced run (6 numbers): chord ends xa, ya, xb, yb, the material area the chord adds (< 0: removes), Σ|area| between run and chord. */
  readonly runs: Float64Array;
  /** Relative change of the area and of the centroidal Ix, Iy of the meshed outline (simplified / input − 1). */
  readonly deltaArea: number;
  readonly deltaIx: number;
  readonly deltaIy: number;
}

export interface MeshOptions {
  /** Element layers through the thinnest wall (default 3). Element size ≈ local thickness / layers. */
  readonly layers?: number;
  /** Fewest elements across a compact piece: size ≤ √(piece area) / this (default 8). */
  readonly compactDivisions?: number;
  /** Largest arc sweep per chord, degrees (default 2.5, docs/methods.md §7.8: ≈ −0.063 % on a full circle). */
  readonly maxChordAngleDeg?: number;
  /** Minimum-angle target of the refinement, degrees (default 22; at most 30). */
  readonly minAngleDeg?: number;
  /** How much finer the mesh is made at sharp re-entrant corners (default 4). */
  readonly cornerRefinement?: number;
  /** Lipschitz growth of the element size with distance (default 0.3). */
  readonly grading?: number;
  /** Cap on the points refinement may insert (default 400 000); exceeding it throws MeshRefinementError. */
  readonly maxPoints?: number;
  /**
   * Simplify dense boundary chains for the mesh: drop a vertex when it lies within this fraction
   * of the local wall thickness from the chord replacing it (0 = off, the default; at most 0.1).
   * Vertices on exact arcs and shared by touching parts are always kept.
   */
  readonly simplify?: number;
  /** Called after each refinement round with a fraction 0..1; return false to cancel. */
  readonly onProgress?: (fraction: number) => boolean | void;
}

/** The region cannot be meshed because of a problem in the user's geometry. */
export class MeshInputError extends Error {
  override readonly name = 'MeshInputError';
  constructor(readonly diagnostic: Diagnostic) {
    super(diagnostic.message);
  }
}

/** Refinement stopped at its cap (points or rounds) before the mesh met its targets. */
export class MeshRefinementError extends Error {
  override readonly name = 'MeshRefinementError';
  constructor(
    message: string,
    readonly points: number,
    readonly rounds: number,
  ) {
    super(message);
  }
}

/** The caller's onProgress hook returned false. */
export class MeshCancelledError extends Error {
  override readonly name = 'MeshCancelledError';
  constructor() {
    super('meshing was cancelled');
  }
}
