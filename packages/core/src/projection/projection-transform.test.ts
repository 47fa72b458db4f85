import { describe, expect, it } from 'vitest';
import { haversineMetres } from '../lib/haversine.js';
import { projectionForLonLat } from './projection-for-lon-lat.js';
import { projectionConverter } from './projection-transform.js';

const f = (...v: number[]) => Float64Array.from(v);

/**
 * UTM by Krüger's n-series to third order, as published in "Universal Transverse Mercator
 * coordinate system" (Wikipedia, formulas after Kawase 2011 / Karney 2011) [S]; WGS84 a and 1/f
 * from NIMA TR8350.2 [S]. Accurate to well under a millimetre within a zone. Independent of proj4.
 */
function utmKruger(lonDeg: number, latDeg: number, zone: number, south: boolean): [number, number] {
  const a = 6378137;
  const fl = 1 / 298.257223563;
  const n = fl / (2 - fl);
  const A = (a / (1 + n)) * (1 + n ** 2 / 4 + n ** 4 / 64);
  const alpha = [n / 2 - (2 / 3) * n ** 2 + (5 / 16) * n ** 3, (13 / 48) * n ** 2 - (3 / 5) * n ** 3, (61 / 240) * n ** 3];
  const k0 = 0.9996;
  const phi = (latDeg * Math.PI) / 180;
  const dl = ((lonDeg - (zone * 6 - 183)) * Math.PI) / 180;
  const c = (2 * Math.sqrt(n)) / (1 + n);
  const t = Math.sinh(Math.atanh(Math.sin(phi)) - c * Math.atanh(c * Math.sin(phi)));
  const xi = Math.atan(t / Math.cos(dl));
  const eta = Math.atanh(Math.sin(dl) / Math.sqrt(1 + t * t));
  let e = eta;
  let nn = xi;
  for (let j = 1; j <= 3; j++) {
    e += alpha[j - 1] * Math.cos(2 * j * xi) * Math.sinh(2 * j * eta);
    nn += alpha[j - 1] * Math.sin(2 * j * xi) * Math.cosh(2 * j * eta);
  }
  return [500000 + k0 * A * e, (south ? 10_000_000 : 0) + k0 * A * nn];
}

describe('projectionConverter', () => {
  it('matches the published Krüger-series UTM formulas to < 1 mm [S]', () => {
    const lon = f(3.5, 1.2, 5.9, 3);
    const lat = f(45.5, 10.1, 60.3, 0);
    const p = projectionForLonLat(lon, lat);
    const { x, y } = projectionConverter(p).forward(lon, lat);
    for (let i = 0; i < lon.length; i++) {
      const [ex, ny] = utmKruger(lon[i], lat[i], 31, false);
      expect(Math.abs(x[i] - ex)).toBeLessThan(1e-3);
      expect(Math.abs(y[i] - ny)).toBeLessThan(1e-3);
    }
    // On the central meridian at the equator: E = 500,000 m, N = 0 by definition of UTM [S].
    expect(x[3]).toBeCloseTo(500000, 6);
    expect(y[3]).toBeCloseTo(0, 6);
  });
  it('matches the Krüger series in the southern hemisphere (false northing 10,000 km) [S]', () => {
    const lon = f(-31.9, -31.7);
    const lat = f(-38.1, -37.9);
    const { x, y } = projectionConverter(projectionForLonLat(lon, lat)).forward(lon, lat);
    const [ex, ny] = utmKruger(-31.9, -38.1, 25, true);
    expect(Math.abs(x[0] - ex)).toBeLessThan(1e-3);
    expect(Math.abs(y[0] - ny)).toBeLessThan(1e-3);
  });
  for (const kind of ['utm', 'laea'] as const) {
    it(`${kind}: round trip lon/lat → metres → lon/lat within 1 mm`, () => {
      const lon = f(-31.95, -31.8, -31.62, -31.7);
      const lat = f(-38.2, -37.95, -37.81, -38.0);
      const c = projectionConverter(projectionForLonLat(lon, lat, { projection: kind }));
      const { x, y } = c.forward(lon, lat);
      const back = c.inverse(x, y);
      for (let i = 0; i < lon.length; i++) {
        expect(haversineMetres(lon[i], lat[i], back.lon[i], back.lat[i])).toBeLessThan(1e-3);
      }
    });
    it(`${kind}: two points 1 km apart by haversine are 1 km apart in metres (< 0.1 %)`, () => {
      // 1 km north-east of the first point on the sphere of mean radius 6371.0088 km [D].
      const lon0 = -31.8;
      const lat0 = -38.0;
      const d = 1000 / 6371008.8;
      const b = Math.PI / 4;
      const p0 = (lat0 * Math.PI) / 180;
      const p1 = Math.asin(Math.sin(p0) * Math.cos(d) + Math.cos(p0) * Math.sin(d) * Math.cos(b));
      const l1 = lon0 + (Math.atan2(Math.sin(b) * Math.sin(d) * Math.cos(p0), Math.cos(d) - Math.sin(p0) * Math.sin(p1)) * 180) / Math.PI;
      const lat1 = (p1 * 180) / Math.PI;
      expect(haversineMetres(lon0, lat0, l1, lat1)).toBeCloseTo(1000, 6);
      const c = projectionConverter(projectionForLonLat(f(lon0, l1), f(lat0, lat1), { projection: kind }));
      const { x, y } = c.forward(f(lon0, l1), f(lat0, lat1));
      const planar = Math.hypot(x[1] - x[0], y[1] - y[0]);
      expect(Math.abs(planar / 1000 - 1)).toBeLessThan(1e-3);
    });
  }
  it('transforms across the antimeridian continuously', () => {
    const lon = f(179.9, -179.9);
    const lat = f(-17, -17);
    const c = projectionConverter(projectionForLonLat(lon, lat));
    const { x, y } = c.forward(lon, lat);
    expect(Math.hypot(x[1] - x[0], y[1] - y[0]) / 1000).toBeCloseTo(21.3, 0);
    const back = c.inversePoint(x[1], y[1]);
    expect(back[0]).toBeCloseTo(-179.9, 9);
  });
});
