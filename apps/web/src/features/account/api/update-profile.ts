import { useMutation, useQueryClient } from '@tanstack/react-query';
import { z } from 'zod';
import { api } from '../../../lib/api-client';
import type { MutationConfig } from '../../../lib/react-query';
import type { User } from '../../../types/api';

export const updateProfileInputSchema = z.object({
  name: z.string().trim().min(1, 'Enter your name as teammates should see it.').max(120, 'Use at most 120 characters.'),
});

export type UpdateProfileInput = z.infer<typeof updateProfileInputSchema>;

/**
 * Changes the signed-in user's display name.
 * @param input the new name
 * @returns the updated user
 * @example await updateProfile({ name: 'Ada Quill' });
 */
export async function updateProfile(input: UpdateProfileInput): Promise<User> {
  const body = await api.patch<{ user: User }>('/me', input);
  return body.user;
}

/**
 * Mutation for the profile form; refreshes the session so the header shows the new name.
 * @param config extra mutation options
 * @returns the mutation
 * @example useUpdateProfile().mutate({ name })
 */
export function useUpdateProfile(config: MutationConfig<UpdateProfileInput, User> = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    meta: { errorsShownInline: true },
    ...config,
    mutationFn: updateProfile,
    onSuccess: async (...args) => {
      await queryClient.invalidateQueries({ queryKey: ['me'] });
      await config.onSuccess?.(...args);
    },
  });
}
