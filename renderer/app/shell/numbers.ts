/** Reading typed numbers: decimals, exponents, fractions "3/4" and mixed numbers "1 3/8" (common in inch work). */
export type Parsed = { readonly ok: true; readonly value: number } | { readonly ok: false; readonly message: string };

export function parseNumber(text: string, what: string): Parsed {
  const t = text.trim().replace(/,/g, '.');
  if (t === '') return { ok: false, message: `${what}: enter a number` };
  const mixed = /^(-?)(\d+)\s+(\d+)\/(\d+)$/.exec(t);
  if (mixed) {
    const v = Number(mixed[2]) + Number(mixed[3]) / Number(mixed[4]);
    return Number(mixed[4]) === 0 ? { ok: false, message: `${what}: "${text}" divides by zero` } : { ok: true, value: mixed[1] ? -v : v };
  }
  const frac = /^(-?\d+(?:\.\d+)?)\/(\d+(?:\.\d+)?)$/.exec(t);
  if (frac) {
    const d = Number(frac[2]);
    return d === 0 ? { ok: false, message: `${what}: "${text}" divides by zero` } : { ok: true, value: Number(frac[1]) / d };
  }
  const v = Number(t);
  if (!/^[-+]?(\d+\.?\d*|\.\d+)(e[-+]?\d+)?$/i.test(t) || !Number.isFinite(v)) return { ok: false, message: `${what}: "${text}" is not a number` };
  return { ok: true, value: v };
}
