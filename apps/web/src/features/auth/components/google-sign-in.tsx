import { buttonVariants, cn } from '@demandscape/ui';
import { paths } from '../../../config/paths';
import { useProviders } from '../api/get-providers';

/**
 * The Google sign-in link, shown only when the server offers it. A full-page navigation, because
 * the provider's pages cannot run inside the app.
 * @returns the link and a divider, or nothing
 * @example <GoogleSignIn />
 */
export function GoogleSignIn() {
  const providers = useProviders();
  const google = providers.data?.google;
  if (!google?.enabled) return null;
  return (
    <div className="flex flex-col gap-4">
      <a href={paths.auth.google.getHref()} className={cn(buttonVariants({ variant: 'secondary', size: 'lg' }), 'w-full')}>
        <svg viewBox="0 0 16 16" className="size-4" aria-hidden="true">
          <circle cx="8" cy="8" r="6.25" fill="none" stroke="currentColor" strokeWidth="1.5" />
          <path d="M8 8h5" stroke="currentColor" strokeWidth="1.5" />
        </svg>
        {google.label}
      </a>
      <div className="flex items-center gap-3 text-xs text-ink-faint" aria-hidden="true">
        <span className="h-px flex-1 bg-line" />
        or with e-mail
        <span className="h-px flex-1 bg-line" />
      </div>
    </div>
  );
}
