import type { ReactNode } from 'react';
import { cn } from '../lib/cn';

export type StatProps = {
  label: ReactNode;
  value: ReactNode;
  /** The unit beside the number (always shown when the number has one). */
  unit?: ReactNode;
  /** One short line under the number. */
  hint?: ReactNode;
  tone?: 'neutral' | 'success' | 'caution' | 'danger';
  className?: string;
};

const tones = { neutral: 'text-ink', success: 'text-success', caution: 'text-caution', danger: 'text-danger' } as const;

/**
 * A labelled key number, set in tabular figures with its unit.
 * @param props label, value, optional unit, hint and tone
 * @returns a description-list group (`<dl>` with one term and one value)
 * @example <Stat label="Accepted" value="48,210" unit="rows" tone="success" />
 */
export function Stat({ label, value, unit, hint, tone = 'neutral', className }: StatProps) {
  return (
    <dl className={cn('flex flex-col gap-0.5 rounded-control border border-line bg-surface px-3 py-2', className)}>
      <dt className="text-xs text-ink-muted">{label}</dt>
      <dd className={cn('text-lg font-semibold tabular-nums', tones[tone])}>
        {value}
        {unit ? <span className="ml-1 text-xs font-normal text-ink-muted">{unit}</span> : null}
      </dd>
      {hint ? <dd className="text-xs text-ink-faint">{hint}</dd> : null}
    </dl>
  );
}
