import { screen } from '@testing-library/react';
import { http, HttpResponse } from 'msw';
import { describe, expect, it } from 'vitest';
import { createBillingOverview } from '../../../features/billing/testing/billing-factories';
import { createMe, createMember, createOrganization } from '../../../testing/data-generators';
import { server } from '../../../testing/mocks/server';
import { renderApp } from '../../../testing/test-utils';

function signedInAs(role: 'owner' | 'analyst') {
  const org = createOrganization({ id: 'org_1', name: 'Larchloaf', role });
  server.use(
    http.get('*/api/me', () => HttpResponse.json(createMe([org]))),
    http.get('*/api/organizations', () => HttpResponse.json({ organizations: [org] })),
    http.get('*/api/organizations/org_1/members', () => HttpResponse.json({ members: [createMember('owner', { name: 'Odile Fairhaven' })] })),
    http.get('*/api/organizations/org_1/invitations', () => HttpResponse.json({ invitations: [] })),
    http.get('*/api/organizations/org_1/billing', () => HttpResponse.json(createBillingOverview())),
    http.get('*/api/organizations/org_1/billing/ledger', () => HttpResponse.json({ entries: [], nextBefore: null })),
    http.get('*/api/organizations/org_1/billing/receipts', () => HttpResponse.json({ receipts: [] })),
  );
}

describe('owner pages', () => {
  it('opens billing for an owner', async () => {
    signedInAs('owner');
    renderApp('/orgs/org_1/billing');
    expect(await screen.findByRole('heading', { name: 'Billing', level: 1 })).toBeInTheDocument();
    expect(await screen.findByTestId('credit-balance')).toHaveTextContent('1,240');
  });

  it('tells an analyst that billing is for owners', async () => {
    signedInAs('analyst');
    renderApp('/orgs/org_1/billing');
    expect(await screen.findByText('Only owners of this organization can see and change its billing.')).toBeInTheDocument();
  });

  it('gives an analyst the member list without invitations or role controls', async () => {
    signedInAs('analyst');
    renderApp('/orgs/org_1/members');
    expect(await screen.findByText('Odile Fairhaven')).toBeInTheDocument();
    expect(screen.queryByRole('form', { name: 'Invite someone' })).not.toBeInTheDocument();
    expect(screen.queryByRole('combobox')).not.toBeInTheDocument();
  });

  it('gives an owner the invite form and the open invitations', async () => {
    signedInAs('owner');
    renderApp('/orgs/org_1/members');
    expect(await screen.findByRole('form', { name: 'Invite someone' })).toBeInTheDocument();
    expect(await screen.findByText('No open invitations')).toBeInTheDocument();
    expect(screen.getByLabelText('Role of Odile Fairhaven')).toBeInTheDocument();
  });
});
