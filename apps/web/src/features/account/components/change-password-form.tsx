import { Alert, Button, Card, CardHeader, TextField } from '@demandscape/ui';
import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { ApiError, errorMessage } from '../../../lib/api-error';
import { serverErrorsOnFields } from '../../../lib/form-errors';
import { changePasswordInputSchema, useChangePassword, type ChangePasswordInput } from '../api/change-password';

const emptyValues: ChangePasswordInput = { currentPassword: '', newPassword: '', confirmPassword: '' };

/**
 * Changes the password; a wrong current password is shown on that field.
 * @returns a card with the form
 * @example <ChangePasswordForm />
 */
export function ChangePasswordForm() {
  const [status, setStatus] = useState<{ tone: 'success' | 'danger'; message: string } | null>(null);
  const form = useForm<ChangePasswordInput>({ resolver: zodResolver(changePasswordInputSchema), defaultValues: emptyValues });
  const mutation = useChangePassword();
  const { errors } = form.formState;

  const submit = form.handleSubmit((input) => {
    setStatus(null);
    mutation.mutate(input, {
      onSuccess: () => {
        form.reset(emptyValues);
        setStatus({ tone: 'success', message: 'Password changed. Use the new one next time you sign in.' });
      },
      onError: (error) => {
        if (serverErrorsOnFields(error, form.setError, ['currentPassword', 'newPassword'])) return;
        if (error instanceof ApiError && (error.code === 'INVALID_CREDENTIALS' || error.status === 401)) {
          form.setError('currentPassword', { type: 'server', message: error.message }, { shouldFocus: true });
          return;
        }
        setStatus({ tone: 'danger', message: errorMessage(error) });
      },
    });
  });

  return (
    <Card>
      <CardHeader title="Password" description="Choose a new password of at least 10 characters." />
      <form onSubmit={submit} noValidate className="flex flex-col gap-4 p-5">
        {status ? <Alert tone={status.tone}>{status.message}</Alert> : null}
        <TextField
          label="Current password"
          type="password"
          autoComplete="current-password"
          error={errors.currentPassword?.message}
          {...form.register('currentPassword')}
        />
        <TextField
          label="New password"
          type="password"
          autoComplete="new-password"
          error={errors.newPassword?.message}
          {...form.register('newPassword')}
        />
        <TextField
          label="New password, again"
          type="password"
          autoComplete="new-password"
          error={errors.confirmPassword?.message}
          {...form.register('confirmPassword')}
        />
        <div>
          <Button type="submit" isLoading={mutation.isPending}>
            Change password
          </Button>
        </div>
      </form>
    </Card>
  );
}
