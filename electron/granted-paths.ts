/**
 * Which files the renderer may save to (main owns every path; the renderer only holds paths main
 * handed it). A path is granted when the user chose it in Save As, or opened a file that the app
 * can save back as it was: a Sectionsmith document. A GeoJSON or DXF file (or a .json holding
 * anything but a Sectionsmith document) is read, never overwritten: saving it would replace the
 * user's drawing with a Sectionsmith document, so its Save asks for a new place (Save As).
 */
import path from 'node:path';

export const DOCUMENT_EXTENSION = '.section.json';

/** True when `text`, opened from `filePath`, may be written back there as a Sectionsmith document. */
export function canSaveBack(filePath: string, text: string): boolean {
  const name = path.basename(filePath).toLowerCase();
  if (name.endsWith(DOCUMENT_EXTENSION)) return true;
  if (!name.endsWith('.json') || name.endsWith('.geojson')) return false;
  // A document saved under a plain .json name: only if it really is one.
  try {
    const value: unknown = JSON.parse(text.charCodeAt(0) === 0xfeff ? text.slice(1) : text);
    return typeof value === 'object' && value !== null && (value as { format?: unknown }).format === 'sectionsmith-section';
  } catch {
    return false;
  }
}

export interface GrantedPaths {
  /** A file was opened: grant it if it can be saved back; returns whether it was. */
  opened(filePath: string, text: string): boolean;
  /** The user chose this place in a save dialog for a document. */
  chosen(filePath: string): void;
  has(filePath: string): boolean;
}

export function createGrantedPaths(): GrantedPaths {
  const granted = new Set<string>();
  return {
    opened(filePath, text) {
      if (!canSaveBack(filePath, text)) return false;
      granted.add(filePath);
      return true;
    },
    chosen(filePath) {
      granted.add(filePath);
    },
    has: (filePath) => granted.has(filePath),
  };
}
