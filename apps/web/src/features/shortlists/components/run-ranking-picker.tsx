import type { ScoringRunJson } from '../../scoring/types';
import { demandText, shareText } from '../utils/score-text';

export type RunRankingPickerProps = {
  run: Pick<ScoringRunJson, 'name' | 'weightLabel' | 'results'>;
  /** Site ids already on the shortlist. */
  chosenIds: ReadonlySet<string>;
  onToggle: (candidate: { siteId: string; name: string }) => void;
};

/**
 * A finished run's ranking with a checkbox per candidate: ticking adds the site at the end of the shortlist.
 * @param props the run, the chosen sites and the toggle handler
 * @returns the ranking table, or a line when the run has no results
 * @example <RunRankingPicker run={run} chosenIds={new Set(['site_1'])} onToggle={toggle} />
 */
export function RunRankingPicker({ run, chosenIds, onToggle }: RunRankingPickerProps) {
  const candidates = run.results?.candidates ?? [];
  if (candidates.length === 0) return <p className="text-sm text-ink-muted">This run has no ranked candidates.</p>;
  const unit = run.weightLabel;
  return (
    <div className="overflow-x-auto rounded-control border border-line">
      <table className="w-full text-sm tabular-nums" aria-label={`Ranking of ${run.name}`}>
        <thead className="bg-sunken text-left text-xs text-ink-muted">
          <tr>
            <th scope="col" className="px-3 py-2">
              <span className="sr-only">On the shortlist</span>
            </th>
            <th scope="col" className="px-3 py-2">Rank</th>
            <th scope="col" className="px-3 py-2">Site</th>
            <th scope="col" className="px-3 py-2 text-right">Net new ({unit})</th>
            <th scope="col" className="px-3 py-2 text-right">Captured ({unit})</th>
            <th scope="col" className="px-3 py-2 text-right">Cannibalization ({unit})</th>
            <th scope="col" className="px-3 py-2 text-right">Share of demand</th>
          </tr>
        </thead>
        <tbody>
          {candidates.map((c) => (
            <tr key={c.siteId} className="border-t border-line">
              <td className="px-3 py-2">
                <input
                  type="checkbox"
                  className="accent-accent"
                  aria-label={`Choose ${c.name}`}
                  checked={chosenIds.has(c.siteId)}
                  onChange={() => onToggle({ siteId: c.siteId, name: c.name })}
                />
              </td>
              <td className="px-3 py-2">{c.rank}</td>
              <td className="px-3 py-2 font-medium text-ink">{c.name}</td>
              <td className="px-3 py-2 text-right">{demandText(c.netNew)}</td>
              <td className="px-3 py-2 text-right">{demandText(c.captured)}</td>
              <td className="px-3 py-2 text-right">{demandText(c.cannibalization)}</td>
              <td className="px-3 py-2 text-right">{shareText(c.shareOfTotal)}</td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
