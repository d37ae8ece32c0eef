/**
 * Calendar dates written YYYY-MM-DD: the pure checks behind "a real date, not in the future",
 * shared by the service's form validation and the rank request in rules/.
 */
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

/**
 * True when the date part (the first ten characters, YYYY-MM-DD) of an ISO date or date-time is
 * not later than `latestAllowedDate(now)`.
 */
export function isNotInFuture(isoDate: string, now = new Date()): boolean {
  return isoDate.slice(0, 10) <= latestAllowedDate(now);
}
