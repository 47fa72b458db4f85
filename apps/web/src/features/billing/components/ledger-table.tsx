import { Alert, Button, Card, CardHeader, EmptyState, Spinner, cn } from '@demandscape/ui';
import { errorMessage } from '../../../lib/api-error';
import { dateTimeText } from '../../../lib/format';
import { useLedger } from '../api/get-ledger';
import { ledgerKindLabels, ledgerReferenceText } from '../utils/ledger-text';
import { countText, signedCreditsText } from '../utils/money-text';

/**
 * The credits ledger, newest first, a page at a time: date, kind, amount ±, balance after, reference.
 * @param props the organization
 * @returns a card with the table, or its loading, error or empty state
 * @example <LedgerTable orgId={orgId} />
 */
export function LedgerTable({ orgId }: { orgId: string }) {
  const ledger = useLedger(orgId);
  const entries = ledger.data?.pages.flatMap((page) => page.entries) ?? [];
  return (
    <Card>
      <CardHeader title="Credits ledger" description="Every credit in and out. A run reserves its cost when it starts; a stopped or failed run gets it back." />
      {ledger.isPending ? <Spinner label="Loading the ledger" className="flex justify-center p-10" /> : null}
      {ledger.isError && entries.length === 0 ? (
        <div className="p-5">
          <Alert tone="danger" title="Could not load the ledger">
            {errorMessage(ledger.error)}
          </Alert>
        </div>
      ) : null}
      {ledger.isSuccess && entries.length === 0 ? <EmptyState title="No credit movements yet">Purchases, grants and runs will be listed here.</EmptyState> : null}
      {entries.length > 0 ? (
        <div className="overflow-x-auto">
          <table className="w-full text-left text-sm">
            <caption className="sr-only">Credits ledger</caption>
            <thead className="border-b border-line text-xs text-ink-muted">
              <tr>
                <th scope="col" className="px-5 py-2.5 font-medium">Date</th>
                <th scope="col" className="px-5 py-2.5 font-medium">Kind</th>
                <th scope="col" className="px-5 py-2.5 text-right font-medium">Credits</th>
                <th scope="col" className="px-5 py-2.5 text-right font-medium">Balance after</th>
                <th scope="col" className="px-5 py-2.5 font-medium">Reference</th>
              </tr>
            </thead>
            <tbody className="divide-y divide-line">
              {entries.map((entry) => (
                <tr key={entry.id}>
                  <td className="px-5 py-3 whitespace-nowrap text-ink-muted">{dateTimeText(entry.createdAt)}</td>
                  <td className="px-5 py-3">{ledgerKindLabels[entry.kind] ?? entry.kind}</td>
                  <td className={cn('px-5 py-3 text-right tabular-nums', entry.amount > 0 && 'text-success', entry.amount < 0 && 'text-ink')}>
                    {signedCreditsText(entry.amount)}
                  </td>
                  <td className="px-5 py-3 text-right tabular-nums">{countText(entry.balanceAfter)}</td>
                  <td className="px-5 py-3 text-ink-muted">{ledgerReferenceText(entry)}</td>
                </tr>
              ))}
            </tbody>
          </table>
        </div>
      ) : null}
      {ledger.hasNextPage || ledger.isFetchNextPageError ? (
        <div className="flex items-center justify-center gap-3 border-t border-line p-4">
          {ledger.isFetchNextPageError ? <span className="text-sm text-danger">{errorMessage(ledger.error)}</span> : null}
          <Button variant="secondary" onClick={() => void ledger.fetchNextPage()} isLoading={ledger.isFetchingNextPage}>
            Older entries
          </Button>
        </div>
      ) : null}
    </Card>
  );
}
