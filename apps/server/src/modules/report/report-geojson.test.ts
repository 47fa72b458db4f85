import { describe, expect, it } from 'vitest';
import { reportRunFixture } from './report-fixture.js';
import { reportSitesGeojson } from './report-geojson.js';

// Shape per RFC 7946 (§3.1.2 Point, §3.1.1 position = [longitude, latitude], §4 no "crs" member) [S].
describe('reportSitesGeojson', () => {
  const fc = JSON.parse(JSON.stringify(reportSitesGeojson(reportRunFixture())));

  it('is a FeatureCollection of Points with every site of the run and no crs member', () => {
    expect(fc.type).toBe('FeatureCollection');
    expect(fc.crs).toBeUndefined();
    expect(fc.features).toHaveLength(6);
    for (const f of fc.features) {
      expect(f.type).toBe('Feature');
      expect(f.geometry.type).toBe('Point');
      expect(f.geometry.coordinates).toHaveLength(2);
    }
    expect(fc.features.map((f: { properties: { kind: string } }) => f.properties.kind)).toEqual([
      'candidate',
      'candidate',
      'candidate',
      'own',
      'own',
      'competitor',
    ]);
  });

  it('puts longitude first and rounds to 6 decimals', () => {
    const quay = fc.features.find((f: { id: string }) => f.id === 'c-quay');
    expect(quay.geometry.coordinates).toEqual([-38.512346, 44.521235]);
  });

  it('gives candidates their rank, score parts, rings and rank range', () => {
    const p = fc.features.find((f: { id: string }) => f.id === 'c-quay').properties;
    expect(p).toMatchObject({
      rank: 1,
      measure: 'netNew',
      captured: 12_400.25,
      cannibalization: 3_100,
      netNew: 9_300.25,
      ring_1_km: 3_200.5,
      ring_3_km: 14_000,
      minRank: 1,
      maxRank: 2,
    });
    expect(p.value).toBe(p.netNew);
    expect(p.shareOfTotal).toBeCloseTo(0.31, 3);
    expect(p.explanation).toMatch(/Ranks 1 of 3/);
  });

  it('marks own stores with today’s demand and competitors with their kind only', () => {
    const own = fc.features.find((f: { id: string }) => f.id === 'o-harbour').properties;
    expect(own).toMatchObject({ kind: 'own', demandToday: 15_000 });
    expect(own.rank).toBeUndefined();
    const rival = fc.features.find((f: { id: string }) => f.id === 'k-tide').properties;
    expect(rival).toMatchObject({ kind: 'competitor', name: 'Tidewater Buns' });
    expect(rival.demandToday).toBeUndefined();
  });

  it('refuses a run without results', () => {
    const run = { ...reportRunFixture(), status: 'running' as const, results: null };
    expect(() => reportSitesGeojson(run)).toThrow(/only a succeeded run/);
  });
});
