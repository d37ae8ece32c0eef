import { queryOptions, useQuery } from '@tanstack/react-query';
import type { CatalogResponse } from '@fuelwright/shared';
import { api } from '../../../lib/api-client';

/** GET /api/catalog (open to visitors): symptoms, causes, checks with steps and cautions, fixes. */
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
