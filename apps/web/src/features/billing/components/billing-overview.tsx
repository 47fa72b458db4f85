import { Alert, Spinner } from '@demandscape/ui';
import { errorMessage } from '../../../lib/api-error';
import { useBilling } from '../api/get-billing';
import { useCheckoutReturn } from '../hooks/use-checkout-return';
import { CreditBalance } from './credit-balance';
import { CreditPacks } from './credit-packs';
import { LedgerTable } from './ledger-table';
import { ReceiptsTable } from './receipts-table';
import { SeatPlan } from './seat-plan';

export type BillingOverviewPanelProps = {
  orgId: string;
  /** Sends the browser to the hosted checkout page; replaced in tests. */
  onNavigate?: (url: string) => void;
};

/**
 * The owner's billing page body: credit balance and packs, seat plan, ledger and receipts; after a
 * checkout it waits for the payment confirmation and refreshes the balance.
 * @param props the organization and the navigation function
 * @returns the page sections
 * @example <BillingOverviewPanel orgId={orgId} />
 */
export function BillingOverviewPanel({ orgId, onNavigate }: BillingOverviewPanelProps) {
  const billing = useBilling(orgId);
  const { waiting, timedOut } = useCheckoutReturn(orgId);
  if (billing.isPending) return <Spinner label="Loading billing" className="flex justify-center p-10" />;
  if (billing.isError) {
    return (
      <Alert tone="danger" title="Could not load billing">
        {errorMessage(billing.error)}
      </Alert>
    );
  }
  return (
    <div className="flex flex-col gap-6">
      {timedOut ? (
        <Alert tone="caution" title="The payment is not confirmed yet">
          The payment provider has not confirmed the payment within a minute. Reload this page in a little while; you are not
          charged twice.
        </Alert>
      ) : null}
      <div className="grid gap-6 lg:grid-cols-[minmax(0,1fr)_minmax(0,2fr)]">
        <CreditBalance credits={billing.data.credits} waiting={waiting} />
        <CreditPacks orgId={orgId} packs={billing.data.packs} onNavigate={onNavigate} />
      </div>
      <SeatPlan orgId={orgId} billing={billing.data} onNavigate={onNavigate} />
      <LedgerTable orgId={orgId} />
      <ReceiptsTable orgId={orgId} />
    </div>
  );
}
