/**
 * The streaming check (core/check/table.ts checkTableRows): each row is handed on as it is
 * checked, the summary is the one checkTable gives, and a part computed once is reused only for
 * rows with the same shape, parameters and unit. Reference rows: AISC Shapes Database v15.0
 * (W14X90: d 14, bf 14.5, tw 0.44, tf 0.71, kdes 1.31; A 26.5 in², Ix 999 in⁴, Iy 362 in⁴).
 */
import { describe, expect, it } from 'vitest';
import { checkTable, checkTableRows, type RowCheck } from '../../core/check/index.ts';

const HEADER = 'label,type,d_in,bf_in,tw_in,tf_in,kdes_in,A_in2,Ix_in4,Iy_in4';
const W14X90 = 'W14X90,W,14,14.5,0.44,0.71,1.31,26.5,999,362';

describe('checkTableRows: the check streamed row by row', () => {
  it('hands on every row in order and gives the summary checkTable gives', () => {
    // Row 3: bf 7.25, half of the published 14.5 (an injected error).
    const text = [HEADER, W14X90, W14X90, 'W14X90,W,14,7.25,0.44,0.71,1.31,26.5,999,362'].join('\n');
    const seen: RowCheck[] = [];
    const streamed = checkTableRows(text, {}, (r) => seen.push(r));
    const whole = checkTable(text);
    expect(seen.map((r) => r.row)).toEqual([1, 2, 3]);
    expect(seen).toEqual(whole.rows);
    expect(streamed.summary).toEqual(whole.summary);
    expect(streamed.summary.rowsFlagged).toBe(1);
    expect(whole.summary.rowsPassed).toBe(2);
  });

  it('a repeated part gives the same values as the first; a changed dimension is computed afresh, not served from the first', () => {
    const text = [HEADER, W14X90, 'W14X90,W,14,7.25,0.44,0.71,1.31,26.5,999,362', W14X90].join('\n');
    const rows = checkTable(text, { readLabels: false }).rows;
    const iy = (r: RowCheck): number => r.properties.find((p) => p.symbol === 'Iy')!.computed;
    expect(iy(rows[2]!)).toBe(iy(rows[0]!));
    // Iy of a W shape is almost all flange: 2·tf·bf³/12 scales with bf³, so halving bf gives about 1/8
    // (the web's tw³ term and the fillets are small; AISC W14X90: Iy 362 in⁴ against 2·0.71·14.5³/12 = 360.8 in⁴).
    expect(iy(rows[1]!) / iy(rows[0]!)).toBeGreaterThan(0.12);
    expect(iy(rows[1]!) / iy(rows[0]!)).toBeLessThan(0.14);
    expect(rows[1]!.status).toBe('flagged');
  });

  it('the row limit still holds when streaming: one row past maxRows is refused naming the limit', () => {
    const text = [HEADER, W14X90, W14X90, W14X90].join('\n');
    expect(() => checkTableRows(text, { maxRows: 2 }, () => undefined)).toThrow(/more than 2 rows/);
  });
});
