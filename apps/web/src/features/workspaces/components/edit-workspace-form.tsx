import { Alert, Button, TextAreaField, TextField } from '@demandscape/ui';
import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { errorMessage } from '../../../lib/api-error';
import { serverErrorsOnFields } from '../../../lib/form-errors';
import type { Workspace } from '../../../types/api';
import { updateWorkspaceInputSchema, useUpdateWorkspace, type UpdateWorkspaceInput } from '../api/update-workspace';

export type EditWorkspaceFormProps = { orgId: string; workspace: Workspace; onDone: () => void };

/**
 * Renames a workspace or edits its description.
 * @param props the organization, the workspace and what to do when saved or cancelled
 * @returns the form
 * @example <EditWorkspaceForm orgId={orgId} workspace={workspace} onDone={close} />
 */
export function EditWorkspaceForm({ orgId, workspace, onDone }: EditWorkspaceFormProps) {
  const [formError, setFormError] = useState<string | null>(null);
  const form = useForm<UpdateWorkspaceInput>({
    resolver: zodResolver(updateWorkspaceInputSchema),
    defaultValues: { name: workspace.name, description: workspace.description ?? '' },
  });
  const mutation = useUpdateWorkspace(orgId, workspace.id);
  const { errors } = form.formState;

  const submit = form.handleSubmit((input) => {
    setFormError(null);
    mutation.mutate(input, {
      onSuccess: () => onDone(),
      onError: (error) => {
        if (!serverErrorsOnFields(error, form.setError, ['name', 'description'])) setFormError(errorMessage(error));
      },
    });
  });

  return (
    <form onSubmit={submit} noValidate className="flex flex-col gap-4">
      {formError ? <Alert tone="danger">{formError}</Alert> : null}
      <TextField label="Name" error={errors.name?.message} {...form.register('name')} />
      <TextAreaField label="Description" rows={4} error={errors.description?.message} {...form.register('description')} />
      <div className="flex justify-end gap-2">
        <Button variant="ghost" onClick={onDone}>
          Cancel
        </Button>
        <Button type="submit" isLoading={mutation.isPending}>
          Save changes
        </Button>
      </div>
    </form>
  );
}
