import type { ReactNode } from 'react';
import { cn } from '../lib/cn';

export type EmptyStateProps = {
  title: ReactNode;
  children?: ReactNode;
  /** A button or link that gets the user out of the empty state. */
  action?: ReactNode;
  icon?: ReactNode;
  className?: string;
};

/**
 * Says plainly that there is nothing here yet, why, and what to do next.
 * @param props title, explanation, optional action and icon
 * @returns the empty-state block
 * @example <EmptyState title="No workspaces yet" action={<Button>New workspace</Button>} />
 */
export function EmptyState({ title, children, action, icon, className }: EmptyStateProps) {
  return (
    <div className={cn('flex flex-col items-center justify-center gap-3 px-6 py-12 text-center', className)}>
      {icon ? <div className="text-ink-faint">{icon}</div> : null}
      <h3 className="text-base font-semibold text-ink">{title}</h3>
      {children ? <div className="max-w-md text-sm text-ink-muted">{children}</div> : null}
      {action ? <div className="mt-2">{action}</div> : null}
    </div>
  );
}
