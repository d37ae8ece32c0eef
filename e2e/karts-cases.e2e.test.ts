import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import type { Browser, Locator, Page } from 'playwright-core';
import { mkdirSync } from 'node:fs';
import { DESKTOP, PHONE, SCREENSHOT_DIR, apiFromPage, launchChromium, newPage, recordOutsideRequests, signInWithForm, snap as snapPage } from './browser.js';

const RACER = 'racer@fuelwright.test';
/** Other browser tests use the same demo racer: names made unique per run keep this test's rows apart. */
/** expect.poll waits 1 s by default; a loaded machine needs longer. */
const POLL = { timeout: 20_000 };
const RUN = Date.now().toString(36).slice(-5);
const KART_NAME = `Yellow 12 ${RUN}`;

function daysAgo(n: number): string {
  const d = new Date(Date.now() - n * 24 * 3600 * 1000);
  const pad = (x: number) => String(x).padStart(2, '0');
  return `${d.getFullYear()}-${pad(d.getMonth() + 1)}-${pad(d.getDate())}`;
}

/** A full-page screenshot from the top (the sticky navbar is drawn where the page is scrolled to). */
async function snap(page: Page, name: string): Promise<void> {
  await page.evaluate(() => window.scrollTo(0, 0));
  await snapPage(page, name);
}

/** Waits for the toasts that would cover a part of the page to time out (5 to 8 s). */
async function dismissToasts(page: Page): Promise<void> {
  await expect.poll(() => page.getByRole('button', { name: 'Close', exact: true }).count(), POLL).toBe(0);
}

/** A screenshot of one part of the page. */
async function snapPart(locator: Locator, name: string): Promise<void> {
  mkdirSync(SCREENSHOT_DIR, { recursive: true });
  await dismissToasts(locator.page());
  await locator.screenshot({ path: `${SCREENSHOT_DIR}${name}.png` });
}

describe('karts, setups and cases in the browser', () => {
  const baseUrl = inject('baseUrl');
  let browser: Browser;
  let kartId = '';
  let openCaseId = '';

  beforeAll(async () => {
    browser = await launchChromium();
  });
  afterAll(async () => {
    await browser?.close();
  });

  it('as the demo racer at 390 px: adds a kart, records a setup after fixing a field, sees the change, finds and opens a case', async () => {
    const { context, page } = await newPage(browser, PHONE, 'dark');
    const outside = recordOutsideRequests(page, baseUrl);
    await signInWithForm(page, baseUrl, RACER);

    // Home -> My karts -> Add a kart.
    await page.getByRole('button', { name: 'Open karts' }).click();
    await page.waitForURL(`${baseUrl}/karts`);
    await page.getByRole('button', { name: 'Add a kart' }).click();
    const kartForm = page.getByRole('form', { name: 'Add kart' });
    await kartForm.getByLabel('Name').fill(KART_NAME);
    await kartForm.getByLabel('Engine size (cc)').fill('20');
    await kartForm.getByRole('radiogroup', { name: 'Drive' }).getByRole('radio', { name: 'Gearbox (shifter)' }).click();
    await kartForm.getByRole('radiogroup', { name: 'Carburettor' }).getByRole('radio', { name: 'Pump-around' }).click();
    await kartForm.getByLabel('Notes').fill('Browser test kart.');
    await kartForm.getByRole('button', { name: 'Add kart' }).click();
    // Too small for a kart engine: the message shows under the field and nothing is lost.
    await kartForm.getByText('Kart engines run from 50 to 250 cc.').waitFor();
    expect(await kartForm.getByLabel('Name').inputValue()).toBe(KART_NAME);
    await snap(page, 'karts-cases-add-kart-error-phone');
    await kartForm.getByLabel('Engine size (cc)').fill('125');
    await kartForm.getByRole('button', { name: 'Add kart' }).click();
    await page.waitForURL(/\/karts\/[0-9a-f-]{36}$/);
    kartId = page.url().split('/').pop()!;
    await expect.poll(() => page.getByRole('heading', { level: 1 }).textContent(), POLL).toContain(KART_NAME);
    expect(await page.getByRole('button', { name: 'Diagnose this kart' }).getAttribute('href')).toBe(`/diagnose/new?kartId=${kartId}`);

    // No setup yet: the form is open. One field wrong first.
    const setupForm = page.getByRole('form', { name: 'Record a setup' });
    await setupForm.getByText('Caution', { exact: true }).waitFor();
    await setupForm.getByLabel('Date taken').fill(daysAgo(3));
    await setupForm.getByLabel('Main jet').fill('185');
    await setupForm.getByLabel('Pilot jet').fill('37.5');
    await setupForm.getByLabel('Needle clip groove (from the top)').fill('3');
    await setupForm.getByLabel('Air screw (turns out)').fill('9');
    await setupForm.getByRole('radiogroup', { name: 'Idle screw' }).getByRole('radio', { name: 'Backed off' }).click();
    await setupForm.getByLabel('Premix ratio').fill('32:1');
    await setupForm.getByLabel('Foam fitted on').fill(daysAgo(200));
    await setupForm.getByRole('radiogroup', { name: 'Vent lines fitted' }).getByRole('radio', { name: 'Yes' }).click();
    await setupForm.getByRole('radiogroup', { name: 'Vent lines routed up' }).getByRole('radio', { name: 'Yes' }).click();
    await setupForm.getByLabel('Note').fill('First day on the new kart.');
    await setupForm.getByRole('button', { name: 'Save setup' }).click();

    const airScrew = setupForm.getByLabel('Air screw (turns out)');
    await setupForm.getByText('The air screw is from 0 to 6 turns out from lightly seated.').waitFor();
    expect(await airScrew.getAttribute('aria-invalid')).toBe('true');
    await snap(page, 'karts-cases-setup-form-error-phone');
    // Nothing typed is lost.
    expect(await setupForm.getByLabel('Main jet').inputValue()).toBe('185');
    expect(await setupForm.getByLabel('Pilot jet').inputValue()).toBe('37.5');
    expect(await setupForm.getByLabel('Premix ratio').inputValue()).toBe('32:1');
    expect(await setupForm.getByLabel('Note').inputValue()).toBe('First day on the new kart.');
    expect(await airScrew.inputValue()).toBe('9');

    await airScrew.fill('1.5');
    await setupForm.getByRole('button', { name: 'Save setup' }).click();
    await setupForm.waitFor({ state: 'detached' });
    const cards = page.getByRole('list', { name: 'Past setups' });
    await cards.getByText('First setup recorded').waitFor();

    // A second setup starts from the first: change the main jet and the air screw.
    await page.getByRole('button', { name: 'Record a setup' }).click();
    const second = page.getByRole('form', { name: 'Record a setup' });
    expect(await second.getByLabel('Main jet').inputValue()).toBe('185');
    expect(await second.getByLabel('Air screw (turns out)').inputValue()).toBe('1.5');
    await second.getByLabel('Date taken').fill(daysAgo(1));
    await second.getByLabel('Main jet').fill('182.5');
    await second.getByLabel('Air screw (turns out)').fill('1.75');
    await second.getByRole('button', { name: 'Save setup' }).click();
    await second.waitFor({ state: 'detached' });
    const newest = cards.getByRole('listitem').first();
    await newest.getByText('Changed: main jet, air screw').waitFor();
    const changed = await newest.locator('.fw-setup-changed dt').allTextContents();
    expect(changed).toEqual(['Main jet', 'Air screw']);
    expect(await newest.locator('.fw-setup-changed').first().textContent()).toContain('was 185');
    await snap(page, 'karts-cases-kart-page-phone');
    await snapPart(page.getByRole('region', { name: 'Setups', exact: true }), 'karts-cases-setups-phone');

    // The kart list shows it as a card.
    await page.goto(`${baseUrl}/karts`);
    await page.getByRole('list', { name: 'Your karts' }).getByText(KART_NAME).waitFor();
    await snap(page, 'karts-cases-kart-list-phone');

    // Two cases on this kart, opened through the API from the page (the walk-through builds them in real use).
    const opened = await apiFromPage<{ id: string; state: string; setup: { mainJet?: number } }>(page, 'POST', '/api/cases', {
      kartId,
      symptoms: [{ id: 'bog-on-acceleration', band: 'quarter-to-three-quarters', engine: 'warm', where: ['corner-exit'] }, 'sporadic-running'],
    });
    expect(opened.status).toBe(201);
    // The case took the kart's latest setup.
    expect(opened.body.setup.mainJet).toBe(182.5);
    openCaseId = opened.body.id;
    const recorded = await apiFromPage(page, 'POST', `/api/cases/${openCaseId}/results`, { checkId: 'foam-inspect', result: 'fault-found', note: 'Foam crumbles when squeezed' });
    expect(recorded.status).toBe(200);
    const other = await apiFromPage<{ id: string }>(page, 'POST', '/api/cases', { kartId, symptoms: ['high-idle'] });
    expect(other.status).toBe(201);
    expect((await apiFromPage(page, 'POST', `/api/cases/${other.body.id}/abandon`, { reason: 'Went away after a clean' })).status).toBe(200);

    // Case list: filter by kart, then by state.
    await page.goto(`${baseUrl}/cases`);
    // On a phone the filters fold behind a button while none is set.
    await page.getByRole('button', { name: 'Filters', exact: true }).click();
    await page.getByLabel('Kart').selectOption(kartId);
    const caseCards = page.getByRole('list', { name: 'Your cases' });
    await expect.poll(() => caseCards.getByRole('listitem').count(), POLL).toBe(2);
    await page.getByLabel('State').selectOption('open');
    await expect.poll(() => caseCards.getByRole('listitem').count(), POLL).toBe(1);
    await caseCards.getByText('Bowl foam', { exact: false }).first().waitFor();
    await snap(page, 'karts-cases-case-list-phone');

    // Open the case: its timeline shows both steps with who and when.
    await caseCards.getByRole('link').first().click();
    await page.waitForURL(`${baseUrl}/cases/${openCaseId}`);
    const timeline = page.getByRole('list', { name: 'Timeline' });
    await timeline.locator('[data-event-type="check-recorded"]').waitFor();
    expect(await timeline.locator('[data-event-type]').evaluateAll((els) => els.map((e) => e.getAttribute('data-event-type')))).toEqual([
      'opened',
      'check-recorded',
    ]);
    expect(await timeline.locator('[data-event-type="check-recorded"]').textContent()).toContain('Foam crumbles when squeezed');
    expect(await timeline.locator('[data-event-type="opened"]').textContent()).toContain('Tamsin Vell');
    await page.getByRole('region', { name: 'Symptoms' }).getByText('Corner exit').waitFor();
    expect(await page.getByRole('button', { name: 'Continue the walk-through' }).getAttribute('href')).toBe(`/cases/${openCaseId}/walk-through`);
    await snap(page, 'karts-cases-case-page-phone');

    expect(outside).toEqual([]);
    await context.close();
  });

  it('at desktop width: the kart table, the setups table with changes highlighted, sorting cases, a case page, abandoning and deleting', async () => {
    expect(kartId).not.toBe('');
    const { context, page } = await newPage(browser, DESKTOP, 'light');
    await signInWithForm(page, baseUrl, RACER);

    await page.goto(`${baseUrl}/karts`);
    const table = page.getByRole('table', { name: 'Your karts' });
    await table.getByRole('link', { name: KART_NAME }).waitFor();
    await snap(page, 'karts-cases-kart-list-desktop');

    await table.getByRole('link', { name: KART_NAME }).click();
    const setups = page.locator('table.fw-setups-table');
    await setups.waitFor();
    const newestRow = setups.locator('tbody tr').first();
    expect(await newestRow.locator('td.fw-setup-changed').count()).toBe(2);
    expect(await newestRow.locator('td.fw-setup-changed').first().textContent()).toBe('182.5was 185');
    expect(await setups.locator('tbody tr').nth(1).locator('td.fw-setup-changed').count()).toBe(0);
    await snap(page, 'karts-cases-kart-page-desktop');

    // The form with an error at desktop width (a date in the future).
    await page.getByRole('button', { name: 'Record a setup' }).click();
    const form = page.getByRole('form', { name: 'Record a setup' });
    await form.getByLabel('Date taken').fill('2999-01-01');
    await form.getByLabel('Needle clip groove (from the top)').fill('2.5');
    await form.getByRole('button', { name: 'Save setup' }).click();
    await form.getByText('The day the kart ran with this setup cannot be in the future.').waitFor();
    await form.getByText('Use a whole groove number, counted from the top of the needle: 1 (top groove) to 7.').waitFor();
    await snap(page, 'karts-cases-setup-form-error-desktop');
    await form.getByRole('button', { name: 'Cancel' }).click();
    await snapPart(page.getByRole('region', { name: 'Setups', exact: true }), 'karts-cases-setups-desktop');

    // Case list: all cases of this kart, sorted by probability then by state.
    await page.goto(`${baseUrl}/cases?kartId=${kartId}`);
    const cases = page.getByRole('table', { name: 'Your cases' });
    await expect.poll(() => cases.locator('tbody tr').count(), POLL).toBe(2);
    await page.getByRole('button', { name: 'Sort by state' }).click();
    await page.locator('th[aria-sort="ascending"]', { hasText: 'State' }).waitFor();
    // Open cases first (the order of CASE_STATES), then the other way round.
    await expect.poll(() => cases.locator('tbody tr').first().getAttribute('data-case-id'), POLL).toBe(openCaseId);
    await page.getByRole('button', { name: 'Sort by state' }).click();
    await page.locator('th[aria-sort="descending"]', { hasText: 'State' }).waitFor();
    await expect.poll(() => cases.locator('tbody tr').last().getAttribute('data-case-id'), POLL).toBe(openCaseId);
    await snap(page, 'karts-cases-case-list-desktop');

    await cases.locator(`tr[data-case-id="${openCaseId}"]`).getByRole('link').click();
    await page.getByRole('region', { name: 'Likely causes now' }).waitFor();
    await page.getByRole('list', { name: 'Timeline' }).locator('[data-event-type="check-recorded"]').waitFor();
    await snap(page, 'karts-cases-case-page-desktop');

    // Abandon with a reason: the case is kept, marked abandoned, with one more step in its timeline.
    await page.getByRole('button', { name: 'Abandon', exact: true }).click();
    const dialog = page.getByRole('dialog');
    await dialog.getByLabel('Why (optional)').fill('Fitted new foam before the walk-through');
    await dialog.getByRole('button', { name: 'Abandon case' }).click();
    await dialog.waitFor({ state: 'detached' });
    await page.getByRole('list', { name: 'Timeline' }).locator('[data-event-type="abandoned"]').waitFor();
    expect(await page.getByRole('button', { name: 'Continue the walk-through' }).count()).toBe(0);

    // Delete a throwaway kart: the Alert asks first.
    const spare = await apiFromPage<{ id: string }>(page, 'POST', '/api/karts', {
      name: `Spare ${RUN}`,
      displacementCc: 100,
      drive: 'direct-drive',
      carburettorKind: 'float-valve',
    });
    expect(spare.status).toBe(201);
    await page.goto(`${baseUrl}/karts/${spare.body.id}`);
    await page.getByRole('button', { name: 'Delete' }).click();
    const alert = page.getByRole('alertdialog').or(page.getByRole('dialog'));
    await alert.getByText(`Delete Spare ${RUN}?`).waitFor();
    await alert.getByRole('button', { name: 'Delete kart' }).click();
    await page.waitForURL(`${baseUrl}/karts`);
    await page.getByRole('table', { name: 'Your karts' }).getByRole('link', { name: KART_NAME }).waitFor();
    expect(await page.getByRole('link', { name: `Spare ${RUN}` }).count()).toBe(0);
    expect((await apiFromPage(page, 'GET', `/api/karts/${spare.body.id}`)).status).toBe(404);

    await context.close();
  });
});
