/**
 * Checking a section table (CSV) against the parts library: column mapping (columns.ts), row
 * dimensions to parts (shapes.ts), the check itself (table.ts) and its CSV report (report-csv.ts).
 */
export * from './columns.ts';
export * from './shapes.ts';
export * from './table.ts';
export { tableCheckCsv } from './report-csv.ts';
export { parseTolerances } from './tolerance.ts';
