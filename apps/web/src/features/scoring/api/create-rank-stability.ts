import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import type { ScoringRunJson } from '../types';
import { getScoringRunQueryOptions } from './get-scoring-run';
import { scoringRunsPath } from './get-scoring-runs';

/**
 * Starts the rank-stability check of a finished run: the server rescores on surfaces at 0.5×, 0.75×,
 * 1.5× and 2× the bandwidth and compares the rankings.
 * @param orgId the organization
 * @param workspaceId the workspace
 * @param runId the run
 * @returns the run with `stability.status = 'running'`
 * @example const run = await createRankStability(orgId, wsId, runId);
 */
export async function createRankStability(orgId: string, workspaceId: string, runId: string): Promise<ScoringRunJson> {
  const res = await api.post<{ run: ScoringRunJson }>(`${scoringRunsPath(orgId, workspaceId)}/${runId}/stability`, {});
  return res.run;
}

/**
 * Mutation for createRankStability; caches the returned run so polling starts at once.
 * @param orgId the organization
 * @param workspaceId the workspace
 * @returns the mutation (variable: the run id)
 * @example useCreateRankStability(orgId, wsId).mutate(runId)
 */
export function useCreateRankStability(orgId: string, workspaceId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    meta: { errorsShownInline: true },
    mutationFn: (runId: string) => createRankStability(orgId, workspaceId, runId),
    onSuccess: (run) => {
      queryClient.setQueryData(getScoringRunQueryOptions(orgId, workspaceId, run.id).queryKey, run);
    },
  });
}
