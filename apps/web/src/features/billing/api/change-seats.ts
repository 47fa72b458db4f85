import { useMutation, useQueryClient } from '@tanstack/react-query';
import { z } from 'zod';
import { api } from '../../../lib/api-client';
import type { MutationConfig } from '../../../lib/react-query';
import type { BillingOverview } from '../types';

export const changeSeatsInputSchema = z.object({
  seats: z.number({ message: 'Enter a whole number of seats.' }).int('Enter a whole number of seats.').min(1, 'Keep at least 1 seat.'),
});

export type ChangeSeatsInput = z.infer<typeof changeSeatsInputSchema>;

/**
 * Changes the number of paid seats on the running seat plan (never below the seats in use).
 * @param orgId the organization
 * @param input the new number of seats
 * @returns the updated billing overview
 * @example await changeSeats(orgId, { seats: 6 });
 */
export function changeSeats(orgId: string, input: ChangeSeatsInput): Promise<BillingOverview> {
  return api.post<BillingOverview>(`/organizations/${orgId}/billing/seats`, input);
}

/**
 * Mutation that changes seats and stores the new overview.
 * @param orgId the organization
 * @param config extra mutation options
 * @returns the mutation
 * @example useChangeSeats(orgId).mutate({ seats: 6 })
 */
export function useChangeSeats(orgId: string, config: MutationConfig<ChangeSeatsInput, BillingOverview> = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    meta: { errorsShownInline: true },
    ...config,
    mutationFn: (input: ChangeSeatsInput) => changeSeats(orgId, input),
    onSuccess: async (...args) => {
      queryClient.setQueryData(['organizations', orgId, 'billing'], args[0]);
      await config.onSuccess?.(...args);
    },
  });
}
