import { useMutation, useQueryClient } from '@tanstack/react-query';
import { z } from 'zod';
import { api } from '../../../lib/api-client';
import type { MutationConfig } from '../../../lib/react-query';
import type { Invitation } from '../types';

export const createInvitationInputSchema = z.object({
  email: z.string().trim().min(1, 'Enter the e-mail address to invite.').pipe(z.email({ message: 'Enter an e-mail address such as name@company.example.' })),
  role: z.enum(['owner', 'analyst', 'planner', 'executive'], { message: 'Choose a role.' }),
});

export type CreateInvitationInput = z.infer<typeof createInvitationInputSchema>;

/**
 * Invites an e-mail address with a role; the server e-mails a one-time link valid for 7 days.
 * @param orgId the organization
 * @param input e-mail and role
 * @returns the invitation
 * @example await createInvitation(orgId, { email: 'ana@larchloaf.example', role: 'analyst' });
 */
export async function createInvitation(orgId: string, input: CreateInvitationInput): Promise<Invitation> {
  const body = await api.post<{ invitation: Invitation }>(`/organizations/${orgId}/invitations`, input);
  return body.invitation;
}

/**
 * Mutation that invites someone and refreshes invitations and seat counts.
 * @param orgId the organization
 * @param config extra mutation options
 * @returns the mutation
 * @example useCreateInvitation(orgId).mutate({ email, role })
 */
export function useCreateInvitation(orgId: string, config: MutationConfig<CreateInvitationInput, Invitation> = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    meta: { errorsShownInline: true },
    ...config,
    mutationFn: (input: CreateInvitationInput) => createInvitation(orgId, input),
    onSuccess: async (...args) => {
      await queryClient.invalidateQueries({ queryKey: ['organizations', orgId, 'invitations'] });
      void queryClient.invalidateQueries({ queryKey: ['organizations', orgId, 'billing'] });
      await config.onSuccess?.(...args);
    },
  });
}
