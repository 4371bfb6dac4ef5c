/**
 * Exact-arithmetic oracle: the polygon sums of docs/methods.md §1.1 evaluated here in BigInt rationals
 * (independent of the engine) for random star-shaped integer polygons, some with holes, and for
 * the same polygons translated 1e6 away and scaled by 1e−4 (compared with the exact rational of
 * the transformed double-precision input). Engine vs exact: 1e−12 relative (docs/methods.md §11).
 */
import { describe, it } from 'vitest';
import { sectionProperties } from '../../core/properties/index.ts';
import type { Region } from '../../core/geometry/types.ts';
import { expectRel, poly, ring, seededRandom } from './helpers.ts';

/** Exact rational n/d with BigInt, d > 0. */
class Q {
  readonly n: bigint;
  readonly d: bigint;
  constructor(n: bigint, d: bigint = 1n) {
    if (d === 0n) throw new Error('zero denominator');
    const s = d < 0n ? -1n : 1n;
    const g = gcd(n < 0n ? -n : n, d < 0n ? -d : d) || 1n;
    this.n = (s * n) / g;
    this.d = (s * d) / g;
  }
  add(o: Q): Q { return new Q(this.n * o.d + o.n * this.d, this.d * o.d); }
  sub(o: Q): Q { return new Q(this.n * o.d - o.n * this.d, this.d * o.d); }
  mul(o: Q): Q { return new Q(this.n * o.n, this.d * o.d); }
  div(o: Q): Q { return new Q(this.n * o.d, this.d * o.n); }
  /** Nearest double (to ~1 ulp): scale so that numerator and denominator fit comfortably. */
  toNumber(): number {
    let n = this.n, d = this.d;
    const bits = (v: bigint) => (v < 0n ? -v : v).toString(2).length;
    const shift = Math.max(bits(n), bits(d)) - 900;
    if (shift > 0) { n >>= BigInt(shift); d >>= BigInt(shift); }
    return Number(n) / Number(d);
  }
}
function gcd(a: bigint, b: bigint): bigint {
  while (b !== 0n) [a, b] = [b, a % b];
  return a;
}

/** Exact rational of a finite double. */
function exactOf(x: number): Q {
  if (x === 0) return new Q(0n);
  let k = 0;
  let m = x;
  while (!Number.isInteger(m)) { m *= 2; k++; } // multiplying by 2 is exact
  return new Q(BigInt(m), 1n << BigInt(k));
}

interface ExactProps { A: Q; cx: Q; cy: Q; Ix: Q; Iy: Q; Ixy: Q }

/** docs/methods.md §1.1 vertex sums over rings of exact vertices, then §1.2 to the centroid, all exact. */
function exactProps(rings: readonly (readonly Q[])[]): ExactProps {
  let a = new Q(0n), qx = new Q(0n), qy = new Q(0n), ixx = new Q(0n), iyy = new Q(0n), ixy = new Q(0n);
  const two = new Q(2n);
  for (const r of rings) {
    const n = r.length / 2;
    for (let i = 0; i < n; i++) {
      const j = (i + 1) % n;
      const x0 = r[2 * i]!, y0 = r[2 * i + 1]!, x1 = r[2 * j]!, y1 = r[2 * j + 1]!;
      const c = x0.mul(y1).sub(x1.mul(y0));
      a = a.add(c);
      qx = qx.add(y0.add(y1).mul(c));
      qy = qy.add(x0.add(x1).mul(c));
      ixx = ixx.add(y0.mul(y0).add(y0.mul(y1)).add(y1.mul(y1)).mul(c));
      iyy = iyy.add(x0.mul(x0).add(x0.mul(x1)).add(x1.mul(x1)).mul(c));
      ixy = ixy.add(x0.mul(y1).add(two.mul(x0).mul(y0)).add(two.mul(x1).mul(y1)).add(x1.mul(y0)).mul(c));
    }
  }
  const A = a.div(new Q(2n));
  const Qx = qx.div(new Q(6n));
  const Qy = qy.div(new Q(6n));
  const cx = Qy.div(A);
  const cy = Qx.div(A);
  return {
    A,
    cx,
    cy,
    Ix: ixx.div(new Q(12n)).sub(A.mul(cy).mul(cy)),
    Iy: iyy.div(new Q(12n)).sub(A.mul(cx).mul(cx)),
    Ixy: ixy.div(new Q(24n)).sub(A.mul(cx).mul(cy)),
  };
}

/**
 * A star-shaped polygon about an integer centre: vertex offsets at increasing angles (gaps < π),
 * integer radii; outer offsets are multiples of 4 so that the hole (offsets / 4, reversed = CW)
 * is exactly the outer scaled by 1/4 about the centre and lies strictly inside it.
 */
function randomStar(rand: () => number, withHole: boolean): number[][] {
  for (;;) {
    const n = 3 + Math.floor(rand() * 30);
    const angles = Array.from({ length: n }, () => rand() * 2 * Math.PI).sort((p, q) => p - q);
    const gaps = angles.map((t, i) => (i + 1 < n ? angles[i + 1]! : angles[0]! + 2 * Math.PI) - t);
    if (Math.max(...gaps) >= Math.PI * 0.95) continue;
    const cx = Math.floor(rand() * 2000) - 1000;
    const cy = Math.floor(rand() * 2000) - 1000;
    const off: number[] = [];
    for (const t of angles) {
      const r = 20 + rand() * 400;
      off.push(4 * Math.round((r * Math.cos(t)) / 4), 4 * Math.round((r * Math.sin(t)) / 4));
    }
    // Rounding may reorder angles or collapse vertices: keep only strictly increasing angles around the centre.
    const ang = (k: number) => Math.atan2(off[2 * k + 1]!, off[2 * k]!);
    let ok = true;
    for (let k = 0; k < n; k++) {
      const d = (((ang((k + 1) % n) - ang(k)) % (2 * Math.PI)) + 2 * Math.PI) % (2 * Math.PI);
      if (!(d > 1e-9 && d < Math.PI * 0.99)) ok = false;
    }
    if (!ok) continue;
    const outer = off.flatMap((v, i) => (i % 2 === 0 ? cx + v : cy + v));
    if (!withHole) return [outer];
    const hole: number[] = [];
    for (let k = n - 1; k >= 0; k--) hole.push(cx + off[2 * k]! / 4, cy + off[2 * k + 1]! / 4);
    return [outer, hole];
  }
}

function regionOf(rings: number[][]): Region {
  const [outer, ...holes] = rings;
  return [poly(ring(outer!), ...holes.map((h) => ring(h)))];
}

function compare(rings: number[][], tol: number): void {
  const exact = exactProps(rings.map((r) => r.map(exactOf)));
  const p = sectionProperties(regionOf(rings));
  const scaleI = Math.max(exact.Ix.toNumber(), exact.Iy.toNumber());
  const size = Math.sqrt(exact.A.toNumber());
  expectRel(p.area, exact.A.toNumber(), tol);
  expectRel(p.cx, exact.cx.toNumber(), tol, size);
  expectRel(p.cy, exact.cy.toNumber(), tol, size);
  expectRel(p.Ix, exact.Ix.toNumber(), tol);
  expectRel(p.Iy, exact.Iy.toNumber(), tol);
  expectRel(p.Ixy, exact.Ixy.toNumber(), tol, scaleI);
}

describe('random integer star polygons against exact BigInt rational sums (seed 20261201)', () => {
  const rand = seededRandom(20261201);
  const cases = Array.from({ length: 40 }, (_, i) => randomStar(rand, i % 2 === 1));
  it('A, centroid, Ix, Iy, Ixy agree to 1e-12 relative for 40 polygons (20 with a hole)', () => {
    for (const rings of cases) compare(rings, 1e-12);
  });
  it('translated by (1e6, −1e6) and scaled by 1e-4: agree with the exact rational of the transformed input to 1e-12', () => {
    for (const rings of cases) {
      const moved = rings.map((r) => r.map((v, i) => (v + (i % 2 === 0 ? 1e6 : -1e6)) * 1e-4));
      compare(moved, 1e-12);
    }
  });
  it('the oracle itself reproduces a closed form: right triangle legs 120, 90 gives Ixy = −b²h²/72 exactly (Gere & Timoshenko)', () => {
    const e = exactProps([[0, 0, 120, 0, 0, 90].map((v) => new Q(BigInt(v)))]);
    if (e.Ixy.n !== BigInt(-(120 ** 2) * 90 ** 2) / 72n || e.Ixy.d !== 1n) throw new Error(`oracle Ixy ${e.Ixy.n}/${e.Ixy.d}`);
  });
});
