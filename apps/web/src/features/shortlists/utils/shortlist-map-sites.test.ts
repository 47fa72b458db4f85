import { describe, expect, it } from 'vitest';
import { createShortlistItem, createShortlistVersion } from '../testing/shortlist-factories';
import { shortlistMapSites } from './shortlist-map-sites';

describe('shortlistMapSites', () => {
  it('labels the chosen candidates with their order and adds own stores and competitors unlabelled', () => {
    const version = createShortlistVersion({
      items: [createShortlistItem({ order: 2, siteId: 's2', name: 'Ropewalk Yard', lon: 1, lat: 2 }), createShortlistItem({ order: 1, siteId: 's1', name: 'Quay', lon: 3, lat: 4 })],
    });
    expect(shortlistMapSites(version)).toEqual([
      { id: 's1', name: 'Quay', kind: 'candidate', lon: 3, lat: 4, label: '1' },
      { id: 's2', name: 'Ropewalk Yard', kind: 'candidate', lon: 1, lat: 2, label: '2' },
      { id: 'site_own_1', name: 'Larchloaf Harbour', kind: 'own', lon: -38.52, lat: 44.49 },
      { id: 'site_comp_1', name: 'Crumbhall Bakery', kind: 'competitor', lon: -38.49, lat: 44.51 },
    ]);
  });
});
