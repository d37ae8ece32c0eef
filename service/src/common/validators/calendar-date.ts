import { registerDecorator, type ValidationOptions } from 'class-validator';

const DATE_RE = /^(\d{4})-(\d{2})-(\d{2})$/;

/** A real calendar date written YYYY-MM-DD. */
export function isCalendarDate(value: unknown): value is string {
  if (typeof value !== 'string') return false;
  const m = DATE_RE.exec(value);
  if (!m) return false;
  const d = new Date(Date.UTC(+m[1], +m[2] - 1, +m[3]));
  return d.getUTCFullYear() === +m[1] && d.getUTCMonth() === +m[2] - 1 && d.getUTCDate() === +m[3];
}

/**
 * Today's date where the user is at the latest: a day later than UTC today is still allowed, so a
 * racer east of Greenwich entering today's date is never refused.
 */
export function latestAllowedDate(now = new Date()): string {
  return new Date(now.getTime() + 24 * 3600 * 1000).toISOString().slice(0, 10);
}

/** A calendar date (YYYY-MM-DD) that is not in the future. */
export function IsPastOrTodayDate(what: string, options?: ValidationOptions) {
  return (object: object, propertyName: string) =>
    registerDecorator({
      name: 'isPastOrTodayDate',
      target: object.constructor,
      propertyName,
      options,
      validator: {
        validate: (value: unknown) => isCalendarDate(value) && value <= latestAllowedDate() && value >= '1970-01-01',
        defaultMessage: () => `${propertyName} must be a date written YYYY-MM-DD, not in the future: ${what}`,
      },
    });
}
