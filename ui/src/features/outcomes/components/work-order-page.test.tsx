import { screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it } from 'vitest';
import type { LogOutcomeRequest, OutcomeDto, RankRequest } from '@fuelwright/shared';
import { makeUser, meReply, mockApi, renderApp } from '../../../test-utils';
import { CATALOG, outcome, workOrder } from '../test-support/fixtures';

describe('work order page (shop)', () => {
  it('shows the symptoms’ cautions first, logs the outcome, then corrects it with a new entry', async () => {
    const shop = makeUser('shop');
    let outcomes: OutcomeDto[] = [];
    const posted: LogOutcomeRequest[] = [];
    const calls = mockApi({
      'GET /auth/me': meReply(shop),
      'GET /work-orders': () => ({ status: 200, body: { workOrders: [workOrder({ status: outcomes.length ? 'done' : 'open', outcomes: outcomes.length })] } }),
      'GET /catalog': { status: 200, body: CATALOG },
      'POST /diagnosis/rank': { status: 200, body: { causes: [{ id: 'fuel-level-high', probability: 0.3 }, { id: 'vent-lines-off', probability: 0.2 }] } },
      'GET /outcomes': () => ({ status: 200, body: { outcomes, total: outcomes.filter((o) => o.current).length } }),
      'POST /outcomes': (init) => {
        const body = JSON.parse(String(init.body)) as LogOutcomeRequest;
        posted.push(body);
        if (body.labourMinutes === undefined) return { status: 400, body: { statusCode: 400, message: 'Bad request', fields: { fix: ['fix must say what fixed it'] } } };
        const created = outcome({ id: `out-${posted.length}`, confirmedCauses: body.confirmedCauses, fix: body.fix, labourMinutes: body.labourMinutes ?? null, supersedesId: body.supersedesId ?? null });
        outcomes = [created, ...outcomes.map((o) => (o.id === body.supersedesId ? { ...o, current: false } : o))];
        return { status: 201, body: created };
      },
    });
    renderApp('/work-orders/wo-1');
    const user = userEvent.setup();

    expect(await screen.findByRole('heading', { name: 'Walk-in customer', level: 1 })).toBeInTheDocument();
    expect(screen.getByText('Stop: Fuel near hot parts')).toBeInTheDocument();
    const form = await screen.findByRole('form', { name: 'Log what really fixed it' });
    // Nothing ticked: the browser says so and sends nothing.
    await user.click(within(form).getByRole('button', { name: 'Log the outcome' }));
    expect(within(form).getByText('Pick what was really wrong (or “Something else”).')).toBeInTheDocument();
    expect(within(form).getByText('Say what fixed it.')).toBeInTheDocument();
    expect(calls.filter((c) => c.path === '/outcomes' && c.method === 'POST')).toEqual([]);

    // The causes the ranking puts first for these symptoms lead; the rest wait behind "Show all".
    expect(within(form).getAllByRole('checkbox').map((b) => b.closest('label')?.querySelector('strong')?.textContent)).toEqual([
      'Fuel level too high',
      'Vent lines missing or not routed up',
      'Something else',
    ]);
    expect(within(form).getByRole('button', { name: 'Show all 3 causes' })).toBeInTheDocument();
    // No setup was entered for this walk-in: the symptoms alone go to the ranking.
    expect(calls.filter((c) => c.path === '/diagnosis/rank').map((c) => JSON.parse(String(c.init.body)))).toEqual([{ symptoms: [{ id: 'fuel-from-vents' }] }]);
    expect(screen.getByText('Not given')).toBeInTheDocument();
    await user.click(within(form).getByRole('checkbox', { name: /^Vent lines missing or not routed up/ }));
    await user.type(within(form).getByLabelText('What fixed it'), 'Fitted vent lines');
    // The server's field message shows under the field.
    await user.click(within(form).getByRole('button', { name: 'Log the outcome' }));
    expect(await within(form).findByText('fix must say what fixed it')).toBeInTheDocument();
    await user.type(within(form).getByLabelText('Labour minutes (optional)'), '10');
    await user.click(within(form).getByRole('button', { name: 'Log the outcome' }));
    await waitFor(() => expect(posted).toHaveLength(2));
    expect(posted[1]).toEqual({ workOrderId: 'wo-1', confirmedCauses: ['vent-lines-off'], fix: 'Fitted vent lines', labourMinutes: 10 });

    const correct = await screen.findByRole('button', { name: 'Correct this entry' });
    expect(screen.queryByRole('form', { name: 'Log what really fixed it' })).toBeNull();
    await user.click(correct);
    const correction = screen.getByRole('form', { name: 'Correct this entry' });
    expect(within(correction).getByLabelText('What fixed it')).toHaveValue('Fitted vent lines');
    await user.click(within(correction).getByRole('checkbox', { name: /^Vent lines missing/ }));
    await user.click(within(correction).getByRole('checkbox', { name: /^Fuel level too high/ }));
    await user.click(within(correction).getByRole('button', { name: 'Save the correction' }));
    await waitFor(() => expect(posted).toHaveLength(3));
    expect(posted[2]).toMatchObject({ workOrderId: 'wo-1', confirmedCauses: ['fuel-level-high'], supersedesId: 'out-2' });
    // The corrected entry stays, marked; the correction is the current one.
    expect(await screen.findByText('Corrected')).toBeInTheDocument();
    expect(screen.getByText('Fuel level too high')).toBeInTheDocument();
  });

  it('ranks with the kart’s setup as well as its symptoms, so the causes the setup points to are offered first', async () => {
    const setup = { carburettorKind: 'pump-around' as const, ventLinesFitted: false };
    const ranked: RankRequest[] = [];
    mockApi({
      'GET /auth/me': meReply(makeUser('shop')),
      'GET /work-orders': { status: 200, body: { workOrders: [workOrder({ symptoms: [{ id: 'hesitation' }], setup })] } },
      'GET /catalog': { status: 200, body: CATALOG },
      'GET /outcomes': { status: 200, body: { outcomes: [], total: 0 } },
      // A stand-in ranking that, like the real one, lets the setup move causes: vent lines off puts that cause first.
      'POST /diagnosis/rank': (init) => {
        const body = JSON.parse(String(init.body)) as RankRequest;
        ranked.push(body);
        const causes =
          body.setup?.ventLinesFitted === false
            ? [{ id: 'vent-lines-off', probability: 0.5 }, { id: 'foam-degraded', probability: 0.2 }]
            : [{ id: 'fuel-level-high', probability: 0.3 }, { id: 'foam-degraded', probability: 0.2 }];
        return { status: 200, body: { causes } };
      },
    });
    renderApp('/work-orders/wo-1');
    const facts = await screen.findByRole('region', { name: 'The kart' });
    expect(within(facts).getByRole('list', { name: 'Setup' })).toHaveTextContent('Carburettor: Pump-around');
    expect(within(facts).getByRole('list', { name: 'Setup' })).toHaveTextContent('Vent lines fitted: No');
    const form = await screen.findByRole('form', { name: 'Log what really fixed it' });
    expect(ranked).toEqual([{ symptoms: [{ id: 'hesitation' }], setup }]);
    expect(within(form).getAllByRole('checkbox').map((b) => b.closest('label')?.querySelector('strong')?.textContent)).toEqual([
      'Vent lines missing or not routed up',
      'Bowl foam missing, rotten or soaked',
      'Something else',
    ]);
  });
});
