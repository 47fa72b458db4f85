import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import type { ScoringRunJson, ScoringRunSummaryJson } from '../../scoring/types';

/**
 * The API path of a workspace's scoring runs.
 * @param orgId the organization
 * @param workspaceId the workspace
 * @returns the path under `/api`
 * @example api.get(scoringRunsPath(orgId, workspaceId))
 */
export function scoringRunsPath(orgId: string, workspaceId: string): string {
  return `/organizations/${orgId}/workspaces/${workspaceId}/scoring-runs`;
}

// Under the scoring feature's run keys, so its refreshes (a new or deleted run) reach the builder too;
// the last part keeps these entries apart from the scoring step's own.
const runsKey = (orgId: string, workspaceId: string) => ['organizations', orgId, 'workspaces', workspaceId, 'scoring', 'runs'] as const;

/**
 * Query options for the workspace's scoring runs (newest first), for choosing the ranking a shortlist comes from.
 * @param orgId the organization
 * @param workspaceId the workspace
 * @returns options keyed `[…, 'scoring', 'runs', 'shortlist-choice']`
 * @example useQuery(getShortlistRunsQueryOptions(orgId, wsId))
 */
export function getShortlistRunsQueryOptions(orgId: string, workspaceId: string) {
  return queryOptions({
    queryKey: [...runsKey(orgId, workspaceId), 'shortlist-choice'],
    queryFn: async () => (await api.get<{ runs: ScoringRunSummaryJson[] }>(scoringRunsPath(orgId, workspaceId))).runs,
  });
}

/**
 * The workspace's scoring runs in a component.
 * @param orgId the organization
 * @param workspaceId the workspace
 * @returns the query result
 * @example const runs = useShortlistRuns(orgId, wsId).data ?? [];
 */
export function useShortlistRuns(orgId: string, workspaceId: string) {
  return useQuery(getShortlistRunsQueryOptions(orgId, workspaceId));
}

/**
 * One scoring run with its ranking, in a component; nothing is fetched while `runId` is empty.
 * @param orgId the organization
 * @param workspaceId the workspace
 * @param runId the run, or '' when none is chosen
 * @returns the query result
 * @example const run = useShortlistRun(orgId, wsId, runId).data;
 */
export function useShortlistRun(orgId: string, workspaceId: string, runId: string) {
  return useQuery({
    queryKey: [...runsKey(orgId, workspaceId), runId, 'shortlist-choice'],
    queryFn: async () => (await api.get<{ run: ScoringRunJson }>(`${scoringRunsPath(orgId, workspaceId)}/${runId}`)).run,
    enabled: runId !== '',
  });
}
