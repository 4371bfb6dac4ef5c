/**
 * Torsion constant J, Trefftz shear centre (xs, ys) and warping constant Cw by finite elements
 * (docs/methods.md §7; Pilkey 2002). Pure TypeScript, no DOM or Node: it runs in the editor's
 * Web Worker and in the command line alike.
 *
 * torsionAnalysis takes the Region of one material. compositeTorsionAnalysis takes pieces of
 * several materials, each with its shear modulus, and weights every element by G_i/G_ref
 * (docs/methods.md §7.7): J = GJ/G_ref, and the centroid, shear centre and Cw are G-weighted.
 *
 * Dense outlines (thousands of vertices along a curve, as imported from drawings) are simplified
 * for the mesh only (core/mesh/simplify.ts) within geometryTolerance of J: the change of J is
 * estimated from the coarse solution by Hadamard's boundary variation, reported in
 * simplifiedOutline with the change of area, Ix and Iy, and added to jRelativeError; if it
 * exceeds its share, the coarse level is redone with a smaller tolerance.
 *
 * Method: meshRegion (core/mesh) at half the requested layers, each straight-sided T6 element
 * then split into four (nested mesh at the requested layers). The warping function is solved on
 * both levels by conjugate gradients preconditioned with incomplete Cholesky IC(0) (sparse.ts; the
 * coarse solution, exactly prolongated, starts the fine solve).
 * The constants come from the fine level. Because J_h ≥ J_{h/2} ≥ J (minimum principle,
 * docs/methods.md §7.2), J_coarse − J_fine is a lower bound of the coarse error; the reported jRelativeError is
 * the Richardson estimate of the fine error, (J_c − J_f)/((2^p − 1)·J_f) with p = 4/3 when the
 * section has sharp re-entrant corners (the r^{2/3} corner rate) and p = 2 otherwise (a
 * conservative rate for T6), plus 1.25·Δφ²/3 for arcs replaced by chords of sweep Δφ (the
 * chord deficit of a full circle, docs/methods.md §7.8, rounded up), which the FE comparison cannot see.
 * Lengths in the region's unit; xs, ys in section coordinates. iterations = fine-level PCG
 * iterations. Shear stress per unit torque: torsionStressField. Sharp re-entrant corners make
 * the theoretical stress unbounded there (docs/methods.md §7.6); the field shows a finite mesh value.
 */
import type { Region } from '../geometry/types.ts';
import { DEFAULT_CHORD_ANGLE_DEG, MeshCancelledError, MeshInputError, meshGraph, regionGraph, type MeshSimplification, type PlanarGraph, type TriangleMesh } from '../mesh/index.ts';
import { invariant, outside } from '../invariant.ts';
import { TorsionCancelledError } from './errors.ts';
import { pieceLocator } from './pieces.ts';
import type { TorsionOptions, TorsionResult } from './types.ts';
import { snapShearCentre, materialGroups } from './symmetry.ts';
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
  readonly coarseIterations: number;
  /**
   * Wall time per phase, ms, by options.now (all 0 without a clock): mesh (graph, coarse mesh,
   * quadratic nodes, fine mesh), assemble, solve and post (both levels), and redo (a coarse
   * level thrown away because the simplified outline changed J by more than its share).
   */
  readonly phaseMs: { readonly mesh: number; readonly assemble: number; readonly solve: number; readonly post: number; readonly redo: number };
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
/** Default share of the J budget that the simplification of dense outlines may use (0.1 % of the 0.2 % target). */
const defaultGeometryTolerance = 1e-3;

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

interface CoarseLevel {
  readonly base: TriangleMesh;
  readonly coarse: QuadraticMesh;
  readonly solve: WarpingSolution;
  readonly geometryChange: { readonly change: number; readonly bound: number };
  readonly meshMs: number;
}

/**
 * Estimated relative change of J caused by the simplified outline, from Hadamard's variation of
 * the torsional rigidity under a normal boundary shift δn: ΔJ = ∮ |τ̂|² δn ds, with τ̂ the shear
 * stress per unit G·θ′ (Pólya & Szegő 1951, Isoperimetric Inequalities in Mathematical Physics
 * [from memory]; for a disc of radius r, |τ̂| = r and ΔJ = 2πr³·δr = d(πr⁴/2), an identity the
 * tests check). Each run's ∫δn ds is the material area its chord adds; |τ̂|² is the mean of its
 * two chord ends on the coarse solution. `change` is that first-order estimate (signed: an
 * inscribed outer chord lowers J, a hole's chord raises it); `bound` is what enters the error
 * budget: 1.25 × |change|, but never less than a quarter of the sum without cancellation.
 */
function geometryChangeOfJ(simplification: MeshSimplification | null, q: QuadraticMesh, s: WarpingSolution): { change: number; bound: number } {
  const runs = simplification?.runs;
  if (!runs || runs.length === 0) return { change: 0, bound: 0 };
  const key = (x: number, y: number): string => `${x},${y}`;
  const tau2 = new Map<string, number>();
  for (let r = 0; r < runs.length; r += RUN) {
    tau2.set(key(runs[r]!, runs[r + 1]!), Number.NaN);
    tau2.set(key(runs[r + 2]!, runs[r + 3]!), Number.NaN);
  }
  const { gx, gy } = nodalGradient(q, s.omega);
  let largest = 0;
  for (let i = 0; i < q.xy.length / 2; i++) {
    const x = q.xy[2 * i]!;
    const y = q.xy[2 * i + 1]!;
    const tx = gx[i]! - (y - s.yc);
    const ty = gy[i]! + (x - s.xc);
    const t2 = tx * tx + ty * ty;
    largest = Math.max(largest, t2);
    const k = key(x, y);
    if (tau2.has(k)) tau2.set(k, t2);
  }
  let change = 0;
  let absolute = 0;
  for (let r = 0; r < runs.length; r += RUN) {
    const a = tau2.get(key(runs[r]!, runs[r + 1]!)) ?? Number.NaN;
    const b = tau2.get(key(runs[r + 2]!, runs[r + 3]!)) ?? Number.NaN;
    // A chord end that is not a mesh node cannot happen; if it did, the largest τ̂² keeps the bound.
    const weight = ((Number.isNaN(a) ? largest : a) + (Number.isNaN(b) ? largest : b)) / 2;
    change += weight * runs[r + 4]!;
    absolute += weight * runs[r + 5]!;
  }
  // Several materials: a run's τ̂² counts with the stiffest neighbour's G/G_ref (an upper estimate).
  let heaviest = 1;
  if (q.weights) for (const w of q.weights) heaviest = Math.max(heaviest, w);
  change *= heaviest;
  absolute *= heaviest;
  // ×1.25 covers the second-order terms the first-order variation leaves out.
  return { change: change / s.J, bound: (1.25 * Math.max(Math.abs(change), absolute / 4)) / s.J };
}

/** Numbers per run in MeshSimplification.runs. */
const RUN = 6;

export function torsionAnalysis(region: Region, options: TorsionOptions = {}): TorsionAnalysis {
  return analysis(region, options, undefined, [region]);
}

/** A piece of one material for compositeTorsionAnalysis: its region and shear modulus (any unit, the same for all). */
export interface ShearPiece {
  readonly region: Region;
  readonly G: number;
}

/**
 * Torsion of a section of several materials, perfectly bonded where they touch (docs/methods.md §7.7):
 * each element's K_e, F_e and section integrals are weighted by G_e/G_ref, so the result's J is
 * GJ/G_ref, and the centroid, Ix, Iy, the shear centre (Trefftz) and Cw are G-weighted (with one
 * Poisson's ratio for all materials this is the same as E-weighting). G_ref defaults to the first
 * piece's G. Pieces must not overlap; pieces that do not touch twist on their own (components).
 */
export function compositeTorsionAnalysis(pieces: readonly ShearPiece[], options: TorsionOptions & { readonly referenceShearModulus?: number } = {}): TorsionAnalysis {
  if (pieces.length === 0) throw new MeshInputError({ code: 'empty-section', message: 'no material pieces to analyse' });
  pieces.forEach((p, i) => {
    if (!(p.G > 0 && Number.isFinite(p.G))) throw new MeshInputError({ code: 'bad-parameter', message: `piece ${i}: shear modulus G = ${p.G} must be a positive number` });
  });
  const gRef = options.referenceShearModulus ?? pieces[0]!.G;
  if (!(gRef > 0 && Number.isFinite(gRef))) throw new MeshInputError({ code: 'bad-parameter', message: `reference shear modulus ${gRef} must be a positive number` });
  const locate = pieceLocator(pieces.map((p) => p.region), ((options.maxChordAngleDeg ?? DEFAULT_CHORD_ANGLE_DEG) * Math.PI) / 180);
  const ratio = pieces.map((p) => p.G / gRef);
  const weigh = (xy: Float64Array, triangles: Int32Array): Float64Array => {
    const w = new Float64Array(triangles.length / 3);
    for (let t = 0; t < w.length; t++) {
      const a = triangles[3 * t]!, b = triangles[3 * t + 1]!, c = triangles[3 * t + 2]!;
      const gx = (xy[2 * a]! + xy[2 * b]! + xy[2 * c]!) / 3;
      const gy = (xy[2 * a + 1]! + xy[2 * b + 1]! + xy[2 * c + 1]!) / 3;
      let k = locate(gx, gy);
      // A centroid on a ray through a vertex: try points nearer each corner.
      for (const v of [a, b, c]) if (k < 0) k = locate((gx + xy[2 * v]!) / 2, (gy + xy[2 * v + 1]!) / 2);
      invariant(k >= 0, `torsion mesh element ${t} at (${gx}, ${gy}) lies in no material piece`);
      w[t] = ratio[k]!;
    }
    return w;
  };
  return analysis(pieces.flatMap((p) => p.region), options, weigh, materialGroups(pieces));
}

/** `groups`: the region of each material (one G), for the symmetry test of the shear centre (symmetry.ts). */
function analysis(region: Region, options: TorsionOptions, weigh: ((xy: Float64Array, triangles: Int32Array) => Float64Array) | undefined, groups: readonly Region[]): TorsionAnalysis {
  const layers = checkedOption('layers', options.layers ?? defaultLayers, 1, 64);
  const tolerance = checkedOption('tolerance', options.tolerance ?? 1e-10, 1e-15, 1e-3);
  const maxIterations = Math.floor(checkedOption('maxIterations', options.maxIterations ?? 20_000, 1, 10_000_000));
  const geometryTolerance = checkedOption('geometryTolerance', options.geometryTolerance ?? defaultGeometryTolerance, 0, 0.01);
  const now = options.now ?? ((): number => 0);
  let reached = 0;
  // Progress never runs backwards, even when the coarse level is redone.
  const progress = options.onProgress ? (f: number): boolean | void => options.onProgress?.((reached = Math.max(reached, f))) : undefined;
  const coarseLevel = (graph: PlanarGraph, simplify: number): CoarseLevel => {
    const t0 = now();
    const base = meshGraph(graph, {
      layers: layers / 2,
      // Compact pieces: 8 fine-level elements across at the default 3 layers, scaled with layers.
      compactDivisions: (4 * layers) / 3,
      minAngleDeg: options.minAngleDeg,
      maxPoints: options.maxPoints,
      simplify,
      onProgress: stage(progress, 0, 0.15),
    });
    const coarse = bandOrdered({ ...quadraticMesh(base.xy, base.triangles), weights: weigh?.(base.xy, base.triangles) });
    const meshMs = now() - t0;
    // The coarse level only feeds the error estimate and the start of the fine solve; with the
    // energy form of J its solver error enters squared, so 1e-7 is ample there.
    const solve = solveWarping(coarse, { tolerance: Math.max(tolerance, 1e-7), maxIterations, now, preconditioner: options.preconditioner, onProgress: stage(progress, 0.15, 0.3) });
    return { base, coarse, solve, geometryChange: geometryChangeOfJ(base.simplification, coarse, solve), meshMs };
  };
  try {
    const t0 = now();
    const graph = regionGraph(region, { maxChordAngleDeg: options.maxChordAngleDeg });
    const graphMs = now() - t0;
    let simplify = geometryTolerance;
    let level: CoarseLevel;
    try {
      level = coarseLevel(graph, simplify);
    } catch (err) {
      // A chord of the simplified outline crossed a nearby boundary: mesh the outline as given.
      if (!(err instanceof MeshInputError) || simplify === 0) throw err;
      level = coarseLevel(graph, (simplify = 0));
    }
    const first = level;
    if (level.geometryChange.bound > geometryTolerance) {
      // The estimate is about linear in the tolerance (chord sag δ, run count ∝ δ^-1/2, area ∝ δ^3/2 each).
      simplify *= (0.6 * geometryTolerance) / level.geometryChange.bound;
      level = coarseLevel(graph, simplify);
    }
    const { base, coarse, solve: solveC } = level;
    const t1 = now();
    // Each coarse element's four children keep its material (childTriangles order).
    const fineWeights = coarse.weights ? Float64Array.from({ length: coarse.weights.length * 4 }, (_, i) => coarse.weights![i >> 2]!) : undefined;
    const fine = bandOrdered({ ...quadraticMesh(coarse.xy, childTriangles(coarse)), weights: fineWeights });
    const triangles = cornerTriangles(fine);
    const fineMeshMs = now() - t1;
    const solveF = solveWarping(fine, {
      tolerance,
      maxIterations,
      now,
      initial: prolongate(coarse, fine, solveC.omega),
      preconditioner: options.preconditioner,
      onProgress: stage(progress, 0.3, 1),
    });
    const p = base.reentrantCorners > 0 ? 4 / 3 : 2;
    const feError = Math.max(0, solveC.J - solveF.J) / ((2 ** p - 1) * solveF.J);
    // Δφ²/3 is the measured full-circle deficit (docs/methods.md §7.8); ×1.25 makes it an upper estimate.
    const chordError = (1.25 * base.maxChordSweep * base.maxChordSweep) / 3;
    const simplified = base.simplification;
    const jRelativeError = feError + chordError + level.geometryChange.bound;
    const centre = snapShearCentre(groups, { xs: solveF.xs, ys: solveF.ys, xsCoarse: solveC.xs, ysCoarse: solveC.ys, relativeError: jRelativeError });
    const result: TorsionResult = {
      J: solveF.J,
      Cw: solveF.Cw,
      xs: centre.xs,
      ys: centre.ys,
      meshElements: fine.elements.length / 6,
      meshNodes: fine.xy.length / 2,
      iterations: solveF.iterations,
      jRelativeError,
      components: solveF.components,
      simplifiedOutline: simplified
        ? { inputPoints: simplified.inputPoints, meshPoints: simplified.keptPoints, deltaArea: simplified.deltaArea, deltaIx: simplified.deltaIx, deltaIy: simplified.deltaIy, jChange: level.geometryChange.change }
        : null,
    };
    const redoMs = level === first ? 0 : first.meshMs + first.solve.phaseMs.assemble + first.solve.phaseMs.solve + first.solve.phaseMs.post;
    const phaseMs = {
      mesh: graphMs + level.meshMs + fineMeshMs,
      assemble: solveC.phaseMs.assemble + solveF.phaseMs.assemble,
      solve: solveC.phaseMs.solve + solveF.phaseMs.solve,
      post: solveC.phaseMs.post + solveF.phaseMs.post,
      redo: redoMs,
    };
    return { result, mesh: fine, triangles, solution: solveF, jCoarse: solveC.J, coarseIterations: solveC.iterations, phaseMs, minAngleDeg: base.minAngleDeg, reentrantCorners: base.reentrantCorners };
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

/** τ_zX = (T/J)(∂ω/∂X − Y), τ_zY = (T/J)(∂ω/∂Y + X) per unit torque T (docs/methods.md §7.6). */
export function torsionStressField(analysis: TorsionAnalysis): TorsionStressField {
  const { mesh, solution: s } = analysis;
  const { gx, gy } = nodalGradient(mesh, s.omega);
  const n = mesh.xy.length / 2;
  const tauX = new Float64Array(n);
  const tauY = new Float64Array(n);
  const magnitude = new Float64Array(n);
  let maxMagnitude = 0;
  for (let i = 0; i < n; i++) {
    const X = (mesh.xy[2 * i] ?? outside(mesh.xy, 2 * i)) - s.xc;
    const Y = (mesh.xy[2 * i + 1] ?? outside(mesh.xy, 2 * i + 1)) - s.yc;
    tauX[i] = ((gx[i] ?? outside(gx, i)) - Y) / s.J;
    tauY[i] = ((gy[i] ?? outside(gy, i)) + X) / s.J;
    magnitude[i] = Math.hypot((tauX[i] ?? outside(tauX, i)), (tauY[i] ?? outside(tauY, i)));
    maxMagnitude = Math.max(maxMagnitude, (magnitude[i] ?? outside(magnitude, i)));
  }
  return { xy: mesh.xy, triangles: childTriangles(mesh), tauX, tauY, magnitude, maxMagnitude, unboundedAtCorners: analysis.reentrantCorners > 0 };
}
