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
 * The failing side of a checked read (STYLE.md §5): `array[i] ?? outside(array, i)` returns the
 * element, and throws InvariantError naming the index when it lies outside the array (a broken
 * invariant, e.g. a triangle naming a node that does not exist), where `array[i] ?? 0` would
 * silently read coordinate 0. The read itself stays at the call site, so each site keeps its
 * own (monomorphic) element access and hot loops run as fast as with `?? 0`; a shared accessor
 * function taking every array type was measured 2–10× slower on the mesher (tests/bench).
 */
export function outside(array: ArrayLike<unknown>, index: number): never {
  throw new InvariantError(`invariant failed: index ${index} is outside 0..${array.length - 1}`);
}
