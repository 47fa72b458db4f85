import { apiRequest } from '../../../lib/api-client';
import { ApiError } from '../../../lib/api-error';
import type { SiteRowError } from '../types';

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
  const form = new FormData();
  for (const [key, value] of Object.entries(fields)) form.append(key, value);
  form.append('file', file, file.name);
  try {
    return await apiRequest<T>('POST', path, { body: form });
  } catch (error) {
    // A proxy in front of the server may refuse a large body without the server's explanation.
    if (error instanceof ApiError && error.status === 413 && error.code === 'HTTP_ERROR') {
      throw new ApiError(413, 'FILE_TOO_LARGE', 'The file is larger than 2 MB. Split it into files of at most 5,000 sites.', 'file');
    }
    throw error;
  }
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
