import { screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it, vi } from 'vitest';
import type { KartDto, SetupDto } from '@fuelwright/shared';
import { makeUser, meReply, mockApi, renderApp, setPhoneWidth } from '../../../test-utils';

const KART: KartDto = {
  id: 'k1',
  ownerId: 'u',
  ownerName: 'Test racer',
  name: 'Blue 27',
  displacementCc: 125,
  drive: 'gearbox',
  carburettorKind: 'pump-around',
  notes: 'Shifter.',
  createdAt: '2026-01-01T00:00:00Z',
  updatedAt: '2026-01-01T00:00:00Z',
};
const SETUP: SetupDto = { id: 's1', kartId: 'k1', takenOn: '2026-09-12', note: '', createdAt: '2026-09-12T00:00:00Z', changedFields: [], mainJet: 185 };

function api(viewer = makeUser('racer', { id: 'u' }), extra = {}) {
  return mockApi({
    'GET /auth/me': meReply(viewer),
    'GET /karts/k1': { status: 200, body: KART },
    'GET /karts/k1/setups': { status: 200, body: { setups: [SETUP] } },
    'GET /karts': { status: 200, body: { karts: [] } },
    'DELETE /karts/k1': { status: 204 },
    ...extra,
  });
}

describe('kart page', () => {
  it('deletes a kart only after the alert is confirmed, then goes back to the kart list', async () => {
    setPhoneWidth(false);
    const calls = api();
    const user = userEvent.setup();
    const { router } = renderApp('/karts/k1');
    await user.click(await screen.findByRole('button', { name: 'Delete' }));
    const alert = await screen.findByRole('alertdialog');
    expect(alert).toHaveTextContent('Delete Blue 27?');
    expect(alert).toHaveTextContent('Its 1 setup, its jetting log and its cases are deleted with it.');

    await user.click(within(alert).getByRole('button', { name: 'Keep it' }));
    await waitFor(() => expect(screen.queryByRole('alertdialog')).not.toBeInTheDocument());
    expect(calls.filter((c) => c.method === 'DELETE')).toHaveLength(0);

    await user.click(screen.getByRole('button', { name: 'Delete' }));
    await user.click(within(await screen.findByRole('alertdialog')).getByRole('button', { name: 'Delete kart' }));
    await waitFor(() => expect(router.state.location.pathname).toBe('/karts'));
    expect(calls.filter((c) => c.method === 'DELETE').map((c) => c.path)).toEqual(['/karts/k1']);
  });

  it('edits a kart, keeping what was typed when the server refuses a field', async () => {
    setPhoneWidth(false);
    const calls = api(undefined, {
      'PATCH /karts/k1': {
        status: 400,
        body: { statusCode: 400, error: 'Bad Request', message: 'Check this field: name.', fields: { name: ['name must be at most 60 characters'] } },
      },
    });
    const user = userEvent.setup();
    renderApp('/karts/k1');
    await user.click(await screen.findByRole('button', { name: 'Edit' }));
    const name = screen.getByLabelText('Name');
    await user.clear(name);
    await user.type(name, 'Blue 28');
    await user.click(screen.getByRole('button', { name: 'Save kart' }));
    expect(await screen.findByText('name must be at most 60 characters')).toBeInTheDocument();
    expect(name).toHaveValue('Blue 28');
    expect(screen.getByLabelText('Engine size (cc)')).toHaveValue('125');
    const patch = calls.find((c) => c.method === 'PATCH')!;
    expect(JSON.parse(String(patch.init.body))).toMatchObject({ name: 'Blue 28', displacementCc: 125, drive: 'gearbox', carburettorKind: 'pump-around' });
  });

  it('shows a shared kart to someone else without the controls that change it', async () => {
    setPhoneWidth(false);
    api(makeUser('coach', { id: 'coach-1' }));
    renderApp('/karts/k1');
    expect(await screen.findByRole('heading', { name: 'Blue 27' })).toBeInTheDocument();
    await screen.findByRole('table');
    for (const name of ['Edit', 'Delete', 'Record a setup', 'Diagnose this kart']) {
      expect(screen.queryByRole('button', { name })).not.toBeInTheDocument();
    }
  });

  it('opened from a jetting log link, shows the setups with the linked one marked and scrolled to', async () => {
    setPhoneWidth(false);
    const OLDER: SetupDto = { ...SETUP, id: 's0', takenOn: '2026-08-01', mainJet: 190 };
    api(undefined, { 'GET /karts/k1/setups': { status: 200, body: { setups: [SETUP, OLDER] } } });
    const scrolled = vi.spyOn(Element.prototype, 'scrollIntoView');
    renderApp('/karts/k1?setup=s0#setups');
    const table = await screen.findByRole('table');
    const rows = within(table).getAllByRole('row').slice(1);
    expect(rows.map((r) => r.getAttribute('data-setup-id'))).toEqual(['s1', 's0']);
    expect(rows[1]).toHaveAttribute('aria-current', 'true');
    expect(within(rows[1]).getByText('Selected')).toBeInTheDocument();
    expect(rows[0]).not.toHaveAttribute('aria-current');
    expect(within(rows[0]).queryByText('Selected')).toBeNull();
    await waitFor(() => expect(scrolled.mock.contexts).toContain(rows[1]));
    scrolled.mockRestore();
  });

  it('on a phone marks the linked setup’s card, and says so when the link names a setup the kart no longer has', async () => {
    setPhoneWidth(true);
    api();
    const { router, unmount } = renderApp('/karts/k1?setup=s1');
    const cards = await screen.findByRole('list', { name: 'Past setups' });
    const item = within(cards).getAllByRole('listitem')[0];
    expect(item).toHaveAttribute('aria-current', 'true');
    expect(within(item).getByText('Selected')).toBeInTheDocument();
    expect(router.state.location.search).toBe('?setup=s1');
    unmount();

    api();
    renderApp('/karts/k1?setup=gone');
    expect(await screen.findByText('The setup the link points to is not among this kart’s setups any more.')).toBeInTheDocument();
    expect(within(screen.getByRole('list', { name: 'Past setups' })).getAllByRole('listitem')[0]).not.toHaveAttribute('aria-current');
  });
});
