import { describe, expect, it } from 'vitest';
import { reportFileName } from './report-download.js';

describe('reportFileName', () => {
  it('joins lower-case ASCII words of the names with dashes', () => {
    expect(reportFileName(['North corridor 2027', 'Harbour run'], 'ranking', 'csv')).toBe(
      'demandscape-north-corridor-2027-harbour-run-ranking.csv',
    );
  });

  it('drops accents, quotes and slashes, and skips names with nothing usable', () => {
    expect(reportFileName(['Café "Nord"/Süd', '···'], 'v2', 'xlsx')).toBe(
      'demandscape-cafe-nord-sud-v2.xlsx',
    );
  });

  it('keeps each name to 40 characters without a trailing dash', () => {
    const name = reportFileName(['a'.repeat(39) + ' b' + 'c'.repeat(20)], 'sites', 'geojson');
    expect(name).toBe(`demandscape-${'a'.repeat(39)}-sites.geojson`);
  });
});
