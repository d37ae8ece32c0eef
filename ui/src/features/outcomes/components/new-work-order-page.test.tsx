import { screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it } from 'vitest';
import type { CreateWorkOrderRequest } from '@fuelwright/shared';
import { makeUser, meReply, mockApi, renderApp } from '../../../test-utils';
import { CATALOG, workOrder } from '../test-support/fixtures';

describe('new work order page (shop)', () => {
  it('opens a walk-in with its symptoms, showing each ticked symptom’s cautions, then goes to the work order', async () => {
    const posted: CreateWorkOrderRequest[] = [];
    mockApi({
      'GET /auth/me': meReply(makeUser('shop')),
      'GET /catalog': { status: 200, body: CATALOG },
      'GET /work-orders': { status: 200, body: { workOrders: [workOrder({ id: 'wo-9' })] } },
      'GET /outcomes': { status: 200, body: { outcomes: [], total: 0 } },
      'POST /work-orders': (init) => {
        posted.push(JSON.parse(String(init.body)));
        return { status: 201, body: workOrder({ id: 'wo-9' }) };
      },
    });
    const { router } = renderApp('/work-orders/new');
    const user = userEvent.setup();
    const form = await screen.findByRole('form', { name: 'New work order' });
    await user.click(within(form).getByRole('button', { name: 'Open the work order' }));
    expect(within(form).getByText('Name the customer.')).toBeInTheDocument();
    expect(within(form).getByText('Tick what the customer noticed.')).toBeInTheDocument();
    expect(posted).toEqual([]);

    await user.type(within(form).getByLabelText('Customer'), 'Walk-in customer');
    await user.click(within(form).getByRole('radio', { name: 'Pump-around' }));
    const vents = await within(form).findByRole('checkbox', { name: /^Fuel comes out of the vents/ });
    expect(within(form).queryByText('Stop: Fuel near hot parts')).toBeNull();
    await user.click(vents);
    expect(vents).toBeChecked();
    expect(within(form).getByText('Stop: Fuel near hot parts')).toBeInTheDocument();
    await user.click(within(form).getByRole('checkbox', { name: /^Hesitates or stutters/ }));
    await user.click(within(form).getByRole('checkbox', { name: /^Hesitates or stutters/ }));
    await user.click(within(form).getByRole('button', { name: 'Open the work order' }));

    await waitFor(() => expect(router.state.location.pathname).toBe('/work-orders/wo-9'));
    expect(posted).toEqual([{ customerName: 'Walk-in customer', symptoms: ['fuel-from-vents'], setup: { carburettorKind: 'pump-around' } }]);
  });
});
