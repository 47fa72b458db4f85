import { Badge } from '@demandscape/ui';
import type { ShortlistVersion } from '../types';
import { demandText, ringRadiusText, shareText, stabilityText } from '../utils/score-text';

export type ShortlistRankedTableProps = { version: ShortlistVersion };

const measureWords: Record<string, string> = {
  netNew: 'net new demand',
  captured: 'captured demand',
  shareOfTotal: 'share of demand',
  cannibalization: 'lowest cannibalization',
};

/**
 * The shortlisted sites in the planner's order with their key numbers: run rank, net new demand, captured
 * demand, cannibalization, share of all demand, demand inside each ring and the rank range when the bandwidth changes.
 * @param props the shortlist version
 * @returns the table
 * @example <ShortlistRankedTable version={shortlist.version} />
 */
export function ShortlistRankedTable({ version }: ShortlistRankedTableProps) {
  const unit = version.weightLabel;
  const radiusUnit = version.settings.radiusUnit;
  const radii = version.settings.radiiM;
  const items = [...version.items].sort((a, b) => a.order - b.order);
  const measure = measureWords[version.settings.measure] ?? `demand within ring ${Number(version.settings.measure.split(':')[1] ?? 0) + 1}`;
  return (
    <div className="flex flex-col gap-2">
      <div className="overflow-x-auto rounded-control border border-line">
        <table className="w-full text-sm tabular-nums" aria-label="Shortlisted sites">
          <thead className="bg-sunken text-left text-xs text-ink-muted">
            <tr>
              <th scope="col" className="px-3 py-2">#</th>
              <th scope="col" className="px-3 py-2">Site</th>
              <th scope="col" className="px-3 py-2 text-right">Run rank</th>
              <th scope="col" className="px-3 py-2 text-right">Net new ({unit})</th>
              <th scope="col" className="px-3 py-2 text-right">Captured ({unit})</th>
              <th scope="col" className="px-3 py-2 text-right">Cannibalization ({unit})</th>
              <th scope="col" className="px-3 py-2 text-right">Share of demand</th>
              {radii.map((r) => (
                <th key={r} scope="col" className="px-3 py-2 text-right">
                  Within {ringRadiusText(r, radiusUnit)} ({unit})
                </th>
              ))}
              <th scope="col" className="px-3 py-2">Rank when bandwidth changes</th>
            </tr>
          </thead>
          <tbody>
            {items.map((item) => (
              <tr key={item.siteId} className="border-t border-line">
                <td className="px-3 py-2 font-semibold text-accent-strong">{item.order}</td>
                <th scope="row" className="px-3 py-2 text-left font-medium text-ink">
                  {item.name}
                </th>
                <td className="px-3 py-2 text-right">
                  {item.score.rank} of {version.candidateCount}
                </td>
                <td className="px-3 py-2 text-right font-semibold">{demandText(item.score.netNew)}</td>
                <td className="px-3 py-2 text-right">{demandText(item.score.captured)}</td>
                <td className="px-3 py-2 text-right">{demandText(item.score.cannibalization)}</td>
                <td className="px-3 py-2 text-right">{shareText(item.score.shareOfTotal)}</td>
                {radii.map((r) => {
                  const ring = item.score.rings.find((g) => Math.abs(g.radiusM - r) < 0.5);
                  return (
                    <td key={r} className="px-3 py-2 text-right">
                      {ring ? demandText(ring.demand) : '–'}
                    </td>
                  );
                })}
                <td className="px-3 py-2">
                  <span className="flex flex-wrap items-center gap-1.5">
                    {stabilityText(item.stability)}
                    {item.stability?.unstable ? <Badge tone="caution">moves a lot</Badge> : null}
                  </span>
                </td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
      <p className="text-xs text-ink-muted">
        Run rank: place among all {version.candidateCount} candidates by {measure}, each scored as if it alone opened. Demand is in {unit}; the
        surface holds {demandText(version.totalDemand)} {unit} in total. Huff model α {version.settings.alpha}, β {version.settings.beta}.
      </p>
    </div>
  );
}
