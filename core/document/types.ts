/**
 * The Sectionsmith document (our own versioned JSON format, "sectionsmith-section").
 * One length unit per document; every length in it is in that unit. Computed results are never
 * stored here. The schema, validation and migrations live beside this file (schema.ts,
 * migrations.ts); this file is the type contract the rest of the code builds on.
 *
 * Two shapes:
 *   SectionFile      what a file holds (version 2): document-wide name, unit, materials and
 *                    default material, and one or more named sections (alternatives), each
 *                    with its own parts.
 *   SectionDocument  one section seen on its own, with the document-wide fields beside its
 *                    parts: exactly the layout of a version 1 file. Everything that computes
 *                    (core/section, core/materials, core/member, core/export, the editor's
 *                    tools) takes this shape; core/document/sections.ts makes it from a file
 *                    (sectionView) and writes an edited one back (withSectionView).
 */
import type { LengthUnit, StressUnit } from '../units/types.ts';

export const DOCUMENT_FORMAT = 'sectionsmith-section';
/** The version files are written in (SectionFile). */
export const DOCUMENT_VERSION = 2;
/** A one-section view (SectionDocument) has the layout of this version: the last one-section format. */
export const SECTION_VIEW_VERSION = 1;

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

/**
 * One section (alternative) on its own: its parts with the document's unit and materials.
 * As a view of a SectionFile, `name` is the section's name.
 */
export interface SectionDocument {
  readonly format: typeof DOCUMENT_FORMAT;
  readonly version: typeof SECTION_VIEW_VERSION;
  readonly name: string;
  readonly unit: LengthUnit;
  readonly parts: readonly Part[];
  readonly materials: readonly MaterialRef[];
  readonly defaultMaterial: string | null;
  /** Optional (added with the materials editor); old files without it load unchanged. */
  readonly referenceModulus?: ReferenceModulus;
}

/** One named alternative in a file: its own parts; unit and materials are the file's. */
export interface Section {
  /** Unique in the file; never shown (names are). */
  readonly id: string;
  /** Unique in the file, not empty or blank: how people and `--section NAME` refer to it. */
  readonly name: string;
  readonly parts: readonly Part[];
}

/** What a file holds (version DOCUMENT_VERSION). */
export interface SectionFile {
  readonly format: typeof DOCUMENT_FORMAT;
  readonly version: typeof DOCUMENT_VERSION;
  /** The document's own name (e.g. the member being designed). */
  readonly name: string;
  readonly unit: LengthUnit;
  /** Shared by every section; a part's `material` names one of these. */
  readonly materials: readonly MaterialRef[];
  readonly defaultMaterial: string | null;
  /** Optional, document-wide like the materials (see SectionDocument.referenceModulus). */
  readonly referenceModulus?: ReferenceModulus;
  /** At least one, in the order people put them (the first is the default one). */
  readonly sections: readonly Section[];
}
