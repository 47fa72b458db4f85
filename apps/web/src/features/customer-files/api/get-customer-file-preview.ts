import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import type { CustomerFilePreview } from '../types';
import { customerFilesKey, customerFilesPath } from './get-customer-files';

/**
 * The mapping step's preview of an uploaded file (columns, first rows, detected columns).
 * @param orgId the organization
 * @param workspaceId the workspace
 * @param fileId the customer file
 * @returns the preview (409 RAW_FILE_DISCARDED once the file is imported)
 * @example const preview = await getCustomerFilePreview(orgId, workspaceId, fileId);
 */
export async function getCustomerFilePreview(orgId: string, workspaceId: string, fileId: string): Promise<CustomerFilePreview> {
  return api.get<CustomerFilePreview>(`${customerFilesPath(orgId, workspaceId)}/${fileId}/preview`);
}

/**
 * Query options for the preview; it never changes, so it is not refetched.
 * @param orgId the organization
 * @param workspaceId the workspace
 * @param fileId the customer file
 * @returns options keyed `[…, 'customer-files', fileId, 'preview']`
 * @example queryClient.setQueryData(getCustomerFilePreviewQueryOptions(o, w, f).queryKey, preview)
 */
export function getCustomerFilePreviewQueryOptions(orgId: string, workspaceId: string, fileId: string) {
  return queryOptions({
    queryKey: [...customerFilesKey(orgId, workspaceId), fileId, 'preview'],
    queryFn: () => getCustomerFilePreview(orgId, workspaceId, fileId),
    staleTime: Infinity,
  });
}

/**
 * The preview in a component.
 * @param orgId the organization
 * @param workspaceId the workspace
 * @param fileId the customer file
 * @returns the query result
 * @example const { data: preview } = useCustomerFilePreview(orgId, workspaceId, fileId);
 */
export function useCustomerFilePreview(orgId: string, workspaceId: string, fileId: string) {
  return useQuery(getCustomerFilePreviewQueryOptions(orgId, workspaceId, fileId));
}
