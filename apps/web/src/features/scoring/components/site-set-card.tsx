import type { CandidateScoreJson, SiteSetJson } from '../types';
import { demandText, percentText } from '../utils/demand-text';
import { siteSetComparison } from '../utils/site-set-comparison';

export type SiteSetCardProps = { set: SiteSetJson; candidates: CandidateScoreJson[]; weightLabel: string };

/**
 * One candidate set: captured, cannibalization and net new when its members open together, beside the
 * sum of the members scored alone; the difference is what they take from each other.
 * @param props the set, the run's candidates (scored alone) and the demand unit
 * @returns the card
 * @example <SiteSetCard set={set} candidates={run.results.candidates} weightLabel="customers" />
 */
export function SiteSetCard({ set, candidates, weightLabel: unit }: SiteSetCardProps) {
  const cmp = siteSetComparison(set, candidates);
  const rows = [
    { label: 'Captured', together: cmp.together.captured, alone: cmp.alone.captured },
    { label: 'Cannibalization', together: cmp.together.cannibalization, alone: cmp.alone.cannibalization },
    { label: 'Net new', together: cmp.together.netNew, alone: cmp.alone.netNew },
  ];
  return (
    <article aria-label={`Candidate set ${set.name}`} className="flex flex-col gap-2 rounded-panel border border-line p-3">
      <div>
        <h5 className="text-sm font-semibold text-ink">{set.name}</h5>
        <p className="text-xs text-ink-muted tabular-nums">
          {set.members.map((m) => `${m.name} (${demandText(m.captured)} ${unit} together)`).join(' · ')} · {percentText(set.shareOfTotal)} of all demand
        </p>
      </div>
      <table className="w-full text-left text-sm tabular-nums">
        <caption className="sr-only">Opened together against the members scored alone</caption>
        <thead className="text-xs text-ink-muted">
          <tr className="border-b border-line">
            <th scope="col" className="py-1 pr-2 font-medium" />
            <th scope="col" className="py-1 pr-2 text-right font-medium">Opened together</th>
            <th scope="col" className="py-1 pr-2 text-right font-medium">Sum of each alone</th>
            <th scope="col" className="py-1 text-right font-medium">Difference</th>
          </tr>
        </thead>
        <tbody>
          {rows.map((r) => (
            <tr key={r.label} className="border-b border-line">
              <th scope="row" className="py-1 pr-2 font-normal text-ink-muted">{r.label}</th>
              <td className="py-1 pr-2 text-right">{demandText(r.together)} {unit}</td>
              <td className="py-1 pr-2 text-right">{demandText(r.alone)} {unit}</td>
              <td className="py-1 text-right">{demandText(r.together - r.alone)} {unit}</td>
            </tr>
          ))}
        </tbody>
      </table>
      <p className="text-xs text-ink-muted tabular-nums">
        Opened together, these sites take {demandText(Math.max(0, cmp.takenFromEachOther))} {unit} from each other: the sum of each
        scored alone overstates what the set captures by that much.
      </p>
    </article>
  );
}
