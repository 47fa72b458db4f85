/** Body of every error response: `{ error: { code, message, field?, fields? } }`. */
export interface ErrorBody {
  code: string;
  message: string;
  field?: string;
  fields?: Record<string, string>;
}

/**
 * Base class for errors that map to a specific HTTP status and a stable code.
 * @example
 * throw new AppError(409, 'EMAIL_TAKEN', 'An account with this e-mail already exists.', 'email');
 */
export class AppError extends Error {
  readonly status: number;
  readonly code: string;
  readonly field?: string;
  readonly fields?: Record<string, string>;

  constructor(status: number, code: string, message: string, field?: string, fields?: Record<string, string>) {
    super(message);
    this.name = 'AppError';
    this.status = status;
    this.code = code;
    this.field = field;
    this.fields = fields;
  }

  /** @returns the JSON error body for this error */
  toBody(): ErrorBody {
    return {
      code: this.code,
      message: this.message,
      ...(this.field ? { field: this.field } : {}),
      ...(this.fields ? { fields: this.fields } : {}),
    };
  }
}

/** 400: the request body or query failed validation; `field` names the first bad field. */
export class ValidationError extends AppError {
  constructor(message: string, field?: string, fields?: Record<string, string>) {
    super(400, 'VALIDATION_FAILED', message, field, fields);
  }
}

/** 400: a one-use token (verification, password reset) is unknown, used or expired. */
export class TokenInvalidError extends AppError {
  constructor() {
    super(400, 'TOKEN_INVALID', 'This link is invalid or has expired. Request a new one.', 'token');
  }
}

/** 401: no signed-in session. */
export class UnauthenticatedError extends AppError {
  constructor(message = 'Sign in to continue.') {
    super(401, 'UNAUTHENTICATED', message);
  }
}

/** 401: generic wrong e-mail or password (never says which). */
export class InvalidCredentialsError extends AppError {
  constructor() {
    super(401, 'INVALID_CREDENTIALS', 'E-mail or password is incorrect.');
  }
}

/** 403: signed in and a member, but the role does not allow this action. */
export class ForbiddenError extends AppError {
  constructor(message = 'Your role in this organization does not allow this action.') {
    super(403, 'FORBIDDEN', message);
  }
}

/** 404: missing, or belonging to another organization (never 403, so ids cannot be probed). */
export class NotFoundError extends AppError {
  constructor(what = 'Resource') {
    super(404, 'NOT_FOUND', `${what} not found.`);
  }
}

/** 409: the request conflicts with existing data. */
export class ConflictError extends AppError {
  constructor(code: string, message: string, field?: string) {
    super(409, code, message, field);
  }
}
