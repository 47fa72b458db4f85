import { buttonVariants } from '@demandscape/ui';
import { runRankingCsvHref, runSitesGeojsonHref, shortlistXlsxHref } from '../api/export-hrefs';

export type ShortlistDownloadsProps = {
  orgId: string;
  workspaceId: string;
  shortlistId: string;
  /** The version shown (its report is the one downloaded). */
  version: number;
  scoringRunId: string;
};

/**
 * Downloads for a shortlist version: its Excel report, and the run's full ranking (CSV) and scored sites (GeoJSON).
 * None holds customer locations.
 * @param props the shortlist, the version shown and its scoring run
 * @returns the download links
 * @example <ShortlistDownloads orgId={o} workspaceId={w} shortlistId={s.id} version={2} scoringRunId="run_1" />
 */
export function ShortlistDownloads({ orgId, workspaceId, shortlistId, version, scoringRunId }: ShortlistDownloadsProps) {
  const link = buttonVariants({ variant: 'secondary', size: 'sm' });
  return (
    <div className="flex flex-col gap-2">
      <div className="flex flex-wrap gap-2">
        <a className={buttonVariants({ size: 'sm' })} href={shortlistXlsxHref(orgId, workspaceId, shortlistId, version)} download>
          Shortlist report (XLSX)
        </a>
        <a className={link} href={runRankingCsvHref(orgId, workspaceId, scoringRunId)} download>
          Full ranking (CSV)
        </a>
        <a className={link} href={runSitesGeojsonHref(orgId, workspaceId, scoringRunId)} download>
          Scored sites (GeoJSON)
        </a>
      </div>
      <p className="text-xs text-ink-muted">Sites and scores only: no file contains customer locations.</p>
    </div>
  );
}
