import type { Invitation, InvitationPreview } from '../types';

let counter = 0;

/**
 * An invitation as owners see it (invented Larchloaf staff).
 * @param overrides fields to set
 * @returns the invitation
 * @example createInvitation({ status: 'expired' })
 */
export function createInvitation(overrides: Partial<Invitation> = {}): Invitation {
  counter += 1;
  return {
    id: `inv_${counter}`,
    email: `baker${counter}@larchloaf.test`,
    role: 'analyst',
    status: 'pending',
    invitedBy: { id: 'usr_owner', name: 'Wren Applegarth' },
    expiresAt: '2026-12-09T10:00:00.000Z',
    createdAt: '2026-12-02T10:00:00.000Z',
    ...overrides,
  };
}

/**
 * What the public invitation preview returns.
 * @param overrides fields to set
 * @returns the preview
 * @example createInvitationPreview({ status: 'revoked' })
 */
export function createInvitationPreview(overrides: Partial<InvitationPreview> = {}): InvitationPreview {
  return {
    organization: { id: 'org_1', name: 'Larchloaf' },
    role: 'analyst',
    invitedBy: { name: 'Wren Applegarth' },
    email: 'tobiah@larchloaf.test',
    expiresAt: '2026-12-09T10:00:00.000Z',
    expired: false,
    status: 'pending',
    ...overrides,
  };
}
