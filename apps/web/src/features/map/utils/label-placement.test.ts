import { describe, expect, it } from 'vitest';
import { labelsPlaced, labelWidthEstimate } from './label-placement';

describe('labelsPlaced', () => {
  it('keeps every label when none overlap', () => {
    const boxes = [
      { id: 'a', x: 50, y: 10, width: 40, height: 14 },
      { id: 'b', x: 150, y: 10, width: 40, height: 14 },
      { id: 'c', x: 50, y: 60, width: 40, height: 14 },
    ];
    expect([...labelsPlaced(boxes)]).toEqual(['a', 'b', 'c']);
  });

  it('drops a later label that overlaps an earlier one, keeping the priority order', () => {
    const boxes = [
      { id: 'first', x: 50, y: 10, width: 60, height: 14 },
      { id: 'covers-first', x: 70, y: 18, width: 60, height: 14 },
      { id: 'clear', x: 200, y: 18, width: 60, height: 14 },
    ];
    expect([...labelsPlaced(boxes)]).toEqual(['first', 'clear']);
  });

  it('counts the padding: boxes 3 px apart clash with 2 px padding, not with 1 px', () => {
    // Right edge of a at 70, left edge of b at 73.
    const boxes = [
      { id: 'a', x: 50, y: 0, width: 40, height: 14 },
      { id: 'b', x: 93, y: 0, width: 40, height: 14 },
    ];
    expect(labelsPlaced(boxes, 2).has('b')).toBe(false);
    expect(labelsPlaced(boxes, 1).has('b')).toBe(true);
  });

  it('places nothing for no labels', () => {
    expect(labelsPlaced([]).size).toBe(0);
  });
});

describe('labelWidthEstimate', () => {
  it('grows with the text', () => {
    expect(labelWidthEstimate('Quay corner')).toBeGreaterThan(labelWidthEstimate('#1'));
  });
});
