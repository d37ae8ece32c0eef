/**
 * The quick diagnosis page wired to a fake API: cautions before steps, what is sent to the
 * ranking, the bars with their numbers, a 400 shown under its field, and the place kept in this
 * browser; then a saved case's pages: the hand-over from "Diagnose a kart" to the case's own
 * walk-through, and a place restored in this browser checked against the server before it shows.
 * The catalog and ranking below are neutral plumbing fixtures, not facts of the trade.
 */
import { screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it } from 'vitest';
import type { CaseDto, CatalogResponse, CheckResultValue, KartDto, RankRequest, RankResponse } from '@fuelwright/shared';
import { makeUser, meReply, mockApi, renderApp, type ApiReply } from '../../../test-utils';
import { QUICK_DIAGNOSIS_KEY, caseStorageKey } from '../hooks/walk-through-storage';

const CAUTION = { id: 'k1', severity: 'caution' as const, title: 'Hot parts', text: 'Let them cool first.' };

const CATALOG: CatalogResponse = {
  version: 'test',
  throttleBands: [{ id: 'closed', label: 'Closed band', circuit: 'circuit' }],
  engineTemps: [{ id: 'warm', label: 'Warm engine' }],
  trackPositions: [{ id: 'straight', label: 'Straight' }],
  groups: [{ id: 'outside', label: 'Outside', openingMinutes: 0, steps: [], cautions: [] }],
  symptoms: [{ id: 'sym-1', label: 'Symptom one', description: 'What symptom one looks like.', dimensions: ['where'], cautions: [] }],
  causes: [
    { id: 'cause-x', label: 'Cause X', description: '', prior: 0.1, fixes: [] },
    { id: 'cause-y', label: 'Cause Y', description: '', prior: 0.1, fixes: [] },
  ],
  checks: [
    {
      id: 'check-a',
      label: 'Check A',
      group: 'outside',
      minutes: 2,
      cautions: [CAUTION],
      steps: ['Step one of A.'],
      tools: [],
      record: [],
      faultFoundMeans: 'A is bad.',
      looksFineMeans: 'A is good.',
      tests: [{ cause: 'cause-x', sensitivity: 0.8 }],
      specificity: 0.9,
      stopOnFault: false,
    },
  ],
  fixes: [],
  cautions: [CAUTION],
  somethingElse: { label: 'Something else', prior: 0.1 },
};

function rankReply(results: Record<string, CheckResultValue> = {}): RankResponse {
  const x = results['check-a'] === 'looks-fine' ? 0.2 : 0.6;
  return {
    version: 'test',
    causes: [
      { id: 'cause-x', label: 'Cause X', probability: x, prior: 0.1, logOdds: 0, reasons: [{ kind: 'rule', text: 'Because of symptom one', likelihoodRatio: 3, logOdds: 1.1 }], fixes: [] },
      { id: 'cause-y', label: 'Cause Y', probability: 0.3, prior: 0.1, logOdds: 0, reasons: [], fixes: [] },
    ],
    somethingElse: { label: 'Something else', probability: 0.1 },
    excluded: [],
    plan: 'check-a' in results ? [] : [{ checkId: 'check-a', label: 'Check A', group: 'outside', minutes: 2, openingMinutes: 0, cautions: [CAUTION], findProbability: 0.5, causes: ['cause-x'], safetyFirst: false }],
    expectedMinutes: 2,
    cautions: [],
  };
}

function fakeApi(rank: (body: RankRequest) => ApiReply) {
  return mockApi({
    'GET /auth/me': meReply(null),
    'GET /catalog': { status: 200, body: CATALOG },
    'POST /diagnosis/rank': (init) => rank(JSON.parse(String(init.body)) as RankRequest),
  });
}

async function toRanking(user: ReturnType<typeof userEvent.setup>) {
  await user.click(await screen.findByRole('checkbox', { name: /Symptom one/ }));
  await user.click(screen.getByRole('button', { name: 'Straight' }));
  await user.click(screen.getByRole('radio', { name: /Pump-around slide carburettor/ }));
  await user.click(screen.getByRole('button', { name: 'Show the likely causes' }));
  await screen.findByRole('heading', { name: 'Likely causes' });
}

describe('quick diagnosis page', () => {
  it('ranks what was reported, shows bars with numbers, and the cautions before the steps', async () => {
    const sent: RankRequest[] = [];
    fakeApi((body) => {
      sent.push(body);
      return { status: 200, body: rankReply(body.results) };
    });
    const user = userEvent.setup();
    renderApp('/diagnose');
    await toRanking(user);
    expect(sent[0]).toEqual({ symptoms: [{ id: 'sym-1', where: ['straight'] }], setup: { carburettorKind: 'pump-around' } });

    const causes = screen.getByRole('list', { name: /Likely causes/ });
    expect(within(causes).getByText('60%')).toBeInTheDocument();
    // The bars are drawn for the eye; the number beside each is what is read out.
    expect(within(causes).getAllByRole('progressbar', { hidden: true }).map((bar) => bar.getAttribute('aria-valuenow'))).toEqual(['60', '30']);
    await user.click(within(causes).getByRole('button', { name: 'Why? (1)' }));
    expect(screen.getByText('Because of symptom one')).toBeVisible();

    await user.click(screen.getByRole('button', { name: 'Start with: Check A' }));
    expect(await screen.findByText('Caution: Hot parts')).toBeInTheDocument();
    expect(screen.queryByText('Step one of A.')).toBeNull();
    expect(screen.queryByRole('radio', { name: 'Looks fine' })).toBeNull();
    await user.click(screen.getByRole('button', { name: /I have read the cautions/ }));
    expect(screen.getByText('Step one of A.')).toBeInTheDocument();

    // Recording needs a result first.
    await user.click(screen.getByRole('button', { name: 'Record the result' }));
    expect(screen.getByText('Pick what you found first.')).toBeInTheDocument();
    await user.click(screen.getByRole('radio', { name: 'Looks fine' }));
    await user.type(screen.getByLabelText('Note (optional)'), 'all good');
    await user.click(screen.getByRole('button', { name: 'Record the result' }));
    expect(await screen.findByText('Result recorded')).toBeInTheDocument();
    expect(sent[1].results).toEqual({ 'check-a': 'looks-fine' });
    expect(within(screen.getByRole('list', { name: /Likely causes/ })).getByText('20%')).toBeInTheDocument();
    expect(screen.getByText(/down 40 points/)).toBeInTheDocument();

    // The place is kept in this browser for coming back.
    const stored = JSON.parse(localStorage.getItem(QUICK_DIAGNOSIS_KEY)!) as { snapshot: { value: unknown } };
    expect(stored.snapshot.value).toEqual({ ranking: 'idle' });
  });

  it('asks for a symptom and the carburettor before sending anything', async () => {
    const sent: RankRequest[] = [];
    fakeApi((body) => {
      sent.push(body);
      return { status: 200, body: rankReply() };
    });
    const user = userEvent.setup();
    renderApp('/diagnose');
    await user.click(await screen.findByRole('button', { name: 'Show the likely causes' }));
    expect(screen.getByText('Pick at least one thing the engine does.')).toBeInTheDocument();
    expect(screen.getByText(/Pick the kind of carburettor/)).toBeInTheDocument();
    expect(sent).toHaveLength(0);
  });

  it('shows a 400 from the ranking under the setup field it names', async () => {
    fakeApi(() => ({
      status: 400,
      body: { statusCode: 400, error: 'Bad Request', message: 'Invalid rank request: setup.premixRatio', fields: { 'setup.premixRatio': ['must be at most 100'] } },
    }));
    const user = userEvent.setup();
    renderApp('/diagnose');
    await user.click(await screen.findByRole('checkbox', { name: /Symptom one/ }));
    await user.click(screen.getByRole('radio', { name: /Pump-around slide carburettor/ }));
    await user.click(screen.getByRole('button', { name: 'Show the likely causes' }));
    const premix = await screen.findByLabelText('Premix ratio (fuel to oil)');
    await waitFor(() => expect(premix).toHaveAccessibleDescription('must be at most 100'));
    expect(screen.getByRole('checkbox', { name: /Symptom one/ })).toBeChecked();
  });

  it("sends today's air and the fuel age typed in the closed-by-default section; an impossible humidity is named and blocks the ranking", async () => {
    const sent: RankRequest[] = [];
    fakeApi((body) => {
      sent.push(body);
      return { status: 200, body: rankReply() };
    });
    const user = userEvent.setup();
    renderApp('/diagnose');
    await user.click(await screen.findByRole('checkbox', { name: /Symptom one/ }));
    await user.click(screen.getByRole('radio', { name: /Pump-around slide carburettor/ }));
    // Closed until wanted.
    expect(screen.queryByLabelText('Days since the fuel was mixed')).toBeNull();
    await user.click(screen.getByText("Today's air and fuel (optional)"));
    const today = screen.getByRole('group', { name: 'Today' });
    await user.type(within(today).getByLabelText('Air temperature (°C)'), '12');
    await user.type(within(today).getByLabelText('Relative humidity (%)'), '140');
    await user.type(within(today).getByLabelText('Station pressure (hPa)'), '1002');
    await user.type(screen.getByLabelText('Days since the fuel was mixed'), '35');
    const before = screen.getByRole('group', { name: 'The day the setup was last right' });
    await user.type(within(before).getByLabelText('Air temperature (°C)'), '24');
    await user.type(within(before).getByLabelText('Relative humidity (%)'), '50');
    await user.type(within(before).getByLabelText('Station pressure (hPa)'), '1002');

    await user.click(screen.getByRole('button', { name: 'Show the likely causes' }));
    // Relative humidity is 0 to 100 % of saturation (WMO-No. 8, Guide to Instruments and Methods of Observation).
    const humidity = within(today).getByLabelText('Relative humidity (%)');
    expect(humidity).toHaveAccessibleDescription('Relative humidity today: between 0 and 100 %.');
    expect(sent).toHaveLength(0);
    expect(humidity).toHaveValue('140');
    expect(screen.getByLabelText('Days since the fuel was mixed')).toHaveValue('35');

    await user.clear(humidity);
    await user.type(humidity, '80');
    expect(humidity).not.toHaveAccessibleDescription(/between 0 and 100/);
    // What the app works out, in trade words. Colder air at the same pressure is denser (ideal gas law, from memory).
    expect(screen.getByText(/^The air is [\d.]+ % denser than on the day it ran right$/)).toBeInTheDocument();
    expect(screen.getByText(/Denser air leans the mixture/)).toBeInTheDocument();
    await user.click(screen.getByRole('button', { name: 'Show the likely causes' }));
    await screen.findByRole('heading', { name: 'Likely causes' });
    expect(sent[0].conditions).toMatchObject({
      today: { temperatureC: 12, relativeHumidityPct: 80, stationPressureHpa: 1002 },
      reference: { temperatureC: 24, relativeHumidityPct: 50, stationPressureHpa: 1002 },
      fuelAgeDays: 35,
    });
    expect(sent[0].conditions?.densityChangePct).toBeGreaterThan(0);

    // Kept in this browser: back at the intake after a reload, nothing typed is lost.
    const stored = JSON.parse(localStorage.getItem(QUICK_DIAGNOSIS_KEY)!) as { snapshot: { context: { conditionsDraft: { today: { humidity: string } } } } };
    expect(stored.snapshot.context.conditionsDraft.today.humidity).toBe('80');
  });
});

const AT = '2026-11-20T10:00:00.000Z';
const RACER = makeUser('racer');
const KART: KartDto = {
  id: 'k1',
  ownerId: RACER.id,
  ownerName: RACER.displayName,
  name: 'Blue 27',
  displacementCc: 125,
  drive: 'direct-drive',
  carburettorKind: 'pump-around',
  notes: '',
  createdAt: AT,
  updatedAt: AT,
};
const CASE: CaseDto = {
  id: 'c1',
  kartId: KART.id,
  kartName: KART.name,
  ownerId: RACER.id,
  ownerName: RACER.displayName,
  state: 'open',
  rulesetVersion: 'test',
  symptomIds: ['sym-1'],
  topCauseId: 'cause-x',
  topCauseProbability: 0.6,
  openedAt: AT,
  updatedAt: AT,
  symptoms: [{ id: 'sym-1' }],
  setup: { carburettorKind: 'pump-around' },
  conditions: {},
  results: [],
  rank: rankReply(),
  openingRank: rankReply(),
  resolution: null,
  stop: null,
  abandonedReason: null,
  recommendations: [],
  events: [],
};

/**
 * Every screen each walk-through root shows, in order, roots numbered as they appear. Read from
 * the mutation records (with old values), so a screen drawn and replaced within one task counts.
 */
function watchScreens() {
  const roots = new Map<Element, string[]>();
  const screensOf = (el: Element) => {
    if (!roots.has(el)) roots.set(el, []);
    return roots.get(el)!;
  };
  const note = (el: Element, screen: string | null) => {
    const screens = screensOf(el);
    if (screen !== null && screens.at(-1) !== screen) screens.push(screen);
  };
  const read = (records: MutationRecord[]) => {
    for (const record of records) {
      if (record.type === 'attributes' && (record.target as Element).classList.contains('fw-diag')) {
        note(record.target as Element, record.oldValue);
        note(record.target as Element, (record.target as Element).getAttribute('data-screen'));
      }
      for (const node of record.addedNodes) {
        if (!(node instanceof Element)) continue;
        const added = node.classList.contains('fw-diag') ? [node] : [...node.querySelectorAll('.fw-diag')];
        // Its screen when added is its first attribute change's old value, when there is one.
        for (const el of added) screensOf(el);
      }
    }
  };
  const observer = new MutationObserver(read);
  observer.observe(document.body, { subtree: true, childList: true, attributes: true, attributeOldValue: true, attributeFilter: ['data-screen'] });
  return {
    screens: () => {
      read(observer.takeRecords());
      return [...roots].map(([el, screens]) => (screens.length > 0 ? screens : [el.getAttribute('data-screen') ?? '']));
    },
    stop: () => observer.disconnect(),
  };
}

describe('a case’s walk-through', () => {
  it('hands over from "Diagnose a kart" once the case is open, and shows a restored place only as the server has it', async () => {
    const caseReads: string[] = [];
    mockApi({
      'GET /auth/me': meReply(RACER),
      'GET /catalog': { status: 200, body: CATALOG },
      'GET /karts': { status: 200, body: { karts: [KART] } },
      'GET /karts/k1/setups': { status: 200, body: { setups: [] } },
      'POST /cases': { status: 201, body: CASE },
      'GET /cases/c1': () => {
        caseReads.push('c1');
        return { status: 200, body: CASE };
      },
    });
    const user = userEvent.setup();
    const watch = watchScreens();
    const { router, unmount } = renderApp('/diagnose/new?kartId=k1');
    await user.click(await screen.findByRole('checkbox', { name: /Symptom one/ }));
    await user.click(screen.getByRole('button', { name: 'Open the case and rank the causes' }));
    await waitFor(() => expect(router.state.location.pathname).toBe('/cases/c1/walk-through'));
    await screen.findByRole('button', { name: 'Start with: Check A' });
    // The intake's own walk-through never showed its ranking: nothing could be done in it after the
    // case was open. The case's walk-through showed its place once the server's case was in.
    expect(watch.screens()).toEqual([
      ['intake', 'loading'],
      ['loading', 'ranking'],
    ]);
    expect(caseReads).toHaveLength(1);

    await user.click(screen.getByRole('button', { name: 'Start with: Check A' }));
    expect(await screen.findByText('Caution: Hot parts')).toBeInTheDocument();
    const stored = JSON.parse(localStorage.getItem(caseStorageKey('c1'))!) as { snapshot: { value: unknown } };
    expect(stored.snapshot.value).toEqual({ check: 'cautions' });
    unmount();
    watch.stop();

    // Coming back: the stored place shows only after the server's case has been read again.
    const again = watchScreens();
    renderApp('/cases/c1/walk-through');
    expect(await screen.findByText('Caution: Hot parts')).toBeInTheDocument();
    expect(again.screens()).toEqual([['loading', 'check']]);
    expect(caseReads).toHaveLength(2);
    expect(screen.queryByText('Step one of A.')).toBeNull();
    await user.click(screen.getByRole('button', { name: /I have read the cautions/ }));
    expect(screen.getByText('Step one of A.')).toBeInTheDocument();
    again.stop();
  });
});

describe('correcting an open case’s setup and the day’s air', () => {
  it('prefills from the case, names a bad main jet before sending, shows a 400 under its field with the value kept, then ranks again', async () => {
    const opened: CaseDto = { ...CASE, setup: { carburettorKind: 'pump-around', mainJet: 180 }, conditions: { fuelAgeDays: 3 } };
    const sent: unknown[] = [];
    let answer400 = true;
    mockApi({
      'GET /auth/me': meReply(RACER),
      'GET /catalog': { status: 200, body: CATALOG },
      'GET /karts/k1/sessions': { status: 200, body: { sessions: [] } },
      'GET /me/preferences': { status: 200, body: { units: { temperature: 'C', pressure: 'hPa', length: 'm' } } },
      'GET /cases/c1': { status: 200, body: opened },
      'PUT /cases/c1/facts': (init) => {
        const body = JSON.parse(String(init.body)) as { setup: CaseDto['setup'] };
        sent.push(body);
        if (answer400) {
          answer400 = false;
          return { status: 400, body: { statusCode: 400, error: 'Bad Request', message: 'Some details were not accepted', fields: { 'setup.mainJet': ['mainJet is not a size this ruleset knows'] } } };
        }
        const rank = rankReply();
        rank.causes = rank.causes.map((c) => ({ ...c, probability: c.id === 'cause-y' ? 0.7 : 0.2 }));
        return { status: 200, body: { ...opened, setup: { ...body.setup, carburettorKind: 'pump-around' }, rank } };
      },
    });
    const user = userEvent.setup();
    renderApp('/cases/c1/walk-through');
    await user.click(await screen.findByRole('button', { name: "Correct the setup or today's air" }));

    const mainJet = await screen.findByLabelText('Main jet');
    expect(mainJet).toHaveValue('180');
    // The day's air section opens on what the case holds.
    expect(screen.getByLabelText('Days since the fuel was mixed')).toHaveValue('3');

    await user.clear(mainJet);
    await user.type(mainJet, '5');
    await user.click(screen.getByRole('button', { name: 'Save and rank again' }));
    expect(screen.getByText(/^Main jet: between/)).toBeInTheDocument();
    expect(sent).toHaveLength(0);

    await user.clear(mainJet);
    await user.type(mainJet, '205');
    await user.click(screen.getByRole('button', { name: 'Save and rank again' }));
    expect(await screen.findByText('mainJet is not a size this ruleset knows')).toBeInTheDocument();
    expect(screen.getByLabelText('Main jet')).toHaveValue('205');
    // Only the setup changed: the day's air is not sent, so it stays as recorded.
    expect(sent).toEqual([{ setup: { mainJet: 205, carburettorKind: 'pump-around' } }]);

    await user.click(screen.getByRole('button', { name: 'Save and rank again' }));
    const causes = await screen.findByRole('list', { name: /Likely causes/ });
    expect(within(causes).getByText('70%')).toBeInTheDocument();
    expect(screen.getByText('Setup and air corrected')).toBeInTheDocument();
    expect(sent).toHaveLength(2);
  });
});
