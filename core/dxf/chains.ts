/**
 * Joining open paths (LINE, ARC, open polylines) into closed loops.
 *
 * Units: drawing units. Tolerance: `tol`, the largest gap closed (import.ts ties it to the
 * drawing's size). Ends that meet exactly are joined as they are; an end within tol of the next
 * is joined too, and the gap is reported with its size and the two entities (the loop keeps the
 * later path's start point, so the earlier segment ends there: it moves by the gap, no more).
 * A point where three or more ends meet is a branch, and a loop that cannot come back to its start
 * is open: both are errors naming the entity and the point, never guessed at.
 * Segments no longer than tol are refused ("zero-length segment"): they would make joining ambiguous.
 * Complexity: ends are found through a hash grid of cell size 2·tol, so joining is O(n).
 */
import { describeRef, type EntityRef, type Path } from './curves.ts';

/** A closed loop: vertices, a bulge per segment, and the entity of each segment. */
export interface Loop {
  readonly xy: number[];
  readonly bulge: number[];
  readonly segmentRefs: EntityRef[];
}

export interface ChainIssue {
  readonly ref: EntityRef;
  readonly message: string;
  readonly at?: readonly [number, number];
}

export interface ChainResult {
  readonly loops: Loop[];
  readonly errors: ChainIssue[];
  /** One line per gap closed (size > 0), naming the two entities. */
  readonly gaps: string[];
  readonly largestGap: number;
}

const fmt = (v: number): string => Number(v.toPrecision(6)).toString();
const pointText = (x: number, y: number): string => `(${fmt(x)}, ${fmt(y)})`;

/** Segment k's length is zero or below tol (k = vertex index of its start). */
function shortSegment(p: Path, tol: number): number {
  const n = p.xy.length / 2;
  const segments = p.closed ? n : n - 1;
  for (let k = 0; k < segments; k++) {
    const j = (k + 1) % n;
    if (Math.hypot((p.xy[2 * j] ?? 0) - (p.xy[2 * k] ?? 0), (p.xy[2 * j + 1] ?? 0) - (p.xy[2 * k + 1] ?? 0)) <= tol) return k;
  }
  return -1;
}

function reversed(p: Path): Path {
  const n = p.xy.length / 2;
  const xy: number[] = [];
  for (let k = n - 1; k >= 0; k--) xy.push(p.xy[2 * k] ?? 0, p.xy[2 * k + 1] ?? 0);
  const bulge = p.bulge.slice().reverse().map((b) => 0 - b);
  return { ...p, xy, bulge };
}

class EndGrid {
  private readonly cells = new Map<string, number[]>();
  constructor(private readonly cell: number) {}
  private key(x: number, y: number): string {
    return `${Math.floor(x / this.cell)},${Math.floor(y / this.cell)}`;
  }
  add(x: number, y: number, id: number): void {
    const k = this.key(x, y);
    const list = this.cells.get(k);
    if (list) list.push(id);
    else this.cells.set(k, [id]);
  }
  near(x: number, y: number): number[] {
    const cx = Math.floor(x / this.cell), cy = Math.floor(y / this.cell);
    const out: number[] = [];
    for (let i = -1; i <= 1; i++) for (let j = -1; j <= 1; j++) out.push(...(this.cells.get(`${cx + i},${cy + j}`) ?? []));
    return out;
  }
}

/** Joins `paths` into loops; closed paths pass through as loops of their own. */
export function joinPaths(paths: readonly Path[], tol: number): ChainResult {
  const out: ChainResult = { loops: [], errors: [], gaps: [], largestGap: 0 };
  const open: Path[] = [];
  for (const p of paths) {
    const k = shortSegment(p, tol);
    if (k >= 0) {
      const x = p.xy[2 * k] ?? 0, y = p.xy[2 * k + 1] ?? 0;
      out.errors.push({ ref: p.ref, at: [x, y], message: `${describeRef(p.ref)}: zero-length segment at ${pointText(x, y)}${p.xy.length > 4 ? ` (vertex ${k + 1})` : ''}: no longer than the joining tolerance ${fmt(tol)}` });
      continue;
    }
    if (p.closed) out.loops.push({ xy: p.xy.slice(), bulge: p.bulge.slice(), segmentRefs: p.bulge.map(() => p.ref) });
    else open.push(p);
  }
  // End ids: 2·i = start of open[i], 2·i + 1 = its end.
  const grid = new EndGrid(Math.max(2 * tol, Number.MIN_VALUE));
  const endPoint = (id: number): [number, number] => {
    const p = open[id >> 1];
    if (!p) return [Number.NaN, Number.NaN];
    const k = (id & 1) === 0 ? 0 : p.xy.length / 2 - 1;
    return [p.xy[2 * k] ?? 0, p.xy[2 * k + 1] ?? 0];
  };
  for (let id = 0; id < 2 * open.length; id++) grid.add(...endPoint(id), id);
  const within = (id: number, x: number, y: number): number => {
    const [ex, ey] = endPoint(id);
    return Math.hypot(ex - x, ey - y);
  };
  // Branches: three or more ends within tol of one point.
  for (let id = 0; id < 2 * open.length; id++) {
    const [x, y] = endPoint(id);
    const meeting = grid.near(x, y).filter((o) => within(o, x, y) <= tol);
    if (meeting.length > 2 && meeting[0] === id) {
      const names = meeting.map((o) => describeRef((open[o >> 1] as Path).ref));
      out.errors.push({ ref: (open[id >> 1] as Path).ref, at: [x, y], message: `${meeting.length} ends meet at ${pointText(x, y)} (${names.join('; ')}): a boundary cannot branch; remove the extra lines` });
    }
  }
  if (out.errors.length > 0) return out;
  const used = new Uint8Array(open.length);
  for (let s = 0; s < open.length; s++) {
    if (used[s] === 1) continue;
    used[s] = 1;
    let current = open[s] as Path;
    const startRef = current.ref;
    const xy = current.xy.slice();
    const bulge = current.bulge.slice();
    const refs = current.bulge.map(() => current.ref);
    for (let guard = 0; guard <= open.length; guard++) {
      const ex = xy[xy.length - 2] ?? 0, ey = xy[xy.length - 1] ?? 0;
      const sx = xy[0] ?? 0, sy = xy[1] ?? 0;
      const candidates = grid.near(ex, ey).filter((o) => used[o >> 1] === 0 && within(o, ex, ey) <= tol);
      const closeGap = Math.hypot(ex - sx, ey - sy);
      if (candidates.length === 0) {
        if (closeGap <= tol && xy.length > 4) {
          recordGap(out, closeGap, current.ref, startRef, ex, ey);
          xy.length -= 2; // the loop's last point is its first
          out.loops.push({ xy, bulge, segmentRefs: refs });
        } else {
          out.errors.push({ ref: current.ref, at: [ex, ey], message: `${describeRef(current.ref)}: the chain that starts at ${describeRef(startRef)} does not close: its open end at ${pointText(ex, ey)} meets no other line or arc within the joining tolerance ${fmt(tol)}` });
        }
        break;
      }
      const next = candidates[0] as number;
      used[next >> 1] = 1;
      const gap = within(next, ex, ey);
      const p = (next & 1) === 0 ? (open[next >> 1] as Path) : reversed(open[next >> 1] as Path);
      recordGap(out, gap, current.ref, p.ref, ex, ey);
      xy.length -= 2; // keep the next path's start point
      xy.push(...p.xy);
      bulge.push(...p.bulge);
      for (let k = 0; k < p.bulge.length; k++) refs.push(p.ref);
      current = p;
    }
  }
  return out;
}

function recordGap(out: ChainResult, gap: number, a: EntityRef, b: EntityRef, x: number, y: number): void {
  if (gap === 0) return;
  (out as { largestGap: number }).largestGap = Math.max(out.largestGap, gap);
  out.gaps.push(`closed a gap of ${fmt(gap)} at ${pointText(x, y)} between ${describeRef(a)} and ${describeRef(b)}`);
}
