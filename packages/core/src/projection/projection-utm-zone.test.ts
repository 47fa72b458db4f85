import { describe, expect, it } from 'vitest';
import { projectionUtmZone } from './projection-utm-zone.js';

// Zone numbering: NIMA TM 8358.2 "The Universal Grids" [S] — zone 1 spans 180°W–174°W, zone 31
// spans 0°–6°E, central meridian = 6·zone − 183. EPSG codes 326zz / 327zz (EPSG registry [S]).
describe('projectionUtmZone', () => {
  it('finds zone 31N for 3.5°E 45.5°N', () => {
    const z = projectionUtmZone(3.5, 45.5);
    expect(z).toMatchObject({ zone: 31, hemisphere: 'north', epsg: 32631, centralMeridian: 3 });
    expect(z.proj4).toBe('+proj=utm +zone=31 +datum=WGS84 +units=m +no_defs');
  });
  it('finds zone 1 at 180°W and zone 60 at 179.9°E', () => {
    expect(projectionUtmZone(-180, 10).zone).toBe(1);
    expect(projectionUtmZone(179.9, 10).zone).toBe(60);
    expect(projectionUtmZone(180, 10).zone).toBe(1);
  });
  it('uses the southern code and +south below the equator', () => {
    const z = projectionUtmZone(-43.2, -22.9);
    expect(z).toMatchObject({ zone: 23, hemisphere: 'south', epsg: 32723, centralMeridian: -45 });
    expect(z.proj4).toContain('+south');
  });
  it('wraps longitudes beyond 180°', () => {
    expect(projectionUtmZone(181, 0).zone).toBe(1);
  });
});
