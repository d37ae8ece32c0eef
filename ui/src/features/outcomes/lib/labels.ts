import { SOMETHING_ELSE_ID, type CatalogResponse } from '@fuelwright/shared';

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

const dateTime = new Intl.DateTimeFormat(undefined, { dateStyle: 'medium', timeStyle: 'short' });
const date = new Intl.DateTimeFormat(undefined, { dateStyle: 'medium' });

export function formatDateTime(iso: string): string {
  const d = new Date(iso);
  return Number.isNaN(d.getTime()) ? iso : dateTime.format(d);
}

export function formatDate(iso: string): string {
  const d = new Date(iso);
  return Number.isNaN(d.getTime()) ? iso : date.format(d);
}
