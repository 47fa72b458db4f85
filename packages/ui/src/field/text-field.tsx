import type { ReactNode } from 'react';
import { Input, type InputProps } from '../input/input';
import { Field } from './field';

export type TextFieldProps = Omit<InputProps, 'id'> & { label: ReactNode; hint?: ReactNode; error?: string };

/**
 * A labelled text input with hint and error text; spreads react-hook-form's `register()` result.
 * @param props input attributes plus label, hint and error
 * @returns the field
 * @example <TextField label="E-mail" type="email" error={errors.email?.message} {...register('email')} />
 */
export function TextField({ label, hint, error, className, ...props }: TextFieldProps) {
  return (
    <Field label={label} hint={hint} error={error} className={className}>
      {(control) => <Input {...control} {...props} />}
    </Field>
  );
}
