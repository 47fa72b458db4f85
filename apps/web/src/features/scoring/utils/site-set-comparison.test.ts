import { describe, expect, it } from 'vitest';
import { createSiteSet, threeCandidates } from '../testing/scoring-factories';
import { siteSetComparison } from './site-set-comparison';

describe('siteSetComparison', () => {
  it('sums the members scored alone and takes the set from it', () => {
    const cmp = siteSetComparison(createSiteSet(), threeCandidates);
    expect(cmp.alone).toEqual({ captured: 4100, cannibalization: 1050, netNew: 3050 });
    expect(cmp.together).toEqual({ captured: 3600, cannibalization: 980, netNew: 2620 });
    expect(cmp.takenFromEachOther).toBe(500);
  });

  it('skips a member the run does not know', () => {
    const cmp = siteSetComparison(createSiteSet({ siteIds: ['ste_c3', 'ste_gone'] }), threeCandidates);
    expect(cmp.alone.captured).toBe(450);
  });
});
