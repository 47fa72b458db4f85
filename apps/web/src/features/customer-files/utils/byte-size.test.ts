import { describe, expect, it } from 'vitest';
import { byteSizeText, countText } from './byte-size';

describe('byteSizeText', () => {
  it('names the default upload limit as 200 MB', () => {
    expect(byteSizeText(200 * 1024 * 1024)).toBe('200 MB');
  });
  it('keeps one decimal below 100 and whole bytes', () => {
    expect(byteSizeText(1434)).toBe('1.4 KB');
    expect(byteSizeText(512)).toBe('512 bytes');
  });
});

describe('countText', () => {
  it('groups thousands', () => {
    expect(countText(48210)).toBe('48,210');
  });
});
