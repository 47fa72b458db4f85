import { readFileSync } from 'node:fs';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { QUILLPORT_CENTRE, quillportBasemap, type Basemap } from '../../../../../../infra/basemap/quillport-basemap';

const assetPath = join(dirname(fileURLToPath(import.meta.url)), '../../../../public/basemap/quillport.geojson');
const asset = JSON.parse(readFileSync(assetPath, 'utf8')) as Basemap;

describe('the committed Quillport basemap', () => {
  it('is exactly what the seeded generator writes (rerun infra/basemap/generate-quillport-basemap.ts)', () => {
    expect(asset).toEqual(quillportBasemap());
  });

  it('has land, a river, six named districts, main roads and labels', () => {
    const count = (layer: string) => asset.features.filter((f) => f.properties.layer === layer).length;
    expect(count('land')).toBe(1);
    expect(count('river')).toBe(1);
    expect(count('district')).toBe(6);
    expect(count('district-label')).toBe(6);
    expect(count('road')).toBeGreaterThanOrEqual(6);
    for (const f of asset.features.filter((x) => x.properties.layer.includes('district'))) expect(f.properties.name).toMatch(/\w/);
  });

  it('closes every polygon ring and stays within about 20 km of Quillport’s centre in open sea', () => {
    for (const f of asset.features) {
      const rings = f.geometry.type === 'Polygon' ? f.geometry.coordinates : [];
      for (const ring of rings) {
        expect(ring.length).toBeGreaterThanOrEqual(4);
        expect(ring[0]).toEqual(ring[ring.length - 1]);
      }
      const points = f.geometry.type === 'Point' ? [f.geometry.coordinates] : f.geometry.type === 'LineString' ? f.geometry.coordinates : rings.flat();
      for (const [lon, lat] of points) {
        expect(Math.abs(lon - QUILLPORT_CENTRE.lon)).toBeLessThan(0.26); // ≈ 20 km east–west at 44.5° N
        expect(Math.abs(lat - QUILLPORT_CENTRE.lat)).toBeLessThan(0.18);
      }
    }
  });
});
