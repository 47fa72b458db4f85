import { describe, expect, it } from 'vitest';
import { studyAreaFromGeoJson } from './study-area-geojson';

const ring = [
  [-38.6, 44.4],
  [-38.4, 44.4],
  [-38.4, 44.6],
  [-38.6, 44.4],
];

describe('studyAreaFromGeoJson', () => {
  it('reads a bare Polygon', () => {
    expect(studyAreaFromGeoJson(JSON.stringify({ type: 'Polygon', coordinates: [ring] }))).toEqual({ type: 'Polygon', coordinates: [ring] });
  });

  it('combines the polygons of a FeatureCollection into one MultiPolygon', () => {
    const fc = {
      type: 'FeatureCollection',
      features: [
        { type: 'Feature', properties: {}, geometry: { type: 'Polygon', coordinates: [ring] } },
        { type: 'Feature', properties: {}, geometry: { type: 'Point', coordinates: [-38.5, 44.5] } },
        { type: 'Feature', properties: {}, geometry: { type: 'MultiPolygon', coordinates: [[ring], [ring]] } },
      ],
    };
    expect(studyAreaFromGeoJson(JSON.stringify(fc))).toEqual({ type: 'MultiPolygon', coordinates: [[ring], [ring], [ring]] });
  });

  it('says when the file holds no polygon', () => {
    expect(() => studyAreaFromGeoJson(JSON.stringify({ type: 'Feature', geometry: { type: 'LineString', coordinates: ring } }))).toThrow(
      /no Polygon or MultiPolygon/,
    );
  });

  it('says when the text is not JSON', () => {
    expect(() => studyAreaFromGeoJson('<kml/>')).toThrow(/not valid JSON/);
  });

  it('refuses projected coordinates and names the fix', () => {
    const projected = { type: 'Polygon', coordinates: [[[455000, 4927000], [456000, 4927000], [456000, 4928000], [455000, 4927000]]] };
    expect(() => studyAreaFromGeoJson(JSON.stringify(projected))).toThrow(/WGS 84 \(EPSG:4326\)/);
  });
});
