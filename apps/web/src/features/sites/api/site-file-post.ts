import { env } from '../../../config/env';
import { csrfTokenFor, resetCsrfToken } from '../../../lib/api-client';
import { ApiError, isApiErrorBody } from '../../../lib/api-error';
import type { SiteRowError } from '../types';

function urlFor(path: string): string {
  const base = env.VITE_API_ORIGIN || globalThis.location?.origin || 'http://localhost';
  return new URL(`/api${path}`, base).toString();
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
    const rowErrors = (parsed.error as { rowErrors?: unknown }).rowErrors;
    return new ApiError(response.status, code, message, field, fields, Array.isArray(rowErrors) ? { ...details, rowErrors } : details);
  }
  if (response.status === 413) return new ApiError(413, 'FILE_TOO_LARGE', 'The file is larger than 2 MB. Split it into files of at most 5,000 sites.', 'file');
  return new ApiError(response.status, 'HTTP_ERROR', `The server answered ${response.status} without an explanation. Try again in a moment.`);
}

async function sendOnce(path: string, form: FormData, token: string): Promise<Response> {
  try {
    return await fetch(urlFor(path), { method: 'POST', credentials: 'include', headers: { accept: 'application/json', 'x-csrf-token': token }, body: form });
  } catch {
    throw new ApiError(0, 'NETWORK_ERROR', 'Could not reach the Demandscape server to send the file. Check your connection and try again.');
  }
}

/**
 * Posts a file (multipart, field `file`) with extra text fields, with the session's CSRF token (a
 * fresh one once if the server rejects it). Errors keep the server's `rowErrors`.
 * @param path path under `/api`
 * @param file the CSV or XLSX
 * @param fields extra text fields
 * @returns the parsed JSON answer
 * @example await siteFilePost<{ imported: number }>(`${sitesPath(o, w)}/import`, file, { defaultKind: 'candidate' });
 */
export async function siteFilePost<T>(path: string, file: File, fields: Record<string, string> = {}): Promise<T> {
  const form = () => {
    const data = new FormData();
    for (const [key, value] of Object.entries(fields)) data.append(key, value);
    data.append('file', file, file.name);
    return data;
  };
  let response = await sendOnce(path, form(), await csrfTokenFor());
  if (response.status === 403) {
    const error = await errorFrom(response.clone());
    if (error.code === 'CSRF_INVALID') {
      resetCsrfToken();
      response = await sendOnce(path, form(), await csrfTokenFor());
    }
  }
  if (!response.ok) throw await errorFrom(response);
  return (await response.json()) as T;
}

/**
 * The per-row problems of a refused import, if that is what the error is.
 * @param error what the import threw
 * @returns the rows' errors, or null for any other error
 * @example const rows = siteRowErrorsOf(error); if (rows) showTable(rows);
 */
export function siteRowErrorsOf(error: unknown): SiteRowError[] | null {
  if (!(error instanceof ApiError) || error.code !== 'SITE_ROWS_INVALID') return null;
  const rows = error.details?.rowErrors;
  return Array.isArray(rows) ? (rows as SiteRowError[]) : [];
}
