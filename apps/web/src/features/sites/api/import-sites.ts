import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { SiteColumnMapping, SiteKind } from '../types';
import { sitesKey, sitesPath } from './get-sites';
import { siteFilePost } from './site-file-post';

/** An import: the file, which column holds what, and the values for fields without a column. */
export type SiteImportInput = { file: File; mapping: SiteColumnMapping; defaultKind: SiteKind; defaultAttractiveness: number | null };

/**
 * Imports every site of a file or none (400 SITE_ROWS_INVALID lists each bad row).
 * @param orgId the organization
 * @param workspaceId the workspace
 * @param input file, mapping and defaults
 * @returns how many sites were added
 * @example await importSites(orgId, wsId, { file, mapping, defaultKind: 'candidate', defaultAttractiveness: 100 });
 */
export async function importSites(orgId: string, workspaceId: string, input: SiteImportInput): Promise<{ imported: number }> {
  const fields: Record<string, string> = { mapping: JSON.stringify(input.mapping), defaultKind: input.defaultKind };
  if (input.defaultAttractiveness !== null) fields.defaultAttractiveness = String(input.defaultAttractiveness);
  return siteFilePost<{ imported: number }>(`${sitesPath(orgId, workspaceId)}/import`, input.file, fields);
}

/**
 * Mutation that imports a file and refreshes the site list (errors are shown in the dialog).
 * @param orgId the organization
 * @param workspaceId the workspace
 * @returns the mutation
 * @example useImportSites(orgId, wsId).mutate({ file, mapping, defaultKind, defaultAttractiveness })
 */
export function useImportSites(orgId: string, workspaceId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    meta: { errorsShownInline: true },
    mutationFn: (input: SiteImportInput) => importSites(orgId, workspaceId, input),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: sitesKey(orgId, workspaceId) }),
  });
}
