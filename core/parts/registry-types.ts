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
  /**
   * What the number is (optional extension; absent means 'length'). Only 'length' values are
   * converted between units by callers: 'ratio' is dimensionless (a flange slope, rise over run),
   * 'count' a whole number (lumber plies), 'nominal-in' a trade size name in inches that is never
   * converted (lumber nominal 2 × 10).
   */
  readonly quantity?: 'length' | 'ratio' | 'count' | 'nominal-in';
  /** How an omitted optional value is chosen, when it is not simply `defaultIn` (e.g. "2t"). */
  readonly defaultRule?: string;
}

export interface PartType {
  /** Trade words: 'plate', 'round-bar', 'pipe', 'rect-tube', 'i-shape', 'channel', 'angle', 'tee', 'z-shape', 'lumber'. */
  readonly id: string;
  readonly label: string;
  readonly params: readonly ParamSpec[];
  /** Exact geometry in local coordinates; local origin as documented by each type. */
  /** Where the local origin is and which way the part faces (optional extension). */
  readonly origin?: string;
  /**
   * The length unit of the returned region when it does not follow the params (optional
   * extension): 'in' for lumber, whose nominal sizes map to dressed sizes in inches. Use
   * shapeRegion() in core/parts/index.ts to get any part in a document unit.
   */
  readonly regionUnit?: 'in';
  readonly region: (params: Readonly<Record<string, number>>) => { region: Region; diagnostics: readonly Diagnostic[] };
}
