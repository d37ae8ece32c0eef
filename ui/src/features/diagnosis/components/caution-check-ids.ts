import type { CatalogResponse } from '@fuelwright/shared';

/**
 * The checks whose cautions must be acknowledged before their steps show: those with cautions of
 * their own, and those that open a group (fuel lines, float bowl, carburettor top, spark plug)
 * that has cautions.
 */
export function cautionCheckIds(catalog: CatalogResponse): string[] {
  const groupsWithCautions = new Set(catalog.groups.filter((g) => g.id !== 'outside' && g.cautions.length > 0).map((g) => g.id));
  return catalog.checks.filter((c) => c.cautions.length > 0 || groupsWithCautions.has(c.group)).map((c) => c.id);
}
