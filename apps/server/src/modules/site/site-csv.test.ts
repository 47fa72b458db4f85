import { describe, expect, it } from 'vitest';
import { SITE_CSV_MAX_ROWS, siteCsvRead } from './site-csv.js';

const read = (text: string) => siteCsvRead(Buffer.from(text, 'utf8'));

describe('siteCsvRead', () => {
  it('reads a header in any order and with aliases, semicolons and a BOM', () => {
    const { sites, errors } = read('\uFEFFLatitude;Longitude;Name;Type;Attractiveness\n44.5;-38.5;Quay corner;Candidate;120\n');
    expect(errors).toEqual([]);
    expect(sites).toEqual([{ name: 'Quay corner', kind: 'candidate', lon: -38.5, lat: 44.5, attractiveness: 120, notes: '' }]);
  });

  it('takes name, kind, lon, lat, attractiveness, notes in order without a header', () => {
    const { sites, errors } = read('Harbour Row,own,-38.51,44.50,180,"Flagship, since 2019"\nRival,competitor,-38.49,44.52,90\n');
    expect(errors).toEqual([]);
    expect(sites.map((s) => [s.name, s.kind, s.notes])).toEqual([
      ['Harbour Row', 'own', 'Flagship, since 2019'],
      ['Rival', 'competitor', ''],
    ]);
  });

  it('lists every bad field of every row and returns no sites', () => {
    const { sites, errors } = read('name,kind,lon,lat,attractiveness\nGood,own,-38.5,44.5,10\n,shop,200,44.5,0\nX,own,abc,95,5\n');
    expect(sites).toEqual([]);
    expect(new Set(errors.map((e) => e.row))).toEqual(new Set([3, 4]));
    const byKey = Object.fromEntries(errors.map((e) => [`${e.row}.${e.field}`, e.message]));
    expect(byKey['3.kind']).toMatch(/one of candidate, own, competitor/);
    expect(byKey['3.name']).toMatch(/must not be empty/);
    expect(byKey['3.lon']).toMatch(/between -180 and 180/);
    expect(byKey['3.attractiveness']).toMatch(/greater than 0/);
    expect(byKey['4.lon']).toMatch(/must be a number/);
    expect(byKey['4.lat']).toMatch(/between -90 and 90/);
    expect(Object.keys(byKey).sort()).toEqual(['3.attractiveness', '3.kind', '3.lon', '3.name', '4.lat', '4.lon']);
  });

  it('names missing header columns, empty files and files over the row limit', () => {
    expect(read('name,kind,lat\nA,own,44\n').errors.map((e) => e.field)).toEqual(['lon', 'attractiveness']);
    expect(read('').errors[0]).toMatchObject({ field: 'file', message: expect.stringMatching(/no rows/) });
    expect(read('name,kind,lon,lat,attractiveness\n').errors[0].message).toMatch(/no sites/);
    const big = 'name,kind,lon,lat,attractiveness\n' + 'S,own,-38.5,44.5,1\n'.repeat(SITE_CSV_MAX_ROWS + 1);
    expect(read(big).errors[0].message).toMatch(/at most 5000/);
    expect(read('name,kind,lon,lat,attractiveness\n' + 'S,own,-38.5,44.5,1\n'.repeat(SITE_CSV_MAX_ROWS)).sites).toHaveLength(SITE_CSV_MAX_ROWS);
  });
});
