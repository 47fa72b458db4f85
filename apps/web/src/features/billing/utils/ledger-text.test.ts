import { describe, expect, it } from 'vitest';
import { ledgerReferenceText } from './ledger-text';
import { signedCreditsText } from './money-text';

describe('ledgerReferenceText', () => {
  it('names grants by reason, purchases by pack and runs by id', () => {
    expect(ledgerReferenceText({ kind: 'grant', ref: 'welcome', details: { reason: 'Welcome credits' } })).toBe('Welcome credits');
    expect(ledgerReferenceText({ kind: 'purchase', ref: 'cs_test_1', details: { pack: 'pack-500' } })).toBe('Credit pack pack-500');
    expect(ledgerReferenceText({ kind: 'reservation', ref: 'surface:srf_9:m1', details: { cost: 12 } })).toBe('Demand surface run srf_9');
    expect(ledgerReferenceText({ kind: 'release', ref: 'other', details: null })).toBe('other');
  });
});

describe('signedCreditsText', () => {
  it('signs credits with plus and a true minus', () => {
    expect(signedCreditsText(2000)).toBe('+2,000');
    expect(signedCreditsText(-12)).toBe('\u221212');
    expect(signedCreditsText(0)).toBe('0');
  });
});
