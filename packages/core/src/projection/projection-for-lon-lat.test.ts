import { describe, expect, it } from 'vitest';
import { isCoreError } from '../errors.js';
import { projectionForLonLat } from './projection-for-lon-lat.js';

const f = (...v: number[]) => Float64Array.from(v);

describe('projectionForLonLat', () => {
  it('chooses the UTM zone of the mean longitude and records EPSG and proj4', () => {
    const p = projectionForLonLat(f(3.2, 3.8), f(45.4, 45.6));
    expect(p).toMatchObject({ kind: 'utm', epsg: 32631, label: 'UTM zone 31N (EPSG:32631)' });
    expect(p.proj4).toBe('+proj=utm +zone=31 +datum=WGS84 +units=m +no_defs');
    expect(p.centerLon).toBeCloseTo(3.5, 12);
  });
  it('works in open sea (the demo city is fictional and offshore)', () => {
    expect(projectionForLonLat(f(-31.9, -31.7), f(-38.1, -37.9)).epsg).toBe(32725);
    // The demo city's invented centre, 38.5°W 44.5°N: zone floor(141.5 / 6) + 1 = 24 north.
    expect(projectionForLonLat(f(-38.7, -38.3), f(44.3, 44.7)).label).toBe('UTM zone 24N (EPSG:32624)');
  });
  it('uses the zone of the wrapped mean for data across the antimeridian', () => {
    const p = projectionForLonLat(f(179.4, -179.8), f(-17, -17));
    expect(p.epsg).toBe(32760);
  });
  it('rejects data wider than UTM allows with PROJECTION_SPAN naming the span and the fix', () => {
    try {
      projectionForLonLat(f(1, 9), f(50, 50));
      expect.unreachable();
    } catch (e) {
      expect(isCoreError(e, 'PROJECTION_SPAN')).toBe(true);
      expect((e as Error).message).toMatch(/span 8° of longitude/);
      expect((e as Error).message).toMatch(/projection 'laea'/);
    }
  });
  it('rejects polar data for UTM and accepts it for LAEA', () => {
    expect(() => projectionForLonLat(f(10, 20), f(85, 86))).toThrow(/beyond UTM's limits/);
    const p = projectionForLonLat(f(10, 20), f(85, 86), { projection: 'laea' });
    expect(p.kind).toBe('laea');
    expect(p.epsg).toBeNull();
    expect(p.proj4).toMatch(/^\+proj=laea \+lat_0=85\.5 \+lon_0=15 /);
  });
  it('accepts a wide region with LAEA but rejects one over 1,000 km from its centre', () => {
    expect(projectionForLonLat(f(1, 9), f(50, 50), { projection: 'laea' }).kind).toBe('laea');
    expect(() => projectionForLonLat(f(-10, 20), f(40, 55), { projection: 'laea' })).toThrow(/split the customer file/i);
  });
  it('rejects an unknown projection name', () => {
    expect(() => projectionForLonLat(f(1), f(1), { projection: 'mercator' as never })).toThrow(/'utm' or 'laea'/);
  });
});
