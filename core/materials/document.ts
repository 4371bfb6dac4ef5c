/**
 * Materials of a document: validating the stored materials, resolving each part's material
 * (a part's own material id, else the document default), and splitting the composed section
 * into non-overlapping pieces of one material each.
 *
 * Overlaps (docs/methods.md §6 option (a)): a later part wins. Each visible "add" part keeps only
 * what no later visible part (add or subtract) covers; a subtract part removes material from
 * every earlier part, except a fastener hole: the pieces are the GROSS section, as stiffness
 * (EA, EI) and deflection use it (core/section/compose.ts). The union of the pieces is the section core/section composes, so the
 * geometric properties agree; per-material extreme fibres need the split.
 * A part id that names no document material but a built-in one uses the built-in entry.
 * Problems are returned, never repaired: a missing material, an unknown id or an invalid field
 * becomes an issue naming the part or material.
 */
import type { SectionDocument } from '../document/types.ts';
import { BooleanError, differenceRegions, regionBounds } from '../geometry/index.ts';
import type { Diagnostic, Region } from '../geometry/types.ts';
import { isFastenerHole, partLabel, regionFromDocument } from '../section/index.ts';
import type { MaterialPiece } from './composite.ts';
import { builtInMaterial } from './library.ts';
import { materialInSI, validateMaterial, type Material } from './schema.ts';

export interface MaterialsResult {
  readonly materials: ReadonlyMap<string, Material>;
  readonly issues: readonly string[];
}

/** The document's materials, validated; invalid ones are left out and reported. */
export function documentMaterials(doc: SectionDocument): MaterialsResult {
  const materials = new Map<string, Material>();
  const issues: string[] = [];
  doc.materials.forEach((raw, i) => {
    const { material, issues: found } = validateMaterial(raw, i);
    if (material) materials.set(material.id, material);
    issues.push(...found.map((f) => `materials[${i}]: ${f.message}`));
  });
  return { materials, issues };
}

export interface DocumentPieces {
  readonly pieces: readonly MaterialPiece[];
  readonly diagnostics: readonly Diagnostic[];
  /** Material problems (each names the part or material); pieces are empty when any exist. */
  readonly issues: readonly string[];
  readonly hiddenParts: number;
}

function boxesOverlap(a: Region, b: Region): boolean {
  const p = regionBounds(a), q = regionBounds(b);
  return p !== null && q !== null && p.minX < q.maxX && q.minX < p.maxX && p.minY < q.maxY && q.minY < p.maxY;
}

/** One piece per visible add part with material, overlaps resolved (later part wins). */
export function materialPiecesFromDocument(doc: SectionDocument): DocumentPieces {
  const composed = regionFromDocument(doc);
  const { materials, issues: materialIssues } = documentMaterials(doc);
  const issues = [...materialIssues];
  if (composed.diagnostics.length > 0) return { pieces: [], diagnostics: composed.diagnostics, issues, hiddenParts: composed.hiddenParts };
  const pieces: MaterialPiece[] = [];
  const diagnostics: Diagnostic[] = [];
  composed.parts.forEach((placed, k) => {
    if (placed.part.operation !== 'add') return;
    const label = partLabel(placed.part, placed.index);
    const id = placed.part.material ?? doc.defaultMaterial;
    if (id === null) {
      issues.push(`part "${label}" has no material and the document has no default material`);
      return;
    }
    const material = materials.get(id) ?? builtInMaterial(id);
    if (material === undefined) {
      issues.push(`part "${label}" uses material "${id}", which is neither in the document nor built in`);
      return;
    }
    let region = placed.region;
    for (const later of composed.parts.slice(k + 1)) {
      if (region.length === 0) break;
      if (isFastenerHole(later.part) || !boxesOverlap(region, later.region)) continue;
      try {
        region = differenceRegions(region, later.region, { context: 'splitting the section by material', parts: [label, partLabel(later.part, later.index)] });
      } catch (err) {
        if (!(err instanceof BooleanError)) throw err;
        diagnostics.push({ code: 'boolean-failed', part: label, message: `splitting part "${label}" by material failed: ${err.message}` });
      }
    }
    if (region.length > 0) pieces.push({ region, material: materialInSI(material), label });
  });
  const ok = issues.length === 0 && diagnostics.length === 0;
  if (ok && pieces.length === 0) issues.push('no part with material remains in the section');
  return { pieces: ok ? pieces : [], diagnostics, issues, hiddenParts: composed.hiddenParts };
}
