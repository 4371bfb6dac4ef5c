/**
 * Derived results (never stored in the document or history, STYLE.md §10): the section's
 * properties and diagnostics from core/section, memoised by document object, timed, and the
 * last valid properties kept so the panel can show them marked stale while the geometry is bad.
 */
import type { SectionDocument } from '../../core/document/types.ts';
import type { Diagnostic } from '../../core/geometry/types.ts';
import type { SectionProperties } from '../../core/properties/types.ts';
import type { NetSectionProperties } from '../../core/properties/index.ts';
import { localRegion, sectionFromDocument } from '../../core/section/index.ts';
import type { Part } from '../../core/document/types.ts';
import { flattenRing, type Vec } from '../editor/geometry.ts';

export interface Results {
  readonly properties: SectionProperties | null;
  /** The last valid properties, when the current document has none. */
  readonly stale: SectionProperties | null;
  readonly diagnostics: readonly Diagnostic[];
  readonly hiddenParts: number;
  /** Net-section properties where fastener holes exist (the gross `properties` ignore them). */
  readonly net: NetSectionProperties | null;
  readonly fastenerHoles: number;
  /** Wall time of the recompute, milliseconds. */
  readonly millis: number;
}

/**
 * The same section apart from its member and stress inputs (typed loads change no property):
 * the same parts, unit, name, materials and joints, by identity.
 */
export function sameSection(a: SectionDocument | null, b: SectionDocument): boolean {
  if (a === b) return true;
  return a !== null && a.parts === b.parts && a.unit === b.unit && a.name === b.name && a.materials === b.materials && a.defaultMaterial === b.defaultMaterial && a.referenceModulus === b.referenceModulus && a.joints === b.joints;
}

export function createResultsCache(): (doc: SectionDocument) => Results {
  let lastDoc: SectionDocument | null = null;
  let last: Results | null = null;
  let lastValid: SectionProperties | null = null;
  return (doc) => {
    if (last && sameSection(lastDoc, doc)) return last;
    const t0 = performance.now();
    let properties: SectionProperties | null = null;
    let diagnostics: readonly Diagnostic[];
    let hiddenParts = 0;
    let net: NetSectionProperties | null = null;
    let fastenerHoles = 0;
    try {
      const r = sectionFromDocument(doc);
      properties = r.properties;
      diagnostics = r.diagnostics;
      hiddenParts = r.hiddenParts;
      net = r.netProperties;
      fastenerHoles = r.fastenerHoles;
    } catch (err) {
      // A thrown error is a bug in core, not bad user data; say so rather than show nothing.
      diagnostics = [{ code: 'boolean-failed', message: `internal error while computing the section: ${err instanceof Error ? err.message : String(err)}` }];
    }
    const millis = performance.now() - t0;
    if (properties) lastValid = properties;
    lastDoc = doc;
    // An empty section (a new alternative, everything deleted) shows nothing left over from before.
    const empty = !doc.parts.some((p) => p.visible);
    last = { properties, stale: properties || empty ? null : lastValid, diagnostics, hiddenParts, net, fastenerHoles, millis };
    return last;
  };
}

/** Outlines of standard parts for drawing, from core's exact local region (arcs flattened for the screen only). */
export function shapeOutlineResolver(unitOf: () => SectionDocument['unit']): (part: Extract<Part, { type: 'shape' }>) => { points: Vec[]; hole: boolean }[] {
  const cache = new Map<string, { points: Vec[]; hole: boolean }[]>();
  return (part) => {
    const unit = unitOf();
    const key = `${unit}|${part.shape}|${JSON.stringify(part.params)}`;
    const hit = cache.get(key);
    if (hit) return hit;
    const { region } = localRegion({ ...part, placement: { x: 0, y: 0, rotationDeg: 0, mirror: false } }, unit);
    const rings: { points: Vec[]; hole: boolean }[] = [];
    for (const poly of region) {
      for (const [ring, hole] of [[poly.outer, false], ...poly.holes.map((h) => [h, true] as const)] as const) {
        const pts: Vec[] = [];
        for (let i = 0; i < ring.xy.length; i += 2) pts.push([ring.xy[i] as number, ring.xy[i + 1] as number]);
        rings.push({ points: flattenRing(pts, ring.bulge ? Array.from(ring.bulge) : undefined), hole });
      }
    }
    if (cache.size > 200) cache.clear();
    cache.set(key, rings);
    return rings;
  };
}
