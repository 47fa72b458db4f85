import { Alert, Button, TextField } from '@demandscape/ui';
import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { Link } from 'react-router';
import { paths } from '../../../config/paths';
import { ApiError, errorMessage } from '../../../lib/api-error';
import { serverErrorsOnFields } from '../../../lib/form-errors';
import { PASSWORD_MIN_LENGTH, signUpInputSchema, useSignUp, type SignUpInput } from '../api/sign-up';

export type SignUpFormProps = { onSuccess: () => void; redirectTo?: string | null };

/**
 * Account creation: name, e-mail, password twice. A taken e-mail is shown on the e-mail field.
 * @param props what to do after the account exists, and the return path to keep on the sign-in link
 * @returns the form
 * @example <SignUpForm onSuccess={() => navigate('/welcome')} />
 */
export function SignUpForm({ onSuccess, redirectTo }: SignUpFormProps) {
  const [formError, setFormError] = useState<string | null>(null);
  const form = useForm<SignUpInput>({
    resolver: zodResolver(signUpInputSchema),
    defaultValues: { name: '', email: '', password: '', confirmPassword: '' },
  });
  const signUpMutation = useSignUp({ onSuccess: () => onSuccess() });
  const { errors } = form.formState;

  const submit = form.handleSubmit((input) => {
    setFormError(null);
    signUpMutation.mutate(input, {
      onError: (error) => {
        if (error instanceof ApiError && error.code === 'EMAIL_TAKEN') {
          form.setError('email', { type: 'server', message: error.message }, { shouldFocus: true });
          return;
        }
        if (!serverErrorsOnFields(error, form.setError, ['name', 'email', 'password'])) setFormError(errorMessage(error));
      },
    });
  });

  return (
    <form onSubmit={submit} noValidate className="flex flex-col gap-4">
      {formError ? (
        <Alert tone="danger" title="Could not create the account">
          {formError}
        </Alert>
      ) : null}
      <TextField label="Your name" autoComplete="name" error={errors.name?.message} {...form.register('name')} />
      <TextField label="Work e-mail" type="email" autoComplete="email" error={errors.email?.message} {...form.register('email')} />
      <TextField
        label="Password"
        type="password"
        autoComplete="new-password"
        hint={`At least ${PASSWORD_MIN_LENGTH} characters; a few unrelated words make a strong one.`}
        error={errors.password?.message}
        {...form.register('password')}
      />
      <TextField
        label="Password, again"
        type="password"
        autoComplete="new-password"
        error={errors.confirmPassword?.message}
        {...form.register('confirmPassword')}
      />
      <Button type="submit" size="lg" isLoading={signUpMutation.isPending}>
        Create account
      </Button>
      <p className="text-center text-sm text-ink-muted">
        Already have an account?{' '}
        <Link to={paths.auth.signIn.getHref(redirectTo)} className="font-medium text-accent hover:underline">
          Sign in
        </Link>
      </p>
    </form>
  );
}
