import { describe, expect, it } from 'vitest';
import { haversineM, outlierFlag, weightedMedian } from './outlier-flag.js';
import { rowHash } from './import-accumulator.js';

describe('haversineM', () => {
  it('gives one degree of the equator as 2πR/360', () => {
    // R = 6,371,008.8 m (IUGG mean radius) → 111,194.93 m [D]
    expect(haversineM(0, 0, 1, 0)).toBeCloseTo((2 * Math.PI * 6_371_008.8) / 360, 6);
  });
  it('matches the spherical law of cosines for a longer arc', () => {
    // cos c = sin φ1 sin φ2 + cos φ1 cos φ2 cos Δλ [S: spherical trigonometry]
    const r = Math.PI / 180;
    const c = Math.acos(
      Math.sin(44.5 * r) * Math.sin(46 * r) +
        Math.cos(44.5 * r) * Math.cos(46 * r) * Math.cos(8.5 * r),
    );
    expect(haversineM(-38.5, 44.5, -30, 46)).toBeCloseTo(c * 6_371_008.8, 3);
  });
});

describe('weightedMedian', () => {
  it('returns the value where the cumulative weight reaches half', () => {
    expect(weightedMedian(Float64Array.of(1, 2, 3), Float64Array.of(1, 1, 5))).toBe(3);
    expect(weightedMedian(Float64Array.of(3, 1, 2), Float64Array.of(1, 1, 1))).toBe(2);
  });
  it('falls back to the plain median when every weight is zero', () => {
    expect(weightedMedian(Float64Array.of(5, 1, 9), Float64Array.of(0, 0, 0))).toBe(5);
  });
});

describe('outlierFlag', () => {
  it('flags points beyond 5 × the median distance and nothing else', () => {
    // 40 points 1 km east/north/west/south of the centre, one 4.9 km and one 5.1 km away.
    const lon: number[] = [];
    const lat: number[] = [];
    const degLat = 1000 / 111_194.93;
    for (let i = 0; i < 10; i++) {
      lat.push(44.5 + degLat, 44.5 - degLat, 44.5, 44.5);
      const degLon = degLat / Math.cos((44.5 * Math.PI) / 180);
      lon.push(-38.5, -38.5, -38.5 + degLon, -38.5 - degLon);
    }
    lat.push(44.5 + 4.9 * degLat, 44.5 + 5.1 * degLat);
    lon.push(-38.5, -38.5);
    const n = lon.length;
    const r = outlierFlag(
      Float64Array.from(lon),
      Float64Array.from(lat),
      new Float64Array(n).fill(1),
      n,
    );
    expect(r.applied).toBe(true);
    expect(r.spreadM).toBeCloseTo(1000, -1);
    expect(r.limitM).toBeCloseTo(5000, -1);
    expect(Array.from(r.outlier.slice(n - 2))).toEqual([0, 1]);
    expect(r.count).toBe(1);
  });
  it('never flags within 1 km, and flags nothing below 20 points', () => {
    const n = 30;
    const lon = new Float64Array(n).fill(-38.5);
    const lat = new Float64Array(n).fill(44.5);
    lat[0] = 44.5 + 0.005; // ≈ 556 m
    expect(outlierFlag(lon, lat, new Float64Array(n).fill(1), n).count).toBe(0);
    lat[0] = 50;
    expect(outlierFlag(lon, lat, new Float64Array(n).fill(1), 19)).toMatchObject({
      applied: false,
      count: 0,
    });
    expect(outlierFlag(lon, lat, new Float64Array(n).fill(1), n).count).toBe(1);
  });
});

describe('rowHash', () => {
  it('is equal for equal rows and differs when cells are split differently', () => {
    expect(Array.from(rowHash(['Ada', '44.5', '-38.5']))).toEqual(
      Array.from(rowHash(['Ada', '44.5', '-38.5'])),
    );
    expect(Array.from(rowHash(['ab', 'c']))).not.toEqual(Array.from(rowHash(['a', 'bc'])));
    expect(rowHash(['x'])).toHaveLength(2);
  });
});

describe('RowHashSet', () => {
  it('tells new fingerprints from repeated ones across growth', async () => {
    const { RowHashSet } = await import('./row-hash-set.js');
    const set = new RowHashSet();
    for (let i = 0; i < 200_000; i++) expect(set.add(i, i * 7)).toBe(true);
    for (let i = 0; i < 200_000; i += 997) expect(set.add(i, i * 7)).toBe(false);
    expect(set.add(5, 36)).toBe(true);
  });
});
