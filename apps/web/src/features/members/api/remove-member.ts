import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import type { MutationConfig } from '../../../lib/react-query';

/**
 * Removes a member from the organization, freeing their seat (the last owner cannot be removed).
 * @param orgId the organization
 * @param userId the member's user id
 * @returns nothing
 * @example await removeMember(orgId, userId);
 */
export function removeMember(orgId: string, userId: string): Promise<void> {
  return api.delete(`/organizations/${orgId}/members/${userId}`);
}

/**
 * Mutation that removes a member and refreshes members, seats and the session.
 * @param orgId the organization
 * @param config extra mutation options
 * @returns the mutation (variables: the user id)
 * @example useRemoveMember(orgId).mutate(userId)
 */
export function useRemoveMember(orgId: string, config: MutationConfig<string, void> = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    meta: { errorsShownInline: true },
    ...config,
    mutationFn: (userId: string) => removeMember(orgId, userId),
    onSuccess: async (...args) => {
      await queryClient.invalidateQueries({ queryKey: ['organizations', orgId, 'members'] });
      void queryClient.invalidateQueries({ queryKey: ['organizations', orgId, 'billing'] });
      void queryClient.invalidateQueries({ queryKey: ['me'] });
      await config.onSuccess?.(...args);
    },
  });
}
