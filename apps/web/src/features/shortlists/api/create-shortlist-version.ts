import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import type { MutationConfig } from '../../../lib/react-query';
import type { Shortlist, ShortlistVersionBody } from '../types';
import { shortlistsPath } from './get-shortlists';
import { shortlistsRefresh } from './refresh-shortlists';

/**
 * Saves the edited sites, order and notes as the shortlist's new latest version (older versions stay readable).
 * @param orgId the organization
 * @param workspaceId the workspace
 * @param shortlistId the shortlist
 * @param body run, ordered items with notes, optional version note
 * @returns the shortlist at its new version
 * @example await createShortlistVersion(orgId, wsId, id, { scoringRunId: 'run_1', items: [{ siteId: 's2' }] });
 */
export async function createShortlistVersion(orgId: string, workspaceId: string, shortlistId: string, body: ShortlistVersionBody): Promise<Shortlist> {
  const res = await api.post<{ shortlist: Shortlist }>(`${shortlistsPath(orgId, workspaceId)}/${shortlistId}/versions`, body);
  return res.shortlist;
}

/**
 * Mutation that saves a new version and refreshes the shortlist's cached versions and the lists.
 * @param orgId the organization
 * @param workspaceId the workspace
 * @param shortlistId the shortlist
 * @param config extra mutation options
 * @returns the mutation
 * @example useCreateShortlistVersion(orgId, wsId, id).mutate(body)
 */
export function useCreateShortlistVersion(
  orgId: string,
  workspaceId: string,
  shortlistId: string,
  config: MutationConfig<ShortlistVersionBody, Shortlist> = {},
) {
  const queryClient = useQueryClient();
  return useMutation({
    meta: { errorsShownInline: true },
    ...config,
    mutationFn: (body: ShortlistVersionBody) => createShortlistVersion(orgId, workspaceId, shortlistId, body),
    onSuccess: async (...args) => {
      await shortlistsRefresh(queryClient, orgId, workspaceId);
      await config.onSuccess?.(...args);
    },
  });
}
