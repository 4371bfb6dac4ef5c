/**
 * Public API of core/properties: exact area properties of normalised regions with straight and
 * circular-arc edges. Conventions are stated once in section.ts (Ixy = +∫XY dA, angles CCW from +x).
 */
export type { RawIntegrals, SectionProperties } from './types.ts';
export { ringIntegrals, regionIntegrals, vertexBoxCentre } from './integrals.ts';
export {
  principalAxes,
  secondMomentsAboutPoint,
  secondMomentsAtAngle,
  ISOTROPY_TOLERANCE,
  type PrincipalAxes,
  type CentroidalMoments,
  type AxisMoments,
  type RotatedMoments,
} from './principal.ts';
export { elasticModuli, outerProjectionRange, type ElasticModuli, type ExtremeRange, type ModuliInput } from './moduli.ts';
export {
  plasticNeutralAxis,
  plasticNeutralAxisWeighted,
  plasticAboutX,
  plasticAboutY,
  type PlasticAxis,
  type WeightedPlasticAxis,
  type WeightedRegion,
  type PnaMethod,
} from './plastic.ts';
export { sectionProperties, centroidalFromIntegrals, type CentroidalIntegrals } from './section.ts';
export { netSectionProperties, type NetSectionProperties } from './net.ts';
export { NET_CATALOGUE, PROPERTY_CATALOGUE, TORSION_CATALOGUE, catalogueFor, catalogueGroups, residueScale, shownValue, type CatalogueEntry, type CatalogueKind, type PropertyView, type NumericKey, type TorsionKey, type NetKey } from './catalogue.ts';
