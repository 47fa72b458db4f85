import { env } from '../../../config/env';
import { scoringRunsPath } from './get-scoring-runs';

/**
 * Where a run's downloads come from (all roles). Plain links send the session cookie and let the
 * browser save the file; none holds point-level customer data.
 * @param orgId the organization
 * @param workspaceId the workspace
 * @param runId the run
 * @returns the XLSX report, CSV ranking and GeoJSON sites URLs
 * @example <a href={scoringExportHrefs(o, w, r).csv} download>Ranking (CSV)</a>
 */
export function scoringExportHrefs(orgId: string, workspaceId: string, runId: string) {
  const base = `${env.VITE_API_ORIGIN}/api${scoringRunsPath(orgId, workspaceId)}/${runId}`;
  return { xlsx: `${base}/export.xlsx`, csv: `${base}/ranking.csv`, geojson: `${base}/sites.geojson` };
}
