import type { ReactNode, Ref, TextareaHTMLAttributes } from 'react';
import { Field } from '../field/field';
import { controlClass } from '../input/input';
import { cn } from '../lib/cn';

export type TextAreaFieldProps = Omit<TextareaHTMLAttributes<HTMLTextAreaElement>, 'id'> & {
  label: ReactNode;
  hint?: ReactNode;
  error?: string;
  ref?: Ref<HTMLTextAreaElement>;
};

/**
 * A labelled multi-line text input.
 * @param props textarea attributes plus label, hint and error
 * @returns the field
 * @example <TextAreaField label="Description" rows={3} {...register('description')} />
 */
export function TextAreaField({ label, hint, error, className, ...props }: TextAreaFieldProps) {
  return (
    <Field label={label} hint={hint} error={error} className={className}>
      {(control) => <textarea className={cn(controlClass, 'min-h-20 py-2')} {...control} {...props} />}
    </Field>
  );
}
