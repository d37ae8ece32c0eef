import type { SharedCaseSummaryDto } from '@fuelwright/shared';

export interface RacerGroup {
  ownerId: string;
  ownerName: string;
  cases: SharedCaseSummaryDto[];
  /** Open cases in the group. */
  open: number;
}

/**
 * Groups the dashboard's cases by racer, keeping the server's order (open first, newest change
 * first) inside each group; groups come in the order of their first case, so the racer with the
 * most recent open case leads.
 */
export function groupByRacer(cases: readonly SharedCaseSummaryDto[]): RacerGroup[] {
  const groups = new Map<string, RacerGroup>();
  for (const c of cases) {
    let group = groups.get(c.ownerId);
    if (!group) {
      group = { ownerId: c.ownerId, ownerName: c.ownerName, cases: [], open: 0 };
      groups.set(c.ownerId, group);
    }
    group.cases.push(c);
    if (c.state === 'open') group.open += 1;
  }
  return [...groups.values()];
}
