import { cn } from '../lib/cn';

const sizes = { sm: 'size-4 border-2', md: 'size-6 border-2', lg: 'size-10 border-[3px]' } as const;

export type SpinnerProps = {
  size?: keyof typeof sizes;
  /** Read by screen readers; pass '' when a surrounding element already says what is loading. */
  label?: string;
  className?: string;
};

/**
 * A rotating ring shown while something loads.
 * @param props size, accessible label and extra classes
 * @returns a status element
 * @example <Spinner label="Loading workspaces" />
 */
export function Spinner({ size = 'md', label = 'Loading', className }: SpinnerProps) {
  return (
    <span role={label ? 'status' : undefined} className={cn('inline-flex items-center gap-2', className)}>
      <span
        aria-hidden="true"
        className={cn('inline-block animate-spin rounded-full border-current border-r-transparent text-accent', sizes[size])}
      />
      {label ? <span className="sr-only">{label}</span> : null}
    </span>
  );
}
