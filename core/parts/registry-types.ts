/**
 * Contract for parametric standard parts (core/parts). A part type turns trade-symbol
 * dimensions into an exact region in local coordinates (arcs as bulges), or returns diagnostics
 * naming the bad parameter. Implementations register in core/parts/index.ts.
 */
import type { Diagnostic, Region } from '../geometry/types.ts';

export interface ParamSpec {
  /** Trade symbol, e.g. 'd', 'bf', 'tw', 'tf', 'r', 't', 'OD', 'H', 'B'. */
  readonly key: string;
  readonly label: string;
  /** Default value in inches (converted by callers to the document unit). */
  readonly defaultIn: number;
  readonly optional?: boolean;
  readonly min?: number;
}

export interface PartType {
  /** Trade words: 'plate', 'round-bar', 'pipe', 'rect-tube', 'i-shape', 'channel', 'angle', 'tee', 'z-shape', 'lumber'. */
  readonly id: string;
  readonly label: string;
  readonly params: readonly ParamSpec[];
  /** Exact geometry in local coordinates; local origin as documented by each type. */
  readonly region: (params: Readonly<Record<string, number>>) => { region: Region; diagnostics: readonly Diagnostic[] };
}
