import { Alert, Card, CardHeader } from '@demandscape/ui';
import type { BillingOverview } from '../types';
import { countText } from '../utils/money-text';

export type CreditBalanceProps = { credits: BillingOverview['credits']; waiting?: boolean };

/**
 * The organization's credit balance as one big number, with a warning when it runs low.
 * @param props the credits part of the billing overview, and whether a payment is being confirmed
 * @returns a card
 * @example <CreditBalance credits={billing.credits} />
 */
export function CreditBalance({ credits, waiting = false }: CreditBalanceProps) {
  return (
    <Card>
      <CardHeader title="Credits" description="Building a demand surface spends credits; the cost is shown before a run starts." />
      <div className="flex flex-col gap-3 px-5 py-5">
        <p className="flex items-baseline gap-2">
          <span className="text-5xl font-semibold tracking-tight text-ink tabular-nums" data-testid="credit-balance">
            {countText(credits.balance)}
          </span>
          <span className="text-sm text-ink-muted">credits available</span>
        </p>
        {waiting ? (
          <p className="text-sm text-ink-muted" role="status">
            Waiting for the payment provider to confirm the payment…
          </p>
        ) : null}
        {credits.low ? (
          <Alert tone="caution" title="Credits are running low">
            The balance is below {countText(credits.lowBalanceThreshold)} credits. Buy a pack so new runs are not refused.
          </Alert>
        ) : null}
      </div>
    </Card>
  );
}
