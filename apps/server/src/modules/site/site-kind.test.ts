import { describe, expect, it } from 'vitest';
import { siteKindMessage, siteKindParse } from './site-kind.js';

describe('siteKindParse', () => {
  it('accepts the kinds and their synonyms in any case and spacing', () => {
    expect(['candidate', 'Cand', ' PROSPECT ', 'candidate site'].map(siteKindParse)).toEqual(['candidate', 'candidate', 'candidate', 'candidate']);
    expect(['own', 'Store', 'ours', 'own_store'].map(siteKindParse)).toEqual(['own', 'own', 'own', 'own']);
    expect(['competitor', 'Rival', 'comp', 'Competitor-Store'].map(siteKindParse)).toEqual(['competitor', 'competitor', 'competitor', 'competitor']);
  });

  it('names no kind for other words and says which words work', () => {
    expect(siteKindParse('warehouse')).toBeNull();
    expect(siteKindParse('')).toBeNull();
    const message = siteKindMessage(' shop ');
    expect(message).toMatch(/^"shop" is not a site kind/);
    expect(message).toMatch(/candidate \(or cand, prospect/);
    expect(message).toMatch(/own \(or own store, store, ours/);
    expect(message).toMatch(/competitor \(or rival, comp/);
  });
});
