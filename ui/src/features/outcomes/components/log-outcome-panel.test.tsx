import { render, screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { MemoryRouter } from 'react-router-dom';
import { describe, expect, it } from 'vitest';
import type { CaseDto, LogOutcomeRequest, UserDto } from '@fuelwright/shared';
import { AppProviders } from '../../../app/providers';
import { CurrentUserProvider } from '../../../lib/current-user';
import { createQueryClient } from '../../../lib/query-client';
import { makeUser, mockApi } from '../../../test-utils';
import { CATALOG, outcome } from '../test-support/fixtures';
import { LogOutcomePanel } from './log-outcome-panel';

const OWNER = makeUser('racer', { id: 'racer-1' });

/** Only what the panel reads of a case. */
function aCase(state: CaseDto['state']): CaseDto {
  return {
    id: 'case-1',
    ownerId: OWNER.id,
    state,
    rank: { causes: [{ id: 'fuel-level-high', probability: 0.4 }, { id: 'foam-degraded', probability: 0.2 }] },
    resolution: state === 'resolved' ? { causeId: 'foam-degraded', fix: 'New foam', note: '', at: '2026-11-20T10:00:00.000Z', by: OWNER.id } : null,
  } as unknown as CaseDto;
}

function renderPanel(viewer: UserDto, c: CaseDto) {
  return render(
    <AppProviders queryClient={createQueryClient()}>
      <CurrentUserProvider user={viewer}>
        <MemoryRouter>
          <LogOutcomePanel c={c} />
        </MemoryRouter>
      </CurrentUserProvider>
    </AppProviders>,
  );
}

describe('"Log what really fixed it" on the case page', () => {
  it('lets the owner of a resolved case log it, filled from the resolution, the ranking’s causes first', async () => {
    const posted: LogOutcomeRequest[] = [];
    mockApi({
      'GET /catalog': { status: 200, body: CATALOG },
      'POST /outcomes': (init) => {
        const body = JSON.parse(String(init.body)) as LogOutcomeRequest;
        posted.push(body);
        return { status: 201, body: outcome({ id: 'out-7', caseId: 'case-1', workOrderId: null, confirmedCauses: body.confirmedCauses, fix: body.fix }) };
      },
    });
    renderPanel(OWNER, aCase('resolved'));
    const user = userEvent.setup();
    const panel = screen.getByRole('region', { name: 'Log what really fixed it' });
    await user.click(await within(panel).findByRole('button', { name: 'Log the outcome' }));
    const form = within(panel).getByRole('form', { name: 'Log what really fixed it' });
    const boxes = within(form).getAllByRole('checkbox');
    expect(boxes.slice(0, 2).map((b) => b.closest('label')?.querySelector('strong')?.textContent)).toEqual(['Fuel level too high', 'Bowl foam missing, rotten or soaked']);
    expect(within(form).getByRole('checkbox', { name: /^Bowl foam missing/ })).toBeChecked();
    expect(within(form).getByLabelText('What fixed it')).toHaveValue('New foam');
    await user.click(within(form).getByRole('button', { name: 'Log the outcome' }));
    await waitFor(() => expect(posted).toEqual([{ caseId: 'case-1', confirmedCauses: ['foam-degraded'], fix: 'New foam' }]));
    expect(await within(panel).findByRole('button', { name: 'Correct this entry' })).toBeInTheDocument();
    expect(within(panel).queryByRole('link', { name: /work order/ })).toBeNull();
  });

  it('shows nothing on an open case of the owner, nor to a coach; a shop gets it with a work-order link', async () => {
    mockApi({ 'GET /catalog': { status: 200, body: CATALOG }, 'GET /outcomes': { status: 200, body: { outcomes: [], total: 0 } } });
    const open = renderPanel(OWNER, aCase('open'));
    expect(screen.queryByRole('region', { name: 'Log what really fixed it' })).toBeNull();
    open.unmount();
    const coach = renderPanel(makeUser('coach'), aCase('resolved'));
    expect(screen.queryByRole('region', { name: 'Log what really fixed it' })).toBeNull();
    coach.unmount();
    renderPanel(makeUser('shop'), aCase('open'));
    const panel = screen.getByRole('region', { name: 'Log what really fixed it' });
    expect(await within(panel).findByRole('button', { name: 'Open a work order for it' })).toHaveAttribute('href', '/work-orders/new?caseId=case-1');
  });
});
