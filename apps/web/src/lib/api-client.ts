import { env } from '../config/env';
import { ApiError, isApiErrorBody } from './api-error';

type Method = 'GET' | 'POST' | 'PATCH' | 'PUT' | 'DELETE';

export type RequestOptions = {
  body?: unknown;
  query?: Record<string, string | number | undefined | null>;
  signal?: AbortSignal;
};

let csrfToken: string | null = null;
let csrfPending: Promise<string> | null = null;

/**
 * Forgets the CSRF token; the next mutation fetches a new one. Call after sign-in and sign-out,
 * because the server ties the token to the session.
 * @returns nothing
 * @example await signIn(input); resetCsrfToken();
 */
export function resetCsrfToken(): void {
  csrfToken = null;
  csrfPending = null;
}

function urlFor(path: string, query?: RequestOptions['query']): string {
  const base = env.VITE_API_ORIGIN || globalThis.location?.origin || 'http://localhost';
  const url = new URL(`/api${path}`, base);
  for (const [key, value] of Object.entries(query ?? {})) {
    if (value !== undefined && value !== null && value !== '') url.searchParams.set(key, String(value));
  }
  return url.toString();
}

async function send(method: Method, path: string, options: RequestOptions, token: string | null): Promise<Response> {
  const headers: Record<string, string> = { accept: 'application/json' };
  // A FormData body (a file upload) goes as multipart with the boundary fetch writes itself.
  const isForm = typeof FormData !== 'undefined' && options.body instanceof FormData;
  if (options.body !== undefined && !isForm) headers['content-type'] = 'application/json';
  if (token) headers['x-csrf-token'] = token;
  try {
    return await fetch(urlFor(path, options.query), {
      method,
      headers,
      credentials: 'include',
      body: options.body === undefined ? undefined : isForm ? (options.body as FormData) : JSON.stringify(options.body),
      signal: options.signal,
    });
  } catch (cause) {
    if (cause instanceof DOMException && cause.name === 'AbortError') throw cause;
    throw new ApiError(0, 'NETWORK_ERROR', 'Could not reach the Demandscape server. Check your connection and try again.');
  }
}

async function errorFrom(response: Response): Promise<ApiError> {
  const text = await response.text().catch(() => '');
  let parsed: unknown = null;
  try {
    parsed = text ? JSON.parse(text) : null;
  } catch {
    parsed = null;
  }
  if (isApiErrorBody(parsed)) {
    const { code, message, field, fields, details } = parsed.error;
    // A refused file import lists its bad rows beside the message; they travel in `details`.
    const rowErrors = (parsed.error as { rowErrors?: unknown }).rowErrors;
    return new ApiError(response.status, code, message, field, fields, Array.isArray(rowErrors) ? { ...details, rowErrors } : details);
  }
  return new ApiError(
    response.status,
    'HTTP_ERROR',
    `The server answered ${response.status}${response.statusText ? ` ${response.statusText}` : ''} without an explanation. Try again in a moment.`,
  );
}

/**
 * The session's CSRF token (fetched once, then cached), for requests this client cannot send itself,
 * such as a file upload that reports progress through XMLHttpRequest.
 * @returns the token for the `x-csrf-token` header
 * @example xhr.setRequestHeader('x-csrf-token', await csrfTokenFor());
 */
export async function csrfTokenFor(): Promise<string> {
  if (csrfToken) return csrfToken;
  csrfPending ??= (async () => {
    const response = await send('GET', '/auth/csrf', {}, null);
    if (!response.ok) throw await errorFrom(response);
    const body = (await response.json()) as { csrfToken: string };
    csrfToken = body.csrfToken;
    return body.csrfToken;
  })().finally(() => {
    csrfPending = null;
  });
  return csrfPending;
}

/**
 * Calls the Demandscape API: sends the session cookie, adds the CSRF header on mutations (fetching
 * the token once, and again once if the server rejects it), and turns `{ error }` bodies into `ApiError`.
 * @param method HTTP method
 * @param path path under `/api`, e.g. `/organizations`
 * @param options JSON body (or FormData for a file upload), query parameters, abort signal
 * @returns the parsed JSON body (202 Accepted included), or `undefined` for 204 or an empty body
 * @example const { workspaces } = await apiRequest<{ workspaces: Workspace[] }>('GET', `/organizations/${id}/workspaces`);
 */
export async function apiRequest<T>(method: Method, path: string, options: RequestOptions = {}): Promise<T> {
  const isMutation = method !== 'GET';
  let response = await send(method, path, options, isMutation ? await csrfTokenFor() : null);
  if (isMutation && response.status === 403) {
    const error = await errorFrom(response.clone());
    if (error.code === 'CSRF_INVALID') {
      resetCsrfToken();
      response = await send(method, path, options, await csrfTokenFor());
    }
  }
  if (!response.ok) throw await errorFrom(response);
  if (response.status === 204) return undefined as T;
  // 202 Accepted may carry a body (a queued run, an importing file); it is parsed like any other.
  const text = await response.text();
  return (text ? JSON.parse(text) : undefined) as T;
}

/** Shorthands for `apiRequest`, one per method. */
export const api = {
  get: <T>(path: string, options?: Omit<RequestOptions, 'body'>) => apiRequest<T>('GET', path, options),
  post: <T>(path: string, body?: unknown) => apiRequest<T>('POST', path, { body }),
  patch: <T>(path: string, body: unknown) => apiRequest<T>('PATCH', path, { body }),
  put: <T>(path: string, body: unknown) => apiRequest<T>('PUT', path, { body }),
  delete: <T = void>(path: string) => apiRequest<T>('DELETE', path),
};
