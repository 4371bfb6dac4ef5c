/**
 * Checking a cold-formed product table: the usual column names (Depth, Flange width, Lip,
 * Thickness, Inside radius; common practice) are recognised, each row is rebuilt as the exact
 * bent-sheet part, and its tabulated A, Ix, Iy compared. The tabulated values of this table are
 * computed by the AISI linear method (AISI S100; AISI Cold-Formed Steel Design Manual, Part I;
 * tests/parts/aisi-linear.ts) and printed to 3 significant figures, as product tables print them;
 * the sections are our own (joists, tracks and a purlin), not a manufacturer's.
 */
import { describe, expect, it } from 'vitest';
import { checkTable, familyOf } from '../../core/check/index.ts';
import { linearMethod, midLine, type P } from '../parts/aisi-linear.ts';

interface Row { name: string; type: string; D: number; B: number; L: number; t: number; R: number }

function channelPath(r: Row): P[] {
  const { D, B, L, t } = r;
  if (L === 0) return [[B, D / 2 - t / 2], [t / 2, D / 2 - t / 2], [t / 2, -D / 2 + t / 2], [B, -D / 2 + t / 2]];
  return [[B - t / 2, D / 2 - L], [B - t / 2, D / 2 - t / 2], [t / 2, D / 2 - t / 2], [t / 2, -D / 2 + t / 2], [B - t / 2, -D / 2 + t / 2], [B - t / 2, -D / 2 + L]];
}

const ROWS: Row[] = [
  { name: 'joist 8-2.5-75', type: 'lipped channel', D: 8, B: 2.5, L: 0.625, t: 0.075, R: 0.1125 },
  { name: 'joist 10-2.5-68', type: 'lipped channel', D: 10, B: 2.5, L: 0.625, t: 0.0677, R: 0.1015 },
  { name: 'stud 6-1.625-54', type: 'LC', D: 6, B: 1.625, L: 0.5, t: 0.0566, R: 0.0849 },
  { name: 'track 6-1.25-43', type: 'track', D: 6.125, B: 1.25, L: 0, t: 0.0451, R: 0.0677 },
];

const g = (x: number): string => x.toPrecision(3);

function tableText(change?: { row: number; column: 'A' | 'Ix'; factor: number }): string {
  const lines = ['Designation,Type,Depth (in),Flange width (in),Lip (in),Thickness (in),Inside radius (in),A (in^2),Ix (in^4),Iy (in^4)'];
  ROWS.forEach((r, i) => {
    const lin = linearMethod(midLine(channelPath(r), r.R + r.t / 2).line, r.t);
    const f = (c: 'A' | 'Ix'): number => (change !== undefined && change.row === i && change.column === c ? change.factor : 1);
    lines.push([r.name, r.type, r.D, r.B, r.L === 0 ? '' : r.L, r.t, r.R, g(lin.A * f('A')), g(lin.Ix * f('Ix')), g(lin.Iy)].join(','));
  });
  return `${lines.join('\n')}\n`;
}

describe('a cold-formed product table', () => {
  it('reads "lipped channel", "LC" and "track" as families', () => {
    expect(familyOf('lipped channel')).toBe('LC');
    expect(familyOf('Lipped-Channel')).toBe('LC');
    expect(familyOf('track')).toBe('TRACK');
    expect(familyOf('hat')).toBe('HAT');
  });

  it('maps Depth, Flange width, Lip, Thickness, Inside radius and passes every row against the AISI linear method at 1 %', () => {
    const result = checkTable(tableText(), { tolerances: { default: 0.01 } });
    for (const row of result.rows) {
      expect(row.findings, row.designation).toEqual([]);
      expect(row.properties.map((p) => p.symbol).sort(), row.designation).toEqual(['A', 'Ix', 'Iy']);
    }
    expect(result.rows.map((r) => r.part?.shape)).toEqual(['lipped-channel', 'lipped-channel', 'lipped-channel', 'track']);
    expect(result.summary.rowsFlagged).toBe(0);
  });

  it('flags the one row whose Ix was raised 3 %, and only that row', () => {
    const result = checkTable(tableText({ row: 1, column: 'Ix', factor: 1.03 }), { tolerances: { default: 0.01 } });
    expect(result.rows.filter((r) => r.flagged).map((r) => r.designation)).toEqual(['joist 10-2.5-68']);
  });

  it('a lipped-channel row without a lip is named, and is "not checked" (nothing could be compared), not flagged or passed', () => {
    const text = 'Designation,Type,Depth,Flange width,Thickness,A\njoist,LC,8,2.5,0.075,1.1\n';
    const result = checkTable(text, { tolerances: { default: 0.01 } });
    expect(result.rows[0]!.status).toBe('not checked');
    expect(result.rows[0]!.notCheckedReason).toContain('lip L');
  });
});
