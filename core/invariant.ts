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

/**
 * Checked accessor (STYLE.md §5): array[index], throwing InvariantError when the index is outside
 * the array (a broken invariant, e.g. a triangle naming a node that does not exist), where
 * `array[index] ?? 0` would silently read coordinate 0. Small enough for the engine to inline in
 * hot loops (tests/bench/torsion.bench.ts measures them).
 */
export function entry<T>(array: ArrayLike<T>, index: number): T {
  const value = array[index];
  if (value === undefined) throw new InvariantError(`invariant failed: index ${index} is outside 0..${array.length - 1}`);
  return value;
}
