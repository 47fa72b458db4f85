import { describe, expect, it } from 'vitest';
import { envFrom } from './env';

describe('envFrom', () => {
  it('defaults the API origin to the page’s own', () => {
    expect(envFrom({}).VITE_API_ORIGIN).toBe('');
  });

  it('names the bad variable and the rule', () => {
    expect(() => envFrom({ VITE_API_ORIGIN: 'localhost:3000' })).toThrow(/VITE_API_ORIGIN: must be an absolute http\(s\) URL/);
  });

  it('checks the basemap style URL and defaults to the demo basemap', () => {
    expect(envFrom({}).VITE_BASEMAP_STYLE_URL).toBe('');
    expect(() => envFrom({ VITE_BASEMAP_STYLE_URL: 'tiles/style.json' })).toThrow(/VITE_BASEMAP_STYLE_URL: must be an absolute http\(s\) URL of a MapLibre style JSON/);
  });
});
