import { Alert, Button, Card, CardHeader, EmptyState, Select, Spinner } from '@demandscape/ui';
import { useId, useState } from 'react';
import { errorMessage } from '../../../lib/api-error';
import { dateTimeText } from '../../../lib/format';
import { auditActions, useAuditEvents } from '../api/get-audit-events';
import { auditActionLabel } from './audit-action-label';

function targetText(target: unknown): string {
  if (target === null || target === undefined) return '';
  if (typeof target !== 'object') return String(target);
  const { type, name, id } = target as { type?: unknown; name?: unknown; id?: unknown };
  return [type, name ?? id].filter((part) => typeof part === 'string' && part).join(' ');
}

function detailsText(details: Record<string, unknown> | null): string {
  if (!details || typeof details !== 'object') return '';
  return Object.entries(details)
    .filter(([, value]) => value !== null && value !== undefined && typeof value !== 'object')
    .map(([key, value]) => `${key}: ${String(value)}`)
    .join(' · ');
}

/**
 * The organization's audit log, newest first, filterable by action, 50 events at a time with an
 * "Older events" button.
 * @param props the organization
 * @returns a card with filter and table, or its loading, error or empty state
 * @example <AuditLog orgId={orgId} />
 */
export function AuditLog({ orgId }: { orgId: string }) {
  const [action, setAction] = useState('');
  const filterId = useId();
  const log = useAuditEvents(orgId, action);
  const events = log.data?.pages.flatMap((page) => page.events) ?? [];

  return (
    <Card>
      <CardHeader
        title="Audit log"
        description="Who did what, and when. Only owners see this log."
        actions={
          <div className="flex items-center gap-2">
            <label htmlFor={filterId} className="text-sm text-ink-muted">
              Action
            </label>
            <Select id={filterId} value={action} onChange={(event) => setAction(event.target.value)} className="w-56">
              <option value="">All actions</option>
              {auditActions.map((value) => (
                <option key={value} value={value}>
                  {auditActionLabel(value)}
                </option>
              ))}
            </Select>
          </div>
        }
      />
      {log.isPending ? <Spinner label="Loading the audit log" className="flex justify-center p-10" /> : null}
      {log.isError ? (
        <div className="p-5">
          <Alert tone="danger" title="Could not load the audit log">
            {errorMessage(log.error)}
          </Alert>
        </div>
      ) : null}
      {log.isSuccess && events.length === 0 ? (
        <EmptyState title={action ? 'No events of this kind' : 'No events yet'}>
          {action ? 'Choose “All actions” to see everything recorded.' : 'Sign-ins and changes will be listed here.'}
        </EmptyState>
      ) : null}
      {events.length > 0 ? (
        <div className="overflow-x-auto">
          <table className="w-full text-left text-sm">
            <thead className="border-b border-line text-xs text-ink-muted">
              <tr>
                <th scope="col" className="px-5 py-2.5 font-medium">When</th>
                <th scope="col" className="px-5 py-2.5 font-medium">Who</th>
                <th scope="col" className="px-5 py-2.5 font-medium">What</th>
                <th scope="col" className="px-5 py-2.5 font-medium">Details</th>
              </tr>
            </thead>
            <tbody className="divide-y divide-line">
              {events.map((event) => (
                <tr key={event.id}>
                  <td className="px-5 py-3 whitespace-nowrap text-ink-muted">{dateTimeText(event.createdAt)}</td>
                  <td className="px-5 py-3">
                    {event.actor ? (
                      <>
                        <span className="font-medium text-ink">{event.actor.name}</span>
                        <span className="block text-xs text-ink-muted">{event.actor.email}</span>
                      </>
                    ) : (
                      <span className="text-ink-muted">System or unknown</span>
                    )}
                  </td>
                  <td className="px-5 py-3">
                    {auditActionLabel(event.action)}
                    <span className="block font-mono text-xs text-ink-faint">{event.action}</span>
                  </td>
                  <td className="px-5 py-3 text-ink-muted">
                    {[targetText(event.target), detailsText(event.details)].filter(Boolean).join(' · ') || '—'}
                  </td>
                </tr>
              ))}
            </tbody>
          </table>
        </div>
      ) : null}
      {log.hasNextPage || log.isFetchNextPageError ? (
        <div className="flex items-center justify-center gap-3 border-t border-line p-4">
          {log.isFetchNextPageError ? <span className="text-sm text-danger">{errorMessage(log.error)}</span> : null}
          <Button variant="secondary" onClick={() => void log.fetchNextPage()} isLoading={log.isFetchingNextPage}>
            Older events
          </Button>
        </div>
      ) : null}
    </Card>
  );
}
