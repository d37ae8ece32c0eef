import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import type { Browser, Locator, Page } from 'playwright-core';
import { SHIPPED_RULESET_VERSION } from '@fuelwright/rules';
import type { CatalogResponse } from '@fuelwright/shared';
import { DESKTOP, PHONE, POLL, apiFromPage, launchChromium, trackedPages, shareCaseAndAccept, signInQuietly, signInWithForm, snapPart, snapTop } from './browser.js';

const RACER = 'racer@fuelwright.test';
const SHOP = 'shop@fuelwright.test';
const ADMIN = 'admin@fuelwright.test';
/** Unique per run, so this test's rows stand apart from other browser tests on the same demo club. */
const RUN = Date.now().toString(36).slice(-5);
const CUSTOMER = `Walk-in customer ${RUN}`;
const STEP = 150_000;

/**
 * Ticks or unticks a check box through its label, as a finger does (Blueprint draws its own box
 * over the hidden input, so the input itself is not what gets the tap).
 */
async function toggle(box: Locator, on: boolean): Promise<void> {
  await box.locator('xpath=ancestor::label[1]').click();
  await expect.poll(() => box.isChecked(), POLL).toBe(on);
}

/** Ticks a cause in the outcome form, opening the full list first when it is not among the likely ones. */
async function tickCause(form: Locator, label: RegExp): Promise<void> {
  const box = form.getByRole('checkbox', { name: label });
  await form.getByRole('checkbox').first().waitFor();
  if ((await box.count()) === 0) await form.getByRole('button', { name: /^Show all \d+ causes$/ }).click();
  await toggle(box, true);
}

describe('outcomes, insights and ruleset versions in the browser', () => {
  const baseUrl = inject('baseUrl');
  let browser: Browser;
  let racer: Page; // phone, dark: the racer at the track
  let shop: Page; // phone, light: the shop at the bench
  let shopDesk: Page; // desktop, light: the shop's office
  let admin: Page; // desktop, light
  let adminPhone: Page;
  let caseId = '';
  let proposalPath = '';
  let proposedVersion = '';

  const pages = trackedPages(baseUrl);
  const open = (viewport: typeof PHONE | typeof DESKTOP, theme: 'dark' | 'light') => pages.open(browser, viewport, theme);

  beforeAll(async () => {
    browser = await launchChromium();
    racer = await open(PHONE, 'dark');
    shop = await open(PHONE, 'light');
    shopDesk = await open(DESKTOP, 'light');
    admin = await open(DESKTOP, 'light');
    adminPhone = await open(PHONE, 'dark');
    await signInQuietly(racer, baseUrl, RACER);
    await signInQuietly(admin, baseUrl, ADMIN);
  });
  afterAll(async () => {
    await pages.close();
    await browser?.close();
  });

  it('the racer shares a case with the demo shop, which accepts the e-mailed invitation', { timeout: STEP }, async () => {
    const karts = await apiFromPage<{ karts: { id: string; name: string }[] }>(racer, 'GET', '/api/karts');
    const blue = karts.body.karts.find((k) => k.name === 'Blue 27')!;
    const opened = await apiFromPage<{ id: string }>(racer, 'POST', '/api/cases', {
      kartId: blue.id,
      symptoms: ['bog-on-acceleration', 'sporadic-running'],
      setup: { foamFittedDate: '2024-01-10' },
    });
    expect(opened.status).toBe(201);
    caseId = opened.body.id;
    await signInWithForm(shop, baseUrl, SHOP);
    await shareCaseAndAccept({ owner: racer, admin, recipient: shop, caseId, email: SHOP, as: 'shop' });
  });

  it('the shop logs what really fixed the shared case, then corrects the entry (390 px)', { timeout: STEP }, async () => {
    await shop.goto(`${baseUrl}/cases/${caseId}`);
    const panel = shop.getByRole('region', { name: 'Log what really fixed it' });
    await panel.getByRole('button', { name: 'Log the outcome' }).click();
    const form = panel.getByRole('form', { name: 'Log what really fixed it' });
    await tickCause(form, /^Bowl foam missing, rotten or soaked/);
    await form.getByLabel('What fixed it').fill('New foam blocks in the bowl');
    await form.getByLabel('Parts (optional)').fill('Foam set');
    await form.getByLabel('Labour minutes (optional)').fill('twenty');
    await form.getByRole('radiogroup', { name: 'Still fixed after the next session?' }).getByRole('radio', { name: 'No', exact: true }).click();
    // A fault that came back: the stop caution shows before anything else is sent.
    await form.getByText('Stop: the fault came back').waitFor();
    await form.getByRole('button', { name: 'Log the outcome' }).click();
    await form.getByText('Whole minutes from 0 to 6000.').waitFor();
    await form.getByLabel('Labour minutes (optional)').fill('20');
    await form.getByRole('radiogroup', { name: 'Still fixed after the next session?' }).getByRole('radio', { name: 'Yes' }).click();
    expect(await form.getByText('Whole minutes from 0 to 6000.').count()).toBe(0);
    await snapTop(shop, 'outcomes-case-form-phone');
    await form.getByRole('button', { name: 'Log the outcome' }).click();

    const entry = panel.getByRole('article').first();
    await entry.getByText('Fixed by:').waitFor();
    expect(await entry.textContent()).toContain('Bowl foam missing, rotten or soaked');
    expect(await entry.textContent()).toContain('Foam set · 20 min labour');
    expect(await entry.textContent()).toContain('Still fixed');

    // Corrections are new entries: the first stays, marked corrected.
    await entry.getByRole('button', { name: 'Correct this entry' }).click();
    const correction = panel.getByRole('form', { name: 'Correct this entry' });
    await toggle(correction.getByRole('checkbox', { name: /^Bowl foam missing, rotten or soaked/ }), false);
    await tickCause(correction, /^Return tube loose or damaged/);
    await correction.getByLabel('What fixed it').fill('Return tube pushed home and clipped');
    await correction.getByRole('button', { name: 'Save the correction' }).click();
    await panel.getByText('Return tube pushed home and clipped').waitFor();
    await panel.getByText('Corrected', { exact: true }).waitFor();
    const list = await apiFromPage<{ outcomes: { caseId: string; current: boolean; fix: string }[] }>(shop, 'GET', '/api/outcomes');
    const onCase = list.body.outcomes.filter((o) => o.caseId === caseId);
    expect(onCase.map((o) => [o.fix, o.current]).sort()).toEqual([
      ['New foam blocks in the bowl', false],
      ['Return tube pushed home and clipped', true],
    ]);
    await snapPart(panel, 'outcomes-case-corrected-phone');
  });

  it('the racer logs what fixed their own resolved case from the case page', { timeout: STEP }, async () => {
    const resolved = await apiFromPage(racer, 'POST', `/api/cases/${caseId}/resolve`, { causeId: 'return-tube-loose', fix: 'Return tube clipped' });
    expect(resolved.status).toBe(200);
    await racer.goto(`${baseUrl}/cases/${caseId}`);
    const panel = racer.getByRole('region', { name: 'Log what really fixed it' });
    await panel.getByRole('button', { name: 'Log the outcome' }).click();
    const form = panel.getByRole('form', { name: 'Log what really fixed it' });
    // Filled from the resolution.
    expect(await form.getByRole('checkbox', { name: /^Return tube loose or damaged/ }).isChecked()).toBe(true);
    expect(await form.getByLabel('What fixed it').inputValue()).toBe('Return tube clipped');
    await form.getByRole('button', { name: 'Log the outcome' }).click();
    await panel.getByRole('button', { name: 'Correct this entry' }).waitFor();
    await snapTop(racer, 'outcomes-racer-case-phone');
  });

  it('the shop opens a walk-in work order, logs its outcome, and sees it done (390 px and desktop)', { timeout: STEP }, async () => {
    await shop.goto(`${baseUrl}/work-orders`);
    await shop.getByRole('heading', { name: 'Work orders', level: 1 }).waitFor();
    await shop.getByRole('button', { name: 'New work order' }).first().click();
    await shop.waitForURL(`${baseUrl}/work-orders/new`);
    const form = shop.getByRole('form', { name: 'New work order' });
    await form.getByRole('button', { name: 'Open the work order' }).click();
    await form.getByText('Name the customer.').waitFor();
    await form.getByText('Tick what the customer noticed.').waitFor();
    await form.getByLabel('Customer').fill(CUSTOMER);
    await form.getByLabel('Kart (optional)').fill('125 shifter');
    await form.getByRole('radiogroup', { name: 'Carburettor' }).getByRole('radio', { name: 'Pump-around' }).click();
    await toggle(form.getByRole('checkbox', { name: /^Fuel comes out of the vents/ }), true);
    // The symptom's cautions show as soon as it is ticked.
    await form.getByText('Stop: Fuel near hot parts or the ignition').waitFor();
    await snapTop(shop, 'outcomes-new-work-order-phone');
    await form.getByRole('button', { name: 'Open the work order' }).click();
    await shop.waitForURL(/\/work-orders\/[0-9a-f-]{36}$/);

    await shop.getByRole('heading', { name: CUSTOMER, level: 1 }).waitFor();
    const outcome = shop.getByRole('form', { name: 'Log what really fixed it' });
    await tickCause(outcome, /^Vent lines missing or not routed up/);
    await outcome.getByLabel('What fixed it').fill('Fitted vent lines routed up');
    await outcome.getByLabel('Labour minutes (optional)').fill('10');
    await snapTop(shop, 'outcomes-work-order-form-phone');
    await outcome.getByRole('button', { name: 'Log the outcome' }).click();
    await shop.getByRole('button', { name: 'Correct this entry' }).waitFor();
    await shop.getByText('Done', { exact: true }).first().waitFor();

    await signInQuietly(shopDesk, baseUrl, SHOP);
    await shopDesk.goto(`${baseUrl}/work-orders`);
    const card = shopDesk.getByRole('list', { name: 'Work orders' }).getByRole('listitem').filter({ hasText: CUSTOMER });
    await card.getByText('1 outcome logged').waitFor();
    await snapTop(shopDesk, 'outcomes-work-orders-desktop');
    await shop.goto(`${baseUrl}/work-orders`);
    await shop.getByRole('list', { name: 'Work orders' }).getByText(CUSTOMER).waitFor();
    await snapTop(shop, 'outcomes-work-orders-phone');
  });

  it('logs more walk-in outcomes through the API, then the shop sees them in the insights (390 px and desktop)', { timeout: STEP }, async () => {
    const catalog = await apiFromPage<CatalogResponse>(shop, 'GET', '/api/catalog');
    const causes = catalog.body.causes.filter((c) => !c.carburettorKinds || c.carburettorKinds.includes('pump-around'));
    // A few invented walk-ins, so the proposal has outcomes to fit (each symptom with a cause a rule links it to).
    const walkIns: [string, string][] = [
      ['fuel-from-vents', 'vent-lines-off'],
      ['hard-warm-start', 'fuel-level-high'],
      ['rich-blubber', 'fuel-level-high'],
      ['lean-top-end', 'main-jet-too-small'],
      ['bog-on-acceleration', 'foam-degraded'],
      ['sporadic-running', 'foam-degraded'],
      ['high-idle', 'idle-screw-set'],
      ['slow-deceleration', 'intake-air-leak'],
      ['fades-after-laps', 'tank-vent-blocked'],
      ['hard-cold-start', 'choke-not-used-cold'],
    ];
    const before = await apiFromPage<{ outcomes: number }>(shop, 'GET', '/api/insights');
    for (const [symptom, cause] of walkIns) {
      expect(causes.some((c) => c.id === cause), cause).toBe(true);
      const wo = await apiFromPage<{ id: string }>(shop, 'POST', '/api/work-orders', {
        customerName: `API walk-in ${RUN}`,
        symptoms: [symptom],
        setup: { carburettorKind: 'pump-around' },
      });
      expect(wo.status, JSON.stringify(wo.body)).toBe(201);
      const logged = await apiFromPage(shop, 'POST', '/api/outcomes', { workOrderId: wo.body.id, confirmedCauses: [cause], fix: 'Invented fix (test)', labourMinutes: 30, stillFixed: true });
      expect(logged.status, JSON.stringify(logged.body)).toBe(201);
    }
    const figures = await apiFromPage<{ outcomes: number; insights: { ranked: number } }>(shop, 'GET', '/api/insights');
    // Ten more current outcomes under the active version (the shop's corrected entry stopped counting before).
    expect(figures.body.outcomes).toBe(before.body.outcomes + walkIns.length);
    expect(before.body.outcomes).toBeGreaterThanOrEqual(3);

    // The shop's outcome log: its own entries, newest first, the corrected one marked.
    await shop.goto(`${baseUrl}/outcomes`);
    const log = shop.getByRole('list', { name: 'Outcomes' });
    await log.getByText('Return tube pushed home and clipped').waitFor();
    await log.getByText('Corrected', { exact: true }).waitFor();
    expect(await shop.getByRole('button', { name: 'Download CSV' }).getAttribute('href')).toBe('/api/outcomes.csv');
    await snapTop(shop, 'outcomes-log-phone');
    await signInQuietly(admin, baseUrl, ADMIN);
    await admin.goto(`${baseUrl}/outcomes`);
    await admin.getByRole('list', { name: 'Outcomes' }).getByText('Return tube pushed home and clipped').waitFor();
    // An admin reads everyone's entries and corrects none.
    expect(await admin.getByRole('button', { name: 'Correct this entry' }).count()).toBe(0);
    await snapTop(admin, 'outcomes-log-admin-desktop');

    await shop.goto(`${baseUrl}/insights`);
    const counts = shop.getByRole('region', { name: 'Counts' });
    await counts.getByText(String(figures.body.outcomes), { exact: true }).first().waitFor();
    const accuracy = shop.getByRole('region', { name: 'How often the ranking was right' });
    await accuracy.getByText('Top cause right (top-1)').waitFor();
    await accuracy.getByText('Brier score').waitFor();
    const calibration = shop.getByRole('region', { name: 'Calibration' });
    // The reliability chart: the diagonal and at least one bin's point.
    await calibration.locator('.recharts-reference-line').waitFor();
    await expect.poll(() => calibration.locator('.recharts-line-dot').count(), POLL).toBeGreaterThan(0);
    expect(await shop.getByRole('region', { name: 'Mean minutes to fix, per cause' }).textContent()).toContain('Vent lines missing or not routed up');
    const csv = await shop.getByRole('region', { name: 'Most frequent symptom → cause pairs' }).getByRole('button', { name: /Download .* as CSV/ }).getAttribute('href');
    expect(csv).toBe('/api/insights.csv?table=pairs');
    const download = await apiFromPage<null>(shop, 'GET', csv!);
    expect(download.status).toBe(200);
    await snapTop(shop, 'outcomes-insights-phone');
    await snapPart(calibration, 'outcomes-insights-chart-phone');

    await shopDesk.goto(`${baseUrl}/insights`);
    await shopDesk.getByRole('region', { name: 'Calibration' }).locator('.recharts-line-dot').first().waitFor();
    await snapTop(shopDesk, 'outcomes-insights-desktop');
  });

  it('the shop proposes new weights and watches the progress bar reach ready; only an admin can publish', { timeout: STEP }, async () => {
    await shop.goto(`${baseUrl}/insights`);
    await shop.getByRole('button', { name: 'Propose new weights' }).click();
    await shop.waitForURL(`${baseUrl}/admin/rulesets`);
    const form = shop.getByRole('form', { name: 'Propose new weights' });
    await shop.getByText('Only an admin can publish a proposal.', { exact: false }).waitFor();
    proposedVersion = await form.getByLabel('Publish as version').inputValue();
    expect(proposedVersion).toMatch(/^\d+\.\d+\.0$/);
    await form.getByLabel('Strength of the current weights').fill('20');
    await form.getByLabel('Held out for the back-test (%)').fill('70');
    await form.getByRole('button', { name: 'Propose new weights' }).click();
    await form.getByText('A percent from 5 to 50.').waitFor();
    await form.getByLabel('Held out for the back-test (%)').fill('30');
    await form.getByRole('button', { name: 'Propose new weights' }).click();
    await shop.waitForURL(/\/admin\/rulesets\/proposals\/[0-9a-f-]{36}$/);
    proposalPath = new URL(shop.url()).pathname;

    const bar = shop.getByRole('progressbar', { name: 'Proposal progress' });
    await bar.waitFor();
    const seen = new Set<string>();
    await expect
      .poll(async () => {
        seen.add((await bar.getAttribute('aria-valuenow')) ?? '');
        return shop.getByRole('region', { name: /^Status/ }).getByText('Ready', { exact: true }).count();
      }, POLL)
      .toBeGreaterThan(0);
    expect(await bar.getAttribute('aria-valuenow')).toBe('100');
    // The back-test and the diff with its evidence.
    const backTest = shop.getByRole('table', { name: 'Back-test' });
    await backTest.getByText('Right cause in the top three (top-3)').waitFor();
    const priors = shop.getByRole('region', { name: 'Cause priors' });
    await priors.getByText(/\d+ (of \d+ )?shown/).waitFor();
    expect(await priors.textContent()).toMatch(/90 % interval/);
    expect(await shop.getByRole('button', { name: /^Publish as/ }).count()).toBe(0);
    await shop.getByText('Only an admin can publish a proposal. Send this page’s address', { exact: false }).waitFor();
    // The rule diff filters by name or cause.
    const rules = shop.getByRole('region', { name: 'Rule likelihood ratios' });
    await rules.getByRole('radio', { name: 'All', exact: true }).click();
    await rules.getByRole('textbox', { name: 'Find a rule or cause' }).fill('vent lines');
    await expect.poll(async () => (await rules.getByRole('status').textContent()) ?? '', POLL).toMatch(/^\d+ of \d+ shown/);
    await rules.getByRole('textbox', { name: 'Find a rule or cause' }).fill('');
    await snapTop(shop, 'outcomes-proposal-phone');
    await shopDesk.goto(`${baseUrl}${proposalPath}`);
    await shopDesk.getByRole('table', { name: 'Back-test' }).waitFor();
    await snapTop(shopDesk, 'outcomes-proposal-desktop');
    // The poll saw the bar at some value on the way (a proposal over a dozen outcomes may finish between polls).
    expect(seen.size).toBeGreaterThan(0);
  });

  it('the admin publishes the proposal, sees the new active version, then rolls back', { timeout: STEP }, async () => {
    await admin.goto(`${baseUrl}${proposalPath}`);
    await admin.getByRole('button', { name: `Publish as ${proposedVersion}` }).click();
    const alert = admin.getByRole('alertdialog');
    await alert.getByText(`Publish these weights as version ${proposedVersion}`, { exact: false }).waitFor();
    await alert.getByLabel('Notes (optional)').fill(`Browser test re-fit ${RUN}`);
    await alert.getByRole('button', { name: `Publish ${proposedVersion}` }).click();
    await admin.waitForURL(`${baseUrl}/admin/rulesets`);
    const versions = admin.getByRole('region', { name: 'Published versions' });
    const row = versions.getByRole('row').filter({ hasText: `Browser test re-fit ${RUN}` });
    await row.getByText('Active', { exact: true }).waitFor();
    expect((await apiFromPage<{ version: string }>(admin, 'GET', '/api/catalog')).body.version).toBe(proposedVersion);
    await snapTop(admin, 'outcomes-rulesets-admin-desktop');
    await signInQuietly(adminPhone, baseUrl, ADMIN);
    await adminPhone.goto(`${baseUrl}/admin/rulesets`);
    await adminPhone.getByRole('region', { name: 'Published versions' }).getByText(proposedVersion, { exact: true }).waitFor();
    await snapTop(adminPhone, 'outcomes-rulesets-admin-phone');

    // Roll back to the shipped version (nothing is deleted; other browser tests expect it active).
    await versions.getByRole('button', { name: `Roll back to ${SHIPPED_RULESET_VERSION}` }).click();
    await admin.getByRole('alertdialog').getByRole('button', { name: `Roll back to ${SHIPPED_RULESET_VERSION}` }).click();
    await versions.getByRole('row').filter({ hasText: 'Shipped expert ruleset' }).getByText('Active', { exact: true }).waitFor();
    expect((await apiFromPage<{ version: string }>(admin, 'GET', '/api/catalog')).body.version).toBe(SHIPPED_RULESET_VERSION);
    expect(await versions.getByRole('button', { name: `Activate ${proposedVersion}` }).count()).toBe(1);
  });

  it('fetched nothing from outside the app', () => {
    expect(pages.outside()).toEqual([]);
  });
});
