// Material fills and hatches on the drawing (renderer/app/canvas/material-style.ts): every pair of
// materials differs in fill or in hatch, up to fills × hatches materials (counting).
import { describe, expect, it } from 'vitest';
import { MATERIAL_FILLS, materialStyles } from '../../renderer/app/canvas/material-style.ts';

describe('material styles', () => {
  it('the first materials each get their own fill and no hatch', () => {
    const s = materialStyles(['steel', 'timber']);
    expect(s.get('steel')?.hatch).toBe('none');
    expect(s.get('timber')?.hatch).toBe('none');
    expect(s.get('steel')?.fill).not.toBe(s.get('timber')?.fill);
  });

  it('past the palette, a repeated fill carries a hatch: no two of fills × 4 materials look alike', () => {
    const ids = Array.from({ length: MATERIAL_FILLS.length * 4 }, (_, i) => `m${i}`);
    const s = materialStyles(ids);
    const looks = new Set(ids.map((id) => `${s.get(id)?.fill}/${s.get(id)?.hatch}`));
    expect(looks.size).toBe(ids.length);
    expect(s.get(`m${MATERIAL_FILLS.length}`)?.hatch).toBe('diagonal');
  });
});
