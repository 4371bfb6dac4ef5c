/**
 * The Sectionsmith document (our own versioned JSON format, "sectionsmith-section").
 * One length unit per document; every length in it is in that unit. Computed results are never
 * stored here. The schema, validation and migrations live beside this file (schema.ts,
 * migrations.ts); this file is the type contract the rest of the code builds on.
 *
 * Two shapes:
 *   SectionFile      what a file holds (version 3): document-wide name, unit, materials and
 *                    default material, and one or more named sections (alternatives), each
 *                    with its own parts and the kinds the user gave its joints.
 *   SectionDocument  one section seen on its own, with the document-wide fields beside its
 *                    parts: exactly the layout of a version 1 file. Everything that computes
 *                    (core/section, core/materials, core/member, core/export, the editor's
 *                    tools) takes this shape; core/document/sections.ts makes it from a file
 *                    (sectionView) and writes an edited one back (withSectionView).
 */
import type { LengthUnit, StressUnit } from '../units/types.ts';

export const DOCUMENT_FORMAT = 'sectionsmith-section';
/** The version files are written in (SectionFile). */
export const DOCUMENT_VERSION = 3;
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

/**
 * What a cut-out (a subtract part) is, which decides where it counts:
 *   'fastener-hole'  a bolt, rivet or pin hole through the plies: it exists only at the
 *                    fastener, so it is a net-section deduction and nothing else (stiffness,
 *                    deflection, torsion and plastic moduli use the gross section);
 *   'void'           material missing along the whole member (the inside of a box, a cored
 *                    slot, a lightening hole running along the member): every property sees it.
 * A subtract part without a role is a void (what every cut-out meant before version 3).
 */
export type CutoutRole = 'fastener-hole' | 'void';
export const CUTOUT_ROLES: readonly CutoutRole[] = ['fastener-hole', 'void'];

interface PartCommon {
  readonly id: string;
  readonly name: string;
  readonly placement: Placement;
  readonly operation: Operation;
  /** Material id from SectionDocument.materials; null = the document default. */
  readonly material: string | null;
  readonly visible: boolean;
  /** Subtract parts only: what the cut-out is (absent = 'void'). */
  readonly cutoutRole?: CutoutRole;
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
 * How two parts that touch along a line are joined. The engine finds the joints (contact
 * segments between part outlines, core/joints); the file keeps only the kind the user chose for
 * a pair of parts, never the computed segments. A pair with no entry takes the default: welded
 * (fillet both sides) between two metal parts, not connected otherwise (core/joints says which).
 *   welded      fillet weld on one side or on both sides of the joint line, or a groove weld;
 *   fastened    bolts, nails or screws in `rows` rows along the member (pitch is computed, or
 *               the user's own `pitch` in the document unit is checked);
 *   glued       an adhesive line along the whole joint;
 *   not connected  the parts only touch: they do not share shear, and torsion treats them apart.
 */
export type JointKind =
  | { readonly type: 'welded'; readonly weld: 'fillet-one-side' | 'fillet-both-sides' | 'groove' }
  | { readonly type: 'fastened'; readonly fastener: 'bolt' | 'nail' | 'screw'; readonly rows: number; readonly pitch?: number }
  | { readonly type: 'glued' }
  | { readonly type: 'not-connected' };

/** The kind a user gave the joint between two parts (part ids of the same section, either order). */
export interface JointSetting {
  readonly parts: readonly [string, string];
  readonly kind: JointKind;
}

/**
 * Typed member and stress inputs, stored as physical quantities in fixed SI units (never as the
 * digits shown in some unit), so a change of document or display unit, saving, reopening,
 * recovery and undo all keep their meaning. The fields show them converted to the document's
 * unit system (core/units/systems.ts).
 */
export const MEMBER_SUPPORTS = ['simple', 'cantilever', 'fixed', 'propped'] as const;
export type MemberSupport = (typeof MEMBER_SUPPORTS)[number];

/** A point load: P in N (downward positive), a in m from the left (fixed) end; no `a` = mid-span. */
export interface PointLoadInput {
  readonly P: number;
  readonly a?: number;
}

/** One kind of load on the member: a uniform line load in N/m (downward positive) and point loads. */
export interface LoadSet {
  readonly uniform: number;
  readonly points: readonly PointLoadInput[];
}

/** A typed allowable stress for one material (Pa): bending, shear, or both. */
export interface AllowableInput {
  readonly material: string;
  readonly bending?: number;
  readonly shear?: number;
}

/**
 * The member (beam) check's case for one section: span in m, supports, the live load and the
 * other (dead, superimposed) load apart so each deflection limit sees its own load, the
 * deflection limits as span ratios (L/ratio), and the stress limit (factor × strength basis, or a
 * typed allowable per material).
 */
export interface MemberInputs {
  readonly span: number;
  readonly support: MemberSupport;
  /** Loads other than live (dead, superimposed dead …). */
  readonly dead: LoadSet;
  readonly live: LoadSet;
  readonly selfWeight: boolean;
  /** Deflection limit under total load: span / totalLimit. */
  readonly totalLimit: number;
  /** Deflection limit under live load alone: span / liveLimit. */
  readonly liveLimit: number;
  /** Stress limit = stressFactor × the material's strength basis (unless a typed allowable is given). */
  readonly stressFactor: number;
  readonly allowables?: readonly AllowableInput[];
}

/** The stress panel's forces about the centroid: N and V in N, moments in N·m (N > 0 tension). */
export interface StressInputs {
  readonly N: number;
  readonly Mx: number;
  readonly My: number;
  readonly Vx: number;
  readonly Vy: number;
}

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
  /** The section's joint kinds (version 3); absent = every joint takes its default kind. */
  readonly joints?: readonly JointSetting[];
  /** The section's member check case; absent = the defaults (core/document/inputs.ts). */
  readonly member?: MemberInputs;
  /** The section's stress panel forces; absent = all zero. */
  readonly stress?: StressInputs;
}

/** One named alternative in a file: its own parts; unit and materials are the file's. */
export interface Section {
  /** Unique in the file; never shown (names are). */
  readonly id: string;
  /** Unique in the file, not empty or blank: how people and `--section NAME` refer to it. */
  readonly name: string;
  readonly parts: readonly Part[];
  /** Kinds the user gave this section's joints (see JointSetting); absent = all defaults. */
  readonly joints?: readonly JointSetting[];
  /** The member check case (SI); absent = the defaults. */
  readonly member?: MemberInputs;
  /** The stress panel's forces (SI); absent = all zero. */
  readonly stress?: StressInputs;
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
