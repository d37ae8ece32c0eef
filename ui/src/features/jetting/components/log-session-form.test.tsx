import { render, screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it } from 'vitest';
import type { JettingSessionDto, SetupDto, UnitPreferences } from '@fuelwright/shared';
import { AppProviders } from '../../../app/providers';
import { EMPTY_AIR_FORM } from '../../../components/air-reading-fields';
import { createQueryClient } from '../../../lib/query-client';
import { formatCalendarDate } from '../../../lib/setup-fields';
import { mockApi, type ApiCall } from '../../../test-utils';
import { LogSessionForm } from './log-session-form';

// Invented demo values: two snapshots of one kart, newest first as GET /api/karts/:id/setups answers.
const base = { kartId: 'k1', note: '', createdAt: '2026-11-01T10:00:00.000Z', changedFields: [] };
const NEWER: SetupDto = { ...base, id: 'setup-new', takenOn: '2026-11-21', mainJet: 182.5, pilotJet: 40, needleClipGroove: 3, airScrewTurnsOut: 1.75 };
const OLDER: SetupDto = { ...base, id: 'setup-old', takenOn: '2026-10-02', mainJet: 190, pilotJet: 37.5, needleClipGroove: 2 };
const METRIC: UnitPreferences = { temperature: 'C', pressure: 'hPa', length: 'm' };

/** The newest logged session (only what the form reads of it). */
const LATEST = { track: 'Club circuit', mainJet: 185, pilotJet: 37.5, needleClipGroove: 4, airScrewTurnsOut: 1.5 } as JettingSessionDto;

const posts = (calls: ApiCall[]) => calls.filter((c) => c.method === 'POST' && c.path === '/karts/k1/sessions');

function renderForm(setups: SetupDto[], latest: JettingSessionDto | undefined = LATEST) {
  return render(
    <AppProviders queryClient={createQueryClient()}>
      <LogSessionForm kartId="k1" units={METRIC} latest={latest} setups={setups} initialAir={EMPTY_AIR_FORM} onDone={() => undefined} />
    </AppProviders>,
  );
}

async function fillAirAndRan(user: ReturnType<typeof userEvent.setup>) {
  await user.type(screen.getByLabelText('Air temperature (°C)'), '14');
  await user.type(screen.getByLabelText('Relative humidity (%)'), '60');
  await user.type(screen.getByLabelText('Station pressure (hPa)'), '1009');
  await user.click(screen.getByRole('radio', { name: 'Right' }));
}

describe('log session form: the setup used', () => {
  it('lists the kart’s setups newest first with date, main jet and clip, starts on the latest and fills the jets from it', () => {
    mockApi({});
    renderForm([NEWER, OLDER]);
    const select = screen.getByLabelText('Setup used');
    const options = within(select).getAllByRole('option');
    // Short option texts, so the chosen one is readable in the closed select at 390 px.
    expect(options.map((o) => o.textContent)).toEqual([
      'None',
      `${formatCalendarDate('2026-11-21')} · main 182.5 · clip 3`,
      `${formatCalendarDate('2026-10-02')} · main 190 · clip 2`,
    ]);
    expect(select).toHaveValue('setup-new');
    // The chosen setup in full words under the select.
    expect(select).toHaveAccessibleDescription(
      `The latest setup, ${formatCalendarDate('2026-11-21')}: main jet 182.5, clip groove 3 from top. Its jets fill the fields below; change any the kart ran differently.`,
    );
    expect(screen.getByLabelText('Main jet')).toHaveValue('182.5');
    expect(screen.getByLabelText('Pilot jet')).toHaveValue('40');
    expect(screen.getByLabelText('Needle clip groove')).toHaveValue('3');
    expect(screen.getByLabelText('Air screw, turns out')).toHaveValue('1.75');
  });

  it('picking an older setup fills the jets not typed, keeps the typed one, and sends its id', async () => {
    const calls = mockApi({ 'POST /karts/k1/sessions': { status: 201, body: { ...LATEST, id: 'new', sessionOn: '2026-11-22' } } });
    const user = userEvent.setup();
    renderForm([NEWER, OLDER]);
    const main = screen.getByLabelText('Main jet');
    await user.clear(main);
    await user.type(main, '187.5');
    await user.selectOptions(screen.getByLabelText('Setup used'), 'setup-old');
    expect(screen.getByLabelText('Setup used')).toHaveAccessibleDescription(new RegExp(`^${formatCalendarDate('2026-10-02')}: main jet 190, clip groove 2 from top\\. Its jets`));
    expect(main).toHaveValue('187.5');
    expect(screen.getByLabelText('Pilot jet')).toHaveValue('37.5');
    expect(screen.getByLabelText('Needle clip groove')).toHaveValue('2');
    // The older setup does not record the air screw: the latest session's value stands in.
    expect(screen.getByLabelText('Air screw, turns out')).toHaveValue('1.5');

    await fillAirAndRan(user);
    await user.click(screen.getByRole('button', { name: 'Log session' }));
    await waitFor(() => expect(posts(calls)).toHaveLength(1));
    expect(JSON.parse(String(posts(calls)[0].init.body))).toMatchObject({
      setupId: 'setup-old',
      mainJet: 187.5,
      pilotJet: 37.5,
      needleClipGroove: 2,
      airScrewTurnsOut: 1.5,
    });
  });

  it('“None” keeps the jets and sends no setup', async () => {
    const calls = mockApi({ 'POST /karts/k1/sessions': { status: 201, body: { ...LATEST, id: 'new', sessionOn: '2026-11-22' } } });
    const user = userEvent.setup();
    renderForm([NEWER, OLDER]);
    await user.selectOptions(screen.getByLabelText('Setup used'), '');
    expect(screen.getByLabelText('Setup used')).toHaveAccessibleDescription('No setup linked: enter the jets the kart ran below.');
    expect(screen.getByLabelText('Main jet')).toHaveValue('182.5');
    await fillAirAndRan(user);
    await user.click(screen.getByRole('button', { name: 'Log session' }));
    await waitFor(() => expect(posts(calls)).toHaveLength(1));
    const body = JSON.parse(String(posts(calls)[0].init.body));
    expect(body).not.toHaveProperty('setupId');
    expect(body.mainJet).toBe(182.5);
  });

  it('shows the server’s setupId message under the select and keeps everything entered', async () => {
    const message = 'setupId must be the id of a setup snapshot of this kart';
    mockApi({ 'POST /karts/k1/sessions': { status: 400, body: { statusCode: 400, error: 'Bad Request', message: 'Check the fields', fields: { setupId: [message] } } } });
    const user = userEvent.setup();
    renderForm([NEWER, OLDER]);
    await user.selectOptions(screen.getByLabelText('Setup used'), 'setup-old');
    await fillAirAndRan(user);
    await user.type(screen.getByLabelText('Note'), 'Cold start');
    await user.click(screen.getByRole('button', { name: 'Log session' }));
    expect(await screen.findByText(message)).toBeInTheDocument();
    expect(screen.getByLabelText('Setup used')).toHaveAccessibleDescription(message);
    expect(screen.getByLabelText('Setup used')).toHaveValue('setup-old');
    expect(screen.getByLabelText('Note')).toHaveValue('Cold start');
    expect(screen.getByLabelText('Air temperature (°C)')).toHaveValue('14');
  });

  it('without setups offers only “None”, says where to record one, and starts from the latest session’s jets', () => {
    mockApi({});
    renderForm([]);
    const select = screen.getByLabelText('Setup used');
    expect(within(select).getAllByRole('option').map((o) => o.textContent)).toEqual(['None']);
    expect(select).toHaveValue('');
    expect(select).toHaveAccessibleDescription(/No setup recorded for this kart yet/);
    expect(screen.getByLabelText('Main jet')).toHaveValue('185');
    expect(screen.getByLabelText('Needle clip groove')).toHaveValue('4');
  });
});
