import { Alert, Stat, buttonVariants } from '@demandscape/ui';
import { rejectedRowsHref } from '../api/get-rejected-rows';
import type { CustomerFile, ReportExample } from '../types';
import { countText } from '../utils/byte-size';
import { reasonText } from '../utils/validation-reasons';

export type ValidationReportProps = {
  orgId: string;
  workspaceId: string;
  file: CustomerFile;
  /** Owners and analysts: the rejected-rows download (examples are only sent to them anyway). */
  canDownload: boolean;
};

function ReasonTable({ title, counts, examples }: { title: string; counts: Record<string, number>; examples: Record<string, ReportExample[]> }) {
  const entries = Object.entries(counts).filter(([, n]) => n > 0).sort((a, b) => b[1] - a[1]);
  if (entries.length === 0) return null;
  return (
    <section aria-label={title} className="flex flex-col gap-2">
      <h4 className="text-sm font-semibold text-ink">{title}</h4>
      <ul className="flex flex-col divide-y divide-line rounded-control border border-line">
        {entries.map(([code, n]) => {
          const text = reasonText(code);
          const rows = examples[code] ?? [];
          return (
            <li key={code} className="flex flex-col gap-1 px-3 py-2 text-sm">
              <div className="flex items-baseline justify-between gap-3">
                <span className="font-medium text-ink">{text.title}</span>
                <span className="tabular-nums text-ink">
                  {countText(n)} {n === 1 ? 'row' : 'rows'}
                </span>
              </div>
              <p className="text-xs text-ink-muted">{text.explanation}</p>
              {rows.length ? (
                <p className="text-xs text-ink-faint tabular-nums">
                  e.g.{' '}
                  {rows
                    .slice(0, 3)
                    .map((e) => `row ${e.row}: ${e.lon || '(empty)'}, ${e.lat || '(empty)'}${e.weight !== undefined ? `, ${e.weight || '(empty)'}` : ''}`)
                    .join(' · ')}
                </p>
              ) : null}
            </li>
          );
        })}
      </ul>
    </section>
  );
}

/**
 * The import's validation report: how many rows were accepted, rejected, flagged and excluded, each
 * reason in plain words with its count and examples, and the rejected-rows download.
 * @param props the workspace, the imported (or failed) file, and whether the viewer may download rows
 * @returns the report
 * @example <ValidationReport orgId={o} workspaceId={w} file={file} canDownload />
 */
export function ValidationReport({ orgId, workspaceId, file, canDownload }: ValidationReportProps) {
  const report = file.report;
  const usable = file.acceptedCount - file.excludedCount;
  return (
    <section aria-label="Validation report" className="flex flex-col gap-4">
      <div>
        <h3 className="text-base font-semibold text-ink">Validation report for “{file.name}”</h3>
        <p className="text-sm text-ink-muted">
          {countText(file.rowCount)} rows read; {countText(Math.max(0, usable))} customers go into demand surfaces
          {file.weightLabel ? `, weighted by ${file.weightLabel}` : ''}.
        </p>
      </div>
      <div className="grid grid-cols-2 gap-2 md:grid-cols-4">
        <Stat label="Accepted" value={countText(file.acceptedCount)} unit="rows" tone="success" hint="Valid coordinates and weight" />
        <Stat label="Rejected" value={countText(file.rejectedCount)} unit="rows" tone={file.rejectedCount ? 'danger' : 'neutral'} hint="Left out; reasons below" />
        <Stat label="Flagged" value={countText(file.flaggedCount)} unit="rows" tone={file.flaggedCount ? 'caution' : 'neutral'} hint="Accepted, but worth a look" />
        <Stat label="Excluded" value={countText(file.excludedCount)} unit="rows" hint={file.excludeFlagged ? 'Flagged rows left out, as chosen' : 'Flagged rows are kept'} />
      </div>
      {report ? (
        <>
          <ReasonTable title="Why rows were rejected" counts={report.rejected} examples={report.examples} />
          <ReasonTable title="Why rows were flagged" counts={report.flagged} examples={report.examples} />
          {report.outlierRule?.note ? <p className="text-xs text-ink-muted">Outlier rule: {report.outlierRule.note}</p> : null}
        </>
      ) : null}
      {file.rejectedCount === 0 && file.flaggedCount === 0 ? (
        <Alert tone="success">Every row had usable coordinates{file.mapping?.weight ? ' and weight' : ''}.</Alert>
      ) : null}
      {canDownload && file.rejectedCount > 0 ? (
        <a className={buttonVariants({ variant: 'secondary', className: 'w-fit' })} href={rejectedRowsHref(orgId, workspaceId, file.id)} download>
          Download rejected rows (CSV)
        </a>
      ) : null}
      <p className="text-xs text-ink-faint">{file.privacyNote ?? 'Only coordinates and the weight were kept; the other columns were discarded.'}</p>
    </section>
  );
}
