import { describe, expect, it } from 'vitest';
import { ledgerReferenceText } from './ledger-text';
import { signedCreditsText } from './money-text';

describe('ledgerReferenceText', () => {
  it('names grants by reason, purchases by pack and runs by id', () => {
    expect(ledgerReferenceText({ kind: 'grant', amount: 20, ref: 'welcome', details: { reason: 'Welcome credits' } })).toBe('Welcome credits');
    expect(ledgerReferenceText({ kind: 'purchase', amount: 2000, ref: 'cs_test_1', details: { pack: 'pack-2000' } })).toBe('2,000-credit pack');
    expect(ledgerReferenceText({ kind: 'reservation', amount: -12, ref: 'surface:srf_9:m1', details: { cost: 12 } })).toBe('Demand surface run srf_9');
    expect(ledgerReferenceText({ kind: 'release', amount: 12, ref: 'other', details: null })).toBe('other');
  });
});

describe('signedCreditsText', () => {
  it('signs credits with plus and a true minus', () => {
    expect(signedCreditsText(2000)).toBe('+2,000');
    expect(signedCreditsText(-12)).toBe('\u221212');
    expect(signedCreditsText(0)).toBe('0');
  });
});
