import type { CandidateScoreJson, StoreDemandJson } from '../types';
import { demandText, percentText } from '../utils/demand-text';

export type CandidateExplanationProps = {
  candidate: CandidateScoreJson;
  /** Demand each own store holds today, to put each loss in proportion. */
  ownToday: StoreDemandJson[];
  weightLabel: string;
};

/**
 * Why a candidate ranks where it does: the server's explanation, its score parts, and how much it
 * takes from each of our own stores as a small bar list.
 * @param props the candidate, our stores' demand today and the demand unit
 * @returns the explanation block
 * @example <CandidateExplanation candidate={c} ownToday={results.ownToday} weightLabel="customers" />
 */
export function CandidateExplanation({ candidate: c, ownToday, weightLabel }: CandidateExplanationProps) {
  const today = new Map(ownToday.map((s) => [s.siteId, s.demand]));
  const parts = [...c.cannibalizedFrom].filter((p) => p.demand > 0).sort((a, b) => b.demand - a.demand);
  const largest = parts[0]?.demand ?? 0;
  return (
    <div className="flex flex-col gap-3" aria-label={`Why ${c.name} ranks ${c.rank}`}>
      <p className="text-sm text-ink">{c.explanation}</p>
      <p className="text-sm text-ink-muted tabular-nums">
        Captured {demandText(c.captured)} {weightLabel} − taken from our own stores {demandText(c.cannibalization)} {weightLabel} = net new{' '}
        {demandText(c.netNew)} {weightLabel} ({percentText(c.shareOfTotal)} of all demand captured).
      </p>
      {parts.length ? (
        <div className="flex flex-col gap-1">
          <h5 className="text-xs font-semibold text-ink-muted">Taken from each of our own stores</h5>
          <ul className="flex flex-col gap-1" aria-label={`Cannibalization by ${c.name}`}>
            {parts.map((p) => {
              const before = today.get(p.siteId);
              return (
                <li key={p.siteId} className="grid grid-cols-[10rem_minmax(0,1fr)_auto] items-center gap-2 text-xs tabular-nums">
                  <span className="truncate text-ink">{p.name}</span>
                  <span className="h-2 rounded-full bg-sunken" aria-hidden>
                    <span className="block h-full rounded-full bg-caution" style={{ width: `${largest > 0 ? (p.demand / largest) * 100 : 0}%` }} />
                  </span>
                  <span className="text-ink">
                    {demandText(p.demand)} {weightLabel}
                    {before ? <span className="text-ink-muted"> ({percentText(p.demand / before)} of its demand today)</span> : null}
                  </span>
                </li>
              );
            })}
          </ul>
        </div>
      ) : (
        <p className="text-xs text-ink-muted">It takes nothing measurable from our own stores.</p>
      )}
    </div>
  );
}
