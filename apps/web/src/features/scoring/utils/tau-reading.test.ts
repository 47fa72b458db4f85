import { describe, expect, it } from 'vitest';
import { tauReading } from './tau-reading';

describe('tauReading', () => {
  it('reads τ near 1 as the same order and near −1 as reversed', () => {
    expect(tauReading(1)).toBe('the same order');
    expect(tauReading(0.93)).toBe('nearly the same order');
    expect(tauReading(0.8)).toBe('mostly the same order, a few swaps');
    expect(tauReading(0.5)).toBe('partly reordered');
    expect(tauReading(0)).toBe('largely reordered');
    expect(tauReading(-1)).toBe('mostly reversed');
  });

  it('says when τ cannot be computed', () => {
    expect(tauReading(Number.NaN)).toBe('not comparable (too few candidates)');
  });
});
