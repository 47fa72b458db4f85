import { projectionConverter, projectionForLonLat } from '@demandscape/core';
import { describe, expect, it } from 'vitest';
import { aggregateSide, customerAggregate } from './customer-file-aggregate.js';

describe('aggregateSide', () => {
  it('takes about 24 screen pixels and never goes below 250 m', () => {
    // 24 px × 2π·6378137/256/2¹² m/px × cos 44.5° ≈ 653 m → next offered side 1000 m [D]
    expect(aggregateSide(12, 44.5)).toBe(1000);
    expect(aggregateSide(18, 44.5)).toBe(250);
    expect(aggregateSide(0, 0)).toBe(500_000);
  });
});

describe('customerAggregate', () => {
  it('keeps bins of 11 or more customers and suppresses smaller ones', () => {
    const projection = projectionForLonLat(Float64Array.of(-38.5), Float64Array.of(44.5));
    const conv = projectionConverter(projection);
    const [cx, cy] = conv.forwardPoint(-38.5, 44.5);
    const side = 1000;
    const bx = Math.floor(cx / side) * side;
    const by = Math.floor(cy / side) * side;
    const lon: number[] = [];
    const lat: number[] = [];
    const w: number[] = [];
    // 11 customers in one bin, 10 in the next bin east, 1 two bins north; all near bin centres.
    const put = (x: number, y: number, n: number, weight: number) => {
      for (let i = 0; i < n; i++) {
        const [lo, la] = conv.inversePoint(
          x + 500 + (i % 5) * 20 - 40,
          y + 500 + Math.floor(i / 5) * 20 - 20,
        );
        lon.push(lo);
        lat.push(la);
        w.push(weight);
      }
    };
    put(bx, by, 11, 2);
    put(bx + side, by, 10, 3);
    put(bx, by + 2 * side, 1, 5);
    const fc = customerAggregate(
      {
        lon: Float64Array.from(lon),
        lat: Float64Array.from(lat),
        w: Float64Array.from(w),
        count: lon.length,
      },
      12,
    );
    expect(fc.binSizeM).toBe(1000);
    expect(fc.features).toHaveLength(1);
    expect(fc.features[0].properties).toEqual({ count: 11, weight: 22 });
    expect(fc.suppressed).toEqual({ bins: 2, customers: 11, weight: 35 });
    const ring = fc.features[0].geometry.coordinates[0];
    expect(ring).toHaveLength(5);
    expect(ring[4]).toEqual(ring[0]);
    const [x0, y0] = conv.forwardPoint(ring[0][0], ring[0][1]);
    expect(x0).toBeCloseTo(bx, 6);
    expect(y0).toBeCloseTo(by, 6);
  });
  it('refuses a file with no points', () => {
    expect(() =>
      customerAggregate(
        { lon: new Float64Array(0), lat: new Float64Array(0), w: new Float64Array(0), count: 0 },
        10,
      ),
    ).toThrow('no imported points');
  });
});
