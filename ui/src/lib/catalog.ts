import { queryOptions, useQuery } from '@tanstack/react-query';
import { SOMETHING_ELSE_ID, type CatalogResponse } from '@fuelwright/shared';
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

/** An id as words when the catalog has no label for it ("foam-degraded" -> "Foam degraded"). */
export function humanizeId(id: string): string {
  const words = id.replace(/[-_]+/g, ' ').trim();
  return words ? words[0].toUpperCase() + words.slice(1) : id;
}

export interface Labels {
  cause: (id: string) => string;
  symptom: (id: string) => string;
}

/** Cause and symptom labels from the catalog (ids as words while it loads). */
export function labelsFrom(catalog: CatalogResponse | undefined): Labels {
  const causes = new Map((catalog?.causes ?? []).map((c) => [c.id, c.label]));
  causes.set(SOMETHING_ELSE_ID, catalog?.somethingElse.label ?? 'Something else');
  const symptoms = new Map((catalog?.symptoms ?? []).map((s) => [s.id, s.label]));
  return {
    cause: (id) => causes.get(id) ?? humanizeId(id),
    symptom: (id) => symptoms.get(id) ?? humanizeId(id),
  };
}
