import { queryOptions, useQuery } from '@tanstack/react-query';
import type { CatalogResponse } from '@fuelwright/shared';
import { api } from '../../../lib/api-client';

/** GET /api/catalog: labels for the cause ids on the shared-cases dashboard. */
export function getCatalog(signal?: AbortSignal): Promise<CatalogResponse> {
  return api.get<CatalogResponse>('/catalog', { signal });
}

export const catalogQueryKey = ['catalog'] as const;

export function getCatalogQueryOptions() {
  // A published ruleset never changes; a new version comes with a new deployment.
  return queryOptions({ queryKey: catalogQueryKey, queryFn: ({ signal }) => getCatalog(signal), staleTime: Infinity });
}

export function useCatalog() {
  return useQuery(getCatalogQueryOptions());
}
