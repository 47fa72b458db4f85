import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import type { CustomerFile } from '../types';
import { customerFilesKey, customerFilesPath } from './get-customer-files';

/** How often an importing file is polled, in milliseconds. */
export const CUSTOMER_FILE_POLL_MS = 1000;

/**
 * One customer file with its validation report.
 * @param orgId the organization
 * @param workspaceId the workspace
 * @param fileId the customer file
 * @returns the file
 * @example const file = await getCustomerFile(orgId, workspaceId, fileId);
 */
export async function getCustomerFile(orgId: string, workspaceId: string, fileId: string): Promise<CustomerFile> {
  const body = await api.get<{ customerFile: CustomerFile }>(`${customerFilesPath(orgId, workspaceId)}/${fileId}`);
  return body.customerFile;
}

/**
 * Query options for one file; polls while it is importing and stops at `imported` or `failed`.
 * @param orgId the organization
 * @param workspaceId the workspace
 * @param fileId the customer file
 * @returns options keyed `[…, 'customer-files', fileId]`
 * @example useQuery(getCustomerFileQueryOptions(orgId, workspaceId, fileId))
 */
export function getCustomerFileQueryOptions(orgId: string, workspaceId: string, fileId: string) {
  return queryOptions({
    queryKey: [...customerFilesKey(orgId, workspaceId), fileId],
    queryFn: () => getCustomerFile(orgId, workspaceId, fileId),
    refetchInterval: (query) => (query.state.data?.status === 'importing' ? CUSTOMER_FILE_POLL_MS : false),
  });
}

/**
 * One customer file in a component (polling while it imports).
 * @param orgId the organization
 * @param workspaceId the workspace
 * @param fileId the customer file
 * @returns the query result
 * @example const { data: file } = useCustomerFile(orgId, workspaceId, fileId);
 */
export function useCustomerFile(orgId: string, workspaceId: string, fileId: string) {
  return useQuery(getCustomerFileQueryOptions(orgId, workspaceId, fileId));
}
