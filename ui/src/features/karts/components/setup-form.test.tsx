import { screen, waitFor, render } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it } from 'vitest';
import type { SetupDto } from '@fuelwright/shared';
import { AppProviders } from '../../../app/providers';
import { createQueryClient } from '../../../lib/query-client';
import { mockApi, type ApiCall } from '../../../test-utils';
import { SetupForm } from './setup-form';

const LATEST: SetupDto = {
  id: 's1',
  kartId: 'k1',
  takenOn: '2026-09-12',
  note: '',
  createdAt: '2026-09-12T10:00:00.000Z',
  changedFields: [],
  mainJet: 185,
  pilotJet: 37.5,
  needleClipGroove: 3,
  airScrewTurnsOut: 1.5,
  idleScrew: 'backed-off',
  idleScrewTurns: 0,
  premixRatio: 32,
  ventLinesFitted: true,
  ventLinesRoutedUp: true,
};

function renderForm(latest: SetupDto | undefined = LATEST) {
  return render(
    <AppProviders queryClient={createQueryClient()}>
      <SetupForm kartId="k1" carburettorKind="pump-around" latest={latest} />
    </AppProviders>,
  );
}

const posts = (calls: ApiCall[]) => calls.filter((c) => c.method === 'POST' && c.path === '/karts/k1/setups');

describe('setup form', () => {
  it('starts from the latest setup and explains each field', () => {
    mockApi({});
    renderForm();
    expect(screen.getByLabelText('Main jet')).toHaveValue('185');
    expect(screen.getByLabelText('Pilot jet')).toHaveValue('37.5');
    expect(screen.getByLabelText('Needle clip groove (from the top)')).toHaveValue('3');
    expect(screen.getByLabelText('Air screw (turns out)')).toHaveValue('1.5');
    expect(screen.getByRole('radio', { name: 'Backed off' })).toHaveAttribute('aria-checked', 'true');
    expect(screen.getByLabelText('Main jet')).toHaveAccessibleDescription(/stamped on the main jet.*float bowl/);
    expect(screen.getByLabelText('Needle clip groove (from the top)')).toHaveAccessibleDescription(/Count the grooves from the top of the needle/);
    // Opening the carburettor handles fuel: the caution comes before the fields.
    expect(screen.getByText('Caution')).toBeInTheDocument();
  });

  it('shows a wrong value under its field, sends nothing, keeps what was typed; fixing it sends the setup', async () => {
    const saved: SetupDto = { ...LATEST, id: 's2', takenOn: '2026-09-13', mainJet: 190, changedFields: ['mainJet'] };
    const calls = mockApi({ 'POST /karts/k1/setups': { status: 201, body: saved }, 'GET /karts/k1/setups': { status: 200, body: { setups: [saved, LATEST] } } });
    const user = userEvent.setup();
    renderForm();
    const main = screen.getByLabelText('Main jet');
    await user.clear(main);
    await user.type(main, '1900');
    await user.type(screen.getByLabelText('Note'), 'Cold morning');
    await user.click(screen.getByRole('button', { name: 'Save setup' }));

    expect(await screen.findByText('Main jets run from 50 to 400: check the number stamped on the jet.')).toBeInTheDocument();
    expect(main).toHaveAttribute('aria-invalid', 'true');
    expect(main).toHaveFocus();
    expect(screen.getByRole('alert')).toHaveTextContent('nothing was saved yet');
    expect(posts(calls)).toHaveLength(0);
    expect(main).toHaveValue('1900');
    expect(screen.getByLabelText('Note')).toHaveValue('Cold morning');
    expect(screen.getByLabelText('Pilot jet')).toHaveValue('37.5');

    await user.clear(main);
    await user.type(main, '190');
    expect(screen.queryByText(/Main jets run from/)).not.toBeInTheDocument();
    await user.click(screen.getByRole('button', { name: 'Save setup' }));
    await waitFor(() => expect(posts(calls)).toHaveLength(1));
    const body = JSON.parse(String(posts(calls)[0].init.body));
    expect(body).toMatchObject({ mainJet: 190, pilotJet: 37.5, needleClipGroove: 3, airScrewTurnsOut: 1.5, idleScrew: 'backed-off', note: 'Cold morning' });
    expect(body.takenOn).toMatch(/^\d{4}-\d{2}-\d{2}$/);
  });

  it('shows the server’s 400 messages under their fields until the field is changed, keeping every value', async () => {
    const calls = mockApi({
      'POST /karts/k1/setups': {
        status: 400,
        body: {
          statusCode: 400,
          error: 'Bad Request',
          message: 'Check this field: pilotJet.',
          fields: { pilotJet: ['pilotJet must be from 10 to 80: the size stamped on the pilot (slow) jet'] },
        },
      },
    });
    const user = userEvent.setup();
    renderForm();
    const pilot = screen.getByLabelText('Pilot jet');
    await user.clear(pilot);
    await user.type(pilot, '40');
    await user.click(screen.getByRole('button', { name: 'Save setup' }));

    expect(await screen.findByText('pilotJet must be from 10 to 80: the size stamped on the pilot (slow) jet')).toBeInTheDocument();
    expect(pilot).toHaveAttribute('aria-invalid', 'true');
    expect(pilot).toHaveValue('40');
    expect(screen.getByLabelText('Main jet')).toHaveValue('185');
    expect(posts(calls)).toHaveLength(1);

    await user.type(pilot, '.5');
    expect(screen.queryByText(/pilotJet must be/)).not.toBeInTheDocument();
    expect(pilot).not.toHaveAttribute('aria-invalid');
  });

  it('refuses a date in the future', async () => {
    const calls = mockApi({});
    const user = userEvent.setup();
    renderForm(undefined);
    const date = screen.getByLabelText('Date taken');
    await user.clear(date);
    await user.type(date, '2999-01-01');
    await user.click(screen.getByRole('button', { name: 'Save setup' }));
    expect(await screen.findByText('The day the kart ran with this setup cannot be in the future.')).toBeInTheDocument();
    expect(posts(calls)).toHaveLength(0);
  });
});
