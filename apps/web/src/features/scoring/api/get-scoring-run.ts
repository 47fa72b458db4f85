import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import type { ScoringRunJson } from '../types';
import { scoringRunsKey, scoringRunsPath } from './get-scoring-runs';

/** How often a run (or its stability check) is polled while it works, in milliseconds. */
export const SCORING_POLL_MS = 1000;

/**
 * Whether a run may still change on its own: queued or running, or its rank-stability check running.
 * @param run the run
 * @returns true while it is worth polling
 * @example scoringRunIsActive({ status: 'succeeded', stability: { status: 'running' } } as ScoringRunJson) // true
 */
export function scoringRunIsActive(run: Pick<ScoringRunJson, 'status' | 'stability'> | undefined): boolean {
  if (!run) return false;
  return run.status === 'queued' || run.status === 'running' || run.stability?.status === 'running';
}

/**
 * One scoring run with its ranking, stability check and candidate sets.
 * @param orgId the organization
 * @param workspaceId the workspace
 * @param runId the run
 * @returns the run
 * @example const run = await getScoringRun(orgId, wsId, runId);
 */
export async function getScoringRun(orgId: string, workspaceId: string, runId: string): Promise<ScoringRunJson> {
  const body = await api.get<{ run: ScoringRunJson }>(`${scoringRunsPath(orgId, workspaceId)}/${runId}`);
  return body.run;
}

/**
 * Query options for one run; polls every second while it (or its stability check) is working.
 * @param orgId the organization
 * @param workspaceId the workspace
 * @param runId the run
 * @returns options keyed `[…, 'scoring', 'runs', runId]`
 * @example useQuery(getScoringRunQueryOptions(orgId, wsId, runId))
 */
export function getScoringRunQueryOptions(orgId: string, workspaceId: string, runId: string) {
  return queryOptions({
    queryKey: [...scoringRunsKey(orgId, workspaceId), runId],
    queryFn: () => getScoringRun(orgId, workspaceId, runId),
    refetchInterval: (query) => (scoringRunIsActive(query.state.data) ? SCORING_POLL_MS : false),
  });
}

/**
 * One run in a component, polled while it works.
 * @param orgId the organization
 * @param workspaceId the workspace
 * @param runId the run, or null when none is chosen
 * @returns the query result
 * @example const { data: run } = useScoringRun(orgId, wsId, runId);
 */
export function useScoringRun(orgId: string, workspaceId: string, runId: string | null) {
  return useQuery({ ...getScoringRunQueryOptions(orgId, workspaceId, runId ?? ''), enabled: runId !== null });
}
