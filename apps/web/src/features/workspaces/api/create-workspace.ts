import { useMutation, useQueryClient } from '@tanstack/react-query';
import { z } from 'zod';
import { api } from '../../../lib/api-client';
import type { MutationConfig } from '../../../lib/react-query';
import type { Workspace } from '../../../types/api';

export const workspaceNameSchema = z
  .string()
  .trim()
  .min(1, 'Give the study a name, e.g. “North corridor 2027”.')
  .max(120, 'Use at most 120 characters.');

export const workspaceDescriptionSchema = z.string().trim().max(2000, 'Use at most 2,000 characters.');

export const createWorkspaceInputSchema = z.object({
  name: workspaceNameSchema,
  description: workspaceDescriptionSchema,
});

export type CreateWorkspaceInput = z.infer<typeof createWorkspaceInputSchema>;

/**
 * Creates a workspace in an organization.
 * @param orgId the organization
 * @param input name and description (an empty description is left out)
 * @returns the new workspace
 * @example await createWorkspace(orgId, { name: 'North corridor 2027', description: '' });
 */
export async function createWorkspace(orgId: string, input: CreateWorkspaceInput): Promise<Workspace> {
  const body = await api.post<{ workspace: Workspace }>(`/organizations/${orgId}/workspaces`, {
    name: input.name,
    ...(input.description ? { description: input.description } : {}),
  });
  return body.workspace;
}

/**
 * Mutation that creates a workspace and refreshes the organization's workspace list.
 * @param orgId the organization
 * @param config extra mutation options
 * @returns the mutation
 * @example useCreateWorkspace(orgId, { onSuccess: (ws) => navigate(paths.org.workspace.getHref(orgId, ws.id)) })
 */
export function useCreateWorkspace(orgId: string, config: MutationConfig<CreateWorkspaceInput, Workspace> = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    meta: { errorsShownInline: true },
    ...config,
    mutationFn: (input: CreateWorkspaceInput) => createWorkspace(orgId, input),
    onSuccess: async (...args) => {
      await queryClient.invalidateQueries({ queryKey: ['organizations', orgId, 'workspaces'] });
      await config.onSuccess?.(...args);
    },
  });
}
