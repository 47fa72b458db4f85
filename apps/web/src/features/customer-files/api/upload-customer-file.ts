import { useMutation, useQueryClient } from '@tanstack/react-query';
import { useState } from 'react';
import { env } from '../../../config/env';
import { csrfTokenFor, resetCsrfToken } from '../../../lib/api-client';
import { ApiError, isApiErrorBody } from '../../../lib/api-error';
import type { CustomerFile, CustomerFilePreview } from '../types';
import { customerFilesKey, customerFilesPath } from './get-customer-files';
import { getCustomerFilePreviewQueryOptions } from './get-customer-file-preview';

export type UploadResult = { customerFile: CustomerFile; preview: CustomerFilePreview };

/** Upload progress: bytes sent so far of the total. */
export type UploadProgress = { loaded: number; total: number };

function uploadUrl(orgId: string, workspaceId: string): string {
  const base = env.VITE_API_ORIGIN || globalThis.location?.origin || 'http://localhost';
  return new URL(`/api${customerFilesPath(orgId, workspaceId)}`, base).toString();
}

function errorFromXhr(xhr: XMLHttpRequest): ApiError {
  let parsed: unknown = null;
  try {
    parsed = xhr.responseText ? JSON.parse(xhr.responseText) : null;
  } catch {
    parsed = null;
  }
  if (isApiErrorBody(parsed)) {
    const { code, message, field, fields } = parsed.error;
    return new ApiError(xhr.status, code, message, field, fields);
  }
  if (xhr.status === 413) {
    return new ApiError(413, 'FILE_TOO_LARGE', 'The file is larger than the server accepts. Split it or keep only the needed columns.');
  }
  return new ApiError(xhr.status, 'HTTP_ERROR', `The server answered ${xhr.status} without an explanation. Try again in a moment.`);
}

function sendOnce(url: string, file: File, token: string, onProgress?: (p: UploadProgress) => void): Promise<UploadResult> {
  return new Promise((resolve, reject) => {
    const xhr = new XMLHttpRequest();
    xhr.open('POST', url);
    xhr.withCredentials = true;
    xhr.setRequestHeader('accept', 'application/json');
    xhr.setRequestHeader('x-csrf-token', token);
    xhr.upload.onprogress = (event) => {
      if (event.lengthComputable) onProgress?.({ loaded: event.loaded, total: event.total });
    };
    xhr.onload = () => {
      if (xhr.status >= 200 && xhr.status < 300) {
        try {
          resolve(JSON.parse(xhr.responseText) as UploadResult);
        } catch {
          reject(new ApiError(xhr.status, 'HTTP_ERROR', 'The server’s answer to the upload could not be read. Try again.'));
        }
      } else reject(errorFromXhr(xhr));
    };
    xhr.onerror = () =>
      reject(new ApiError(0, 'NETWORK_ERROR', 'The upload was interrupted: could not reach the Demandscape server. Check your connection and try again.'));
    const form = new FormData();
    form.append('file', file, file.name);
    xhr.send(form);
  });
}

/**
 * Uploads a customer file (multipart field `file`) with progress events, sending the CSRF token and
 * retrying once with a fresh token when the server rejects it.
 * @param orgId the organization
 * @param workspaceId the workspace
 * @param file a CSV or XLSX file
 * @param onProgress called as bytes go out
 * @returns the new file (awaiting mapping) and its preview
 * @example const { customerFile, preview } = await uploadCustomerFile(orgId, wsId, file, (p) => setSent(p.loaded));
 */
export async function uploadCustomerFile(
  orgId: string,
  workspaceId: string,
  file: File,
  onProgress?: (p: UploadProgress) => void,
): Promise<UploadResult> {
  const url = uploadUrl(orgId, workspaceId);
  try {
    return await sendOnce(url, file, await csrfTokenFor(), onProgress);
  } catch (error) {
    if (!(error instanceof ApiError && error.code === 'CSRF_INVALID')) throw error;
    resetCsrfToken();
    return sendOnce(url, file, await csrfTokenFor(), onProgress);
  }
}

/**
 * Mutation that uploads a customer file, tracks its progress, seeds the preview cache and refreshes the list.
 * @param orgId the organization
 * @param workspaceId the workspace
 * @returns the mutation plus `progress` (null before the first byte is reported)
 * @example const upload = useUploadCustomerFile(orgId, wsId); upload.mutate(file);
 */
export function useUploadCustomerFile(orgId: string, workspaceId: string) {
  const queryClient = useQueryClient();
  const [progress, setProgress] = useState<UploadProgress | null>(null);
  const mutation = useMutation({
    meta: { errorsShownInline: true },
    mutationFn: (file: File) => {
      setProgress(null);
      return uploadCustomerFile(orgId, workspaceId, file, setProgress);
    },
    onSuccess: async ({ customerFile, preview }) => {
      queryClient.setQueryData(getCustomerFilePreviewQueryOptions(orgId, workspaceId, customerFile.id).queryKey, preview);
      await queryClient.invalidateQueries({ queryKey: customerFilesKey(orgId, workspaceId), exact: true });
    },
  });
  return { ...mutation, progress };
}
