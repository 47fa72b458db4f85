import { isCoreError } from '@demandscape/core';
import { AppError, type ErrorBody } from '../common/errors.js';

/** 400 from the density engine's input checks, with its code, field and machine-readable details. */
export class SurfaceInputError extends AppError {
  readonly details?: Record<string, unknown>;

  constructor(code: string, message: string, field?: string, details?: Record<string, unknown>) {
    super(400, code, message, field);
    this.details = details;
  }

  override toBody(): ErrorBody & { details?: Record<string, unknown> } {
    return { ...super.toBody(), ...(this.details ? { details: this.details } : {}) };
  }
}

/**
 * Runs engine code and turns its input errors (CoreError) into 400 responses with the engine's message.
 * @param run the engine call
 * @returns its result
 * @throws SurfaceInputError for CoreError; anything else unchanged
 * @example
 * const plan = coreInputErrors(() => surfacePlan(lon, lat, w, params));
 */
export function coreInputErrors<T>(run: () => T): T {
  try {
    return run();
  } catch (err) {
    if (isCoreError(err)) {
      const field = err.field === 'spec' || err.field === 'polygon' ? 'studyArea' : err.field;
      throw new SurfaceInputError(err.code, err.message, field, err.details);
    }
    throw err;
  }
}
