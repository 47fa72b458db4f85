import { Alert, Button, TextAreaField, TextField } from '@demandscape/ui';
import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { errorMessage } from '../../../lib/api-error';
import { serverErrorsOnFields } from '../../../lib/form-errors';
import type { Workspace } from '../../../types/api';
import { createWorkspaceInputSchema, useCreateWorkspace, type CreateWorkspaceInput } from '../api/create-workspace';

export type CreateWorkspaceFormProps = {
  orgId: string;
  onCreated: (workspace: Workspace) => void;
  onCancel?: () => void;
};

/**
 * Starts a new site-selection study: a name and an optional description.
 * @param props the organization, what to do with the new workspace, and an optional cancel handler
 * @returns the form
 * @example <CreateWorkspaceForm orgId={orgId} onCreated={(ws) => navigate(paths.org.workspace.getHref(orgId, ws.id))} />
 */
export function CreateWorkspaceForm({ orgId, onCreated, onCancel }: CreateWorkspaceFormProps) {
  const [formError, setFormError] = useState<string | null>(null);
  const form = useForm<CreateWorkspaceInput>({
    resolver: zodResolver(createWorkspaceInputSchema),
    defaultValues: { name: '', description: '' },
  });
  const mutation = useCreateWorkspace(orgId);
  const { errors } = form.formState;

  const submit = form.handleSubmit((input) => {
    setFormError(null);
    mutation.mutate(input, {
      onSuccess: (workspace) => onCreated(workspace),
      onError: (error) => {
        if (!serverErrorsOnFields(error, form.setError, ['name', 'description'])) setFormError(errorMessage(error));
      },
    });
  });

  return (
    <form onSubmit={submit} noValidate className="flex flex-col gap-4">
      {formError ? <Alert tone="danger">{formError}</Alert> : null}
      <TextField
        label="Name"
        placeholder="North corridor 2027"
        hint="One study: the area, the question and the year, in a few words."
        error={errors.name?.message}
        {...form.register('name')}
      />
      <TextAreaField
        label="Description (optional)"
        rows={3}
        hint="What the study should decide, for whoever opens it later."
        error={errors.description?.message}
        {...form.register('description')}
      />
      <div className="flex justify-end gap-2">
        {onCancel ? (
          <Button variant="ghost" onClick={onCancel}>
            Cancel
          </Button>
        ) : null}
        <Button type="submit" isLoading={mutation.isPending}>
          Create workspace
        </Button>
      </div>
    </form>
  );
}
