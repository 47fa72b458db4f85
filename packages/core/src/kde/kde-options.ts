/** Options shared by the grid estimators (exact and binned). */
export interface KdeGridOptions {
  /** Study-area mask, one byte per cell (1 = inside); cells outside come back as 0. */
  mask?: Uint8Array;
  /** Cancels the run; checked between chunks of work (throws CoreError ABORTED). */
  signal?: AbortSignal;
  /** Called with the finished share of the work, 0 … 1, a few dozen times per run. */
  onProgress?: (fraction: number) => void;
}

/** A raw estimate on a grid, before any unit conversion. */
export interface KdeGridResult {
  /** λ̂ at each cell in weight per m², row-major i + j·width. */
  values: Float64Array;
  /** Distinct points with a non-zero kernel value at each cell (exact method only, on request). */
  contributors?: Uint32Array;
  /** Points whose kernel reaches at least one cell centre (or sub-sample) of the grid, mask ignored. */
  contributingPoints: number;
  /** Kernel sub-samples per cell and axis: 1 = values at cell centres, s > 1 = cell means. */
  oversample: number;
}
