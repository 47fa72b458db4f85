import { describe, expect, it } from 'vitest';
import type { MapSite } from '../types';
import { siteBounds, siteFeatureCollection, siteFeatureMoved, siteIconId, siteLabelsShown } from './site-geojson';

const quay: MapSite = { id: 'site_1', name: 'Quay corner', kind: 'candidate', lon: -38.51, lat: 44.52 };
const harbour: MapSite = { id: 'site_2', name: 'Harbour Row', kind: 'own', lon: -38.47, lat: 44.49 };
const rival: MapSite = { id: 'site_3', name: 'Crumbhall Mill Street', kind: 'competitor', lon: -38.45, lat: 44.55 };

describe('siteFeatureCollection', () => {
  it('makes one Point per site at lon, lat with its kind’s icon and draw order', () => {
    const collection = siteFeatureCollection([quay, harbour, rival]);
    expect(collection.type).toBe('FeatureCollection');
    expect(collection.features.map((f) => f.geometry.coordinates)).toEqual([[-38.51, 44.52], [-38.47, 44.49], [-38.45, 44.55]]);
    expect(collection.features.map((f) => f.properties.icon)).toEqual(['ds-site-candidate', 'ds-site-own', 'ds-site-competitor']);
    // Candidates are drawn last (on top), competitors first.
    expect(collection.features.map((f) => f.properties.order)).toEqual([3, 2, 1]);
    expect(collection.features[0]!.id).toBe('site_1');
    expect(collection.features[0]!.properties.id).toBe('site_1');
  });

  it('writes the label (e.g. a rank) instead of the name when one is given, and the name for a blank label', () => {
    const collection = siteFeatureCollection([{ ...quay, label: '#2' }, { ...harbour, label: '  ' }]);
    expect(collection.features.map((f) => f.properties.text)).toEqual(['#2', 'Harbour Row']);
  });

  it('leaves out sites whose coordinates cannot be drawn instead of putting them at 0, 0', () => {
    const collection = siteFeatureCollection([quay, { ...harbour, lon: Number.NaN }, { ...rival, lat: 95 }]);
    expect(collection.features.map((f) => f.properties.id)).toEqual(['site_1']);
  });

  it('is empty for no sites', () => {
    expect(siteFeatureCollection([]).features).toEqual([]);
  });
});

describe('siteFeatureMoved', () => {
  it('moves only the dragged site and leaves the input unchanged', () => {
    const collection = siteFeatureCollection([quay, harbour]);
    const moved = siteFeatureMoved(collection, 'site_2', { lon: -38.4, lat: 44.6 });
    expect(moved.features.map((f) => f.geometry.coordinates)).toEqual([[-38.51, 44.52], [-38.4, 44.6]]);
    expect(collection.features[1]!.geometry.coordinates).toEqual([-38.47, 44.49]);
    expect(moved.features[0]).toBe(collection.features[0]);
  });
});

describe('siteBounds', () => {
  it('boxes all sites with a fifth of their span to spare on each side', () => {
    const [w, s, e, n] = siteBounds([quay, harbour, rival])!;
    // Sites span -38.51…-38.45 and 44.49…44.55 (0.06° each way); 0.2 × 0.06 = 0.012° of margin.
    expect(w).toBeCloseTo(-38.522, 12);
    expect(e).toBeCloseTo(-38.438, 12);
    expect(s).toBeCloseTo(44.478, 12);
    expect(n).toBeCloseTo(44.562, 12);
  });

  it('widens a single site to a box of at least 0.03° so the map does not zoom to street level', () => {
    const [w, s, e, n] = siteBounds([quay])!;
    expect(e - w).toBeCloseTo(0.03, 12);
    expect(n - s).toBeCloseTo(0.03, 12);
    expect((w + e) / 2).toBeCloseTo(-38.51, 12);
  });

  it('is null without drawable sites', () => {
    expect(siteBounds([])).toBeNull();
    expect(siteBounds([{ ...quay, lat: Number.NaN }])).toBeNull();
  });
});

describe('siteLabelsShown', () => {
  it('labels every site up to the limit, candidates before own stores before competitors', () => {
    expect(siteLabelsShown([rival, harbour, quay], null, 3).map((s) => s.id)).toEqual(['site_1', 'site_2', 'site_3']);
  });

  it('keeps the selected and the ranked sites first when there are more than the limit', () => {
    const shown = siteLabelsShown([quay, harbour, { ...rival, label: '#1' }], 'site_2', 2);
    expect(shown.map((s) => s.id)).toEqual(['site_2', 'site_3']);
  });
});

describe('siteIconId', () => {
  it('names one image per kind', () => {
    expect(new Set(['candidate', 'own', 'competitor'].map((k) => siteIconId(k as MapSite['kind']))).size).toBe(3);
  });
});
