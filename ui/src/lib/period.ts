/** A period and ruleset version to look at (each part optional), as the API and the address take it. */
export interface PeriodFilter {
  /** First day, YYYY-MM-DD. */
  from?: string;
  /** Last day (included), YYYY-MM-DD. */
  to?: string;
  version?: string;
}

const DAY = /^\d{4}-\d{2}-\d{2}$/;

/** The filter in the address (`?from=&to=&version=`); malformed days are ignored. */
export function periodFromSearch(params: URLSearchParams): PeriodFilter {
  const filter: PeriodFilter = {};
  const from = params.get('from');
  const to = params.get('to');
  const version = params.get('version');
  if (from && DAY.test(from)) filter.from = from;
  if (to && DAY.test(to)) filter.to = to;
  if (version) filter.version = version;
  return filter;
}

/** `?from=…&to=…&version=…` with only the parts set, or an empty string. */
export function periodQueryString(filter: PeriodFilter, extra: Record<string, string> = {}): string {
  const params = new URLSearchParams();
  for (const [key, value] of Object.entries(extra)) params.set(key, value);
  if (filter.from) params.set('from', filter.from);
  if (filter.to) params.set('to', filter.to);
  if (filter.version) params.set('version', filter.version);
  const text = params.toString();
  return text ? `?${text}` : '';
}
