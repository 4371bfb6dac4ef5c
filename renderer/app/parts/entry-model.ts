/**
 * The exact-input form's view logic (EntryPanel): the sizes it offers by default, reading its
 * length fields, and carrying typed text across a change of document unit.
 *
 * Defaults follow the document unit (common practice for a first plate and bar in each system):
 * a 100 × 200 mm plate and a 20 mm round in mm (10 × 20 and 2 in cm, 0.1 × 0.2 and 0.02 in m);
 * a 4 × 8 in plate and a 3/4 in round in in (0.5 × 1 and 0.0625 in ft). An inch document is
 * never offered a 100 × 200 inch plate.
 * Reading: every field goes through core/units readQuantity (a bare number is in the document
 * unit; "4 in" or "13'-9\"" carry their own), returned in the document unit.
 * A unit change keeps the physical value of what was typed: text still at the old default takes
 * the new default, other valid text is rewritten in the new unit (12 significant figures), text
 * that does not read is left for the user to correct.
 */
import { convertLength, fromSI, readQuantity, type LengthUnit } from '../../../core/units/index.ts';

export type EntryFields = Readonly<Record<string, string>>;

const SIZES: Readonly<Record<LengthUnit, readonly [width: string, height: string, diameter: string]>> = {
  mm: ['100', '200', '20'],
  cm: ['10', '20', '2'],
  m: ['0.1', '0.2', '0.02'],
  in: ['4', '8', '0.75'],
  ft: ['0.5', '1', '0.0625'],
};

/** The form's starting text in the document unit. */
export function entryDefaults(unit: LengthUnit): EntryFields {
  const [w, h, d] = SIZES[unit];
  return {
    'rect-width': w, 'rect-height': h, 'rect-x': '0', 'rect-y': '0',
    'circle-diameter': d, 'circle-x': '0', 'circle-y': '0',
    'point-x': '0', 'point-y': '0',
  };
}

export type LengthRead = { readonly ok: true; readonly value: number } | { readonly ok: false; readonly message: string };

/** A typed length in the document unit (the typed digits exactly when no other unit was written). */
export function readEntryLength(text: string, label: string, unit: LengthUnit): LengthRead {
  const r = readQuantity(text, { label, kind: 'length', unit });
  if (!r.ok) return r;
  return { ok: true, value: r.unit === unit ? r.value : fromSI(r.si, 'length', unit) };
}

/** The fields after the document unit changed from `from` to `to`, each keeping its physical value. */
export function fieldsForUnit(fields: EntryFields, from: LengthUnit, to: LengthUnit): Record<string, string> {
  if (from === to) return { ...fields };
  const oldDefaults = entryDefaults(from);
  const newDefaults = entryDefaults(to);
  const out: Record<string, string> = {};
  for (const [k, text] of Object.entries(fields)) {
    if (Object.hasOwn(oldDefaults, k) && oldDefaults[k] === text) {
      out[k] = newDefaults[k] ?? text;
      continue;
    }
    const r = readEntryLength(text, k, from);
    out[k] = r.ok ? String(Number(convertLength(r.value, from, to).toPrecision(12))) : text;
  }
  return out;
}
