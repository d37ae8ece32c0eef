import { describe, expect, it } from 'vitest';
import type { SharedCaseSummaryDto } from '@fuelwright/shared';
import { groupByRacer } from './group-by-racer';

const item = (id: string, ownerId: string, state: string): SharedCaseSummaryDto => ({
  id,
  kartId: `kart-${ownerId}`,
  kartName: `Kart of ${ownerId}`,
  ownerId,
  ownerName: `Racer ${ownerId}`,
  state,
  topCauseId: null,
  topCauseProbability: null,
  updatedAt: '2026-11-30T10:00:00.000Z',
  openedAt: '2026-11-29T10:00:00.000Z',
  comments: 0,
  pendingPhotoRequests: 0,
});

describe('groupByRacer', () => {
  it('keeps the server order inside each group and orders groups by their first case', () => {
    const groups = groupByRacer([item('c1', 'b', 'open'), item('c2', 'a', 'open'), item('c3', 'b', 'resolved'), item('c4', 'a', 'abandoned')]);
    expect(groups.map((g) => g.ownerId)).toEqual(['b', 'a']);
    expect(groups[0].cases.map((c) => c.id)).toEqual(['c1', 'c3']);
    expect(groups[1].cases.map((c) => c.id)).toEqual(['c2', 'c4']);
    expect(groups.map((g) => g.open)).toEqual([1, 1]);
  });

  it('gives no groups for no cases', () => {
    expect(groupByRacer([])).toEqual([]);
  });
});
