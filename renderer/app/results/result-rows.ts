/**
 * The rows the results panel and the printed report show, read from the one property catalogue
 * (core/properties/catalogue.ts): this file only formats them. Which properties a view lists,
 * their symbols, meanings, groups and kinds all come from the catalogue, so adding a property
 * there adds it here.
 *
 * Units: values in the document's length unit in; shown in the display set given (core/units),
 * angles in degrees, ratios without a unit. Rounding residue (below 1e-9 of the kind's natural
 * scale for this section) is shown as 0 (catalogue `shownValue`); `raw` keeps the full number.
 */
import { catalogueFor, catalogueGroups, NET_CATALOGUE, PROPERTY_CATALOGUE, residueScale, TORSION_CATALOGUE, type CatalogueEntry, type CatalogueKind, type TorsionKey } from '../../../core/properties/catalogue.ts';
import type { NetSectionProperties } from '../../../core/properties/net.ts';
import type { SectionProperties } from '../../../core/properties/types.ts';
import { formatSig, toDisplay, zeroWithinRounding, type DisplaySet, type LengthUnit } from '../../../core/units/index.ts';

export interface ShownRow {
  readonly key: string;
  readonly symbol: string;
  readonly meaning: string;
  /** The full-precision value, in the document unit (the panel's data-value). */
  readonly raw: number;
  readonly text: string;
  readonly unit: string;
}

export interface ShownGroup {
  readonly title: string;
  readonly rows: readonly ShownRow[];
}

/** One value of a catalogue kind as text and unit label: residue to 0, then the display unit. */
export function shownQuantity(kind: CatalogueKind, value: number, scale: number, unit: LengthUnit, display: DisplaySet, sig: number): { text: string; unit: string } {
  const v = zeroWithinRounding(value, scale);
  if (kind === 'angle') return { text: formatSig(v, sig), unit: '°' };
  if (kind === 'ratio') return { text: formatSig(v, sig), unit: '' };
  const d = display[kind];
  return { text: formatSig(toDisplay(v, unit, d), sig), unit: d.label };
}

function row<K extends string>(entry: CatalogueEntry<K>, value: number, p: SectionProperties, unit: LengthUnit, display: DisplaySet, sig: number): ShownRow {
  const s = shownQuantity(entry.kind, value, residueScale(entry.kind, p), unit, display, sig);
  return { key: entry.key, symbol: entry.symbol, meaning: entry.meaning, raw: value, text: s.text, unit: s.unit };
}

/** The section properties a view lists, by catalogue group, formatted. */
export function propertyGroups(view: 'panel' | 'report', p: SectionProperties, unit: LengthUnit, display: DisplaySet, sig: number): ShownGroup[] {
  return catalogueGroups(catalogueFor(view, PROPERTY_CATALOGUE)).map((g) => ({ title: g.title, rows: g.entries.map((e) => row(e, p[e.key], p, unit, display, sig)) }));
}

/**
 * The torsion rows a view lists: J always; Cw and the shear centre only for one connected piece
 * (separate pieces twist on their own, so J adds and there is no shared shear centre or Cw).
 */
export function torsionRows(view: 'panel' | 'report', t: Readonly<Record<TorsionKey, number>> & { readonly components: number }, p: SectionProperties, unit: LengthUnit, display: DisplaySet, sig: number): ShownRow[] {
  return catalogueFor(view, TORSION_CATALOGUE)
    .filter((e) => t.components <= 1 || e.key === 'J')
    .map((e) => {
      const r = row(e, t[e.key], p, unit, display, sig);
      return e.key === 'J' && t.components > 1 ? { ...r, meaning: `Saint-Venant torsion constant: sum over ${t.components} separate pieces` } : r;
    });
}

/** The net-section rows (fastener holes deducted), on the gross section's residue scales. */
export function netRows(view: 'panel' | 'report', net: NetSectionProperties, p: SectionProperties, unit: LengthUnit, display: DisplaySet, sig: number): ShownRow[] {
  return catalogueFor(view, NET_CATALOGUE).map((e) => row(e, net[e.key], p, unit, display, sig));
}
