import type { InputHTMLAttributes, Ref } from 'react';

export type ToggleFieldProps = Omit<InputHTMLAttributes<HTMLInputElement>, 'type'> & {
  label: string;
  hint: string;
  ref?: Ref<HTMLInputElement>;
};

/**
 * A checkbox with its label and a one-line explanation; spreads react-hook-form's `register()` result.
 * @param props input attributes plus label and hint
 * @returns the labelled checkbox
 * @example <ToggleField label="Edge correction" hint="…" {...register('edgeCorrection')} />
 */
export function ToggleField({ label, hint, ...props }: ToggleFieldProps) {
  return (
    <label className="flex items-start gap-2 text-sm text-ink">
      <input type="checkbox" className="mt-0.5 size-4 accent-accent" {...props} />
      <span>
        {label}
        <span className="block text-xs text-ink-muted">{hint}</span>
      </span>
    </label>
  );
}
