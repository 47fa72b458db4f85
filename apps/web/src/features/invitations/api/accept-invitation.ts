import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import type { MutationConfig } from '../../../lib/react-query';
import type { OrganizationRef, Role } from '../../../types/api';

export type AcceptInvitationResult = { organization: OrganizationRef; role: Role };

/**
 * Joins the organization through an invitation; the signed-in account must have the invited e-mail.
 * @param token the token from the link
 * @returns the organization joined and the role received
 * @example const { organization } = await acceptInvitation(token);
 */
export function acceptInvitation(token: string): Promise<AcceptInvitationResult> {
  return api.post<AcceptInvitationResult>('/invitations/accept', { token });
}

/**
 * Mutation that accepts an invitation and refreshes the session (its memberships).
 * @param config extra mutation options
 * @returns the mutation (variables: the token)
 * @example useAcceptInvitation({ onSuccess: ({ organization }) => navigate(`/orgs/${organization.id}`) })
 */
export function useAcceptInvitation(config: MutationConfig<string, AcceptInvitationResult> = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    meta: { errorsShownInline: true },
    ...config,
    mutationFn: (token: string) => acceptInvitation(token),
    onSuccess: async (...args) => {
      await queryClient.invalidateQueries({ queryKey: ['me'] });
      await queryClient.invalidateQueries({ queryKey: ['organizations'] });
      await config.onSuccess?.(...args);
    },
  });
}
