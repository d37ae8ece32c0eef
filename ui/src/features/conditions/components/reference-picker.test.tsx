import { screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it } from 'vitest';
import type { AirResponse, JettingSessionDto, KartDto } from '@fuelwright/shared';
import { makeUser, meReply, mockApi, renderApp } from '../../../test-utils';
import { REFERENCE_STORAGE_KEY } from '../lib/air-reference';

// Made-up karts, sessions and answer: the page's job here is to send the picked session's stored
// density as the reference and to say which reference the figures are against.
function kart(id: string, name: string): KartDto {
  return {
    id,
    ownerId: 'user-racer',
    ownerName: 'Test racer',
    name,
    displacementCc: 100,
    drive: 'direct-drive',
    carburettorKind: 'float-valve',
    notes: '',
    createdAt: '2026-01-01T10:00:00.000Z',
    updatedAt: '2026-01-01T10:00:00.000Z',
  };
}

function session(id: string, kartId: string, sessionOn: string, ran: JettingSessionDto['ran'], densityKgM3: number, track = 'Club circuit'): JettingSessionDto {
  return {
    id,
    kartId,
    sessionOn,
    track,
    temperatureC: 12,
    stationPressureHpa: 1010,
    relativeHumidityPct: 60,
    densityKgM3,
    dryAirDensityKgM3: densityKgM3 - 0.005,
    setupId: null,
    mainJet: 180,
    pilotJet: 40,
    needleClipGroove: 3,
    airScrewTurnsOut: null,
    plugColour: null,
    ran,
    lapTimeMs: null,
    note: '',
    createdAt: `${sessionOn}T10:00:00.000Z`,
  };
}

const ANSWER: AirResponse = {
  densityKgM3: 1.19931,
  dryAirDensityKgM3: 1.19061,
  vaporPressureHpa: 11.74,
  saturationVaporPressureHpa: 23.39,
  densityAltitudeM: 220.4,
  relativeAirDensityPct: 102.3,
  reference: 'baseline',
  referenceDensityKgM3: 1.172,
  powerCorrectionFactor: 0.977,
  stationPressureHpa: 1013.25,
  warnings: [],
};

const day = (iso: string) => new Date(`${iso}T12:00:00`).toLocaleDateString(undefined, { day: 'numeric', month: 'short', year: 'numeric' });

async function enterAir(user: ReturnType<typeof userEvent.setup>) {
  await user.type(await screen.findByLabelText('Air temperature (°C)'), '20');
  await user.type(screen.getByLabelText('Relative humidity (%)'), '50');
  await user.type(screen.getByLabelText('Station pressure (hPa)'), '1013.25');
}

describe('conditions page: the reference of the relative air density', () => {
  it('lets a racer pick a logged session of any of their karts, ran-right first, and says it is the reference', async () => {
    const calls = mockApi({
      'GET /auth/me': meReply(makeUser('racer')),
      'GET /me/preferences': { status: 200, body: { units: { temperature: 'C', pressure: 'hPa', length: 'm' } } },
      'GET /karts': { status: 200, body: { karts: [kart('k1', 'Blue 27'), kart('k2', 'Red 5')] } },
      'GET /karts/k1/sessions': {
        status: 200,
        body: { sessions: [session('s-new-lean', 'k1', '2026-11-20', 'lean', 1.15), session('s-old-right', 'k1', '2026-11-12', 'right', 1.172)] },
      },
      'GET /karts/k2/sessions': { status: 200, body: { sessions: [session('s-mid-right', 'k2', '2026-11-15', 'right', 1.201, 'Hill track')] } },
      'POST /conditions/air': { status: 200, body: ANSWER },
    });
    renderApp('/conditions');
    const user = userEvent.setup();
    await enterAir(user);
    // No session is fetched until the racer asks for one.
    expect(calls.some((c) => c.path === '/karts')).toBe(false);
    await user.click(screen.getByRole('radio', { name: 'Logged session' }));
    const select = (await screen.findByLabelText('Logged session')) as HTMLSelectElement;
    await waitFor(() => expect(select).not.toBeDisabled());
    // Ran right first, each group newest first, across both karts.
    expect(Array.from(select.querySelectorAll('optgroup')).map((g) => g.label)).toEqual(['Ran right', 'Ran rich or lean']);
    expect(Array.from(select.options).map((o) => o.value)).toEqual(['s-mid-right', 's-old-right', 's-new-lean']);
    expect(select.options[1].text).toBe(`Blue 27 · ${day('2026-11-12')} · 1.172 kg/m³ · ran right · Club circuit`);
    expect(select.value).toBe('s-mid-right');
    expect(screen.getByTestId('reference-session-detail')).toHaveTextContent(`Red 5, ${day('2026-11-15')} at Hill track: ran right, 1.201 kg/m³`);
    await user.selectOptions(select, 's-old-right');
    expect(screen.getByTestId('reference-session-detail')).toHaveTextContent(`Blue 27, ${day('2026-11-12')} at Club circuit: ran right, 1.172 kg/m³`);
    await user.click(screen.getByRole('button', { name: 'Work out the air' }));

    const figures = await screen.findByLabelText('Air figures');
    const body = JSON.parse(String(calls.find((c) => c.method === 'POST')!.init.body));
    expect(body.reference).toEqual({ kind: 'baseline', densityKgM3: 1.172 });
    const said = `Blue 27’s session of ${day('2026-11-12')} (ran right), 1.172 kg/m³`;
    expect(screen.getByTestId('reference-used')).toHaveTextContent(`Relative air density against ${said}.`);
    expect(within(figures).getByText(`against ${said}`)).toBeInTheDocument();
    expect(within(figures).getByText('102.3 %')).toBeInTheDocument();
    // Remembered in this browser: the page opens with the same session next time.
    expect(JSON.parse(window.localStorage.getItem(REFERENCE_STORAGE_KEY)!)).toEqual({ kind: 'session', sessionId: 's-old-right' });
  });

  it('reopens with the remembered session', async () => {
    window.localStorage.setItem(REFERENCE_STORAGE_KEY, JSON.stringify({ kind: 'session', sessionId: 's-b' }));
    mockApi({
      'GET /auth/me': meReply(makeUser('racer')),
      'GET /me/preferences': { status: 200, body: { units: { temperature: 'C', pressure: 'hPa', length: 'm' } } },
      'GET /karts': { status: 200, body: { karts: [kart('k1', 'Blue 27')] } },
      'GET /karts/k1/sessions': { status: 200, body: { sessions: [session('s-a', 'k1', '2026-11-20', 'right', 1.18), session('s-b', 'k1', '2026-11-10', 'right', 1.21)] } },
    });
    renderApp('/conditions');
    expect(await screen.findByRole('radio', { name: 'Logged session' })).toBeChecked();
    const select = (await screen.findByLabelText('Logged session')) as HTMLSelectElement;
    await waitFor(() => expect(select.value).toBe('s-b'));
  });

  it('tells a racer with no logged session where to log one, and does not compute', async () => {
    const calls = mockApi({
      'GET /auth/me': meReply(makeUser('racer')),
      'GET /me/preferences': { status: 200, body: { units: { temperature: 'C', pressure: 'hPa', length: 'm' } } },
      'GET /karts': { status: 200, body: { karts: [kart('k1', 'Blue 27')] } },
      'GET /karts/k1/sessions': { status: 200, body: { sessions: [] } },
    });
    renderApp('/conditions');
    const user = userEvent.setup();
    await enterAir(user);
    await user.click(screen.getByRole('radio', { name: 'Logged session' }));
    expect(await screen.findByText('No session logged yet')).toBeInTheDocument();
    expect(screen.getByText('Go to jetting').closest('a')).toHaveAttribute('href', '/jetting');
    await user.click(screen.getByRole('button', { name: 'Work out the air' }));
    expect(await screen.findByText('Pick one of your logged sessions, or another reference.')).toBeInTheDocument();
    expect(calls.some((c) => c.method === 'POST')).toBe(false);
  });

  it('offers a visitor ISA sea level and a typed density only, and a remembered session falls back to ISA', async () => {
    window.localStorage.setItem(REFERENCE_STORAGE_KEY, JSON.stringify({ kind: 'session', sessionId: 's-old-right' }));
    const calls = mockApi({
      'GET /auth/me': meReply(null),
      'POST /conditions/air': { status: 200, body: ANSWER },
    });
    renderApp('/conditions');
    const user = userEvent.setup();
    await enterAir(user);
    const group = screen.getByRole('radiogroup', { name: 'Relative air density against' });
    expect(within(group).getAllByRole('radio').map((r) => r.textContent)).toEqual(['ISA sea level', 'Typed density']);
    expect(within(group).getByRole('radio', { name: 'ISA sea level' })).toBeChecked();
    await user.click(within(group).getByRole('radio', { name: 'Typed density' }));
    await user.type(screen.getByLabelText('Reference air density (kg/m³)'), '1.172');
    await user.click(screen.getByRole('button', { name: 'Work out the air' }));
    await screen.findByLabelText('Air figures');
    const body = JSON.parse(String(calls.find((c) => c.method === 'POST')!.init.body));
    expect(body.reference).toEqual({ kind: 'baseline', densityKgM3: 1.172 });
    expect(screen.getByTestId('reference-used')).toHaveTextContent('Relative air density against the density you typed, 1.172 kg/m³.');
    // A visitor's page never asks for karts or sessions.
    expect(calls.some((c) => c.path.startsWith('/karts'))).toBe(false);
  });
});
