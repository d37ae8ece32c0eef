import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import type { Browser, Page } from 'playwright-core';
import { DESKTOP, PHONE, apiFromPage, invitationPathIn, launchChromium, signInQuietly, snapTop, trackedPages, waitForInvitation } from './browser.js';

const RACER = 'racer@fuelwright.test';
const ADMIN = 'admin@fuelwright.test';
/** Unique per run, so this test's rows stand apart from other browser tests on the same demo club. */
const RUN = Date.now().toString(36).slice(-5);
/** Someone with no account yet: the racer's coach, reached only by e-mail. */
const NEWCOMER = `new.coach.${RUN}@example.test`;
const NEWCOMER_PASSWORD = 'a long password for the coach';
const COMMENT = `Which fuel can did you fill from last? (${RUN})`;
const STEP = 120_000;

describe('a brand-new invitee: e-mailed link, sign-up, the shared case, a comment', () => {
  const baseUrl = inject('baseUrl');
  let browser: Browser;
  let racer: Page;
  let newcomer: Page; // phone: the coach opens the e-mail on a phone
  let newcomerDesk: Page;
  let admin: Page;
  let caseId = '';
  let sharedAt = '';

  const pages = trackedPages(baseUrl);
  const open = (viewport: typeof PHONE | typeof DESKTOP, theme: 'dark' | 'light') => pages.open(browser, viewport, theme);

  beforeAll(async () => {
    browser = await launchChromium();
    racer = await open(PHONE, 'light');
    newcomer = await open(PHONE, 'light');
    newcomerDesk = await open(DESKTOP, 'light');
    admin = await open(DESKTOP, 'light');
    await signInQuietly(admin, baseUrl, ADMIN);
  });
  afterAll(async () => {
    await pages.close();
    await browser?.close();
  });

  it('the demo racer shares a case with an address that has no account (390 px)', { timeout: STEP }, async () => {
    await signInQuietly(racer, baseUrl, RACER);
    const karts = await apiFromPage<{ karts: { id: string; name: string }[] }>(racer, 'GET', '/api/karts');
    const blue = karts.body.karts.find((k) => k.name === 'Blue 27')!;
    const opened = await apiFromPage<{ id: string }>(racer, 'POST', '/api/cases', { kartId: blue.id, symptoms: ['bog-on-acceleration'] });
    expect(opened.status).toBe(201);
    caseId = opened.body.id;

    await racer.goto(`${baseUrl}/cases/${caseId}`);
    const share = racer.getByRole('region', { name: 'Share with a coach or shop' });
    await share.getByLabel('Their e-mail').fill(NEWCOMER);
    await share.getByRole('radio', { name: 'Coach' }).click();
    await share.getByRole('radio', { name: 'This case' }).click();
    sharedAt = new Date(Date.now() - 1000).toISOString();
    await share.getByRole('button', { name: 'Send invitation' }).click();
    await racer.getByText(`Invitation sent to ${NEWCOMER}`).waitFor();
  });

  it('the newcomer signs up through the e-mailed link, lands on the shared case and comments (390 px)', { timeout: STEP }, async () => {
    const invitation = await waitForInvitation(admin, NEWCOMER, sharedAt);
    await newcomer.goto(`${baseUrl}${invitationPathIn(invitation)}`);
    await newcomer.getByRole('heading', { name: 'You are invited to review a case' }).waitFor();
    await snapTop(newcomer, 'invitee-invitation-phone');
    await newcomer.getByRole('button', { name: 'Create an account' }).click();

    const form = newcomer.getByRole('form', { name: 'Create account' });
    await form.waitFor();
    await newcomer.getByText('You were invited to review a case').waitFor();
    await newcomer.fill('#sign-up-name', `New Coach ${RUN}`);
    await newcomer.fill('#sign-up-email', NEWCOMER);
    await newcomer.fill('#sign-up-password', NEWCOMER_PASSWORD);
    await snapTop(newcomer, 'invitee-sign-up-phone');
    const answered = newcomer.waitForResponse((r) => r.url().endsWith('/api/auth/sign-up'));
    await form.getByRole('button', { name: 'Create account' }).click();
    const signedUp = (await (await answered).json()) as { shared?: { caseId: string | null } };
    expect(signedUp.shared?.caseId).toBe(caseId);

    // Straight to the shared case, read-only for its facts.
    await newcomer.waitForURL(`${baseUrl}/cases/${caseId}`);
    await newcomer.getByRole('heading', { name: 'Case on Blue 27' }).waitFor();
    await newcomer.getByText('Tamsin Vell’s case, shared with you to review').waitFor();
    expect(await newcomer.getByRole('button', { name: 'Continue the walk-through' }).count()).toBe(0);
    expect(await newcomer.getByRole('region', { name: 'Share with a coach or shop' }).count()).toBe(0);
    // A racer account, like every new one: the share lets it review.
    const me = await apiFromPage<{ user: { role: string; emailVerified: boolean } }>(newcomer, 'GET', '/api/auth/me');
    expect(me.body.user).toMatchObject({ role: 'racer', emailVerified: true });

    const comments = newcomer.getByRole('region', { name: 'Comments' });
    await comments.getByRole('textbox', { name: 'Add a comment' }).fill(COMMENT);
    await comments.getByRole('button', { name: 'Post comment' }).click();
    await comments.getByRole('list', { name: 'Comments' }).getByText(COMMENT).waitFor();
    await snapTop(newcomer, 'invitee-case-phone');

    // The racer sees the comment on their case.
    await racer.goto(`${baseUrl}/cases/${caseId}`);
    await racer.getByRole('region', { name: 'Comments' }).getByText(COMMENT).waitFor();
  });

  it('on a desktop, the newcomer reaches the case from the menu’s Shared cases', { timeout: STEP }, async () => {
    await newcomerDesk.goto(`${baseUrl}/conditions`);
    const signIn = await apiFromPage(newcomerDesk, 'POST', '/api/auth/sign-in', { email: NEWCOMER, password: NEWCOMER_PASSWORD });
    expect(signIn.status).toBe(200);
    await newcomerDesk.goto(`${baseUrl}/home`);
    const nav = newcomerDesk.getByRole('navigation', { name: 'Main' });
    await nav.getByText('Shared cases').click();
    await newcomerDesk.waitForURL(`${baseUrl}/shared-cases`);
    const card = newcomerDesk.locator(`[data-case-id="${caseId}"]`);
    await card.waitFor();
    expect(await card.textContent()).toContain('1 comment');
    await snapTop(newcomerDesk, 'invitee-dashboard-desktop');
    await card.getByRole('link').click();
    await newcomerDesk.waitForURL(`${baseUrl}/cases/${caseId}`);
    await newcomerDesk.getByRole('region', { name: 'Comments' }).getByText(COMMENT).waitFor();
    await snapTop(newcomerDesk, 'invitee-case-desktop');
  });
});
