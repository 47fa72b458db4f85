import { buttonVariants, LogoMark } from '@demandscape/ui';
import { Link } from 'react-router';

export type NotFoundProps = { title?: string; message?: string };

/**
 * The page for an address that leads nowhere (or to something this account may not see).
 * @param props optional title and explanation
 * @returns the message with a way home
 * @example <NotFound />
 */
export function NotFound({
  title = 'Page not found',
  message = 'Nothing lives at this address, or it belongs to an organization you are not a member of.',
}: NotFoundProps) {
  return (
    <main className="flex min-h-[60dvh] flex-col items-center justify-center gap-4 px-6 py-16 text-center">
      <LogoMark size={48} title="" className="text-ink-faint" />
      <p className="text-sm font-semibold text-accent">404</p>
      <h1 className="text-2xl font-semibold tracking-tight text-ink">{title}</h1>
      <p className="max-w-md text-sm text-ink-muted">{message}</p>
      <Link to="/" className={buttonVariants({ variant: 'secondary' })}>
        Go to your workspaces
      </Link>
    </main>
  );
}
