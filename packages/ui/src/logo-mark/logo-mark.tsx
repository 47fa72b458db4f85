import { cn } from '../lib/cn';

export type LogoMarkProps = {
  /** Side length in pixels. */
  size?: number;
  className?: string;
  /** Accessible name; pass '' when the word "Demandscape" is shown next to the mark. */
  title?: string;
};

/**
 * The Demandscape mark: three nested contour rings drawn tighter toward a peak, the way a demand
 * surface's percent-volume contours close in on its densest cell.
 * @param props size in px, extra classes, accessible title
 * @returns an inline SVG
 * @example <LogoMark size={28} title="" />
 */
export function LogoMark({ size = 28, className, title = 'Demandscape' }: LogoMarkProps) {
  return (
    <svg
      width={size}
      height={size}
      viewBox="0 0 32 32"
      role={title ? 'img' : undefined}
      aria-hidden={title ? undefined : true}
      aria-label={title || undefined}
      className={cn('shrink-0 text-accent', className)}
    >
      <path
        d="M16.4 3.2c6.9-.2 12.6 4.6 12.4 11.3-.2 6.2-4.3 9.3-8.6 11.6-3.7 2-6.4 3.6-10.3 2.3C5.3 26.8 3 22.3 3.3 17.1 3.7 9.6 9.5 3.4 16.4 3.2Z"
        fill="none"
        stroke="currentColor"
        strokeWidth="1.6"
        opacity="0.45"
      />
      <path
        d="M17.6 8.1c4.5-.1 7.5 3.1 7.2 7.2-.3 3.6-2.6 5.4-5.2 6.8-2.3 1.2-4.3 2-6.5 1.1-2.3-.9-3.7-3.5-3.4-6.4.4-4.6 3.7-8.6 7.9-8.7Z"
        fill="none"
        stroke="currentColor"
        strokeWidth="1.8"
        opacity="0.75"
      />
      <path
        d="M18.9 12.4c2.2 0 3.6 1.5 3.4 3.5-.2 1.9-1.7 3.4-3.6 3.6-1.9.2-3.4-1.1-3.3-3.1.1-2.2 1.5-4 3.5-4Z"
        fill="currentColor"
      />
    </svg>
  );
}
