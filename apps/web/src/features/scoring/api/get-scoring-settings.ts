import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import type { ScoringSettingsJson } from '../types';
import { scoringKey, workspacePath } from './get-scoring-runs';

/**
 * The workspace's scoring settings (the defaults until a planner saves them).
 * @param orgId the organization
 * @param workspaceId the workspace
 * @returns the settings
 * @example const s = await getScoringSettings(orgId, wsId);
 */
export async function getScoringSettings(orgId: string, workspaceId: string): Promise<ScoringSettingsJson> {
  const body = await api.get<{ settings: ScoringSettingsJson }>(`${workspacePath(orgId, workspaceId)}/scoring-settings`);
  return body.settings;
}

/**
 * Query options for the settings.
 * @param orgId the organization
 * @param workspaceId the workspace
 * @returns options keyed `[…, 'scoring', 'settings']`
 * @example queryClient.prefetchQuery(getScoringSettingsQueryOptions(orgId, wsId))
 */
export function getScoringSettingsQueryOptions(orgId: string, workspaceId: string) {
  return queryOptions({
    queryKey: [...scoringKey(orgId, workspaceId), 'settings'],
    queryFn: () => getScoringSettings(orgId, workspaceId),
  });
}

/**
 * The settings in a component.
 * @param orgId the organization
 * @param workspaceId the workspace
 * @returns the query result
 * @example const { data: settings } = useScoringSettings(orgId, wsId);
 */
export function useScoringSettings(orgId: string, workspaceId: string) {
  return useQuery(getScoringSettingsQueryOptions(orgId, workspaceId));
}
