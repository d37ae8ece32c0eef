import { fireEvent, screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it } from 'vitest';
import { makeUser, meReply, mockApi, renderApp, setPhoneWidth } from '../../../test-utils';
import { CASE_SUMMARIES, CATALOG, KARTS, OPEN_CASE } from '../test-support/case-fixtures';

const racer = makeUser('racer', { id: 'u', displayName: 'Test racer' });

function api(extra: Record<string, { status: number; body?: unknown }> = {}) {
  return mockApi({
    'GET /auth/me': meReply(racer),
    'GET /catalog': { status: 200, body: CATALOG },
    'GET /karts': { status: 200, body: { karts: KARTS } },
    'GET /cases': { status: 200, body: { cases: CASE_SUMMARIES } },
    'GET /cases?state=open': { status: 200, body: { cases: CASE_SUMMARIES.filter((c) => c.state === 'open') } },
    'GET /cases?state=open&kartId=k2': { status: 200, body: { cases: [] } },
    ...extra,
  });
}

const rowIds = () => [...document.querySelectorAll('tbody tr')].map((tr) => tr.getAttribute('data-case-id'));

describe('case list', () => {
  it('shows each case with its kart, labelled top cause, probability and state, and sorts by a column', async () => {
    setPhoneWidth(false);
    api();
    const user = userEvent.setup();
    renderApp('/cases');
    const table = await screen.findByRole('table', { name: 'Your cases' });
    await within(table).findByText('Bowl foam missing, rotten or soaked');
    // Last change first by default.
    expect(rowIds()).toEqual(['c-abandoned', 'c-open']);
    const open = within(table).getByRole('link', { name: 'Bogs when you open the throttle + 1 more' });
    expect(open).toHaveAttribute('href', '/cases/c-open');
    expect(within(open.closest('tr')!).getByText('48%')).toBeInTheDocument();
    expect(within(open.closest('tr')!).getByText('Open')).toBeInTheDocument();

    await user.click(screen.getByRole('button', { name: 'Sort by kart' }));
    expect(rowIds()).toEqual(['c-open', 'c-abandoned']);
    expect(screen.getByRole('button', { name: 'Sort by kart' }).closest('th')).toHaveAttribute('aria-sort', 'ascending');
    await user.click(screen.getByRole('button', { name: 'Sort by kart' }));
    expect(rowIds()).toEqual(['c-abandoned', 'c-open']);
    expect(screen.getByRole('button', { name: 'Sort by kart' }).closest('th')).toHaveAttribute('aria-sort', 'descending');
  });

  it('filters by state and kart on the server and says when nothing matches', async () => {
    setPhoneWidth(false);
    const calls = api();
    const user = userEvent.setup();
    const { router } = renderApp('/cases');
    await screen.findByRole('table', { name: 'Your cases' });

    await user.selectOptions(screen.getByLabelText('State'), 'open');
    await waitFor(() => expect(rowIds()).toEqual(['c-open']));
    expect(calls.some((c) => c.path === '/cases?state=open')).toBe(true);
    expect(router.state.location.search).toBe('?state=open');

    await user.selectOptions(screen.getByLabelText('Kart'), 'k2');
    expect(await screen.findByText('No cases match')).toBeInTheDocument();
    await user.click(screen.getByRole('button', { name: 'Show all cases' }));
    await waitFor(() => expect(rowIds()).toEqual(['c-abandoned', 'c-open']));
  });

  it('filters by top cause with the causes in the list, labelled from the catalog, kept in the address', async () => {
    setPhoneWidth(false);
    const calls = api();
    const user = userEvent.setup();
    const { router } = renderApp('/cases');
    await screen.findByRole('table', { name: 'Your cases' });
    const select = screen.getByLabelText('Top cause') as HTMLSelectElement;
    await waitFor(() => expect([...select.options].map((o) => o.text)).toContain('Idle screw holds the slide open'));
    // Only the two causes the cases hold, by label; not the whole catalog.
    expect([...select.options].map((o) => [o.value, o.text])).toEqual([
      ['', 'All top causes'],
      ['foam-degraded', 'Bowl foam missing, rotten or soaked'],
      ['idle-screw-set', 'Idle screw holds the slide open'],
    ]);

    await user.selectOptions(select, 'idle-screw-set');
    await waitFor(() => expect(rowIds()).toEqual(['c-abandoned']));
    expect(router.state.location.search).toBe('?cause=idle-screw-set');
    expect(screen.getByText('1 of 2 cases')).toBeInTheDocument();
    // Filtered in the page: the server was never asked for a cause.
    expect(calls.every((c) => !c.path.includes('cause'))).toBe(true);

    await user.click(screen.getByRole('button', { name: 'Clear filters' }));
    await waitFor(() => expect(rowIds()).toEqual(['c-abandoned', 'c-open']));
    expect(router.state.location.search).toBe('');
  });

  it('filters by the day a case was opened, from the address on load, and offers to clear when nothing matches', async () => {
    setPhoneWidth(false);
    api();
    const user = userEvent.setup();
    // As after a reload: the period comes from the address.
    const { router } = renderApp('/cases?from=2026-11-15&sort=kart');
    await screen.findByRole('table', { name: 'Your cases' });
    expect(rowIds()).toEqual(['c-open']);
    const period = screen.getByRole('group', { name: 'Period' });
    expect(within(period).getByLabelText('From')).toHaveValue('2026-11-15');
    expect(within(period).queryByLabelText('Ruleset version')).toBeNull();

    // The last day is included: a case opened on 20 November is in "to 20 November".
    fireEvent.change(within(period).getByLabelText('To (included)'), { target: { value: '2026-11-20' } });
    await waitFor(() => expect(router.state.location.search).toBe('?from=2026-11-15&sort=kart&to=2026-11-20'));
    expect(rowIds()).toEqual(['c-open']);

    fireEvent.change(within(period).getByLabelText('To (included)'), { target: { value: '2026-11-16' } });
    expect(await screen.findByText('No cases match')).toBeInTheDocument();
    expect(screen.getByText(/No case has opened .* to .*\. Change the filters/)).toBeInTheDocument();
    await user.click(screen.getByRole('button', { name: 'Show all cases' }));
    await waitFor(() => expect(rowIds()).toEqual(['c-open', 'c-abandoned']));
    // The order is not a filter: it stays.
    expect(router.state.location.search).toBe('?sort=kart');
  });

  it('shows no filters while there is no case at all', async () => {
    setPhoneWidth(true);
    api({ 'GET /cases': { status: 200, body: { cases: [] } } });
    renderApp('/cases');
    expect(await screen.findByText('No cases yet')).toBeInTheDocument();
    expect(screen.queryByRole('search', { name: 'Filter cases' })).toBeNull();
    expect(screen.getByRole('button', { name: 'Go to my karts' })).toHaveAttribute('href', '/karts');
  });

  it('shows cards with a sort control on a phone', async () => {
    setPhoneWidth(true);
    api();
    const user = userEvent.setup();
    renderApp('/cases');
    const cards = await screen.findByRole('list', { name: 'Your cases' });
    expect(screen.queryByRole('table')).not.toBeInTheDocument();
    await within(cards).findByText('Idle screw holds the slide open');
    await user.selectOptions(screen.getByLabelText('Sort by'), 'probability');
    const links = within(cards).getAllByRole('link').map((a) => a.getAttribute('href'));
    expect(links).toEqual(['/cases/c-abandoned', '/cases/c-open']);
  });

  it('folds the filters behind a button on a phone, counting the ones set, with the sort in view', async () => {
    setPhoneWidth(true);
    api();
    const user = userEvent.setup();
    const { router } = renderApp('/cases');
    await screen.findByRole('list', { name: 'Your cases' });
    // No filter set: closed, the sort control still there.
    const toggle = screen.getByRole('button', { name: 'Filters' });
    expect(toggle).toHaveAttribute('aria-expanded', 'false');
    expect(screen.queryByLabelText('State')).toBeNull();
    expect(screen.getByLabelText('Sort by')).toBeInTheDocument();

    await user.click(toggle);
    expect(toggle).toHaveAttribute('aria-expanded', 'true');
    await user.selectOptions(screen.getByLabelText('State'), 'open');
    await waitFor(() => expect(router.state.location.search).toBe('?state=open'));
    expect(await screen.findByRole('button', { name: 'Filters · 1' })).toHaveAttribute('aria-expanded', 'true');

    await user.click(screen.getByRole('button', { name: 'Filters · 1' }));
    expect(screen.queryByLabelText('State')).toBeNull();
    expect(screen.getByLabelText('Sort by')).toBeInTheDocument();
  });

  it('opens the filters on a phone when the address already sets some', async () => {
    setPhoneWidth(true);
    api();
    renderApp('/cases?state=open&cause=foam-degraded');
    const toggle = await screen.findByRole('button', { name: 'Filters · 2' });
    expect(toggle).toHaveAttribute('aria-expanded', 'true');
    expect((screen.getByLabelText('State') as HTMLSelectElement).value).toBe('open');
  });

  it('shows the filters without a button on a wide screen', async () => {
    setPhoneWidth(false);
    api();
    renderApp('/cases');
    await screen.findByRole('table', { name: 'Your cases' });
    expect(screen.getByLabelText('State')).toBeInTheDocument();
    expect(screen.queryByRole('button', { name: /^Filters/ })).toBeNull();
  });
});

describe('case page', () => {
  it('shows the symptoms with where they show, the ranking with numbers and reasons, the checks and the timeline', async () => {
    setPhoneWidth(false);
    api({ 'GET /cases/c-open': { status: 200, body: OPEN_CASE } });
    renderApp('/cases/c-open');
    expect(await screen.findByRole('heading', { name: 'Case on Blue 27' })).toBeInTheDocument();

    const symptoms = screen.getByRole('region', { name: 'Symptoms' });
    await within(symptoms).findByText('Bogs when you open the throttle');
    for (const detail of ['1/4 to 3/4 throttle', 'Warm engine', 'Corner exit']) expect(within(symptoms).getByText(detail)).toBeInTheDocument();

    const ranking = screen.getByRole('region', { name: 'Likely causes now' });
    expect(within(ranking).getByText('91%')).toBeInTheDocument();
    expect(within(ranking).getByText('The foam was found rotten')).toBeInTheDocument();

    const checks = screen.getByRole('region', { name: 'Checks done' });
    expect(within(checks).getByText('Look at the bowl foam')).toBeInTheDocument();
    expect(within(checks).getByText('Fault found')).toBeInTheDocument();
    expect(within(checks).getByText('“foam crumbles”')).toBeInTheDocument();

    const setup = screen.getByRole('region', { name: 'Setup at the time' });
    expect(within(setup).getByText('Groove 3 from the top')).toBeInTheDocument();
    expect(within(setup).getByText('32:1')).toBeInTheDocument();
    const conditions = screen.getByRole('region', { name: 'Conditions' });
    expect(within(conditions).getByText(/4.2% denser air/)).toBeInTheDocument();

    const timeline = screen.getByRole('list', { name: 'Timeline' });
    const events = within(timeline).getAllByRole('listitem').filter((li) => li.hasAttribute('data-event-type'));
    expect(events.map((e) => e.getAttribute('data-event-type'))).toEqual(['opened', 'check-recorded']);
    expect(events[1]).toHaveTextContent('“Look at the bowl foam”: Fault found (foam crumbles)');
    expect(events[1]).toHaveTextContent('Test racer');
    expect(events[1]).toHaveTextContent('Bowl foam missing, rotten or soaked 91%');
    expect(screen.getByText(/ruleset version/)).toHaveTextContent('1.0.0');

    expect(screen.getByRole('button', { name: 'Continue the walk-through' })).toHaveAttribute('href', '/cases/c-open/walk-through');
  });

  it('abandons an open case with a reason', async () => {
    setPhoneWidth(false);
    const abandoned = {
      ...OPEN_CASE,
      state: 'abandoned',
      abandonedReason: 'Went away after a clean',
      events: [
        ...OPEN_CASE.events,
        { seq: 3, type: 'abandoned', at: '2026-11-21T08:00:00.000Z', actorId: 'u', actorName: 'Test racer', summary: 'Abandoned: Went away after a clean', payload: {} },
      ],
    };
    let current: unknown = OPEN_CASE;
    const posted: unknown[] = [];
    mockApi({
      'GET /auth/me': meReply(racer),
      'GET /catalog': { status: 200, body: CATALOG },
      'GET /cases/c-open': () => ({ status: 200, body: current }),
      'POST /cases/c-open/abandon': (init) => {
        posted.push(JSON.parse(String(init.body)));
        current = abandoned;
        return { status: 200, body: abandoned };
      },
    });
    const user = userEvent.setup();
    renderApp('/cases/c-open');
    await user.click(await screen.findByRole('button', { name: 'Abandon' }));
    const dialog = await screen.findByRole('dialog');
    await user.type(within(dialog).getByLabelText('Why (optional)'), 'Went away after a clean');
    await user.click(within(dialog).getByRole('button', { name: 'Abandon case' }));

    expect(await screen.findByRole('heading', { name: 'Abandoned' })).toBeInTheDocument();
    expect(posted).toEqual([{ reason: 'Went away after a clean' }]);
    await waitFor(() => expect(screen.queryByRole('dialog')).not.toBeInTheDocument());
    expect(screen.getByText('Went away after a clean')).toBeInTheDocument();
    expect(screen.queryByRole('button', { name: 'Continue the walk-through' })).not.toBeInTheDocument();
  });

  it('says so when the case is not found', async () => {
    setPhoneWidth(false);
    api({ 'GET /cases/nope': { status: 404, body: { statusCode: 404, error: 'Not Found', message: 'Case not found' } } });
    renderApp('/cases/nope');
    expect(await screen.findByText('Case not found')).toBeInTheDocument();
    expect(screen.getByRole('button', { name: 'Back to cases' })).toHaveAttribute('href', '/cases');
    // A racer may have had the case shared with it and lost access: the shared list is offered too.
    expect(screen.getByRole('button', { name: 'Back to shared cases' })).toHaveAttribute('href', '/shared-cases');
  });
});
