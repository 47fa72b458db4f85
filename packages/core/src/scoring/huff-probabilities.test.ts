import { describe, expect, it } from 'vitest';
import { huffProbabilities } from './huff-probabilities.js';

describe('huffProbabilities', () => {
  // Sizes 3,500 / 1,500 / 300 at 4 / 5 / 3 miles: inputs from a public homework Q&A [S],
  // probabilities re-derived by hand [D] (DOMAIN.md §2).
  it('reproduces the worked example with β = 1: 0.6863 / 0.2353 / 0.0784 [D]', () => {
    const p = huffProbabilities([3500, 1500, 300], [4, 5, 3], { beta: 1 });
    [0.6863, 0.2353, 0.0784].forEach((v, k) => expect(p[k]).toBeCloseTo(v, 4));
  });

  it('reproduces the worked example with β = 2: 0.7009 / 0.1923 / 0.1068 [D]', () => {
    const p = huffProbabilities([3500, 1500, 300], [4, 5, 3]);
    [0.7009, 0.1923, 0.1068].forEach((v, k) => expect(p[k]).toBeCloseTo(v, 4));
  });

  it('gives shares of attractiveness when every store is equally far (fair share) [CP]', () => {
    const p = huffProbabilities([1, 3], [2, 2], { beta: 2.7 });
    expect(p[0]).toBeCloseTo(0.25, 12);
  });

  it('rejects bad α, β, distances and attractiveness with named errors', () => {
    expect(() => huffProbabilities([1], [1], { beta: 0 })).toThrow(/β \(distance decay\) must be a finite number > 0 \(got 0\)/);
    expect(() => huffProbabilities([1], [1], { alpha: -1 })).toThrow(/α/);
    expect(() => huffProbabilities([1, 2], [1], {})).toThrow(/one distance per store/);
    expect(() => huffProbabilities([1], [0], {})).toThrow(/distance to store #1/);
    expect(() => huffProbabilities([-2], [1], {})).toThrow(/attractiveness of store #1/);
  });
});
