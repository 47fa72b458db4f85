import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import type { Site, SiteInput } from '../types';
import { sitesKey, sitesPath } from './get-sites';

/** What an edit sends: any fields of a site; a move sends lon and lat together. */
export type SiteUpdate = { siteId: string; changes: Partial<SiteInput> };

/**
 * Edits or moves a site.
 * @param orgId the organization
 * @param workspaceId the workspace
 * @param update the site and the fields to change
 * @returns the updated site
 * @example await updateSite(orgId, wsId, { siteId, changes: { lon: -38.49, lat: 44.53 } });
 */
export async function updateSite(orgId: string, workspaceId: string, { siteId, changes }: SiteUpdate): Promise<Site> {
  const body = await api.patch<{ site: Site }>(`${sitesPath(orgId, workspaceId)}/${siteId}`, changes);
  return body.site;
}

/**
 * Mutation that edits or moves a site. The list changes at once (a dragged site stays where it was
 * dropped) and goes back if the server refuses.
 * @param orgId the organization
 * @param workspaceId the workspace
 * @param options `inline: true` when the caller's form shows the error itself (otherwise a notification)
 * @returns the mutation
 * @example useUpdateSite(orgId, wsId).mutate({ siteId, changes: { lon, lat } })
 */
export function useUpdateSite(orgId: string, workspaceId: string, options: { inline?: boolean } = {}) {
  const queryClient = useQueryClient();
  const key = sitesKey(orgId, workspaceId);
  return useMutation({
    meta: { errorsShownInline: options.inline ?? false },
    mutationFn: (update: SiteUpdate) => updateSite(orgId, workspaceId, update),
    onMutate: async ({ siteId, changes }) => {
      await queryClient.cancelQueries({ queryKey: key });
      const before = queryClient.getQueryData<Site[]>(key);
      queryClient.setQueryData<Site[]>(key, (sites) => sites?.map((s) => (s.id === siteId ? { ...s, ...changes } : s)));
      return { before };
    },
    onError: (_error, _update, context) => {
      if (context?.before) queryClient.setQueryData(key, context.before);
    },
    onSettled: () => queryClient.invalidateQueries({ queryKey: key }),
  });
}
