import { Alert, ProgressBar, Spinner } from '@demandscape/ui';
import { useQueryClient } from '@tanstack/react-query';
import { useEffect, useRef, useState } from 'react';
import { errorMessage } from '../../../lib/api-error';
import { dateTimeText } from '../../../lib/format';
import { scoringRunIsActive, useScoringRun } from '../api/get-scoring-run';
import { scoringRunsKey } from '../api/get-scoring-runs';
import type { ScoringRunJson } from '../types';
import { demandText } from '../utils/demand-text';
import { radiusText } from '../utils/radius-units';
import { measureLabel, SCORING_CAUTION_LINE } from '../utils/scoring-explanations';
import { RankStabilityPanel } from './rank-stability-panel';
import { RankingTable } from './ranking-table';
import { RunDownloads } from './run-downloads';
import { SiteSetPanel } from './site-set-panel';

export type ScoringRunViewProps = {
  orgId: string;
  workspaceId: string;
  runId: string;
  canWrite: boolean;
  /** Called with each candidate's rank label once the ranking is known (for the map). */
  onRanking?: (run: ScoringRunJson) => void;
};

function progressText(run: ScoringRunJson): string {
  if (run.status === 'queued') return 'Queued: waiting for a worker';
  return `Scoring ${run.candidateCount.toLocaleString('en')} candidates: ${Math.round(run.progress * 100)} %`;
}

function settingsLine(run: ScoringRunJson): string {
  const s = run.settings;
  const rings = s.radiiM.map((m) => radiusText(m, s.radiusUnit));
  return `α = ${s.alpha}, β = ${s.beta} · rings ${rings.join(', ')} · ranked by ${measureLabel(s.measure, rings).toLowerCase()} · minimum distance ${s.minDistanceM === null ? 'half a cell' : `${s.minDistanceM} m`}`;
}

/**
 * One scoring run: progress while it works (polled), the error when it failed, and when done the ranking
 * with explanations, downloads, the caution, rank stability and candidate sets.
 * @param props the workspace, the run id, rights and a callback for map labels
 * @returns the run's panel
 * @example <ScoringRunView orgId={o} workspaceId={w} runId={id} canWrite />
 */
export function ScoringRunView({ orgId, workspaceId, runId, canWrite, onRanking }: ScoringRunViewProps) {
  const query = useScoringRun(orgId, workspaceId, runId);
  const [selectedId, setSelectedId] = useState<string | null>(null);
  const [ticked, setTicked] = useState<string[]>([]);
  const run = query.data;
  const queryClient = useQueryClient();
  const wasActive = useRef(scoringRunIsActive(run));

  // When a run ends, the list should show its new status at once.
  useEffect(() => {
    const active = scoringRunIsActive(run);
    if (wasActive.current && !active) void queryClient.invalidateQueries({ queryKey: scoringRunsKey(orgId, workspaceId), exact: true });
    wasActive.current = active;
  }, [run, queryClient, orgId, workspaceId]);
  useEffect(() => {
    if (run?.results) onRanking?.(run);
  }, [run, onRanking]);

  if (query.isPending) return <Spinner label="Loading the scoring run" className="flex justify-center p-6" />;
  if (query.isError) {
    return (
      <Alert tone="danger" title="Could not load the scoring run">
        {errorMessage(query.error)}
      </Alert>
    );
  }
  const r = query.data;

  return (
    <article aria-label={`Scoring run ${r.name}`} className="flex flex-col gap-4">
      <div>
        <h4 className="text-sm font-semibold text-ink">{r.name}</h4>
        <p className="text-xs text-ink-muted tabular-nums">
          Surface “{r.surfaceName}” · {settingsLine(r)}
        </p>
        <p className="text-xs text-ink-faint tabular-nums">
          Started {dateTimeText(r.createdAt)}
          {r.createdBy ? ` by ${r.createdBy.name}` : ''}
          {r.finishedAt ? ` · ended ${dateTimeText(r.finishedAt)}` : ''}
        </p>
      </div>

      {r.status === 'queued' || r.status === 'running' ? (
        <ProgressBar label={`Progress of ${r.name}`} value={r.status === 'queued' ? null : r.progress} valueText={progressText(r)} />
      ) : null}
      {r.status === 'failed' ? (
        <Alert tone="danger" title="Scoring failed">
          {r.error?.message ?? 'The server did not say why.'}
        </Alert>
      ) : null}
      {r.warnings.map((w) => (
        <Alert key={w} tone="caution">
          {w}
        </Alert>
      ))}

      {r.status === 'succeeded' && r.results ? (
        <>
          <p className="text-sm text-ink-muted tabular-nums">
            {r.results.candidates.length.toLocaleString('en')} candidates ranked; total demand on the surface {demandText(r.results.totalDemand)}{' '}
            {r.weightLabel}. Each candidate is scored as if it alone opened beside our stores and the competitors. Choose a name for its
            explanation.
          </p>
          <RankingTable
            run={r}
            selectedId={selectedId}
            onSelect={setSelectedId}
            ticked={new Set(ticked)}
            onTick={canWrite ? (id, on) => setTicked((t) => (on ? [...t, id] : t.filter((x) => x !== id))) : undefined}
          />
          <p className="text-xs text-caution">{SCORING_CAUTION_LINE}</p>
          <RunDownloads orgId={orgId} workspaceId={workspaceId} runId={r.id} />
          <SiteSetPanel orgId={orgId} workspaceId={workspaceId} run={r} canWrite={canWrite} ticked={ticked} onScored={() => setTicked([])} />
          <RankStabilityPanel orgId={orgId} workspaceId={workspaceId} run={r} canWrite={canWrite} />
        </>
      ) : null}
    </article>
  );
}
