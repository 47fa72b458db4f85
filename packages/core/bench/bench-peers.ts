import { spawnSync } from 'node:child_process';
import { existsSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import type { PlanarPoints } from '../src/types.js';

const HERE = import.meta.dirname;
const PYTHON = '/usr/bin/python3';

/** A peer's timing; `extrapolated` says whether the time was scaled up from a subsample. */
export interface PeerResult {
  id: string;
  label: string;
  seconds: number;
  /** CPU seconds (user + system), extrapolated like `seconds` where that is. */
  cpuSeconds: number;
  extrapolated: boolean;
  note: string;
  /** Intensity per km² at the first query cells (for a cross-check), when the peer returns them. */
  values?: number[];
}

/** A task for the Python peers (see bench/peer-python.py). */
export interface PythonTask {
  id: string;
  lib: 'sklearn' | 'scipy';
  kernel?: 'epanechnikov' | 'gaussian';
  bandwidth: number;
  rtol?: number;
  queries: number;
}

/** Writes x[N], y[N], w[N] as little-endian float64 for the peers. */
export function peerPointsWrite(path: string, points: PlanarPoints): void {
  const n = points.x.length;
  const all = new Float64Array(3 * n);
  all.set(points.x, 0);
  all.set(points.y, n);
  all.set(points.w, 2 * n);
  writeFileSync(path, new Uint8Array(all.buffer));
}

/** True when Debian's python3 with sklearn and scipy is installed. */
export function pythonPeersAvailable(): boolean {
  return existsSync(PYTHON) && spawnSync(PYTHON, ['-c', 'import sklearn, scipy'], { stdio: 'ignore' }).status === 0;
}

/** True when Rscript with KernSmooth is installed. */
export function kernsmoothAvailable(): boolean {
  return spawnSync('Rscript', ['-e', 'library(KernSmooth)'], { stdio: 'ignore' }).status === 0;
}

/**
 * Runs the Python peers on the same points, evaluating at the first `task.queries` query cells and
 * extrapolating to `fullCells` (labelled as extrapolated).
 */
export function pythonPeersRun(
  dir: string,
  pointsPath: string,
  n: number,
  qx: Float64Array,
  qy: Float64Array,
  fullCells: number,
  tasks: PythonTask[],
): PeerResult[] {
  const queriesPath = join(dir, 'queries.f64');
  const q = new Float64Array(2 * qx.length);
  q.set(qx, 0);
  q.set(qy, qx.length);
  writeFileSync(queriesPath, new Uint8Array(q.buffer));
  const specPath = join(dir, 'peer-spec.json');
  writeFileSync(specPath, JSON.stringify({ points: pointsPath, n, queries: queriesPath, m: qx.length, fullCells, tasks }));
  const out = spawnSync(PYTHON, [join(HERE, 'peer-python.py'), specPath], { encoding: 'utf8', maxBuffer: 1 << 28 });
  if (out.status !== 0) throw new Error(`python peers failed: ${out.stderr}`);
  return out.stdout
    .trim()
    .split('\n')
    .map((line) => {
      const r = JSON.parse(line) as { id: string; label: string; fitSeconds: number; evalSeconds: number; queries: number; extrapolatedSeconds: number; extrapolatedCpuSeconds: number; values: number[] };
      return {
        id: r.id,
        label: r.label,
        seconds: r.extrapolatedSeconds,
        cpuSeconds: r.extrapolatedCpuSeconds,
        extrapolated: true,
        note: `measured ${r.evalSeconds.toFixed(2)} s for ${r.queries.toLocaleString('en-US')} cells (+ ${r.fitSeconds.toFixed(2)} s fit), scaled ×${(fullCells / r.queries).toFixed(0)}`,
        values: r.values,
      };
    });
}

/** Runs R KernSmooth::bkde2D (Gaussian, binned, unweighted) on the full grid; time is measured. */
export function kernsmoothRun(
  pointsPath: string,
  n: number,
  sd: number,
  side: number,
  cellSize: number,
): PeerResult {
  const lo = cellSize / 2;
  const hi = side * cellSize - cellSize / 2;
  const args = [join(HERE, 'peer-kernsmooth.R'), pointsPath, String(n), String(sd), String(side), String(side), String(lo), String(lo), String(hi), String(hi)];
  const out = spawnSync('Rscript', args, { encoding: 'utf8' });
  if (out.status !== 0) throw new Error(`Rscript peer failed: ${out.stderr}`);
  const r = JSON.parse(out.stdout.trim()) as { label: string; seconds: number; cpuSeconds: number };
  return { id: 'kernsmooth', label: r.label, seconds: r.seconds, cpuSeconds: r.cpuSeconds, extrapolated: false, note: 'full grid, fastest of 3 (weights ignored: bkde2D has none)' };
}
