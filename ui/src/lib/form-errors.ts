import { isApiError } from './api-client';

export interface FormErrors {
  /** Messages for one field of the form (from a 400's `fields`). */
  field: (name: string) => string[];
  /** A message for the whole form: the server's message, or field messages the form has no place for. */
  form: string | null;
}

const NONE: FormErrors = { field: () => [], form: null };

/** Splits an API error into messages under each field and one message for the form. */
export function formErrors(error: unknown, formFields: readonly string[]): FormErrors {
  if (!error) return NONE;
  if (!isApiError(error)) return { field: () => [], form: error instanceof Error ? error.message : String(error) };
  const fields = error.status === 400 ? error.fields : {};
  const known = new Set(formFields);
  const placed = Object.keys(fields).filter((name) => known.has(name));
  const unplaced = Object.entries(fields)
    .filter(([name]) => !known.has(name))
    .flatMap(([, messages]) => messages);
  const form = unplaced.length > 0 ? unplaced.join(' ') : placed.length > 0 ? null : error.message;
  return { field: (name) => (known.has(name) ? (fields[name] ?? []) : []), form };
}
