/**
 * The comparison of alternative sections, as one import: the comparison itself (compare.ts),
 * its CSV table (csv.ts) and its side-by-side SVG (svg.ts). This file only re-exports; the
 * modules beside it import compare.ts directly, never this barrel.
 */
export * from './compare.ts';
export { comparisonCsv, columnHeading, columnUnit, columnValue, sharedLoadShown } from './csv.ts';
export { comparisonSvg } from './svg.ts';
