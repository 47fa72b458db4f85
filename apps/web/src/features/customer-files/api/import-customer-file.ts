import { useMutation, useQueryClient } from '@tanstack/react-query';
import { z } from 'zod';
import { api } from '../../../lib/api-client';
import type { MutationConfig } from '../../../lib/react-query';
import type { CustomerFile } from '../types';
import { customerFilesKey, customerFilesPath } from './get-customer-files';
import { getCustomerFileQueryOptions } from './get-customer-file';

export const importCustomerFileInputSchema = z
  .object({
    lon: z.string().min(1, 'Choose the column that holds the longitude (east–west, −180 to 180).'),
    lat: z.string().min(1, 'Choose the column that holds the latitude (north–south, −90 to 90).'),
    weight: z.string(),
    weightKind: z.enum(['count', 'spend', 'visits', 'other']),
    weightLabel: z.string().trim().max(120, 'Use at most 120 characters.'),
    excludeFlagged: z.boolean(),
  })
  .refine((v) => v.lon !== v.lat, { path: ['lat'], message: 'Longitude and latitude must come from two different columns.' })
  .refine((v) => !v.weight || (v.weight !== v.lon && v.weight !== v.lat), {
    path: ['weight'],
    message: 'The weight cannot be one of the coordinate columns; choose another column or “No weight”.',
  });

export type ImportCustomerFileInput = z.infer<typeof importCustomerFileInputSchema>;

/**
 * Starts the import: the chosen columns become points (lon, lat, weight); every other column is discarded.
 * @param orgId the organization
 * @param workspaceId the workspace
 * @param fileId the uploaded file
 * @param input column choices, weight kind and label, whether to leave flagged outliers out
 * @returns the file, now `importing` (the 202 Accepted body)
 * @example await importCustomerFile(o, w, f, { lon: 'x', lat: 'y', weight: '', weightKind: 'count', weightLabel: '', excludeFlagged: false })
 */
export async function importCustomerFile(
  orgId: string,
  workspaceId: string,
  fileId: string,
  input: ImportCustomerFileInput,
): Promise<CustomerFile> {
  const body = await api.post<{ customerFile: CustomerFile }>(`${customerFilesPath(orgId, workspaceId)}/${fileId}/import`, {
    mapping: { lon: input.lon, lat: input.lat, ...(input.weight ? { weight: input.weight } : {}) },
    weightKind: input.weightKind,
    ...(input.weightLabel ? { weightLabel: input.weightLabel } : {}),
    excludeFlagged: input.excludeFlagged,
  });
  return body.customerFile;
}

/**
 * Mutation that starts an import and puts the `importing` file in the cache so polling starts at once.
 * @param orgId the organization
 * @param workspaceId the workspace
 * @param fileId the uploaded file
 * @param config extra mutation options
 * @returns the mutation
 * @example useImportCustomerFile(orgId, wsId, fileId).mutate(values)
 */
export function useImportCustomerFile(
  orgId: string,
  workspaceId: string,
  fileId: string,
  config: MutationConfig<ImportCustomerFileInput, CustomerFile> = {},
) {
  const queryClient = useQueryClient();
  return useMutation({
    meta: { errorsShownInline: true },
    ...config,
    mutationFn: (input: ImportCustomerFileInput) => importCustomerFile(orgId, workspaceId, fileId, input),
    onSuccess: async (...args) => {
      const [file] = args;
      queryClient.setQueryData(getCustomerFileQueryOptions(orgId, workspaceId, fileId).queryKey, file);
      await queryClient.invalidateQueries({ queryKey: customerFilesKey(orgId, workspaceId), exact: true });
      await config.onSuccess?.(...args);
    },
  });
}
