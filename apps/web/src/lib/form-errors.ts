import type { FieldValues, Path, UseFormSetError } from 'react-hook-form';
import { ApiError } from './api-error';

/**
 * Puts a server's validation errors on the matching form fields.
 * @param error what the mutation threw
 * @param setError react-hook-form's `setError`
 * @param fieldNames the fields this form has (errors for other fields are not shown on a field)
 * @returns true when at least one error was placed on a field; otherwise the caller shows `error.message`
 * @example if (!serverErrorsOnFields(err, form.setError, ['name'])) setFormError(errorMessage(err));
 */
export function serverErrorsOnFields<T extends FieldValues>(
  error: unknown,
  setError: UseFormSetError<T>,
  fieldNames: readonly Path<T>[],
): boolean {
  if (!(error instanceof ApiError)) return false;
  const known = new Set<string>(fieldNames);
  const placed = new Set<string>();
  for (const [field, message] of Object.entries(error.fields ?? {})) {
    if (known.has(field)) {
      setError(field as Path<T>, { type: 'server', message });
      placed.add(field);
    }
  }
  if (error.field && known.has(error.field) && !placed.has(error.field)) {
    setError(error.field as Path<T>, { type: 'server', message: error.message }, { shouldFocus: true });
    placed.add(error.field);
  }
  return placed.size > 0;
}
