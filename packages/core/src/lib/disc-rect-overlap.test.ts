import { describe, expect, it } from 'vitest';
import { discRectOverlap } from './disc-rect-overlap.js';

describe('discRectOverlap', () => {
  it('gives the whole disc inside a large box — πr² [closed form]', () => {
    expect(discRectOverlap(0, 0, 3, -10, -10, 10, 10)).toBeCloseTo(Math.PI * 9, 12);
  });

  it('gives a quarter disc for a box with a corner at the centre — πr²/4 [closed form]', () => {
    expect(discRectOverlap(5, 5, 2, 5, 5, 9, 9)).toBeCloseTo(Math.PI, 12);
  });

  it('gives half a disc for a half-plane box — πr²/2 [closed form]', () => {
    expect(discRectOverlap(0, 0, 1, -2, 0, 2, 2)).toBeCloseTo(Math.PI / 2, 12);
  });

  it('matches the circular segment r²·acos(h/r) − h·√(r² − h²) for a strip beyond h [S: circular segment formula]', () => {
    const r = 2;
    const h = 0.7;
    const segment = r * r * Math.acos(h / r) - h * Math.sqrt(r * r - h * h);
    expect(discRectOverlap(0, 0, r, h, -5, 5, 5)).toBeCloseTo(segment, 12);
  });

  it('gives the full box when the box lies inside the disc and 0 when it lies outside', () => {
    expect(discRectOverlap(0, 0, 10, 1, 1, 2, 3)).toBeCloseTo(2, 12);
    expect(discRectOverlap(0, 0, 1, 1, 1, 2, 2)).toBe(0);
    expect(discRectOverlap(0, 0, 0, -1, -1, 1, 1)).toBe(0);
  });

  it('adds up over a tiling of the plane to πr² [closed form]', () => {
    let sum = 0;
    const r = 3.3;
    for (let i = -5; i < 5; i++) for (let j = -5; j < 5; j++) sum += discRectOverlap(0.21, -0.37, r, i, j, i + 1, j + 1);
    expect(sum).toBeCloseTo(Math.PI * r * r, 10);
  });
});
