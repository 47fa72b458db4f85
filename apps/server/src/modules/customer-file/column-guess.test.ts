import { describe, expect, it } from 'vitest';
import { columnGuess, headerWords } from './column-guess.js';

describe('columnGuess', () => {
  it('matches English, German, French and Spanish header names', () => {
    expect(columnGuess(['Customer', 'Latitude', 'Longitude', 'Annual spend'])).toEqual({
      lat: 'Latitude',
      lon: 'Longitude',
      weight: 'Annual spend',
    });
    expect(columnGuess(['Kunde', 'Breite', 'Länge', 'Umsatz'])).toEqual({
      lat: 'Breite',
      lon: 'Länge',
      weight: 'Umsatz',
    });
    expect(columnGuess(['nom', 'latitude', 'longitude', 'montant'])).toEqual({
      lat: 'latitude',
      lon: 'longitude',
      weight: 'montant',
    });
    expect(columnGuess(['LATITUD', 'LONGITUD', 'VENTAS'])).toEqual({
      lat: 'LATITUD',
      lon: 'LONGITUD',
      weight: 'VENTAS',
    });
  });
  it('accepts lng, x/y as whole names, and words inside longer names', () => {
    expect(columnGuess(['y', 'x'])).toEqual({ lat: 'y', lon: 'x' });
    expect(columnGuess(['home_lat', 'home_lng', 'visit_count'])).toEqual({
      lat: 'home_lat',
      lon: 'home_lng',
      weight: 'visit_count',
    });
  });
  it('leaves out what it cannot find, and does not read "xylophone" as x', () => {
    expect(columnGuess(['name', 'xylophone', 'email'])).toEqual({});
  });
  it('prefers money over counts for the weight', () => {
    expect(columnGuess(['lat', 'lon', 'count', 'sales'])).toMatchObject({ weight: 'sales' });
  });
  it('splits headers into plain words', () => {
    expect(headerWords('Kunden-Länge (WGS84)')).toEqual(['kunden', 'lange', 'wgs84']);
  });
});
