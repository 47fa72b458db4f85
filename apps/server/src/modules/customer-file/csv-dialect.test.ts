import { describe, expect, it } from 'vitest';
import { csvDialectDetect } from './csv-dialect.js';

describe('csvDialectDetect', () => {
  it('finds commas in a plain CSV', () => {
    expect(csvDialectDetect(['name,lat,lon', 'A,44.5,-38.5', '"B, junior",44.6,-38.4'])).toEqual({
      delimiter: ',',
      decimalComma: false,
    });
  });
  it('prefers the semicolon when numbers use decimal commas', () => {
    expect(csvDialectDetect(['Kunde;Breite;Länge', 'A;44,5;-38,5', 'B;44,6;-38,4'])).toEqual({
      delimiter: ';',
      decimalComma: true,
    });
  });
  it('keeps the decimal point in a semicolon file without decimal commas', () => {
    expect(csvDialectDetect(['a;lat;lon', 'x;44.5;-38.5'])).toEqual({
      delimiter: ';',
      decimalComma: false,
    });
  });
  it('finds tabs and pipes', () => {
    expect(csvDialectDetect(['lat\tlon\tname, first', '44.5\t-38.5\tA, B']).delimiter).toBe('\t');
    expect(csvDialectDetect(['lat|lon', '44.5|-38.5']).delimiter).toBe('|');
  });
});
