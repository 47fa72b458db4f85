import { Alert, Button, Field, Select, TextField } from '@demandscape/ui';
import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { Link } from 'react-router';
import { paths } from '../../../config/paths';
import { ApiError, errorMessage } from '../../../lib/api-error';
import { roleLabels } from '../../../lib/authorization';
import { serverErrorsOnFields } from '../../../lib/form-errors';
import { createInvitationInputSchema, useCreateInvitation, type CreateInvitationInput } from '../api/create-invitation';

const roleHints: Record<CreateInvitationInput['role'], string> = {
  owner: 'manages billing, seats, members and everything else',
  analyst: 'uploads customer files and builds demand surfaces',
  planner: 'manages sites and builds shortlists',
  executive: 'reads shortlists and surfaces',
};

/**
 * Invites someone by e-mail with a role. When every paid seat is taken the server's message is
 * shown with a link to the billing page, where seats are added.
 * @param props the organization
 * @returns the form
 * @example <InviteForm orgId={orgId} />
 */
export function InviteForm({ orgId }: { orgId: string }) {
  const [formError, setFormError] = useState<ApiError | Error | null>(null);
  const [sentTo, setSentTo] = useState<string | null>(null);
  const form = useForm<CreateInvitationInput>({
    resolver: zodResolver(createInvitationInputSchema),
    defaultValues: { email: '', role: 'analyst' },
  });
  const mutation = useCreateInvitation(orgId);
  const { errors } = form.formState;
  const role = form.watch('role');

  const submit = form.handleSubmit((input) => {
    setFormError(null);
    setSentTo(null);
    mutation.mutate(input, {
      onSuccess: (invitation) => {
        setSentTo(invitation.email);
        form.reset({ email: '', role: input.role });
      },
      onError: (error) => {
        const seats = error instanceof ApiError && error.code === 'SEATS_EXHAUSTED';
        if (seats || !serverErrorsOnFields(error, form.setError, ['email', 'role'])) setFormError(error);
      },
    });
  });

  return (
    <form onSubmit={submit} noValidate aria-label="Invite someone" className="flex flex-col gap-4 p-5">
      {formError instanceof ApiError && formError.code === 'SEATS_EXHAUSTED' ? (
        <Alert tone="caution" title="No free seat">
          {formError.message}.{' '}
          <Link to={paths.org.billing.getHref(orgId)} className="font-medium text-accent underline-offset-4 hover:underline">
            Go to billing
          </Link>
        </Alert>
      ) : formError ? (
        <Alert tone="danger">{errorMessage(formError)}</Alert>
      ) : null}
      {sentTo ? <Alert tone="success">Invitation sent to {sentTo}. The link works for 7 days.</Alert> : null}
      <div className="grid gap-4 sm:grid-cols-[minmax(0,2fr)_minmax(0,1fr)]">
        <TextField label="E-mail" type="email" autoComplete="off" placeholder="name@company.example" error={errors.email?.message} {...form.register('email')} />
        <Field label="Role" hint={roleHints[role]} error={errors.role?.message}>
          {(control) => (
            <Select {...control} {...form.register('role')}>
              {(Object.keys(roleLabels) as CreateInvitationInput['role'][]).map((value) => (
                <option key={value} value={value}>
                  {roleLabels[value]}
                </option>
              ))}
            </Select>
          )}
        </Field>
      </div>
      <div>
        <Button type="submit" isLoading={mutation.isPending}>
          Send invitation
        </Button>
      </div>
    </form>
  );
}
