import { render, screen, within } from '@testing-library/react';
import { MemoryRouter } from 'react-router-dom';
import { describe, expect, it } from 'vitest';
import type { JettingSessionDto, SetupDto, UnitPreferences } from '@fuelwright/shared';
import { AppProviders } from '../../../app/providers';
import { createQueryClient } from '../../../lib/query-client';
import { formatCalendarDate } from '../../../lib/setup-fields';
import { mockApi } from '../../../test-utils';
import { SessionLogTable } from './session-log-table';

// Invented demo values.
const SETUP: SetupDto = {
  id: 'setup-1',
  kartId: 'k1',
  takenOn: '2026-11-21',
  note: '',
  createdAt: '2026-11-21T10:00:00.000Z',
  changedFields: [],
  mainJet: 182.5,
  needleClipGroove: 3,
};
const METRIC: UnitPreferences = { temperature: 'C', pressure: 'hPa', length: 'm' };

function session(id: string, setupId: string | null): JettingSessionDto {
  return {
    id,
    kartId: 'k1',
    sessionOn: '2026-11-22',
    track: 'Club circuit',
    temperatureC: 14,
    stationPressureHpa: 1009,
    relativeHumidityPct: 60,
    densityKgM3: 1.22,
    dryAirDensityKgM3: 1.225,
    setupId,
    mainJet: 182.5,
    pilotJet: 40,
    needleClipGroove: 3,
    airScrewTurnsOut: null,
    plugColour: null,
    ran: 'right',
    lapTimeMs: null,
    note: '',
    createdAt: '2026-11-22T10:00:00.000Z',
  };
}

function renderTable(sessions: JettingSessionDto[], setups: SetupDto[]) {
  mockApi({});
  return render(
    <AppProviders queryClient={createQueryClient()}>
      <MemoryRouter>
        <SessionLogTable kartId="k1" sessions={sessions} setups={setups} units={METRIC} canDelete={false} />
      </MemoryRouter>
    </AppProviders>,
  );
}

const rowOf = (id: number) => within(screen.getByRole('table', { name: 'Jetting log' })).getAllByRole('row')[id];

describe('jetting log table: the setup used', () => {
  it('names the linked setup in its own column with the main jet and clip, linking to the kart’s page', () => {
    renderTable([session('with', 'setup-1'), session('without', null)], [SETUP]);
    const headers = screen.getAllByRole('columnheader').map((th) => th.textContent);
    const column = headers.indexOf('Setup used');
    expect(column).toBeGreaterThan(0);
    const day = formatCalendarDate('2026-11-21');

    const linked = within(rowOf(1)).getAllByRole('cell')[column];
    expect(linked).toHaveTextContent(`${day}main jet 182.5, clip groove 3 from top`);
    const link = within(linked).getByRole('link');
    // Opens the kart page at its setups list with this setup highlighted.
    expect(link).toHaveAttribute('href', '/karts/k1?setup=setup-1#setups');
    expect(link).toHaveAccessibleName(`Setup of ${day}: main jet 182.5, clip groove 3 from top`);

    expect(within(rowOf(2)).getAllByRole('cell')[column]).toHaveTextContent('None');
  });

  it('on a phone the day cell carries a short link instead (the column is hidden there)', () => {
    const { container } = renderTable([session('with', 'setup-1'), session('without', null)], [SETUP]);
    expect(screen.getByRole('columnheader', { name: 'Setup used' })).toHaveClass('fw-hide-on-phone');
    const phoneLines = container.querySelectorAll('.fw-phone-only');
    // Only the session that ran a setup gets the line.
    expect(phoneLines).toHaveLength(1);
    expect(within(rowOf(1)).getAllByRole('cell')[0]).toContainElement(phoneLines[0] as HTMLElement);
    expect(phoneLines[0]).toHaveTextContent(`Setup ${formatCalendarDate('2026-11-21')}`);
    expect(within(phoneLines[0] as HTMLElement).getByRole('link')).toHaveAttribute('href', '/karts/k1?setup=setup-1#setups');
  });

  it('still links a setup it cannot name (setups not loaded)', () => {
    renderTable([session('with', 'setup-1')], []);
    expect(screen.getAllByRole('link', { name: 'The linked setup' })[0]).toHaveAttribute('href', '/karts/k1?setup=setup-1#setups');
  });
});
