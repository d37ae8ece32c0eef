import { render, screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { MemoryRouter } from 'react-router-dom';
import { describe, expect, it } from 'vitest';
import type { CaseDto, CaseOutcomeDto, LogOutcomeRequest, UserDto } from '@fuelwright/shared';
import { AppProviders } from '../../../app/providers';
import { CurrentUserProvider } from '../../../lib/current-user';
import { createQueryClient } from '../../../lib/query-client';
import { makeUser, mockApi, type ApiCall } from '../../../test-utils';
import { CATALOG, outcome } from '../test-support/fixtures';
import { LogOutcomePanel } from './log-outcome-panel';

const OWNER = makeUser('racer', { id: 'racer-1' });
const READ = 'GET /cases/case-1/outcomes';

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

const onCase = (overrides: Partial<CaseOutcomeDto>): CaseOutcomeDto => ({ ...outcome({ caseId: 'case-1', workOrderId: null, ...overrides }), yours: false, ...overrides });

/** A shop's entry on the case, corrected by a later one (both the shop's). */
const SHOP_FIRST = onCase({ id: 'out-2', confirmedCauses: ['fuel-level-high'], fix: 'Float height reset', labourMinutes: null, current: false, at: '2026-11-20T11:00:00.000Z' });
const SHOP_FIX = onCase({
  id: 'out-3',
  confirmedCauses: ['vent-lines-off', 'foam-degraded'],
  fix: 'Vent lines fitted and new foam',
  parts: 'Vent line, foam set',
  labourMinutes: 35,
  stillFixed: true,
  supersedesId: 'out-2',
  at: '2026-11-20T12:00:00.000Z',
});

function renderPanel(viewer: UserDto, c: CaseDto) {
  const queryClient = createQueryClient();
  const view = render(
    <AppProviders queryClient={queryClient}>
      <CurrentUserProvider user={viewer}>
        <MemoryRouter>
          <LogOutcomePanel c={c} />
        </MemoryRouter>
      </CurrentUserProvider>
    </AppProviders>,
  );
  return { ...view, queryClient };
}

/** Waits until the panel has asked for the case's outcomes and the answer is in. */
async function readDone(calls: ApiCall[], queryClient: ReturnType<typeof createQueryClient>) {
  await waitFor(() => expect(calls.some((c) => `${c.method} ${c.path}` === READ)).toBe(true));
  await waitFor(() => expect(queryClient.isFetching()).toBe(0));
}

describe('"Log what really fixed it" on the case page', () => {
  it('lets the owner of a resolved case log it, filled from the resolution, the ranking’s causes first', async () => {
    const posted: LogOutcomeRequest[] = [];
    let logged: CaseOutcomeDto[] = [];
    mockApi({
      'GET /catalog': { status: 200, body: CATALOG },
      [READ]: () => ({ status: 200, body: { outcomes: logged } }),
      'POST /outcomes': (init) => {
        const body = JSON.parse(String(init.body)) as LogOutcomeRequest;
        posted.push(body);
        const created = outcome({ id: 'out-7', caseId: 'case-1', workOrderId: null, confirmedCauses: body.confirmedCauses, fix: body.fix });
        logged = [{ ...created, yours: true }];
        return { status: 201, body: created };
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
    expect(within(panel).queryByRole('button', { name: 'Log the outcome' })).toBeNull();
    expect(within(panel).queryByRole('link', { name: /work order/ })).toBeNull();
  });

  it('shows nothing on an open case with nothing logged, nor to a coach; a shop gets it with a work-order link', async () => {
    const calls = mockApi({ 'GET /catalog': { status: 200, body: CATALOG }, [READ]: { status: 200, body: { outcomes: [] } } });
    const open = renderPanel(OWNER, aCase('open'));
    await readDone(calls, open.queryClient);
    expect(screen.queryByRole('region', { name: /really fixed it/ })).toBeNull();
    open.unmount();
    const coach = renderPanel(makeUser('coach'), aCase('resolved'));
    await readDone(calls, coach.queryClient);
    expect(screen.queryByRole('region', { name: /really fixed it/ })).toBeNull();
    coach.unmount();
    renderPanel(makeUser('shop'), aCase('open'));
    const panel = screen.getByRole('region', { name: 'Log what really fixed it' });
    expect(await within(panel).findByRole('button', { name: 'Open a work order for it' })).toHaveAttribute('href', '/work-orders/new?caseId=case-1');
    expect(await within(panel).findByRole('button', { name: 'Log the outcome' })).toBeInTheDocument();
  });

  it('shows the racer what the shop logged on their case: causes, fix, parts, minutes, follow-up, and the corrected entry marked', async () => {
    const calls = mockApi({ 'GET /catalog': { status: 200, body: CATALOG }, [READ]: { status: 200, body: { outcomes: [SHOP_FIX, SHOP_FIRST] } } });
    const view = renderPanel(OWNER, aCase('open'));
    const panel = await screen.findByRole('region', { name: 'What really fixed it' });
    await readDone(calls, view.queryClient);
    const current = within(panel).getAllByRole('article')[0];
    await within(current).findByText('Vent lines missing or not routed up + Bowl foam missing, rotten or soaked');
    expect(current).toHaveTextContent('Fixed by: Vent lines fitted and new foam');
    expect(current).toHaveTextContent('Parts: Vent line, foam set · 35 min labour');
    expect(within(current).getByText('Still fixed')).toBeInTheDocument();
    expect(current).toHaveTextContent('Test shop');
    expect(within(current).queryByText('Corrected')).toBeNull();
    // The entry it replaced: under it, marked, no longer counting.
    const corrected = within(panel).getByRole('list', { name: 'Entries it corrects' });
    const old = within(corrected).getByRole('article');
    expect(old).toHaveTextContent('Fuel level too high');
    expect(old).toHaveTextContent('Fixed by: Float height reset');
    expect(within(old).getByText('Corrected')).toBeInTheDocument();
    // Not the racer's to correct, and an open case takes no outcome yet.
    expect(within(panel).queryByRole('button')).toBeNull();
  });

  it('lets a coach the case is shared with read the entries, and nothing more', async () => {
    mockApi({ 'GET /catalog': { status: 200, body: CATALOG }, [READ]: { status: 200, body: { outcomes: [SHOP_FIX, SHOP_FIRST] } } });
    renderPanel(makeUser('coach'), aCase('resolved'));
    const panel = await screen.findByRole('region', { name: 'What really fixed it' });
    expect(await within(panel).findByText('Vent lines missing or not routed up + Bowl foam missing, rotten or soaked')).toBeInTheDocument();
    expect(within(panel).getByText('Corrected')).toBeInTheDocument();
    expect(within(panel).queryByRole('button')).toBeNull();
    expect(within(panel).queryByRole('form')).toBeNull();
  });

  it('offers the racer their own log beside the shop’s entry, then only corrections of their own', async () => {
    let logged: CaseOutcomeDto[] = [SHOP_FIX, SHOP_FIRST];
    const posted: LogOutcomeRequest[] = [];
    mockApi({
      'GET /catalog': { status: 200, body: CATALOG },
      [READ]: () => ({ status: 200, body: { outcomes: logged } }),
      'POST /outcomes': (init) => {
        const body = JSON.parse(String(init.body)) as LogOutcomeRequest;
        posted.push(body);
        const created = outcome({ id: `mine-${posted.length}`, caseId: 'case-1', workOrderId: null, confirmedCauses: body.confirmedCauses, fix: body.fix, supersedesId: body.supersedesId ?? null, loggedByName: OWNER.displayName, at: `2026-11-21T1${posted.length}:00:00.000Z` });
        logged = [{ ...created, yours: true }, ...logged.map((o) => (o.id === body.supersedesId ? { ...o, current: false } : o))];
        return { status: 201, body: created };
      },
    });
    renderPanel(OWNER, aCase('resolved'));
    const user = userEvent.setup();
    const panel = await screen.findByRole('region', { name: 'Log what really fixed it' });
    await within(panel).findByText('Vent lines fitted and new foam');
    // The shop's entry is not the racer's to correct; the racer may log their own.
    expect(within(panel).queryByRole('button', { name: 'Correct this entry' })).toBeNull();
    await user.click(within(panel).getByRole('button', { name: 'Log the outcome' }));
    await user.click(within(panel).getByRole('button', { name: 'Log the outcome' }));
    await waitFor(() => expect(posted).toHaveLength(1));
    // Now one current entry of their own: a correction, not another log.
    const correct = await within(panel).findByRole('button', { name: 'Correct this entry' });
    expect(within(panel).getAllByRole('button', { name: 'Correct this entry' })).toHaveLength(1);
    expect(within(panel).queryByRole('button', { name: 'Log the outcome' })).toBeNull();
    expect(correct.closest('article')).toHaveTextContent(OWNER.displayName);
    await user.click(correct);
    const form = within(panel).getByRole('form', { name: 'Correct this entry' });
    await user.click(within(form).getByRole('checkbox', { name: /^Fuel level too high/ }));
    await user.click(within(form).getByRole('button', { name: 'Save the correction' }));
    await waitFor(() => expect(posted[1]).toMatchObject({ caseId: 'case-1', confirmedCauses: ['foam-degraded', 'fuel-level-high'], supersedesId: 'mine-1' }));
    // Both the shop's and the racer's first entries now show as corrected.
    await waitFor(() => expect(within(panel).getAllByText('Corrected')).toHaveLength(2));
  });
});
