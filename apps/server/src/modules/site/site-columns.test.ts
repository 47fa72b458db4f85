import { describe, expect, it } from 'vitest';
import { siteColumnGuess, siteHeaderIs, siteMappingByOrder } from './site-columns.js';

const isNumber = (t: string) => t.trim() !== '' && Number.isFinite(Number(t));

describe('siteColumnGuess', () => {
  it('maps plain English headers', () => {
    expect(siteColumnGuess(['Site name', 'Longitude', 'Latitude', 'Floor area (m²)', 'Comment'])).toEqual({
      name: 'Site name',
      lon: 'Longitude',
      lat: 'Latitude',
      kind: null,
      attractiveness: 'Floor area (m²)',
      attractivenessLabel: null,
      notes: 'Comment',
    });
  });

  it('maps short and alternative names, x/y only as whole names', () => {
    expect(siteColumnGuess(['store', 'type', 'x', 'y', 'size', 'size unit', 'remarks'])).toEqual({
      name: 'store',
      lon: 'x',
      lat: 'y',
      kind: 'type',
      attractiveness: 'size',
      attractivenessLabel: 'size unit',
      notes: 'remarks',
    });
    expect(siteColumnGuess(['Site', 'lng', 'lat', 'Score'])).toMatchObject({ name: 'Site', lon: 'lng', lat: 'lat', attractiveness: 'Score' });
    expect(siteColumnGuess(['Store size', 'Store name', 'LON', 'LAT']).attractiveness).toBe('Store size');
    expect(siteColumnGuess(['Store size', 'Store name', 'LON', 'LAT']).name).toBe('Store name');
  });

  it('leaves fields without a fitting column null', () => {
    expect(siteColumnGuess(['foo', 'bar'])).toEqual({ name: null, lon: null, lat: null, kind: null, attractiveness: null, attractivenessLabel: null, notes: null });
  });
});

describe('siteHeaderIs / siteMappingByOrder', () => {
  it('tells a header from a first data row', () => {
    expect(siteHeaderIs(['Site name', 'Longitude', 'Latitude'], ['Quay', '-38.5', '44.5'], isNumber)).toBe(true);
    expect(siteHeaderIs(['Standort', 'Ostwert', 'Nordwert'], ['Quay', '-38.5', '44.5'], isNumber)).toBe(true);
    expect(siteHeaderIs(['Harbour Row', 'own', '-38.51', '44.50', '180'], ['Rival', 'competitor', '-38.49', '44.52', '90'], isNumber)).toBe(false);
  });

  it('takes name, kind, lon, lat, attractiveness, notes in order', () => {
    expect(siteMappingByOrder(['column 1', 'column 2', 'column 3', 'column 4', 'column 5'])).toEqual({
      name: 'column 1',
      kind: 'column 2',
      lon: 'column 3',
      lat: 'column 4',
      attractiveness: 'column 5',
      attractivenessLabel: null,
      notes: null,
    });
  });
});
