import { env } from '../../../config/env';
import { scoringRunsPath } from './get-scoring-runs';
import { shortlistsPath } from './get-shortlists';

/**
 * Where the shortlist's Excel report downloads from (summary sheet + one sheet per site).
 * @param orgId the organization
 * @param workspaceId the workspace
 * @param shortlistId the shortlist
 * @param version the version shown
 * @returns the URL for an `<a download>`
 * @example shortlistXlsxHref('org_1', 'wsp_1', 'shl_1', 2) // '/api/organizations/org_1/workspaces/wsp_1/shortlists/shl_1/export.xlsx?version=2'
 */
export function shortlistXlsxHref(orgId: string, workspaceId: string, shortlistId: string, version: number): string {
  return `${env.VITE_API_ORIGIN}/api${shortlistsPath(orgId, workspaceId)}/${shortlistId}/export.xlsx?version=${version}`;
}

/**
 * Where a scoring run's ranking downloads from as CSV.
 * @param orgId the organization
 * @param workspaceId the workspace
 * @param runId the scoring run
 * @returns the URL for an `<a download>`
 * @example runRankingCsvHref('org_1', 'wsp_1', 'run_1') // '/api/organizations/org_1/workspaces/wsp_1/scoring-runs/run_1/ranking.csv'
 */
export function runRankingCsvHref(orgId: string, workspaceId: string, runId: string): string {
  return `${env.VITE_API_ORIGIN}/api${scoringRunsPath(orgId, workspaceId)}/${runId}/ranking.csv`;
}

/**
 * Where a scoring run's sites with their scores download from as GeoJSON.
 * @param orgId the organization
 * @param workspaceId the workspace
 * @param runId the scoring run
 * @returns the URL for an `<a download>`
 * @example runSitesGeojsonHref('org_1', 'wsp_1', 'run_1') // '/api/organizations/org_1/workspaces/wsp_1/scoring-runs/run_1/sites.geojson'
 */
export function runSitesGeojsonHref(orgId: string, workspaceId: string, runId: string): string {
  return `${env.VITE_API_ORIGIN}/api${scoringRunsPath(orgId, workspaceId)}/${runId}/sites.geojson`;
}
