import { useMutation, useQueryClient } from '@tanstack/react-query';
import { z } from 'zod';
import { api } from '../../../lib/api-client';
import type { MutationConfig } from '../../../lib/react-query';
import type { Surface, SurfaceCreateBody } from '../types';
import { getSurfaceQueryOptions } from './get-surface';
import { surfacesKey, surfacesPath } from './get-surfaces';

/** The surface form's values (strings where the user types; converted to the API body by `surfaceBodyFrom`). */
export const surfaceFormSchema = z
  .object({
    customerFileId: z.string().min(1, 'Choose the customer file to build from (an imported one).'),
    name: z.string().trim().max(120, 'Use at most 120 characters.'),
    kernel: z.enum(['quartic', 'epanechnikov', 'triweight', 'uniform', 'triangular', 'gaussian']),
    bandwidthMode: z.enum(['rule', 'value']),
    rule: z.enum(['normal-reference', 'likelihood-cv', 'least-squares-cv']),
    bandwidthValue: z.string().trim(),
    cellSize: z.string().trim(),
    studyAreaType: z.enum(['extent', 'polygon']),
    edgeCorrection: z.boolean(),
    adaptive: z.boolean(),
    unit: z.enum(['km2', 'sqmi']),
    method: z.enum(['auto', 'exact', 'binned']),
  })
  .superRefine((v, ctx) => {
    if (v.bandwidthMode === 'value') {
      const h = Number(v.bandwidthValue);
      if (!v.bandwidthValue || !Number.isFinite(h) || h <= 0 || h > 200_000) {
        ctx.addIssue({ code: 'custom', path: ['bandwidthValue'], message: 'Enter the bandwidth in metres, more than 0 and at most 200,000 (e.g. 800).' });
      }
    }
    if (v.cellSize) {
      const c = Number(v.cellSize);
      if (!Number.isFinite(c) || c < 1 || c > 100_000) {
        ctx.addIssue({ code: 'custom', path: ['cellSize'], message: 'Enter the cell size in metres between 1 and 100,000, or leave it empty for the suggested size.' });
      }
    }
  });

export type SurfaceFormValues = z.infer<typeof surfaceFormSchema>;

/**
 * Creates (queues) a demand-surface run; the server checks the inputs with the engine and reserves credits.
 * @param orgId the organization
 * @param workspaceId the workspace
 * @param body the create body
 * @returns the queued run
 * @example const s = await createSurface(orgId, wsId, body);
 */
export async function createSurface(orgId: string, workspaceId: string, body: SurfaceCreateBody): Promise<Surface> {
  const res = await api.post<{ surface: Surface }>(surfacesPath(orgId, workspaceId), body);
  return res.surface;
}

/**
 * Mutation that queues a run, caches it (so polling starts at once) and refreshes the list.
 * @param orgId the organization
 * @param workspaceId the workspace
 * @param config extra mutation options
 * @returns the mutation
 * @example useCreateSurface(orgId, wsId, { onSuccess: (s) => select(s.id) }).mutate(body)
 */
export function useCreateSurface(orgId: string, workspaceId: string, config: MutationConfig<SurfaceCreateBody, Surface> = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    meta: { errorsShownInline: true },
    ...config,
    mutationFn: (body: SurfaceCreateBody) => createSurface(orgId, workspaceId, body),
    onSuccess: async (...args) => {
      queryClient.setQueryData(getSurfaceQueryOptions(orgId, workspaceId, args[0].id).queryKey, args[0]);
      await queryClient.invalidateQueries({ queryKey: surfacesKey(orgId, workspaceId), exact: true });
      await config.onSuccess?.(...args);
    },
  });
}
