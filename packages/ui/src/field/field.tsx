import { useId, type ReactNode } from 'react';
import { cn } from '../lib/cn';

export type FieldControlProps = {
  id: string;
  'aria-invalid': boolean | undefined;
  'aria-describedby': string | undefined;
};

export type FieldProps = {
  label: ReactNode;
  /** One plain sentence under the control: what it does, or the rule it follows. */
  hint?: ReactNode;
  /** The validation message; marks the control invalid and is announced. */
  error?: string;
  className?: string;
  children: (control: FieldControlProps) => ReactNode;
};

/**
 * Lays out a label, a control, a hint and an error, and wires their ids for assistive technology.
 * @param props label, hint, error and a render function that receives the control's aria props
 * @returns the labelled field
 * @example <Field label="Name" error={err}>{(p) => <Input {...p} {...register('name')} />}</Field>
 */
export function Field({ label, hint, error, className, children }: FieldProps) {
  const id = useId();
  const hintId = hint ? `${id}-hint` : undefined;
  const errorId = error ? `${id}-error` : undefined;
  const describedBy = [errorId, hintId].filter(Boolean).join(' ') || undefined;
  return (
    <div className={cn('flex flex-col gap-1.5', className)}>
      <label htmlFor={id} className="text-sm font-medium text-ink">
        {label}
      </label>
      {children({ id, 'aria-invalid': error ? true : undefined, 'aria-describedby': describedBy })}
      {error ? (
        <p id={errorId} className="text-sm text-danger" role="alert">
          {error}
        </p>
      ) : null}
      {hint ? (
        <p id={hintId} className="text-xs text-ink-muted">
          {hint}
        </p>
      ) : null}
    </div>
  );
}
