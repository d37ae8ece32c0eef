import { screen, waitFor, within } from '@testing-library/react';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { makeUser, meReply, mockApi, renderApp, setPhoneWidth } from '../../../test-utils';
import { LIST_BACK_TEST, proposalSummary } from '../test-support/fixtures';

const RULESETS = {
  active: '1.1.0',
  versions: [
    { version: '1.0.0', parentVersion: null, notes: 'Shipped expert ruleset', active: false, publishedAt: '2026-11-01T00:00:00.000Z', publishedBy: null, rules: 2, causes: 3 },
    { version: '1.1.0', parentVersion: '1.0.0', notes: 'First re-fit', active: true, publishedAt: '2026-11-20T09:01:00.000Z', publishedBy: 'user-admin', rules: 2, causes: 3 },
  ],
};

/** Newest first, as the server sends them: one running, one failed, one ready, one published. */
const LIST = [
  proposalSummary({ id: 'p-4', proposedVersion: '1.3.0', baseVersion: '1.1.0', status: 'running', progress: 0.4, createdAt: '2026-11-22T09:00:00.000Z', createdByName: 'Test admin' }),
  proposalSummary({ id: 'p-3', proposedVersion: '1.3.0', baseVersion: '1.1.0', status: 'failed', error: 'No outcomes to fit', createdAt: '2026-11-21T12:00:00.000Z', createdByName: null }),
  proposalSummary({ id: 'p-2', proposedVersion: '1.2.0', baseVersion: '1.1.0', status: 'ready', progress: 1, strength: 400, backTest: LIST_BACK_TEST, createdAt: '2026-11-21T09:00:00.000Z' }),
  proposalSummary({ id: 'p-1', proposedVersion: '1.1.0', status: 'published', progress: 1, backTest: LIST_BACK_TEST, createdAt: '2026-11-20T09:00:00.000Z' }),
];

const rowOf = (table: HTMLElement, id: string) => within(table).getAllByRole('row').find((r) => r.querySelector(`a[href="/admin/rulesets/proposals/${id}"]`))!;

describe('proposal list on the rulesets page', () => {
  afterEach(() => vi.restoreAllMocks());

  it('shows each proposal’s status, who started it and its back-test, with a link to open it (desktop)', async () => {
    setPhoneWidth(false);
    mockApi({
      'GET /auth/me': meReply(makeUser('shop')),
      'GET /rulesets': { status: 200, body: RULESETS },
      'GET /rulesets/proposals': { status: 200, body: { proposals: LIST } },
    });
    renderApp('/admin/rulesets');
    const region = await screen.findByRole('region', { name: 'Proposals' });
    const table = await within(region).findByRole('table', { name: 'Proposals' });
    expect(within(table).getAllByRole('columnheader').map((h) => h.textContent)).toEqual(['Proposal', 'Status', 'Held-out back-test', 'Started', 'Strength']);
    // In the order the server gives (newest first), each a link to its page.
    expect(within(table).getAllByRole('link').map((a) => a.getAttribute('href'))).toEqual(LIST.map((p) => `/admin/rulesets/proposals/${p.id}`));

    const running = rowOf(table, 'p-4');
    expect(running).toHaveTextContent('Running: 40 %');
    expect(running).toHaveTextContent('Not yet');
    expect(running).toHaveTextContent('by Test admin');

    const failed = rowOf(table, 'p-3');
    expect(failed).toHaveTextContent('Failed');
    expect(failed).toHaveTextContent('No outcomes to fit');
    expect(failed).toHaveTextContent('by a former user');

    // Figures from the fixture's back-test: top-3 0.45 -> 0.49, top-1 0.22 -> 0.25.
    const ready = rowOf(table, 'p-2');
    expect(within(ready).getByRole('link')).toHaveTextContent('Version 1.2.0');
    expect(ready).toHaveTextContent('Ready');
    expect(ready).toHaveTextContent('Top 3: 45.0 % → 49.0 %');
    expect(ready).toHaveTextContent('+4.0 points');
    expect(ready).toHaveTextContent('Top 1: 22.0 % → 25.0 %');
    expect(ready).toHaveTextContent('on 100 held-out outcomes');
    expect(ready).toHaveTextContent('400');
    expect(ready).not.toHaveTextContent('Became version');

    // Published: the version it became, active here.
    const published = rowOf(table, 'p-1');
    expect(published).toHaveTextContent('Published');
    expect(published).toHaveTextContent('Became version 1.1.0');
    expect(within(published).getByText('Active')).toBeInTheDocument();
  });

  it('on a phone keeps two columns: status and who started it move under the version', async () => {
    setPhoneWidth(true);
    mockApi({
      'GET /auth/me': meReply(makeUser('admin')),
      'GET /rulesets': { status: 200, body: { ...RULESETS, active: '1.0.0' } },
      'GET /rulesets/proposals': { status: 200, body: { proposals: LIST } },
    });
    renderApp('/admin/rulesets');
    const table = await screen.findByRole('table', { name: 'Proposals' });
    expect(within(table).getAllByRole('columnheader').map((h) => h.textContent)).toEqual(['Proposal', 'Held-out back-test']);
    const first = within(rowOf(table, 'p-1')).getAllByRole('cell')[0];
    expect(first).toHaveTextContent('Published');
    expect(first).toHaveTextContent('Became version 1.1.0');
    expect(first).toHaveTextContent('by Test shop · strength 200');
    // 1.1.0 is not the active version here: no "Active" tag on it.
    expect(within(first).queryByText('Active')).toBeNull();
  });

  it('says when there are none yet, and asks again while one runs until it is ready', async () => {
    setPhoneWidth(false);
    let answers = 0;
    mockApi({
      'GET /auth/me': meReply(makeUser('shop')),
      'GET /rulesets': { status: 200, body: RULESETS },
      'GET /rulesets/proposals': () => {
        answers++;
        if (answers === 1) return { status: 200, body: { proposals: [] } };
        return { status: 200, body: { proposals: [answers === 2 ? LIST[0] : { ...LIST[0], status: 'ready', progress: 1, backTest: LIST_BACK_TEST }] } };
      },
    });
    const { queryClient } = renderApp('/admin/rulesets');
    expect(await screen.findByText('No proposals yet. Propose new weights below to start one.')).toBeInTheDocument();
    // Starting a proposal invalidates the list (done here directly); a running one is polled.
    await queryClient.invalidateQueries({ queryKey: ['proposals'] });
    const table = await screen.findByRole('table', { name: 'Proposals' });
    expect(rowOf(table, 'p-4')).toHaveTextContent('Running: 40 %');
    await waitFor(() => expect(rowOf(screen.getByRole('table', { name: 'Proposals' }), 'p-4')).toHaveTextContent('Top 3: 45.0 % → 49.0 %'), { timeout: 5000 });
    expect(answers).toBe(3);
  });
});
