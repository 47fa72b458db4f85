import { buttonVariants } from '@demandscape/ui';
import { scoringExportHrefs } from '../api/scoring-exports';

/**
 * Download links of a finished run: the XLSX report, the CSV ranking and the sites as GeoJSON.
 * @param props the workspace and the run
 * @returns the links
 * @example <RunDownloads orgId={o} workspaceId={w} runId={run.id} />
 */
export function RunDownloads({ orgId, workspaceId, runId }: { orgId: string; workspaceId: string; runId: string }) {
  const hrefs = scoringExportHrefs(orgId, workspaceId, runId);
  const link = buttonVariants({ variant: 'secondary', size: 'sm' });
  return (
    <nav aria-label="Downloads" className="flex flex-wrap gap-2">
      <a className={link} href={hrefs.xlsx} download>
        Report (XLSX)
      </a>
      <a className={link} href={hrefs.csv} download>
        Ranking (CSV)
      </a>
      <a className={link} href={hrefs.geojson} download>
        Sites with scores (GeoJSON)
      </a>
    </nav>
  );
}
