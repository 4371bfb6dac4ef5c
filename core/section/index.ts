/** Composition of a document into a region and its properties (compose.ts). */
export { regionFromDocument, sectionFromDocument, localRegion, placedPart, partLabel, isFastenerHole, type Composition, type ComposedPart, type SectionResult } from './compose.ts';
