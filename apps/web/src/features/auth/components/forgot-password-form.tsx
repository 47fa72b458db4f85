import { Alert, Button, TextField } from '@demandscape/ui';
import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { Link } from 'react-router';
import { paths } from '../../../config/paths';
import { errorMessage } from '../../../lib/api-error';
import { serverErrorsOnFields } from '../../../lib/form-errors';
import { forgotPasswordInputSchema, useRequestPasswordReset, type ForgotPasswordInput } from '../api/forgot-password';

/**
 * Asks for a reset link. The confirmation never says whether the account exists, so the form
 * cannot be used to find out who has one.
 * @returns the form, or the confirmation after sending
 * @example <ForgotPasswordForm />
 */
export function ForgotPasswordForm() {
  const [formError, setFormError] = useState<string | null>(null);
  const [sentTo, setSentTo] = useState<string | null>(null);
  const form = useForm<ForgotPasswordInput>({ resolver: zodResolver(forgotPasswordInputSchema), defaultValues: { email: '' } });
  const mutation = useRequestPasswordReset();

  const submit = form.handleSubmit((input) => {
    setFormError(null);
    mutation.mutate(input, {
      onSuccess: () => setSentTo(input.email),
      onError: (error) => {
        if (!serverErrorsOnFields(error, form.setError, ['email'])) setFormError(errorMessage(error));
      },
    });
  });

  if (sentTo) {
    return (
      <div className="flex flex-col gap-4">
        <Alert tone="success" title="Check your inbox">
          If an account exists for {sentTo}, we have sent it a link to choose a new password. The link works once, for
          one hour.
        </Alert>
        <Link to={paths.auth.signIn.getHref()} className="text-center text-sm font-medium text-accent hover:underline">
          Back to sign in
        </Link>
      </div>
    );
  }

  return (
    <form onSubmit={submit} noValidate className="flex flex-col gap-4">
      {formError ? <Alert tone="danger">{formError}</Alert> : null}
      <TextField
        label="E-mail"
        type="email"
        autoComplete="email"
        error={form.formState.errors.email?.message}
        {...form.register('email')}
      />
      <Button type="submit" size="lg" isLoading={mutation.isPending}>
        Send reset link
      </Button>
      <Link to={paths.auth.signIn.getHref()} className="text-center text-sm text-accent hover:underline">
        Back to sign in
      </Link>
    </form>
  );
}
