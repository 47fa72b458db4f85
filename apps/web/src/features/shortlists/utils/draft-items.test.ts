import { describe, expect, it } from 'vitest';
import { draftItemMove, draftItemsBody, draftItemToggle, type DraftItem } from './draft-items';

const a: DraftItem = { siteId: 'a', name: 'Quay Street corner', note: '' };
const b: DraftItem = { siteId: 'b', name: 'Old Mill Lane', note: 'next to the school' };
const c: DraftItem = { siteId: 'c', name: 'Ropewalk Yard', note: '' };

describe('draftItemMove', () => {
  it('swaps a site with the one above it', () => {
    expect(draftItemMove([a, b, c], 2, -1).map((i) => i.siteId)).toEqual(['a', 'c', 'b']);
  });

  it('swaps a site with the one below it', () => {
    expect(draftItemMove([a, b, c], 0, 1).map((i) => i.siteId)).toEqual(['b', 'a', 'c']);
  });

  it('leaves the list alone when the move would leave either end', () => {
    const list = [a, b, c];
    expect(draftItemMove(list, 0, -1)).toBe(list);
    expect(draftItemMove(list, 2, 1)).toBe(list);
    expect(draftItemMove(list, 5, -1)).toBe(list);
  });
});

describe('draftItemToggle', () => {
  it('adds a newly ticked site at the end with an empty note', () => {
    expect(draftItemToggle([a], { siteId: 'c', name: 'Ropewalk Yard' })).toEqual([a, c]);
  });

  it('takes out a site that is already chosen and keeps the others in order', () => {
    expect(draftItemToggle([a, b, c], { siteId: 'b', name: 'Old Mill Lane' })).toEqual([a, c]);
  });
});

describe('draftItemsBody', () => {
  it('keeps the order, trims notes and leaves empty notes out', () => {
    expect(draftItemsBody([c, { ...b, note: '  next to the school \n' }, { ...a, note: '   ' }])).toEqual([
      { siteId: 'c' },
      { siteId: 'b', note: 'next to the school' },
      { siteId: 'a' },
    ]);
  });
});
