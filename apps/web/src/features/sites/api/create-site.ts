import { useMutation, useQueryClient } from '@tanstack/react-query';
import { z } from 'zod';
import { api } from '../../../lib/api-client';
import type { MutationConfig } from '../../../lib/react-query';
import type { Site, SiteInput } from '../types';
import { sitesKey, sitesPath } from './get-sites';

const numberText = (message: string, check: (n: number) => boolean) =>
  z
    .string()
    .trim()
    .refine((v) => v !== '' && Number.isFinite(Number(v)) && check(Number(v)), message);

/** The site form's values (numbers as typed; `siteInputFrom` converts them). Same rules as the server. */
export const siteFormSchema = z.object({
  kind: z.enum(['candidate', 'own', 'competitor'], { message: 'Choose candidate site, own store or competitor store.' }),
  name: z.string().trim().min(1, 'Give the site a name, e.g. “Quay corner”.').max(120, 'Use at most 120 characters.'),
  lon: numberText('Enter the longitude in decimal degrees between −180 and 180, or click the map.', (n) => n >= -180 && n <= 180),
  lat: numberText('Enter the latitude in decimal degrees between −90 and 90, or click the map.', (n) => n >= -90 && n <= 90),
  attractiveness: numberText('Enter a number greater than 0, e.g. 180 (m² of sales floor) or 7 (a 1–10 score).', (n) => n > 0),
  attractivenessLabel: z.string().trim().max(60, 'Use at most 60 characters.'),
  notes: z.string().trim().max(2000, 'Use at most 2,000 characters.'),
});

export type SiteFormValues = z.infer<typeof siteFormSchema>;

/**
 * The API body from the form's values.
 * @param values checked form values
 * @returns the create (or full edit) body
 * @example siteInputFrom({ kind: 'own', name: 'Harbour Row', lon: '-38.47', lat: '44.49', attractiveness: '180', attractivenessLabel: 'm²', notes: '' })
 */
export function siteInputFrom(values: SiteFormValues): SiteInput {
  return {
    kind: values.kind,
    name: values.name.trim(),
    lon: Number(values.lon),
    lat: Number(values.lat),
    attractiveness: Number(values.attractiveness),
    attractivenessLabel: values.attractivenessLabel.trim(),
    notes: values.notes.trim(),
  };
}

/**
 * Adds a site to the workspace.
 * @param orgId the organization
 * @param workspaceId the workspace
 * @param input the site
 * @returns the created site
 * @example const site = await createSite(orgId, wsId, { kind: 'candidate', name: 'Quay corner', lon: -38.51, lat: 44.52, attractiveness: 120 });
 */
export async function createSite(orgId: string, workspaceId: string, input: SiteInput): Promise<Site> {
  const body = await api.post<{ site: Site }>(sitesPath(orgId, workspaceId), input);
  return body.site;
}

/**
 * Mutation that adds a site and refreshes the list.
 * @param orgId the organization
 * @param workspaceId the workspace
 * @param config extra mutation options
 * @returns the mutation
 * @example useCreateSite(orgId, wsId, { onSuccess: (s) => select(s.id) }).mutate(input)
 */
export function useCreateSite(orgId: string, workspaceId: string, config: MutationConfig<SiteInput, Site> = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    meta: { errorsShownInline: true },
    ...config,
    mutationFn: (input: SiteInput) => createSite(orgId, workspaceId, input),
    onSuccess: async (...args) => {
      await queryClient.invalidateQueries({ queryKey: sitesKey(orgId, workspaceId) });
      await config.onSuccess?.(...args);
    },
  });
}
