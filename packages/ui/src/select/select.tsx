import type { Ref, SelectHTMLAttributes } from 'react';
import { controlClass } from '../input/input';
import { cn } from '../lib/cn';

export type SelectProps = SelectHTMLAttributes<HTMLSelectElement> & { ref?: Ref<HTMLSelectElement> };

/**
 * A native select in the product style (native keeps keyboard and screen-reader behaviour for free).
 * @param props select attributes and `<option>` children
 * @returns a `<select>` element
 * @example <Select aria-label="Action"><option value="">All actions</option></Select>
 */
export function Select({ className, ...props }: SelectProps) {
  return <select className={cn(controlClass, 'h-10 pr-8', className)} {...props} />;
}
