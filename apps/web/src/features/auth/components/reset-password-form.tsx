import { Alert, Button, TextField } from '@demandscape/ui';
import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { Link } from 'react-router';
import { paths } from '../../../config/paths';
import { ApiError, errorMessage } from '../../../lib/api-error';
import { serverErrorsOnFields } from '../../../lib/form-errors';
import { PASSWORD_MIN_LENGTH } from '../api/sign-up';
import { resetPasswordInputSchema, useResetPassword } from '../api/reset-password';
import type { z } from 'zod';

type FormValues = z.infer<typeof resetPasswordInputSchema>;

/**
 * Chooses a new password with the token from the reset e-mail.
 * @param props the token from the link
 * @returns the form, the success message, or an explanation when the link is unusable
 * @example <ResetPasswordForm token={searchParams.get('token')} />
 */
export function ResetPasswordForm({ token }: { token: string | null }) {
  const [formError, setFormError] = useState<{ message: string; expired: boolean } | null>(null);
  const [done, setDone] = useState(false);
  const form = useForm<FormValues>({
    resolver: zodResolver(resetPasswordInputSchema),
    defaultValues: { password: '', confirmPassword: '' },
  });
  const mutation = useResetPassword();

  if (!token) {
    return (
      <Alert tone="danger" title="This link is incomplete">
        Open the link from the e-mail exactly as it arrived, or{' '}
        <Link to={paths.auth.forgotPassword.getHref()} className="font-medium text-accent underline">
          ask for a new one
        </Link>
        .
      </Alert>
    );
  }

  if (done) {
    return (
      <div className="flex flex-col gap-4">
        <Alert tone="success" title="Password changed">
          Sign in with your new password.
        </Alert>
        <Link to={paths.auth.signIn.getHref()} className="text-center text-sm font-medium text-accent hover:underline">
          Go to sign in
        </Link>
      </div>
    );
  }

  const submit = form.handleSubmit((input) => {
    setFormError(null);
    mutation.mutate(
      { ...input, token },
      {
        onSuccess: () => setDone(true),
        onError: (error) => {
          if (serverErrorsOnFields(error, form.setError, ['password'])) return;
          const expired = error instanceof ApiError && error.code === 'TOKEN_INVALID';
          setFormError({
            message: expired ? 'This reset link has expired or was already used. Links work once, for one hour.' : errorMessage(error),
            expired,
          });
        },
      },
    );
  });

  return (
    <form onSubmit={submit} noValidate className="flex flex-col gap-4">
      {formError ? (
        <Alert tone="danger">
          {formError.message}{' '}
          {formError.expired ? (
            <Link to={paths.auth.forgotPassword.getHref()} className="font-medium text-accent underline">
              Ask for a new link
            </Link>
          ) : null}
        </Alert>
      ) : null}
      <TextField
        label="New password"
        type="password"
        autoComplete="new-password"
        hint={`At least ${PASSWORD_MIN_LENGTH} characters.`}
        error={form.formState.errors.password?.message}
        {...form.register('password')}
      />
      <TextField
        label="New password, again"
        type="password"
        autoComplete="new-password"
        error={form.formState.errors.confirmPassword?.message}
        {...form.register('confirmPassword')}
      />
      <Button type="submit" size="lg" isLoading={mutation.isPending}>
        Set new password
      </Button>
    </form>
  );
}
