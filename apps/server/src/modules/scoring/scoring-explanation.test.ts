import { describe, expect, it } from 'vitest';
import { candidateExplanation, demandText, measureText, type ExplanationInput } from './scoring-explanation.js';

const BASE: ExplanationInput = {
  captured: 12_437,
  shareOfTotal: 0.0412,
  cannibalization: 3_104,
  cannibalizedFrom: [
    { name: 'Quay Street', demand: 1_104 },
    { name: 'Harbour Row', demand: 2_000 },
  ],
  netNew: 9_333,
  rank: 2,
  candidateCount: 8,
  measure: 'netNew',
  rings: [
    { radiusM: 1000, demand: 800 },
    { radiusM: 3000, demand: 5_210 },
  ],
  ownStoreCount: 2,
  weightLabel: 'customers',
  radiusUnit: 'km',
};

describe('candidateExplanation', () => {
  it('names captured demand, share, cannibalization with the biggest loser, net new and rank', () => {
    expect(candidateExplanation(BASE)).toBe(
      'Captures 12,400 customers (4.1 % of all demand); 3,100 of them would come from own stores (most from Harbour Row: 2,000), so 9,330 are new to the chain. Ranks 2 of 8 by net new demand.',
    );
  });

  it('says there are no own stores when the network has none', () => {
    const s = candidateExplanation({ ...BASE, cannibalization: 0, cannibalizedFrom: [], netNew: 12_437, ownStoreCount: 0 });
    expect(s).toContain('there are no own stores to lose any of it');
    expect(s).not.toContain('would come from own stores');
  });

  it('says none comes from own stores when they lose nothing', () => {
    const s = candidateExplanation({ ...BASE, cannibalization: 0, cannibalizedFrom: [{ name: 'Harbour Row', demand: 0 }], netNew: 12_437 });
    expect(s).toContain('none of it would come from own stores');
  });

  it('with one own store says all of the loss comes from it', () => {
    const s = candidateExplanation({ ...BASE, cannibalizedFrom: [{ name: 'Harbour Row', demand: 3_104 }] });
    expect(s).toContain('(all from Harbour Row)');
  });

  it('uses the weight label and a ring measure with its radius and value', () => {
    const s = candidateExplanation({ ...BASE, weightLabel: 'visits per year', measure: 'ring:1', rank: 1 });
    expect(s).toContain('Captures 12,400 visits per year');
    expect(s).toContain('Ranks 1 of 8 by demand within 3 km (5,210 visits per year).');
  });

  it('shows ring radii in miles when the run uses miles', () => {
    expect(measureText('ring:0', [{ radiusM: 1609.344 }], 'mi')).toBe('demand within 1 mi');
  });
});

describe('demandText', () => {
  it('rounds to three significant figures from 1,000, whole numbers from 10, one decimal below', () => {
    expect(demandText(12_437.2)).toBe('12,400');
    expect(demandText(1_234_567)).toBe('1,230,000');
    expect(demandText(999.6)).toBe('1,000');
    expect(demandText(42.4)).toBe('42');
    expect(demandText(3.14)).toBe('3.1');
    expect(demandText(0)).toBe('0');
  });
});
