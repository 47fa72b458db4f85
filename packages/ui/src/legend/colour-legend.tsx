import type { ReactNode } from 'react';
import { cn } from '../lib/cn';

export type ColourLegendTick = {
  /** Where the tick sits along the bar, 0 (left) to 1 (right). */
  position: number;
  label: string;
};

export type ColourLegendProps = {
  /** What the colours show, e.g. "Demand". */
  title: ReactNode;
  /** The unit, in words, shown under the title, e.g. "customers per km²". */
  unit: string;
  /** Colours from left to right, evenly spaced (the same ramp the map draws with). */
  stops: string[];
  ticks: ColourLegendTick[];
  /** Extra rows under the bar (line keys, notes). */
  children?: ReactNode;
  className?: string;
};

/**
 * A continuous colour key: title, unit, a gradient bar and tick values in tabular figures.
 * @param props title, unit, colour stops, ticks, extra rows
 * @returns the legend
 * @example
 * <ColourLegend title="Demand" unit="customers per km²" stops={['#00204d', '#fdea45']}
 *   ticks={[{ position: 0, label: '0' }, { position: 1, label: '400' }]} />
 */
export function ColourLegend({ title, unit, stops, ticks, children, className }: ColourLegendProps) {
  const gradient = stops.length === 1 ? stops[0] : `linear-gradient(to right, ${stops.join(', ')})`;
  return (
    <figure className={cn('flex flex-col gap-1.5 text-xs text-ink', className)}>
      <figcaption>
        <span className="font-semibold">{title}</span> <span className="text-ink-muted">({unit})</span>
      </figcaption>
      <div className="h-2.5 rounded-sm border border-line" style={{ background: gradient }} aria-hidden="true" />
      <div className="relative h-4 tabular-nums text-ink-muted">
        {ticks.map((tick) => (
          <span
            key={`${tick.position}-${tick.label}`}
            className="absolute top-0 -translate-x-1/2 whitespace-nowrap first:translate-x-0 last:-translate-x-full"
            style={{ left: `${Math.max(0, Math.min(1, tick.position)) * 100}%` }}
          >
            {tick.label}
          </span>
        ))}
      </div>
      {children}
    </figure>
  );
}
