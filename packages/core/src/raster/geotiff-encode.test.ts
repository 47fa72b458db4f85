import { fromArrayBuffer } from 'geotiff';
import { describe, expect, it } from 'vitest';
import { isCoreError } from '../errors.js';
import type { GridSpec } from '../types.js';
import { geotiffFromGrid } from './geotiff-encode.js';

const spec: GridSpec = { originX: 500_000, originY: 4_900_000, cellSize: 50, width: 4, height: 3 };

function ramp(): Float64Array {
  // value = 10·j + i, so the row (south = 0) and column of every pixel are visible in its value.
  const v = new Float64Array(12);
  for (let j = 0; j < 3; j++) for (let i = 0; i < 4; i++) v[i + j * 4] = 10 * j + i;
  return v;
}

// Read back with geotiff.js, an independent reader of the GeoTIFF 1.1 standard (OGC 19-008r4) [S].
describe('geotiffFromGrid', () => {
  it('writes north-up rows with the tie point at the north-west corner', async () => {
    const tiff = await fromArrayBuffer(geotiffFromGrid(ramp(), spec, { epsg: 32626 }));
    const image = await tiff.getImage();
    expect(image.getWidth()).toBe(4);
    expect(image.getHeight()).toBe(3);
    expect(image.getOrigin()).toEqual([500_000, 4_900_150, 0]);
    expect(image.getResolution()).toEqual([50, -50, 0]);
    const [band] = (await image.readRasters()) as unknown as Float32Array[];
    expect(band).toBeInstanceOf(Float32Array);
    // First image row is the northern grid row j = 2.
    expect(Array.from(band.slice(0, 4))).toEqual([20, 21, 22, 23]);
    expect(Array.from(band.slice(8, 12))).toEqual([0, 1, 2, 3]);
  });

  it('declares a projected CRS by EPSG code, metres and pixel-is-area', async () => {
    const image = await (await fromArrayBuffer(geotiffFromGrid(ramp(), spec, { epsg: 32626 }))).getImage();
    const keys = image.getGeoKeys();
    expect(keys?.ProjectedCSTypeGeoKey).toBe(32626);
    expect(keys?.GTModelTypeGeoKey).toBe(1);
    expect(keys?.GTRasterTypeGeoKey).toBe(1);
    expect(keys?.ProjLinearUnitsGeoKey).toBe(9001);
    expect(keys?.GTCitationGeoKey).toBe('Demandscape demand surface');
    expect(image.getSampleFormat()).toBe(3);
    expect(image.getBitsPerSample()).toBe(32);
  });

  it('marks a plane without EPSG code as user-defined', async () => {
    const image = await (await fromArrayBuffer(geotiffFromGrid(ramp(), spec))).getImage();
    expect(image.getGeoKeys()?.ProjectedCSTypeGeoKey).toBe(32767);
  });

  it('replaces NaN by the nodata value and records it', async () => {
    const v = ramp();
    v[0] = Number.NaN;
    const image = await (await fromArrayBuffer(geotiffFromGrid(v, spec, { noData: -9999 }))).getImage();
    expect(image.getGDALNoData()).toBe(-9999);
    const [band] = (await image.readRasters()) as unknown as Float32Array[];
    expect(band[8]).toBe(-9999);
  });

  it('rejects a value array of the wrong length', () => {
    try {
      geotiffFromGrid(new Float64Array(5), spec);
      expect.unreachable();
    } catch (e) {
      expect(isCoreError(e, 'INVALID_ARGUMENT')).toBe(true);
      expect((e as Error).message).toMatch(/12 cells \(got 5\)/);
    }
  });

  it('rejects an EPSG code outside the GeoTIFF range', () => {
    expect(() => geotiffFromGrid(ramp(), spec, { epsg: 99999 })).toThrow(/epsg must be an integer EPSG code/);
  });
});
