import { useMutation, useQueryClient } from '@tanstack/react-query';
import { z } from 'zod';
import { api } from '../../../lib/api-client';
import type { ScoringSettingsBody, ScoringSettingsJson } from '../types';
import { KM_PER_MILE } from '../utils/radius-units';
import { getScoringSettingsQueryOptions } from './get-scoring-settings';
import { workspacePath } from './get-scoring-runs';

const decimal = (text: string) => (text.trim() === '' ? NaN : Number(text.trim().replace(',', '.')));

/** The settings form's values (strings where the user types; `scoringSettingsBodyFrom` converts them). */
export const scoringSettingsFormSchema = z
  .object({
    alpha: z.string(),
    beta: z.string(),
    radii: z.array(z.object({ value: z.string() })),
    radiusUnit: z.enum(['km', 'mi']),
    measure: z.string().regex(/^(netNew|captured|shareOfTotal|cannibalization|ring:\d+)$/, 'Choose what to rank the candidates by.'),
    minDistance: z.string(),
  })
  .superRefine((v, ctx) => {
    const alpha = decimal(v.alpha);
    if (!Number.isFinite(alpha) || alpha < 0.1 || alpha > 5) {
      ctx.addIssue({ code: 'custom', path: ['alpha'], message: 'Enter α between 0.1 and 5 (the usual value is 1).' });
    }
    const beta = decimal(v.beta);
    if (!Number.isFinite(beta) || beta < 0.5 || beta > 5) {
      ctx.addIssue({ code: 'custom', path: ['beta'], message: 'Enter β between 0.5 and 5 (the usual value is 2).' });
    }
    const maxRadius = v.radiusUnit === 'km' ? 50 : 50 / KM_PER_MILE;
    if (v.radii.length < 1 || v.radii.length > 5) {
      ctx.addIssue({ code: 'custom', path: ['radii'], message: 'Give between 1 and 5 ring radii.' });
    }
    let previous = 0;
    v.radii.forEach((r, i) => {
      const value = decimal(r.value);
      if (!Number.isFinite(value) || value <= 0 || value > maxRadius + 1e-9) {
        ctx.addIssue({
          code: 'custom',
          path: ['radii', i, 'value'],
          message: `Enter a radius above 0 and at most ${v.radiusUnit === 'km' ? '50 km' : '31 mi (50 km)'}.`,
        });
      } else if (value <= previous) {
        ctx.addIssue({ code: 'custom', path: ['radii', i, 'value'], message: 'Each ring must be larger than the one before it.' });
      }
      if (Number.isFinite(value)) previous = Math.max(previous, value);
    });
    const ring = /^ring:(\d+)$/.exec(v.measure);
    if (ring && Number(ring[1]) >= v.radii.length) {
      ctx.addIssue({ code: 'custom', path: ['measure'], message: 'That ring no longer exists; choose another measure or add the ring back.' });
    }
    if (v.minDistance.trim() !== '') {
      const m = decimal(v.minDistance);
      if (!Number.isFinite(m) || m <= 0 || m > 50_000) {
        ctx.addIssue({ code: 'custom', path: ['minDistance'], message: 'Enter metres above 0 and at most 50,000, or leave it blank for half a cell.' });
      }
    }
  });

export type ScoringSettingsFormValues = z.infer<typeof scoringSettingsFormSchema>;

/**
 * The form values of saved settings.
 * @param settings the settings from the API
 * @returns the form's values
 * @example scoringSettingsFormValues(settings).alpha // '1'
 */
export function scoringSettingsFormValues(settings: ScoringSettingsJson): ScoringSettingsFormValues {
  return {
    alpha: String(settings.alpha),
    beta: String(settings.beta),
    radii: settings.radii.map((r) => ({ value: String(r) })),
    radiusUnit: settings.radiusUnit,
    measure: settings.measure,
    minDistance: settings.minDistanceM === null ? '' : String(settings.minDistanceM),
  };
}

/**
 * The PUT body of checked form values.
 * @param values the form's values (already validated)
 * @returns the body
 * @example scoringSettingsBodyFrom(values).radii // [1, 3, 5]
 */
export function scoringSettingsBodyFrom(values: ScoringSettingsFormValues): ScoringSettingsBody {
  return {
    alpha: decimal(values.alpha),
    beta: decimal(values.beta),
    radii: values.radii.map((r) => decimal(r.value)),
    radiusUnit: values.radiusUnit,
    measure: values.measure as ScoringSettingsBody['measure'],
    minDistanceM: values.minDistance.trim() === '' ? null : decimal(values.minDistance),
  };
}

/**
 * Saves the workspace's scoring settings (used by the next runs; finished runs keep theirs).
 * @param orgId the organization
 * @param workspaceId the workspace
 * @param body the settings
 * @returns the saved settings
 * @example await updateScoringSettings(orgId, wsId, body);
 */
export async function updateScoringSettings(orgId: string, workspaceId: string, body: ScoringSettingsBody): Promise<ScoringSettingsJson> {
  const res = await api.put<{ settings: ScoringSettingsJson }>(`${workspacePath(orgId, workspaceId)}/scoring-settings`, body);
  return res.settings;
}

/**
 * Mutation that saves the settings and puts the answer in the cache.
 * @param orgId the organization
 * @param workspaceId the workspace
 * @returns the mutation
 * @example useUpdateScoringSettings(orgId, wsId).mutate(body)
 */
export function useUpdateScoringSettings(orgId: string, workspaceId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    meta: { errorsShownInline: true },
    mutationFn: (body: ScoringSettingsBody) => updateScoringSettings(orgId, workspaceId, body),
    onSuccess: (settings) => {
      queryClient.setQueryData(getScoringSettingsQueryOptions(orgId, workspaceId).queryKey, settings);
    },
  });
}
