import { cn } from '@demandscape/ui';
import { NavLink } from 'react-router';
import { paths } from '../../config/paths';
import { roleCan, type Permission } from '../../lib/authorization';
import type { Role } from '../../types/api';

type NavItem = { label: string; href: (orgId: string) => string; permission: Permission };

const items: NavItem[] = [
  { label: 'Workspaces', href: paths.org.workspaces.getHref, permission: 'workspace:read' },
  { label: 'Shortlists', href: paths.org.shortlists.getHref, permission: 'shortlist:read' },
  { label: 'Members', href: paths.org.members.getHref, permission: 'members:read' },
  { label: 'Billing', href: paths.org.billing.getHref, permission: 'billing:manage' },
  { label: 'Audit log', href: paths.org.auditLog.getHref, permission: 'audit-log:read' },
];

export type AppNavProps = { orgId: string; role: Role };

/**
 * The organization's navigation, showing only what the member's role may use.
 * @param props the organization and the member's role in it
 * @returns the nav landmark
 * @example <AppNav orgId={orgId} role="executive" />
 */
export function AppNav({ orgId, role }: AppNavProps) {
  return (
    <nav aria-label="Organization" className="flex items-center gap-1">
      {items
        .filter((item) => roleCan(role, item.permission))
        .map((item) => (
          <NavLink
            key={item.label}
            to={item.href(orgId)}
            className={({ isActive }) =>
              cn(
                'rounded-control px-3 py-1.5 text-sm font-medium text-ink-muted hover:bg-sunken hover:text-ink',
                isActive && 'bg-accent-soft text-accent-strong hover:bg-accent-soft hover:text-accent-strong',
              )
            }
          >
            {item.label}
          </NavLink>
        ))}
    </nav>
  );
}
