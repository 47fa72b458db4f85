import type { HTMLAttributes, ReactNode } from 'react';
import { cn } from '../lib/cn';

/**
 * A white panel on the canvas.
 * @param props div attributes
 * @returns the panel
 * @example <Card><CardHeader title="Profile" /></Card>
 */
export function Card({ className, ...props }: HTMLAttributes<HTMLDivElement>) {
  return <div className={cn('rounded-panel border border-line bg-surface shadow-panel', className)} {...props} />;
}

export type CardHeaderProps = { title: ReactNode; description?: ReactNode; actions?: ReactNode; className?: string };

/**
 * A panel heading with an optional one-line description and actions on the right.
 * @param props title, description and actions
 * @returns the header block
 * @example <CardHeader title="Members" description="Everyone in this organization." />
 */
export function CardHeader({ title, description, actions, className }: CardHeaderProps) {
  return (
    <div className={cn('flex items-start justify-between gap-4 border-b border-line px-5 py-4', className)}>
      <div className="min-w-0">
        <h2 className="text-base font-semibold text-ink">{title}</h2>
        {description ? <p className="mt-0.5 text-sm text-ink-muted">{description}</p> : null}
      </div>
      {actions ? <div className="flex shrink-0 items-center gap-2">{actions}</div> : null}
    </div>
  );
}
