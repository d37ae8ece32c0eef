import { queryOptions, useQuery } from '@tanstack/react-query';
import type { CatalogResponse } from '@fuelwright/shared';
import { api } from './api-client';

/*
 * The active ruleset's catalog, read by many features (labels of symptoms, causes and checks; the
 * walk-through's steps and cautions), so it lives here rather than in one of them.
 */

/** GET /api/catalog (open to visitors): symptoms, causes, checks with steps and cautions, fixes. */
export function getCatalog(signal?: AbortSignal): Promise<CatalogResponse> {
  return api.get<CatalogResponse>('/catalog', { signal });
}

export const catalogQueryKey = ['catalog'] as const;

export function getCatalogQueryOptions() {
  // It changes only when an admin publishes or activates a version, and that invalidates this key.
  return queryOptions({ queryKey: catalogQueryKey, queryFn: ({ signal }) => getCatalog(signal), staleTime: Infinity });
}

export function useCatalog() {
  return useQuery(getCatalogQueryOptions());
}
