/** Every URL in the app; routes and links read from here so a path changes in one place. */
export const paths = {
  home: { path: '/', getHref: () => '/' },
  auth: {
    signIn: {
      path: '/sign-in',
      getHref: (redirectTo?: string | null) =>
        redirectTo && redirectTo !== '/' ? `/sign-in?redirectTo=${encodeURIComponent(redirectTo)}` : '/sign-in',
    },
    signUp: {
      path: '/sign-up',
      getHref: (redirectTo?: string | null) =>
        redirectTo && redirectTo !== '/' ? `/sign-up?redirectTo=${encodeURIComponent(redirectTo)}` : '/sign-up',
    },
    forgotPassword: { path: '/forgot-password', getHref: () => '/forgot-password' },
    resetPassword: { path: '/reset-password', getHref: (token: string) => `/reset-password?token=${encodeURIComponent(token)}` },
    verifyEmail: { path: '/verify-email', getHref: (token: string) => `/verify-email?token=${encodeURIComponent(token)}` },
    google: { getHref: () => '/api/auth/google' },
  },
  welcome: { path: '/welcome', getHref: () => '/welcome' },
  invitationAccept: {
    path: '/invitations/accept',
    getHref: (token: string) => `/invitations/accept?token=${encodeURIComponent(token)}`,
  },
  account: { path: '/account', getHref: () => '/account' },
  org: {
    root: { path: '/orgs/:orgId', getHref: (orgId: string) => `/orgs/${orgId}` },
    workspaces: { path: 'workspaces', getHref: (orgId: string) => `/orgs/${orgId}/workspaces` },
    workspace: {
      path: 'workspaces/:workspaceId',
      /** `step` opens that study step's panel (customers, surface, sites or shortlist). */
      getHref: (orgId: string, workspaceId: string, step?: 'customers' | 'surface' | 'sites' | 'shortlist') =>
        `/orgs/${orgId}/workspaces/${workspaceId}${step ? `?step=${step}` : ''}`,
    },
    members: { path: 'members', getHref: (orgId: string) => `/orgs/${orgId}/members` },
    auditLog: { path: 'audit-log', getHref: (orgId: string) => `/orgs/${orgId}/audit-log` },
    billing: { path: 'billing', getHref: (orgId: string) => `/orgs/${orgId}/billing` },
    shortlists: { path: 'shortlists', getHref: (orgId: string) => `/orgs/${orgId}/shortlists` },
    shortlist: {
      path: 'shortlists/:shortlistId',
      getHref: (orgId: string, shortlistId: string, version?: number | null) =>
        `/orgs/${orgId}/shortlists/${shortlistId}${version ? `?version=${version}` : ''}`,
    },
  },
} as const;

/**
 * Keeps a post-sign-in return path on this site: only same-origin absolute paths pass.
 * @param value the `redirectTo` query parameter
 * @returns the path, or '/' when it is missing or points elsewhere
 * @example safeRedirectPath('//elsewhere.test') // '/'
 */
export function safeRedirectPath(value: string | null | undefined): string {
  if (!value || !value.startsWith('/') || value.startsWith('//') || value.startsWith('/\\')) return '/';
  return value;
}
