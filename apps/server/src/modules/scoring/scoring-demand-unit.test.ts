import { describe, expect, it } from 'vitest';
import { demandUnitWords } from './scoring-demand-unit.js';

describe('demandUnitWords', () => {
  it('uses the analyst’s label when there is one', () => {
    expect(demandUnitWords({ weightLabel: ' annual spend (€) ', weightKind: 'spend' })).toBe(
      'annual spend (€)',
    );
  });

  it('falls back on the weight kind, so an unlabelled spend file is not called customers', () => {
    expect(demandUnitWords({ weightLabel: '', weightKind: 'spend' })).toBe('spend');
    expect(demandUnitWords({ weightLabel: null, weightKind: 'visits' })).toBe('visits');
    expect(demandUnitWords({ weightLabel: '', weightKind: 'count' })).toBe('customers');
  });

  it('says customers when the file is gone or has no weight', () => {
    expect(demandUnitWords(null)).toBe('customers');
    expect(demandUnitWords({ weightLabel: '', weightKind: null })).toBe('customers');
  });
});
