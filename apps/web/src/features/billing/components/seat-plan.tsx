import { Alert, Badge, Button, Card, CardHeader, Stat, TextField } from '@demandscape/ui';
import { useState, type FormEvent } from 'react';
import { errorMessage } from '../../../lib/api-error';
import { dateText } from '../../../lib/format';
import { useChangeSeats } from '../api/change-seats';
import { useCreateCheckout } from '../api/create-checkout';
import type { BillingOverview, PlanStatus } from '../types';
import { checkoutPendingRemember } from '../utils/checkout-pending';
import { countText, moneyText } from '../utils/money-text';

const statusText: Record<PlanStatus, { label: string; tone: 'neutral' | 'success' | 'caution' | 'danger' | 'accent' }> = {
  none: { label: 'No seat plan', tone: 'neutral' },
  active: { label: 'Active', tone: 'success' },
  past_due: { label: 'Payment overdue', tone: 'danger' },
  canceled: { label: 'Cancelled', tone: 'caution' },
  demo: { label: 'Demo plan (not billed)', tone: 'accent' },
};

export type SeatPlanProps = {
  orgId: string;
  billing: BillingOverview;
  /** Sends the browser to the hosted checkout page (a full page load); replaced in tests. */
  onNavigate?: (url: string) => void;
};

function seatsText(n: number): string {
  return `${countText(n)} seat${n === 1 ? '' : 's'}`;
}

/**
 * The seat plan: status, seats paid and used, the monthly price, and a form to change the number of
 * seats that shows the new monthly total before it is confirmed. Without a running plan the same
 * form starts one through the hosted checkout.
 * @param props the organization, its billing overview and the navigation function
 * @returns a card
 * @example <SeatPlan orgId={orgId} billing={billing} />
 */
export function SeatPlan({ orgId, billing, onNavigate = (url) => window.location.assign(url) }: SeatPlanProps) {
  const { plan, seats, seatPlan } = billing;
  const live = plan.status === 'active' || plan.status === 'past_due';
  const [value, setValue] = useState(String(Math.max(plan.seatsPaid, seats.used, 1)));
  const [localError, setLocalError] = useState<string | null>(null);
  const change = useChangeSeats(orgId);
  const checkout = useCreateCheckout(orgId, {
    onSuccess: ({ url, sessionId }, input) => {
      checkoutPendingRemember({ sessionId, kind: 'seats', seats: input.kind === 'seats' ? input.seats : undefined });
      onNavigate(url);
    },
  });
  const mutation = live ? change : checkout;
  const wanted = Number(value);
  const valid = Number.isInteger(wanted) && wanted >= 1;
  const unit = moneyText(seatPlan.unitAmount, seatPlan.currency);
  const billedSeats = live ? plan.seatsPaid : 0;

  const submit = (event: FormEvent) => {
    event.preventDefault();
    setLocalError(null);
    if (!valid) return setLocalError('Enter a whole number of seats, 1 or more.');
    if (wanted < seats.used) {
      return setLocalError(`${seatsText(seats.used)} are in use (members and open invitations) — choose at least ${seats.used}, or remove members first.`);
    }
    if (live) change.mutate({ seats: wanted });
    else checkout.mutate({ kind: 'seats', seats: wanted });
  };

  return (
    <Card>
      <CardHeader
        title="Seat plan"
        description={`${seatPlan.name}: ${unit} per seat per ${seatPlan.interval}. Every member and every open invitation takes a seat.`}
        actions={<Badge tone={statusText[plan.status].tone}>{statusText[plan.status].label}</Badge>}
      />
      <div className="flex flex-col gap-5 p-5">
        <div className="grid gap-3 sm:grid-cols-3">
          <Stat label="Seats paid" value={countText(seats.limit)} unit="seats" />
          <Stat
            label="Seats used"
            value={countText(seats.used)}
            unit="seats"
            hint={`${countText(seats.members)} members, ${countText(seats.pendingInvitations)} open invitations`}
            tone={seats.used >= seats.limit ? 'caution' : 'neutral'}
          />
          <Stat
            label="Monthly price"
            value={moneyText(billedSeats * seatPlan.unitAmount, seatPlan.currency)}
            hint={plan.currentPeriodEnd && live ? `Renews ${dateText(plan.currentPeriodEnd)}` : live ? undefined : 'Nothing is billed yet'}
          />
        </div>
        {plan.status === 'past_due' ? (
          <Alert tone="danger" title="The last payment failed">
            Seats still count, but update the card with the payment provider before the plan is cancelled.
          </Alert>
        ) : null}
        <form onSubmit={submit} noValidate aria-label={live ? 'Change seats' : 'Start a seat plan'} className="flex flex-col gap-3">
          <div className="flex flex-wrap items-end gap-3">
            <TextField
              label={live ? 'Seats' : 'Seats for the new plan'}
              type="number"
              inputMode="numeric"
              min={Math.max(seats.used, 1)}
              step={1}
              value={value}
              onChange={(event) => setValue(event.target.value)}
              hint={`At least ${seats.used}: the seats in use.`}
              error={localError ?? undefined}
              className="w-48"
            />
          </div>
          {valid ? (
            <p className="text-sm text-ink tabular-nums" role="status" aria-live="polite">
              New monthly total: {seatsText(wanted)} × {unit} ={' '}
              <strong>{moneyText(wanted * seatPlan.unitAmount, seatPlan.currency)}</strong> per {seatPlan.interval}
              {live && wanted !== plan.seatsPaid
                ? ` (now ${moneyText(plan.seatsPaid * seatPlan.unitAmount, seatPlan.currency)}; the difference is prorated)`
                : ''}
            </p>
          ) : null}
          {mutation.isError ? <Alert tone="danger">{errorMessage(mutation.error)}</Alert> : null}
          {change.isSuccess && live ? <Alert tone="success">The plan now has {seatsText(plan.seatsPaid)}.</Alert> : null}
          <div>
            <Button type="submit" isLoading={mutation.isPending} disabled={live && wanted === plan.seatsPaid}>
              {live ? `Change to ${valid ? seatsText(wanted) : 'this number'}` : `Start plan with ${valid ? seatsText(wanted) : 'these seats'}`}
            </Button>
          </div>
        </form>
      </div>
    </Card>
  );
}
