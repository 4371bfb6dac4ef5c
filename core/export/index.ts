/** Exports of a section as text: an SVG drawing (svg.ts) and a CSV of its properties (csv.ts). */
export { sectionSvg, escapeXml, ringPathData, type SvgInput } from './svg.ts';
export { propertiesCsv, csvTextCell, csvNumberCell, csvUnit, type CsvInput } from './csv.ts';
