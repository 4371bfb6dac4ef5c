/**
 * Result contract of core/torsion (finite-element Saint-Venant torsion, docs/methods.md §7).
 * Lengths in the region's unit; xs, ys are section coordinates (not centroidal).
 */
export interface TorsionResult {
  readonly J: number;
  readonly Cw: number;
  readonly xs: number;
  readonly ys: number;
  readonly meshElements: number;
  readonly meshNodes: number;
  readonly iterations: number;
  /** Estimated relative error of J (e.g. from a refined solve or Richardson), ≥ 0. */
  readonly jRelativeError: number;
  /** Number of disconnected pieces (each twists on its own; J values add). */
  readonly components: number;
  /**
   * Dense outlines are simplified for the finite-element model only (core/mesh/simplify.ts);
   * this says how much: boundary points before and after, the relative change of the meshed
   * area and centroidal Ix, Iy, and the estimated relative change of J (already included in
   * jRelativeError). Null when nothing was simplified. Exact properties never use it.
   */
  readonly simplifiedOutline?: {
    readonly inputPoints: number;
    readonly meshPoints: number;
    readonly deltaArea: number;
    readonly deltaIx: number;
    readonly deltaIy: number;
    readonly jChange: number;
  } | null;
}

export interface TorsionOptions {
  /** Element layers through the thinnest wall (default 3). */
  readonly layers?: number;
  /** Cancellation/progress hook: called now and then with a fraction 0..1; return false to abort. */
  readonly onProgress?: (fraction: number) => boolean | void;
  /** Largest arc sweep per chord of the mesh, degrees (default 2.5). Optional extension. */
  readonly maxChordAngleDeg?: number;
  /** Minimum-angle target of the mesh, degrees (default 22). Optional extension. */
  readonly minAngleDeg?: number;
  /** Cap on mesh points (default 400 000). Optional extension. */
  readonly maxPoints?: number;
  /** Conjugate-gradient relative-residual tolerance (default 1e-10). Optional extension. */
  readonly tolerance?: number;
  /** Conjugate-gradient iteration cap per solve (default 20 000). Optional extension. */
  readonly maxIterations?: number;
  /**
   * Largest relative change of J allowed from simplifying dense outlines for the mesh (default
   * 1e-3, i.e. 0.1 %; 0 meshes every vertex). Vertices within this fraction of the local wall
   * thickness of their chord are dropped; if the change estimated on the coarse solution still
   * exceeds it, the coarse level is redone with a smaller tolerance.
   */
  readonly geometryTolerance?: number;
  /** Preconditioner of the conjugate-gradient solves (default 'ic0', incomplete Cholesky; 'sgs', symmetric Gauss–Seidel; core/torsion/sparse.ts). Optional extension, for the bench's comparison. */
  readonly preconditioner?: 'ic0' | 'sgs';
  /** Clock in ms for the phase times of torsionAnalysis (e.g. performance.now); none by default. */
  readonly now?: () => number;
}
