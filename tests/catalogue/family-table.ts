/**
 * Prints the measured agreement of every AISC v15.0 family with its published nominal weights
 * (core/catalogue/measure.ts) as the Markdown tables of docs/catalogue-conventions.md: rows within
 * tolerance and the worst row per family, then every row outside tolerance with its reason.
 * Run by hand after changing a convention, and paste the output into the doc:
 *   npx tsx tests/catalogue/family-table.ts
 * tests/catalogue/families.test.ts fails when the doc no longer lists every row outside.
 */
import { standardCatalogue } from '../../core/catalogue/index.ts';
import { familyAgreement, provenWeightInconsistency, weightAgreement } from '../../core/catalogue/measure.ts';

const pct = (x: number): string => `${x >= 0 ? '+' : '−'}${Math.abs(x * 100).toFixed(2)} %`;
const entries = standardCatalogue().entries;
const lines: string[] = [
  '| family | rows | within tolerance | worst row | its A vs W/(490/144) |',
  '|---|---|---|---|---|',
];
for (const f of familyAgreement(entries)) lines.push(`| ${f.family} | ${f.rows} | ${f.within} | ${f.worst.designation} | ${pct(f.worst.relative)} (tolerance ${pct(f.worst.tolerance).slice(1)}) |`);
lines.push('', '| row | A vs W/(490/144) | tolerance | reason |', '|---|---|---|---|');
for (const e of entries) {
  const a = weightAgreement(e);
  if (a === undefined || a.within) continue;
  const proven = provenWeightInconsistency(e, entries.filter((x) => x.family === e.family));
  const reason = proven !== undefined ? `published inconsistency: ${proven}` : (e.caveats.find((c) => c.startsWith('published weight')) ?? 'not reproduced by the family rule (our miss)');
  lines.push(`| ${e.designation} | ${pct(a.relative)} | ${pct(a.tolerance).slice(1)} | ${reason} |`);
}
console.log(lines.join('\n'));
