import { Alert, Button, TextField } from '@demandscape/ui';
import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { errorMessage } from '../../../lib/api-error';
import { serverErrorsOnFields } from '../../../lib/form-errors';
import type { Organization } from '../../../types/api';
import {
  createOrganizationInputSchema,
  useCreateOrganization,
  type CreateOrganizationInput,
} from '../api/create-organization';

export type CreateOrganizationFormProps = {
  onCreated: (organization: Organization) => void;
  onCancel?: () => void;
};

/**
 * Names a new organization; the user becomes its owner.
 * @param props what to do with the new organization, and an optional cancel handler
 * @returns the form
 * @example <CreateOrganizationForm onCreated={(org) => navigate(paths.org.workspaces.getHref(org.id))} />
 */
export function CreateOrganizationForm({ onCreated, onCancel }: CreateOrganizationFormProps) {
  const [formError, setFormError] = useState<string | null>(null);
  const form = useForm<CreateOrganizationInput>({ resolver: zodResolver(createOrganizationInputSchema), defaultValues: { name: '' } });
  const mutation = useCreateOrganization();

  const submit = form.handleSubmit((input) => {
    setFormError(null);
    mutation.mutate(input, {
      onSuccess: ({ organization }) => onCreated(organization),
      onError: (error) => {
        if (!serverErrorsOnFields(error, form.setError, ['name'])) setFormError(errorMessage(error));
      },
    });
  });

  return (
    <form onSubmit={submit} noValidate className="flex flex-col gap-4">
      {formError ? <Alert tone="danger">{formError}</Alert> : null}
      <TextField
        label="Organization name"
        hint="Your company or team. You will be its owner and can invite teammates later."
        autoComplete="organization"
        error={form.formState.errors.name?.message}
        {...form.register('name')}
      />
      <div className="flex justify-end gap-2">
        {onCancel ? (
          <Button variant="ghost" onClick={onCancel}>
            Cancel
          </Button>
        ) : null}
        <Button type="submit" isLoading={mutation.isPending}>
          Create organization
        </Button>
      </div>
    </form>
  );
}
