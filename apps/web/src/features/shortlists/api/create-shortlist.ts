import { useMutation, useQueryClient } from '@tanstack/react-query';
import { z } from 'zod';
import { api } from '../../../lib/api-client';
import type { MutationConfig } from '../../../lib/react-query';
import type { Shortlist, ShortlistCreateBody } from '../types';
import { shortlistsPath } from './get-shortlists';
import { shortlistsRefresh } from './refresh-shortlists';

/** Most sites one shortlist version holds (contract: 1–50 candidates of the run). */
export const SHORTLIST_MAX_ITEMS = 50;

/** A shortlist draft as the builder holds it, checked before it is sent. */
export const shortlistDraftSchema = z.object({
  name: z.string().trim().min(1, 'Give the shortlist a name, e.g. “Harbour candidates for the board”.').max(120, 'Use at most 120 characters for the name.'),
  scoringRunId: z.string().min(1, 'Choose the scoring run whose ranking the shortlist comes from.'),
  items: z
    .array(z.object({ siteId: z.string().min(1), note: z.string().max(2000, 'Keep each note under 2,000 characters.') }))
    .min(1, 'Choose at least one site from the ranking.')
    .max(SHORTLIST_MAX_ITEMS, `A shortlist holds at most ${SHORTLIST_MAX_ITEMS} sites; leave some out.`),
  versionNote: z.string().trim().max(500, 'Keep the version note under 500 characters.'),
});

export type ShortlistDraft = z.infer<typeof shortlistDraftSchema>;

/**
 * Saves a new shortlist (its version 1) from a finished scoring run.
 * @param orgId the organization
 * @param workspaceId the workspace
 * @param body name, run, ordered items with notes, optional version note
 * @returns the new shortlist
 * @example const s = await createShortlist(orgId, wsId, { name: 'Board list', scoringRunId: 'run_1', items: [{ siteId: 's1' }] });
 */
export async function createShortlist(orgId: string, workspaceId: string, body: ShortlistCreateBody): Promise<Shortlist> {
  const res = await api.post<{ shortlist: Shortlist }>(shortlistsPath(orgId, workspaceId), body);
  return res.shortlist;
}

/**
 * Mutation that creates a shortlist and refreshes the lists.
 * @param orgId the organization
 * @param workspaceId the workspace
 * @param config extra mutation options
 * @returns the mutation
 * @example useCreateShortlist(orgId, wsId, { onSuccess: (s) => open(s.id) }).mutate(body)
 */
export function useCreateShortlist(orgId: string, workspaceId: string, config: MutationConfig<ShortlistCreateBody, Shortlist> = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    meta: { errorsShownInline: true },
    ...config,
    mutationFn: (body: ShortlistCreateBody) => createShortlist(orgId, workspaceId, body),
    onSuccess: async (...args) => {
      await shortlistsRefresh(queryClient, orgId, workspaceId);
      await config.onSuccess?.(...args);
    },
  });
}
