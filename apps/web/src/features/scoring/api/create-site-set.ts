import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import type { ScoringRunJson, SiteSetJson } from '../types';
import { getScoringRunQueryOptions } from './get-scoring-run';
import { scoringRunsPath } from './get-scoring-runs';

export type SiteSetCreateBody = { siteIds: string[]; name?: string };

/**
 * Scores 2–20 candidates of a run opened together (they compete with each other too); the set is stored in the run.
 * @param orgId the organization
 * @param workspaceId the workspace
 * @param runId the run
 * @param body the candidates' site ids and an optional name
 * @returns the scored set
 * @example const set = await createSiteSet(orgId, wsId, runId, { siteIds: ['ste_1', 'ste_2'] });
 */
export async function createSiteSet(orgId: string, workspaceId: string, runId: string, body: SiteSetCreateBody): Promise<SiteSetJson> {
  const res = await api.post<{ set: SiteSetJson }>(`${scoringRunsPath(orgId, workspaceId)}/${runId}/sets`, body);
  return res.set;
}

/**
 * Mutation for createSiteSet; adds the set to the cached run and refetches the run.
 * @param orgId the organization
 * @param workspaceId the workspace
 * @param runId the run
 * @returns the mutation
 * @example useCreateSiteSet(orgId, wsId, runId).mutate({ siteIds })
 */
export function useCreateSiteSet(orgId: string, workspaceId: string, runId: string) {
  const queryClient = useQueryClient();
  const { queryKey } = getScoringRunQueryOptions(orgId, workspaceId, runId);
  return useMutation({
    meta: { errorsShownInline: true },
    mutationFn: (body: SiteSetCreateBody) => createSiteSet(orgId, workspaceId, runId, body),
    onSuccess: async (set) => {
      queryClient.setQueryData(queryKey, (run: ScoringRunJson | undefined) =>
        run && !run.sets.some((s) => s.id === set.id) ? { ...run, sets: [...run.sets, set] } : run,
      );
      await queryClient.invalidateQueries({ queryKey, exact: true });
    },
  });
}
