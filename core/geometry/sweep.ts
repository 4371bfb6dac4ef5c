/**
 * Sort-and-sweep over segments: visits every pair of segments whose bounding boxes overlap.
 *
 * Segment k runs from point k to point ends[k]. The sweep runs along the longer side of the
 * points' box: segments are ordered by their lower end on that axis, bucketed into n equal-width
 * buckets by a counting sort (O(n), where a comparison sort would cost O(n log n)); an active list
 * holds the segments the sweep has not yet passed, pruned once a whole bucket starts beyond their
 * upper end; each new segment is paired with the active ones whose box overlaps its own.
 * Cost O(n + n·k), k = the number of active segments (the segments one sweep band cuts: a few
 * for section outlines; a dense stack of long parallel edges, or many segments in one bucket,
 * is the bad case, at worst O(n²)).
 * Boxes that merely touch count as overlapping (closed boxes), so touching segments are visited.
 * `visit` returns false to stop early. Units: any. Source: Shamos & Hoey (1976); the
 * "sweep and prune" broad phase (common practice).
 */

/**
 * Orders segment ids by bucket of their lower end (a counting sort into n equal-width buckets,
 * O(n)); returns the order and, per position, the smallest key in that position's bucket.
 * Rounding is monotone, so every key in a later bucket is ≥ every key in an earlier one.
 */
function bucketOrder(keys: Float64Array): { order: Uint32Array; floor: Float64Array } {
  const n = keys.length;
  let lo = Infinity, hi = -Infinity;
  for (let i = 0; i < n; i++) {
    const k = keys[i]!;
    if (k < lo) lo = k;
    if (k > hi) hi = k;
  }
  // A zero (or denormal-tiny) range puts every segment in bucket 0 rather than dividing by ~0.
  const scale = hi > lo && Number.isFinite(n / (hi - lo)) ? n / (hi - lo) : 0;
  const bucket = new Uint32Array(n);
  const count = new Uint32Array(n + 1);
  const bucketMin = new Float64Array(n).fill(Infinity);
  for (let i = 0; i < n; i++) {
    const k = keys[i]!;
    const b = Math.min(n - 1, Math.floor((k - lo) * scale));
    bucket[i] = b;
    count[b + 1]!++;
    if (k < bucketMin[b]!) bucketMin[b] = k;
  }
  for (let b = 0; b < n; b++) count[b + 1]! += count[b]!;
  const order = new Uint32Array(n);
  const floor = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    const b = bucket[i]!;
    const at = count[b]!;
    order[at] = i;
    floor[at] = bucketMin[b]!;
    count[b] = at + 1;
  }
  return { order, floor };
}

function spread(v: Float64Array): number {
  let lo = Infinity, hi = -Infinity;
  for (let i = 0; i < v.length; i++) {
    const x = v[i]!;
    if (x < lo) lo = x;
    if (x > hi) hi = x;
  }
  return hi - lo;
}

export function sweepPairs(x: Float64Array, y: Float64Array, ends: Uint32Array, visit: (a: number, b: number) => boolean): void {
  const n = ends.length;
  const [u, w] = spread(x) >= spread(y) ? [x, y] : [y, x];
  const uLo = new Float64Array(n), uHi = new Float64Array(n), wLo = new Float64Array(n), wHi = new Float64Array(n);
  for (let k = 0; k < n; k++) {
    const e = ends[k]!;
    const u0 = u[k]!, u1 = u[e]!, w0 = w[k]!, w1 = w[e]!;
    uLo[k] = Math.min(u0, u1);
    uHi[k] = Math.max(u0, u1);
    wLo[k] = Math.min(w0, w1);
    wHi[k] = Math.max(w0, w1);
  }
  const { order, floor } = bucketOrder(uLo);
  const active: number[] = [];
  for (let o = 0; o < n; o++) {
    const s = order[o]!;
    const passed = floor[o]!;
    const sLo = uLo[s]!, sHi = uHi[s]!, lo = wLo[s]!, hi = wHi[s]!;
    let i = 0;
    while (i < active.length) {
      const a = active[i]!;
      const aHi = uHi[a]!;
      if (aHi < passed) {
        // Swap-remove: every segment still to come starts beyond segment a's upper end.
        active[i] = active[active.length - 1]!;
        active.pop();
        continue;
      }
      const overlaps = uLo[a]! <= sHi && sLo <= aHi && wLo[a]! <= hi && lo <= wHi[a]!;
      if (overlaps && !visit(a, s)) return;
      i++;
    }
    active.push(s);
  }
}
