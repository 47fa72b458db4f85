import { useMutation, useQueryClient } from '@tanstack/react-query';
import { z } from 'zod';
import { api } from '../../../lib/api-client';
import type { MutationConfig } from '../../../lib/react-query';
import type { ShortlistRecipient, ShortlistShareBody } from '../types';
import { shortlistsPath } from './get-shortlists';
import { shortlistsRefresh } from './refresh-shortlists';

export const shareShortlistSchema = z.object({
  message: z.string().trim().max(2000, 'Keep the message under 2,000 characters.'),
});

export type ShareShortlistInput = z.infer<typeof shareShortlistSchema>;

/** The answer to a share: everyone the shortlist has been shared with so far (with when), and whom the mail did not reach. */
export type ShareShortlistResult = { sharedWith: ShortlistRecipient[]; failed?: Array<{ userId: string; name: string }> };

/**
 * Shares a shortlist: every executive of the organization (or the users given) gets an e-mail with a link to its page.
 * @param orgId the organization
 * @param workspaceId the workspace
 * @param shortlistId the shortlist
 * @param body optional message and recipients
 * @returns who has received it and when (this send and earlier ones), and whom the e-mail did not reach
 * @example const { sharedWith } = await shareShortlist(orgId, wsId, id, { message: 'For Thursday' });
 */
export async function shareShortlist(orgId: string, workspaceId: string, shortlistId: string, body: ShortlistShareBody): Promise<ShareShortlistResult> {
  return api.post<ShareShortlistResult>(`${shortlistsPath(orgId, workspaceId)}/${shortlistId}/share`, body);
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
export function useShareShortlist(orgId: string, workspaceId: string, shortlistId: string, config: MutationConfig<ShortlistShareBody, ShareShortlistResult> = {}) {
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
