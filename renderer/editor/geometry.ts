/**
 * Editor geometry in SECTION coordinates (x right, y up, document unit): part placement,
 * outlines flattened for drawing, hit testing and snapping. This is presentation geometry only;
 * the numbers people read come from core/section, never from here.
 */
import type { Part, Placement, SectionDocument } from '../../core/document/types.ts';

export type Vec = readonly [number, number];

export interface OutlineRing {
  readonly points: readonly Vec[];
  readonly hole: boolean;
}

export interface PartOutline {
  readonly partId: string;
  readonly rings: readonly OutlineRing[];
  /** Corner and centre points worth snapping to, world coordinates. */
  readonly vertices: readonly Vec[];
  readonly centre: Vec;
  /** Exact circle in world coordinates (drawn as a true circle), when the part is one. */
  readonly circle?: { readonly cx: number; readonly cy: number; readonly r: number };
}

export interface Box {
  readonly xMin: number;
  readonly yMin: number;
  readonly xMax: number;
  readonly yMax: number;
}

/** Local → world: mirror x → −x, then rotate CCW, then translate (core/document/types.ts). */
export function toWorld(placement: Placement, p: Vec): Vec {
  const x = placement.mirror ? -p[0] : p[0];
  const a = (placement.rotationDeg * Math.PI) / 180;
  const c = Math.cos(a);
  const s = Math.sin(a);
  return [placement.x + c * x - s * p[1], placement.y + s * x + c * p[1]];
}

/** World → local, the exact inverse of toWorld. */
export function toLocal(placement: Placement, p: Vec): Vec {
  const dx = p[0] - placement.x;
  const dy = p[1] - placement.y;
  const a = (placement.rotationDeg * Math.PI) / 180;
  const c = Math.cos(a);
  const s = Math.sin(a);
  const x = c * dx + s * dy;
  const y = -s * dx + c * dy;
  return [placement.mirror ? -x : x, y];
}

/** Points along a ring with DXF bulges, arcs split into short chords for drawing only. */
export function flattenRing(points: readonly Vec[], bulges: readonly number[] | undefined): Vec[] {
  const out: Vec[] = [];
  for (let i = 0; i < points.length; i++) {
    const p = points[i] as Vec;
    const q = points[(i + 1) % points.length] as Vec;
    out.push(p);
    const b = bulges?.[i] ?? 0;
    if (b === 0) continue;
    // Arc through p and q with sweep 4·atan(b); sampled every ≤ 6°.
    const sweep = 4 * Math.atan(b);
    const chord = Math.hypot(q[0] - p[0], q[1] - p[1]);
    if (chord === 0) continue;
    const radius = chord / (2 * Math.sin(Math.abs(sweep) / 2));
    const mx = (p[0] + q[0]) / 2;
    const my = (p[1] + q[1]) / 2;
    const h = radius * Math.cos(Math.abs(sweep) / 2) * Math.sign(b);
    const nx = -(q[1] - p[1]) / chord;
    const ny = (q[0] - p[0]) / chord;
    const cx = mx + nx * h;
    const cy = my + ny * h;
    const a0 = Math.atan2(p[1] - cy, p[0] - cx);
    const steps = Math.max(2, Math.ceil(Math.abs(sweep) / (Math.PI / 30)));
    for (let k = 1; k < steps; k++) {
      const a = a0 + (sweep * k) / steps;
      out.push([cx + radius * Math.cos(a), cy + radius * Math.sin(a)]);
    }
  }
  return out;
}

function rectangleCorners(width: number, height: number): Vec[] {
  const w = width / 2;
  const h = height / 2;
  return [[-w, -h], [w, -h], [w, h], [-w, h]];
}

/** Local rings of a part before placement; shape parts are resolved by the caller-supplied resolver. */
export type ShapeRingResolver = (part: Extract<Part, { type: 'shape' }>) => readonly { points: Vec[]; hole: boolean }[];

function localRings(part: Part, resolveShape: ShapeRingResolver | undefined): { points: Vec[]; hole: boolean }[] {
  switch (part.type) {
    case 'rectangle':
      return [{ points: rectangleCorners(part.width, part.height), hole: false }];
    case 'circle': {
      const r = part.diameter / 2;
      return [{ points: flattenRing([[r, 0], [-r, 0]], [1, 1]), hole: false }];
    }
    case 'polygon':
      return [
        { points: flattenRing(part.outer, part.outerBulges), hole: false },
        ...part.holes.map((h, i) => ({ points: flattenRing(h, part.holeBulges?.[i]), hole: true })),
      ];
    case 'shape':
      return resolveShape ? resolveShape(part).map((r) => ({ points: [...r.points], hole: r.hole })) : [];
  }
}

function localVertices(part: Part): Vec[] {
  switch (part.type) {
    case 'rectangle':
      return rectangleCorners(part.width, part.height);
    case 'circle': {
      const r = part.diameter / 2;
      return [[r, 0], [0, r], [-r, 0], [0, -r]];
    }
    case 'polygon':
      return [...part.outer, ...part.holes.flat()];
    case 'shape':
      return [];
  }
}

export function partOutline(part: Part, resolveShape?: ShapeRingResolver): PartOutline {
  const rings = localRings(part, resolveShape).map((r) => ({
    hole: r.hole,
    points: r.points.map((p) => toWorld(part.placement, p)),
  }));
  const local = localVertices(part);
  const vertices = (part.type === 'shape' ? rings.flatMap((r) => r.points) : local.map((p) => toWorld(part.placement, p)));
  const centre: Vec = [part.placement.x, part.placement.y];
  const base = { partId: part.id, rings, vertices, centre };
  return part.type === 'circle' ? { ...base, circle: { cx: centre[0], cy: centre[1], r: part.diameter / 2 } } : base;
}

export function documentOutlines(doc: SectionDocument, resolveShape?: ShapeRingResolver): PartOutline[] {
  return doc.parts.map((p) => partOutline(p, resolveShape));
}

export function outlineBox(outlines: readonly PartOutline[]): Box | null {
  let xMin = Infinity;
  let yMin = Infinity;
  let xMax = -Infinity;
  let yMax = -Infinity;
  for (const o of outlines) {
    for (const r of o.rings) {
      for (const [x, y] of r.points) {
        xMin = Math.min(xMin, x);
        yMin = Math.min(yMin, y);
        xMax = Math.max(xMax, x);
        yMax = Math.max(yMax, y);
      }
    }
  }
  return xMin <= xMax ? { xMin, yMin, xMax, yMax } : null;
}

/** Even-odd point in ring test (ray casting). */
export function pointInRing(p: Vec, ring: readonly Vec[]): boolean {
  let inside = false;
  for (let i = 0, j = ring.length - 1; i < ring.length; j = i++) {
    const a = ring[i] as Vec;
    const b = ring[j] as Vec;
    if (a[1] > p[1] !== b[1] > p[1] && p[0] < ((b[0] - a[0]) * (p[1] - a[1])) / (b[1] - a[1]) + a[0]) inside = !inside;
  }
  return inside;
}

export function distanceToSegment(p: Vec, a: Vec, b: Vec): { distance: number; t: number } {
  const dx = b[0] - a[0];
  const dy = b[1] - a[1];
  const len2 = dx * dx + dy * dy;
  const t = len2 === 0 ? 0 : Math.max(0, Math.min(1, ((p[0] - a[0]) * dx + (p[1] - a[1]) * dy) / len2));
  return { distance: Math.hypot(p[0] - (a[0] + t * dx), p[1] - (a[1] + t * dy)), t };
}

/** True when p is inside the filled area of the outline or within `tolerance` of its boundary. */
export function outlineHit(o: PartOutline, p: Vec, tolerance: number): boolean {
  let inside = false;
  for (const r of o.rings) {
    if (pointInRing(p, r.points)) inside = !inside;
    for (let i = 0; i < r.points.length; i++) {
      if (distanceToSegment(p, r.points[i] as Vec, r.points[(i + 1) % r.points.length] as Vec).distance <= tolerance) return true;
    }
  }
  return inside;
}
