/**
 * The Sectionsmith document (our own versioned JSON format, "sectionsmith-section").
 * One length unit per document; every length in it is in that unit. Computed results are never
 * stored here. The schema, validation and migrations live beside this file (schema.ts,
 * migrations.ts); this file is the type contract the rest of the code builds on.
 */
import type { StressUnit } from '../materials/quantities.ts';
import type { LengthUnit } from '../units/types.ts';

export const DOCUMENT_FORMAT = 'sectionsmith-section';
export const DOCUMENT_VERSION = 1;

export interface Placement {
  /** Translation of the part's local origin, document unit. */
  readonly x: number;
  readonly y: number;
  /** Rotation CCW about the part's local origin, degrees, applied after mirroring. */
  readonly rotationDeg: number;
  /** Mirror the local shape about its local y axis (x → −x) before rotating. */
  readonly mirror: boolean;
}

export type Operation = 'add' | 'subtract';

interface PartCommon {
  readonly id: string;
  readonly name: string;
  readonly placement: Placement;
  readonly operation: Operation;
  /** Material id from SectionDocument.materials; null = the document default. */
  readonly material: string | null;
  readonly visible: boolean;
}

/** Vertices in local coordinates; optional bulges per segment (see core/geometry/types.ts). */
export interface PolygonPart extends PartCommon {
  readonly type: 'polygon';
  readonly outer: readonly (readonly [number, number])[];
  readonly outerBulges?: readonly number[];
  readonly holes: readonly (readonly (readonly [number, number])[])[];
  readonly holeBulges?: readonly (readonly number[])[];
}

/** Axis-aligned in local coordinates, centred on the local origin. */
export interface RectanglePart extends PartCommon {
  readonly type: 'rectangle';
  readonly width: number;
  readonly height: number;
}

/** Centred on the local origin; an exact circle (two semicircular arcs). */
export interface CirclePart extends PartCommon {
  readonly type: 'circle';
  readonly diameter: number;
}

/**
 * A parametric standard part (core/parts): `shape` is a part type in trade words
 * ('i-shape', 'channel', 'angle', …) and `params` its dimensions by trade symbol (d, bf, tw, …),
 * in the document unit. `designation` records the catalogue entry it came from, if any.
 */
export interface ShapePart extends PartCommon {
  readonly type: 'shape';
  readonly shape: string;
  readonly params: Readonly<Record<string, number>>;
  readonly designation?: string;
}

export type Part = PolygonPart | RectanglePart | CirclePart | ShapePart;

/** Material slot (filled in by the materials issue). Units: E, G, strengths in the document's stress unit; density kg/m³. */
export interface MaterialRef {
  readonly id: string;
  readonly name: string;
  readonly [key: string]: unknown;
}

/**
 * Reference modulus E_ref of the transformed section: the E of a material in `materials`, or a
 * typed stress in its unit. Absent means the material of the first part (the default).
 * Only E_ref's choice is stored; modular ratios and transformed values are never stored.
 */
export type ReferenceModulus =
  | { readonly material: string }
  | { readonly value: number; readonly unit: StressUnit };

export interface SectionDocument {
  readonly format: typeof DOCUMENT_FORMAT;
  readonly version: typeof DOCUMENT_VERSION;
  readonly name: string;
  readonly unit: LengthUnit;
  readonly parts: readonly Part[];
  readonly materials: readonly MaterialRef[];
  readonly defaultMaterial: string | null;
  /** Optional (added with the materials editor); old files without it load unchanged. */
  readonly referenceModulus?: ReferenceModulus;
}
