import { Badge, Dialog, Spinner, cn } from '@demandscape/ui';
import { useEffect, useId, useRef, useState } from 'react';
import { Link, useNavigate } from 'react-router';
import { paths } from '../../../config/paths';
import { roleLabels } from '../../../lib/authorization';
import { errorMessage } from '../../../lib/api-error';
import { useOrganizations } from '../api/get-organizations';
import { CreateOrganizationForm } from './create-organization-form';

/**
 * The header control that shows the current organization, lists every organization the user
 * belongs to (with their role there), and creates a new one.
 * @param props the organization in view, if any, and its name (shown while the list loads)
 * @returns the switcher button, its menu and the create dialog
 * @example <OrgSwitcher currentOrgId={orgId} currentOrgName="Larchloaf" />
 */
export function OrgSwitcher({ currentOrgId, currentOrgName }: { currentOrgId?: string; currentOrgName?: string }) {
  const organizations = useOrganizations();
  const navigate = useNavigate();
  const [open, setOpen] = useState(false);
  const [creating, setCreating] = useState(false);
  const menuId = useId();
  const rootRef = useRef<HTMLDivElement>(null);
  const toggleRef = useRef<HTMLButtonElement>(null);
  const current = organizations.data?.find((org) => org.id === currentOrgId);

  useEffect(() => {
    if (!open) return;
    const onPointer = (event: MouseEvent) => {
      if (!rootRef.current?.contains(event.target as Node)) setOpen(false);
    };
    const onKey = (event: KeyboardEvent) => {
      if (event.key === 'Escape') {
        setOpen(false);
        toggleRef.current?.focus();
      }
    };
    document.addEventListener('mousedown', onPointer);
    document.addEventListener('keydown', onKey);
    return () => {
      document.removeEventListener('mousedown', onPointer);
      document.removeEventListener('keydown', onKey);
    };
  }, [open]);

  return (
    <div ref={rootRef} className="relative">
      <button
        ref={toggleRef}
        type="button"
        aria-expanded={open}
        aria-controls={menuId}
        onClick={() => setOpen((value) => !value)}
        className="flex h-9 max-w-64 items-center gap-2 rounded-control border border-line bg-surface px-3 text-sm hover:bg-sunken"
      >
        <span className="sr-only">Organization:</span>
        <span className="truncate font-medium">{current?.name ?? currentOrgName ?? 'Choose organization'}</span>
        <svg viewBox="0 0 16 16" className="size-3.5 shrink-0 text-ink-muted" aria-hidden="true">
          <path d="M4 6l4 4 4-4" fill="none" stroke="currentColor" strokeWidth="1.6" strokeLinecap="round" />
        </svg>
      </button>
      {open ? (
        <div
          id={menuId}
          className="absolute left-0 z-40 mt-1 w-72 rounded-panel border border-line bg-surface p-1.5 shadow-dialog"
        >
          <p className="px-2.5 pt-1.5 pb-1 text-xs font-medium tracking-wide text-ink-faint uppercase">Your organizations</p>
          {organizations.isPending ? <Spinner size="sm" label="Loading organizations" className="p-2.5" /> : null}
          {organizations.isError ? (
            <p className="p-2.5 text-sm text-danger">{errorMessage(organizations.error)}</p>
          ) : null}
          {organizations.data?.length === 0 ? (
            <p className="p-2.5 text-sm text-ink-muted">You are not in any organization yet.</p>
          ) : null}
          <ul>
            {organizations.data?.map((org) => (
              <li key={org.id}>
                <Link
                  to={paths.org.workspaces.getHref(org.id)}
                  onClick={() => setOpen(false)}
                  aria-current={org.id === currentOrgId ? 'true' : undefined}
                  className={cn(
                    'flex items-center justify-between gap-2 rounded-control px-2.5 py-2 text-sm hover:bg-sunken',
                    org.id === currentOrgId && 'bg-accent-soft',
                  )}
                >
                  <span className="truncate">{org.name}</span>
                  <Badge tone={org.role === 'owner' ? 'accent' : 'neutral'}>{roleLabels[org.role]}</Badge>
                </Link>
              </li>
            ))}
          </ul>
          <div className="mt-1 border-t border-line pt-1">
            <button
              type="button"
              onClick={() => {
                setOpen(false);
                setCreating(true);
              }}
              className="w-full rounded-control px-2.5 py-2 text-left text-sm font-medium text-accent hover:bg-sunken"
            >
              + Create organization
            </button>
          </div>
        </div>
      ) : null}
      <Dialog
        open={creating}
        onClose={() => setCreating(false)}
        title="Create organization"
        description="An organization holds your team's workspaces, members and credits."
      >
        <CreateOrganizationForm
          onCancel={() => setCreating(false)}
          onCreated={(organization) => {
            setCreating(false);
            navigate(paths.org.workspaces.getHref(organization.id));
          }}
        />
      </Dialog>
    </div>
  );
}
