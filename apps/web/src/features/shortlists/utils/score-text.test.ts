import { describe, expect, it } from 'vitest';
import { demandText, ringRadiusText, shareText, stabilityText } from './score-text';

describe('demandText', () => {
  it('keeps three significant figures with thousands separators', () => {
    expect(demandText(12_391.2)).toBe('12,400');
    expect(demandText(312.44)).toBe('312');
    expect(demandText(0.84213)).toBe('0.842');
    expect(demandText(-47.06)).toBe('-47.1');
  });

  it('writes zero plainly and a dash for a missing number', () => {
    expect(demandText(0)).toBe('0');
    expect(demandText(Number.NaN)).toBe('–');
  });
});

describe('shareText', () => {
  it('shows a 0–1 share as a percentage with one decimal', () => {
    expect(shareText(0.1234)).toBe('12.3 %');
    expect(shareText(1)).toBe('100.0 %');
  });
});

describe('ringRadiusText', () => {
  it('shows metres in the run’s unit', () => {
    expect(ringRadiusText(3000, 'km')).toBe('3 km');
    // [S] 1 international mile = 1609.344 m exactly (NIST SP 811, B.8)
    expect(ringRadiusText(1609.344, 'mi')).toBe('1 mi');
    expect(ringRadiusText(804.672, 'mi')).toBe('0.5 mi');
  });
});

describe('stabilityText', () => {
  it('gives the rank range, a steady rank, or says the check was not run', () => {
    expect(stabilityText({ minRank: 2, maxRank: 5 })).toBe('ranks 2–5');
    expect(stabilityText({ minRank: 1, maxRank: 1 })).toBe('rank 1 throughout');
    expect(stabilityText(null)).toBe('not checked');
  });
});
