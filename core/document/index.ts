/**
 * The Sectionsmith document: types (types.ts), validation (schema.ts), migrations
 * (migrations.ts) and text I/O (io.ts). See types.ts for the format.
 */
export * from './types.ts';
export { validateDocument, describeValue, jsonPath, PART_TYPES, type DocumentIssue, type ValidationResult } from './schema.ts';
export { migrateToCurrent, MIGRATIONS, OLDEST_READABLE_VERSION, type Migration, type MigrationResult } from './migrations.ts';
export { parseDocument, parseJson, documentFromJson, jsonSyntaxError, serialiseDocument, newDocument, type ParseResult, type JsonResult } from './io.ts';
