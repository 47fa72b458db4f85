import { screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { http, HttpResponse } from 'msw';
import { describe, expect, it, vi } from 'vitest';
import { apiErrorResponse } from '../../../../testing/mocks/handlers';
import { server } from '../../../../testing/mocks/server';
import { renderWithProviders } from '../../../../testing/test-utils';
import { createBillingOverview, createLedgerEntry } from '../../testing/billing-factories';
import { BillingOverviewPanel } from '../billing-overview';

const base = '*/api/organizations/org_1/billing';

function billingHandlers(overview = createBillingOverview(), entries = [createLedgerEntry()]) {
  return [
    http.get(base, () => HttpResponse.json(overview)),
    http.get(`${base}/ledger`, () => HttpResponse.json({ entries, nextBefore: null })),
    http.get(`${base}/receipts`, () => HttpResponse.json({ receipts: [] })),
  ];
}

describe('BillingOverviewPanel', () => {
  it('shows the balance in big figures and the three packs, and opens the checkout for a pack', async () => {
    let body: unknown = null;
    server.use(
      ...billingHandlers(),
      http.post(`${base}/checkout`, async ({ request }) => {
        body = await request.json();
        return HttpResponse.json({ url: 'http://localhost:3002/checkout/cs_test_1', sessionId: 'cs_test_1' }, { status: 201 });
      }),
    );
    const navigate = vi.fn();
    renderWithProviders(<BillingOverviewPanel orgId="org_1" onNavigate={navigate} />);

    expect(await screen.findByTestId('credit-balance')).toHaveTextContent('1,240');
    expect(screen.getByRole('heading', { name: '100 credits' })).toBeInTheDocument();
    expect(screen.getByRole('heading', { name: '500 credits' })).toBeInTheDocument();
    expect(screen.getByRole('heading', { name: '2,000 credits' })).toBeInTheDocument();
    expect(screen.getByText('€200.00')).toBeInTheDocument();
    expect(await screen.findByText('Welcome credits')).toBeInTheDocument();

    await userEvent.click(screen.getByRole('button', { name: 'Buy 500 credits for €60.00' }));
    await waitFor(() => expect(navigate).toHaveBeenCalledWith('http://localhost:3002/checkout/cs_test_1'));
    expect(body).toEqual({ kind: 'credits', pack: 'pack-500' });
  });

  it('shows the new monthly total before a seat change and refuses fewer seats than used', async () => {
    let sent: unknown = null;
    server.use(
      ...billingHandlers(),
      http.post(`${base}/seats`, async ({ request }) => {
        sent = await request.json();
        return HttpResponse.json(createBillingOverview({ plan: { status: 'active', seatsPaid: 7, currentPeriodEnd: null }, seats: { used: 4, limit: 7, members: 3, pendingInvitations: 1 } }));
      }),
    );
    renderWithProviders(<BillingOverviewPanel orgId="org_1" />);
    const form = await screen.findByRole('form', { name: 'Change seats' });
    const seats = within(form).getByLabelText('Seats');
    expect(within(form).getByRole('status')).toHaveTextContent('New monthly total: 5 seats × €39.00 = €195.00 per month');

    await userEvent.clear(seats);
    await userEvent.type(seats, '3');
    await userEvent.click(within(form).getByRole('button', { name: 'Change to 3 seats' }));
    expect(await within(form).findByText(/4 seats are in use/)).toBeInTheDocument();
    expect(sent).toBeNull();

    await userEvent.clear(seats);
    await userEvent.type(seats, '7');
    expect(within(form).getByRole('status')).toHaveTextContent('7 seats × €39.00 = €273.00 per month (now €195.00; the difference is prorated)');
    await userEvent.click(within(form).getByRole('button', { name: 'Change to 7 seats' }));
    expect(await within(form).findByText('The plan now has 7 seats.')).toBeInTheDocument();
    expect(sent).toEqual({ seats: 7 });
  });

  it('shows the server’s reason when a seat change is refused', async () => {
    server.use(
      ...billingHandlers(),
      http.post(`${base}/seats`, () => apiErrorResponse(409, 'SEATS_BELOW_USED', '6 seats are in use (5 members, 1 open invitations) — remove members or revoke invitations before going below 6.')),
    );
    renderWithProviders(<BillingOverviewPanel orgId="org_1" />);
    const form = await screen.findByRole('form', { name: 'Change seats' });
    await userEvent.clear(within(form).getByLabelText('Seats'));
    await userEvent.type(within(form).getByLabelText('Seats'), '4');
    await userEvent.click(within(form).getByRole('button', { name: 'Change to 4 seats' }));
    expect(await within(form).findByText(/remove members or revoke invitations before going below 6/)).toBeInTheDocument();
  });

  it('after a successful checkout polls until the purchase is in the ledger, then shows the new balance', async () => {
    let polls = 0;
    server.use(
      http.get(base, () => HttpResponse.json(createBillingOverview({ credits: { balance: polls >= 2 ? 1740 : 1240, lowBalanceThreshold: 50, low: false } }))),
      http.get(`${base}/ledger`, () => {
        polls += 1;
        const entries = polls >= 2 ? [createLedgerEntry({ kind: 'purchase', amount: 500, balanceAfter: 1740, ref: 'cs_test_9', details: { pack: 'pack-500' } })] : [];
        return HttpResponse.json({ entries, nextBefore: null });
      }),
      http.get(`${base}/receipts`, () => HttpResponse.json({ receipts: [] })),
    );
    renderWithProviders(<BillingOverviewPanel orgId="org_1" />, { url: '/orgs/org_1/billing?checkout=success&session_id=cs_test_9', path: '/orgs/:orgId/billing' });
    expect(await screen.findByText('Payment received')).toBeInTheDocument();
    await waitFor(() => expect(screen.getByTestId('credit-balance')).toHaveTextContent('1,740'), { timeout: 6000 });
    expect(await screen.findByText('The balance is now 1,740 credits.')).toBeInTheDocument();
  }, 15_000);
});
