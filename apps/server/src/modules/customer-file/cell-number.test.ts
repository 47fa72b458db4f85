import { describe, expect, it } from 'vitest';
import { cellNumber } from './cell-number.js';
import { csvCell } from './csv-cell.js';

describe('cellNumber', () => {
  it('reads plain and exponent numbers, trimming spaces', () => {
    expect(cellNumber(' -38.125 ', false)).toBe(-38.125);
    expect(cellNumber('1e3', false)).toBe(1000);
    expect(cellNumber('+.5', false)).toBe(0.5);
  });
  it('reads decimal commas only when the file uses them', () => {
    expect(cellNumber('44,5', true)).toBe(44.5);
    expect(cellNumber('44.5', true)).toBe(44.5);
    expect(cellNumber('44,5', false)).toBeNaN();
  });
  it('tells empty cells (null) from text (NaN)', () => {
    expect(cellNumber('', false)).toBeNull();
    expect(cellNumber('   ', false)).toBeNull();
    expect(cellNumber(undefined, false)).toBeNull();
    for (const text of ['abc', '0x10', 'Infinity', '1,234.5', '12 345', '1e999'])
      expect(cellNumber(text, false), text).toBeNaN();
  });
});

describe('csvCell', () => {
  it('quotes delimiters and quotes, and defuses spreadsheet formulas but not negative numbers', () => {
    expect(csvCell('a,b')).toBe('"a,b"');
    expect(csvCell('say "hi"')).toBe('"say ""hi"""');
    expect(csvCell('=HYPERLINK("x")')).toBe(`"'=HYPERLINK(""x"")"`);
    expect(csvCell('@SUM(A1)')).toBe("'@SUM(A1)");
    expect(csvCell('-38.5')).toBe('-38.5');
    expect(csvCell('-abc')).toBe("'-abc");
  });
});
