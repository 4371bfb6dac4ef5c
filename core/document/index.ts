/**
 * The Sectionsmith document: types (types.ts), validation (schema.ts), migrations
 * (migrations.ts), text I/O (io.ts) and the sections of a file with their one-section views
 * (sections.ts). See types.ts for the format.
 */
export * from './types.ts';
export { validateDocument, MAX_DOCUMENT_VERTICES, describeValue, jsonPath, PART_TYPES, type DocumentIssue, type ValidationResult } from './schema.ts';
export { migrateToCurrent, MIGRATIONS, OLDEST_READABLE_VERSION, FIRST_SECTION_ID, type Migration, type MigrationResult } from './migrations.ts';
export { parseDocument, parseJson, textTooLong, MAX_TEXT_LENGTH, documentFromJson, jsonSyntaxError, serialiseDocument, newDocument, type ParseResult, type JsonResult } from './io.ts';
export {
  allSectionViews, fileFromSection, findSection, firstSectionView, mapSectionViews, newSectionFile, sectionById, sectionNameProblem, sectionView,
  uniqueSectionId, uniqueSectionName, withSectionView, jointsOfParts, memberOfMaterials,
} from './sections.ts';
export * from './inputs.ts';
