import { cn } from '../lib/cn';

export type ProgressBarProps = {
  /** Share done, 0–1; `null` while the amount is unknown (an animated stripe is shown instead). */
  value: number | null;
  /** Names the bar for assistive technology, e.g. "Demand surface progress". */
  label: string;
  /** Shown under the bar; defaults to the percentage. */
  valueText?: string;
  tone?: 'accent' | 'success' | 'danger';
  className?: string;
};

const fills = { accent: 'bg-accent', success: 'bg-success', danger: 'bg-danger' } as const;

/**
 * A horizontal progress bar with the native `progressbar` role and its value as text.
 * @param props share done (0–1 or null), label, optional value text and tone
 * @returns the bar
 * @example <ProgressBar value={0.3} label="Import progress" />
 */
export function ProgressBar({ value, label, valueText, tone = 'accent', className }: ProgressBarProps) {
  const clamped = value === null || !Number.isFinite(value) ? null : Math.min(1, Math.max(0, value));
  const percent = clamped === null ? null : Math.round(clamped * 100);
  const text = valueText ?? (percent === null ? 'Waiting to start' : `${percent} %`);
  return (
    <div className={cn('flex flex-col gap-1', className)}>
      <div
        role="progressbar"
        aria-label={label}
        aria-valuemin={0}
        aria-valuemax={100}
        aria-valuenow={percent ?? undefined}
        aria-valuetext={text}
        className="h-2 w-full overflow-hidden rounded-full bg-sunken"
      >
        <div
          className={cn('h-full rounded-full transition-[width] duration-500', fills[tone], percent === null && 'w-1/4 animate-pulse')}
          style={percent === null ? undefined : { width: `${percent}%` }}
        />
      </div>
      <span className="text-xs text-ink-muted tabular-nums">{text}</span>
    </div>
  );
}
