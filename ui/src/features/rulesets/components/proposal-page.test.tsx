import { screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it } from 'vitest';
import type { Role } from '@fuelwright/shared';
import { menuItemsFor } from '../../../app/navigation';
import { makeUser, meReply, mockApi, renderApp } from '../../../test-utils';
import { LIST_BACK_TEST, proposal, proposalSummary, RESULT } from '../test-support/fixtures';

const ID = proposal().id;
const CATALOG = {
  causes: [
    { id: 'foam-degraded', label: 'Bowl foam missing, rotten or soaked' },
    { id: 'fuel-level-high', label: 'Fuel level too high' },
    { id: 'vent-lines-off', label: 'Vent lines missing or not routed up' },
  ],
  symptoms: [],
  somethingElse: { label: 'Something else', prior: 0.05 },
};

/** The proposal answers "running" at 0 %, 40 %, 80 %, then "ready" with its result. */
function progressingProposal() {
  const steps = [0, 0.4, 0.8];
  let polls = 0;
  return () => {
    const i = polls++;
    return i < steps.length
      ? { status: 200, body: proposal({ progress: steps[i] }) }
      : { status: 200, body: proposal({ status: 'ready', progress: 1, finishedAt: '2026-11-20T09:00:05.000Z', result: RESULT }) };
  };
}

describe('proposal page', () => {
  it('polls while the fit runs, then shows the back-test and the diff; a shop cannot publish', async () => {
    mockApi({
      'GET /auth/me': meReply(makeUser('shop')),
      [`GET /rulesets/proposals/${ID}`]: progressingProposal(),
      'GET /catalog': { status: 200, body: CATALOG },
    });
    renderApp(`/admin/rulesets/proposals/${ID}`);
    expect(await screen.findByRole('progressbar', { name: 'Proposal progress' })).toHaveAttribute('aria-valuenow', '0');
    // The bar follows the server's progress while it runs (polled every half second).
    await waitFor(() => expect(screen.getByText('Fitting and back-testing: 40 %')).toBeInTheDocument(), { timeout: 4000 });
    await waitFor(() => expect(screen.getByRole('table', { name: 'Back-test' })).toBeInTheDocument(), { timeout: 6000 });
    expect(screen.getByRole('progressbar', { name: 'Proposal progress' })).toHaveAttribute('aria-valuenow', '100');

    const backTest = screen.getByRole('table', { name: 'Back-test' });
    const top3 = within(backTest).getByRole('row', { name: /top-3/ });
    expect(top3).toHaveTextContent('45.0 %');
    expect(top3).toHaveTextContent('49.0 %');
    expect(within(backTest).getByRole('row', { name: /Brier/ })).toHaveTextContent('−0.030 (better)');

    // Changed weights first, with their evidence; the unchanged one only under "All".
    const priors = screen.getByRole('region', { name: 'Cause priors' });
    expect(within(priors).getByText('Bowl foam missing, rotten or soaked')).toBeInTheDocument();
    expect(within(priors).getByText('Outcomes disagree with the old value')).toBeInTheDocument();
    expect(within(priors).getByText('90 % interval 0.0592–0.0724')).toBeInTheDocument();
    expect(within(priors).queryByText('Fuel level too high')).toBeNull();
    await userEvent.setup().click(within(priors).getByRole('radio', { name: /^All$/ }));
    expect(within(priors).getByText('Fuel level too high')).toBeInTheDocument();
    const rules = screen.getByRole('region', { name: 'Rule likelihood ratios' });
    expect(within(rules).getByText('329 outcomes')).toBeInTheDocument();
    expect(within(rules).getByText('+12 %')).toBeInTheDocument();

    expect(screen.queryByRole('button', { name: /^Publish/ })).toBeNull();
    expect(screen.getByText(/Only an admin can publish a proposal/)).toBeInTheDocument();
  });

  it('lets an admin publish after confirming, then shows the versions', async () => {
    let published = false;
    const calls = mockApi({
      'GET /auth/me': meReply(makeUser('admin')),
      [`GET /rulesets/proposals/${ID}`]: () => ({ status: 200, body: proposal({ status: published ? 'published' : 'ready', progress: 1, result: RESULT }) }),
      'GET /catalog': { status: 200, body: CATALOG },
      [`POST /rulesets/proposals/${ID}/publish`]: () => {
        published = true;
        return { status: 200, body: proposal({ status: 'published', progress: 1 }) };
      },
      'GET /rulesets/proposals': () => ({
        status: 200,
        body: { proposals: [proposalSummary({ status: published ? 'published' : 'ready', progress: 1, backTest: LIST_BACK_TEST })] },
      }),
      'GET /rulesets': () => ({
        status: 200,
        body: {
          active: published ? '1.1.0' : '1.0.0',
          versions: [
            { version: '1.0.0', parentVersion: null, notes: 'Shipped expert ruleset', active: !published, publishedAt: '2026-11-01T00:00:00.000Z', publishedBy: null, rules: 2, causes: 3 },
            ...(published ? [{ version: '1.1.0', parentVersion: '1.0.0', notes: 'First re-fit', active: true, publishedAt: '2026-11-20T09:01:00.000Z', publishedBy: 'user-admin', rules: 2, causes: 3 }] : []),
          ],
        },
      }),
    });
    renderApp(`/admin/rulesets/proposals/${ID}`);
    const user = userEvent.setup();
    await user.click(await screen.findByRole('button', { name: 'Publish as 1.1.0' }));
    const alert = await screen.findByRole('alertdialog');
    // Cancelling sends nothing.
    await user.click(within(alert).getByRole('button', { name: 'Cancel' }));
    expect(calls.some((c) => c.method === 'POST')).toBe(false);
    await user.click(screen.getByRole('button', { name: 'Publish as 1.1.0' }));
    const again = await screen.findByRole('alertdialog');
    await user.type(within(again).getByLabelText('Notes (optional)'), 'First re-fit');
    await user.click(within(again).getByRole('button', { name: 'Publish 1.1.0' }));
    await waitFor(() => expect(calls.find((c) => c.method === 'POST')?.init.body).toBe(JSON.stringify({ notes: 'First re-fit' })));
    const versions = await screen.findByRole('region', { name: 'Published versions' });
    const row = await within(versions).findByRole('row', { name: /1\.1\.0/ });
    expect(row).toHaveTextContent('Active');
    expect(within(versions).getByRole('button', { name: 'Roll back to 1.0.0' })).toBeInTheDocument();
    // The list of proposals (read after publishing) shows it as the version it became.
    const proposals = await screen.findByRole('table', { name: 'Proposals' });
    expect(await within(proposals).findByText('Became version 1.1.0')).toBeInTheDocument();
  });

  it('gives the rulesets a menu entry for admins only; shops reach them from the insights', () => {
    const labels = (role: Role) => menuItemsFor(makeUser(role)).map((m) => m.label);
    expect(labels('admin')).toEqual(expect.arrayContaining(['Insights', 'Rulesets']));
    expect(labels('shop')).toEqual(expect.arrayContaining(['Work orders', 'Outcomes', 'Insights']));
    expect(labels('shop')).not.toContain('Rulesets');
    for (const role of ['racer', 'coach'] as const) expect(labels(role)).not.toContain('Insights');
  });
});
