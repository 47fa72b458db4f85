import { clsx, type ClassValue } from 'clsx';
import { twMerge } from 'tailwind-merge';

/**
 * Joins class names and lets later Tailwind utilities override earlier ones.
 * @param inputs class strings, arrays or `{ class: condition }` maps
 * @returns one merged class string
 * @example cn('px-2 text-ink', isActive && 'text-accent') // 'px-2 text-accent' when active
 */
export function cn(...inputs: ClassValue[]): string {
  return twMerge(clsx(inputs));
}
