import { valueText } from '../utils/density-unit';

/**
 * The value under the cursor, sampled from the raster already loaded (no request per move).
 * @param props the sampled value (null off the raster, NaN outside the study area) and the unit text
 * @returns a one-line read-out, or a hint when the cursor is not on the map
 * @example <HoverReadout value={412.3} unitText="customers per km²" />
 */
export function HoverReadout({ value, unitText, signed = false }: { value: number | null | undefined; unitText: string; signed?: boolean }) {
  let text: string;
  if (value === undefined) text = 'Point at the map to read the value there.';
  else if (value === null || Number.isNaN(value)) text = 'Outside the surface.';
  else text = `${signed && value > 0 ? '+' : ''}${valueText(value)} ${unitText}`;
  return (
    <p aria-live="polite" className="rounded-control bg-surface/95 px-2.5 py-1.5 text-xs text-ink tabular-nums shadow-panel">
      {text}
    </p>
  );
}
