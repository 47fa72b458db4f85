import { describe, expect, it } from 'vitest';
import { randomSeeded } from '../lib/random-seeded.js';
import type { Site } from '../sites/site.js';
import type { GridSpec, PlanarPoints } from '../types.js';
import { rankStability, rankStabilityFromSurfaces } from './rank-stability.js';
import type { ScoringSurface } from './scoring-surface.js';

const spec: GridSpec = { originX: 0, originY: 0, cellSize: 200, width: 60, height: 50 };

function uniformSurface(v: number): ScoringSurface {
  return { spec, values: new Float64Array(spec.width * spec.height).fill(v) };
}

function towns(seed: number): PlanarPoints {
  const r = randomSeeded(seed);
  const centres = [
    [3000, 3000, 300],
    [8000, 6000, 900],
    [5000, 8000, 1500],
  ];
  const n = 3000;
  const p = { x: new Float64Array(n), y: new Float64Array(n), w: new Float64Array(n) };
  for (let k = 0; k < n; k++) {
    const [cx, cy, s] = centres[k % 3];
    p.x[k] = cx + s * r.normal();
    p.y[k] = cy + s * r.normal();
    p.w[k] = 1;
  }
  return p;
}

const cand = (id: string, x: number, y: number): Site => ({ id, kind: 'candidate', x, y, attractiveness: 1 });

describe('rankStabilityFromSurfaces', () => {
  it('reports τ = 1 and no movement when every bandwidth gives the same surface (scaled) [closed form: ranking is scale-free]', () => {
    const sites: Site[] = [cand('a', 2000, 2000), cand('b', 6000, 5000), cand('c', 11000, 9000), { id: 'o', kind: 'own', x: 6500, y: 5000, attractiveness: 1 }];
    const r = rankStabilityFromSurfaces(
      [0.5, 1, 2].map((factor) => ({ factor, surface: uniformSurface(100 * factor) })),
      sites,
    );
    expect(r.variants.map((v) => v.tau)).toEqual([1, 1, 1]);
    expect(r.sites.every((s) => s.maxShift === 0 && !s.unstable)).toBe(true);
    expect(r.threshold).toBe(2);
  });

  it('flags the one site that jumps from last to first, with τ = (36 − 9)/45 = 0.6 for that variant [D: counted pairs]', () => {
    // Ten far-apart demand blobs (500 m cells, 25 km apart), each with a candidate on it and a
    // competitor 1.5 km away, so a candidate's score is essentially its own blob.
    const line: GridSpec = { originX: 0, originY: 0, cellSize: 500, width: 500, height: 1 };
    const sites: Site[] = [];
    for (let i = 0; i < 10; i++) {
      sites.push(cand(`c${i}`, (50 * i + 0.5) * 500, 250));
      sites.push({ id: `k${i}`, kind: 'competitor', x: (50 * i + 0.5) * 500, y: 1750, attractiveness: 1 });
    }
    const blobs = (first: number): ScoringSurface => {
      const values = new Float64Array(line.width);
      for (let i = 0; i < 10; i++) values[50 * i] = i === 0 ? first : 10 + i;
      return { spec: line, values };
    };
    const r = rankStabilityFromSurfaces(
      [
        { factor: 1, surface: blobs(10) },
        { factor: 2, surface: blobs(100) },
      ],
      sites,
    );
    expect(r.variants[1].tau).toBeCloseTo(0.6, 12);
    const c0 = r.sites.find((s) => s.id === 'c0')!;
    expect(c0).toMatchObject({ baseRank: 10, minRank: 1, maxRank: 10, maxShift: 9, unstable: true });
    expect(r.sites.filter((s) => s.unstable).map((s) => s.id)).toEqual(['c0']);
  });

  it('requires the base surface and two candidates', () => {
    const sites = [cand('a', 0, 0), cand('b', 1, 1)];
    expect(() => rankStabilityFromSurfaces([{ factor: 2, surface: uniformSurface(1) }], sites)).toThrow(/factor 1/);
    expect(() => rankStabilityFromSurfaces([{ factor: 1, surface: uniformSurface(1) }], [cand('a', 0, 0)])).toThrow(/at least 2 candidate/);
  });
});

describe('rankStability', () => {
  it('reports rank ranges and τ for surfaces built from points at half to double the bandwidth', () => {
    const sites: Site[] = [
      cand('t1', 3000, 3000),
      cand('t2', 8000, 6000),
      cand('t3', 5000, 8000),
      cand('w1', 8600, 6400),
      cand('w2', 7400, 5600),
      cand('m1', 5500, 8500),
      cand('m2', 4500, 7400),
      cand('f1', 11000, 1000),
      cand('f2', 1000, 9000),
      cand('edge', 4100, 3900),
      { id: 'own', kind: 'own', x: 3000, y: 3100, attractiveness: 2 },
      { id: 'rival', kind: 'competitor', x: 8000, y: 6200, attractiveness: 2 },
    ];
    const r = rankStability(towns(1), spec, 'gaussian', 600, sites);
    expect(r.variants.map((v) => v.factor)).toEqual([0.5, 0.75, 1, 1.5, 2]);
    expect(r.variants.find((v) => v.factor === 1)!.tau).toBeCloseTo(1, 12);
    for (const s of r.sites) {
      expect(s.minRank).toBeLessThanOrEqual(s.baseRank);
      expect(s.maxRank).toBeGreaterThanOrEqual(s.baseRank);
      expect(s.unstable).toBe(s.maxShift > r.threshold);
    }
    for (const v of r.variants) expect(v.tau).toBeGreaterThan(0);
  });
});
