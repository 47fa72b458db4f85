import { Button } from '@demandscape/ui';
import { Fragment, useState } from 'react';
import type { CandidateScoreJson, ScoringRunJson } from '../types';
import { demandText, percentText } from '../utils/demand-text';
import { radiusText } from '../utils/radius-units';
import { measureLabel } from '../utils/scoring-explanations';
import { CandidateExplanation } from './candidate-explanation';

export type RankingTableProps = {
  run: ScoringRunJson;
  selectedId: string | null;
  onSelect: (siteId: string | null) => void;
  /** Ticked candidates (for scoring a set); the tick column shows only when `onTick` is given. */
  ticked?: ReadonlySet<string>;
  onTick?: (siteId: string, ticked: boolean) => void;
};

/** Rows shown before "Show all": long rankings (hundreds of candidates) stay quick to read and render. */
export const RANKING_FIRST_ROWS = 50;

// A demand figure with its unit beside it, kept on one line; the unit is set smaller so long labels stay light.
function Demand({ value, unit }: { value: number; unit: string }) {
  return (
    <span className="whitespace-nowrap">
      {demandText(value)} <span className="text-xs text-ink-muted">{unit}</span>
    </span>
  );
}

function measureValue(c: CandidateScoreJson, measure: string, unit: string) {
  return measure === 'shareOfTotal' ? percentText(c.value) : <Demand value={c.value} unit={unit} />;
}

/**
 * The ranked candidates of a finished run: rank, the ranking measure, captured, cannibalization, net new,
 * share and ring demands in tabular figures; choosing a row opens its explanation beneath it.
 * @param props the run, the open row and (for planners) the ticked candidates
 * @returns the table
 * @example <RankingTable run={run} selectedId={id} onSelect={setId} />
 */
export function RankingTable({ run, selectedId, onSelect, ticked, onTick }: RankingTableProps) {
  const [showAll, setShowAll] = useState(false);
  const results = run.results;
  if (!results) return null;
  const unit = run.weightLabel;
  const rings = run.settings.radiiM.map((m) => radiusText(m, run.settings.radiusUnit));
  const measure = measureLabel(run.settings.measure, rings);
  const columns = 7 + rings.length + (onTick ? 1 : 0);
  return (
    <div className="overflow-x-auto">
      <table className="w-full text-left text-sm tabular-nums">
        <caption className="sr-only">Candidates ranked by {measure.toLowerCase()}</caption>
        <thead className="text-xs text-ink-muted">
          <tr className="border-b border-line">
            {onTick ? (
              <th scope="col" className="py-2 pr-2 font-medium">
                <span className="sr-only">Score together</span>
              </th>
            ) : null}
            <th scope="col" className="py-2 pr-2 font-medium">Rank</th>
            <th scope="col" className="py-2 pr-2 font-medium">Candidate</th>
            <th scope="col" className="py-2 pr-2 text-right font-medium">{measure}</th>
            <th scope="col" className="py-2 pr-2 text-right font-medium">Captured</th>
            <th scope="col" className="py-2 pr-2 text-right font-medium">Cannibalization</th>
            <th scope="col" className="py-2 pr-2 text-right font-medium">Net new</th>
            <th scope="col" className="py-2 pr-2 text-right font-medium">Share</th>
            {rings.map((r) => (
              <th key={r} scope="col" className="py-2 pr-2 text-right font-medium">
                Within {r}
              </th>
            ))}
          </tr>
        </thead>
        <tbody>
          {(showAll ? results.candidates : results.candidates.slice(0, RANKING_FIRST_ROWS)).map((c) => {
            const open = c.siteId === selectedId;
            return (
              <Fragment key={c.siteId}>
                <tr className={`border-b border-line ${open ? 'bg-accent-soft/50' : 'hover:bg-sunken/60'}`}>
                  {onTick ? (
                    <td className="py-2 pr-2">
                      <input
                        type="checkbox"
                        className="size-4 accent-accent"
                        aria-label={`Score ${c.name} together with others`}
                        checked={ticked?.has(c.siteId) ?? false}
                        onChange={(e) => onTick(c.siteId, e.target.checked)}
                      />
                    </td>
                  ) : null}
                  <td className="py-2 pr-2 font-semibold">{c.rank}</td>
                  <td className="py-2 pr-2">
                    <button
                      type="button"
                      className="text-left font-medium text-accent hover:underline"
                      aria-expanded={open}
                      onClick={() => onSelect(open ? null : c.siteId)}
                    >
                      {c.name}
                    </button>
                  </td>
                  <td className="py-2 pr-2 text-right font-semibold">{measureValue(c, run.settings.measure, unit)}</td>
                  <td className="py-2 pr-2 text-right">
                    <Demand value={c.captured} unit={unit} />
                  </td>
                  <td className="py-2 pr-2 text-right">
                    <Demand value={c.cannibalization} unit={unit} />
                  </td>
                  <td className="py-2 pr-2 text-right">
                    <Demand value={c.netNew} unit={unit} />
                  </td>
                  <td className="py-2 pr-2 text-right whitespace-nowrap">{percentText(c.shareOfTotal)}</td>
                  {c.rings.map((r) => (
                    <td key={r.radiusM} className="py-2 pr-2 text-right">
                      <Demand value={r.demand} unit={unit} />
                    </td>
                  ))}
                </tr>
                {open ? (
                  <tr className="border-b border-line bg-accent-soft/20">
                    <td colSpan={columns} className="px-3 py-3">
                      <CandidateExplanation candidate={c} ownToday={results.ownToday} weightLabel={unit} />
                    </td>
                  </tr>
                ) : null}
              </Fragment>
            );
          })}
        </tbody>
      </table>
      {!showAll && results.candidates.length > RANKING_FIRST_ROWS ? (
        <Button variant="link" size="sm" onClick={() => setShowAll(true)}>
          Show all {results.candidates.length.toLocaleString('en')} candidates
        </Button>
      ) : null}
    </div>
  );
}
