import { Alert, Button } from '@demandscape/ui';
import { errorMessage } from '../../../lib/api-error';
import { useDeleteSite } from '../api/delete-site';
import type { Site } from '../types';
import { siteKindWords } from '../utils/site-explanations';

export type DeleteSiteConfirmProps = { orgId: string; workspaceId: string; site: Site; onCancel: () => void; onDeleted: () => void };

/**
 * Asks before a site is deleted and says what that changes.
 * @param props the workspace, the site and what to do after
 * @returns the confirmation body (inside a Dialog)
 * @example <DeleteSiteConfirm orgId={o} workspaceId={w} site={s} onCancel={close} onDeleted={close} />
 */
export function DeleteSiteConfirm({ orgId, workspaceId, site, onCancel, onDeleted }: DeleteSiteConfirmProps) {
  const mutation = useDeleteSite(orgId, workspaceId, { onSuccess: onDeleted });
  return (
    <div className="flex flex-col gap-4">
      <p className="text-sm text-ink">
        {siteKindWords[site.kind].one} “{site.name}” is removed from this workspace. Scoring runs already made keep their copy of it; new runs
        leave it out.
      </p>
      {mutation.error ? <Alert tone="danger">{errorMessage(mutation.error)}</Alert> : null}
      <div className="flex justify-end gap-2">
        <Button variant="ghost" onClick={onCancel}>
          Keep it
        </Button>
        <Button variant="danger" isLoading={mutation.isPending} onClick={() => mutation.mutate(site.id)}>
          Delete site
        </Button>
      </div>
    </div>
  );
}
