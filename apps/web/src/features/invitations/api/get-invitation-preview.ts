import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import type { InvitationPreview } from '../types';

/**
 * What an invitation link offers, readable without signing in (the token is the credential).
 * @param token the token from the e-mailed link
 * @returns organization, role, inviter, invited e-mail, expiry and status
 * @example const preview = await getInvitationPreview(token);
 */
export async function getInvitationPreview(token: string): Promise<InvitationPreview> {
  const body = await api.get<{ invitation: InvitationPreview }>(`/invitations/${encodeURIComponent(token)}`);
  return body.invitation;
}

/**
 * Query options for an invitation preview.
 * @param token the token from the link
 * @returns options keyed `['invitations', token]`
 * @example queryClient.prefetchQuery(getInvitationPreviewQueryOptions(token))
 */
export function getInvitationPreviewQueryOptions(token: string) {
  return queryOptions({ queryKey: ['invitations', token], queryFn: () => getInvitationPreview(token), enabled: token.length > 0 });
}

/**
 * An invitation preview in a component.
 * @param token the token from the link
 * @returns the query result
 * @example const preview = useInvitationPreview(token);
 */
export function useInvitationPreview(token: string) {
  return useQuery(getInvitationPreviewQueryOptions(token));
}
