import { LogoMark } from '@demandscape/ui';
import type { ReactNode } from 'react';
import { Link } from 'react-router';

export type AuthLayoutProps = { title: string; description?: ReactNode; children: ReactNode };

/**
 * The frame of the signed-out pages: the mark, a title and one narrow panel.
 * @param props page title, one-line description and the form
 * @returns the page
 * @example <AuthLayout title="Sign in"><SignInForm … /></AuthLayout>
 */
export function AuthLayout({ title, description, children }: AuthLayoutProps) {
  return (
    <div className="flex min-h-dvh flex-col items-center justify-center px-4 py-12">
      <Link to="/" className="mb-8 flex items-center gap-2.5 text-lg font-semibold tracking-tight text-ink">
        <LogoMark size={32} title="" />
        Demandscape
      </Link>
      <main className="w-full max-w-sm rounded-panel border border-line bg-surface p-7 shadow-panel">
        <h1 className="text-xl font-semibold tracking-tight text-ink">{title}</h1>
        {description ? <p className="mt-1 text-sm text-ink-muted">{description}</p> : null}
        <div className="mt-6">{children}</div>
      </main>
      <p className="mt-8 max-w-sm text-center text-xs text-ink-faint">
        Demand surfaces are estimates from a sample of customers. Check leases, zoning and local rules with licensed
        professionals before you commit to a site.
      </p>
    </div>
  );
}
