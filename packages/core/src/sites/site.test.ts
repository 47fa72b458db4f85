import { describe, expect, it } from 'vitest';
import { isCoreError } from '../errors.js';
import { siteValidate, sitesValidate, type Site } from './site.js';

const ok: Site = { id: 'cand-1', kind: 'candidate', x: 1200.5, y: -300, attractiveness: 2.5 };

describe('siteValidate', () => {
  it('accepts a well-formed site', () => {
    expect(siteValidate(ok)).toBe(ok);
  });

  it('names the site id, the field and the fix', () => {
    const bad = { ...ok, kind: 'warehouse' } as unknown as Site;
    try {
      siteValidate(bad);
      expect.unreachable();
    } catch (e) {
      expect(isCoreError(e, 'INVALID_ARGUMENT')).toBe(true);
      expect((e as Error).message).toBe('site "cand-1" has kind "warehouse"; use one of candidate, own, competitor');
      expect((e as { field?: string }).field).toBe('sites.kind');
    }
    expect(() => siteValidate({ ...ok, y: Infinity })).toThrow(/site "cand-1" has y = Infinity/);
    expect(() => siteValidate({ ...ok, attractiveness: -1 })).toThrow(/site "cand-1" has attractiveness -1; it must be a positive finite number/);
  });

  it('falls back to the position when the id is missing', () => {
    expect(() => siteValidate({ ...ok, id: '' }, 4)).toThrow(/site #5 needs a non-empty text id/);
  });
});

describe('sitesValidate', () => {
  it('rejects repeated ids and accepts an empty list', () => {
    expect(sitesValidate([])).toEqual([]);
    expect(() => sitesValidate([ok, { ...ok, kind: 'own' }])).toThrow(/site "cand-1" appears twice/);
  });
});
