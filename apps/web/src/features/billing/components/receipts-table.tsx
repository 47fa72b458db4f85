import { Alert, Card, CardHeader, EmptyState, Spinner } from '@demandscape/ui';
import { errorMessage } from '../../../lib/api-error';
import { dateText } from '../../../lib/format';
import { useReceipts } from '../api/get-receipts';
import { moneyText } from '../utils/money-text';

/**
 * Payments received (credit packs and seat plan invoices), newest first.
 * @param props the organization
 * @returns a card with the table, or its loading, error or empty state
 * @example <ReceiptsTable orgId={orgId} />
 */
export function ReceiptsTable({ orgId }: { orgId: string }) {
  const receipts = useReceipts(orgId);
  return (
    <Card>
      <CardHeader title="Receipts" description="Each payment is also sent by e-mail to the owner who paid." />
      {receipts.isPending ? <Spinner label="Loading receipts" className="flex justify-center p-10" /> : null}
      {receipts.isError ? (
        <div className="p-5">
          <Alert tone="danger" title="Could not load the receipts">
            {errorMessage(receipts.error)}
          </Alert>
        </div>
      ) : null}
      {receipts.data?.length === 0 ? <EmptyState title="No payments yet">Receipts appear here after the first purchase.</EmptyState> : null}
      {receipts.data && receipts.data.length > 0 ? (
        <div className="overflow-x-auto">
          <table className="w-full text-left text-sm">
            <caption className="sr-only">Receipts</caption>
            <thead className="border-b border-line text-xs text-ink-muted">
              <tr>
                <th scope="col" className="px-5 py-2.5 font-medium">Date</th>
                <th scope="col" className="px-5 py-2.5 font-medium">What</th>
                <th scope="col" className="px-5 py-2.5 text-right font-medium">Amount</th>
                <th scope="col" className="px-5 py-2.5 font-medium">Reference</th>
              </tr>
            </thead>
            <tbody className="divide-y divide-line">
              {receipts.data.map((receipt) => (
                <tr key={receipt.id}>
                  <td className="px-5 py-3 whitespace-nowrap text-ink-muted">{dateText(receipt.createdAt)}</td>
                  <td className="px-5 py-3">{receipt.description}</td>
                  <td className="px-5 py-3 text-right tabular-nums">{moneyText(receipt.amount, receipt.currency)}</td>
                  <td className="px-5 py-3 font-mono text-xs text-ink-muted">{receipt.reference}</td>
                </tr>
              ))}
            </tbody>
          </table>
        </div>
      ) : null}
    </Card>
  );
}
