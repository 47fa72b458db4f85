import { describe, expect, it } from 'vitest';
import { isCoreError } from '../errors.js';
import { surfaceCreditCost } from './credit-cost.js';

// Expected values are worked by hand from the documented formula max(1, ⌈n·m / 3e9⌉) [D].
describe('surfaceCreditCost', () => {
  it('charges one credit for small runs', () => {
    expect(surfaceCreditCost(1, 1)).toBe(1);
    expect(surfaceCreditCost(10_000, 100_000)).toBe(1);
    expect(surfaceCreditCost(0, 400)).toBe(1);
  });

  it('grows with customers × cells', () => {
    expect(surfaceCreditCost(100_000, 250_000)).toBe(9); // 2.5e10 / 3e9 = 8.33 → 9
    expect(surfaceCreditCost(1_000_000, 1_000_000)).toBe(334); // 333.3 → 334
    expect(surfaceCreditCost(30_000, 100_000)).toBe(1); // exactly 3e9 → 1
    expect(surfaceCreditCost(30_001, 100_000)).toBe(2);
  });

  it('rejects counts that are not whole numbers, naming the argument', () => {
    for (const [p, c, field] of [
      [-1, 10, 'points'],
      [1.5, 10, 'points'],
      [10, 0, 'cells'],
      [10, Number.NaN, 'cells'],
    ] as const) {
      try {
        surfaceCreditCost(p, c);
        expect.unreachable();
      } catch (e) {
        expect(isCoreError(e, 'INVALID_ARGUMENT')).toBe(true);
        expect((e as { field: string }).field).toBe(field);
      }
    }
  });
});
