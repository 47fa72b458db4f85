import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { scoringRunsKey, scoringRunsPath } from './get-scoring-runs';

/**
 * Deletes a scoring run with its ranking, stability check and candidate sets.
 * @param orgId the organization
 * @param workspaceId the workspace
 * @param runId the run
 * @returns nothing
 * @example await deleteScoringRun(orgId, wsId, runId);
 */
export async function deleteScoringRun(orgId: string, workspaceId: string, runId: string): Promise<void> {
  await api.delete(`${scoringRunsPath(orgId, workspaceId)}/${runId}`);
}

/**
 * Mutation that deletes a run, drops its cached copy and refreshes the list.
 * @param orgId the organization
 * @param workspaceId the workspace
 * @returns the mutation (variable: the run id)
 * @example useDeleteScoringRun(orgId, wsId).mutate(runId)
 */
export function useDeleteScoringRun(orgId: string, workspaceId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (runId: string) => deleteScoringRun(orgId, workspaceId, runId),
    onSuccess: async (_data, runId) => {
      queryClient.removeQueries({ queryKey: [...scoringRunsKey(orgId, workspaceId), runId] });
      await queryClient.invalidateQueries({ queryKey: scoringRunsKey(orgId, workspaceId), exact: true });
    },
  });
}
