import type { InputHTMLAttributes, Ref } from 'react';
import { cn } from '../lib/cn';

export const controlClass =
  'w-full rounded-control border border-line-strong bg-surface px-3 text-sm text-ink placeholder:text-ink-faint focus-visible:border-accent disabled:bg-sunken aria-[invalid=true]:border-danger';

export type InputProps = InputHTMLAttributes<HTMLInputElement> & { ref?: Ref<HTMLInputElement> };

/**
 * A bare text input in the product style; wrap it in `Field` (or use `TextField`) for a label.
 * @param props input attributes
 * @returns an `<input>` element
 * @example <Input type="search" aria-label="Filter" />
 */
export function Input({ className, ...props }: InputProps) {
  return <input className={cn(controlClass, 'h-10', className)} {...props} />;
}
