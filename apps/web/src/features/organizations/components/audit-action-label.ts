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
  'customer_file.upload': 'Uploaded a customer file',
  'customer_file.import': 'Imported a customer file',
  'customer_file.delete': 'Deleted a customer file',
  'customer_file.rejected_download': 'Downloaded rejected rows',
  'surface.create': 'Started a demand surface',
  'surface.cancel': 'Cancelled a demand surface',
  'surface.retry': 'Retried a demand surface',
  'surface.delete': 'Deleted a demand surface',
  'site.create': 'Added a site',
  'site.update': 'Changed or moved a site',
  'site.delete': 'Deleted a site',
  'site.import': 'Imported sites from a file',
  'export.surface_geotiff': 'Exported a demand surface (GeoTIFF)',
  'export.surface_contours': 'Exported percent-volume contours (GeoJSON)',
  'billing.checkout': 'Opened a checkout',
  'billing.purchase': 'Paid (credits or seats)',
  'billing.seats_change': 'Changed the number of seats',
  'invitation.create': 'Invited someone',
  'invitation.revoke': 'Revoked an invitation',
  'invitation.resend': 'Resent an invitation',
  'invitation.accept': 'Accepted an invitation',
  'member.role_change': 'Changed a member’s role',
  'member.remove': 'Removed a member',
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
