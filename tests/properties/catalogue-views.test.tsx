/**
 * One property catalogue serves every view (issue 11 item 5): this walks core/properties/catalogue.ts
 * and checks that each entry is listed by every view it names (results panel, CSV, the drawings'
 * table in SVG and DXF, the printed report, the command line's table and JSON), and by no view it
 * does not name. So adding a property is one catalogue line, and forgetting a view fails here.
 *
 * Only presence is checked here; values are checked against closed forms in the export, report
 * and command-line tests. The section is a 4 × 6 in plate with a 1 in hole off centre (our own
 * trailer-frame gusset), so no value is zero and every row has a number.
 */
import { renderToStaticMarkup } from 'react-dom/server';
import { describe, expect, it } from 'vitest';
import type { CliIo } from '../../cli/command.ts';
import { propsCommand } from '../../cli/commands/props.ts';
import { sectionDxf } from '../../core/dxf/index.ts';
import { propertiesCsv } from '../../core/export/csv.ts';
import { escapeXml, sectionSvg } from '../../core/export/svg.ts';
import { NET_CATALOGUE, PROPERTY_CATALOGUE, TORSION_CATALOGUE, type CatalogueEntry, type PropertyView } from '../../core/properties/catalogue.ts';
import { netSectionProperties } from '../../core/properties/net.ts';
import { CAUTION } from '../../core/member/check.ts';
import { sectionFromDocument } from '../../core/section/index.ts';
import type { TorsionResult } from '../../core/torsion/types.ts';
import { defaultDisplaySet } from '../../core/units/index.ts';
import { sectionReportInput } from '../../renderer/app/report/report-input.ts';
import { ResultsPanel } from '../../renderer/app/results/ResultsPanel.tsx';
import { circle, document, rectangle } from '../export/sections.ts';

const doc = document('trailer frame gusset', [rectangle('p', 'gusset', 4, 6), circle('h', 'hole', 1, 0.7, -1.1, 'subtract')]);
const section = sectionFromDocument(doc);
const p = section.properties!;
const display = defaultDisplaySet('in');
// Presence only: these torsion numbers are placeholders for the rows, not results checked anywhere.
const torsion: TorsionResult = { J: 50, Cw: 3, xs: 0.1, ys: -0.2, meshElements: 100, meshNodes: 250, iterations: 10, jRelativeError: 1e-4, components: 1 };

const panel = renderToStaticMarkup(
  <ResultsPanel
    results={{ properties: p, stale: null, diagnostics: [], hiddenParts: 0, net: netSectionProperties(section.region), fastenerHoles: 1, millis: 1 }}
    unit="in"
    display={display}
    sig={4}
    torsion={{ kind: 'done', result: torsion, millis: 1, doc }}
    current={doc}
  />,
);
const csvHeader = (propertiesCsv({ name: doc.name, unit: 'in', properties: p, torsion }).split(/\r?\n/)[0] ?? '').split(',');
const svg = sectionSvg({ name: doc.name, unit: 'in', section });
const dxf = sectionDxf({ name: doc.name, unit: 'in', region: section.region, properties: p, table: true, caution: CAUTION });
const report = sectionReportInput({ doc, display, sig: 4, torsion, member: null });
const reportSymbols = report.ok ? report.input.tables.flatMap((t) => t.rows.map((r) => r[0])) : [];

function cli(flags: Record<string, string | boolean>): string {
  let out = '';
  const io: CliIo = { out: (t) => { out += t; }, err: () => undefined, readFile: () => JSON.stringify(doc) };
  propsCommand.run(['gusset.json'], flags, io, {});
  return out;
}
const cliJson = JSON.parse(cli({ json: true })) as Record<string, unknown> & { units: Record<string, string> };
const cliTable = cli({}).split('\n');

/** Does a view list this entry? */
const lists: Record<PropertyView, (e: CatalogueEntry<string>) => boolean> = {
  panel: (e) => panel.includes(`data-testid="result-${e.key}"`),
  csv: (e) => csvHeader.some((h) => h.startsWith(`${e.key} [`)),
  drawing: (e) => svg.includes(`>${escapeXml(e.symbol)}</text>`),
  report: (e) => reportSymbols.includes(e.symbol),
  cli: (e) => Object.hasOwn(cliJson, e.key) && cliTable.some((line) => line.trimStart().startsWith(`${e.key} `)),
};
const VIEWS = Object.keys(lists) as PropertyView[];

describe('the property catalogue is the one list every view reads', () => {
  it('the report was built', () => expect(report.ok).toBe(true));

  it.each(PROPERTY_CATALOGUE.map((e) => [e.key, e] as const))('%s is listed by exactly the views it names', (_key, e) => {
    for (const v of VIEWS) expect([v, lists[v](e)]).toEqual([v, e.views.includes(v)]);
  });

  it('every drawing entry is in the DXF property table too, and every CLI key has its unit in the JSON "units"', () => {
    for (const e of PROPERTY_CATALOGUE) {
      if (e.views.includes('drawing')) expect(dxf, e.key).toContain(`${e.symbol} = `);
      if (e.views.includes('cli')) expect(cliJson.units[e.key], e.key).toBeTruthy();
    }
  });

  it.each(TORSION_CATALOGUE.map((e) => [e.key, e] as const))('torsion result %s is listed by the panel, CSV and report exactly when the catalogue says', (_key, e) => {
    for (const v of ['panel', 'csv', 'report'] as const) expect([v, lists[v](e)]).toEqual([v, e.views.includes(v)]);
  });

  it('a view lists nothing the catalogue does not hold: the panel has one result row per panel entry', () => {
    const rows = panel.match(/data-testid="result-(?!net-)[A-Za-z0-9]+"/g) ?? [];
    const expected = [...PROPERTY_CATALOGUE, ...TORSION_CATALOGUE].filter((e) => e.views.includes('panel')).length;
    expect(rows).toHaveLength(expected);
    const reportRows = reportSymbols.filter((s) => s !== 'Cw, xs, ys');
    expect(reportRows).toHaveLength([...PROPERTY_CATALOGUE, ...TORSION_CATALOGUE].filter((e) => e.views.includes('report')).length);
  });
});

describe('the net-section rows come from the catalogue too', () => {
  // The same gusset, its hole a fastener hole (format version 3 cut-out role): a net section exists.
  const v3 = {
    format: 'sectionsmith-section', version: 3, name: doc.name, unit: 'in', materials: [], defaultMaterial: null,
    sections: [{ id: 's', name: doc.name, parts: doc.parts.map((part) => (part.operation === 'subtract' ? { ...part, cutoutRole: 'fastener-hole' } : part)) }],
  };
  let out = '';
  propsCommand.run(['gusset.json'], { json: true }, { out: (t) => { out += t; }, err: () => undefined, readFile: () => JSON.stringify(v3) }, {});
  const j = JSON.parse(out) as { net?: Record<string, number>; units: Record<string, string> };

  it.each(NET_CATALOGUE.map((e) => [e.key, e] as const))('net %s: in the panel and under "net" in the CLI JSON with its unit, as the catalogue says', (_key, e) => {
    expect(['panel', panel.includes(`data-testid="result-net-${e.key}"`)]).toEqual(['panel', e.views.includes('panel')]);
    expect(['cli', typeof j.net?.[e.key] === 'number' && typeof j.units[`net.${e.key}`] === 'string']).toEqual(['cli', e.views.includes('cli')]);
  });
});
