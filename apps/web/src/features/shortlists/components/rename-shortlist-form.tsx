import { Alert, Button, TextField } from '@demandscape/ui';
import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { errorMessage } from '../../../lib/api-error';
import { serverErrorsOnFields } from '../../../lib/form-errors';
import { renameShortlistSchema, useRenameShortlist, type RenameShortlistInput } from '../api/rename-shortlist';
import type { ShortlistSummary } from '../types';

export type RenameShortlistFormProps = { orgId: string; shortlist: Pick<ShortlistSummary, 'id' | 'workspaceId' | 'name'>; onDone: () => void };

/**
 * Renames a shortlist.
 * @param props the organization, the shortlist and what to do when saved or cancelled
 * @returns the form
 * @example <RenameShortlistForm orgId={orgId} shortlist={s} onDone={close} />
 */
export function RenameShortlistForm({ orgId, shortlist, onDone }: RenameShortlistFormProps) {
  const [formError, setFormError] = useState<string | null>(null);
  const form = useForm<RenameShortlistInput>({ resolver: zodResolver(renameShortlistSchema), defaultValues: { name: shortlist.name } });
  const mutation = useRenameShortlist(orgId, shortlist.workspaceId, shortlist.id);
  const submit = form.handleSubmit((input) => {
    setFormError(null);
    mutation.mutate(input, {
      onSuccess: () => onDone(),
      onError: (error) => {
        if (!serverErrorsOnFields(error, form.setError, ['name'])) setFormError(errorMessage(error));
      },
    });
  });
  return (
    <form onSubmit={submit} noValidate className="flex flex-col gap-4">
      {formError ? <Alert tone="danger">{formError}</Alert> : null}
      <TextField label="Shortlist name" error={form.formState.errors.name?.message} {...form.register('name')} />
      <div className="flex justify-end gap-2">
        <Button variant="ghost" onClick={onDone}>
          Cancel
        </Button>
        <Button type="submit" isLoading={mutation.isPending}>
          Rename
        </Button>
      </div>
    </form>
  );
}
