import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import type { MutationConfig } from '../../../lib/react-query';
import type { ScoringRunJson } from '../types';
import { getScoringRunQueryOptions } from './get-scoring-run';
import { scoringRunsKey, scoringRunsPath } from './get-scoring-runs';

export type ScoringRunCreateBody = { surfaceId: string; name?: string };

/**
 * Queues a scoring run of every candidate against a finished surface, with the saved settings and a
 * snapshot of the workspace's sites (409 SURFACE_NOT_READY, 400 NO_CANDIDATES otherwise).
 * @param orgId the organization
 * @param workspaceId the workspace
 * @param body the surface and an optional name
 * @returns the queued run
 * @example const run = await createScoringRun(orgId, wsId, { surfaceId });
 */
export async function createScoringRun(orgId: string, workspaceId: string, body: ScoringRunCreateBody): Promise<ScoringRunJson> {
  const res = await api.post<{ run: ScoringRunJson }>(scoringRunsPath(orgId, workspaceId), body);
  return res.run;
}

/**
 * Mutation that queues a run, caches it (so polling starts at once) and refreshes the list.
 * @param orgId the organization
 * @param workspaceId the workspace
 * @param config extra mutation options
 * @returns the mutation
 * @example useCreateScoringRun(orgId, wsId, { onSuccess: (r) => choose(r.id) }).mutate({ surfaceId })
 */
export function useCreateScoringRun(orgId: string, workspaceId: string, config: MutationConfig<ScoringRunCreateBody, ScoringRunJson> = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    meta: { errorsShownInline: true },
    ...config,
    mutationFn: (body: ScoringRunCreateBody) => createScoringRun(orgId, workspaceId, body),
    onSuccess: async (...args) => {
      queryClient.setQueryData(getScoringRunQueryOptions(orgId, workspaceId, args[0].id).queryKey, args[0]);
      await queryClient.invalidateQueries({ queryKey: scoringRunsKey(orgId, workspaceId), exact: true });
      await config.onSuccess?.(...args);
    },
  });
}
