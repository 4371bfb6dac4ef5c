// core/geojson.ts: RFC 7946 Polygon, MultiPolygon, Feature and FeatureCollection read as a region,
// with errors naming the JSON path. Expected structure from RFC 7946 §3.1.6 (linear rings) and §3.2–3.3.
import { describe, expect, it } from 'vitest';
import { geoJsonPathOf, isGeoJson, regionFromGeoJson } from '../../core/geojson.ts';

const square = [[0, 0], [10, 0], [10, 10], [0, 10], [0, 0]];
const hole = [[2, 2], [2, 4], [4, 4], [4, 2], [2, 2]];

function errors(value: unknown): string[] {
  const r = regionFromGeoJson(value);
  return r.ok ? [] : r.errors.map((e) => e.message);
}

describe('reading GeoJSON areas', () => {
  it('a Polygon: first ring outer, the rest holes, closing position dropped', () => {
    const r = regionFromGeoJson({ type: 'Polygon', coordinates: [square, hole] });
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    expect(r.region.length).toBe(1);
    expect(Array.from(r.region[0]?.outer.xy ?? [])).toEqual([0, 0, 10, 0, 10, 10, 0, 10]);
    expect(Array.from(r.region[0]?.holes[0]?.xy ?? [])).toEqual([2, 2, 2, 4, 4, 4, 4, 2]);
    expect(r.vertexCount).toBe(8);
    expect(r.sources).toEqual(['coordinates']);
  });

  it('a MultiPolygon gives one polygon per member, a FeatureCollection one per feature polygon', () => {
    const mp = regionFromGeoJson({ type: 'MultiPolygon', coordinates: [[square], [square.map(([x, y]) => [(x ?? 0) + 20, y ?? 0])]] });
    expect(mp.ok && mp.sources).toEqual(['coordinates[0]', 'coordinates[1]']);
    const fc = regionFromGeoJson({
      type: 'FeatureCollection',
      features: [
        { type: 'Feature', properties: null, geometry: { type: 'Polygon', coordinates: [square] } },
        { type: 'Feature', properties: {}, geometry: { type: 'MultiPolygon', coordinates: [[square], [square]] } },
      ],
    });
    expect(fc.ok && fc.sources).toEqual(['features[0].geometry.coordinates', 'features[1].geometry.coordinates[0]', 'features[1].geometry.coordinates[1]']);
  });

  it('a third coordinate (elevation) is allowed and ignored (RFC 7946 §3.1.1)', () => {
    const r = regionFromGeoJson({ type: 'Polygon', coordinates: [square.map(([x, y]) => [x, y, 99])] });
    expect(r.ok && Array.from(r.region[0]?.outer.xy ?? [])).toEqual([0, 0, 10, 0, 10, 10, 0, 10]);
  });

  it('winding is kept as given (normalisation is core/geometry\'s job)', () => {
    const cw = [[0, 0], [0, 10], [10, 10], [10, 0], [0, 0]];
    const r = regionFromGeoJson({ type: 'Polygon', coordinates: [cw] });
    expect(r.ok && Array.from(r.region[0]?.outer.xy ?? [])).toEqual([0, 0, 0, 10, 10, 10, 10, 0]);
  });
});

describe('GeoJSON errors name the path', () => {
  it('a bad position inside a FeatureCollection: features[3].geometry.coordinates[0][5]', () => {
    const ring = [[0, 0], [10, 0], [10, 5], [10, 10], [5, 10], ['a', 10], [0, 0]];
    const feature = (coords: unknown) => ({ type: 'Feature', properties: null, geometry: { type: 'Polygon', coordinates: coords } });
    expect(errors({ type: 'FeatureCollection', features: [feature([square]), feature([square]), feature([square]), feature([ring])] })).toEqual([
      'features[3].geometry.coordinates[0][5]: expected a position of finite numbers, got ["a", 10]',
    ]);
  });

  it('an unclosed ring names its last position and cites RFC 7946 §3.1.6', () => {
    expect(errors({ type: 'Polygon', coordinates: [[[0, 0], [1, 0], [1, 1], [0, 1]]] })).toEqual([
      'coordinates[0][3]: expected the ring to close on its first position [0, 0] (RFC 7946 §3.1.6), got [0, 1]',
    ]);
  });

  it('too few positions, a non-area geometry, a missing geometry and an unknown type are each named', () => {
    expect(errors({ type: 'Polygon', coordinates: [[[0, 0], [1, 0], [0, 0]]] })).toEqual([
      'coordinates[0]: expected a linear ring of at least 4 positions (RFC 7946 §3.1.6: 3 corners and the first repeated), got 3',
    ]);
    expect(errors({ type: 'Feature', geometry: { type: 'LineString', coordinates: [[0, 0], [1, 1]] } })).toEqual([
      'geometry.type: expected "Polygon" or "MultiPolygon" (a section is an area), got "LineString"',
    ]);
    expect(errors({ type: 'Feature', geometry: null })).toEqual(['geometry: expected a Polygon or MultiPolygon geometry, got null']);
    expect(errors({ type: 'Point', coordinates: [0, 0] })).toEqual(['type: expected one of "Polygon", "MultiPolygon", "Feature", "FeatureCollection", got "Point"']);
    expect(errors({ type: 'FeatureCollection', features: [] })).toEqual(['features: expected at least one polygon, found none']);
  });

  it('stops after 20 problems, so a broken large file gives a readable list', () => {
    const ring = Array.from({ length: 100 }, () => [Number.NaN, 0]);
    expect(errors({ type: 'Polygon', coordinates: [ring] }).length).toBe(20);
  });

  it('maps a ring/vertex of the region back to the file: hole 0 vertex 2 → coordinates[1][2]', () => {
    expect(geoJsonPathOf(['coordinates'], 0, 0, 2)).toBe('coordinates[1][2]');
    expect(geoJsonPathOf(['features[2].geometry.coordinates[1]'], 0, -1, 7)).toBe('features[2].geometry.coordinates[1][0][7]');
  });

  it('recognises GeoJSON by its type only', () => {
    expect([isGeoJson({ type: 'Feature' }), isGeoJson({ format: 'sectionsmith-section' }), isGeoJson(null)]).toEqual([true, false, false]);
  });
});
