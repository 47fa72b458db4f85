/** Response shapes of the Demandscape API (contract v1). */

export type Role = 'owner' | 'analyst' | 'planner' | 'executive';

export type User = {
  id: string;
  email: string;
  name: string;
  emailVerified: boolean;
  createdAt: string;
};

export type OrganizationRef = { id: string; name: string; slug: string };

export type Membership = { organization: OrganizationRef; role: Role };

export type Me = { user: User; memberships: Membership[] };

export type OrganizationSummary = OrganizationRef & { role: Role; createdAt: string };

export type Organization = OrganizationRef & { createdAt?: string; updatedAt?: string };

export type Member = { userId: string; name: string; email: string; role: Role; joinedAt: string };

export type AuditEvent = {
  id: string;
  action: string;
  actor: { id: string; name: string; email: string } | null;
  target: unknown;
  details: Record<string, unknown> | null;
  createdAt: string;
};

export type Workspace = {
  id: string;
  name: string;
  description: string | null;
  createdAt: string;
  updatedAt: string;
  createdBy: { id: string; name: string } | null;
};

export type AuthProviders = { google?: { enabled: boolean; label: string } };
