import { useCallback, useEffect, useState } from 'react';
import { useScoringRuns } from '../api/get-scoring-runs';
import type { ScoringRunJson, ScoringSurfaceOption } from '../types';
import { ScoreSitesForm } from './score-sites-form';
import { ScoringRunList } from './scoring-run-list';
import { ScoringRunView } from './scoring-run-view';
import { ScoringSettingsForm } from './scoring-settings-form';

export type ScoringStepProps = {
  orgId: string;
  workspaceId: string;
  /** Finished demand surfaces (the route passes them from the surfaces feature), newest first. */
  surfaces: ScoringSurfaceOption[];
  /** Owners and planners: change the settings, score, check stability, score sets, delete runs. */
  canWrite: boolean;
  /** Labels for candidates on the map, by site id (e.g. "#1"); `{}` when no ranking is shown. */
  onSiteLabels?: (labels: Record<string, string>) => void;
};

/**
 * Study step 3, scoring: the trade-area settings, "Score sites" against a finished surface, the past runs,
 * and the chosen run's ranking with explanations, rank stability, candidate sets and downloads.
 * @param props the workspace, its finished surfaces, rights and the map-label callback
 * @returns the scoring panel
 * @example <ScoringStep orgId={o} workspaceId={w} surfaces={finished} canWrite onSiteLabels={setLabels} />
 */
export function ScoringStep({ orgId, workspaceId, surfaces, canWrite, onSiteLabels }: ScoringStepProps) {
  const runs = useScoringRuns(orgId, workspaceId);
  const [chosenId, setChosenId] = useState<string | null | undefined>(undefined);
  // Until someone chooses, show the newest run.
  const shownId = chosenId === undefined ? (runs.data?.[0]?.id ?? null) : chosenId;

  const onRanking = useCallback(
    (run: ScoringRunJson) => onSiteLabels?.(Object.fromEntries((run.results?.candidates ?? []).map((c) => [c.siteId, `#${c.rank}`]))),
    [onSiteLabels],
  );
  useEffect(() => {
    if (shownId === null) onSiteLabels?.({});
  }, [shownId, onSiteLabels]);
  // The labels belong to the ranking shown here: take them off the map when the panel closes.
  useEffect(() => () => onSiteLabels?.({}), [onSiteLabels]);

  return (
    <div className="flex flex-col gap-6">
      <section aria-label="Trade-area settings" className="flex flex-col gap-3">
        <h3 className="text-base font-semibold text-ink">Trade-area settings</h3>
        <p className="text-xs text-ink-muted">
          Huff model: each area’s demand is shared among all stores (ours, competitors’ and the candidate) by attractiveness and distance.
        </p>
        <ScoringSettingsForm orgId={orgId} workspaceId={workspaceId} canWrite={canWrite} />
      </section>
      {canWrite ? (
        <section aria-label="Score the candidates" className="flex flex-col gap-3">
          <h3 className="text-base font-semibold text-ink">Score the candidates</h3>
          <ScoreSitesForm orgId={orgId} workspaceId={workspaceId} surfaces={surfaces} onStarted={(run) => setChosenId(run.id)} />
        </section>
      ) : null}
      <section aria-label="Scoring runs in this workspace" className="flex flex-col gap-3">
        <h3 className="text-sm font-semibold text-ink">Scoring runs</h3>
        <ScoringRunList orgId={orgId} workspaceId={workspaceId} canWrite={canWrite} chosenId={shownId} onChoose={setChosenId} />
      </section>
      {shownId ? <ScoringRunView key={shownId} orgId={orgId} workspaceId={workspaceId} runId={shownId} canWrite={canWrite} onRanking={onRanking} /> : null}
    </div>
  );
}
