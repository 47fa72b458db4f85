import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import type { CustomerFile } from '../types';

/**
 * The query key every customer-file query of a workspace starts with.
 * @param orgId the organization
 * @param workspaceId the workspace
 * @returns the key prefix
 * @example queryClient.invalidateQueries({ queryKey: customerFilesKey(orgId, workspaceId) })
 */
export function customerFilesKey(orgId: string, workspaceId: string) {
  return ['organizations', orgId, 'workspaces', workspaceId, 'customer-files'] as const;
}

/**
 * The API path of a workspace's customer files.
 * @param orgId the organization
 * @param workspaceId the workspace
 * @returns the path under `/api`
 * @example api.get(customerFilesPath(orgId, workspaceId))
 */
export function customerFilesPath(orgId: string, workspaceId: string): string {
  return `/organizations/${orgId}/workspaces/${workspaceId}/customer-files`;
}

/**
 * A workspace's customer files, newest first.
 * @param orgId the organization
 * @param workspaceId the workspace
 * @returns the files (metadata and report counts; never points)
 * @example const files = await getCustomerFiles(orgId, workspaceId);
 */
export async function getCustomerFiles(orgId: string, workspaceId: string): Promise<CustomerFile[]> {
  const body = await api.get<{ customerFiles: CustomerFile[] }>(customerFilesPath(orgId, workspaceId));
  return body.customerFiles;
}

/**
 * Query options for the list; it refreshes every 2 s while a file is importing.
 * @param orgId the organization
 * @param workspaceId the workspace
 * @returns options keyed `[…, 'customer-files']`
 * @example queryClient.prefetchQuery(getCustomerFilesQueryOptions(orgId, workspaceId))
 */
export function getCustomerFilesQueryOptions(orgId: string, workspaceId: string) {
  return queryOptions({
    queryKey: customerFilesKey(orgId, workspaceId),
    queryFn: () => getCustomerFiles(orgId, workspaceId),
    refetchInterval: (query) => (query.state.data?.some((f) => f.status === 'importing') ? 2000 : false),
  });
}

/**
 * The customer-file list in a component.
 * @param orgId the organization
 * @param workspaceId the workspace
 * @returns the query result
 * @example const { data: files } = useCustomerFiles(orgId, workspaceId);
 */
export function useCustomerFiles(orgId: string, workspaceId: string) {
  return useQuery(getCustomerFilesQueryOptions(orgId, workspaceId));
}
