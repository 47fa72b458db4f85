import Papa from 'papaparse';
import { describe, expect, it } from 'vitest';
import { csvField, reportRankingCsv } from './report-csv.js';
import { reportRunFixture } from './report-fixture.js';
import { reportFromRun } from './report-model.js';

function parse(text: string): string[][] {
  expect(text.charCodeAt(0)).toBe(0xfeff);
  const out = Papa.parse<string[]>(text.slice(1), { skipEmptyLines: true });
  expect(out.errors).toEqual([]);
  return out.data;
}

// Quoting per RFC 4180 §2 [S]; formula prefixes per the OWASP "CSV Injection" page [S].
describe('csvField', () => {
  it('quotes commas, quotes and line breaks and doubles inner quotes', () => {
    expect(csvField('a,b')).toBe('"a,b"');
    expect(csvField('say "hi"')).toBe('"say ""hi"""');
    expect(csvField('two\nlines')).toBe('"two\nlines"');
    expect(csvField('plain')).toBe('plain');
  });

  it('neutralises text a spreadsheet would run as a formula', () => {
    for (const bad of ['=1+1', '+1', '-2+3', '@SUM(A1)', '\tx', '\rx'])
      expect(csvField(bad).replace(/^"/, '').startsWith("'")).toBe(true);
    expect(csvField('=A1,B1')).toBe(`"'=A1,B1"`);
  });

  it('writes numbers as numbers (negative longitudes stay numeric) and non-finite as empty', () => {
    expect(csvField(-38.5)).toBe('-38.5');
    expect(csvField(Number.NaN)).toBe('');
    expect(csvField(null)).toBe('');
  });
});

describe('reportRankingCsv', () => {
  const text = reportRankingCsv(reportFromRun(reportRunFixture(), 'North corridor'));

  it('has a header naming the measure and each ring with its radius and unit, and CRLF line ends', () => {
    const [header] = parse(text);
    expect(header).toEqual([
      'rank',
      'name',
      'lon',
      'lat',
      'value (net new demand)',
      'captured',
      'cannibalization',
      'net new',
      'share',
      'ring 1 km',
      'ring 3 km',
      'min rank',
      'max rank',
      'site id',
    ]);
    expect(text.split('\r\n')).toHaveLength(5);
  });

  it('parses back to the run ranking, best first, with 6-decimal coordinates', () => {
    const rows = parse(text).slice(1);
    expect(rows.map((r) => r[0])).toEqual(['1', '2', '3']);
    const [first] = rows;
    expect(first[1]).toBe('Quay "corner", east');
    expect(first[2]).toBe('-38.512346');
    expect(first[3]).toBe('44.521235');
    expect(Number(first[5])).toBe(12_400.25);
    expect(Number(first[6])).toBe(3_100);
    expect(Number(first[7])).toBe(9_300.25);
    expect(Number(first[4])).toBe(Number(first[7]));
    expect(Number(first[8])).toBeCloseTo(12_400.25 / 40_000, 6);
    expect(Number(first[9])).toBe(3_200.5);
    expect(first.slice(11)).toEqual(['1', '2', 'c-quay']);
  });

  it('keeps a formula-like site name as inert text', () => {
    const rows = parse(text).slice(1);
    expect(rows[2][1]).toBe(`'=HYPERLINK("x")`);
  });
});
