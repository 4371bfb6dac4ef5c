/**
 * Torsion constant J, Trefftz shear centre (xs, ys) and warping constant Cw of ONE material
 * region by finite elements (METHODS §7; Pilkey 2002). Pure TypeScript, no DOM or Node: it runs
 * in the editor's Web Worker and in the command line alike.
 *
 * One material only: the caller passes the Region of the parts that share one shear modulus
 * (union them first). A section of several materials needs the G-weighted form of METHODS §7.7,
 * which this module does not do.
 *
 * Method: meshRegion (core/mesh) at half the requested layers, each straight-sided T6 element
 * then split into four (nested mesh at the requested layers). The warping function is solved on
 * both levels by Jacobi-PCG (the coarse solution, exactly prolongated, starts the fine solve).
 * The constants come from the fine level. Because J_h ≥ J_{h/2} ≥ J (minimum principle, METHODS
 * §7.2), J_coarse − J_fine is a lower bound of the coarse error; the reported jRelativeError is
 * the Richardson estimate of the fine error, (J_c − J_f)/((2^p − 1)·J_f) with p = 4/3 when the
 * section has sharp re-entrant corners (the r^{2/3} corner rate) and p = 2 otherwise (a
 * conservative rate for T6), plus 1.25·Δφ²/3 for arcs replaced by chords of sweep Δφ (the
 * chord deficit of a full circle, METHODS §7.8, rounded up), which the FE comparison cannot see.
 * Lengths in the region's unit; xs, ys in section coordinates. iterations = fine-level PCG
 * iterations. Shear stress per unit torque: torsionStressField. Sharp re-entrant corners make
 * the theoretical stress unbounded there (METHODS §7.6); the field shows a finite mesh value.
 */
import type { Region } from '../geometry/types.ts';
import { MeshCancelledError, MeshInputError, meshRegion } from '../mesh/index.ts';
import { TorsionCancelledError } from './errors.ts';
import type { TorsionOptions, TorsionResult } from './types.ts';
import { bandOrdered, childTriangles, nodalGradient, prolongate, quadraticMesh, solveWarping, type QuadraticMesh, type WarpingSolution } from './warping.ts';

export { TorsionCancelledError, TorsionSolveError } from './errors.ts';
export type { TorsionOptions, TorsionResult } from './types.ts';
export { meshRegion, refineUniform, MeshInputError, MeshRefinementError, MeshCancelledError } from '../mesh/index.ts';
export type { TriangleMesh, MeshOptions } from '../mesh/index.ts';

export interface TorsionAnalysis {
  readonly result: TorsionResult;
  /** The fine T6 mesh the constants were computed on. */
  readonly mesh: QuadraticMesh;
  /** Corner triangles of that mesh (indices into mesh.xy), CCW, for drawing the mesh view. */
  readonly triangles: Int32Array;
  readonly solution: WarpingSolution;
  /** J of the coarse level (for the error estimate). */
  readonly jCoarse: number;
  readonly minAngleDeg: number;
  readonly reentrantCorners: number;
}

export interface TorsionStressField {
  /** Node coordinates (x, y pairs), same as the analysis mesh. */
  readonly xy: Float64Array;
  /** Four small triangles per T6 element over all its nodes (CCW), for drawing the map. */
  readonly triangles: Int32Array;
  /** Shear stress components per unit torque at the nodes, τ/T in 1/length³. */
  readonly tauX: Float64Array;
  readonly tauY: Float64Array;
  readonly magnitude: Float64Array;
  readonly maxMagnitude: number;
  /** True when sharp re-entrant corners exist: the true peak there is unbounded. */
  readonly unboundedAtCorners: boolean;
}

const defaultLayers = 3;

function stage(onProgress: TorsionOptions['onProgress'], from: number, to: number): ((f: number) => boolean | void) | undefined {
  if (!onProgress) return undefined;
  return (f) => onProgress(from + (to - from) * f);
}

function checkedOption(name: string, value: number, lo: number, hi: number): number {
  if (!(value >= lo && value <= hi)) {
    throw new MeshInputError({ code: 'bad-parameter', message: `torsion option ${name} = ${value} is outside ${lo}..${hi}` });
  }
  return value;
}

export function torsionAnalysis(region: Region, options: TorsionOptions = {}): TorsionAnalysis {
  const layers = checkedOption('layers', options.layers ?? defaultLayers, 1, 64);
  const tolerance = checkedOption('tolerance', options.tolerance ?? 1e-10, 1e-15, 1e-3);
  const maxIterations = Math.floor(checkedOption('maxIterations', options.maxIterations ?? 20_000, 1, 10_000_000));
  try {
    const base = meshRegion(region, {
      layers: layers / 2,
      // Compact pieces: 8 fine-level elements across at the default 3 layers, scaled with layers.
      compactDivisions: (4 * layers) / 3,
      maxChordAngleDeg: options.maxChordAngleDeg,
      minAngleDeg: options.minAngleDeg,
      maxPoints: options.maxPoints,
      onProgress: stage(options.onProgress, 0, 0.15),
    });
    const coarse = bandOrdered(quadraticMesh(base.xy, base.triangles));
    // The coarse level only feeds the error estimate and the start of the fine solve; with the
    // energy form of J its solver error enters squared, so 1e-7 is ample there.
    const coarseTolerance = Math.max(tolerance, 1e-7);
    const solveC = solveWarping(coarse, { tolerance: coarseTolerance, maxIterations, onProgress: stage(options.onProgress, 0.15, 0.3) });
    const fine = bandOrdered(quadraticMesh(coarse.xy, childTriangles(coarse)));
    const triangles = cornerTriangles(fine);
    const solveF = solveWarping(fine, {
      tolerance,
      maxIterations,
      initial: prolongate(coarse, fine, solveC.omega),
      onProgress: stage(options.onProgress, 0.3, 1),
    });
    const p = base.reentrantCorners > 0 ? 4 / 3 : 2;
    const feError = Math.max(0, solveC.J - solveF.J) / ((2 ** p - 1) * solveF.J);
    // Δφ²/3 is the measured full-circle deficit (METHODS §7.8); ×1.25 makes it an upper estimate.
    const chordError = (1.25 * base.maxChordSweep * base.maxChordSweep) / 3;
    const result: TorsionResult = {
      J: solveF.J,
      Cw: solveF.Cw,
      xs: solveF.xs,
      ys: solveF.ys,
      meshElements: fine.elements.length / 6,
      meshNodes: fine.xy.length / 2,
      iterations: solveF.iterations,
      jRelativeError: feError + chordError,
      components: solveF.components,
    };
    return { result, mesh: fine, triangles, solution: solveF, jCoarse: solveC.J, minAngleDeg: base.minAngleDeg, reentrantCorners: base.reentrantCorners };
  } catch (err) {
    if (err instanceof MeshCancelledError) throw new TorsionCancelledError();
    throw err;
  }
}

function cornerTriangles(q: QuadraticMesh): Int32Array {
  const out = new Int32Array((q.elements.length / 6) * 3);
  for (let t = 0; t < q.elements.length / 6; t++) out.set(q.elements.subarray(6 * t, 6 * t + 3), 3 * t);
  return out;
}

export function torsionConstants(region: Region, options: TorsionOptions = {}): TorsionResult {
  return torsionAnalysis(region, options).result;
}

/** τ_zX = (T/J)(∂ω/∂X − Y), τ_zY = (T/J)(∂ω/∂Y + X) per unit torque T (METHODS §7.6). */
export function torsionStressField(analysis: TorsionAnalysis): TorsionStressField {
  const { mesh, solution: s } = analysis;
  const { gx, gy } = nodalGradient(mesh, s.omega);
  const n = mesh.xy.length / 2;
  const tauX = new Float64Array(n);
  const tauY = new Float64Array(n);
  const magnitude = new Float64Array(n);
  let maxMagnitude = 0;
  for (let i = 0; i < n; i++) {
    const X = (mesh.xy[2 * i] ?? 0) - s.xc;
    const Y = (mesh.xy[2 * i + 1] ?? 0) - s.yc;
    tauX[i] = ((gx[i] ?? 0) - Y) / s.J;
    tauY[i] = ((gy[i] ?? 0) + X) / s.J;
    magnitude[i] = Math.hypot(tauX[i] ?? 0, tauY[i] ?? 0);
    maxMagnitude = Math.max(maxMagnitude, magnitude[i] ?? 0);
  }
  return { xy: mesh.xy, triangles: childTriangles(mesh), tauX, tauY, magnitude, maxMagnitude, unboundedAtCorners: analysis.reentrantCorners > 0 };
}
