import { describe, expect, it } from 'vitest';
import { webRasterFromResponse } from './raster-request';

function headers(overrides: Record<string, string> = {}) {
  return new Headers({
    'X-Raster-Width': '2',
    'X-Raster-Height': '2',
    'X-Raster-Bounds': '-38.6,44.4,-38.4,44.6',
    'X-Raster-Unit': 'km2',
    'X-Raster-Max': '7.5',
    ...overrides,
  });
}

function body(values: number[]) {
  const buffer = new ArrayBuffer(values.length * 4);
  const view = new DataView(buffer);
  values.forEach((v, i) => view.setFloat32(i * 4, v, true));
  return buffer;
}

describe('webRasterFromResponse', () => {
  it('reads little-endian Float32 values (NaN kept) and the headers', () => {
    const raster = webRasterFromResponse(body([1, Number.NaN, 7.5, 0]), headers());
    expect(raster.width).toBe(2);
    expect(raster.bounds).toEqual([-38.6, 44.4, -38.4, 44.6]);
    expect(raster.unit).toBe('km2');
    expect(raster.max).toBe(7.5);
    expect(raster.values[0]).toBe(1);
    expect(raster.values[1]).toBeNaN();
    expect(raster.values[2]).toBe(7.5);
  });

  it('names a missing header', () => {
    const h = headers();
    h.delete('X-Raster-Bounds');
    expect(() => webRasterFromResponse(body([1, 2, 3, 4]), h)).toThrow("lacks the X-Raster-Bounds header");
  });

  it('rejects bounds out of order and a body of the wrong size', () => {
    expect(() => webRasterFromResponse(body([1, 2, 3, 4]), headers({ 'X-Raster-Bounds': '-38.4,44.4,-38.6,44.6' }))).toThrow(
      'X-Raster-Bounds must be west,south,east,north',
    );
    expect(() => webRasterFromResponse(body([1, 2, 3]), headers())).toThrow('The raster holds 12 bytes but 2 × 2 Float32 values need 16.');
  });

  it('rejects an unknown unit', () => {
    expect(() => webRasterFromResponse(body([1, 2, 3, 4]), headers({ 'X-Raster-Unit': 'ha' }))).toThrow('X-Raster-Unit must be km2 or sqmi (got ha).');
  });
});
