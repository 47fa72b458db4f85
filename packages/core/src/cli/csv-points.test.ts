import { describe, expect, it } from 'vitest';
import { isCoreError } from '../errors.js';
import { csvPoints, csvProblemsFormat } from './csv-points.js';

describe('csvPoints', () => {
  it('finds lon/lat columns by common names in any case and defaults weights to 1', () => {
    const p = csvPoints('id,Latitude,LNG\n1,44.5,-38.5\n2,44.6,-38.4\n', { planar: false });
    expect(p.columns.names).toEqual({ a: 'LNG', b: 'Latitude', w: undefined });
    expect(Array.from(p.a)).toEqual([-38.5, -38.4]);
    expect(Array.from(p.b)).toEqual([44.5, 44.6]);
    expect(Array.from(p.w)).toEqual([1, 1]);
    expect(p.problems).toEqual([]);
  });

  it('uses named columns, strips a byte-order mark and skips blank lines', () => {
    const p = csvPoints('\uFEFFeast,north,spend\n100,200,3.5\n\n300,400,0\n', {
      planar: true,
      a: 'EAST',
      b: 'north',
      weight: 'spend',
    });
    expect(Array.from(p.a)).toEqual([100, 300]);
    expect(Array.from(p.w)).toEqual([3.5, 0]);
  });

  it('reports every bad row with its line number and reason', () => {
    const text = 'lon,lat,w\n-38.5,44.5,1\n-38.5,95,1\nabc,,2\n-38.5,44.5,-1\n-38.5,44.5,\n';
    const p = csvPoints(text, { planar: false, weight: 'w' });
    expect(p.a.length).toBe(1);
    expect(p.problems).toEqual([
      { line: 3, message: 'lat 95 is outside [-90, 90]' },
      { line: 4, message: 'lon "abc" is not a number; lat "" is not a number' },
      { line: 5, message: 'w -1 is negative' },
      { line: 6, message: 'w "" is not a number' },
    ]);
  });

  it('reads quoted fields, semicolons and Windows line ends the same way', () => {
    const quoted = csvPoints('"lon","lat","note"\r\n-38.5,44.5,"a, b"\r\n', { planar: false });
    const semicolon = csvPoints('lon;lat\r\n-38.5;44.5\r\n', { planar: false });
    const plain = csvPoints('lon,lat\r\n-38.5,44.5\r\n', { planar: false });
    for (const p of [quoted, semicolon, plain]) {
      expect(p.problems).toEqual([]);
      expect(Array.from(p.a)).toEqual([-38.5]);
      expect(Array.from(p.b)).toEqual([44.5]);
    }
  });

  it('accepts planar coordinates beyond the degree ranges', () => {
    const p = csvPoints('x,y\n500000,4900000\n', { planar: true });
    expect(p.problems).toEqual([]);
    expect(p.b[0]).toBe(4_900_000);
  });

  it('names the flag to use when no coordinate column is found', () => {
    try {
      csvPoints('a,b\n1,2\n', { planar: false });
      expect.unreachable();
    } catch (e) {
      expect(isCoreError(e, 'INVALID_ARGUMENT')).toBe(true);
      expect((e as Error).message).toMatch(/no longitude column found .* name it with --lon/);
    }
  });

  it('rejects a named column that is not in the header', () => {
    expect(() => csvPoints('lon,lat\n1,2\n', { planar: false, weight: 'spend' })).toThrow(
      /column "spend" given by --weight is not in the header \(columns: lon, lat\)/,
    );
  });

  it('rejects an empty file', () => {
    expect(() => csvPoints('', { planar: false })).toThrow(/the CSV is empty/);
  });
});

describe('csvProblemsFormat', () => {
  it('lists the first rows and counts the rest', () => {
    const problems = Array.from({ length: 25 }, (_, k) => ({ line: k + 2, message: 'bad' }));
    const text = csvProblemsFormat(problems, 'c.csv');
    expect(text.split('\n')).toHaveLength(22);
    expect(text).toMatch(/^c\.csv: 25 bad rows/);
    expect(text).toMatch(/line 21: bad\n {2}… and 5 more bad rows$/);
  });
});
