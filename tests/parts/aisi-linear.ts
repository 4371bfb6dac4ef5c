/**
 * The AISI linear method (AISI S100; AISI Cold-Formed Steel Design Manual, Part I): a
 * cold-formed section as its mid-thickness line, each bend a circular arc of centreline radius
 * R + t/2, every property t times a line integral. Exact calculus on straight segments and arcs,
 * written for the tests independently of core/parts/cold-formed.ts.
 */
export type P = readonly [number, number];

interface LineProps {
  readonly length: number;
  readonly sx: number; // ∫x ds
  readonly sy: number;
  readonly sxx: number; // ∫x² ds
  readonly syy: number;
  readonly sxy: number;
}

const add = (a: LineProps, b: LineProps): LineProps => ({ length: a.length + b.length, sx: a.sx + b.sx, sy: a.sy + b.sy, sxx: a.sxx + b.sxx, syy: a.syy + b.syy, sxy: a.sxy + b.sxy });
const ZERO: LineProps = { length: 0, sx: 0, sy: 0, sxx: 0, syy: 0, sxy: 0 };

/** Line integrals of a straight segment a → b (exact). */
function straight(a: P, b: P): LineProps {
  const l = Math.hypot(b[0] - a[0], b[1] - a[1]);
  return {
    length: l,
    sx: (l * (a[0] + b[0])) / 2,
    sy: (l * (a[1] + b[1])) / 2,
    sxx: (l * (a[0] ** 2 + a[0] * b[0] + b[0] ** 2)) / 3,
    syy: (l * (a[1] ** 2 + a[1] * b[1] + b[1] ** 2)) / 3,
    sxy: (l * (2 * a[0] * a[1] + a[0] * b[1] + b[0] * a[1] + 2 * b[0] * b[1])) / 6,
  };
}

/** Line integrals of the arc of centre c, radius r, from φ1 to φ2 (exact calculus). */
function arc(c: P, r: number, p1: number, p2: number): LineProps {
  const [xc, yc] = c;
  const d = p2 - p1;
  const S = Math.cos(p1) - Math.cos(p2); // ∫sin
  const C = Math.sin(p2) - Math.sin(p1); // ∫cos
  const SS = d / 2 - (Math.sin(2 * p2) - Math.sin(2 * p1)) / 4; // ∫sin²
  const CC = d / 2 + (Math.sin(2 * p2) - Math.sin(2 * p1)) / 4; // ∫cos²
  const SC = (Math.sin(p2) ** 2 - Math.sin(p1) ** 2) / 2; // ∫sin·cos
  return {
    length: r * d,
    sx: r * (xc * d + r * C),
    sy: r * (yc * d + r * S),
    sxx: r * (xc * xc * d + 2 * xc * r * C + r * r * CC),
    syy: r * (yc * yc * d + 2 * yc * r * S + r * r * SS),
    sxy: r * (xc * yc * d + xc * r * S + yc * r * C + r * r * SC),
  };
}

interface Bend {
  readonly centre: P;
  readonly from: number;
  readonly to: number;
}

/**
 * The linear method on a sharp-cornered mid-line path with every corner bent at centreline radius
 * rc: flats between tangent points, arcs at the corners. Returns the line integrals and the bends.
 */
export function midLine(path: readonly P[], rc: number): { line: LineProps; bends: Bend[] } {
  let line = ZERO;
  const bends: Bend[] = [];
  let start: P = path[0]!;
  for (let i = 1; i < path.length; i++) {
    const at = path[i]!;
    if (i === path.length - 1) {
      line = add(line, straight(start, at));
      break;
    }
    const prev = path[i - 1]!;
    const next = path[i + 1]!;
    const u = [at[0] - prev[0], at[1] - prev[1]] as const;
    const v = [next[0] - at[0], next[1] - at[1]] as const;
    const lu = Math.hypot(u[0], u[1]);
    const lv = Math.hypot(v[0], v[1]);
    const turn = Math.atan2(u[0] * v[1] - u[1] * v[0], u[0] * v[0] + u[1] * v[1]);
    const back = rc * Math.tan(Math.abs(turn) / 2);
    const t1: P = [at[0] - (back * u[0]) / lu, at[1] - (back * u[1]) / lu];
    const t2: P = [at[0] + (back * v[0]) / lv, at[1] + (back * v[1]) / lv];
    line = add(line, straight(start, t1));
    // The centre lies rc from t1, to the side the path turns to.
    const s = Math.sign(turn);
    const centre: P = [t1[0] - (s * rc * u[1]) / lu, t1[1] + (s * rc * u[0]) / lu];
    const p1 = Math.atan2(t1[1] - centre[1], t1[0] - centre[0]);
    const p2 = p1 + turn;
    line = add(line, arc(centre, rc, Math.min(p1, p2), Math.max(p1, p2)));
    bends.push({ centre, from: Math.min(p1, p2), to: Math.max(p1, p2) });
    start = t2;
  }
  return { line, bends };
}

/** Centroidal A, Ix, Iy, Ixy by the linear method (t × line integrals). */
export function linearMethod(line: LineProps, t: number): { A: number; cx: number; cy: number; Ix: number; Iy: number; Ixy: number } {
  const A = t * line.length;
  const cx = line.sx / line.length;
  const cy = line.sy / line.length;
  return { A, cx, cy, Ix: t * line.syy - A * cy * cy, Iy: t * line.sxx - A * cx * cx, Ixy: t * line.sxy - A * cx * cy };
}

