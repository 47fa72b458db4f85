import { useQuery, useQueryClient } from '@tanstack/react-query';
import { useEffect, useRef, useState } from 'react';
import { useSearchParams } from 'react-router';
import { notify } from '../../../components/notifications/notifications-store';
import { getBilling } from '../api/get-billing';
import { getLedger } from '../api/get-ledger';
import type { BillingOverview } from '../types';
import { checkoutPendingTake, type CheckoutPending } from '../utils/checkout-pending';
import { countText, moneyText } from '../utils/money-text';

/** How long the page waits for the provider's confirmation before it says so (ms). */
export const CONFIRMATION_WAIT_MS = 60_000;
const POLL_MS = 1000;

type Waiting = { sessionId: string | null; pending: CheckoutPending | null; since: number };
type Check = { state: 'waiting' | 'confirmed' | 'timeout'; billing: BillingOverview };

async function confirmationCheck(orgId: string, waiting: Waiting): Promise<Check> {
  const [billing, ledger] = await Promise.all([getBilling(orgId), getLedger(orgId)]);
  const creditsArrived = waiting.sessionId !== null && ledger.entries.some((e) => e.kind === 'purchase' && e.ref === waiting.sessionId);
  const planStarted =
    waiting.pending?.kind === 'seats' && billing.plan.status === 'active' && billing.plan.seatsPaid >= (waiting.pending.seats ?? 1);
  if (creditsArrived || planStarted) return { state: 'confirmed', billing };
  return { state: Date.now() - waiting.since > CONFIRMATION_WAIT_MS ? 'timeout' : 'waiting', billing };
}

/**
 * Handles the return from the hosted checkout (`?checkout=success|cancelled&session_id=…`): shows a
 * notification, then polls the balance and plan until the server has received the provider's
 * signed confirmation (credits in the ledger under the checkout id, or the seat plan active).
 * @param orgId the organization
 * @returns whether the page is waiting for the confirmation, and whether the wait ran out
 * @example const { waiting, timedOut } = useCheckoutReturn(orgId);
 */
export function useCheckoutReturn(orgId: string): { waiting: boolean; timedOut: boolean } {
  const [params, setParams] = useSearchParams();
  const queryClient = useQueryClient();
  const handled = useRef<string | null>(null);
  const [waiting, setWaiting] = useState<Waiting | null>(null);
  const outcome = params.get('checkout');
  const sessionId = params.get('session_id');

  useEffect(() => {
    if (outcome !== 'success' && outcome !== 'cancelled') return;
    const key = `${outcome}:${sessionId ?? ''}`;
    if (handled.current === key) return;
    handled.current = key;
    const pending = checkoutPendingTake(sessionId);
    if (outcome === 'cancelled') {
      notify({ tone: 'info', title: 'Checkout cancelled', message: 'Nothing was charged.' });
    } else {
      notify({ tone: 'success', title: 'Payment received', message: 'It shows here as soon as the payment provider confirms it.' });
      setWaiting({ sessionId, pending, since: Date.now() });
    }
    const next = new URLSearchParams(params);
    next.delete('checkout');
    next.delete('session_id');
    setParams(next, { replace: true });
  }, [outcome, sessionId, params, setParams]);

  const check = useQuery({
    queryKey: ['organizations', orgId, 'billing', 'confirmation', waiting?.sessionId ?? '', waiting?.since ?? 0],
    queryFn: () => confirmationCheck(orgId, waiting!),
    enabled: waiting !== null,
    refetchInterval: (query) => (query.state.data && query.state.data.state !== 'waiting' ? false : POLL_MS),
    gcTime: 0,
  });

  const state = check.data?.state;
  useEffect(() => {
    if (!waiting || !check.data || state === 'waiting') return;
    queryClient.setQueryData(['organizations', orgId, 'billing'], check.data.billing);
    void queryClient.invalidateQueries({ queryKey: ['organizations', orgId, 'billing', 'ledger'] });
    void queryClient.invalidateQueries({ queryKey: ['organizations', orgId, 'billing', 'receipts'] });
    if (state === 'confirmed') {
      const { pending } = waiting;
      const title =
        pending?.kind === 'seats'
          ? `Seat plan started with ${countText(check.data.billing.plan.seatsPaid)} seats`
          : pending?.credits
            ? `${countText(pending.credits)} credits added`
            : 'Credits added';
      const message =
        pending?.kind === 'seats'
          ? `${moneyText(check.data.billing.plan.seatsPaid * check.data.billing.seatPlan.unitAmount, check.data.billing.seatPlan.currency)} per ${check.data.billing.seatPlan.interval} from now on.`
          : `The balance is now ${countText(check.data.billing.credits.balance)} credits.`;
      notify({ tone: 'success', title, message });
      setWaiting(null);
    }
  }, [state, check.data, waiting, queryClient, orgId]);

  return { waiting: waiting !== null && state !== 'timeout', timedOut: waiting !== null && state === 'timeout' };
}
