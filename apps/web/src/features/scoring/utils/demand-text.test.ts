import { describe, expect, it } from 'vitest';
import { demandText, percentText } from './demand-text';

describe('demandText', () => {
  it('rounds to whole units from 1,000 and to three significant figures below', () => {
    expect(demandText(1249.6)).toBe('1,250');
    expect(demandText(12.345)).toBe('12.3');
    expect(demandText(0.031234)).toBe('0.0312');
    expect(demandText(0)).toBe('0');
    expect(demandText(-430)).toBe('-430');
    expect(demandText(Number.NaN)).toBe('–');
  });
});

describe('percentText', () => {
  it('shows a share as a percentage with one decimal', () => {
    expect(percentText(0.052)).toBe('5.2 %');
    expect(percentText(1)).toBe('100.0 %');
  });
});
