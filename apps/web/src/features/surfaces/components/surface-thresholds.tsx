import type { DensityUnit, SurfaceThreshold } from '../types';
import { areaIn, densityIn, numberText, unitLabels } from '../utils/density-units';

/**
 * The percent-volume contours of a finished surface: for 50 %, 75 % and 90 % of demand, the smallest
 * area holding it and the density at its edge, in the run's unit.
 * @param props the levels (per km² and km² from the API) and the unit to show
 * @returns a small table
 * @example <SurfaceThresholds thresholds={s.thresholds} unit="sqmi" />
 */
export function SurfaceThresholds({ thresholds, unit }: { thresholds: SurfaceThreshold[]; unit: DensityUnit }) {
  const labels = unitLabels[unit];
  return (
    <table className="w-full text-left text-xs tabular-nums">
      <caption className="sr-only">Percent-volume contours</caption>
      <thead className="text-ink-muted">
        <tr>
          <th scope="col" className="py-1 font-medium">Share of demand</th>
          <th scope="col" className="py-1 font-medium">Smallest area ({labels.area})</th>
          <th scope="col" className="py-1 font-medium">Density at its edge ({labels.density})</th>
        </tr>
      </thead>
      <tbody>
        {thresholds.map((t) => (
          <tr key={t.percent} className="border-t border-line">
            <td className="py-1">{t.percent} %</td>
            <td className="py-1">
              {numberText(areaIn(t.areaKm2, unit))}
              {t.clipped ? <span className="ml-1 text-caution" title="The area reaches the study-area edge, so it may be larger in reality.">(at the edge)</span> : null}
            </td>
            <td className="py-1">{numberText(densityIn(t.threshold, unit))}</td>
          </tr>
        ))}
      </tbody>
    </table>
  );
}
