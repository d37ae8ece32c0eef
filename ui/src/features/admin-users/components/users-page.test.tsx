import { screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it } from 'vitest';
import type { UserDto } from '@fuelwright/shared';
import { makeUser, meReply, mockApi, renderApp } from '../../../test-utils';

describe('users screen (admin)', () => {
  it('changes a role with PATCH, shows the new role and a toast; the own role cannot be changed here', async () => {
    const admin = makeUser('admin', { displayName: 'Ada Admin' });
    let racer: UserDto = makeUser('racer', { displayName: 'Rae Racer' });
    const calls = mockApi({
      'GET /auth/me': meReply(admin),
      'GET /users': () => ({ status: 200, body: { users: [admin, racer] } }),
      [`PATCH /users/${racer.id}/role`]: (init) => {
        racer = { ...racer, role: JSON.parse(String(init.body)).role };
        return { status: 200, body: { user: racer } };
      },
    });
    renderApp('/admin/users');

    const select = await screen.findByRole('combobox', { name: 'Role of Rae Racer' });
    expect(screen.getByRole('combobox', { name: 'Role of Ada Admin' })).toBeDisabled();
    await userEvent.setup().selectOptions(select, 'coach');

    expect(await screen.findByText('Rae Racer is now coach.')).toBeInTheDocument();
    const patch = calls.find((c) => c.method === 'PATCH');
    expect(patch?.path).toBe(`/users/${racer.id}/role`);
    expect(patch?.init.body).toBe(JSON.stringify({ role: 'coach' }));
    await waitFor(() => expect(screen.getByRole('combobox', { name: 'Role of Rae Racer' })).toHaveValue('coach'));
  });

  it('keeps the old role and shows the server message when the change is refused', async () => {
    const admin = makeUser('admin');
    const racer = makeUser('racer', { displayName: 'Rae Racer' });
    mockApi({
      'GET /auth/me': meReply(admin),
      'GET /users': { status: 200, body: { users: [admin, racer] } },
      [`PATCH /users/${racer.id}/role`]: {
        status: 400,
        body: { statusCode: 400, error: 'Bad Request', message: 'Role must be one of racer, coach, shop, admin.' },
      },
    });
    renderApp('/admin/users');
    const select = await screen.findByRole('combobox', { name: 'Role of Rae Racer' });
    await userEvent.setup().selectOptions(select, 'shop');
    const toast = await screen.findByText(/Role of Rae Racer not changed/);
    expect(within(toast).getByText(/Role must be one of/)).toBeInTheDocument();
    await waitFor(() => expect(screen.getByRole('combobox', { name: 'Role of Rae Racer' })).toHaveValue('racer'));
  });
});
