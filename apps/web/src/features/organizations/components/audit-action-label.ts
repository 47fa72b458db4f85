/** Plain words for the audit actions the server records; unknown actions show their code. */
const labels: Record<string, string> = {
  'auth.sign_in': 'Signed in',
  'auth.sign_in_failed': 'Failed sign-in',
  'auth.sign_up': 'Created an account',
  'auth.sign_out': 'Signed out',
  'auth.password_reset': 'Reset password',
  'organization.create': 'Created the organization',
  'organization.rename': 'Renamed the organization',
  'workspace.create': 'Created a workspace',
  'workspace.update': 'Changed a workspace',
  'workspace.delete': 'Deleted a workspace',
};

/**
 * A readable label for an audit action code.
 * @param action e.g. `workspace.create`
 * @returns e.g. "Created a workspace"
 * @example auditActionLabel('auth.sign_in') // 'Signed in'
 */
export function auditActionLabel(action: string): string {
  return labels[action] ?? action;
}
