import { useOutletContext } from 'react-router';
import type { Role } from '../../../types/api';

export type OrgContext = { orgId: string; orgName: string; role: Role };

/**
 * The organization in view and the member's role in it, for pages under `/orgs/:orgId`.
 * @returns the context that the organization route provides
 * @example const { orgId, role } = useOrgContext();
 */
export function useOrgContext(): OrgContext {
  return useOutletContext<OrgContext>();
}
