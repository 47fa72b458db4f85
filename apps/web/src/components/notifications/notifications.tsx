import { cn } from '@demandscape/ui';
import { useSyncExternalStore } from 'react';
import { notificationDismiss, notificationsSnapshot, notificationsSubscribe } from './notifications-store';

const toneClass = {
  info: 'border-l-accent',
  success: 'border-l-success',
  danger: 'border-l-danger',
} as const;

/**
 * The corner stack of notifications; rendered once by the app provider.
 * @returns a polite live region
 * @example <Notifications />
 */
export function Notifications() {
  const items = useSyncExternalStore(notificationsSubscribe, notificationsSnapshot, notificationsSnapshot);
  return (
    <div aria-live="polite" className="pointer-events-none fixed right-4 bottom-4 z-50 flex w-80 flex-col gap-2">
      {items.map((item) => (
        <div
          key={item.id}
          className={cn(
            'pointer-events-auto rounded-control border border-l-4 border-line bg-surface px-4 py-3 shadow-dialog',
            toneClass[item.tone],
          )}
        >
          <div className="flex items-start justify-between gap-3">
            <div>
              <p className="text-sm font-semibold text-ink">{item.title}</p>
              {item.message ? <p className="mt-0.5 text-sm text-ink-muted">{item.message}</p> : null}
            </div>
            <button
              type="button"
              onClick={() => notificationDismiss(item.id)}
              className="rounded-control px-1 text-ink-muted hover:text-ink"
              aria-label="Dismiss notification"
            >
              ×
            </button>
          </div>
        </div>
      ))}
    </div>
  );
}
