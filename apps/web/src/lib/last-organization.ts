const KEY = 'demandscape.lastOrganizationId';

/**
 * The organization the user last opened in this browser, so "/" and the account page can return to it.
 * @returns its id, or null
 * @example lastOrganizationId() ?? memberships[0]?.organization.id
 */
export function lastOrganizationId(): string | null {
  try {
    return globalThis.localStorage?.getItem(KEY) ?? null;
  } catch {
    return null;
  }
}

/**
 * Remembers the organization in view.
 * @param orgId its id
 * @returns nothing
 * @example lastOrganizationRemember(params.orgId)
 */
export function lastOrganizationRemember(orgId: string): void {
  try {
    globalThis.localStorage?.setItem(KEY, orgId);
  } catch {
    // Storage can be disabled (private mode, policy); the app then starts at the first organization.
  }
}
