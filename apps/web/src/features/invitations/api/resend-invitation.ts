import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import type { MutationConfig } from '../../../lib/react-query';
import type { Invitation } from '../types';

/**
 * Sends the invitation again with a new link (the old link stops working) and a new 7-day expiry.
 * @param orgId the organization
 * @param invitationId the invitation
 * @returns the invitation with its new expiry
 * @example await resendInvitation(orgId, invitation.id);
 */
export async function resendInvitation(orgId: string, invitationId: string): Promise<Invitation> {
  const body = await api.post<{ invitation: Invitation }>(`/organizations/${orgId}/invitations/${invitationId}/resend`);
  return body.invitation;
}

/**
 * Mutation that resends an invitation and refreshes the list.
 * @param orgId the organization
 * @param config extra mutation options
 * @returns the mutation (variables: the invitation id)
 * @example useResendInvitation(orgId).mutate(invitation.id)
 */
export function useResendInvitation(orgId: string, config: MutationConfig<string, Invitation> = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    ...config,
    mutationFn: (invitationId: string) => resendInvitation(orgId, invitationId),
    onSuccess: async (...args) => {
      await queryClient.invalidateQueries({ queryKey: ['organizations', orgId, 'invitations'] });
      void queryClient.invalidateQueries({ queryKey: ['organizations', orgId, 'billing'] });
      await config.onSuccess?.(...args);
    },
  });
}
