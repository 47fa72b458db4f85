import { useMutation, useQueryClient } from '@tanstack/react-query';
import { z } from 'zod';
import { api } from '../../../lib/api-client';
import type { MutationConfig } from '../../../lib/react-query';
import type { Organization } from '../../../types/api';

export const createOrganizationInputSchema = z.object({
  name: z.string().trim().min(1, 'Enter the organization’s name, e.g. your company or team.').max(120, 'Use at most 120 characters.'),
});

export type CreateOrganizationInput = z.infer<typeof createOrganizationInputSchema>;

/**
 * Creates an organization; the creator becomes its owner.
 * @param input the name
 * @returns the new organization
 * @example const { organization } = await createOrganization({ name: 'Larchloaf' });
 */
export async function createOrganization(input: CreateOrganizationInput): Promise<{ organization: Organization }> {
  return api.post<{ organization: Organization }>('/organizations', input);
}

/**
 * Mutation that creates an organization and refreshes the lists that show memberships.
 * @param config extra mutation options
 * @returns the mutation
 * @example useCreateOrganization({ onSuccess: ({ organization }) => navigate(`/orgs/${organization.id}`) })
 */
export function useCreateOrganization(config: MutationConfig<CreateOrganizationInput, { organization: Organization }> = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    meta: { errorsShownInline: true },
    ...config,
    mutationFn: createOrganization,
    onSuccess: async (...args) => {
      await Promise.all([
        queryClient.invalidateQueries({ queryKey: ['organizations'] }),
        queryClient.invalidateQueries({ queryKey: ['me'], refetchType: 'all' }),
      ]);
      await config.onSuccess?.(...args);
    },
  });
}
