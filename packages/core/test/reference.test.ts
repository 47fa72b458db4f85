/**
 * Reference checks against libraries OUTSIDE the project: scipy 1.10 and scikit-learn 1.2 from
 * Debian (tests/reference/kde-reference.py wrote tests/reference/expected/*.json from the committed
 * points in tests/reference/input/). `REGEN=1` reruns the Python script first.
 *
 * Tolerances:
 *  - exact method: |ours − ref| ≤ 1e-9·|ref| + 1e-12·max (round-off of the two sums);
 *    Gaussian adds 1e-8·max because we truncate the kernel at 6 sd (mass beyond e^−18 ≈ 1.5e-8);
 *  - binned method: |ours − ref| ≤ 1e-3·max(ref), the engine's stated bound, checked for the
 *    kernels binned is used for (Gaussian, quartic, triweight).
 */
import { spawnSync } from 'node:child_process';
import { join } from 'node:path';
import { beforeAll, describe, expect, it } from 'vitest';
import { bandwidthNormalReference } from '../src/bandwidth/bandwidth-normal-reference.js';
import { kdeBinned } from '../src/kde/kde-binned.js';
import { kdeExact } from '../src/kde/kde-exact.js';
import { kernelByName } from '../src/kernels/kernels.js';
import { REFERENCE_DIR, referenceExcess, referencePoints, referenceRead, type KdeReference } from './reference-data.js';

beforeAll(() => {
  if (process.env.REGEN !== '1') return;
  const run = spawnSync('/usr/bin/python3', [join(REFERENCE_DIR, 'kde-reference.py')], { encoding: 'utf8' });
  if (run.status !== 0) throw new Error(`REGEN=1: the reference script failed (needs Debian python3-scipy and python3-sklearn):\n${run.stderr}`);
}, 300_000);

describe('density engine vs scipy / scikit-learn [S: scipy 1.10.1, scikit-learn 1.2.1 from Debian]', () => {
  const ref = referenceRead<KdeReference>('kde-planar.json');
  const points = referencePoints('points-planar.csv');
  const W = ref.grid.width;

  for (const c of ref.cases) {
    const absOfMax = c.kernel === 'gaussian' ? 1e-8 : 1e-12;
    it(`exact ${c.kernel} h = ${c.bandwidth} m matches ${c.source.split(' (')[0]} at ${c.samples.length} cells`, () => {
      const { values } = kdeExact(points, ref.grid, c.kernel, c.bandwidth, { oversample: 1 });
      expect(referenceExcess(c, (i, j) => values[i + j * W] * 1e6, 1e-9, absOfMax)).toBeLessThanOrEqual(0);
      const peak = values.reduce((m, v) => Math.max(m, v), 0) * 1e6;
      expect(Math.abs(peak - c.max) / c.max).toBeLessThan(1e-9);
    });
  }

  for (const c of ref.cases.filter((k) => ['gaussian', 'quartic', 'triweight'].includes(k.kernel))) {
    it(`binned ${c.kernel} h = ${c.bandwidth} m is within 1e-3 × max of the reference`, () => {
      const { values } = kdeBinned(points, ref.grid, c.kernel, c.bandwidth);
      expect(referenceExcess(c, (i, j) => values[i + j * W] * 1e6, 0, 1e-3)).toBeLessThanOrEqual(0);
    });
  }

  it('the reference surfaces carry the total weight (the grid holds every kernel)', () => {
    for (const c of ref.cases) expect(Math.abs(c.integral / ref.totalWeight - 1)).toBeLessThan(1e-3);
  });
});

describe('kernel normalisation vs scipy.integrate and scikit-learn [S: scipy dblquad; sklearn KernelDensity]', () => {
  const k = referenceRead<{
    closedForm: Record<string, { mass: number; mu2: number; roughness: number }>;
    sklearnSinglePoint: Record<string, { mass: number; valueAtZero: number }>;
  }>('kernel-constants.json');

  it('quartic and triweight integrate to 1 with μ₂ and R(K) as our constants', () => {
    for (const name of ['quartic', 'triweight'] as const) {
      const ours = kernelByName(name);
      expect(k.closedForm[name].mass).toBeCloseTo(1, 12);
      expect(ours.mu2).toBeCloseTo(k.closedForm[name].mu2, 12);
      expect(ours.roughness).toBeCloseTo(k.closedForm[name].roughness, 12);
    }
  });

  // sklearn normalises each kernel over the d-dimensional ball (d = 2 here): its tophat, linear and
  // epanechnikov are exactly our uniform, triangular and Epanechnikov, each of mass 1.
  it('sklearn 2-D kernels have mass 1 and the same height at 0 as ours', () => {
    for (const name of ['gaussian', 'epanechnikov', 'uniform', 'triangular'] as const) {
      expect(k.sklearnSinglePoint[name].mass).toBeCloseTo(1, 9);
      expect(kernelByName(name).value(0)).toBeCloseTo(k.sklearnSinglePoint[name].valueAtZero, 12);
    }
  });
});

describe('normal-reference bandwidth vs scipy gaussian_kde [S: scipy 1.10.1 gaussian_kde, Scott factor n_eff^(−1/6)]', () => {
  const b = referenceRead<{ neff: number; factor: number; gaussianSdFromScipyCovariance: number; iqrOver1349: number[]; weightedCovariance: number[][] }>(
    'bandwidth-normal-reference.json',
  );
  const points = referencePoints('points-bandwidth.csv');

  it('the data set is one where the sd, not IQR/1.349, is the spread (uniform points)', () => {
    expect(Math.sqrt(b.weightedCovariance[0][0])).toBeLessThan(b.iqrOver1349[0]);
    expect(Math.sqrt(b.weightedCovariance[1][1])).toBeLessThan(b.iqrOver1349[1]);
  });

  it('Gaussian h = factor × pooled weighted sd, with factor = n_eff^(−1/6)', () => {
    expect(Math.pow(b.neff, -1 / 6)).toBeCloseTo(b.factor, 12);
    const r = bandwidthNormalReference(points, 'gaussian');
    expect(Math.abs(r.value / b.gaussianSdFromScipyCovariance - 1)).toBeLessThan(1e-9);
  });
});
