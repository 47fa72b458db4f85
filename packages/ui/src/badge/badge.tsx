import { cva, type VariantProps } from 'class-variance-authority';
import type { HTMLAttributes } from 'react';
import { cn } from '../lib/cn';

const badgeVariants = cva('inline-flex items-center whitespace-nowrap rounded-full px-2 py-0.5 text-xs font-medium', {
  variants: {
    tone: {
      neutral: 'bg-sunken text-ink-muted',
      accent: 'bg-accent-soft text-accent-strong',
      success: 'bg-success-soft text-success',
      caution: 'bg-caution-soft text-caution',
      danger: 'bg-danger-soft text-danger',
    },
  },
  defaultVariants: { tone: 'neutral' },
});

export type BadgeProps = HTMLAttributes<HTMLSpanElement> & VariantProps<typeof badgeVariants>;

/**
 * A small label for a state or a role.
 * @param props span attributes and tone
 * @returns the badge
 * @example <Badge tone="accent">owner</Badge>
 */
export function Badge({ tone, className, ...props }: BadgeProps) {
  return <span className={cn(badgeVariants({ tone }), className)} {...props} />;
}
