/**
 * Tolerance specifications as text, for the command line and saved settings:
 *   "1%" or "0.01"         — the default for every property
 *   "Iy=3%"                — one property, every family
 *   "MC:Iy=7%"             — one property of one family
 * Per cent needs the % sign; a bare number is a fraction (0.01 = 1 %).
 */
import { CHECKED_PROPERTIES, checkedProperty } from './columns.ts';
import { familyOf } from './shapes.ts';
import { DEFAULT_TOLERANCE, TableInputError, type Tolerances } from './table.ts';

function fraction(text: string, spec: string): number {
  const t = text.trim();
  const m = /^(\d+(?:\.\d*)?|\.\d+)(%?)$/.exec(t);
  if (m === null) throw new TableInputError(`--tolerance ${spec}: "${t}" is not a tolerance (e.g. 1% or 0.01)`);
  const value = Number(m[1]) / (m[2] === '%' ? 100 : 1);
  if (!(value > 0 && value < 1)) throw new TableInputError(`--tolerance ${spec}: must be between 0 and 100 %`);
  return value;
}

export function parseTolerances(specs: readonly string[]): Tolerances {
  let base = DEFAULT_TOLERANCE;
  let defaultGiven = false;
  // Keys are checked symbols and family codes only (validated below), never other user text.
  const byProperty: Record<string, number> = {};
  const byFamily: Record<string, Record<string, number>> = {};
  for (const spec of specs) {
    const eq = spec.indexOf('=');
    if (eq < 0) {
      base = fraction(spec, spec);
      defaultGiven = true;
      continue;
    }
    const target = spec.slice(0, eq).trim();
    const value = fraction(spec.slice(eq + 1), spec);
    const [a, b] = target.includes(':') ? target.split(':') : [undefined, target];
    const symbol = (b ?? '').trim();
    if (checkedProperty(symbol) === undefined) throw new TableInputError(`--tolerance ${spec}: unknown property "${symbol}"; known: ${Object.keys(CHECKED_PROPERTIES).join(', ')}`);
    if (a === undefined) {
      byProperty[symbol] = value;
      continue;
    }
    const family = familyOf(a);
    if (family === undefined) throw new TableInputError(`--tolerance ${spec}: unknown family "${a}"`);
    byFamily[family] = { ...(byFamily[family] ?? {}), [symbol]: value };
  }
  return { default: base, defaultGiven, byProperty, byFamily };
}
