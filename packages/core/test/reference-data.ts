/** Shared access to the committed reference data in tests/reference (see reference.test.ts). */
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { expect } from 'vitest';
import { csvPoints } from '../src/cli/csv-points.js';
import type { GridSpec, KernelName, PlanarPoints } from '../src/types.js';

export const REFERENCE_DIR = join(import.meta.dirname, '../../../tests/reference');

export interface ReferenceCase {
  kernel: KernelName;
  bandwidth: number;
  source: string;
  max: number;
  maxCell: { i: number; j: number };
  integral: number;
  samples: Array<[number, number, number]>;
  /** Uniform only: sklearn tophat averaged over an s × s sub-lattice of each sampled cell. */
  cellMeans?: { oversample: number; values: number[] };
}

export interface KdeReference {
  grid: GridSpec;
  totalWeight: number;
  cases: ReferenceCase[];
}

/** Reads a committed reference JSON. */
export function referenceRead<T>(name: string): T {
  return JSON.parse(readFileSync(join(REFERENCE_DIR, 'expected', name), 'utf8')) as T;
}

/** Reads committed reference input points through the CLI's CSV parser. */
export function referencePoints(name: string): PlanarPoints {
  const p = csvPoints(readFileSync(join(REFERENCE_DIR, 'input', name), 'utf8'), { planar: true, weight: 'weight' });
  expect(p.problems).toEqual([]);
  return { x: p.a, y: p.b, w: p.w };
}

/** Worst |ours − ref| beyond the allowed tolerance (≤ 0 means every sample is within it). */
export function referenceExcess(
  c: ReferenceCase,
  valueAt: (i: number, j: number) => number,
  rel: number,
  absOfMax: number,
): number {
  let worst = -Infinity;
  for (const [i, j, ref] of c.samples) {
    const d = Math.abs(valueAt(i, j) - ref) - (rel * Math.abs(ref) + absOfMax * c.max);
    if (d > worst) worst = d;
  }
  return worst;
}

