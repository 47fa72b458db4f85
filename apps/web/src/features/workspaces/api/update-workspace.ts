import { useMutation, useQueryClient } from '@tanstack/react-query';
import { z } from 'zod';
import { api } from '../../../lib/api-client';
import type { MutationConfig } from '../../../lib/react-query';
import type { Workspace } from '../../../types/api';
import { workspaceDescriptionSchema, workspaceNameSchema } from './create-workspace';

export const updateWorkspaceInputSchema = z.object({
  name: workspaceNameSchema,
  description: workspaceDescriptionSchema,
});

export type UpdateWorkspaceInput = z.infer<typeof updateWorkspaceInputSchema>;

/**
 * Renames a workspace or changes its description.
 * @param orgId the organization
 * @param workspaceId the workspace
 * @param input the new name and description
 * @returns the updated workspace
 * @example await updateWorkspace(orgId, id, { name: 'North corridor 2028', description: '' });
 */
export async function updateWorkspace(orgId: string, workspaceId: string, input: UpdateWorkspaceInput): Promise<Workspace> {
  const body = await api.patch<{ workspace: Workspace }>(`/organizations/${orgId}/workspaces/${workspaceId}`, input);
  return body.workspace;
}

/**
 * Mutation that updates a workspace and refreshes it and the list.
 * @param orgId the organization
 * @param workspaceId the workspace
 * @param config extra mutation options
 * @returns the mutation
 * @example useUpdateWorkspace(orgId, id).mutate({ name, description })
 */
export function useUpdateWorkspace(orgId: string, workspaceId: string, config: MutationConfig<UpdateWorkspaceInput, Workspace> = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    meta: { errorsShownInline: true },
    ...config,
    mutationFn: (input: UpdateWorkspaceInput) => updateWorkspace(orgId, workspaceId, input),
    onSuccess: async (...args) => {
      await queryClient.invalidateQueries({ queryKey: ['organizations', orgId, 'workspaces'] });
      await config.onSuccess?.(...args);
    },
  });
}
