import { useMutation, useQueryClient } from '@tanstack/react-query';
import { z } from 'zod';
import { api } from '../../../lib/api-client';
import type { MutationConfig } from '../../../lib/react-query';
import type { ShortlistRecipient, ShortlistShareBody } from '../types';
import { shortlistsPath } from './get-shortlists';
import { shortlistsRefresh } from './refresh-shortlists';

export const shareShortlistSchema = z.object({
  message: z.string().trim().max(1000, 'Keep the message under 1,000 characters.'),
});

export type ShareShortlistInput = z.infer<typeof shareShortlistSchema>;

/**
 * Shares a shortlist: every executive of the organization (or the users given) gets an e-mail with a link to its page.
 * @param orgId the organization
 * @param workspaceId the workspace
 * @param shortlistId the shortlist
 * @param body optional message and recipients
 * @returns who received it, and when
 * @example const sent = await shareShortlist(orgId, wsId, id, { message: 'For Thursday' });
 */
export async function shareShortlist(orgId: string, workspaceId: string, shortlistId: string, body: ShortlistShareBody): Promise<ShortlistRecipient[]> {
  const res = await api.post<{ sharedWith: ShortlistRecipient[] }>(`${shortlistsPath(orgId, workspaceId)}/${shortlistId}/share`, body);
  return res.sharedWith;
}

/**
 * Mutation that shares a shortlist and refreshes it (its "shared with" list and shared date).
 * @param orgId the organization
 * @param workspaceId the workspace
 * @param shortlistId the shortlist
 * @param config extra mutation options
 * @returns the mutation
 * @example useShareShortlist(orgId, wsId, id).mutate({ message })
 */
export function useShareShortlist(orgId: string, workspaceId: string, shortlistId: string, config: MutationConfig<ShortlistShareBody, ShortlistRecipient[]> = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    meta: { errorsShownInline: true },
    ...config,
    mutationFn: (body: ShortlistShareBody) => shareShortlist(orgId, workspaceId, shortlistId, body),
    onSuccess: async (...args) => {
      await shortlistsRefresh(queryClient, orgId, workspaceId);
      await config.onSuccess?.(...args);
    },
  });
}
