import { useMutation } from '@tanstack/react-query';
import type { SiteImportPreview } from '../types';
import { sitesPath } from './get-sites';
import { siteFilePost } from './site-file-post';

/**
 * Reads an import file's columns and first rows, with the server's guess of which column is which.
 * @param orgId the organization
 * @param workspaceId the workspace
 * @param file a CSV or XLSX file (≤ 2 MB)
 * @returns the preview
 * @example const preview = await previewSiteImport(orgId, wsId, file);
 */
export async function previewSiteImport(orgId: string, workspaceId: string, file: File): Promise<SiteImportPreview> {
  return siteFilePost<SiteImportPreview>(`${sitesPath(orgId, workspaceId)}/import/preview`, file);
}

/**
 * Mutation that previews an import file (errors are shown in the dialog).
 * @param orgId the organization
 * @param workspaceId the workspace
 * @returns the mutation (variable: the file)
 * @example usePreviewSiteImport(orgId, wsId).mutate(file)
 */
export function usePreviewSiteImport(orgId: string, workspaceId: string) {
  return useMutation({ meta: { errorsShownInline: true }, mutationFn: (file: File) => previewSiteImport(orgId, workspaceId, file) });
}
