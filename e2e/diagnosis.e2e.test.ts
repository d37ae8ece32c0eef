/**
 * The guided walk-through in a real browser: a visitor's quick diagnosis on a phone (cautions
 * first, two results, the ranking changes, leave and come back, a stop), saving it after sign-up,
 * and the demo racer's case on "Blue 27" from intake to resolved (its main jet corrected on the way,
 * seen in the case's timeline), found again in the case list.
 * Screenshots of every main screen at phone and desktop width go to screenshots/ (git-ignored).
 */
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import type { Browser, Locator, Page } from 'playwright-core';
import type { CatalogResponse, CaseDto } from '@fuelwright/shared';
import { DESKTOP, PHONE, apiFromPage, launchChromium, newPage, recordOutsideRequests, signInWithForm, snap as snapPage } from './browser.js';

const RACER = 'racer@fuelwright.test';
/** expect.poll and waits: a loaded machine needs longer than the defaults. */
const WAIT = { timeout: 20_000 };
const RUN = Date.now().toString(36).slice(-5);

/** A full-page screenshot from the top (the sticky navbar is drawn where the page is scrolled to). */
async function snap(page: Page, name: string): Promise<void> {
  await page.evaluate(() => window.scrollTo(0, 0));
  await snapPage(page, name);
}

/**
 * The same screen at desktop width too: the page is widened, captured as `name`, and put back to
 * the phone's size (the layout follows the width, so the walk-through's place is kept).
 */
async function snapDesktopToo(page: Page, name: string): Promise<void> {
  await page.setViewportSize(DESKTOP);
  await page.waitForFunction((w) => window.innerWidth === w, DESKTOP.width);
  // Two frames: the layout and the width queries have answered before the capture.
  await page.evaluate(() => new Promise((done) => requestAnimationFrame(() => requestAnimationFrame(done))));
  await snap(page, name);
  await page.setViewportSize(PHONE);
  await page.waitForFunction((w) => window.innerWidth === w, PHONE.width);
}

/** Waits until the element shows (vitest's expect has no browser matchers). */
async function visible(locator: Locator): Promise<void> {
  await locator.first().waitFor({ state: 'visible', ...WAIT });
}

/** The screen the walk-through shows, and the machine's state (data attributes on its root). */
async function screenOf(page: Page): Promise<{ screen: string | null; state: unknown }> {
  const root = page.locator('.fw-diag');
  const state = await root.getAttribute('data-state');
  return { screen: await root.getAttribute('data-screen'), state: state ? JSON.parse(state) : null };
}

async function waitForScreen(page: Page, screen: string): Promise<void> {
  await page.locator(`.fw-diag[data-screen="${screen}"]`).waitFor(WAIT);
}

/** Every cause with its probability as shown (all causes listed). */
async function shownCauses(page: Page): Promise<Map<string, number>> {
  const all = page.getByRole('button', { name: /^Show all \d+ causes$/ });
  if (await all.count()) await all.click();
  const rows = await page.locator('[data-cause]').evaluateAll((els) =>
    els.map((el) => [el.getAttribute('data-cause')!, Number(el.getAttribute('data-probability'))] as const),
  );
  return new Map(rows);
}

async function pickSymptom(page: Page, id: string): Promise<void> {
  await page.locator(`[data-symptom="${id}"] label`).first().click();
}

/**
 * Whether a check's cautions are read before its steps: it has cautions of its own, or it opens a
 * group (anything but "outside") that has some (the rule the walk-through applies, in
 * ui/src/features/diagnosis/components/caution-check-ids.ts).
 */
function cautionsFirst(catalog: CatalogResponse, checkId: string): boolean {
  const check = catalog.checks.find((c) => c.id === checkId);
  expect(check, `check ${checkId} in the catalog`).toBeDefined();
  const group = catalog.groups.find((g) => g.id === check!.group);
  return check!.cautions.length > 0 || (check!.group !== 'outside' && (group?.cautions.length ?? 0) > 0);
}

/**
 * The check on screen (one not opened before), its cautions acknowledged when it shows them first;
 * answers whether it did. Decides only once the check has settled on its cautions or its steps (a
 * screen in passing, e.g. while the case is read again from the server, says neither), and checks
 * that the cautions showed exactly when the catalog gives the check some.
 */
async function openCheck(page: Page, catalog: CatalogResponse): Promise<{ checkId: string; hadCautions: boolean }> {
  await waitForScreen(page, 'check');
  const cautions = page.getByRole('heading', { name: /Before you start/ });
  const steps = page.getByRole('heading', { name: 'Steps', exact: true });
  await visible(cautions.or(steps));
  const checkId = (await page.locator('.fw-diag-step[data-check]').getAttribute('data-check'))!;
  const hadCautions = (await cautions.count()) > 0;
  expect(hadCautions, `cautions first for ${checkId}`).toBe(cautionsFirst(catalog, checkId));
  expect((await screenOf(page)).state).toEqual({ check: hadCautions ? 'cautions' : 'steps' });
  if (hadCautions) {
    // Cautions first: neither the steps nor the result buttons are there yet.
    expect(await steps.count()).toBe(0);
    expect(await page.getByRole('radio', { name: 'Looks fine' }).count()).toBe(0);
    await page.getByRole('button', { name: /I have read the cautions/ }).click();
  }
  await visible(steps);
  return { checkId, hadCautions };
}

async function record(page: Page, result: 'Fault found' | 'Looks fine' | 'Could not check', note?: string): Promise<void> {
  await page.getByRole('radio', { name: result }).click();
  if (note) await page.getByLabel('Note (optional)').fill(note);
  await page.getByRole('button', { name: /^Record (the result|again)$/ }).click();
}

/**
 * A visitor's quick diagnosis: bogging plus sporadic running on a pump-around carburettor, two
 * checks recorded (at least one of them behind cautions), then leave mid-check and come back.
 * Screenshots named `<tag>-...`.
 */
async function quickDiagnosis(page: Page, baseUrl: string, tag: string, catalog: CatalogResponse) {
  await page.goto(`${baseUrl}/diagnose`);
  await waitForScreen(page, 'intake');
  await pickSymptom(page, 'bog-on-acceleration');
  await page.locator('[data-symptom="bog-on-acceleration"]').getByRole('button', { name: 'Corner exit' }).click();
  await pickSymptom(page, 'sporadic-running');
  await page.getByText('Pump-around slide carburettor', { exact: true }).click();
  await snap(page, `${tag}-01-intake`);
  await page.getByRole('button', { name: 'Show the likely causes' }).click();
  await waitForScreen(page, 'ranking');
  await snap(page, `${tag}-02-ranking`);
  const before = await shownCauses(page);
  expect(before.size).toBeGreaterThan(3);

  // Two checks; the first one in the plan handles the throttle and carries cautions.
  const recorded: string[] = [];
  let sawCautions = false;
  for (let i = 0; i < 2; i++) {
    await page.getByRole('button', { name: /^(Start with|Next check):/ }).click();
    await waitForScreen(page, 'check');
    if (i === 0) await snap(page, `${tag}-03-check-cautions`);
    const { checkId, hadCautions } = await openCheck(page, catalog);
    sawCautions ||= hadCautions;
    if (i === 0) await snap(page, `${tag}-04-check-steps`);
    await record(page, 'Looks fine', i === 0 ? 'all as it should be' : undefined);
    await waitForScreen(page, 'ranking');
    await visible(page.getByText('Result recorded'));
    recorded.push(checkId);
  }
  expect(sawCautions).toBe(true);
  await snap(page, `${tag}-05-reranked`);

  // The ranking changed: the recorded checks left the plan, and each one's most-tested cause fell.
  const after = await shownCauses(page);
  const changed = [...before].filter(([id, p]) => Math.abs((after.get(id) ?? 0) - p) >= 0.005);
  expect(changed.length).toBeGreaterThan(0);
  for (const checkId of recorded) {
    expect(await page.locator(`.fw-diag-plan [data-check="${checkId}"]`).count()).toBe(0);
    const check = catalog.checks.find((c) => c.id === checkId)!;
    const tested = [...check.tests].sort((a, b) => b.sensitivity - a.sensitivity)[0];
    // Bayes' rule (PRODUCT.md, "How a diagnosis works"): a "looks fine" on a check that can find a
    // cause (sensitivity > 0) lowers that cause's probability.
    if (tested && before.has(tested.cause)) expect(after.get(tested.cause)!).toBeLessThan(before.get(tested.cause)!);
  }
  return { recorded };
}

/**
 * Today's air and the fuel age in a visitor's quick diagnosis: the closed section opened, today
 * hot and the day it ran right cold at the same pressure (thinner air today), the fuel mixed 40
 * days ago, a rich blubber; the ranking's reasons then name the air and the fuel's age.
 * Screenshots named `<tag>-...`.
 */
async function airAndFuel(page: Page, baseUrl: string, tag: string): Promise<void> {
  await page.goto(`${baseUrl}/diagnose`);
  await waitForScreen(page, 'intake');
  await pickSymptom(page, 'rich-blubber');
  await page.getByText('Pump-around slide carburettor', { exact: true }).click();
  const fuelAge = page.getByLabel('Days since the fuel was mixed');
  expect(await fuelAge.count(), 'the section starts closed').toBe(0);
  await page.getByText("Today's air and fuel (optional)").click();
  const today = page.getByRole('group', { name: 'Today', exact: true });
  await today.getByLabel('Air temperature (°C)').fill('32');
  await today.getByLabel('Relative humidity (%)').fill('60');
  await today.getByLabel('Station pressure (hPa)').fill('1000');
  await fuelAge.fill('40');
  const then = page.getByRole('group', { name: 'The day the setup was last right' });
  await then.getByLabel('Air temperature (°C)').fill('8');
  await then.getByLabel('Relative humidity (%)').fill('60');
  await then.getByLabel('Station pressure (hPa)').fill('1000');
  // 24 °C warmer at the same pressure: about 8 % thinner air (ideal gas law, density ∝ p/T; from memory),
  // and thinner air richens the mixture (common practice, no published source).
  const readout = page.locator('.fw-diag-air-readout');
  await expect.poll(() => readout.innerText(), WAIT).toMatch(/The air is [\d.]+ % thinner than on the day it ran right/);
  await expect.poll(() => readout.innerText(), WAIT).toContain('Thinner air richens the mixture');
  await snap(page, `${tag}-01-intake`);

  await page.getByRole('button', { name: 'Show the likely causes' }).click();
  await waitForScreen(page, 'ranking');
  await shownCauses(page);
  // The rules that fire on a density change of -3 % or more and on fuel 30 days old or more
  // (rules/src/rulesets/1.0.1/rules/jetting-and-air.json, fuel-supply.json).
  const air = page.locator('[data-cause="air-density-changed"]');
  await air.getByRole('button', { name: /^Why\? \(\d+\)$/ }).click();
  await expect.poll(() => air.locator('.fw-diag-reasons').innerText(), WAIT).toMatch(/thinner than when the jetting was right; thinner air richens the mixture/);
  const fuel = page.locator('[data-cause="water-or-stale-fuel"]');
  await fuel.getByRole('button', { name: /^Why\? \(\d+\)$/ }).click();
  await expect.poll(() => fuel.locator('.fw-diag-reasons').innerText(), WAIT).toContain('The fuel was mixed more than a month ago');
  await air.scrollIntoViewIfNeeded();
  await snap(page, `${tag}-02-ranking`);
}

describe('the guided walk-through in the browser', () => {
  const baseUrl = inject('baseUrl');
  let browser: Browser;
  let catalog: CatalogResponse;

  beforeAll(async () => {
    browser = await launchChromium();
    catalog = (await (await fetch(`${baseUrl}/api/catalog`)).json()) as CatalogResponse;
  });
  afterAll(async () => {
    await browser?.close();
  });

  it('a visitor on a phone: cautions first, two results change the ranking, leave and come back, a stop ends it', async () => {
    const { context, page } = await newPage(browser, PHONE, 'light');
    const outside = recordOutsideRequests(page, baseUrl);
    try {
      const { recorded } = await quickDiagnosis(page, baseUrl, 'diagnosis-phone', catalog);

      // Leave in the middle of a check (cautions acknowledged) and come back: the same place.
      await page.getByRole('button', { name: /^Next check:/ }).click();
      const { checkId: leftOn } = await openCheck(page, catalog);
      await page.getByRole('radio', { name: 'Could not check' }).click();
      await page.goto(`${baseUrl}/conditions`);
      await page.goto(`${baseUrl}/diagnose`);
      await waitForScreen(page, 'check');
      expect((await screenOf(page)).state).toEqual({ check: 'steps' });
      expect(await page.locator('.fw-diag-step[data-check]').getAttribute('data-check')).toBe(leftOn);

      // Back goes to the previous check with its result; recording again replaces it.
      await page.getByRole('button', { name: 'Back', exact: true }).click();
      await expect.poll(() => page.locator('.fw-diag-step[data-check]').getAttribute('data-check'), WAIT).toBe(recorded[1]);
      await visible(page.getByText('Recorded earlier:'));
      await record(page, 'Could not check');
      await waitForScreen(page, 'ranking');
      await expect.poll(() => page.locator('.fw-diag-last').innerText(), WAIT).toContain('Could not check');

      // Skip moves the next check to the end of the plan for now.
      const next = await page.locator('.fw-diag-plan [data-check]').first().getAttribute('data-check');
      await page.getByRole('button', { name: /^Next check:/ }).click();
      await waitForScreen(page, 'check');
      await page.getByRole('button', { name: 'Skip for now' }).click();
      await expect.poll(() => page.locator('.fw-diag-step[data-check]').getAttribute('data-check'), WAIT).not.toBe(next);
      await page.getByRole('button', { name: 'See the causes' }).click();
      await waitForScreen(page, 'ranking');
      const skippedLabel = catalog.checks.find((c) => c.id === next)!.label;
      await expect.poll(() => page.locator('.fw-diag-skipped-note').innerText(), WAIT).toContain(skippedLabel);
      await page.getByRole('button', { name: /^Show all \d+ checks$/ }).click();
      await expect.poll(() => page.locator(`.fw-diag-plan [data-check="${next}"]`).innerText(), WAIT).toContain('Skipped for now');
      // ...at the end of the plan.
      expect(await page.locator('.fw-diag-plan [data-check]').last().getAttribute('data-check')).toBe(next);

      // Finish: the summary lists every check.
      await page.getByRole('button', { name: 'Finish without a fix' }).click();
      await waitForScreen(page, 'summary');
      await snap(page, 'diagnosis-phone-06-summary');
      await expect.poll(() => page.getByRole('table').innerText(), WAIT).toContain('Looks fine');

      // A new one: the throttle is slow to return and the throttle check finds the fault: Stop.
      await page.getByRole('button', { name: 'Start a new diagnosis' }).click();
      await waitForScreen(page, 'intake');
      await pickSymptom(page, 'throttle-slow-to-return');
      await visible(page.locator('[data-symptom="throttle-slow-to-return"]').getByText(/^Stop:/));
      await page.getByText('Pump-around slide carburettor', { exact: true }).click();
      await page.getByRole('button', { name: 'Show the likely causes' }).click();
      await waitForScreen(page, 'ranking');
      // The symptom's own caution leads the ranking.
      await expect.poll(() => page.getByLabel('Cautions for these symptoms').innerText(), WAIT).toContain('Stop:');
      await page.getByRole('button', { name: /^Start with:/ }).click();
      const { checkId } = await openCheck(page, catalog);
      expect(catalog.checks.find((c) => c.id === checkId)?.stopOnFault).toBe(true);
      await record(page, 'Fault found');
      await waitForScreen(page, 'stopped');
      await expect.poll(() => page.locator('.fw-diag-stop').innerText(), WAIT).toContain('do not drive');
      await expect.poll(() => page.locator('.fw-diag-stop').innerText(), WAIT).toContain('qualified engine builder');
      await expect.poll(() => page.locator('.fw-diag-stop').innerText(), WAIT).toContain('technical inspection');
      await snap(page, 'diagnosis-phone-07-stop');
      await page.getByRole('button', { name: 'I understand' }).click();
      await waitForScreen(page, 'summary');
      await snap(page, 'diagnosis-phone-08-summary-stop');
      expect(outside).toEqual([]);
    } finally {
      await context.close();
    }
  });

  it('the same screens at desktop width in the dark theme', async () => {
    const { context, page } = await newPage(browser, DESKTOP, 'dark');
    try {
      await quickDiagnosis(page, baseUrl, 'diagnosis-desktop', catalog);
      await page.getByRole('button', { name: /say what fixed it/i }).click();
      await waitForScreen(page, 'resolve');
      await page.getByText(catalog.somethingElse.label, { exact: true }).click();
      await page.getByLabel('What you did').fill('Tightened the plug cap');
      await snap(page, 'diagnosis-desktop-06-resolve');
      await page.getByRole('button', { name: 'Save: fixed' }).click();
      await waitForScreen(page, 'summary');
      await visible(page.getByText('Fixed', { exact: true }));
      await snap(page, 'diagnosis-desktop-07-summary');

      await page.getByRole('button', { name: 'Start a new diagnosis' }).click();
      await pickSymptom(page, 'throttle-slow-to-return');
      await page.getByText('Float-valve slide carburettor', { exact: true }).click();
      await page.getByRole('button', { name: 'Show the likely causes' }).click();
      await page.getByRole('button', { name: /^Start with:/ }).click();
      await openCheck(page, catalog);
      await record(page, 'Fault found');
      await waitForScreen(page, 'stopped');
      await snap(page, 'diagnosis-desktop-08-stop');
    } finally {
      await context.close();
    }
  });

  it("today's air and the fuel age, on a phone and at desktop width, show in the ranking's reasons", async () => {
    for (const [viewport, tag] of [
      [PHONE, 'diagnosis-air-phone'],
      [DESKTOP, 'diagnosis-air-desktop'],
    ] as const) {
      const { context, page } = await newPage(browser, viewport, 'light');
      const outside = recordOutsideRequests(page, baseUrl);
      try {
        await airAndFuel(page, baseUrl, tag);
        expect(outside).toEqual([]);
      } finally {
        await context.close();
      }
    }
  });

  it('"Save this case" after sign-up turns the quick diagnosis into a case, results and notes included', async () => {
    const { context, page } = await newPage(browser, PHONE, 'dark');
    try {
      await page.goto(`${baseUrl}/diagnose`);
      await pickSymptom(page, 'bog-on-acceleration');
      await page.getByText('Pump-around slide carburettor', { exact: true }).click();
      await page.getByText('Setup (optional)').click();
      await page.getByLabel('Main jet').fill('185');
      await page.getByRole('button', { name: 'Show the likely causes' }).click();
      await page.getByRole('button', { name: /^Start with:/ }).click();
      const { checkId } = await openCheck(page, catalog);
      await record(page, 'Looks fine', 'snaps back every time');
      await waitForScreen(page, 'ranking');
      await page.getByRole('button', { name: 'Finish without a fix' }).click();
      await page.getByText('Save this case').click();
      await page.waitForURL(/\/sign-up\?next=%2Fdiagnose%2Fsave/, WAIT);

      await page.getByLabel('Your name').fill(`Saver ${RUN}`);
      await page.getByLabel('E-mail').fill(`saver-${RUN}@example.test`);
      await page.getByLabel('Password', { exact: true }).fill('a-long-enough-password');
      await page.getByRole('button', { name: 'Create account' }).click();
      await page.waitForURL(/\/diagnose\/save$/, WAIT);
      await visible(page.getByText('What will be saved'));
      await visible(page.getByText('snaps back every time', { exact: false }));
      await page.getByLabel('Kart name').fill(`Red ${RUN}`);
      await page.getByLabel('Engine size (cc)').fill('125');
      await snap(page, 'diagnosis-phone-09-save');
      await snapDesktopToo(page, 'diagnosis-desktop-09-save');
      await page.getByRole('button', { name: 'Add the kart and save the case' }).click();
      await page.waitForURL(/\/cases\/[^/]+\/walk-through$/, WAIT);
      await waitForScreen(page, 'ranking');

      const caseId = page.url().split('/cases/')[1].split('/')[0];
      const saved = await apiFromPage<CaseDto>(page, 'GET', `/api/cases/${caseId}`);
      expect(saved.status).toBe(200);
      expect(saved.body.kartName).toBe(`Red ${RUN}`);
      expect(saved.body.symptoms.map((s) => s.id)).toEqual(['bog-on-acceleration']);
      expect(saved.body.setup).toMatchObject({ mainJet: 185, carburettorKind: 'pump-around' });
      expect(saved.body.results.map((r) => [r.checkId, r.result, r.note])).toEqual([[checkId, 'looks-fine', 'snaps back every time']]);
      // The quick diagnosis is no longer kept in this browser once it is a case.
      expect(await page.evaluate(() => localStorage.getItem('fuelwright.diagnosis.quick'))).toBeNull();
    } finally {
      await context.close();
    }
  });

  it('the demo racer opens a case on "Blue 27", records a result, corrects the main jet, resolves it and finds it in the case list', async () => {
    const { context, page } = await newPage(browser, PHONE, 'light');
    try {
      await signInWithForm(page, baseUrl, RACER);

      await page.goto(`${baseUrl}/cases`);
      await page.getByText('Open a new case').click();
      await page.waitForURL(/\/diagnose\/new/, WAIT);
      await waitForScreen(page, 'intake');
      const kartSelect = page.getByLabel('Kart', { exact: true });
      const blue = await kartSelect.locator('option', { hasText: 'Blue 27' }).getAttribute('value');
      await kartSelect.selectOption(blue!);
      // The setup is filled in from the kart's latest snapshot, and stays editable.
      await visible(page.getByText(/Filled in from the setup of/));
      expect(await page.getByLabel('Main jet').inputValue()).not.toBe('');
      await pickSymptom(page, 'hesitation');
      await snap(page, 'diagnosis-case-phone-01-intake');
      await snapDesktopToo(page, 'diagnosis-case-desktop-01-intake');
      await page.getByRole('button', { name: 'Open the case and rank the causes' }).click();
      await page.waitForURL(/\/cases\/[^/]+\/walk-through$/, WAIT);
      await waitForScreen(page, 'ranking');
      await expect.poll(() => page.getByText('Case on').innerText(), WAIT).toContain('Blue 27');
      const caseId = page.url().split('/cases/')[1].split('/')[0];
      await visible(page.getByRole('button', { name: /^Start with:/ }));
      await snapDesktopToo(page, 'diagnosis-case-desktop-02-causes-and-plan');

      await page.getByRole('button', { name: /^Start with:/ }).click();
      // The plan puts the throttle check first, for safety: it handles the throttle, so its cautions come first.
      await visible(page.getByRole('heading', { name: /Before you start/ }));
      await snapDesktopToo(page, 'diagnosis-case-desktop-03-check-cautions');
      const { checkId, hadCautions } = await openCheck(page, catalog);
      expect(hadCautions).toBe(true);
      // Reload mid-check: the place is restored and checked against the server's case.
      await page.reload();
      await waitForScreen(page, 'check');
      expect((await screenOf(page)).state).toEqual({ check: 'steps' });
      await record(page, 'Looks fine', 'checked twice');
      await waitForScreen(page, 'ranking');
      let dto = (await apiFromPage<CaseDto>(page, 'GET', `/api/cases/${caseId}`)).body;
      expect(dto.results.map((r) => [r.checkId, r.result, r.note])).toEqual([[checkId, 'looks-fine', 'checked twice']]);

      // The main jet was entered wrong: correct it on the open case; the causes are ranked again
      // with the result so far, and the case's timeline says so.
      expect(dto.setup.mainJet).toBeTypeOf('number');
      const jetBefore = dto.setup.mainJet!;
      const jetAfter = jetBefore + 10;
      await page.getByRole('button', { name: "Correct the setup or today's air" }).click();
      await waitForScreen(page, 'correcting');
      expect(await page.getByLabel('Main jet').inputValue()).toBe(String(jetBefore));
      await page.getByLabel('Main jet').fill(String(jetAfter));
      await snap(page, 'diagnosis-case-phone-02-correct-facts');
      // Nothing wider than the phone: no sideways scroll on the correction form.
      expect(await page.evaluate(() => document.documentElement.scrollWidth <= window.innerWidth)).toBe(true);
      await page.getByRole('button', { name: 'Save and rank again' }).click();
      await waitForScreen(page, 'ranking');
      await visible(page.getByText('Setup and air corrected', { exact: true }));
      dto = (await apiFromPage<CaseDto>(page, 'GET', `/api/cases/${caseId}`)).body;
      expect(dto.setup.mainJet).toBe(jetAfter);
      expect(dto.events.at(-1)?.type).toBe('facts-corrected');
      expect(dto.results.map((r) => r.checkId)).toEqual([checkId]);
      // The causes shown are the new ranking's, in its order, with its figures.
      const shown = await shownCauses(page);
      expect([...shown.keys()].filter((id) => id !== 'something-else')).toEqual(dto.rank.causes.map((c) => c.id));
      for (const cause of dto.rank.causes) expect(shown.get(cause.id)).toBeCloseTo(cause.probability, 4);
      await snap(page, 'diagnosis-case-phone-03-reranked-after-correction');
      await page.goto(`${baseUrl}/cases/${caseId}`);
      const timeline = page.getByRole('list', { name: 'Timeline' });
      await timeline.locator('[data-event-type="facts-corrected"]').waitFor(WAIT);
      expect(await timeline.locator('[data-event-type="facts-corrected"]').textContent()).toContain(`Setup and air corrected (main jet ${jetAfter})`);
      await snap(page, 'diagnosis-case-phone-04-timeline-corrected');
      await page.goto(`${baseUrl}/cases/${caseId}/walk-through`);
      await waitForScreen(page, 'ranking');

      await page.getByRole('button', { name: /say what fixed it/i }).click();
      await waitForScreen(page, 'resolve');
      const topCause = dto.rank.causes[0];
      await page.locator('label').filter({ hasText: topCause.label }).first().click();
      await page.getByLabel('What you did').fill('Cleaned and refitted it');
      await page.getByRole('button', { name: 'Save: fixed' }).click();
      await waitForScreen(page, 'summary');
      await snap(page, 'diagnosis-case-phone-05-summary');
      await snapDesktopToo(page, 'diagnosis-case-desktop-05-summary');
      dto = (await apiFromPage<CaseDto>(page, 'GET', `/api/cases/${caseId}`)).body;
      expect(dto.state).toBe('resolved');
      expect(dto.resolution).toMatchObject({ causeId: topCause.id, fix: 'Cleaned and refitted it' });

      // The case list (the UI's page): the case is there, resolved.
      await page.getByText('All cases', { exact: true }).click();
      await page.waitForURL(/\/cases$/, WAIT);
      const link = page.locator(`a[href$="/cases/${caseId}"]`).first();
      await link.waitFor(WAIT);
      const card = page.locator('.fw-case-card, tr').filter({ has: page.locator(`a[href$="/cases/${caseId}"]`) }).first();
      await expect.poll(() => card.innerText(), WAIT).toContain('Blue 27');
      await expect.poll(() => card.innerText(), WAIT).toContain('Resolved');
      await snap(page, 'diagnosis-case-phone-06-case-list');

      // A finished case's walk-through opens on its summary; the server refuses further steps (409).
      await page.goto(`${baseUrl}/cases/${caseId}/walk-through`);
      await waitForScreen(page, 'summary');
      const refused = await apiFromPage(page, 'POST', `/api/cases/${caseId}/results`, { checkId, result: 'fault-found' });
      expect(refused.status).toBe(409);
    } finally {
      await context.close();
    }
  });
});
