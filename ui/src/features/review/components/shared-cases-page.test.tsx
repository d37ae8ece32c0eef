import { screen, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { makeUser, meReply, mockApi, renderApp, setPhoneWidth } from '../../../test-utils';
import { CATALOG, summary } from '../test-support/review-fixtures';

describe('shared cases dashboard', () => {
  it('groups the cases by racer in the server’s order and links each to its case', async () => {
    setPhoneWidth(true);
    mockApi({
      'GET /auth/me': meReply(makeUser('coach')),
      'GET /catalog': { status: 200, body: CATALOG },
      'GET /shared-cases': {
        status: 200,
        body: {
          cases: [
            summary({ id: 'a1', ownerId: 'r2', ownerName: 'Ada Apex', kartName: 'Red 5', comments: 2, pendingPhotoRequests: 1 }),
            summary({ id: 'b1', topCauseProbability: 0.62 }),
            summary({ id: 'a2', ownerId: 'r2', ownerName: 'Ada Apex', kartName: 'Red 5', state: 'resolved' }),
          ],
        },
      },
    });
    renderApp('/shared-cases');
    const groups = await screen.findAllByRole('region');
    expect(groups.map((g) => within(g).getByRole('heading').textContent)).toEqual(['Ada Apex1 open · 2 cases', 'Rae Racer1 open · 1 case']);
    const ada = within(groups[0]).getAllByRole('link');
    expect(ada.map((link) => link.getAttribute('href'))).toEqual(['/cases/a1', '/cases/a2']);
    expect(within(groups[0]).getByText('1 photo awaited')).toBeInTheDocument();
    expect(within(groups[0]).getByText('Resolved')).toBeInTheDocument();
    expect(within(groups[1]).getByText('Bowl foam missing, rotten or soaked')).toBeInTheDocument();
    expect(within(groups[1]).getByText('(62%)')).toBeInTheDocument();
  });

  it('says what to do when nothing is shared yet', async () => {
    mockApi({ 'GET /auth/me': meReply(makeUser('shop')), 'GET /catalog': { status: 200, body: CATALOG }, 'GET /shared-cases': { status: 200, body: { cases: [] } } });
    renderApp('/shared-cases');
    expect(await screen.findByText('Nothing shared with you yet')).toBeInTheDocument();
  });
});
