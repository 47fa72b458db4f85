import { Alert, Badge, Button, ProgressBar } from '@demandscape/ui';
import { useState } from 'react';
import { errorMessage } from '../../../lib/api-error';
import { useCreateRankStability } from '../api/create-rank-stability';
import type { ScoringRunJson } from '../types';
import { tauReading } from '../utils/tau-reading';
import { RankRangeBar } from './rank-range-bar';

export type RankStabilityPanelProps = { orgId: string; workspaceId: string; run: ScoringRunJson; canWrite: boolean };

/** Stable sites listed beyond the unstable ones before "Show all". */
export const STABILITY_FIRST_ROWS = 20;

function placesText(n: number): string {
  const rounded = Math.round(n * 10) / 10;
  return `${rounded.toLocaleString('en')} ${rounded === 1 ? 'place' : 'places'}`;
}

/**
 * Rank stability of a finished run: start the check (planners), follow it, then each site's rank range
 * over the bandwidth variants with the unstable ones flagged, and Kendall's τ per bandwidth in plain words.
 * @param props the workspace, the run and whether the viewer may start the check
 * @returns the panel
 * @example <RankStabilityPanel orgId={o} workspaceId={w} run={run} canWrite />
 */
export function RankStabilityPanel({ orgId, workspaceId, run, canWrite }: RankStabilityPanelProps) {
  const start = useCreateRankStability(orgId, workspaceId);
  const [showAll, setShowAll] = useState(false);
  const s = run.stability;
  // Long lists: the unstable sites and the top of the ranking first.
  const sorted = [...(s?.sites ?? [])].sort((a, b) => a.baseRank - b.baseRank);
  const listed = showAll ? sorted : sorted.filter((x) => x.unstable || x.baseRank <= STABILITY_FIRST_ROWS);
  const count = run.results?.candidates.length ?? run.candidateCount;
  const base = s?.variants.find((v) => v.factor === 1)?.bandwidthM ?? run.surface.bandwidthM;

  return (
    <section aria-label="Rank stability" className="flex flex-col gap-3">
      <div className="flex flex-wrap items-center justify-between gap-2">
        <h4 className="text-sm font-semibold text-ink">Rank stability</h4>
        {canWrite && s?.status !== 'running' ? (
          <Button size="sm" variant="secondary" isLoading={start.isPending} onClick={() => start.mutate(run.id)}>
            {s ? 'Check rank stability again' : 'Check rank stability'}
          </Button>
        ) : null}
      </div>
      <p className="text-xs text-ink-muted">
        Rescores every candidate on surfaces at 0.5×, 0.75×, 1.5× and 2× the bandwidth ({Math.round(base).toLocaleString('en')} m). A
        ranking that barely moves does not hinge on how smooth the surface is.
      </p>
      {start.error ? <Alert tone="danger">{errorMessage(start.error)}</Alert> : null}
      {!s ? (
        canWrite ? null : <p className="text-sm text-ink-muted">Not checked yet; planners and owners can run the check.</p>
      ) : s.status === 'running' ? (
        <ProgressBar label="Rank stability progress" value={null} valueText="Rescoring at other bandwidths…" />
      ) : s.status === 'failed' ? (
        <Alert tone="danger" title="The stability check failed">
          {s.error?.message ?? 'The server did not say why.'}
        </Alert>
      ) : (
        <>
          <table className="w-full text-left text-sm tabular-nums">
            <caption className="sr-only">Rank range per candidate across bandwidths</caption>
            <thead className="text-xs text-ink-muted">
              <tr className="border-b border-line">
                <th scope="col" className="py-1.5 pr-2 font-medium">Candidate</th>
                <th scope="col" className="py-1.5 pr-2 font-medium">Rank</th>
                <th scope="col" className="py-1.5 pr-2 font-medium">Range (best–worst)</th>
                <th scope="col" className="py-1.5 pr-2 font-medium">
                  <span className="sr-only">Ranks 1 to {count}</span>
                </th>
                <th scope="col" className="py-1.5 font-medium">
                  <span className="sr-only">Flag</span>
                </th>
              </tr>
            </thead>
            <tbody>
              {listed.map((site) => (
                <tr key={site.siteId} className="border-b border-line">
                  <td className="py-1.5 pr-2">{site.name}</td>
                  <td className="py-1.5 pr-2">{site.baseRank}</td>
                  <td className="py-1.5 pr-2">
                    {site.minRank}–{site.maxRank}
                  </td>
                  <td className="py-1.5 pr-2">
                    <RankRangeBar baseRank={site.baseRank} minRank={site.minRank} maxRank={site.maxRank} count={count} unstable={site.unstable} />
                  </td>
                  <td className="py-1.5">
                    {site.unstable ? (
                      <Badge tone="caution" title={`Its rank moves by ${placesText(site.maxShift)} when the bandwidth changes.`}>
                        Unstable
                      </Badge>
                    ) : null}
                  </td>
                </tr>
              ))}
            </tbody>
          </table>
          {listed.length < sorted.length ? (
            <Button variant="link" size="sm" className="w-fit" onClick={() => setShowAll(true)}>
              Show all {sorted.length.toLocaleString('en')} candidates ({(sorted.length - listed.length).toLocaleString('en')} stable ones below rank {STABILITY_FIRST_ROWS} hidden)
            </Button>
          ) : null}
          <p className="text-xs text-ink-muted">
            Unstable: the rank moves by more than {placesText(s.threshold)} when the bandwidth changes; read such a site’s rank with care.
          </p>
          <div className="flex flex-col gap-1">
            <h5 className="text-xs font-semibold text-ink-muted">Agreement with the run’s ranking (Kendall’s τ; 1 = same order, 0 = unrelated)</h5>
            <ul className="flex flex-col gap-0.5 text-sm tabular-nums">
              {s.variants
                .filter((v) => v.factor !== 1)
                .map((v) => (
                  <li key={v.factor}>
                    {v.factor}× bandwidth ({Math.round(v.bandwidthM).toLocaleString('en')} m): τ = {v.tau.toFixed(2)}, {tauReading(v.tau)}
                  </li>
                ))}
            </ul>
          </div>
        </>
      )}
    </section>
  );
}
