import { Alert, Button, Card, CardHeader, TextField } from '@demandscape/ui';
import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { errorMessage } from '../../../lib/api-error';
import { serverErrorsOnFields } from '../../../lib/form-errors';
import type { User } from '../../../types/api';
import { updateProfileInputSchema, useUpdateProfile, type UpdateProfileInput } from '../api/update-profile';

/**
 * The user's display name, editable.
 * @param props the signed-in user
 * @returns a card with the form
 * @example <ProfileForm user={me.user} />
 */
export function ProfileForm({ user }: { user: User }) {
  const [status, setStatus] = useState<{ tone: 'success' | 'danger'; message: string } | null>(null);
  const form = useForm<UpdateProfileInput>({ resolver: zodResolver(updateProfileInputSchema), values: { name: user.name } });
  const mutation = useUpdateProfile();

  const submit = form.handleSubmit((input) => {
    setStatus(null);
    mutation.mutate(input, {
      onSuccess: () => setStatus({ tone: 'success', message: 'Name saved.' }),
      onError: (error) => {
        if (!serverErrorsOnFields(error, form.setError, ['name'])) setStatus({ tone: 'danger', message: errorMessage(error) });
      },
    });
  });

  return (
    <Card>
      <CardHeader title="Profile" description="How teammates see you in member lists and the audit log." />
      <form onSubmit={submit} noValidate className="flex flex-col gap-4 p-5">
        {status ? <Alert tone={status.tone}>{status.message}</Alert> : null}
        <TextField label="Name" autoComplete="name" error={form.formState.errors.name?.message} {...form.register('name')} />
        <div>
          <Button type="submit" isLoading={mutation.isPending} disabled={!form.formState.isDirty}>
            Save name
          </Button>
        </div>
      </form>
    </Card>
  );
}
