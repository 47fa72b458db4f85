import { MercatorCoordinate } from 'maplibre-gl';
import { describe, expect, it } from 'vitest';
import { lonLatFromMercator, mercatorFromLonLat } from './web-mercator';
import { rasterCorners, rasterPixelCentre, rasterPixelFromLonLat, rasterValueAt, type WebRaster } from './web-raster';

/** A raster around Quillport (lon −38.5°, lat 44.5°), one hot pixel, NaN in one corner. */
function quillportRaster(width = 200, height = 160): WebRaster {
  const values = new Float32Array(width * height);
  values[0] = Number.NaN;
  values[57 + 101 * width] = 900;
  return { width, height, bounds: [-38.75, 44.3, -38.2, 44.72], values, unit: 'km2', max: 900 };
}

describe('mercatorFromLonLat', () => {
  it('matches MapLibre’s own MercatorCoordinate (the map places images with it)', () => {
    // [S] outside reference: maplibre-gl's MercatorCoordinate.fromLngLat, the projection the map draws with.
    for (const [lon, lat] of [
      [0, 0],
      [-38.5, 44.5],
      [151.2, -33.9],
      [-179.9, 84.9],
    ]) {
      const ours = mercatorFromLonLat(lon, lat);
      const theirs = MercatorCoordinate.fromLngLat([lon, lat]);
      expect(ours.x).toBeCloseTo(theirs.x, 12);
      expect(ours.y).toBeCloseTo(theirs.y, 12);
    }
  });

  it('round-trips through lonLatFromMercator', () => {
    const p = mercatorFromLonLat(-38.5, 44.5);
    const back = lonLatFromMercator(p.x, p.y);
    expect(back.lon).toBeCloseTo(-38.5, 10);
    expect(back.lat).toBeCloseTo(44.5, 10);
  });

  it('puts 45° N where the spherical formula says: y = (1 − ln(tan 67.5°)/π)/2', () => {
    // [D] closed form: ln(tan(67.5°)) = ln(1 + √2) = asinh(1) = 0.881373587…
    expect(mercatorFromLonLat(0, 45).y).toBeCloseTo((1 - Math.asinh(1) / Math.PI) / 2, 14);
  });
});

describe('raster georeferencing', () => {
  it('orders the image corners as MapLibre’s image source wants them (NW, NE, SE, SW)', () => {
    expect(rasterCorners([-38.75, 44.3, -38.2, 44.72])).toEqual([
      [-38.75, 44.72],
      [-38.2, 44.72],
      [-38.2, 44.3],
      [-38.75, 44.3],
    ]);
  });

  it('maps the outer corners to the raster edges, linear in Mercator y (MapLibre’s placement), not in latitude', () => {
    const raster = quillportRaster();
    expect(rasterPixelFromLonLat(raster, -38.75, 44.72)).toEqual({ col: 0, row: 0 });
    const se = rasterPixelFromLonLat(raster, -38.2, 44.3);
    expect(se.col).toBeCloseTo(200, 9);
    expect(se.row).toBeCloseTo(160, 9);
    // [D] the middle latitude lies north of the middle row on Mercator (rows are squeezed towards the pole).
    const mid = rasterPixelFromLonLat(raster, -38.475, (44.3 + 44.72) / 2);
    expect(mid.col).toBeCloseTo(100, 9);
    expect(mid.row).toBeGreaterThan(80);
    const topLeft = MercatorCoordinate.fromLngLat([-38.75, 44.72]);
    const bottomRight = MercatorCoordinate.fromLngLat([-38.2, 44.3]);
    const p = MercatorCoordinate.fromLngLat([-38.475, (44.3 + 44.72) / 2]);
    expect(mid.row).toBeCloseTo(((p.y - topLeft.y) / (bottomRight.y - topLeft.y)) * 160, 9);
  });

  it('maps a hot pixel’s centre back onto that pixel (well within one pixel)', () => {
    const raster = quillportRaster();
    const centre = rasterPixelCentre(raster, 57, 101);
    const back = rasterPixelFromLonLat(raster, centre.lon, centre.lat);
    expect(back.col).toBeCloseTo(57.5, 9);
    expect(back.row).toBeCloseTo(101.5, 9);
    expect(rasterValueAt(raster, centre.lon, centre.lat)).toBe(900);
  });

  it('reads NaN where the raster has no data and null off the raster', () => {
    const raster = quillportRaster();
    const nw = rasterPixelCentre(raster, 0, 0);
    expect(rasterValueAt(raster, nw.lon, nw.lat)).toBeNaN();
    expect(rasterValueAt(raster, -40, 44.5)).toBeNull();
    expect(rasterValueAt(raster, -38.5, 44.9)).toBeNull();
  });
});
