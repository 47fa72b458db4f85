/** The `{ error }` body every failed API call returns. */
export type ApiErrorBody = {
  error: { code: string; message: string; field?: string; fields?: Record<string, string>; details?: Record<string, unknown> };
};

/**
 * A failed API call, typed: HTTP status, machine-readable code, human message and, for
 * validation failures, the offending field(s).
 * @example
 * if (error instanceof ApiError && error.code === 'EMAIL_TAKEN') showOnField('email', error.message);
 */
export class ApiError extends Error {
  readonly status: number;
  readonly code: string;
  readonly field?: string;
  readonly fields?: Record<string, string>;
  /** Machine-readable extras some errors carry, e.g. `suggestedCellSize` with GRID_TOO_LARGE. */
  readonly details?: Record<string, unknown>;

  constructor(
    status: number,
    code: string,
    message: string,
    field?: string,
    fields?: Record<string, string>,
    details?: Record<string, unknown>,
  ) {
    super(message);
    this.name = 'ApiError';
    this.status = status;
    this.code = code;
    this.field = field;
    this.fields = fields;
    this.details = details;
  }
}

/**
 * Tells an error body in the contract's shape from anything else a proxy or crash might send.
 * @param value parsed JSON
 * @returns true for `{ error: { code, message } }`
 * @example isApiErrorBody({ error: { code: 'NOT_FOUND', message: 'No such workspace.' } }) // true
 */
export function isApiErrorBody(value: unknown): value is ApiErrorBody {
  if (typeof value !== 'object' || value === null || !('error' in value)) return false;
  const error = (value as { error: unknown }).error;
  return (
    typeof error === 'object' &&
    error !== null &&
    typeof (error as { code?: unknown }).code === 'string' &&
    typeof (error as { message?: unknown }).message === 'string'
  );
}

/**
 * A readable sentence for any thrown value, for error states and notifications.
 * @param error anything caught
 * @returns the message to show
 * @example errorMessage(new ApiError(404, 'NOT_FOUND', 'Workspace not found.')) // 'Workspace not found.'
 */
export function errorMessage(error: unknown): string {
  if (error instanceof Error && error.message) return error.message;
  return 'Something went wrong. Try again; if it keeps happening, reload the page.';
}
