import { cva, type VariantProps } from 'class-variance-authority';
import type { ReactNode } from 'react';
import { cn } from '../lib/cn';

const alertVariants = cva('rounded-control border px-4 py-3 text-sm', {
  variants: {
    tone: {
      info: 'border-accent/30 bg-accent-soft text-ink',
      success: 'border-success/30 bg-success-soft text-ink',
      caution: 'border-caution/40 bg-caution-soft text-ink',
      danger: 'border-danger/30 bg-danger-soft text-ink',
    },
  },
  defaultVariants: { tone: 'info' },
});

export type AlertProps = VariantProps<typeof alertVariants> & {
  title?: ReactNode;
  children?: ReactNode;
  className?: string;
};

/**
 * A boxed message. Danger alerts use `role="alert"` so screen readers announce them at once.
 * @param props tone, optional bold title and body
 * @returns the message box
 * @example <Alert tone="danger" title="Could not sign in">E-mail or password is incorrect.</Alert>
 */
export function Alert({ tone, title, children, className }: AlertProps) {
  return (
    <div role={tone === 'danger' ? 'alert' : 'status'} className={cn(alertVariants({ tone }), className)}>
      {title ? <p className="font-semibold">{title}</p> : null}
      {children ? <div className={title ? 'mt-0.5 text-ink-muted' : undefined}>{children}</div> : null}
    </div>
  );
}
