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
  'scoring.settings_update': 'Changed the scoring settings',
  'scoring.run_create': 'Scored the sites',
  'scoring.run_delete': 'Deleted a scoring run',
  'scoring.set_create': 'Scored candidates opened together',
  'shortlist.create': 'Created a shortlist',
  'shortlist.version_create': 'Saved a new shortlist version',
  'shortlist.rename': 'Renamed a shortlist',
  'shortlist.delete': 'Deleted a shortlist',
  'shortlist.share': 'Shared a shortlist',
  'export.ranking_xlsx': 'Exported a ranking report (XLSX)',
  'export.ranking_csv': 'Exported a ranking (CSV)',
  'export.sites_geojson': 'Exported sites with scores (GeoJSON)',
  'export.shortlist_xlsx': 'Exported a shortlist report (XLSX)',
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
