/**
 * How many AISC v15.0 rows of each family the catalogue rebuilds within tolerance of their
 * published nominal weight (core/catalogue/measure.ts; 1 %, or the rounding of W), one line per
 * family: value = rows within, baseline = rows in the family, ratio = the fraction within.
 * Then the rows outside, by reason: proven published inconsistencies among all rows outside.
 * The last line times the whole measurement (baseline: building the 2,091 regions alone).
 * The rows outside and their reasons are listed in docs/catalogue-conventions.md.
 */
import { standardCatalogue } from '../../core/catalogue/index.ts';
import { familyAgreement, weightMissReason } from '../../core/catalogue/measure.ts';
import { getPartType } from '../../core/parts/index.ts';
import { medianMs, type BenchLine } from './report.ts';

export async function bench(): Promise<BenchLine[]> {
  const entries = standardCatalogue().entries;
  const families = familyAgreement(entries);
  const lines: BenchLine[] = families.map((f) => ({
    name: `catalogue-weight-within-${f.family}`,
    value: f.within,
    unit: 'rows',
    baseline: f.rows,
    baselineUnit: 'rows',
    ratio: f.within / f.rows,
    detail: `worst ${f.worst.designation} ${(f.worst.relative * 100).toFixed(2)} %`,
  }));
  const within = families.reduce((n, f) => n + f.within, 0);
  const rows = families.reduce((n, f) => n + f.rows, 0);
  lines.push({ name: 'catalogue-weight-within-all', value: within, unit: 'rows', baseline: rows, baselineUnit: 'rows', ratio: within / rows });
  // The rows outside, by their reason (weightMissReason): proven published inconsistencies against our rules' misses.
  const reasons = entries.map((e) => weightMissReason(e, entries.filter((x) => x.family === e.family))).filter((r): r is string => r !== undefined);
  const proven = reasons.filter((r) => r.startsWith('published inconsistency')).length;
  lines.push({ name: 'catalogue-weight-outside-published-inconsistency', value: proven, unit: 'rows', baseline: reasons.length, baselineUnit: 'rows outside', ratio: reasons.length === 0 ? 0 : proven / reasons.length, detail: `${reasons.length - proven} our misses, each listed with its reason (docs/catalogue-conventions.md)` });
  const ms = medianMs(() => familyAgreement(entries), 3, 1);
  const buildOnly = medianMs(() => entries.forEach((e) => getPartType(e.shape)?.region(e.params)), 3, 1);
  lines.push({ name: 'catalogue-measure-time', value: ms, unit: 'ms', baseline: buildOnly, baselineUnit: 'ms', ratio: ms / buildOnly });
  return Promise.resolve(lines);
}
