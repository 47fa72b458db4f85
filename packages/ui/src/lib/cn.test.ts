import { describe, expect, it } from 'vitest';
import { cn } from './cn';

describe('cn', () => {
  it('lets a later utility of the same kind win', () => {
    expect(cn('px-2 py-1', 'px-4')).toBe('py-1 px-4');
  });

  it('keeps a theme text colour and a text size apart', () => {
    expect(cn('text-sm text-ink', 'text-accent')).toBe('text-sm text-accent');
  });

  it('drops falsy conditions', () => {
    const isActive = false as boolean;
    expect(cn('a', isActive && 'b', undefined, { c: true, d: false })).toBe('a c');
  });
});
