import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import type { MutationConfig } from '../../../lib/react-query';

/**
 * Withdraws an invitation; its link stops working and its seat is free again.
 * @param orgId the organization
 * @param invitationId the invitation
 * @returns nothing
 * @example await revokeInvitation(orgId, invitation.id);
 */
export function revokeInvitation(orgId: string, invitationId: string): Promise<void> {
  return api.delete(`/organizations/${orgId}/invitations/${invitationId}`);
}

/**
 * Mutation that revokes an invitation and refreshes the list and seat counts.
 * @param orgId the organization
 * @param config extra mutation options
 * @returns the mutation (variables: the invitation id)
 * @example useRevokeInvitation(orgId).mutate(invitation.id)
 */
export function useRevokeInvitation(orgId: string, config: MutationConfig<string, void> = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    ...config,
    mutationFn: (invitationId: string) => revokeInvitation(orgId, invitationId),
    onSuccess: async (...args) => {
      await queryClient.invalidateQueries({ queryKey: ['organizations', orgId, 'invitations'] });
      void queryClient.invalidateQueries({ queryKey: ['organizations', orgId, 'billing'] });
      await config.onSuccess?.(...args);
    },
  });
}
