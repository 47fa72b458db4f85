import { queryOptions, useQuery } from '@tanstack/react-query';
import type { FeatureCollection, Polygon } from 'geojson';
import { api } from '../../../lib/api-client';
import type { MapScope } from '../types';

/** Customers counted in square bins; bins with fewer than `minCount` customers are left out by the server. */
export type CustomerAggregate = FeatureCollection<Polygon, { count: number; weight: number }> & {
  binSizeM?: number;
  minCount?: number;
  suppressed?: { bins: number; customers: number; weight: number };
};

/**
 * Aggregated customers of a file for a map zoom (owners and analysts only; never single points).
 * @param scope organization and workspace
 * @param fileId the customer file
 * @param zoom whole map zoom (decides the bin size)
 * @returns the bins as GeoJSON
 * @example const bins = await getCustomerAggregate(scope, fileId, 12);
 */
export function getCustomerAggregate(scope: MapScope, fileId: string, zoom: number): Promise<CustomerAggregate> {
  return api.get<CustomerAggregate>(`/organizations/${scope.orgId}/workspaces/${scope.workspaceId}/customer-files/${fileId}/aggregate`, {
    query: { zoom },
  });
}

/**
 * Query options for the aggregate at one zoom.
 * @param scope organization and workspace
 * @param fileId the customer file
 * @param zoom whole map zoom
 * @returns options keyed `[…, 'customer-files', fileId, 'aggregate', zoom]`
 * @example useQuery(getCustomerAggregateQueryOptions(scope, fileId, 12))
 */
export function getCustomerAggregateQueryOptions(scope: MapScope, fileId: string, zoom: number) {
  return queryOptions({
    queryKey: ['organizations', scope.orgId, 'workspaces', scope.workspaceId, 'customer-files', fileId, 'aggregate', zoom],
    queryFn: () => getCustomerAggregate(scope, fileId, zoom),
    staleTime: 5 * 60_000,
  });
}

/**
 * The aggregate in a component; fetches only while `fileId` is set (the toggle is on and the role may see it).
 * @param scope organization and workspace
 * @param fileId the customer file, or null
 * @param zoom whole map zoom
 * @returns the query result
 * @example const bins = useCustomerAggregate(scope, showCustomers ? fileId : null, Math.round(zoom));
 */
export function useCustomerAggregate(scope: MapScope, fileId: string | null, zoom: number) {
  return useQuery({ ...getCustomerAggregateQueryOptions(scope, fileId ?? '', zoom), enabled: fileId !== null });
}
