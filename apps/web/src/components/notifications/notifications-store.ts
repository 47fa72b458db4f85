export type Notification = {
  id: number;
  tone: 'info' | 'success' | 'danger';
  title: string;
  message?: string;
};

type Listener = () => void;

let items: Notification[] = [];
let nextId = 1;
const listeners = new Set<Listener>();

function emit() {
  for (const listener of listeners) listener();
}

/**
 * Shows a notification in the corner of the screen; it goes away after 6 s or when dismissed.
 * @param notification tone, title and optional message
 * @returns the notification's id
 * @example notify({ tone: 'success', title: 'Workspace created' });
 */
export function notify(notification: Omit<Notification, 'id'>): number {
  const id = nextId++;
  items = [...items, { ...notification, id }];
  emit();
  setTimeout(() => notificationDismiss(id), 6000);
  return id;
}

/**
 * Removes a notification.
 * @param id what `notify` returned
 * @returns nothing
 * @example notificationDismiss(id);
 */
export function notificationDismiss(id: number): void {
  if (!items.some((item) => item.id === id)) return;
  items = items.filter((item) => item.id !== id);
  emit();
}

/**
 * Subscribes to changes (for `useSyncExternalStore`).
 * @param listener called after every change
 * @returns the unsubscribe function
 * @example useSyncExternalStore(notificationsSubscribe, notificationsSnapshot)
 */
export function notificationsSubscribe(listener: Listener): () => void {
  listeners.add(listener);
  return () => listeners.delete(listener);
}

/**
 * The current notifications, oldest first.
 * @returns the list (a new array after each change)
 * @example notificationsSnapshot().length
 */
export function notificationsSnapshot(): Notification[] {
  return items;
}
