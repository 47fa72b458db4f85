import { describe, expect, it } from 'vitest';
import { demoCustomers, QUILLPORT_CENTRE } from './demo-customers.js';

describe('demoCustomers', () => {
  it('is the same for the same seed and differs for another', () => {
    const a = demoCustomers(500, 3);
    expect(Array.from(demoCustomers(500, 3).lon)).toEqual(Array.from(a.lon));
    expect(Array.from(demoCustomers(500, 4).lon)).not.toEqual(Array.from(a.lon));
  });

  it('stays around Quillport in open sea, far from the Azores (lon −25…−31.3, lat 36.9…39.8)', () => {
    const { lon, lat, w } = demoCustomers(20_000);
    const far = (v: Float64Array, c: number) => v.reduce((m, x) => Math.max(m, Math.abs(x - c)), 0);
    expect(far(lon, QUILLPORT_CENTRE.lon)).toBeLessThan(0.3);
    expect(far(lat, QUILLPORT_CENTRE.lat)).toBeLessThan(0.2);
    expect(Math.min(...w)).toBeGreaterThan(0);
  });

  it('clusters: the busiest 1 km² holds far more customers than an even spread would', () => {
    const { lon, lat } = demoCustomers(20_000);
    const counts = new Map<string, number>();
    for (let k = 0; k < lon.length; k++) {
      const key = `${Math.floor(lon[k] / 0.0126)},${Math.floor(lat[k] / 0.009)}`; // ≈ 1 km × 1 km at 44.5° N
      counts.set(key, (counts.get(key) ?? 0) + 1);
    }
    // An even spread over the ≈ 22 km × 16 km city would put ≈ 57 customers in each km².
    expect(Math.max(...counts.values())).toBeGreaterThan(300);
  });
});
