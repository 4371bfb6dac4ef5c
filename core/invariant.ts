/**
 * Broken invariants are bugs (STYLE.md §5): they throw. Problems in the user's data are never
 * reported through this; they are returned as typed diagnostics (core/geometry/types.ts).
 */
export class InvariantError extends Error {
  override readonly name = 'InvariantError';
}

export function invariant(condition: unknown, message: string): asserts condition {
  if (!condition) throw new InvariantError(`invariant failed: ${message}`);
}
