import { sweepPairs } from '/work/main/core/geometry/sweep.ts';
const n = 1_000_000;
const x = new Float64Array(n), y = new Float64Array(n), ends = new Uint32Array(n);
for (let i = 0; i < n; i++) { const t = (2 * Math.PI * i) / n; const r = 100 * (1 + 0.01 * Math.sin(7 * t)); x[i] = r * Math.cos(t) + 5000; y[i] = r * Math.sin(t) - 3000; ends[i] = (i + 1) % n; }
let v = 0;
for (let k = 0; k < 3; k++) { v = 0; const t0 = performance.now(); sweepPairs(x, y, ends, () => { v++; return true; }); console.log((performance.now()-t0).toFixed(0), v); }
console.log('checks/run', ((globalThis as { checks?: number }).checks ?? 0) / 3);
