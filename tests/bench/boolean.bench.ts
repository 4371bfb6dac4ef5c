/**
 * Boolean and composition benches for a built-up section (a W-like I shape with root fillets from
 * core/parts, two cover plates, eight bolt holes through flange and plate), in inches.
 *
 *  boolean-built-up    the adapter (core/geometry): one union of the I shape with both cover plates,
 *                      then one difference with the eight holes; baseline: the same two raw
 *                      polygon-clipping calls on the same flattened input (the ratio is the
 *                      adapter's overhead: flattening, arc restoration, normalisation). Target ≤ 8 ms.
 *  compose-built-up    regionFromDocument on the same document (fast paths + adapter), against the
 *                      adapter-only time above.
 *  compose-20-parts    a 20-part variant (web doubler plates and web holes added), the editor's
 *                      live-recompute case; target ≤ 8 ms; baseline: raw polygon-clipping called
 *                      part by part in document order on the flattened parts.
 */
import polygonClipping, { type MultiPolygon, type Polygon as PcPolygon, type Ring as PcRing } from 'polygon-clipping';
import { newDocument, type Part, type SectionDocument } from '../../core/document/index.ts';
import { DEFAULT_SAGITTA_RATIO, differenceRegions, flattenRing, regionBounds, unionRegions } from '../../core/geometry/index.ts';
import type { Region, Ring } from '../../core/geometry/types.ts';
import { placedPart, regionFromDocument } from '../../core/section/index.ts';
import type { BenchLine } from './report.ts';

/**
 * Median wall times of several functions measured in alternation (a, b, a, b, …), so a change
 * in machine load during the run hits each of them alike; also the median process CPU time,
 * which a crowded machine inflates less than wall time.
 */
function interleavedMedians(fns: readonly (() => unknown)[], runs = 21, warmup = 5): { wall: number; cpu: number }[] {
  for (let i = 0; i < warmup; i++) for (const fn of fns) fn();
  const wall = fns.map(() => [] as number[]);
  const cpu = fns.map(() => [] as number[]);
  for (let i = 0; i < runs; i++) {
    fns.forEach((fn, k) => {
      const c0 = process.cpuUsage();
      const t0 = performance.now();
      fn();
      wall[k]?.push(performance.now() - t0);
      const c = process.cpuUsage(c0);
      cpu[k]?.push((c.user + c.system) / 1000);
    });
  }
  const median = (t: number[]): number => t.sort((a, b) => a - b)[Math.floor(t.length / 2)] ?? Number.NaN;
  return fns.map((_, k) => ({ wall: median(wall[k] ?? []), cpu: median(cpu[k] ?? []) }));
}

const cpuNote = (a: { cpu: number }, b: { cpu: number }): string => `cpu ${a.cpu.toFixed(2)} ms vs ${b.cpu.toFixed(2)} ms`;

let id = 0;
const at = (x: number, y: number) => ({ x, y, rotationDeg: 0, mirror: false });
const base = (name: string, x: number, y: number, operation: 'add' | 'subtract') => ({ id: `p${++id}`, name, placement: at(x, y), operation, material: null, visible: true });
const plate = (name: string, width: number, height: number, x: number, y: number): Part => ({ ...base(name, x, y, 'add'), type: 'rectangle', width, height });
const hole = (name: string, diameter: number, x: number, y: number): Part => ({ ...base(name, x, y, 'subtract'), type: 'circle', diameter });

/** d 14.0, bf 14.5, tw 0.44, tf 0.71 in, root radius 0.6 in; 16 × 3/4 in cover plates; 15/16 in holes. */
function builtUp(extra: boolean): SectionDocument {
  const parts: Part[] = [
    { ...base('girder', 0, 0, 'add'), type: 'shape', shape: 'i-shape', params: { d: 14, bf: 14.5, tw: 0.44, tf: 0.71, r: 0.6 } },
    plate('top cover plate', 16, 0.75, 0, 7.375),
    plate('bottom cover plate', 16, 0.75, 0, -7.375),
  ];
  if (extra) parts.push(plate('left doubler', 0.5, 10, -0.47, 0), plate('right doubler', 0.5, 10, 0.47, 0));
  for (const x of [-5.5, -2.75, 2.75, 5.5]) for (const y of [7, -7]) parts.push(hole(`flange hole ${x},${y}`, 0.9375, x, y));
  if (extra) for (const y of [-4.5, -3, -1.5, 0, 1.5, 3, 4.5]) parts.push(hole(`web hole ${y}`, 0.8125, 0, y));
  return { ...newDocument('in', extra ? 'Trailer frame girder, 20 parts' : 'Cover-plated girder'), parts };
}

interface Placed {
  readonly operation: Part['operation'];
  readonly region: Region;
  readonly name: string;
}

function placedParts(doc: SectionDocument): Placed[] {
  return doc.parts.map((p, i) => {
    const placed = placedPart(p, i, doc.unit);
    if (placed.diagnostics.length > 0) throw new Error(`bench input is invalid: ${placed.diagnostics[0]?.message}`);
    return { operation: p.operation, region: placed.region, name: p.name };
  });
}

/** Union of all add parts, then difference with all subtract parts: two adapter calls. */
function adapterUnionDifference(parts: readonly Placed[]): Region {
  const [first, ...rest] = parts;
  const adds = rest.filter((p) => p.operation === 'add').flatMap((p) => p.region);
  const cuts = parts.filter((p) => p.operation === 'subtract').flatMap((p) => p.region);
  return differenceRegions(unionRegions(first?.region ?? [], adds), cuts);
}

function flatRing(ring: Ring, sagitta: number): PcRing {
  const { xy } = ring.bulge ? flattenRing(ring, sagitta) : ring;
  const out: PcRing = [];
  for (let i = 0; i < xy.length; i += 2) out.push([xy[i] ?? 0, xy[i + 1] ?? 0]);
  out.push([xy[0] ?? 0, xy[1] ?? 0]);
  return out;
}

function flatParts(parts: readonly Placed[], sagitta: number): { operation: Part['operation']; geom: PcPolygon[] }[] {
  return parts.map((p) => ({ operation: p.operation, geom: p.region.map((poly) => [flatRing(poly.outer, sagitta), ...poly.holes.map((h) => flatRing(h, sagitta))]) }));
}

/** The same two operations as raw polygon-clipping calls on the flattened input. */
function rawUnionDifference(flat: ReturnType<typeof flatParts>): MultiPolygon {
  const [first, ...rest] = flat;
  const adds = rest.filter((p) => p.operation === 'add').flatMap((p) => p.geom);
  const cuts = flat.filter((p) => p.operation === 'subtract').flatMap((p) => p.geom);
  return polygonClipping.difference(polygonClipping.union(first?.geom ?? [], adds), cuts);
}

/** Raw polygon-clipping, part by part in document order (what a naive composition would call). */
function rawSequence(flat: ReturnType<typeof flatParts>): MultiPolygon {
  let acc: MultiPolygon = flat[0]?.geom ?? [];
  for (const p of flat.slice(1)) acc = p.operation === 'add' ? polygonClipping.union(acc, p.geom) : polygonClipping.difference(acc, p.geom);
  return acc;
}

function sagittaFor(parts: readonly Placed[]): number {
  const b = regionBounds(parts.flatMap((p) => p.region));
  if (!b) throw new Error('bench input is empty');
  return DEFAULT_SAGITTA_RATIO * Math.max(b.maxX - b.minX, b.maxY - b.minY);
}

const vertexCount = (flat: ReturnType<typeof flatParts>): number => flat.reduce((n, p) => n + p.geom.reduce((m, poly) => m + poly.reduce((k, r) => k + r.length - 1, 0), 0), 0);

export async function bench(): Promise<BenchLine[]> {
  const lines: BenchLine[] = [];
  const doc = builtUp(false);
  const parts = placedParts(doc);
  const flat = flatParts(parts, sagittaFor(parts));
  const composed = regionFromDocument(doc);
  if (composed.diagnostics.length > 0) throw new Error(composed.diagnostics[0]?.message);
  const [adapterT, rawT, composeT] = interleavedMedians([() => adapterUnionDifference(parts), () => rawUnionDifference(flat), () => regionFromDocument(doc)]);
  if (!adapterT || !rawT || !composeT) throw new Error('no timings');
  const adapter = adapterT.wall;
  const raw = rawT.wall;
  const compose = composeT.wall;
  const detail = `${vertexCount(flat)} vertices after flattening, ${parts.length} parts; ${cpuNote(adapterT, rawT)}; target <= 8 ms`;
  lines.push({ name: 'boolean-built-up', value: adapter, unit: 'ms', baseline: raw, baselineUnit: 'ms', ratio: adapter / raw, detail });

  lines.push({ name: 'compose-built-up', value: compose, unit: 'ms', baseline: adapter, baselineUnit: 'ms', ratio: compose / adapter, detail: `${composed.booleanCalls} Boolean call(s), the rest took fast paths; ${cpuNote(composeT, adapterT)}` });

  const doc20 = builtUp(true);
  const parts20 = placedParts(doc20);
  const flat20 = flatParts(parts20, sagittaFor(parts20));
  const composed20 = regionFromDocument(doc20);
  if (composed20.diagnostics.length > 0) throw new Error(composed20.diagnostics[0]?.message);
  const [compose20T, raw20T] = interleavedMedians([() => regionFromDocument(doc20), () => rawSequence(flat20)]);
  if (!compose20T || !raw20T) throw new Error('no timings');
  const compose20 = compose20T.wall;
  const raw20 = raw20T.wall;
  lines.push({ name: 'compose-20-parts', value: compose20, unit: 'ms', baseline: raw20, baselineUnit: 'ms', ratio: compose20 / raw20, detail: `${doc20.parts.length} parts, ${vertexCount(flat20)} vertices flattened, ${composed20.booleanCalls} Boolean call(s); ${cpuNote(compose20T, raw20T)}; target <= 8 ms` });
  return lines;
}
