/**
 * One input box for a typed quantity (./quantity-text.ts): the field's unit beside its label, the
 * stored value shown converted to that unit, any text read through core/units' readQuantity.
 * While typing, each reading that succeeds goes to `onLive` (the panel updates at once, outside
 * the undo history); leaving the box or Enter commits it as one undo step; Escape puts the stored
 * value back. Text that cannot be read stays in the box with its message (reported through
 * `onProblem`), and on leaving the box the document goes back to its value from before the edit.
 */
import { useState, type ReactElement } from 'react';
import { fieldText, readField, type FieldRead, type InputField } from './quantity-text.ts';

export interface QuantityInputProps {
  readonly field: InputField;
  /** The stored value (SI); null when the box is empty on purpose (an optional input). */
  readonly si: number | null;
  readonly testid: string;
  /** Shown beside the label, e.g. "L"; defaults to the field's label. */
  readonly caption?: string;
  /** An optional input: an empty box means `null` (e.g. a point load at mid-span). */
  readonly emptyMeans?: string;
  readonly onLive: (si: number | null) => void;
  readonly onCommit: () => void;
  readonly onCancel: () => void;
  readonly onProblem: (message: string | null) => void;
  readonly className?: string;
  /** A reader with the field's own range checks; default readField. */
  readonly read?: (text: string, field: InputField) => FieldRead;
}

export function QuantityInput(p: QuantityInputProps): ReactElement {
  const [draft, setDraft] = useState<string | null>(null);
  const [bad, setBad] = useState(false);
  const shown = draft ?? (p.si === null ? '' : fieldText(p.si, p.field));
  const read = (text: string): boolean => {
    if (p.emptyMeans !== undefined && text.trim() === '') {
      p.onProblem(null);
      p.onLive(null);
      return true;
    }
    const r = (p.read ?? readField)(text, p.field);
    if (r.ok) {
      p.onProblem(null);
      p.onLive(r.si);
    } else p.onProblem(r.message);
    return r.ok;
  };
  /** Enter or leaving the box: a good reading is committed; refused text stays with its message. */
  const finish = (leaving: boolean): void => {
    if (draft === null) return;
    if (bad) {
      // Leaving refused text: the document goes back to its value from before this edit.
      if (leaving) p.onCancel();
      return;
    }
    setDraft(null);
    p.onCommit();
  };
  return (
    <label className={p.className ?? 'field'}>
      <span>
        {p.caption ?? p.field.label} ({p.field.unit})
      </span>
      <input
        data-testid={p.testid}
        data-unit={p.field.unit}
        aria-invalid={bad}
        className={bad ? 'invalid' : undefined}
        value={shown}
        placeholder={p.emptyMeans}
        onChange={(e) => {
          setDraft(e.target.value);
          setBad(!read(e.target.value));
        }}
        onBlur={() => finish(true)}
        onKeyDown={(e) => {
          if (e.key === 'Enter') finish(false);
          else if (e.key === 'Escape') {
            setDraft(null);
            setBad(false);
            p.onProblem(null);
            p.onCancel();
          }
        }}
      />
    </label>
  );
}
