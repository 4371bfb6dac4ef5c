/**
 * Sort-and-sweep over segments: visits every pair of segments whose bounding boxes overlap.
 *
 * Segment k runs from point k to point ends[k]. The sweep runs along the longer side of the
 * points' box: segments are sorted by their lower end on that axis (an in-place quicksort on
 * typed arrays, O(n log n)); an active list holds the segments the sweep line still cuts, pruned
 * as it passes their upper end; each new segment is paired with the active ones whose extent on
 * the other axis overlaps its own. Cost O(n log n + n·k), k = the number of segments one sweep
 * line cuts (small for section outlines; a dense stack of long parallel edges is the bad case).
 * Boxes that merely touch count as overlapping (closed boxes), so touching segments are visited.
 * `visit` returns false to stop early. Units: any. Source: Shamos & Hoey (1976); the
 * "sweep and prune" broad phase (common practice).
 */

/** Sorts ids[lo..hi] by keys[ids[·]] ascending (Hoare partition, insertion sort below 16). */
function sortByKey(keys: Float64Array, ids: Uint32Array, lo: number, hi: number): void {
  while (hi - lo > 16) {
    const pivot = keys[ids[(lo + hi) >> 1] ?? 0] ?? 0;
    let i = lo, j = hi;
    while (i <= j) {
      while ((keys[ids[i] ?? 0] ?? 0) < pivot) i++;
      while ((keys[ids[j] ?? 0] ?? 0) > pivot) j--;
      if (i <= j) {
        const t = ids[i] ?? 0;
        ids[i] = ids[j] ?? 0;
        ids[j] = t;
        i++;
        j--;
      }
    }
    // Recurse into the smaller side, loop on the larger: stack depth stays O(log n).
    if (j - lo < hi - i) {
      sortByKey(keys, ids, lo, j);
      lo = i;
    } else {
      sortByKey(keys, ids, i, hi);
      hi = j;
    }
  }
  for (let i = lo + 1; i <= hi; i++) {
    const id = ids[i] ?? 0;
    const key = keys[id] ?? 0;
    let j = i - 1;
    while (j >= lo && (keys[ids[j] ?? 0] ?? 0) > key) {
      ids[j + 1] = ids[j] ?? 0;
      j--;
    }
    ids[j + 1] = id;
  }
}

function spread(v: Float64Array): number {
  let lo = Infinity, hi = -Infinity;
  for (const x of v) {
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
    const e = ends[k] ?? 0;
    const u0 = u[k] ?? 0, u1 = u[e] ?? 0, w0 = w[k] ?? 0, w1 = w[e] ?? 0;
    uLo[k] = Math.min(u0, u1);
    uHi[k] = Math.max(u0, u1);
    wLo[k] = Math.min(w0, w1);
    wHi[k] = Math.max(w0, w1);
  }
  const order = new Uint32Array(n);
  for (let k = 0; k < n; k++) order[k] = k;
  sortByKey(uLo, order, 0, n - 1);
  const active: number[] = [];
  for (let o = 0; o < n; o++) {
    const s = order[o] ?? 0;
    const start = uLo[s] ?? 0, lo = wLo[s] ?? 0, hi = wHi[s] ?? 0;
    let i = 0;
    while (i < active.length) {
      const a = active[i] ?? 0;
      if ((uHi[a] ?? 0) < start) {
        // Swap-remove: the sweep has passed segment a for good.
        active[i] = active[active.length - 1] ?? 0;
        active.pop();
        continue;
      }
      if ((wLo[a] ?? 0) <= hi && lo <= (wHi[a] ?? 0) && !visit(a, s)) return;
      i++;
    }
    active.push(s);
  }
}
