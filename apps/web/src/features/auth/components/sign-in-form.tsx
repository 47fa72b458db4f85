import { Alert, Button, TextField } from '@demandscape/ui';
import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { Link } from 'react-router';
import { paths } from '../../../config/paths';
import { errorMessage } from '../../../lib/api-error';
import { serverErrorsOnFields } from '../../../lib/form-errors';
import { signInInputSchema, useSignIn, type SignInInput } from '../api/sign-in';

export type SignInFormProps = { onSuccess: () => void; redirectTo?: string | null };

/**
 * E-mail and password sign-in with field checks; the server's answer to a wrong e-mail or password is
 * deliberately generic and shown above the form.
 * @param props what to do after signing in, and the return path to keep on the sign-up link
 * @returns the form
 * @example <SignInForm onSuccess={() => navigate(redirectTo)} />
 */
export function SignInForm({ onSuccess, redirectTo }: SignInFormProps) {
  const [formError, setFormError] = useState<string | null>(null);
  const form = useForm<SignInInput>({ resolver: zodResolver(signInInputSchema), defaultValues: { email: '', password: '' } });
  const signInMutation = useSignIn({ onSuccess: () => onSuccess() });
  const { errors } = form.formState;

  const submit = form.handleSubmit((input) => {
    setFormError(null);
    signInMutation.mutate(input, {
      onError: (error) => {
        if (!serverErrorsOnFields(error, form.setError, ['email', 'password'])) setFormError(errorMessage(error));
      },
    });
  });

  return (
    <form onSubmit={submit} noValidate className="flex flex-col gap-4">
      {formError ? (
        <Alert tone="danger" title="Could not sign in">
          {formError}
        </Alert>
      ) : null}
      <TextField label="E-mail" type="email" autoComplete="email" error={errors.email?.message} {...form.register('email')} />
      <TextField
        label="Password"
        type="password"
        autoComplete="current-password"
        error={errors.password?.message}
        {...form.register('password')}
      />
      <div className="flex justify-end">
        <Link to={paths.auth.forgotPassword.getHref()} className="text-sm text-accent hover:underline">
          Forgot your password?
        </Link>
      </div>
      <Button type="submit" size="lg" isLoading={signInMutation.isPending}>
        Sign in
      </Button>
      <p className="text-center text-sm text-ink-muted">
        New to Demandscape?{' '}
        <Link to={paths.auth.signUp.getHref(redirectTo)} className="font-medium text-accent hover:underline">
          Create an account
        </Link>
      </p>
    </form>
  );
}
