/** What the owner went to pay for, kept across the full-page trip to the hosted checkout. */
export type CheckoutPending = { sessionId: string; kind: 'credits' | 'seats'; credits?: number; seats?: number };

const KEY = 'demandscape.checkout-pending';

/**
 * Remembers an open checkout in this tab (sessionStorage), so the return page knows what to wait for.
 * @param pending the checkout session id and what it buys
 * @returns nothing
 * @example checkoutPendingRemember({ sessionId: 'cs_test_1', kind: 'credits', credits: 500 });
 */
export function checkoutPendingRemember(pending: CheckoutPending): void {
  try {
    sessionStorage.setItem(KEY, JSON.stringify(pending));
  } catch {
    // Storage can be disabled; the return page then waits on the session id alone.
  }
}

/**
 * Takes (reads and forgets) the remembered checkout when it matches the session that returned.
 * @param sessionId `session_id` from the return URL
 * @returns the remembered checkout, or null
 * @example const pending = checkoutPendingTake(params.get('session_id'));
 */
export function checkoutPendingTake(sessionId: string | null): CheckoutPending | null {
  try {
    const raw = sessionStorage.getItem(KEY);
    sessionStorage.removeItem(KEY);
    const parsed = raw ? (JSON.parse(raw) as CheckoutPending) : null;
    return parsed && (!sessionId || parsed.sessionId === sessionId) ? parsed : null;
  } catch {
    return null;
  }
}
