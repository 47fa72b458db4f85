import type { ErrorRequestHandler, RequestHandler } from 'express';
import { NotFoundError as OrmNotFoundError, UniqueConstraintViolationException } from '@mikro-orm/core';
import type { Logger } from 'pino';
import { AppError, NotFoundError } from './errors.js';

/**
 * The single error handler: maps known errors to `{ error: { code, message, field? } }` with their
 * status, and logs anything unexpected as a 500 without leaking details to the client.
 * @param log - the app logger
 * @returns express error middleware
 * @example
 * app.use(errorHandler(log));
 */
export function errorHandler(log: Logger): ErrorRequestHandler {
  return (err, req, res, _next) => {
    const known = knownError(err);
    if (known) {
      res.status(known.status).json({ error: known.toBody() });
      return;
    }
    log.error({ err, method: req.method, path: req.path }, 'unhandled error');
    res.status(500).json({ error: { code: 'INTERNAL', message: 'Something went wrong on our side. Try again; if it keeps happening, contact support.' } });
  };
}

function knownError(err: unknown): AppError | null {
  if (err instanceof AppError) return err;
  if (err instanceof OrmNotFoundError) return new NotFoundError();
  if (err instanceof UniqueConstraintViolationException) return new AppError(409, 'CONFLICT', 'This conflicts with an existing record.');
  const e = err as { type?: string; code?: string; status?: number; message?: string };
  if (e?.type === 'entity.parse.failed') return new AppError(400, 'VALIDATION_FAILED', 'The request body is not valid JSON.');
  if (e?.type === 'entity.too.large') return new AppError(413, 'PAYLOAD_TOO_LARGE', 'The request body is larger than 1 MB.');
  if (e?.code === 'EBADCSRFTOKEN') {
    return new AppError(403, 'CSRF_INVALID', 'Missing or invalid CSRF token. Fetch one from GET /api/auth/csrf and send it in the x-csrf-token header.');
  }
  return null;
}

/**
 * 404 for any `/api` path that no route handled.
 * @returns express middleware
 * @example
 * app.use('/api', apiNotFound());
 */
export function apiNotFound(): RequestHandler {
  return (req, _res, next) => next(new AppError(404, 'NOT_FOUND', `No API route for ${req.method} ${req.baseUrl}${req.path}.`));
}
