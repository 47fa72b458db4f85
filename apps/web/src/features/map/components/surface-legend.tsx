import { ColourLegend } from '@demandscape/ui';
import type { SurfaceThreshold } from '../types';
import { densityInterpolator, differenceInterpolator, fadedRampStops, rampStops } from '../utils/colour-ramp';
import { RASTER_FADE_SHARE } from '../utils/raster-colouring';
import { areaText, densityUnitLabel, type AreaUnit, type WeightKind } from '../utils/density-unit';
import { contourDash, CONTOUR_COLOUR } from '../lib/map-layers';
import { divergingLegendTicks, sequentialLegendTicks } from '../utils/legend-scale';

/** The caution shown with every surface: it feeds real-estate decisions. */
export const SURFACE_CAUTION =
  'Estimated from a sample of customers — not a forecast of sales; check leases, zoning and local rules with licensed professionals.';

export type SurfaceLegendProps = {
  unit: AreaUnit;
  weightKind: WeightKind;
  weightLabel?: string | null;
  /** Sequential: the raster's maximum. Difference: the half-width of the centred scale. */
  scaleTop: number;
  mode: 'surface' | 'difference';
  compareName?: string;
  thresholds: SurfaceThreshold[] | null;
  contourVisible: Record<number, boolean>;
  onContourToggle: (percent: number, visible: boolean) => void;
};

function LineSample({ percent }: { percent: number }) {
  const dash = contourDash[percent];
  return (
    <svg width="28" height="8" aria-hidden="true" className="shrink-0">
      <line x1="1" y1="4" x2="27" y2="4" stroke={CONTOUR_COLOUR} strokeWidth={percent === 50 ? 2 : 1.5} strokeDasharray={dash?.map((d) => d * 1.5).join(' ')} />
    </svg>
  );
}

/**
 * The surface's key: colour bar in real units, the percent-volume contour switches with their areas,
 * and the caution text.
 * @param props unit, weight kind, scale, contour state
 * @returns the legend panel
 * @example <SurfaceLegend unit="km2" weightKind="count" scaleTop={412} mode="surface" thresholds={surface.thresholds} … />
 */
export function SurfaceLegend(props: SurfaceLegendProps) {
  const unitText = densityUnitLabel(props.weightKind, props.unit, props.weightLabel);
  const difference = props.mode === 'difference';
  return (
    <div className="flex flex-col gap-3">
      <ColourLegend
        title={difference ? `Difference: ${props.compareName ?? 'other surface'} minus this one` : 'Demand'}
        unit={unitText}
        stops={difference ? rampStops(differenceInterpolator) : fadedRampStops(densityInterpolator, 21, RASTER_FADE_SHARE)}
        ticks={difference ? divergingLegendTicks(props.scaleTop) : sequentialLegendTicks(props.scaleTop)}
      >
        {difference ? (
          <p className="text-ink-muted">Orange: more demand in the compared surface; purple: less. Near-zero differences are left clear.</p>
        ) : (
          <p className="text-ink-muted">The lowest tenth of the scale fades into the map; cells under 0.5 % of the top value are left clear.</p>
        )}
      </ColourLegend>
      {!difference && props.thresholds?.length ? (
        <fieldset className="flex flex-col gap-1 text-xs">
          <legend className="mb-1 font-semibold text-ink">Percent-volume contours</legend>
          {props.thresholds.map((t) => (
            <label key={t.percent} className="flex items-center gap-2 text-ink">
              <input
                type="checkbox"
                checked={props.contourVisible[t.percent] ?? false}
                onChange={(event) => props.onContourToggle(t.percent, event.target.checked)}
                className="accent-accent"
              />
              <LineSample percent={t.percent} />
              <span>
                {t.percent} % of demand within <span className="tabular-nums">{areaText(t.areaKm2, props.unit)}</span>
                {t.clipped ? <span className="text-caution"> (reaches the study-area edge)</span> : null}
              </span>
            </label>
          ))}
        </fieldset>
      ) : null}
      <p className="rounded-control border border-caution/40 bg-caution-soft px-2.5 py-2 text-xs text-ink">{SURFACE_CAUTION}</p>
    </div>
  );
}
