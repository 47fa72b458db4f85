import { fromArrayBuffer } from 'geotiff';
import { describe, expect, it } from 'vitest';
import { exportFileName, surfaceGeotiff } from './surface-export.js';
import type { SurfaceGrid } from './surface-results.js';

const LAEA = '+proj=laea +lat_0=44.5 +lon_0=-38.5 +x_0=0 +y_0=0 +datum=WGS84 +units=m +no_defs';

/** A 3 × 2 LAEA grid (no EPSG code) with one cell outside the study area. */
function laeaGrid(): SurfaceGrid {
  const spec = { originX: -1500, originY: -1000, cellSize: 1000, width: 3, height: 2 };
  const values = new Float32Array([1, 2, 3, 4, 5, Number.NaN]);
  const surface = {
    id: 's',
    name: 'Wide coast',
    params: { unit: 'km2' },
    resolved: { grid: spec, projection: { kind: 'laea', epsg: null, proj4: LAEA, label: 'LAEA' } },
  };
  return { surface, spec, values, converter: null } as unknown as SurfaceGrid;
}

// Read back with geotiff.js, an independent GeoTIFF 1.1 reader (OGC 19-008r4) [S].
describe('surfaceGeotiff', () => {
  it('marks a CRS without EPSG code user-defined and keeps its proj4 string in the citation', async () => {
    const image = await (await fromArrayBuffer(surfaceGeotiff(laeaGrid()))).getImage();
    const keys = image.getGeoKeys();
    expect(keys?.ProjectedCSTypeGeoKey).toBe(32767);
    expect(keys?.GTCitationGeoKey).toBe(`Demandscape demand surface, weight per km2; CRS ${LAEA}`);
    expect(image.getOrigin()).toEqual([-1500, 1000, 0]);
    const [band] = (await image.readRasters()) as unknown as Float32Array[];
    // Northern row (j = 1) first; NaN kept and declared as nodata.
    expect(Array.from(band.slice(0, 2))).toEqual([4, 5]);
    expect(band[2]).toBeNaN();
    expect(Number.isNaN(image.getGDALNoData())).toBe(true);
  });
});

describe('exportFileName', () => {
  it('keeps letters, digits, space, dot, dash and underscore', () => {
    expect(exportFileName('Harbour visits 2026-05_a.b', 'tif')).toBe('Harbour visits 2026-05_a.b.tif');
  });

  it('drops accents and replaces quotes, slashes and other characters', () => {
    expect(exportFileName('Café "nord"/süd\r\n', 'geojson')).toBe('Cafe _nord__sud__.geojson');
  });

  it('falls back to "surface" when nothing usable is left', () => {
    expect(exportFileName('···', 'tif')).toBe('surface.tif');
    expect(exportFileName('', 'tif')).toBe('surface.tif');
  });
});
