import type { MapSiteKind } from '../types';

/** How a kind of site is drawn: shape AND colour differ, so the kinds read without colour vision. */
export type SiteSymbolSpec = {
  kind: MapSiteKind;
  /** Legend wording. */
  label: string;
  shape: 'diamond' | 'square' | 'triangle';
  /** A hollow symbol has a white middle inside a thick coloured outline. */
  hollow: boolean;
  colour: string;
  /** Draw order: higher is on top (candidates, the subject of the study, stay visible). */
  order: number;
};

/**
 * One symbol per kind. Colours from the Okabe–Ito colour-blind-safe palette ([S] Okabe & Ito 2008,
 * "Color Universal Design"): vermillion, blue, reddish purple; every symbol has a white halo so it
 * reads over both ends of the surface's cividis ramp.
 */
export const siteSymbolSpecs: Record<MapSiteKind, SiteSymbolSpec> = {
  candidate: { kind: 'candidate', label: 'Candidate site', shape: 'diamond', hollow: true, colour: '#d55e00', order: 3 },
  own: { kind: 'own', label: 'Own store', shape: 'square', hollow: false, colour: '#0072b2', order: 2 },
  competitor: { kind: 'competitor', label: 'Competitor store', shape: 'triangle', hollow: false, colour: '#cc79a7', order: 1 },
};

/** The kinds in legend order. */
export const siteKinds: readonly MapSiteKind[] = ['candidate', 'own', 'competitor'];

/** Symbol box side in CSS pixels; the halo and the hollow ring's width, also CSS pixels. */
export const SITE_SYMBOL_SIZE = 24;
const HALO = 1.5;
const RING = 3;

/**
 * The "radius" (centre-to-edge distance) of each shape inside a box of side `size`, halo included,
 * chosen so the three read as the same size.
 */
function outerRadius(shape: SiteSymbolSpec['shape'], size: number): number {
  if (shape === 'square') return 0.31 * size;
  if (shape === 'diamond') return 0.34 * size;
  return 0.28 * size;
}

/**
 * Distance-like norm of a point for a convex shape centred at the origin: the largest projection on
 * the edges' unit normals, so `norm <= r` is the shape with inradius r and a band of width w outside
 * it is an even outline. Screen y grows downwards; the triangle points up.
 */
function shapeNorm(shape: SiteSymbolSpec['shape'], x: number, y: number): number {
  if (shape === 'square') return Math.max(Math.abs(x), Math.abs(y));
  if (shape === 'diamond') return (Math.abs(x) + Math.abs(y)) / Math.SQRT2;
  return Math.max(y, -0.5 * y + (Math.sqrt(3) / 2) * x, -0.5 * y - (Math.sqrt(3) / 2) * x);
}

/** The triangle's centroid sits below the box centre so its apex and base fit evenly. */
function centreOffsetY(shape: SiteSymbolSpec['shape'], radius: number): number {
  return shape === 'triangle' ? radius / 2 : 0;
}

function hexRgb(hex: string): [number, number, number] {
  const n = Number.parseInt(hex.slice(1), 16);
  return [(n >> 16) & 255, (n >> 8) & 255, n & 255];
}

/**
 * Paints a kind's symbol into straight (not premultiplied) RGBA bytes for `map.addImage`, with 4 × 4
 * supersampling for smooth edges. No canvas needed, so it runs (and is tested) anywhere.
 * @param kind which symbol
 * @param pixelRatio device pixels per CSS pixel (2 keeps it sharp on dense screens)
 * @returns width, height (device pixels) and the bytes, row 0 at the top
 * @example map.addImage('ds-site-own', siteSymbolImage('own', 2), { pixelRatio: 2 })
 */
export function siteSymbolImage(kind: MapSiteKind, pixelRatio = 2): { width: number; height: number; data: Uint8ClampedArray } {
  const spec = siteSymbolSpecs[kind];
  const size = Math.round(SITE_SYMBOL_SIZE * pixelRatio);
  const outer = outerRadius(spec.shape, size);
  const halo = HALO * pixelRatio;
  const edge = outer - halo;
  const ring = RING * pixelRatio;
  const dy = centreOffsetY(spec.shape, outer);
  const [r, g, b] = hexRgb(spec.colour);
  const data = new Uint8ClampedArray(size * size * 4);
  const sub = 4;
  for (let py = 0; py < size; py++) {
    for (let px = 0; px < size; px++) {
      let coloured = 0;
      let white = 0;
      for (let sy = 0; sy < sub; sy++) {
        for (let sx = 0; sx < sub; sx++) {
          const x = px + (sx + 0.5) / sub - size / 2;
          const y = py + (sy + 0.5) / sub - size / 2 - dy;
          const d = shapeNorm(spec.shape, x, y);
          if (d > outer) continue;
          if (d > edge || (spec.hollow && d <= edge - ring)) white += 1;
          else coloured += 1;
        }
      }
      const covered = coloured + white;
      if (covered === 0) continue;
      const i = (px + py * size) * 4;
      data[i] = (coloured * r + white * 255) / covered;
      data[i + 1] = (coloured * g + white * 255) / covered;
      data[i + 2] = (coloured * b + white * 255) / covered;
      data[i + 3] = (255 * covered) / (sub * sub);
    }
  }
  return { width: size, height: size, data };
}

/**
 * The symbol's coloured outline as polygon vertices in a box of side `size` (origin top left), for
 * the legend's SVG; the same geometry as `siteSymbolImage` without the halo.
 * @param kind which symbol
 * @param size box side in pixels
 * @returns vertices `[x, y]`, clockwise
 * @example siteSymbolPolygon('own', 24) // [[4.56, 4.56], [19.44, 4.56], …]
 */
export function siteSymbolPolygon(kind: MapSiteKind, size = SITE_SYMBOL_SIZE): Array<[number, number]> {
  const spec = siteSymbolSpecs[kind];
  const edge = outerRadius(spec.shape, size) - HALO * (size / SITE_SYMBOL_SIZE);
  const c = size / 2;
  if (spec.shape === 'square') return [[c - edge, c - edge], [c + edge, c - edge], [c + edge, c + edge], [c - edge, c + edge]];
  if (spec.shape === 'diamond') {
    const v = edge * Math.SQRT2;
    return [[c, c - v], [c + v, c], [c, c + v], [c - v, c]];
  }
  const cy = c + centreOffsetY('triangle', outerRadius('triangle', size));
  return [[c, cy - 2 * edge], [c + Math.sqrt(3) * edge, cy + edge], [c - Math.sqrt(3) * edge, cy + edge]];
}

/** Width of the hollow symbol's coloured ring, CSS pixels (the legend draws it with this stroke). */
export const SITE_RING_WIDTH = RING;
