import type { Role } from '../../types/api';

/** Shapes of `/api/organizations/:orgId/invitations` and `/api/invitations` (apps/server/API.md, "Invitations"). */

export type InvitationStatus = 'pending' | 'expired' | 'accepted' | 'revoked';

export type Invitation = {
  id: string;
  email: string;
  role: Role;
  status: InvitationStatus;
  invitedBy: { id: string; name: string } | null;
  expiresAt: string;
  createdAt: string;
};

export type InvitationPreview = {
  organization: { id: string; name: string };
  role: Role;
  invitedBy: { name: string } | null;
  email: string;
  expiresAt: string;
  expired: boolean;
  status: InvitationStatus;
};
