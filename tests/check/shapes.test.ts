/**
 * The table check rebuilds rows with the same modelling conventions as core/catalogue: for
 * every AISC v15.0 catalogue entry of the families a table may hold, the part built from the
 * entry's published dimensions equals the catalogue's own part exactly (identity, no tolerance).
 */
import { describe, expect, it } from 'vitest';
import { standardCatalogue } from '../../core/catalogue/index.ts';
import { familyOf, tablePart } from '../../core/check/index.ts';

describe('table rows use the catalogue conventions', () => {
  it('all W, M, HP, S, C, MC, WT, MT, ST, L, HSS and Pipe entries (1,452) give the catalogue part', () => {
    let n = 0;
    for (const e of standardCatalogue().entries) {
      const family = familyOf(e.family);
      if (family === undefined) continue;
      const built = tablePart(family, e.dimensions, e.designation, 'in');
      expect(built.ok && { shape: built.part.shape, params: built.part.params }, e.designation).toEqual({ shape: e.shape, params: e.params });
      n++;
    }
    // AISC Shapes Database v15.0: 2,091 shapes, less 639 double angles (2L), which a table row does not model.
    expect(n).toBe(1452);
  });
});
