import { Alert, Button, Card, CardHeader } from '@demandscape/ui';
import { useState } from 'react';
import { errorMessage } from '../../../lib/api-error';
import { useCreateCheckout } from '../api/create-checkout';
import type { CreditPack } from '../types';
import { checkoutPendingRemember } from '../utils/checkout-pending';
import { countText, moneyText } from '../utils/money-text';

export type CreditPacksProps = {
  orgId: string;
  packs: CreditPack[];
  /** Sends the browser to the hosted checkout page (a full page load); replaced in tests. */
  onNavigate?: (url: string) => void;
};

/**
 * The credit packs on sale as three cards; buying one opens the payment provider's checkout page.
 * @param props the organization, the packs and the navigation function
 * @returns a card with one panel per pack
 * @example <CreditPacks orgId={orgId} packs={billing.packs} />
 */
export function CreditPacks({ orgId, packs, onNavigate = (url) => window.location.assign(url) }: CreditPacksProps) {
  const [chosen, setChosen] = useState<string | null>(null);
  const checkout = useCreateCheckout(orgId, {
    onSuccess: ({ url, sessionId }, input) => {
      checkoutPendingRemember({ sessionId, kind: input.kind, credits: packs.find((p) => input.kind === 'credits' && p.id === input.pack)?.credits });
      onNavigate(url);
    },
  });
  return (
    <Card>
      <CardHeader title="Buy credits" description="Paid once, never expire. You pay on a secure checkout page and return here." />
      <div className="flex flex-col gap-4 p-5">
        {checkout.isError ? <Alert tone="danger">{errorMessage(checkout.error)}</Alert> : null}
        <ul className="grid gap-4 sm:grid-cols-3">
          {packs.map((pack) => (
            <li key={pack.id} className="flex flex-col gap-3 rounded-control border border-line p-4">
              <h3 className="text-lg font-semibold text-ink tabular-nums">{countText(pack.credits)} credits</h3>
              <p className="text-2xl font-semibold tabular-nums text-ink">{moneyText(pack.amount, pack.currency)}</p>
              <p className="text-xs text-ink-muted tabular-nums">
                {moneyText(Math.round(pack.amount / pack.credits), pack.currency)} per credit
              </p>
              <Button
                onClick={() => {
                  setChosen(pack.id);
                  checkout.mutate({ kind: 'credits', pack: pack.id });
                }}
                isLoading={checkout.isPending && chosen === pack.id}
                disabled={checkout.isPending}
                aria-label={`Buy ${countText(pack.credits)} credits for ${moneyText(pack.amount, pack.currency)}`}
              >
                Buy
              </Button>
            </li>
          ))}
        </ul>
      </div>
    </Card>
  );
}
