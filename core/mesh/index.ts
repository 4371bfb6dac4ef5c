/**
 * meshRegion: a conforming quality triangle mesh of one Region (docs/methods.md §7.8).
 *
 * Steps: flatten arcs (chords of sweep ≤ maxChordAngleDeg), merge coincident vertices of
 * touching pieces, estimate the local wall thickness, build a graded size field, split the
 * boundary to that size, then refine a constrained Delaunay triangulation (refine.ts) until
 * every triangle is small enough and its smallest angle meets minAngleDeg, except triangles
 * wedged into input corners sharper than the target, which are left as they are and counted
 * in badTriangles. Triangles outside the material (outside every outer ring, or in a hole)
 * are removed by winding number.
 * Not guaranteed: the mesh covers the chord polygon, not the exact arcs; input that crosses
 * itself is rejected (MeshInputError), not repaired.
 * refineUniform splits every triangle into four similar ones (nested refinement).
 */
import type { Region } from '../geometry/types.ts';
import { planarGraphOfRegion, type PlanarGraph } from './planar-input.ts';
import { presplitSegments, refineTriangulation } from './refine.ts';
import { graphMoments, simplifiedGraph } from './simplify.ts';
import { reentrantCorners, sizeFieldOf } from './size-field.ts';
import { MeshCancelledError, MeshInputError, type MeshOptions, type MeshSimplification, type TriangleMesh } from './types.ts';
import { outside } from '../invariant.ts';

export { MeshCancelledError, MeshInputError, MeshRefinementError } from './types.ts';
export type { MeshOptions, MeshSimplification, TriangleMesh } from './types.ts';
export type { PlanarGraph } from './planar-input.ts';

/** Largest arc sweep per chord by default, degrees (see DEFAULTS). */
export const DEFAULT_CHORD_ANGLE_DEG = 2.5;

const DEFAULTS = {
  layers: 3,
  compactDivisions: 8,
  // 2.5° per chord keeps the chord-polygon deficit of a full circle (≈ Δφ²/3, docs/methods.md §7.8) at
  // −0.063 %, inside the 0.1 % budget for J; 3.6° would give −0.13 %.
  maxChordAngleDeg: DEFAULT_CHORD_ANGLE_DEG,
  minAngleDeg: 22,
  cornerRefinement: 4,
  grading: 0.3,
  maxPoints: 400_000,
} as const;

function checkedOption(name: keyof typeof DEFAULTS, value: number | undefined, lo: number, hi: number): number {
  const v = value ?? DEFAULTS[name];
  if (!(v >= lo && v <= hi)) {
    throw new MeshInputError({ code: 'bad-parameter', message: `mesh option ${name} = ${v} is outside ${lo}..${hi}` });
  }
  return v;
}

/** The region's planar graph (arcs flattened at maxChordAngleDeg), for meshGraph. */
export function regionGraph(region: Region, options: Pick<MeshOptions, 'maxChordAngleDeg'> = {}): PlanarGraph {
  const chordDeg = checkedOption('maxChordAngleDeg', options.maxChordAngleDeg, 0.05, 30);
  return planarGraphOfRegion(region, (chordDeg * Math.PI) / 180);
}

export function meshRegion(region: Region, options: MeshOptions = {}): TriangleMesh {
  return meshGraph(regionGraph(region, options), options);
}

/** Relative tolerance of the rough pass that only feeds the thickness estimate (× bounding diagonal). */
const ROUGH_TOLERANCE = 1e-4;

/**
 * The graph with dense chains reduced within simplify × local thickness (simplify.ts). The
 * thickness comes from a size field (layers 1, no corner grading) on a rough reduction of the
 * graph, so the ray casting never meets thousands of edges. Null when nothing can be removed.
 */
function budgetedGraph(graph: PlanarGraph, simplify: number): { graph: PlanarGraph; summary: MeshSimplification } | null {
  const rough = simplifiedGraph(graph, () => ROUGH_TOLERANCE * graph.diagonal);
  if (rough.keptPoints === rough.inputPoints) return null;
  const thickness = sizeFieldOf(rough.graph, [], { layers: 1, compactDivisions: 1, cornerRefinement: 1, grading: DEFAULTS.grading });
  // A compact piece (thickness near √area) changes J several times faster per unit of chord sag
  // than a thin wall (J of a disc ∝ r⁴, of a thin tube ∝ t), so its tolerance is up to 6× smaller.
  const compact = Math.sqrt(Math.max(...graph.pieces.map((p) => p.area)));
  const fine = simplifiedGraph(graph, (x, y) => {
    const t = thickness.at(x, y);
    return (simplify * t) / (1 + 5 * Math.min(1, (t / compact) ** 2));
  });
  const before = graphMoments(graph);
  const after = graphMoments(fine.graph);
  return {
    graph: fine.graph,
    summary: {
      inputPoints: fine.inputPoints,
      keptPoints: fine.keptPoints,
      runs: fine.runs,
      deltaArea: after.area / before.area - 1,
      deltaIx: after.Ix / before.Ix - 1,
      deltaIy: after.Iy / before.Iy - 1,
    },
  };
}

export function meshGraph(input: PlanarGraph, options: MeshOptions = {}): TriangleMesh {
  const layers = checkedOption('layers', options.layers, 0.5, 64);
  const compactDivisions = checkedOption('compactDivisions', options.compactDivisions, 1, 512);
  const minAngleDeg = checkedOption('minAngleDeg', options.minAngleDeg, 0, 30);
  const cornerRefinement = checkedOption('cornerRefinement', options.cornerRefinement, 1, 64);
  const grading = checkedOption('grading', options.grading, 0.05, 2);
  const maxPoints = checkedOption('maxPoints', options.maxPoints, 16, 4_000_000);
  const simplify = options.simplify ?? 0;
  if (!(simplify >= 0 && simplify <= 0.1)) {
    throw new MeshInputError({ code: 'bad-parameter', message: `mesh option simplify = ${simplify} is outside 0..0.1` });
  }
  const reduced = simplify > 0 ? budgetedGraph(input, simplify) : null;
  const graph = reduced?.graph ?? input;
  const corners = reentrantCorners(graph);
  const size = sizeFieldOf(graph, corners, { layers, compactDivisions, cornerRefinement, grading });
  if (options.onProgress && options.onProgress(0) === false) throw new MeshCancelledError();
  const work = { xy: [...graph.xy], segA: [...graph.segA], segB: [...graph.segB], segNet: [...graph.segNet] };
  presplitSegments(work, size, maxPoints);
  const refined = refineTriangulation(work, { size, minAngleRad: (minAngleDeg * Math.PI) / 180, maxPoints, onProgress: options.onProgress });
  const compact = compactNodes(refined.xy, refined.triangles);
  return {
    ...compact,
    minAngleDeg: smallestAngleDeg(compact.xy, compact.triangles),
    rounds: refined.rounds,
    insertedPoints: refined.insertedPoints,
    badTriangles: refined.badTriangles,
    reentrantCorners: corners.length,
    maxChordSweep: graph.maxChordSweep,
    simplification: reduced?.summary ?? null,
  };
}

/** Drops points no triangle uses and renumbers the rest in first-use order. */
function compactNodes(xy: Float64Array, triangles: Int32Array): { xy: Float64Array; triangles: Int32Array } {
  const map = new Int32Array(xy.length / 2).fill(-1);
  const out: number[] = [];
  const tri = new Int32Array(triangles.length);
  triangles.forEach((v, i) => {
    if ((map[v] ?? outside(map, v)) < 0) {
      map[v] = out.length / 2;
      out.push((xy[2 * v] ?? outside(xy, 2 * v)), (xy[2 * v + 1] ?? outside(xy, 2 * v + 1)));
    }
    tri[i] = map[v] ?? outside(map, v);
  });
  return { xy: Float64Array.from(out), triangles: tri };
}

export function smallestAngleDeg(xy: Float64Array, triangles: Int32Array): number {
  let best = 180;
  for (let t = 0; t < triangles.length; t += 3) {
    for (let k = 0; k < 3; k++) {
      const a = triangles[t + k] ?? outside(triangles, t + k);
      const b = triangles[t + ((k + 1) % 3)] ?? outside(triangles, t + ((k + 1) % 3));
      const c = triangles[t + ((k + 2) % 3)] ?? outside(triangles, t + ((k + 2) % 3));
      const ux = (xy[2 * b] ?? outside(xy, 2 * b)) - (xy[2 * a] ?? outside(xy, 2 * a));
      const uy = (xy[2 * b + 1] ?? outside(xy, 2 * b + 1)) - (xy[2 * a + 1] ?? outside(xy, 2 * a + 1));
      const vx = (xy[2 * c] ?? outside(xy, 2 * c)) - (xy[2 * a] ?? outside(xy, 2 * a));
      const vy = (xy[2 * c + 1] ?? outside(xy, 2 * c + 1)) - (xy[2 * a + 1] ?? outside(xy, 2 * a + 1));
      best = Math.min(best, (Math.atan2(Math.abs(ux * vy - uy * vx), ux * vx + uy * vy) * 180) / Math.PI);
    }
  }
  return best;
}

/** Each triangle split into four by its edge midpoints (shared midpoints are one node). */
export function refineUniform(mesh: Pick<TriangleMesh, 'xy' | 'triangles'>): { xy: Float64Array; triangles: Int32Array } {
  const xy = Array.from(mesh.xy);
  const n = mesh.xy.length / 2;
  const mid = new Map<number, number>();
  const midpoint = (a: number, b: number): number => {
    const key = Math.min(a, b) * n + Math.max(a, b);
    let m = mid.get(key);
    if (m === undefined) {
      m = xy.length / 2;
      xy.push(((xy[2 * a] ?? outside(xy, 2 * a)) + (xy[2 * b] ?? outside(xy, 2 * b))) / 2, ((xy[2 * a + 1] ?? outside(xy, 2 * a + 1)) + (xy[2 * b + 1] ?? outside(xy, 2 * b + 1))) / 2);
      mid.set(key, m);
    }
    return m;
  };
  const tri: number[] = [];
  const t3 = mesh.triangles;
  for (let t = 0; t < t3.length; t += 3) {
    const a = t3[t] ?? outside(t3, t);
    const b = t3[t + 1] ?? outside(t3, t + 1);
    const c = t3[t + 2] ?? outside(t3, t + 2);
    const ab = midpoint(a, b);
    const bc = midpoint(b, c);
    const ca = midpoint(c, a);
    tri.push(a, ab, ca, ab, b, bc, ca, bc, c, ab, bc, ca);
  }
  return { xy: Float64Array.from(xy), triangles: Int32Array.from(tri) };
}
