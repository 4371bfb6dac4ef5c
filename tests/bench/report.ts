/**
 * Bench output, one line per measurement, in the project's fixed format:
 *   bench: NAME VALUE UNIT (baseline VALUE UNIT, ratio R)
 * The baseline is always measured in the same run (never a stored number).
 */
export interface BenchLine {
  readonly name: string;
  readonly value: number;
  readonly unit: string;
  readonly baseline: number;
  readonly baselineUnit: string;
  /** value / baseline unless the bench defines it otherwise (e.g. a target). */
  readonly ratio: number;
  /** Optional extra facts printed after the line (elements, iterations…). */
  readonly detail?: string;
}

const fmt = (v: number): string => (Math.abs(v) >= 100 ? v.toFixed(0) : Math.abs(v) >= 1 ? v.toFixed(2) : v.toPrecision(3));

export function printBench(line: BenchLine): void {
  const detail = line.detail ? `  ${line.detail}` : '';
  console.log(
    `bench: ${line.name} ${fmt(line.value)} ${line.unit} (baseline ${fmt(line.baseline)} ${line.baselineUnit}, ratio ${line.ratio.toFixed(2)})${detail}`,
  );
}

/** Median wall time in ms of `fn` over `runs` runs after `warmup` unmeasured runs. */
export function medianMs(fn: () => unknown, runs = 15, warmup = 3): number {
  for (let i = 0; i < warmup; i++) fn();
  const times: number[] = [];
  for (let i = 0; i < runs; i++) {
    const t0 = performance.now();
    fn();
    times.push(performance.now() - t0);
  }
  times.sort((a, b) => a - b);
  return times[Math.floor(times.length / 2)] ?? Number.NaN;
}
