/**
 * Reading and checking the dimensions of a part type (trade symbols → numbers).
 *
 * Units: whatever the caller uses, consistently (the document unit); messages print bare numbers.
 * Rules: a required symbol must be present; an optional one falls back to its default (or to the
 *   rule the part type states, e.g. "2t"); every value must be a finite number at or above its
 *   minimum; symbols the part type does not know are reported, never ignored (a misspelt "bf"
 *   silently replaced by a default would be a wrong answer).
 * Limits: a length lies within [MIN_EXTENT, MAX_COORDINATE] = [1e-9, 1e9] in any unit, or is an
 *   optional 0 (beyond them a double keeps too few digits for second moments, or they underflow:
 *   docs/methods.md §1.3); a count is at most MAX_COUNT, so a 400-byte file cannot ask for a million
 *   plies and hang every command (cost grows with the count).
 */
import type { Diagnostic } from '../geometry/types.ts';
import { MAX_COORDINATE, MIN_EXTENT } from '../geometry/validate.ts';
import type { ParamSpec } from './registry-types.ts';

export type Values = Readonly<Record<string, number>>;

/** The largest count a part parameter may take (plies, laminations, rows of holes). */
export const MAX_COUNT = 200;

export interface ReadParams {
  readonly values: Record<string, number>;
  readonly diagnostics: Diagnostic[];
}

/** Short decimal form for messages: up to 6 significant figures, no trailing zeros. */
export function formatNumber(value: number): string {
  if (!Number.isFinite(value)) return String(value);
  return String(Number(value.toPrecision(6)));
}

export function badParameter(partType: string, message: string): Diagnostic {
  return { code: 'bad-parameter', part: partType, message: `${partType}: ${message}` };
}

/** Values by symbol with optional defaults applied, or diagnostics naming each bad symbol. */
export function readParams(partType: string, specs: readonly ParamSpec[], params: Values): ReadParams {
  const values: Record<string, number> = {};
  const diagnostics: Diagnostic[] = [];
  const known = new Set(specs.map((s) => s.key));
  for (const key of Object.keys(params)) {
    if (!known.has(key)) {
      diagnostics.push(badParameter(partType, `unknown dimension "${key}"; expected ${specs.map((s) => s.key).join(', ')}`));
    }
  }
  for (const spec of specs) {
    const given = params[spec.key];
    if (given === undefined) {
      if (spec.optional === true) {
        if (spec.defaultRule === undefined) values[spec.key] = spec.defaultIn;
      } else {
        diagnostics.push(badParameter(partType, `${spec.key} (${spec.label}) is missing`));
      }
      continue;
    }
    if (typeof given !== 'number' || !Number.isFinite(given)) {
      diagnostics.push(badParameter(partType, `${spec.key} = ${String(given)} is not a finite number`));
      continue;
    }
    // Required dimensions must be positive unless the spec states a minimum; optional ones may be 0.
    const strict = spec.min === undefined && spec.optional !== true;
    const min = spec.min ?? 0;
    if (strict ? given <= 0 : given < min) {
      diagnostics.push(badParameter(partType, `${spec.key} = ${formatNumber(given)} must be ${strict ? 'greater than 0' : `at least ${formatNumber(min)}`}`));
      continue;
    }
    if (spec.quantity === 'count' && !Number.isInteger(given)) {
      diagnostics.push(badParameter(partType, `${spec.key} = ${formatNumber(given)} must be a whole number`));
      continue;
    }
    const limit = limitProblem(spec, given);
    if (limit !== null) {
      diagnostics.push(badParameter(partType, limit));
      continue;
    }
    values[spec.key] = given;
  }
  return { values, diagnostics };
}

/** What is out of range for this kind of parameter, or null (ratios have their own rules in each part type). */
function limitProblem(spec: ParamSpec, given: number): string | null {
  if (spec.quantity === 'count') return given > MAX_COUNT ? `${spec.key} = ${formatNumber(given)} is more than the limit: at most ${MAX_COUNT}` : null;
  if (spec.quantity === 'ratio') return null;
  if (given > MAX_COORDINATE) return `${spec.key} = ${formatNumber(given)} is too large: dimensions are limited to ${MAX_COORDINATE.toExponential()} (any unit)`;
  if (given > 0 && given < MIN_EXTENT) return `${spec.key} = ${formatNumber(given)} is too small: dimensions must be at least ${MIN_EXTENT.toExponential()} (any unit), or second moments underflow`;
  return null;
}

/** Adds a diagnostic when `condition` holds; returns whether it did. */
export function complain(diagnostics: Diagnostic[], partType: string, condition: boolean, message: string): boolean {
  if (condition) diagnostics.push(badParameter(partType, message));
  return condition;
}
