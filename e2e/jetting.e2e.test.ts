import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import type { Browser, Page } from 'playwright-core';
import { computeAir, suggestJets, type JettingSessionDto } from '@fuelwright/shared';
import { DESKTOP, PHONE, POLL, SCREENSHOT_DIR, dismissToasts, launchChromium, newPage, recordOutsideRequests, snap, snapPart, snapTop } from './browser.js';

const RACER = { email: 'racer@fuelwright.test', password: 'fuelwright-demo' };

/** A day before today in the browser's calendar, YYYY-MM-DD. */
function daysAgo(n: number): string {
  const d = new Date(Date.now() - n * 24 * 3600 * 1000);
  const pad = (x: number) => String(x).padStart(2, '0');
  return `${d.getFullYear()}-${pad(d.getMonth() + 1)}-${pad(d.getDate())}`;
}

async function signIn(page: Page, baseUrl: string): Promise<void> {
  await page.goto(`${baseUrl}/sign-in`);
  await page.fill('#sign-in-email', RACER.email);
  await page.fill('#sign-in-password', RACER.password);
  await page.getByRole('form', { name: 'Sign in' }).getByRole('button', { name: 'Sign in' }).click();
  await page.waitForURL(`${baseUrl}/home`);
}

/** Neither the page nor the jetting log scrolls sideways. */
async function expectNoSidewaysScroll(page: Page): Promise<void> {
  const overflow = await page.evaluate(() => {
    const root = document.documentElement;
    const log = document.querySelector('[aria-label="Jetting log"]')?.parentElement;
    return { page: root.scrollWidth - root.clientWidth, log: log ? log.scrollWidth - log.clientWidth : -1 };
  });
  expect(overflow.page).toBeLessThanOrEqual(0);
  expect(overflow.log).toBeGreaterThanOrEqual(-1);
  expect(overflow.log).toBeLessThanOrEqual(0);
}

async function logSession(
  page: Page,
  s: {
    day: string;
    temperature: string;
    humidity: string;
    pressure: string;
    main: string;
    pilot: string;
    ran: 'Rich' | 'Right' | 'Lean';
    plug: string;
    lap?: string;
    /** The id of the setup to pick; without it the form's default (the kart's latest setup) stays. */
    setupId?: string;
    snapAs?: string;
  },
): Promise<void> {
  await page.getByRole('button', { name: 'Log a session' }).click();
  const form = page.getByRole('form', { name: 'Log a session' });
  if (s.setupId) await form.locator('#log-setup').selectOption(s.setupId);
  await form.locator('#log-date').fill(s.day);
  await form.locator('#log-track').fill('Club circuit');
  await form.locator('#log-temperature').fill(s.temperature);
  await form.locator('#log-humidity').fill(s.humidity);
  // The form starts from today's air as entered above (elevation and weather report); these were read on a barometer.
  await form.getByRole('radio', { name: 'Barometer at the track' }).click();
  await form.locator('#log-station-pressure').fill(s.pressure);
  await form.locator('#log-main').fill(s.main);
  await form.locator('#log-pilot').fill(s.pilot);
  await form.getByRole('radio', { name: s.ran, exact: true }).click();
  await form.locator('#log-plug').selectOption(s.plug);
  if (s.lap) await form.locator('#log-lap').fill(s.lap);
  if (s.snapAs) await snapTop(page, s.snapAs);
  await form.getByRole('button', { name: 'Log session' }).click();
  await form.waitFor({ state: 'detached' });
}

async function enterTodaysWeather(page: Page): Promise<void> {
  const form = page.getByRole('form', { name: 'Today’s weather' });
  await form.locator('#today-temperature').fill('39.2'); // °F (the racer switched units): 4 °C
  await form.locator('#today-humidity').fill('70');
  await form.getByRole('radio', { name: 'Elevation + weather report' }).click();
  await form.locator('#today-elevation').fill('394'); // ft: about 120 m
  await form.locator('#today-sea-level-pressure').fill('30.39'); // inHg: about 1029 hPa
  await form.getByRole('button', { name: 'Suggest today’s jets' }).click();
}

describe('jetting in the browser', () => {
  const baseUrl = inject('baseUrl');
  let browser: Browser;
  let kartId: string;
  beforeAll(async () => {
    browser = await launchChromium();
  });
  afterAll(async () => {
    await browser?.close();
  });

  it('a racer logs two sessions, enters today’s weather and sees the suggestion and the chart (390 px)', async () => {
    const { context, page } = await newPage(browser, PHONE, 'dark');
    const outside = recordOutsideRequests(page, baseUrl);
    await signIn(page, baseUrl);
    // A fresh kart, so the log starts empty.
    const created = await page.request.post(`${baseUrl}/api/karts`, {
      data: { name: 'Browser test kart', displacementCc: 125, drive: 'gearbox', carburettorKind: 'pump-around' },
    });
    expect(created.status()).toBe(201);
    kartId = (await created.json()).id;
    // Units: °F, inHg, ft (saved to the racer's preferences).
    expect(
      (await page.request.put(`${baseUrl}/api/me/preferences`, { data: { units: { temperature: 'F', pressure: 'inHg', length: 'ft' } } })).status(),
    ).toBe(200);

    await page.goto(`${baseUrl}/karts/${kartId}/jetting`);
    await page.getByRole('heading', { name: /Jetting: Browser test kart/ }).waitFor();
    await page.getByText(/Nothing logged yet/).waitFor();

    // Without a session that ran right there is no baseline: the page says so.
    await enterTodaysWeather(page);
    await page.getByText('No baseline yet').waitFor();

    // Two setup snapshots of this kart (invented demo values), recorded on the kart's page in real use.
    const setupIds: string[] = [];
    for (const setup of [
      { takenOn: daysAgo(20), mainJet: 182.5, pilotJet: 37.5, needleClipGroove: 2 },
      { takenOn: daysAgo(5), mainJet: 185, pilotJet: 37.5, needleClipGroove: 3 },
    ]) {
      const res = await page.request.post(`${baseUrl}/api/karts/${kartId}/setups`, { data: setup });
      expect(res.status()).toBe(201);
      setupIds.push((await res.json()).id);
    }
    const [olderSetup, latestSetup] = setupIds;
    await page.reload();
    await page.getByRole('heading', { name: /Jetting: Browser test kart/ }).waitFor();

    // Two sessions (°F, inHg as the racer reads them): the first keeps the default setup (the latest),
    // the second, a week before, picks the older one.
    await logSession(page, { day: daysAgo(1), temperature: '57.2', humidity: '60', pressure: '29.80', main: '185', pilot: '37.5', ran: 'Right', plug: 'tan', lap: '54.321' });
    await page.getByRole('button', { name: 'Log a session' }).click();
    const setupSelect = page.getByRole('form', { name: 'Log a session' }).locator('#log-setup');
    expect(await setupSelect.inputValue()).toBe(latestSetup);
    const setupOptions = await setupSelect.locator('option').allTextContents();
    expect(setupOptions[0]).toBe('None');
    expect(setupOptions[1]).toMatch(/ · main 185 · clip 3$/);
    expect(setupOptions[2]).toMatch(/ · main 182\.5 · clip 2$/);
    const [latestDay, olderDay] = [setupOptions[1], setupOptions[2]].map((o) => o.split(' · ')[0]);
    // At 390 px the chosen setup reads whole in the closed select: its text is no wider than the
    // room inside the control (measured in the select's own font).
    const fit = await setupSelect.evaluate((el: HTMLSelectElement) => {
      const style = getComputedStyle(el);
      const context = document.createElement('canvas').getContext('2d')!;
      context.font = `${style.fontWeight} ${style.fontSize} ${style.fontFamily}`;
      const text = el.options[el.selectedIndex].text;
      return { text, width: context.measureText(text).width, room: el.clientWidth - parseFloat(style.paddingLeft) - parseFloat(style.paddingRight) };
    });
    expect(fit.text).toContain('main 185');
    expect(fit.width).toBeLessThanOrEqual(fit.room);
    await page.getByRole('form', { name: 'Log a session' }).getByText(/^The latest setup, .*: main jet 185, clip groove 3 from top\./).waitFor();
    await page.getByRole('form', { name: 'Log a session' }).getByRole('button', { name: 'Cancel' }).click();
    await logSession(page, {
      day: daysAgo(8),
      temperature: '78.8',
      humidity: '40',
      pressure: '29.53',
      main: '182.5',
      pilot: '37.5',
      ran: 'Right',
      plug: 'light-tan',
      setupId: olderSetup,
      snapAs: 'jetting-log-form-phone',
    });
    const rows = page.getByRole('table', { name: 'Jetting log' }).locator('tbody tr');
    await expect.poll(() => rows.count()).toBe(2);
    // Each row says which setup it ran (on a phone: a line under the day, linking to the kart's page).
    await rows.nth(0).getByRole('link', { name: `Setup of ${latestDay}: main jet 185, clip groove 3 from top` }).waitFor();
    await rows.nth(1).getByRole('link', { name: `Setup of ${olderDay}: main jet 182.5, clip groove 2 from top` }).waitFor();
    expect(await rows.nth(1).getByRole('link').getAttribute('href')).toBe(`/karts/${kartId}?setup=${olderSetup}#setups`);
    await expectNoSidewaysScroll(page);
    // The link opens the kart's page at its setups, the one the session ran marked and on screen.
    await rows.nth(1).getByRole('link').click();
    const linked = page.getByRole('list', { name: 'Past setups' }).locator(`li[data-setup-id="${olderSetup}"]`);
    await linked.getByText('Selected').waitFor();
    expect(await linked.getAttribute('aria-current')).toBe('true');
    await expect.poll(() => linked.evaluate((el) => {
      const box = el.getBoundingClientRect();
      return box.top >= 0 && box.top < window.innerHeight;
    }), POLL).toBe(true);
    await dismissToasts(page);
    await page.screenshot({ path: `${SCREENSHOT_DIR}kart-setup-linked-phone.png` });
    await page.goBack();
    await page.getByRole('heading', { name: /Jetting: Browser test kart/ }).waitFor();
    const logged = (await (await page.request.get(`${baseUrl}/api/karts/${kartId}/sessions`)).json()).sessions;
    expect(logged.map((x: { setupId: string | null }) => x.setupId)).toEqual([latestSetup, olderSetup]);

    await enterTodaysWeather(page);
    const result = page.getByRole('region', { name: 'Today’s suggestion' });
    await result.waitFor();

    // The number shown is the metering law's answer (Heywood, Internal Combustion Engine Fundamentals, ch. 7,
    // as suggestJets implements it and shared/src/jetting tests it), from the newest session that ran right.
    const inHg = 33.86388640341;
    const baselineAir = computeAir({ temperatureC: (57.2 - 32) / 1.8, stationPressureHpa: 29.8 * inHg, relativeHumidityPct: 60 });
    const todayAir = computeAir({ temperatureC: (39.2 - 32) / 1.8, altitudeM: 394 * 0.3048, seaLevelPressureHpa: 30.39 * inHg, relativeHumidityPct: 70 });
    const expected = suggestJets({
      baseline: { densityKgM3: baselineAir.densityKgM3, dryAirDensityKgM3: baselineAir.dryAirDensityKgM3, mainJet: 185, pilotJet: 37.5 },
      today: { densityKgM3: todayAir.densityKgM3, dryAirDensityKgM3: todayAir.dryAirDensityKgM3 },
      scaling: 'diameter',
      history: [],
    });
    expect(await result.getByTestId('suggested-main').textContent()).toBe(String(expected.main.suggested));
    // Colder, denser air than the baseline day: a richer (bigger) main jet (same source).
    expect(expected.main.suggested).toBeGreaterThan(185);
    await result.getByText(`Unrounded ${expected.main.unrounded.toFixed(2)}`, { exact: false }).first().waitFor();
    // Cautions come first, as callouts with the word "Caution".
    const firstCallout = result.locator('.fw-caution').first();
    expect(await firstCallout.textContent()).toMatch(/^Caution.*engine off and cool/);
    expect(await result.getByText(/^Confidence: (high|medium|low)$/).count()).toBe(1);
    expect(await result.locator('ol.fw-reasoning li').count()).toBeGreaterThanOrEqual(5);

    // The chart: two sessions, today's star and the suggestion line.
    const chart = page.locator('.fw-jet-chart');
    await chart.locator('.recharts-line').waitFor();
    expect(await chart.locator('.recharts-scatter-symbol').count()).toBe(3);
    expect(await chart.getByRole('list', { name: 'Chart key' }).locator('li').allTextContents()).toEqual([
      'Same mixture as the baseline',
      'Ran right',
      'Today (suggested size)',
    ]);
    await snap(page, 'jetting-phone');
    expect(outside).toEqual([]);
    await context.close();
  });

  it('shows the same screen at desktop width, and the conditions screen to a visitor', async () => {
    const { context, page } = await newPage(browser, DESKTOP, 'light');
    await signIn(page, baseUrl);
    await page.goto(`${baseUrl}/karts/${kartId}/jetting`);
    await enterTodaysWeather(page);
    await page.getByRole('region', { name: 'Today’s suggestion' }).waitFor();
    await page.locator('.fw-jet-chart .recharts-line').waitFor();
    // At desktop width the log has a "Setup used" column with the date and the main jet and clip.
    const log = page.getByRole('table', { name: 'Jetting log' });
    await log.getByRole('columnheader', { name: 'Setup used' }).waitFor();
    expect(await log.locator('tbody tr').nth(1).textContent()).toContain('main jet 182.5, clip groove 2 from top');
    await expectNoSidewaysScroll(page);
    await snap(page, 'jetting-desktop');
    await page.getByRole('button', { name: 'Log a session' }).click();
    const form = page.getByRole('form', { name: 'Log a session' });
    expect(await form.locator('#log-setup option:checked').textContent()).toMatch(/ · main 185 · clip 3$/);
    await snapPart(form, 'jetting-log-form-desktop');
    await form.getByRole('button', { name: 'Cancel' }).click();
    await page.getByText('Jet kit', { exact: true }).click();
    await page.getByRole('form', { name: 'Jet kit' }).waitFor();
    await page.getByRole('form', { name: 'Jet kit' }).scrollIntoViewIfNeeded();
    await snap(page, 'jetting-kit-desktop');
    // Back to the demo racer's default units.
    expect(
      (await page.request.put(`${baseUrl}/api/me/preferences`, { data: { units: { temperature: 'C', pressure: 'hPa', length: 'm' } } })).status(),
    ).toBe(200);

    // The conditions page measures today's air against a logged session: the one of a week ago.
    const karts = (await (await page.request.get(`${baseUrl}/api/karts`)).json()).karts as { id: string }[];
    const allSessions: JettingSessionDto[] = [];
    for (const k of karts) allSessions.push(...(await (await page.request.get(`${baseUrl}/api/karts/${k.id}/sessions`)).json()).sessions);
    const weekAgo = allSessions.find((s) => s.kartId === kartId && s.sessionOn === daysAgo(8))!;
    await page.goto(`${baseUrl}/conditions`);
    const airForm = page.getByRole('form', { name: 'Today’s air' });
    await airForm.locator('#conditions-temperature').fill('20');
    await airForm.locator('#conditions-humidity').fill('50');
    await airForm.locator('#conditions-station-pressure').fill('1013.25');
    await airForm.getByRole('radio', { name: 'Logged session' }).click();
    const picker = airForm.locator('#conditions-reference-session');
    await expect.poll(() => picker.isEnabled(), POLL).toBe(true);
    // Every session of every kart of the racer, those that ran right first, each group newest first.
    const newestFirst = (x: JettingSessionDto, y: JettingSessionDto) => y.sessionOn.localeCompare(x.sessionOn) || y.createdAt.localeCompare(x.createdAt);
    const expectedOrder = [...allSessions.filter((s) => s.ran === 'right').sort(newestFirst), ...allSessions.filter((s) => s.ran !== 'right').sort(newestFirst)];
    expect(await picker.locator('option').evaluateAll((os) => os.map((o) => (o as HTMLOptionElement).value))).toEqual(expectedOrder.map((s) => s.id));
    await picker.selectOption(weekAgo.id);
    await airForm.getByRole('button', { name: 'Work out the air' }).click();
    const used = page.getByTestId('reference-used');
    await used.waitFor();
    expect(await used.textContent()).toMatch(
      new RegExp(`^Relative air density against Browser test kart’s session of .+ \\(ran right\\), ${weekAgo.densityKgM3.toFixed(3)} kg/m³\\.$`),
    );
    // Today's CIPM-2007 density (Picard et al., Metrologia 45 (2008) 149, as computeAir implements it) over the
    // density stored with that session.
    const relative = (100 * computeAir({ temperatureC: 20, stationPressureHpa: 1013.25, relativeHumidityPct: 50 }).densityKgM3) / weekAgo.densityKgM3;
    await page.getByLabel('Air figures').getByText(`${relative.toFixed(1)} %`, { exact: true }).waitFor();
    await snap(page, 'conditions-session-reference-desktop');
    await context.close();

    for (const [name, viewport] of [
      ['conditions-phone', PHONE],
      ['conditions-desktop', DESKTOP],
    ] as const) {
      const visitor = await newPage(browser, viewport, 'light');
      await visitor.page.goto(`${baseUrl}/conditions`);
      const form = visitor.page.getByRole('form', { name: 'Today’s air' });
      await form.locator('#conditions-temperature').fill('20');
      await form.locator('#conditions-humidity').fill('50');
      await form.locator('#conditions-station-pressure').fill('1013.25');
      await form.getByRole('button', { name: 'Work out the air' }).click();
      const figures = visitor.page.getByLabel('Air figures');
      await figures.waitFor();
      // CIPM-2007 at 20 °C, 101 325 Pa, 50 % RH: 1.19931 kg/m³ (computed from Picard et al., Metrologia 45 (2008)
      // 149 in shared/src/air/cipm2007.spec.ts), shown to three decimals.
      await figures.getByText('1.199 kg/m³', { exact: true }).waitFor();
      await visitor.page.getByText('How this is computed', { exact: true }).click();
      await visitor.page.getByText(/CIPM-2007 formula for moist air/).waitFor();
      await snap(visitor.page, name);
      await visitor.context.close();
    }
  });
});
