import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import type { MutationConfig } from '../../../lib/react-query';
import type { Member, Role } from '../../../types/api';

export type ChangeMemberRoleInput = { userId: string; role: Role };

/**
 * Gives a member another role (owners only; the last owner cannot be demoted: 409 LAST_OWNER).
 * @param orgId the organization
 * @param input the member's user id and the new role
 * @returns the member with the new role
 * @example await changeMemberRole(orgId, { userId, role: 'planner' });
 */
export async function changeMemberRole(orgId: string, input: ChangeMemberRoleInput): Promise<Member> {
  const body = await api.patch<{ member: Member }>(`/organizations/${orgId}/members/${input.userId}`, { role: input.role });
  return body.member;
}

/**
 * Mutation that changes a role and refreshes the members and the session (own role may change).
 * @param orgId the organization
 * @param config extra mutation options
 * @returns the mutation
 * @example useChangeMemberRole(orgId).mutate({ userId, role })
 */
export function useChangeMemberRole(orgId: string, config: MutationConfig<ChangeMemberRoleInput, Member> = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    meta: { errorsShownInline: true },
    ...config,
    mutationFn: (input: ChangeMemberRoleInput) => changeMemberRole(orgId, input),
    onSuccess: async (...args) => {
      await queryClient.invalidateQueries({ queryKey: ['organizations', orgId, 'members'] });
      void queryClient.invalidateQueries({ queryKey: ['me'] });
      await config.onSuccess?.(...args);
    },
  });
}
