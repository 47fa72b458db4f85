import { useMutation } from '@tanstack/react-query';
import { z } from 'zod';
import { api } from '../../../lib/api-client';
import type { MutationConfig } from '../../../lib/react-query';

export const createCheckoutInputSchema = z.discriminatedUnion('kind', [
  z.object({ kind: z.literal('credits'), pack: z.string().min(1) }),
  z.object({ kind: z.literal('seats'), seats: z.number().int().min(1, 'Choose at least 1 seat.') }),
]);

export type CreateCheckoutInput = z.infer<typeof createCheckoutInputSchema>;

/**
 * Opens a hosted checkout for a credit pack or a new seat plan; credits and seats arrive later,
 * when the payment provider confirms the payment to the server.
 * @param orgId the organization
 * @param input `{ kind: 'credits', pack }` or `{ kind: 'seats', seats }`
 * @returns the hosted checkout page's URL
 * @example const { url } = await createCheckout(orgId, { kind: 'credits', pack: 'pack-500' });
 */
export function createCheckout(orgId: string, input: CreateCheckoutInput): Promise<{ url: string; sessionId: string }> {
  return api.post<{ url: string; sessionId: string }>(`/organizations/${orgId}/billing/checkout`, input);
}

/**
 * Mutation that opens a checkout; the caller sends the browser to `url`.
 * @param orgId the organization
 * @param config extra mutation options
 * @returns the mutation
 * @example useCreateCheckout(orgId, { onSuccess: ({ url }) => window.location.assign(url) })
 */
export function useCreateCheckout(orgId: string, config: MutationConfig<CreateCheckoutInput, { url: string; sessionId: string }> = {}) {
  return useMutation({ meta: { errorsShownInline: true }, ...config, mutationFn: (input: CreateCheckoutInput) => createCheckout(orgId, input) });
}
