import { screen } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { http, HttpResponse } from 'msw';
import { describe, expect, it } from 'vitest';
import { createAuditEvent } from '../../../../testing/data-generators';
import { server } from '../../../../testing/mocks/server';
import { renderWithProviders } from '../../../../testing/test-utils';
import { AuditLog } from '../audit-log';

describe('AuditLog', () => {
  it('sends the action filter and pages with the integer cursor the server returns', async () => {
    const requests: string[] = [];
    server.use(
      http.get('*/api/organizations/org_1/audit-events', ({ request }) => {
        const url = new URL(request.url);
        requests.push(url.search);
        const action = url.searchParams.get('action');
        if (action === 'member.role_change') {
          return HttpResponse.json({ events: [createAuditEvent('member.role_change', { id: '7', details: { from: 'analyst', to: 'planner' } })], nextBefore: null });
        }
        if (url.searchParams.get('before') === '41') {
          return HttpResponse.json({ events: [createAuditEvent('invitation.create', { id: '40' })], nextBefore: null });
        }
        return HttpResponse.json({ events: [createAuditEvent('billing.purchase', { id: '41' })], nextBefore: 41 });
      }),
    );
    renderWithProviders(<AuditLog orgId="org_1" />);
    expect(await screen.findByRole('cell', { name: /Paid \(credits or seats\)/ })).toBeInTheDocument();

    await userEvent.click(screen.getByRole('button', { name: 'Older events' }));
    expect(await screen.findByRole('cell', { name: /Invited someone/ })).toBeInTheDocument();
    expect(screen.queryByRole('button', { name: 'Older events' })).not.toBeInTheDocument();

    await userEvent.selectOptions(screen.getByLabelText('Action'), 'member.role_change');
    expect(await screen.findByText('from: analyst · to: planner')).toBeInTheDocument();
    expect(requests).toEqual(['?limit=50', '?limit=50&before=41', '?limit=50&action=member.role_change']);
  });
});
