import { cva, type VariantProps } from 'class-variance-authority';
import type { ButtonHTMLAttributes, Ref } from 'react';
import { cn } from '../lib/cn';
import { Spinner } from '../spinner/spinner';

export const buttonVariants = cva(
  'inline-flex items-center justify-center gap-2 whitespace-nowrap rounded-control font-medium transition-colors disabled:cursor-not-allowed disabled:opacity-55',
  {
    variants: {
      variant: {
        primary: 'bg-accent text-on-accent hover:bg-accent-strong',
        secondary: 'border border-line-strong bg-surface text-ink hover:bg-sunken',
        ghost: 'text-ink-muted hover:bg-sunken hover:text-ink',
        danger: 'bg-danger text-white hover:bg-danger/90',
        link: 'px-0 text-accent underline-offset-4 hover:underline',
      },
      size: {
        sm: 'h-8 px-3 text-sm',
        md: 'h-10 px-4 text-sm',
        lg: 'h-11 px-5 text-base',
      },
    },
    defaultVariants: { variant: 'primary', size: 'md' },
  },
);

export type ButtonProps = ButtonHTMLAttributes<HTMLButtonElement> &
  VariantProps<typeof buttonVariants> & {
    /** Shows a spinner and disables the button while an action runs. */
    isLoading?: boolean;
    ref?: Ref<HTMLButtonElement>;
  };

/**
 * The product's button. Defaults to `type="button"` so it never submits a form by accident.
 * @param props button attributes plus `variant`, `size` and `isLoading`
 * @returns a `<button>` element
 * @example <Button type="submit" isLoading={mutation.isPending}>Create workspace</Button>
 */
export function Button({ className, variant, size, isLoading = false, disabled, children, type, ...props }: ButtonProps) {
  return (
    <button
      type={type ?? 'button'}
      className={cn(buttonVariants({ variant, size }), className)}
      disabled={disabled || isLoading}
      aria-busy={isLoading || undefined}
      {...props}
    >
      {isLoading ? <Spinner size="sm" label="" /> : null}
      {children}
    </button>
  );
}
