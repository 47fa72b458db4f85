import { describe, expect, it } from 'vitest';
import { divergingLegendTicks, sequentialLegendTicks } from './legend-scale';

describe('sequentialLegendTicks', () => {
  it('places round values along the bar in proportion to the maximum', () => {
    expect(sequentialLegendTicks(400)).toEqual([
      { position: 0, label: '0' },
      { position: 0.25, label: '100' },
      { position: 0.5, label: '200' },
      { position: 0.75, label: '300' },
      { position: 1, label: '400' },
    ]);
  });

  it('keeps a flat surface to a single 0 tick', () => {
    expect(sequentialLegendTicks(0)).toEqual([{ position: 0, label: '0' }]);
  });
});

describe('divergingLegendTicks', () => {
  it('centres 0 and signs both sides', () => {
    const ticks = divergingLegendTicks(40);
    expect(ticks.find((t) => t.label === '0')?.position).toBe(0.5);
    expect(ticks[0]).toEqual({ position: 0, label: '−40' });
    expect(ticks[1]).toEqual({ position: 0.25, label: '−20' });
    expect(ticks[ticks.length - 1]).toEqual({ position: 1, label: '+40' });
  });
});
