import { ColourLegend } from '@demandscape/ui';
import { interpolateGnBu } from 'd3-scale-chromatic';
import { rampStops } from '../utils/colour-ramp';
import { tickText } from '../utils/density-unit';
import { sequentialLegendTicks } from '../utils/legend-scale';

/** Customer bins: ColorBrewer GnBu (sequential, colour-blind safe), distinct from the surface's cividis. */
export const customerInterpolator = interpolateGnBu;

/**
 * MapLibre `interpolate` stops for the bins' fill colour, from the lightest useful green (t = 0.2) at 0.
 * @param maxCount the largest bin count
 * @returns `[count, colour]` pairs, ascending
 * @example customerColourStops(120) // [[0, 'rgb(…)'], [24, …], …, [120, 'rgb(8, 64, 129)']]
 */
export function customerColourStops(maxCount: number): Array<[number, string]> {
  const top = Math.max(1, maxCount);
  return [0, 0.25, 0.5, 0.75, 1].map((t) => [t * top, customerInterpolator(0.2 + 0.8 * t)]);
}

/**
 * Key for the aggregated customer bins, with the privacy rule spelled out.
 * @param props largest bin count, bin side, the suppression threshold and what it hid
 * @returns the legend
 * @example <CustomerLegend maxCount={120} binSizeM={500} minCount={11} />
 */
export function CustomerLegend(props: { maxCount: number; binSizeM?: number; minCount?: number; suppressedCustomers?: number }) {
  const side = props.binSizeM ? (props.binSizeM >= 1000 ? `${tickText(props.binSizeM / 1000)} km` : `${props.binSizeM} m`) : null;
  return (
    <ColourLegend
      title="Customers"
      unit={side ? `customers per ${side} square` : 'customers per square'}
      stops={rampStops((t) => customerInterpolator(0.2 + 0.8 * t), 5)}
      ticks={sequentialLegendTicks(props.maxCount, 3)}
    >
      <p className="text-ink-muted">
        Counted in squares; squares with fewer than {props.minCount ?? 11} customers are hidden
        {props.suppressedCustomers ? ` (${props.suppressedCustomers.toLocaleString('en')} customers in them)` : ''}, and single customers are
        never shown.
      </p>
    </ColourLegend>
  );
}
