import { env } from '../../../config/env';
import { csrfTokenFor, resetCsrfToken } from '../../../lib/api-client';
import { ApiError, isApiErrorBody } from '../../../lib/api-error';

async function errorOf(response: Response): Promise<ApiError> {
  let parsed: unknown = null;
  try {
    parsed = JSON.parse(await response.text());
  } catch {
    parsed = null;
  }
  if (isApiErrorBody(parsed)) {
    const { code, message, field, fields, details } = parsed.error;
    return new ApiError(response.status, code, message, field, fields, details);
  }
  return new ApiError(response.status, 'HTTP_ERROR', `The server answered ${response.status} without an explanation. Try again in a moment.`);
}

async function send(path: string, body: unknown, token: string): Promise<Response> {
  const base = env.VITE_API_ORIGIN || globalThis.location?.origin || 'http://localhost';
  try {
    return await fetch(new URL(`/api${path}`, base).toString(), {
      method: 'POST',
      headers: { accept: 'application/json', 'content-type': 'application/json', 'x-csrf-token': token },
      credentials: 'include',
      body: JSON.stringify(body ?? {}),
    });
  } catch {
    throw new ApiError(0, 'NETWORK_ERROR', 'Could not reach the Demandscape server. Check your connection and try again.');
  }
}

/**
 * POSTs to a route that answers 202 Accepted WITH a JSON body (scoring runs and stability checks return
 * the queued run). The shared client drops 202 bodies, so this sends the same CSRF header, retries once
 * on CSRF_INVALID, and turns `{ error }` bodies into ApiError like the client does.
 * @param path path under `/api`
 * @param body the JSON body
 * @returns the parsed body
 * @example const { run } = await postAccepted<{ run: ScoringRunJson }>(`${path}/scoring-runs`, { surfaceId });
 */
export async function postAccepted<T>(path: string, body?: unknown): Promise<T> {
  let response = await send(path, body, await csrfTokenFor());
  if (response.status === 403) {
    const error = await errorOf(response.clone());
    if (error.code === 'CSRF_INVALID') {
      resetCsrfToken();
      response = await send(path, body, await csrfTokenFor());
    }
  }
  if (!response.ok) throw await errorOf(response);
  return (await response.json()) as T;
}
