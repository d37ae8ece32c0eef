import { screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it } from 'vitest';
import type { AirResponse } from '@fuelwright/shared';
import { makeUser, meReply, mockApi, renderApp } from '../../../test-utils';

// A made-up answer: the page's job here is to send the right request and show what comes back.
const ANSWER: AirResponse = {
  densityKgM3: 1.19931,
  dryAirDensityKgM3: 1.19061,
  vaporPressureHpa: 11.74,
  saturationVaporPressureHpa: 23.39,
  densityAltitudeM: 220.4,
  relativeAirDensityPct: 97.9,
  reference: 'isa-sea-level',
  referenceDensityKgM3: 1.225,
  powerCorrectionFactor: 0.977,
  stationPressureHpa: 1013.2,
  warnings: ['The temperature 58.0 C is outside -20..50 C; the air-density formulas are extrapolated and less certain.'],
};

describe('conditions page', () => {
  it('lets a visitor pick units (kept in this browser) and sends °C and hPa', async () => {
    const calls = mockApi({ 'GET /auth/me': meReply(null), 'POST /conditions/air': { status: 200, body: ANSWER } });
    renderApp('/conditions');
    const user = userEvent.setup();
    await screen.findByRole('heading', { name: /Conditions/ }, { timeout: 5000 });
    await user.click(screen.getByRole('radio', { name: '°F' }));
    await user.click(screen.getByRole('radio', { name: 'inHg' }));
    expect(JSON.parse(window.localStorage.getItem('fuelwright.units')!)).toEqual({ temperature: 'F', pressure: 'inHg', length: 'm' });
    await user.type(screen.getByLabelText('Air temperature (°F)'), '68');
    await user.type(screen.getByLabelText('Relative humidity (%)'), '50');
    await user.type(screen.getByLabelText('Station pressure (inHg)'), '29.92');
    await user.click(screen.getByRole('button', { name: 'Work out the air' }));
    const figures = await screen.findByLabelText('Air figures', undefined, { timeout: 5000 });
    const post = calls.find((c) => c.method === 'POST')!;
    const body = JSON.parse(String(post.init.body));
    // F = C x 9/5 + 32; 1 inHg = 33.86388640341 hPa (NIST SP 811).
    expect(body.temperatureC).toBeCloseTo(20, 9);
    expect(body.stationPressureHpa).toBeCloseTo(29.92 * 33.86388640341, 6);
    expect(body.relativeHumidityPct).toBe(50);
    expect(within(figures).getByText('1.199 kg/m³')).toBeInTheDocument();
    expect(within(figures).getByText('220 m')).toBeInTheDocument();
    expect(within(figures).getByText('0.977')).toBeInTheDocument();
    expect(screen.getByText(/outside -20\.\.50 C/)).toBeInTheDocument();
    // A visitor's units never go to the server.
    expect(calls.some((c) => c.path === '/me/preferences')).toBe(false);
  });

  it('uses and saves a signed-in racer’s units on the server', async () => {
    let saved: unknown = null;
    const calls = mockApi({
      'GET /auth/me': meReply(makeUser('racer')),
      'GET /me/preferences': { status: 200, body: { units: { temperature: 'C', pressure: 'kPa', length: 'ft' } } },
      'PUT /me/preferences': (init) => {
        saved = JSON.parse(String(init.body));
        return { status: 200, body: saved };
      },
    });
    renderApp('/conditions');
    const user = userEvent.setup();
    await screen.findByRole('heading', { name: /Conditions/ }, { timeout: 5000 });
    expect(await screen.findByLabelText('Station pressure (kPa)', undefined, { timeout: 5000 })).toBeInTheDocument();
    await user.click(screen.getByRole('radio', { name: 'mmHg' }));
    await waitFor(() => expect(saved).toEqual({ units: { temperature: 'C', pressure: 'mmHg', length: 'ft' } }));
    expect(screen.getByLabelText('Station pressure (mmHg)')).toBeInTheDocument();
    expect(calls.filter((c) => c.method === 'PUT')).toHaveLength(1);
  });

  it('shows the server’s message under the field it names', async () => {
    mockApi({
      'GET /auth/me': meReply(null),
      'POST /conditions/air': {
        status: 400,
        body: { statusCode: 400, error: 'Bad Request', message: 'Check this field: relativeHumidityPct.', fields: { relativeHumidityPct: ['relativeHumidityPct must be from 0 to 100'] } },
      },
    });
    renderApp('/conditions');
    const user = userEvent.setup();
    await user.type(await screen.findByLabelText('Air temperature (°C)', undefined, { timeout: 5000 }), '20');
    await user.type(screen.getByLabelText('Relative humidity (%)'), '150');
    await user.type(screen.getByLabelText('Station pressure (hPa)'), '1000');
    await user.click(screen.getByRole('button', { name: 'Work out the air' }));
    expect(await screen.findByText('relativeHumidityPct must be from 0 to 100', undefined, { timeout: 5000 })).toBeInTheDocument();
  });
});
