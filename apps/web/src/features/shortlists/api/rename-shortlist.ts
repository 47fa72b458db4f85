import { useMutation, useQueryClient } from '@tanstack/react-query';
import { z } from 'zod';
import { api } from '../../../lib/api-client';
import type { MutationConfig } from '../../../lib/react-query';
import type { Shortlist } from '../types';
import { shortlistsPath } from './get-shortlists';
import { shortlistsRefresh } from './refresh-shortlists';

export const renameShortlistSchema = z.object({
  name: z.string().trim().min(1, 'Give the shortlist a name.').max(120, 'Use at most 120 characters for the name.'),
});

export type RenameShortlistInput = z.infer<typeof renameShortlistSchema>;

/**
 * Renames a shortlist (all its versions keep the new name).
 * @param orgId the organization
 * @param workspaceId the workspace
 * @param shortlistId the shortlist
 * @param input the new name
 * @returns the renamed shortlist
 * @example await renameShortlist(orgId, wsId, id, { name: 'Board list, March' });
 */
export async function renameShortlist(orgId: string, workspaceId: string, shortlistId: string, input: RenameShortlistInput): Promise<Shortlist> {
  const res = await api.patch<{ shortlist: Shortlist }>(`${shortlistsPath(orgId, workspaceId)}/${shortlistId}`, input);
  return res.shortlist;
}

/**
 * Mutation that renames a shortlist and refreshes the lists.
 * @param orgId the organization
 * @param workspaceId the workspace
 * @param shortlistId the shortlist
 * @param config extra mutation options
 * @returns the mutation
 * @example useRenameShortlist(orgId, wsId, id).mutate({ name })
 */
export function useRenameShortlist(orgId: string, workspaceId: string, shortlistId: string, config: MutationConfig<RenameShortlistInput, Shortlist> = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    meta: { errorsShownInline: true },
    ...config,
    mutationFn: (input: RenameShortlistInput) => renameShortlist(orgId, workspaceId, shortlistId, input),
    onSuccess: async (...args) => {
      await shortlistsRefresh(queryClient, orgId, workspaceId);
      await config.onSuccess?.(...args);
    },
  });
}
