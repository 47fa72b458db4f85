import { describe, expect, it } from 'vitest';
import type { MapSiteKind } from '../types';
import { siteKinds, siteSymbolImage, siteSymbolPolygon, siteSymbolSpecs } from './site-symbols';

function pixel(image: { width: number; data: Uint8ClampedArray }, x: number, y: number): [number, number, number, number] {
  const i = (x + y * image.width) * 4;
  return [image.data[i]!, image.data[i + 1]!, image.data[i + 2]!, image.data[i + 3]!];
}

function hex(rgb: number[]): string {
  return `#${rgb.map((v) => Math.round(v).toString(16).padStart(2, '0')).join('')}`;
}

/** Opaque pixels in a row of the image. */
function rowCoverage(image: { width: number; data: Uint8ClampedArray }, y: number): number {
  let n = 0;
  for (let x = 0; x < image.width; x++) if (pixel(image, x, y)[3] > 128) n += 1;
  return n;
}

describe('siteSymbolSpecs', () => {
  it('gives each kind its own shape and its own colour', () => {
    expect(new Set(siteKinds.map((k) => siteSymbolSpecs[k].shape)).size).toBe(3);
    expect(new Set(siteKinds.map((k) => siteSymbolSpecs[k].colour)).size).toBe(3);
  });

  it('uses colours of the Okabe–Ito colour-blind-safe palette', () => {
    // [S] Okabe & Ito (2008), Color Universal Design: the eight colours of the palette.
    const okabeIto = ['#000000', '#e69f00', '#56b4e9', '#009e73', '#f0e442', '#0072b2', '#d55e00', '#cc79a7'];
    for (const kind of siteKinds) expect(okabeIto).toContain(siteSymbolSpecs[kind].colour);
  });
});

describe('siteSymbolImage', () => {
  it('paints a square image at the pixel ratio with clear corners', () => {
    for (const kind of siteKinds) {
      const image = siteSymbolImage(kind, 2);
      expect([image.width, image.height]).toEqual([48, 48]);
      expect(image.data).toHaveLength(48 * 48 * 4);
      expect(pixel(image, 0, 0)[3]).toBe(0);
    }
  });

  it('leaves the candidate’s middle white (hollow) inside a ring of its colour', () => {
    const image = siteSymbolImage('candidate', 2);
    expect(pixel(image, 24, 24)).toEqual([255, 255, 255, 255]);
    // On the horizontal axis the diamond's ring lies between the tip and the white middle.
    const ring = Array.from({ length: 24 }, (_, x) => hex(pixel(image, x, 24).slice(0, 3)));
    expect(ring).toContain(siteSymbolSpecs.candidate.colour);
  });

  it('fills the own store and the competitor with their colours', () => {
    expect(hex(pixel(siteSymbolImage('own', 2), 24, 24).slice(0, 3))).toBe(siteSymbolSpecs.own.colour);
    expect(hex(pixel(siteSymbolImage('competitor', 2), 24, 28).slice(0, 3))).toBe(siteSymbolSpecs.competitor.colour);
  });

  it('draws three different outlines: square corners, diamond corners clear, triangle narrow at the top', () => {
    const square = siteSymbolImage('own', 2);
    const diamond = siteSymbolImage('candidate', 2);
    const triangle = siteSymbolImage('competitor', 2);
    // Near the box’s corner, 10 px in from each side: inside the square (its halo), outside the diamond.
    expect(pixel(square, 10, 10)[3]).toBe(255);
    expect(pixel(diamond, 10, 10)[3]).toBe(0);
    // The square is as wide at the top as at the bottom; the triangle is much narrower at the top.
    expect(rowCoverage(square, 12)).toBe(rowCoverage(square, 36));
    expect(rowCoverage(triangle, 14)).toBeLessThan(rowCoverage(triangle, 36) / 2);
  });

  it('surrounds every symbol with a white halo', () => {
    for (const kind of ['own', 'competitor'] as MapSiteKind[]) {
      const image = siteSymbolImage(kind, 2);
      const row = kind === 'own' ? 24 : 30;
      // The first opaque pixel from the left on a middle row is white (halo), then the colour starts.
      const first = Array.from({ length: 24 }, (_, x) => pixel(image, x, row)).find((p) => p[3] === 255)!;
      expect(first.slice(0, 3)).toEqual([255, 255, 255]);
    }
  });
});

describe('siteSymbolPolygon', () => {
  it('gives four corners for square and diamond and three for the triangle, inside the box', () => {
    expect(siteSymbolPolygon('own')).toHaveLength(4);
    expect(siteSymbolPolygon('candidate')).toHaveLength(4);
    expect(siteSymbolPolygon('competitor')).toHaveLength(3);
    for (const kind of siteKinds) {
      for (const [x, y] of siteSymbolPolygon(kind, 24)) {
        expect(x).toBeGreaterThanOrEqual(0);
        expect(x).toBeLessThanOrEqual(24);
        expect(y).toBeGreaterThanOrEqual(0);
        expect(y).toBeLessThanOrEqual(24);
      }
    }
  });
});
