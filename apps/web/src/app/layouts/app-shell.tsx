import { Badge, Button, LogoMark } from '@demandscape/ui';
import type { ReactNode } from 'react';
import { Link, NavLink, useNavigate, useNavigation } from 'react-router';
import { paths } from '../../config/paths';
import { useSignOut } from '../../features/auth/api/sign-out';
import { OrgSwitcher } from '../../features/organizations/components/org-switcher';
import { roleLabels } from '../../lib/authorization';
import type { Me } from '../../types/api';
import { AppNav } from './app-nav';

export type AppShellProps = { me: Me; orgId: string | null; children: ReactNode };

/**
 * The signed-in frame: mark, organization switcher, role-aware navigation, account and sign-out,
 * a reminder while the e-mail address is unconfirmed, and a progress line during navigation.
 * @param props the session, the organization in view (or the last one used), and the page
 * @returns the shell
 * @example <AppShell me={me} orgId={orgId}><Outlet /></AppShell>
 */
export function AppShell({ me, orgId, children }: AppShellProps) {
  const navigate = useNavigate();
  const navigation = useNavigation();
  const signOut = useSignOut({ onSuccess: () => navigate(paths.auth.signIn.getHref(), { replace: true }) });
  const membership = me.memberships.find((m) => m.organization.id === orgId);

  return (
    <div className="flex min-h-dvh flex-col">
      <a href="#main" className="sr-only focus:not-sr-only focus:absolute focus:top-2 focus:left-2 focus:z-50 focus:bg-surface focus:p-2">
        Skip to content
      </a>
      {navigation.state === 'loading' ? (
        <div role="progressbar" aria-label="Loading page" className="fixed inset-x-0 top-0 z-50 h-0.5 animate-pulse bg-accent" />
      ) : null}
      <header className="sticky top-0 z-30 border-b border-line bg-surface/95 backdrop-blur">
        <div className="mx-auto flex h-14 max-w-7xl items-center gap-4 px-4 sm:px-6">
          <Link to={paths.home.getHref()} className="flex items-center gap-2 font-semibold tracking-tight text-ink">
            <LogoMark size={26} title="" />
            <span className="hidden sm:inline">Demandscape</span>
          </Link>
          <span className="h-6 w-px bg-line" aria-hidden="true" />
          <OrgSwitcher currentOrgId={membership?.organization.id} currentOrgName={membership?.organization.name} />
          {membership ? <Badge tone={membership.role === 'owner' ? 'accent' : 'neutral'}>{roleLabels[membership.role]}</Badge> : null}
          {membership ? <AppNav orgId={membership.organization.id} role={membership.role} /> : null}
          <div className="ml-auto flex items-center gap-2">
            <NavLink
              to={paths.account.getHref()}
              className={({ isActive }) =>
                `rounded-control px-3 py-1.5 text-sm hover:bg-sunken ${isActive ? 'text-accent-strong' : 'text-ink-muted'}`
              }
            >
              <span className="sr-only">Account: </span>
              {me.user.name}
            </NavLink>
            <Button variant="ghost" size="sm" onClick={() => signOut.mutate()} isLoading={signOut.isPending}>
              Sign out
            </Button>
          </div>
        </div>
      </header>
      {me.user.emailVerified ? null : (
        <div className="border-b border-caution/30 bg-caution-soft">
          <p className="mx-auto max-w-7xl px-4 py-2 text-sm text-ink sm:px-6">
            Please confirm your e-mail address: we sent a link to <strong>{me.user.email}</strong>.{' '}
            <Link to={paths.account.getHref()} className="font-medium text-accent-strong underline">
              Send a new link
            </Link>
          </p>
        </div>
      )}
      <div id="main" className="mx-auto w-full max-w-7xl flex-1 px-4 py-8 sm:px-6">
        {children}
      </div>
    </div>
  );
}
