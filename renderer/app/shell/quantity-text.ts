/**
 * Typed quantities in input boxes: what a field shows for a stored value, and what it reads.
 *
 * A field has a label, a quantity kind and its unit (shown beside it). It reads text through
 * core/units' readQuantity only: a bare number is in the field's unit, or the text names its own
 * unit (`40 ft`, `15 kN/m`, `1.8e6 psi`); the value is kept in SI. The field then shows what it
 * read, converted to its unit, to six significant figures with trailing zeros dropped (a stored
 * value is never rounded; only its text is). Refusals name the field and the text.
 */
import type { SectionDocument } from '../../../core/document/types.ts';
import { formatSig, fromSI, readQuantity, type QuantityKind } from '../../../core/units/index.ts';

export interface InputField {
  /** The name in messages and beside the box, e.g. "span L". */
  readonly label: string;
  readonly kind: QuantityKind;
  /** The unit a bare number is read in and the value is shown in. */
  readonly unit: string;
}

/** "12000", "472.441", "1.8e6": six significant figures, no trailing zeros. */
export function plainNumber(value: number): string {
  const t = formatSig(value, 6);
  const [mantissa = '', exponent] = t.split('e');
  const trimmed = mantissa.includes('.') ? mantissa.replace(/0+$/, '').replace(/\.$/, '') : mantissa;
  return exponent === undefined ? trimmed : `${trimmed}e${exponent}`;
}

/** The text a field shows for an SI value. */
export function fieldText(si: number, field: InputField): string {
  return plainNumber(fromSI(si, field.kind, field.unit));
}

export type FieldRead = { readonly ok: true; readonly si: number } | { readonly ok: false; readonly message: string };

/** The text typed into a field, read as its kind (SI), or the refusal naming the field and the text. */
export function readField(text: string, field: InputField): FieldRead {
  const r = readQuantity(text, field);
  return r.ok ? { ok: true, si: r.si } : { ok: false, message: r.message };
}

/**
 * How a panel changes the section's stored inputs (the controller's editor): `live` shows a
 * change at once outside the undo history, `commit` makes everything since the first `live` one
 * undo step, `cancel` puts back the value from before.
 */
export interface InputEditing {
  readonly live: (fn: (doc: SectionDocument) => SectionDocument) => void;
  readonly commit: (label: string) => void;
  readonly cancel: () => void;
}
