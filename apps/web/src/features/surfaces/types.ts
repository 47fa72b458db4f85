/** Demand-surface shapes as the API returns them (apps/server surface module, contract v1). */

export type KernelName = 'quartic' | 'epanechnikov' | 'triweight' | 'uniform' | 'triangular' | 'gaussian';
export type BandwidthRule = 'normal-reference' | 'likelihood-cv' | 'least-squares-cv';
export type DensityUnit = 'km2' | 'sqmi';
export type SurfaceStatus = 'queued' | 'running' | 'succeeded' | 'failed' | 'cancelled';

export type StudyArea =
  | { type: 'extent' }
  | { type: 'polygon'; geometry: { type: 'Polygon'; coordinates: number[][][] } | { type: 'MultiPolygon'; coordinates: number[][][][] } };

/** Everything that shapes a surface; the body of estimate and create (plus the file and an optional name). */
export type SurfaceParams = {
  kernel: KernelName;
  bandwidth: { mode: 'rule'; rule: BandwidthRule } | { mode: 'value'; value: number };
  cellSize?: number;
  studyArea: StudyArea;
  edgeCorrection: boolean;
  adaptive: boolean;
  unit: DensityUnit;
  method: 'auto' | 'exact' | 'binned';
};

export type SurfaceCreateBody = SurfaceParams & { customerFileId: string; name?: string };

/** The live estimate shown before a run: what the server would use and what it costs. */
export type SurfaceEstimate = {
  bandwidth: { value: number; rule: string; explanation: string; gaussianSd: number; radius: number };
  cellSize: { value: number; explanation: string };
  grid: { width: number; height: number; cells: number };
  cost: { credits: number; formula: string };
  method?: 'exact' | 'binned';
  estimatedSeconds?: number;
  warnings: string[];
  projection: { epsg: number | null; label: string };
};

/** One percent-volume level: the smallest area holding `percent` % of demand, above `threshold` per km². */
export type SurfaceThreshold = { percent: number; threshold: number; areaKm2: number; clipped: boolean };

export type Surface = {
  id: string;
  name: string;
  status: SurfaceStatus;
  /** 0–1. */
  progress: number;
  customerFileId: string | null;
  params: SurfaceParams;
  resolved: {
    bandwidth: { value: number; rule: string; explanation: string; gaussianSd: number; radius: number; kernelSd?: number };
    cellSize: { value: number; explanation: string };
    grid: { width: number; height: number; cellSize?: number };
    projection: { epsg: number | null; label: string };
    method: 'exact' | 'binned';
  } | null;
  engineVersion?: string;
  attempts: number;
  pointCount: number;
  costCredits: number;
  queuedAt: string;
  startedAt: string | null;
  finishedAt: string | null;
  /** Seconds per stage of the last attempt. */
  timings: Record<string, number> | null;
  error: { code: string; message: string } | null;
  stats: Record<string, unknown> | null;
  thresholds: SurfaceThreshold[] | null;
  createdBy: { id: string; name: string } | null;
  createdAt: string;
  updatedAt?: string;
};

/** A customer file the form may build from (the route passes these in; features do not import each other). */
export type SurfaceSource = { id: string; name: string; acceptedCount: number; weightLabel: string | null };
