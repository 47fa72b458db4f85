/**
 * Every input problem the engine can report, as a stable machine-readable code.
 * The server maps these to HTTP 400 responses and the CLI to a non-zero exit.
 */
export type CoreErrorCode =
  | 'EMPTY_POINTS'
  | 'INVALID_COORDINATE'
  | 'COORDINATE_OUT_OF_RANGE'
  | 'INVALID_WEIGHT'
  | 'ZERO_TOTAL_WEIGHT'
  | 'INVALID_BANDWIDTH'
  | 'INVALID_CELL_SIZE'
  | 'INVALID_EXTENT'
  | 'INVALID_POLYGON'
  | 'GRID_TOO_LARGE'
  | 'PROJECTION_SPAN'
  | 'INVALID_ARGUMENT'
  | 'ABORTED';

/**
 * An input error with a code, the offending argument and a message that says what to change.
 *
 * @example
 * throw new CoreError('INVALID_BANDWIDTH', 'bandwidth must be a positive number of metres (got -3)', 'bandwidth');
 */
export class CoreError extends Error {
  readonly code: CoreErrorCode;
  readonly field?: string;
  /** Extra machine-readable facts, e.g. the cell size that would fit for GRID_TOO_LARGE. */
  readonly details?: Record<string, unknown>;

  constructor(code: CoreErrorCode, message: string, field?: string, details?: Record<string, unknown>) {
    super(message);
    this.name = 'CoreError';
    this.code = code;
    this.field = field;
    this.details = details;
  }
}

/** True when `e` is a {@link CoreError}, optionally with the given code. */
export function isCoreError(e: unknown, code?: CoreErrorCode): e is CoreError {
  return e instanceof CoreError && (code === undefined || e.code === code);
}

/** Throws an ABORTED CoreError when the signal has fired; long loops call this between chunks. */
export function throwIfAborted(signal?: AbortSignal): void {
  if (signal?.aborted) throw new CoreError('ABORTED', 'the computation was cancelled', undefined);
}

/** Internal invariant; a failure is a bug in the engine, not bad input. */
export function invariant(cond: unknown, message: string): asserts cond {
  if (!cond) throw new Error(`invariant failed: ${message}`);
}
