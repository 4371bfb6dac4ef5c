/**
 * Test helpers for core/properties: building normalised regions (outer CCW, holes CW), reading
 * tests/fixtures/analytic_refs.csv, ring transforms, and relative comparison.
 */
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import Papa from 'papaparse';
import { expect } from 'vitest';
import type { Polygon, Region, Ring } from '../../core/geometry/types.ts';

export interface RefRow {
  readonly case: string;
  readonly params: string;
  readonly quantity: string;
  readonly value: number;
  readonly source: string;
}

/** Rows of tests/fixtures/analytic_refs.csv (copied from the shared reference with the source column). */
export function analyticRefs(): readonly RefRow[] {
  const text = readFileSync(join(import.meta.dirname, '../fixtures/analytic_refs.csv'), 'utf8');
  const parsed = Papa.parse<Record<string, string>>(text, { header: true, skipEmptyLines: true });
  if (parsed.errors.length > 0) throw new Error(`analytic_refs.csv: ${parsed.errors[0]?.message}`);
  return parsed.data.map((r) => ({
    case: r.case ?? '',
    params: r.params ?? '',
    quantity: r.quantity ?? '',
    value: Number(r.value),
    source: r.source ?? '',
  }));
}

/** The reference value of (case, quantity); throws if the row is missing. */
export function ref(rows: readonly RefRow[], caseName: string, quantity: string): number {
  const row = rows.find((r) => r.case === caseName && r.quantity === quantity);
  if (!row) throw new Error(`analytic_refs.csv has no row ${caseName}/${quantity}`);
  return row.value;
}

/** |actual − expected| ≤ tol · max(|expected|, scale). */
export function expectRel(actual: number, expected: number, tol: number, scale = 0): void {
  const bound = tol * Math.max(Math.abs(expected), scale);
  const err = Math.abs(actual - expected);
  if (!(err <= bound)) {
    expect.fail(`expected ${expected}, got ${actual} (error ${err.toExponential(3)} > ${bound.toExponential(3)})`);
  }
}

export function ring(points: readonly number[], bulges?: readonly number[]): Ring {
  return { xy: Float64Array.from(points), bulge: bulges ? Float64Array.from(bulges) : undefined };
}

export function poly(outer: Ring, ...holes: Ring[]): Polygon {
  return { outer, holes };
}

/** Axis-aligned rectangle, counter-clockwise. */
export function rectRing(x0: number, y0: number, x1: number, y1: number): Ring {
  return ring([x0, y0, x1, y0, x1, y1, x0, y1]);
}

/** Circle as two semicircular arcs (bulge 1, CCW); a hole when cw is true. */
export function circleRing(cx: number, cy: number, r: number, cw = false): Ring {
  return cw ? ring([cx + r, cy, cx - r, cy], [-1, -1]) : ring([cx + r, cy, cx - r, cy], [1, 1]);
}

/** The same ring run backwards: vertex order reversed, bulges moved with their segments and negated. */
export function reverseRing(r: Ring): Ring {
  const n = r.xy.length >> 1;
  const xy = new Float64Array(2 * n);
  const bulge = r.bulge ? new Float64Array(n) : undefined;
  for (let k = 0; k < n; k++) {
    const v = (n - k) % n; // w_k = v_{(n−k) mod n}
    xy[2 * k] = r.xy[2 * v]!;
    xy[2 * k + 1] = r.xy[2 * v + 1]!;
    // Segment k runs v_{n−k} → v_{n−k−1}: the original segment n−k−1, reversed.
    if (bulge && r.bulge) bulge[k] = -r.bulge[(n - k - 1 + n) % n]!;
  }
  return { xy, bulge };
}

/** Applies an affine map to every vertex; bulges are kept (valid for rotations and translations). */
export function mapRing(r: Ring, f: (x: number, y: number) => [number, number]): Ring {
  const xy = new Float64Array(r.xy.length);
  for (let i = 0; i < xy.length; i += 2) {
    const [x, y] = f(r.xy[i]!, r.xy[i + 1]!);
    xy[i] = x;
    xy[i + 1] = y;
  }
  return { xy, bulge: r.bulge ? Float64Array.from(r.bulge) : undefined };
}

export function mapRegion(region: Region, f: (r: Ring) => Ring): Region {
  return region.map((p) => ({ outer: f(p.outer), holes: p.holes.map(f) }));
}

/** Mirror x → −x, then reverse every ring so outer rings stay CCW (bulges: mirrored arcs flip, reversal flips back). */
export function mirrorRegionX(region: Region): Region {
  const mirror = (r: Ring): Ring => {
    const m = mapRing(r, (x, y) => [-x, y]);
    return reverseRing({ xy: m.xy, bulge: m.bulge ? m.bulge.map((b) => -b) : undefined });
  };
  return mapRegion(region, mirror);
}

/** Deterministic pseudo-random numbers (mulberry32) for plain loops outside fast-check. */
export function seededRandom(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}
