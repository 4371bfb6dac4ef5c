/**
 * Public API of the geometry layer: rings and regions in section coordinates (x right, y up),
 * exact circular arcs as bulges, normalisation, validation, Boolean operations, placement and
 * bounds. See each module's header for units, winding, tolerance and what it does not guarantee.
 */
export * from './types.ts';
export { ringFromPoints, ringVertexCount, ringSignedArea, reverseRing, arcOfSegment, arcFromBulge, arcSegmentArea, segmentBulge } from './ring.ts';
export type { ArcGeometry } from './ring.ts';
export { normaliseRegion, normalisePolygon, normaliseRing } from './normalise.ts';
export { validateRegion, isRegionValid, MAX_COORDINATE, MIN_EXTENT, ZERO_AREA_RATIO, FLATTEN_RATIO, MAX_CONTACT_DIAGNOSTICS } from './validate.ts';
export type { ValidationContext } from './validate.ts';
export { unionRegions, differenceRegions, intersectRegions, BooleanError, DEFAULT_SAGITTA_RATIO } from './boolean.ts';
export type { BooleanNames, BooleanOperation, BooleanOptions } from './boolean.ts';
export { flattenRing, arcPieceCount, MAX_PIECES_PER_ARC } from './flatten.ts';
export type { FlatRing } from './flatten.ts';
export { transformRegion, translateRegion, rotateRegion, cosSinDegrees } from './transform.ts';
export type { RegionPlacement } from './transform.ts';
export { regionBounds, extremeAlong, ringBounds, ringExtremeAlong, arcContainsAngle } from './bounds.ts';
export type { Bounds, Extremes } from './bounds.ts';
export { pointInRing, segmentContact, leftTurn } from './predicates.ts';
