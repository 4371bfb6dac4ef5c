/**
 * Element-size field for the mesher: target edge length h(x, y).
 *
 * Local wall thickness is estimated by casting a ray from sample points on every boundary edge
 * along its inward normal to the first boundary edge it meets (shared edges between touching
 * parts are interior and ignored). A sample of thickness t asks for h = t / layers; a piece of
 * material area A asks for h ≤ √A / compactDivisions everywhere in its bounding box; sharp
 * re-entrant corners ask for h / cornerRefinement at the corner (docs/methods.md §7.8: grade ×2–4 finer
 * there). The field is the Lipschitz envelope min_s (h_s + grading · |x − x_s|) on a background
 * grid, computed with a two-pass chamfer sweep (8 neighbours; ≤ 8 % anisotropy, conservative).
 * Cost: ray casting is O(samples × edges); the grid has at most ~40 000 cells.
 */
import type { PlanarGraph } from './planar-input.ts';
import { outside } from '../invariant.ts';

export interface SizeFieldSettings {
  readonly layers: number;
  readonly compactDivisions: number;
  readonly cornerRefinement: number;
  readonly grading: number;
}

export interface SizeField {
  readonly at: (x: number, y: number) => number;
  readonly smallest: number;
}

interface Grid {
  readonly x0: number;
  readonly y0: number;
  readonly cell: number;
  readonly nx: number;
  readonly ny: number;
  readonly h: Float64Array;
}

/** Boundary edges oriented with the material on their left, as [a, b] point pairs. */
export function orientedBoundary(g: PlanarGraph): [number, number][] {
  const out: [number, number][] = [];
  g.segNet.forEach((net, s) => {
    const a = g.segA[s] ?? outside(g.segA, s);
    const b = g.segB[s] ?? outside(g.segB, s);
    if (net > 0) out.push([a, b]);
    else if (net < 0) out.push([b, a]);
  });
  return out;
}

/** Distance along the ray (px, py) + s (nx, ny), s > 0, to the nearest boundary edge. */
function rayThickness(xy: readonly number[], edges: readonly [number, number][], skip: number, px: number, py: number, nx: number, ny: number): number {
  let best = Infinity;
  edges.forEach(([a, b], e) => {
    if (e === skip) return;
    const ax = (xy[2 * a] ?? outside(xy, 2 * a)) - px;
    const ay = (xy[2 * a + 1] ?? outside(xy, 2 * a + 1)) - py;
    const ex = (xy[2 * b] ?? outside(xy, 2 * b)) - (xy[2 * a] ?? outside(xy, 2 * a));
    const ey = (xy[2 * b + 1] ?? outside(xy, 2 * b + 1)) - (xy[2 * a + 1] ?? outside(xy, 2 * a + 1));
    // Solve s·n = A + u·E  →  Cramer's rule on [n, −E].
    const det = -nx * ey + ny * ex;
    if (det === 0) return;
    const s = (-ax * ey + ay * ex) / det;
    const u = (nx * ay - ny * ax) / det;
    if (s > 0 && s < best && u >= 0 && u <= 1) best = s;
  });
  return best;
}

interface Sample {
  readonly x: number;
  readonly y: number;
  readonly h: number;
}

function thicknessSamples(g: PlanarGraph, edges: readonly [number, number][], layers: number): Sample[] {
  const spacing = g.diagonal / 40;
  const out: Sample[] = [];
  edges.forEach(([a, b], e) => {
    const ax = g.xy[2 * a] ?? outside(g.xy, 2 * a);
    const ay = g.xy[2 * a + 1] ?? outside(g.xy, 2 * a + 1);
    const dx = (g.xy[2 * b] ?? outside(g.xy, 2 * b)) - ax;
    const dy = (g.xy[2 * b + 1] ?? outside(g.xy, 2 * b + 1)) - ay;
    const len = Math.hypot(dx, dy);
    const m = Math.min(64, Math.max(1, Math.ceil(len / spacing)));
    for (let k = 0; k < m; k++) {
      const u = (k + 0.5) / m;
      const px = ax + u * dx;
      const py = ay + u * dy;
      const t = rayThickness(g.xy, edges, e, px, py, -dy / len, dx / len);
      if (Number.isFinite(t)) out.push({ x: px - (dy / len) * (t / 2), y: py + (dx / len) * (t / 2), h: t / layers });
    }
  });
  return out;
}

function emptyGrid(g: PlanarGraph, finest: number): Grid {
  let xmin = Infinity;
  let ymin = Infinity;
  let xmax = -Infinity;
  let ymax = -Infinity;
  for (const p of g.pieces) {
    xmin = Math.min(xmin, p.box[0]);
    ymin = Math.min(ymin, p.box[1]);
    xmax = Math.max(xmax, p.box[2]);
    ymax = Math.max(ymax, p.box[3]);
  }
  const w = xmax - xmin;
  const hgt = ymax - ymin;
  // Cells about the finest requested size, and no more than ~40 000 of them (values are
  // minima over a cell, so a coarser grid only errs towards smaller elements).
  const cell = Math.max(finest, Math.sqrt((w * hgt) / 40_000), g.diagonal / 1000);
  const nx = Math.ceil(w / cell) + 3;
  const ny = Math.ceil(hgt / cell) + 3;
  return { x0: xmin - cell, y0: ymin - cell, cell, nx, ny, h: new Float64Array(nx * ny).fill(Infinity) };
}

const cellOf = (grid: Grid, x: number, y: number): number => {
  const i = Math.min(grid.nx - 1, Math.max(0, Math.floor((x - grid.x0) / grid.cell)));
  const j = Math.min(grid.ny - 1, Math.max(0, Math.floor((y - grid.y0) / grid.cell)));
  return j * grid.nx + i;
};

function splat(grid: Grid, x: number, y: number, h: number): void {
  const c = cellOf(grid, x, y);
  if (h < (grid.h[c] ?? outside(grid.h, c))) grid.h[c] = h;
}

/** Two chamfer passes: h ← min(h, h_neighbour + grading · distance). */
function sweep(grid: Grid, grading: number): void {
  const { nx, ny, h } = grid;
  const d1 = grading * grid.cell;
  const d2 = d1 * Math.SQRT2;
  const relax = (c: number, n: number, d: number): void => {
    const v = (h[n] ?? outside(h, n)) + d;
    if (v < (h[c] ?? outside(h, c))) h[c] = v;
  };
  for (let j = 0; j < ny; j++) {
    for (let i = 0; i < nx; i++) {
      const c = j * nx + i;
      if (i > 0) relax(c, c - 1, d1);
      if (j > 0) {
        relax(c, c - nx, d1);
        if (i > 0) relax(c, c - nx - 1, d2);
        if (i < nx - 1) relax(c, c - nx + 1, d2);
      }
    }
  }
  for (let j = ny - 1; j >= 0; j--) {
    for (let i = nx - 1; i >= 0; i--) {
      const c = j * nx + i;
      if (i < nx - 1) relax(c, c + 1, d1);
      if (j < ny - 1) {
        relax(c, c + nx, d1);
        if (i < nx - 1) relax(c, c + nx + 1, d2);
        if (i > 0) relax(c, c + nx - 1, d2);
      }
    }
  }
}

export function sizeFieldOf(g: PlanarGraph, corners: readonly number[], s: SizeFieldSettings): SizeField {
  const edges = orientedBoundary(g);
  const samples = thicknessSamples(g, edges, s.layers);
  let finest = Infinity;
  for (const p of samples) finest = Math.min(finest, p.h);
  const caps = g.pieces.map((p) => Math.sqrt(p.area) / s.compactDivisions);
  for (const c of caps) finest = Math.min(finest, c);
  const grid = emptyGrid(g, finest / s.cornerRefinement);
  for (const p of samples) splat(grid, p.x, p.y, p.h);
  g.pieces.forEach((p, k) => capBox(grid, p.box, (caps[k] ?? outside(caps, k))));
  sweep(grid, s.grading);
  if (corners.length > 0 && s.cornerRefinement > 1) {
    for (const v of corners) {
      const x = g.xy[2 * v] ?? outside(g.xy, 2 * v);
      const y = g.xy[2 * v + 1] ?? outside(g.xy, 2 * v + 1);
      splat(grid, x, y, (grid.h[cellOf(grid, x, y)] ?? outside(grid.h, cellOf(grid, x, y))) / s.cornerRefinement);
    }
    sweep(grid, s.grading);
  }
  let smallest = Infinity;
  for (const v of grid.h) smallest = Math.min(smallest, v);
  return { at: (x, y) => (grid.h[cellOf(grid, x, y)] ?? outside(grid.h, cellOf(grid, x, y))), smallest };
}

function capBox(grid: Grid, box: readonly [number, number, number, number], cap: number): void {
  const c0 = cellOf(grid, box[0], box[1]);
  const c1 = cellOf(grid, box[2], box[3]);
  const i0 = c0 % grid.nx;
  const j0 = Math.floor(c0 / grid.nx);
  const i1 = c1 % grid.nx;
  const j1 = Math.floor(c1 / grid.nx);
  for (let j = j0; j <= j1; j++) {
    for (let i = i0; i <= i1; i++) {
      const c = j * grid.nx + i;
      if (cap < (grid.h[c] ?? outside(grid.h, c))) grid.h[c] = cap;
    }
  }
}

/** Boundary vertices where the material's interior angle exceeds 190° (sharp re-entrant corners). */
export function reentrantCorners(g: PlanarGraph): number[] {
  const edges = orientedBoundary(g);
  const n = g.xy.length / 2;
  const incoming = new Int32Array(n).fill(-1);
  const outgoing = new Int32Array(n).fill(-1);
  const degree = new Int32Array(n);
  edges.forEach(([a, b], e) => {
    outgoing[a] = e;
    incoming[b] = e;
    degree[a] = (degree[a] ?? outside(degree, a)) + 1;
    degree[b] = (degree[b] ?? outside(degree, b)) + 1;
  });
  const out: number[] = [];
  const limit = (10 * Math.PI) / 180;
  for (let v = 0; v < n; v++) {
    const ein = edges[(incoming[v] ?? outside(incoming, v))];
    const eout = edges[(outgoing[v] ?? outside(outgoing, v))];
    if (degree[v] !== 2 || !ein || !eout) continue;
    const ux = (g.xy[2 * v] ?? outside(g.xy, 2 * v)) - (g.xy[2 * ein[0]] ?? outside(g.xy, 2 * ein[0]));
    const uy = (g.xy[2 * v + 1] ?? outside(g.xy, 2 * v + 1)) - (g.xy[2 * ein[0] + 1] ?? outside(g.xy, 2 * ein[0] + 1));
    const wx = (g.xy[2 * eout[1]] ?? outside(g.xy, 2 * eout[1])) - (g.xy[2 * v] ?? outside(g.xy, 2 * v));
    const wy = (g.xy[2 * eout[1] + 1] ?? outside(g.xy, 2 * eout[1] + 1)) - (g.xy[2 * v + 1] ?? outside(g.xy, 2 * v + 1));
    // A right turn (clockwise) with material on the left is a re-entrant corner.
    if (Math.atan2(ux * wy - uy * wx, ux * wx + uy * wy) < -limit) out.push(v);
  }
  return out;
}
