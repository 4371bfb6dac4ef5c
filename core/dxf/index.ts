/** DXF drawings in and out (issue 14): import (import.ts) and export (write.ts). */
export { importDxf, summariseDxf, documentFromDxf, looksLikeDxf, JOIN_RATIO, type DxfImport, type DxfImportOptions, type DxfImportResult, type DxfError, type DxfErrorCode, type DxfLayerInfo, type DxfSummary, type ImportedPolygon } from './import.ts';
export { DEFAULT_CHORD_RATIO, describeRef, type EntityRef } from './curves.ts';
export { sectionDxf, dxfLayerName, SECTION_LAYER, type DxfExportInput, type DxfCutPart } from './write.ts';
export { cutParts } from './cut-parts.ts';
