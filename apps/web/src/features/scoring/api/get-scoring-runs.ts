import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import type { ScoringRunSummaryJson } from '../types';

/**
 * The query key every scoring query of a workspace starts with.
 * @param orgId the organization
 * @param workspaceId the workspace
 * @returns the key prefix
 * @example queryClient.invalidateQueries({ queryKey: scoringKey(orgId, workspaceId) })
 */
export function scoringKey(orgId: string, workspaceId: string) {
  return ['organizations', orgId, 'workspaces', workspaceId, 'scoring'] as const;
}

/**
 * The query key of the run list (and, with an id after it, of one run).
 * @param orgId the organization
 * @param workspaceId the workspace
 * @returns the key
 * @example queryClient.invalidateQueries({ queryKey: scoringRunsKey(orgId, wsId), exact: true })
 */
export function scoringRunsKey(orgId: string, workspaceId: string) {
  return [...scoringKey(orgId, workspaceId), 'runs'] as const;
}

/**
 * The API path of a workspace (scoring routes hang below it).
 * @param orgId the organization
 * @param workspaceId the workspace
 * @returns the path under `/api`
 * @example api.get(`${workspacePath(orgId, wsId)}/scoring-runs`)
 */
export function workspacePath(orgId: string, workspaceId: string): string {
  return `/organizations/${orgId}/workspaces/${workspaceId}`;
}

/**
 * The API path of a workspace's scoring runs.
 * @param orgId the organization
 * @param workspaceId the workspace
 * @returns the path under `/api`
 * @example api.get(scoringRunsPath(orgId, workspaceId))
 */
export function scoringRunsPath(orgId: string, workspaceId: string): string {
  return `${workspacePath(orgId, workspaceId)}/scoring-runs`;
}

/**
 * A workspace's scoring runs, newest first (no results).
 * @param orgId the organization
 * @param workspaceId the workspace
 * @returns the run summaries
 * @example const runs = await getScoringRuns(orgId, workspaceId);
 */
export async function getScoringRuns(orgId: string, workspaceId: string): Promise<ScoringRunSummaryJson[]> {
  const body = await api.get<{ runs: ScoringRunSummaryJson[] }>(scoringRunsPath(orgId, workspaceId));
  return body.runs;
}

/**
 * Query options for the run list.
 * @param orgId the organization
 * @param workspaceId the workspace
 * @returns options keyed `[…, 'scoring', 'runs']`
 * @example queryClient.prefetchQuery(getScoringRunsQueryOptions(orgId, workspaceId))
 */
export function getScoringRunsQueryOptions(orgId: string, workspaceId: string) {
  return queryOptions({ queryKey: scoringRunsKey(orgId, workspaceId), queryFn: () => getScoringRuns(orgId, workspaceId) });
}

/**
 * The run list in a component.
 * @param orgId the organization
 * @param workspaceId the workspace
 * @returns the query result
 * @example const { data: runs } = useScoringRuns(orgId, workspaceId);
 */
export function useScoringRuns(orgId: string, workspaceId: string) {
  return useQuery(getScoringRunsQueryOptions(orgId, workspaceId));
}
