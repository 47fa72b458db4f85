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

function measureValue(c: CandidateScoreJson, measure: string): string {
  return measure === 'shareOfTotal' ? percentText(c.value) : demandText(c.value);
}

// A column heading with its unit on a second line: the figures below are in that unit.
function Heading({ label, unit }: { label: string; unit: string }) {
  return (
    <th scope="col" className="py-2 pr-2 text-right align-bottom font-medium">
      {label}
      <span className="block text-[0.6875rem] font-normal text-ink-faint">{unit}</span>
    </th>
  );
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
        <caption className="sr-only">
          Candidates ranked by {measure.toLowerCase()}; demand in {unit}
        </caption>
        <thead className="text-xs text-ink-muted">
          <tr className="border-b border-line">
            {onTick ? (
              <th scope="col" className="py-2 pr-2 font-medium">
                <span className="sr-only">Score together</span>
              </th>
            ) : null}
            <th scope="col" className="py-2 pr-2 align-bottom font-medium">Rank</th>
            <th scope="col" className="py-2 pr-2 align-bottom font-medium">Candidate</th>
            <Heading label={measure} unit={run.settings.measure === 'shareOfTotal' ? '%' : unit} />
            <Heading label="Captured" unit={unit} />
            <Heading label="Cannibalization" unit={unit} />
            <Heading label="Net new" unit={unit} />
            <Heading label="Share" unit="% of all demand" />
            {rings.map((r) => (
              <Heading key={r} label={`Within ${r}`} unit={unit} />
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
                      className="min-w-32 text-left font-medium text-accent hover:underline"
                      aria-expanded={open}
                      onClick={() => onSelect(open ? null : c.siteId)}
                    >
                      {c.name}
                    </button>
                  </td>
                  <td className="py-2 pr-2 text-right font-semibold">{measureValue(c, run.settings.measure)}</td>
                  <td className="py-2 pr-2 text-right">{demandText(c.captured)}</td>
                  <td className="py-2 pr-2 text-right">{demandText(c.cannibalization)}</td>
                  <td className="py-2 pr-2 text-right">{demandText(c.netNew)}</td>
                  <td className="py-2 pr-2 text-right">{percentText(c.shareOfTotal)}</td>
                  {c.rings.map((r) => (
                    <td key={r.radiusM} className="py-2 pr-2 text-right">
                      {demandText(r.demand)}
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
