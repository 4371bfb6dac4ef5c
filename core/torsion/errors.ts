/** Typed failures of core/torsion (STYLE.md §5, §7). */

/** The conjugate-gradient solve hit its iteration cap before reaching the tolerance. */
export class TorsionSolveError extends Error {
  override readonly name = 'TorsionSolveError';
  constructor(
    readonly iterations: number,
    readonly relativeResidual: number,
    readonly tolerance: number,
  ) {
    super(
      `torsion solve stopped after ${iterations} conjugate-gradient iterations with relative residual ` +
        `${relativeResidual.toExponential(3)} (tolerance ${tolerance.toExponential(1)})`,
    );
  }
}

/** The caller's onProgress hook returned false (e.g. a newer edit superseded this solve). */
export class TorsionCancelledError extends Error {
  override readonly name = 'TorsionCancelledError';
  constructor() {
    super('torsion analysis was cancelled');
  }
}
