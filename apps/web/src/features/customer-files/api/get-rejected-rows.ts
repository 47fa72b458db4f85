import { env } from '../../../config/env';
import { customerFilesPath } from './get-customer-files';

/**
 * Where the rejected-rows CSV downloads from (owners and analysts). A plain link sends the session
 * cookie and lets the browser save the file; the CSV holds the row number, the reason and the raw
 * text of the mapped columns only.
 * @param orgId the organization
 * @param workspaceId the workspace
 * @param fileId the customer file
 * @returns the URL
 * @example <a href={rejectedRowsHref(orgId, wsId, fileId)} download>Download rejected rows (CSV)</a>
 */
export function rejectedRowsHref(orgId: string, workspaceId: string, fileId: string): string {
  return `${env.VITE_API_ORIGIN}/api${customerFilesPath(orgId, workspaceId)}/${fileId}/rejected.csv`;
}
