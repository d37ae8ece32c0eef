import { SOMETHING_ELSE_ID, type CatalogResponse } from '@fuelwright/shared';

/** Labels for the ids a case carries (symptoms, causes, checks, fixes), from the catalog. */
export interface CatalogLabels {
  symptom: (id: string) => string;
  cause: (id: string) => string;
  check: (id: string) => string;
  fix: (id: string) => string;
  /** Any known id (symptom, cause, check or fix) in a line of text replaced by its label. */
  text: (line: string) => string;
}

/** An id shown as words when the catalog has no label for it ("foam-inspect" -> "Foam inspect"). */
export function humanizeId(id: string): string {
  const words = id.replace(/[-_]+/g, ' ').trim();
  return words ? words[0].toUpperCase() + words.slice(1) : id;
}

/** Hyphenated ids as they appear in the server's one-line summaries. */
const ID_PATTERN = /\b[a-z0-9]+(?:-[a-z0-9]+)+\b/g;

export function catalogLabels(catalog: CatalogResponse | undefined): CatalogLabels {
  const map = (items: readonly { id: string; label: string }[] | undefined) => new Map((items ?? []).map((item) => [item.id, item.label]));
  const symptoms = map(catalog?.symptoms);
  const causes = map(catalog?.causes);
  if (catalog) causes.set(SOMETHING_ELSE_ID, catalog.somethingElse.label);
  else causes.set(SOMETHING_ELSE_ID, 'Something else');
  const checks = map(catalog?.checks);
  const fixes = map(catalog?.fixes);
  const any = new Map([...fixes, ...checks, ...causes, ...symptoms]);
  const from = (labels: Map<string, string>) => (id: string) => labels.get(id) ?? humanizeId(id);
  return {
    symptom: from(symptoms),
    cause: from(causes),
    check: from(checks),
    fix: from(fixes),
    text: (line) => line.replace(ID_PATTERN, (id) => {
      const label = any.get(id);
      return label ? `“${label}”` : id;
    }),
  };
}
