import { describe, expect, it } from 'vitest';
import { siteColumnGuess, type SiteColumnMapping } from './site-columns.js';
import type { SiteFileTable } from './site-file-read.js';
import { siteMappingCheck, siteRowsParse } from './site-rows.js';

function table(columns: string[], rows: string[][], extra: Partial<SiteFileTable> = {}): SiteFileTable {
  return { format: 'csv', columns, hasHeader: true, decimalComma: false, rows, firstRow: 2, ...extra };
}
const COLUMNS = ['Site name', 'Type', 'Longitude', 'Latitude', 'Floor area (m²)', 'Comment'];
const mapping = siteColumnGuess(COLUMNS);

describe('siteRowsParse', () => {
  it('turns rows into sites, with kind synonyms and the attractiveness header as unit label', () => {
    const { sites, errors, emptyRows } = siteRowsParse(
      table(COLUMNS, [
        ['Quay corner', 'Prospect', '-38.51', '44.52', '120', 'corner plot'],
        ['', '', '', '', '', ''],
        ['Harbour Row', 'store', '-38.5', '44.5', '180', ''],
        ['Crumb & Co', 'rival', '-38.49', '44.51', '95.5', ''],
      ]),
      { mapping },
    );
    expect(errors).toEqual([]);
    expect(emptyRows).toBe(1);
    expect(sites).toEqual([
      { name: 'Quay corner', kind: 'candidate', lon: -38.51, lat: 44.52, attractiveness: 120, attractivenessLabel: 'Floor area (m²)', notes: 'corner plot' },
      { name: 'Harbour Row', kind: 'own', lon: -38.5, lat: 44.5, attractiveness: 180, attractivenessLabel: 'Floor area (m²)', notes: '' },
      { name: 'Crumb & Co', kind: 'competitor', lon: -38.49, lat: 44.51, attractiveness: 95.5, attractivenessLabel: 'Floor area (m²)', notes: '' },
    ]);
  });

  it('uses the default kind and attractiveness where the file has no column or an empty cell', () => {
    const noKind: SiteColumnMapping = { ...mapping, kind: null };
    const { sites, errors } = siteRowsParse(
      table(COLUMNS, [
        ['A', 'own', '-38.5', '44.5', '', ''],
        ['B', 'own', '-38.5', '44.5', '7', ''],
      ]),
      { mapping: noKind, defaultKind: 'candidate', defaultAttractiveness: 100 },
    );
    expect(errors).toEqual([]);
    expect(sites.map((s) => [s.kind, s.attractiveness])).toEqual([
      ['candidate', 100],
      ['candidate', 7],
    ]);
  });

  it('reads decimal commas when the file uses them', () => {
    const { sites } = siteRowsParse(table(COLUMNS, [['A', 'own', '-38,5', '44,5', '12,5', '']], { decimalComma: true }), { mapping });
    expect(sites[0]).toMatchObject({ lon: -38.5, lat: 44.5, attractiveness: 12.5 });
  });

  it('lists every bad field of every row (row numbers as a spreadsheet shows them) and returns no sites', () => {
    const { sites, errors } = siteRowsParse(
      table(COLUMNS, [
        ['Good', 'own', '-38.5', '44.5', '10', ''],
        ['', 'shop', '200', '44.5', '0', ''],
        ['X', 'own', 'abc', '95', '120 m²', ''],
        ['Swapped', 'own', '44.5', '-138.5', '5', ''],
        ['Y', '', '', '44.5', '', 'n'.repeat(2001)],
      ]),
      { mapping },
    );
    expect(sites).toEqual([]);
    const byKey = Object.fromEntries(errors.map((e) => [`${e.row}.${e.field}`, e.message]));
    expect(Object.keys(byKey).sort()).toEqual(['3.attractiveness', '3.kind', '3.lon', '3.name', '4.attractiveness', '4.lat', '4.lon', '5.lat', '6.attractiveness', '6.kind', '6.lon', '6.notes']);
    expect(byKey['3.kind']).toMatch(/^"shop" is not a site kind; write one of: candidate \(or cand, prospect/);
    expect(byKey['3.name']).toBe('is empty; every site needs a name');
    expect(byKey['3.lon']).toMatch(/between -180 and 180/);
    expect(byKey['3.attractiveness']).toMatch(/greater than 0/);
    expect(byKey['4.lon']).toBe('must be a number (longitude in degrees, e.g. -38.51), got "abc"; write the number only, without units or thousands separators');
    expect(byKey['4.lat']).toMatch(/between -90 and 90/);
    expect(byKey['4.attractiveness']).toMatch(/got "120 m²"/);
    expect(byKey['5.lat']).toMatch(/longitude and latitude swapped/);
    expect(byKey['6.kind']).toMatch(/is empty; write candidate, own or competitor/);
    expect(byKey['6.lon']).toMatch(/^is empty/);
    expect(byKey['6.attractiveness']).toMatch(/^is empty/);
    expect(byKey['6.notes']).toMatch(/at most 2000 characters/);
  });
});

describe('siteMappingCheck', () => {
  const t = table(COLUMNS, []);
  it('accepts a complete mapping, or defaults in place of kind and attractiveness', () => {
    expect(() => siteMappingCheck(t, { mapping })).not.toThrow();
    expect(() => siteMappingCheck(t, { mapping: { ...mapping, kind: null, attractiveness: null }, defaultKind: 'own', defaultAttractiveness: 1 })).not.toThrow();
  });

  it('names every missing, unknown or doubly used column', () => {
    let error: unknown;
    try {
      siteMappingCheck(t, { mapping: { ...mapping, name: null, lon: 'Lng', lat: 'Longitude', kind: null, attractiveness: null } });
    } catch (err) {
      error = err;
    }
    expect(error).toMatchObject({ status: 400, code: 'VALIDATION_FAILED', field: 'mapping.lon' });
    const fields = (error as { fields: Record<string, string> }).fields;
    expect(Object.keys(fields).sort()).toEqual(['mapping.attractiveness', 'mapping.kind', 'mapping.lon', 'mapping.name']);
    expect(fields['mapping.lon']).toMatch(/^column "Lng" is not in the file; its columns are "Site name", "Type"/);
    expect(fields['mapping.kind']).toMatch(/or send defaultKind/);
    expect(fields['mapping.attractiveness']).toMatch(/or send defaultAttractiveness/);
    expect(() => siteMappingCheck(t, { mapping: { ...mapping, notes: 'Site name' } })).toThrow(/already mapped to name/);
  });
});
