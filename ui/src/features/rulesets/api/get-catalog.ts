import { queryOptions, useQuery } from '@tanstack/react-query';
import type { CatalogResponse } from '@fuelwright/shared';
import { api } from '../../../lib/api-client';

/** GET /api/catalog: the active ruleset's symptoms and causes with their labels. */
export function getCatalog(signal?: AbortSignal): Promise<CatalogResponse> {
  return api.get<CatalogResponse>('/catalog', { signal });
}

export const catalogQueryKey = ['catalog'] as const;

export function getCatalogQueryOptions() {
  // Labels do not change between versions (a re-fit changes numbers only); publishing invalidates it.
  return queryOptions({ queryKey: catalogQueryKey, queryFn: ({ signal }) => getCatalog(signal), staleTime: Infinity });
}

export function useCatalog() {
  return useQuery(getCatalogQueryOptions());
}
