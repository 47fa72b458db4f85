import { describe, expect, it } from 'vitest';
import { paths, safeRedirectPath } from './paths';

describe('safeRedirectPath', () => {
  it('keeps a path on this site', () => {
    expect(safeRedirectPath('/orgs/org_1/members?x=1')).toBe('/orgs/org_1/members?x=1');
  });

  it.each(['//elsewhere.test/x', 'https://elsewhere.test', '/\\elsewhere.test', '', null, undefined])(
    'sends %s home instead of off-site',
    (value) => {
      expect(safeRedirectPath(value)).toBe('/');
    },
  );
});

describe('paths.auth.signIn', () => {
  it('encodes the return path', () => {
    expect(paths.auth.signIn.getHref('/orgs/a b')).toBe('/sign-in?redirectTo=%2Forgs%2Fa%20b');
  });

  it('leaves out a return path to the start page', () => {
    expect(paths.auth.signIn.getHref('/')).toBe('/sign-in');
  });
});
