import { mkdirSync } from 'node:fs';
import sharp from 'sharp';
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import type { Browser, BrowserContext, Locator, Page } from 'playwright-core';
import type { OutboxMessageDto } from '@fuelwright/shared';
import { DESKTOP, PHONE, SCREENSHOT_DIR, launchChromium, newPage, recordOutsideRequests, snap as snapPage } from './browser.js';

const PASSWORD = 'fuelwright-demo';
const RACER = 'racer@fuelwright.test';
const RACER2 = 'racer2@fuelwright.test';
const COACH = 'coach@fuelwright.test';
const ADMIN = 'admin@fuelwright.test';
const POLL = { timeout: 30_000, interval: 500 };
/** Unique per run, so this test's rows stand apart from other browser tests on the same demo club. */
const RUN = Date.now().toString(36).slice(-5);
const COMMENT = `Is the foam in the bowl crumbling? (${RUN})`;
const REASON = `The foam is the oldest part on this kart (${RUN})`;
const PHOTO_WANTED = `The foam blocks, out of the bowl (${RUN})`;
const STEP = 120_000;

/** A full-page screenshot from the top (the sticky navbar is drawn where the page is scrolled to). */
async function snap(page: Page, name: string): Promise<void> {
  await dismissToasts(page);
  await page.evaluate(() => window.scrollTo(0, 0));
  await snapPage(page, name);
}

/** Closes the toasts that would cover a part of the page. */
async function dismissToasts(page: Page): Promise<void> {
  const close = page.getByRole('button', { name: 'Close', exact: true });
  for (let n = await close.count(); n > 0; n = await close.count()) {
    await close.first().click();
    await expect.poll(() => close.count(), POLL).toBeLessThan(n);
  }
}

/** A screenshot of one part of the page. */
async function snapPart(locator: Locator, name: string): Promise<void> {
  mkdirSync(SCREENSHOT_DIR, { recursive: true });
  await dismissToasts(locator.page());
  await locator.scrollIntoViewIfNeeded();
  await locator.screenshot({ path: `${SCREENSHOT_DIR}${name}.png` });
}

/** Calls the API from inside the page (same origin, the session cookie goes along). */
async function apiFromPage<T>(page: Page, method: string, path: string, body?: unknown): Promise<{ status: number; body: T }> {
  return page.evaluate(
    async ({ method, path, body }) => {
      const res = await fetch(path, {
        method,
        headers: body === undefined ? {} : { 'Content-Type': 'application/json' },
        body: body === undefined ? undefined : JSON.stringify(body),
      });
      return { status: res.status, body: await res.json().catch(() => null) };
    },
    { method, path, body },
  );
}

/** Signs in through the form, as a person does. */
async function signInWithForm(page: Page, baseUrl: string, email: string): Promise<void> {
  await page.goto(`${baseUrl}/sign-in`);
  await page.fill('#sign-in-email', email);
  await page.fill('#sign-in-password', PASSWORD);
  await page.getByRole('form', { name: 'Sign in' }).getByRole('button', { name: 'Sign in' }).click();
  await page.waitForURL(`${baseUrl}/home`);
}

/** Signs in through the API (for the extra windows that only take screenshots). */
async function signInQuietly(page: Page, baseUrl: string, email: string): Promise<void> {
  await page.goto(`${baseUrl}/conditions`);
  const res = await apiFromPage(page, 'POST', '/api/auth/sign-in', { email, password: PASSWORD });
  expect(res.status).toBe(200);
}

/** Polls the admin outbox (the app sends it to the local capture server every 2 s) until a message matches and is sent. */
async function waitForMail(admin: Page, match: (m: OutboxMessageDto) => boolean): Promise<OutboxMessageDto> {
  let found: OutboxMessageDto | undefined;
  await expect
    .poll(async () => {
      const res = await apiFromPage<{ capturing: boolean; messages: OutboxMessageDto[] }>(admin, 'GET', '/api/admin/outbox');
      expect(res.status).toBe(200);
      expect(res.body.capturing).toBe(true);
      found = res.body.messages.find((m) => match(m) && m.status === 'sent');
      return Boolean(found);
    }, POLL)
    .toBe(true);
  return found!;
}

/** The path of the invitation link in a message (the link's host is the app's public address). */
function invitationPathIn(message: OutboxMessageDto): string {
  const path = /\/invitations\/[A-Za-z0-9_-]+/.exec(message.text)?.[0];
  expect(path, `no invitation link in: ${message.text}`).toBeDefined();
  return path!;
}

describe('remote review in the browser: share, accept, comment, recommend, photo, outbox', () => {
  const baseUrl = inject('baseUrl');
  let browser: Browser;
  const contexts: BrowserContext[] = [];
  let racer: Page; // phone, dark theme: the racer at the track
  let racerDesk: Page;
  let coach: Page; // desktop, light theme: the coach at home
  let coachPhone: Page;
  let admin: Page;
  const outside: string[][] = [];
  let caseId = '';
  let sharedAt = '';
  let recommendedLabel = '';

  const open = async (viewport: typeof PHONE | typeof DESKTOP, theme: 'dark' | 'light') => {
    const { context, page } = await newPage(browser, viewport, theme);
    contexts.push(context);
    outside.push(recordOutsideRequests(page, baseUrl));
    return page;
  };

  beforeAll(async () => {
    browser = await launchChromium();
    racer = await open(PHONE, 'dark');
    racerDesk = await open(DESKTOP, 'light');
    coach = await open(DESKTOP, 'light');
    coachPhone = await open(PHONE, 'dark');
    admin = await open(DESKTOP, 'light');
    await signInQuietly(admin, baseUrl, ADMIN);
  });
  afterAll(async () => {
    for (const context of contexts) await context.close();
    await browser?.close();
  });

  it('the racer shares a new case with the demo coach from the case page (390 px)', { timeout: STEP }, async () => {
    await signInWithForm(racer, baseUrl, RACER);
    const karts = await apiFromPage<{ karts: { id: string; name: string }[] }>(racer, 'GET', '/api/karts');
    const blue = karts.body.karts.find((k) => k.name === 'Blue 27')!;
    const opened = await apiFromPage<{ id: string }>(racer, 'POST', '/api/cases', { kartId: blue.id, symptoms: ['bog-on-acceleration', 'sporadic-running'] });
    expect(opened.status).toBe(201);
    caseId = opened.body.id;

    await racer.goto(`${baseUrl}/cases/${caseId}`);
    const share = racer.getByRole('region', { name: 'Share with a coach or shop' });
    await share.getByLabel('Their e-mail').fill(COACH);
    await share.getByRole('radio', { name: 'Coach' }).click();
    await share.getByRole('radio', { name: 'This case' }).click();
    sharedAt = new Date(Date.now() - 1000).toISOString();
    await share.getByRole('button', { name: 'Send invitation' }).click();
    await racer.getByText(`Invitation sent to ${COACH}`).waitFor();
    const row = share.getByRole('list', { name: 'Shared with' }).getByRole('listitem');
    await expect.poll(() => row.count(), POLL).toBe(1);
    expect(await row.textContent()).toContain('Invited');
    await snapPart(share, 'review-share-panel-phone');

    await signInQuietly(racerDesk, baseUrl, RACER);
    await racerDesk.goto(`${baseUrl}/cases/${caseId}`);
    const deskShare = racerDesk.getByRole('region', { name: 'Share with a coach or shop' });
    await deskShare.getByRole('list', { name: 'Shared with' }).getByText(COACH).waitFor();
    await snapPart(deskShare, 'review-share-panel-desktop');
  });

  it('the coach opens the e-mailed link, accepts, and reviews the case read-only: comment, recommend, ask for a photo', { timeout: STEP }, async () => {
    const invitation = await waitForMail(admin, (m) => m.kind === 'invitation' && m.toEmail === COACH && m.createdAt >= sharedAt);
    expect(invitation.subject).toBe('Tamsin Vell shared a case with you on Fuelwright');

    await signInWithForm(coach, baseUrl, COACH);
    await coach.goto(`${baseUrl}${invitationPathIn(invitation)}`);
    await coach.getByText('Marit Quayle', { exact: false }).first().waitFor();
    await coach.getByRole('button', { name: 'Accept the invitation' }).waitFor();
    await snap(coach, 'review-invitation-desktop');
    await coach.getByRole('button', { name: 'Accept the invitation' }).click();
    await coach.waitForURL(`${baseUrl}/cases/${caseId}`);
    await coach.getByRole('heading', { name: 'Case on Blue 27' }).waitFor();
    await coach.getByText('Tamsin Vell’s case, shared with you to review').waitFor();
    // Read-only for the facts: no walk-through, no abandon, no share panel.
    expect(await coach.getByRole('button', { name: 'Continue the walk-through' }).count()).toBe(0);
    expect(await coach.getByRole('button', { name: 'Abandon' }).count()).toBe(0);
    expect(await coach.getByRole('region', { name: 'Share with a coach or shop' }).count()).toBe(0);

    const comments = coach.getByRole('region', { name: 'Comments' });
    await comments.getByText('No comments yet', { exact: false }).waitFor();
    await comments.getByRole('textbox', { name: 'Add a comment' }).fill(COMMENT);
    await comments.getByRole('button', { name: 'Post comment' }).click();
    await comments.getByRole('list', { name: 'Comments' }).getByText(COMMENT).waitFor();

    // Recommend the last check of the plan: it must come to the top.
    const recommend = coach.getByRole('region', { name: 'Recommend the next check' });
    const select = recommend.getByLabel('Check', { exact: true });
    const options = await select.locator('option').evaluateAll((els) => els.map((e) => ({ value: (e as HTMLOptionElement).value, text: e.textContent ?? '' })));
    expect(options.length).toBeGreaterThan(1);
    const last = options.at(-1)!;
    recommendedLabel = last.text.replace(/^\d+\.\s*/, '').replace(/\s*\(\d+ min\)$/, '');
    await select.selectOption(last.value);
    await recommend.getByLabel('Why this check next').fill(REASON);
    await recommend.getByRole('button', { name: 'Recommend this check' }).click();
    await coach.getByText(`Recommended by Marit Quayle: ${REASON}`).waitFor();
    await expect.poll(() => coach.locator('.fw-next-check').textContent(), POLL).toContain(`Next check: ${recommendedLabel}`);

    const photos = coach.getByRole('region', { name: 'Photos asked for' });
    await photos.getByLabel('What the photo should show').fill(PHOTO_WANTED);
    await photos.getByRole('button', { name: 'Ask for a photo' }).click();
    await photos.getByRole('list', { name: 'Photo requests' }).getByText(PHOTO_WANTED).waitFor();
    expect(await photos.getByText('Waiting for a photo').count()).toBe(1);
    await snap(coach, 'review-case-coach-desktop');

    await signInQuietly(coachPhone, baseUrl, COACH);
    await coachPhone.goto(`${baseUrl}/cases/${caseId}`);
    await coachPhone.getByRole('region', { name: 'Comments' }).getByText(COMMENT).waitFor();
    await coachPhone.getByText(`Recommended by Marit Quayle: ${REASON}`).waitFor();
    await snap(coachPhone, 'review-case-coach-phone');
  });

  it('the coach’s dashboard groups the shared cases by racer', { timeout: STEP }, async () => {
    // A second racer shares a case too (through the API); the coach accepts that link through the API.
    const racer2 = await open(DESKTOP, 'light');
    await signInQuietly(racer2, baseUrl, RACER2);
    const karts = await apiFromPage<{ karts: { id: string; name: string }[] }>(racer2, 'GET', '/api/karts');
    const yellow = karts.body.karts.find((k) => k.name === 'Yellow 8')!;
    const opened = await apiFromPage<{ id: string }>(racer2, 'POST', '/api/cases', { kartId: yellow.id, symptoms: ['hesitation'] });
    expect(opened.status).toBe(201);
    const since = new Date(Date.now() - 1000).toISOString();
    expect((await apiFromPage(racer2, 'POST', '/api/shares', { scope: 'case', caseId: opened.body.id, email: COACH, as: 'coach' })).status).toBe(201);
    const invitation = await waitForMail(admin, (m) => m.kind === 'invitation' && m.toEmail === COACH && m.createdAt >= since);
    const token = invitationPathIn(invitation).split('/').at(-1)!;
    expect((await apiFromPage(coach, 'POST', '/api/invitations/accept', { token })).status).toBe(200);

    for (const [page, name] of [
      [coach, 'review-dashboard-desktop'],
      [coachPhone, 'review-dashboard-phone'],
    ] as const) {
      await page.goto(`${baseUrl}/shared-cases`);
      const tamsin = page.getByRole('region', { name: /Tamsin Vell/ });
      const oskar = page.getByRole('region', { name: /Oskar Brannick/ });
      await tamsin.locator(`[data-case-id="${caseId}"]`).waitFor();
      await oskar.locator(`[data-case-id="${opened.body.id}"]`).waitFor();
      expect(await tamsin.locator(`[data-case-id="${caseId}"]`).textContent()).toContain('1 photo awaited');
      expect(await tamsin.locator(`[data-case-id="${caseId}"]`).textContent()).toContain('1 comment');
      await snap(page, name);
    }
    await coach.getByRole('region', { name: /Tamsin Vell/ }).locator(`[data-case-id="${caseId}"]`).getByRole('link').click();
    await coach.waitForURL(`${baseUrl}/cases/${caseId}`);
  });

  it('the racer sees the comment and the recommended check first, and answers the photo request with an upload', { timeout: STEP }, async () => {
    await racer.goto(`${baseUrl}/cases/${caseId}`);
    await racer.getByText(`Recommended by Marit Quayle: ${REASON}`).waitFor();
    // The catalog's label shows once the catalog has loaded.
    await expect.poll(() => racer.locator('.fw-next-check').textContent(), POLL).toContain(`Next check: ${recommendedLabel}`);
    const comments = racer.getByRole('region', { name: 'Comments' });
    await comments.getByText(COMMENT).waitFor();
    expect(await comments.getByText('Marit Quayle', { exact: true }).count()).toBe(1);
    await comments.getByRole('textbox', { name: 'Add a comment' }).fill('Yes, brown and soft. Photo below.');
    await comments.getByRole('button', { name: 'Post comment' }).click();
    await comments.getByText('Yes, brown and soft. Photo below.').waitFor();
    await snap(racer, 'review-racer-case-phone');
    await snapPart(comments, 'review-racer-comments-phone');

    // A file that only claims to be a picture: the server checks the content and says why.
    const requests = racer.getByRole('region', { name: /Photos asked for/ });
    const request = requests.getByRole('listitem').filter({ hasText: PHOTO_WANTED });
    await request.getByRole('button', { name: 'Answer with a photo' }).click();
    await request.getByLabel('Photo file').setInputFiles({ name: 'foam.png', mimeType: 'image/png', buffer: Buffer.from('not a picture at all') });
    await request.getByRole('button', { name: 'Upload photo' }).click();
    await request.getByText('Only JPEG, PNG and WebP photos are accepted (checked by content, not by name).').waitFor();

    const png = await sharp({ create: { width: 320, height: 240, channels: 3, background: '#8a5a2b' } }).png().toBuffer();
    await request.getByRole('button', { name: 'Choose another' }).click();
    await request.getByLabel('Photo file').setInputFiles({ name: 'foam.png', mimeType: 'image/png', buffer: png });
    await request.getByLabel('Caption (optional)').fill('Foam blocks out of the bowl');
    await request.getByRole('button', { name: 'Upload photo' }).click();
    await request.getByText('Answered').waitFor();

    const gallery = racer.getByRole('region', { name: 'Photos', exact: true });
    const thumb = gallery.getByRole('img', { name: 'Foam blocks out of the bowl' });
    await thumb.waitFor();
    await expect.poll(() => thumb.evaluate((img) => (img as HTMLImageElement).complete && (img as HTMLImageElement).naturalWidth), POLL).toBeGreaterThan(0);
    const link = gallery.getByRole('link', { name: 'Open the full photo: Foam blocks out of the bowl' });
    expect(await link.getAttribute('href')).toMatch(/^\/api\/photos\/[0-9a-f-]{36}$/);
    const full = await apiFromPage<null>(racer, 'GET', (await link.getAttribute('href'))!);
    expect(full.status).toBe(200);
    await snapPart(gallery, 'review-photos-phone');

    await racerDesk.goto(`${baseUrl}/cases/${caseId}`);
    await racerDesk.getByText(`Recommended by Marit Quayle: ${REASON}`).waitFor();
    await racerDesk.getByRole('region', { name: 'Comments' }).getByText('Yes, brown and soft. Photo below.').waitFor();
    const deskGallery = racerDesk.getByRole('region', { name: 'Photos', exact: true });
    await deskGallery.getByRole('img', { name: 'Foam blocks out of the bowl' }).waitFor();
    await snap(racerDesk, 'review-racer-case-desktop');
    await snapPart(racerDesk.getByRole('region', { name: 'Comments' }), 'review-racer-comments-desktop');
    await snapPart(deskGallery, 'review-photos-desktop');

    // Each kind of notice can be turned off (the notices' own links do the same for one kind).
    await racer.goto(`${baseUrl}/account/e-mails`);
    await racer.getByRole('checkbox', { name: 'New comments on a case' }).waitFor();
    expect(await racer.getByRole('checkbox').count()).toBe(5);
    await snap(racer, 'review-email-settings-phone');

    // The coach sees the answer.
    await coach.reload();
    await coach.getByRole('region', { name: 'Photos asked for' }).getByText('Answered').waitFor();
  });

  it('the admin’s outbox shows the notices: invitation, comment, check recommended', { timeout: STEP }, async () => {
    await waitForMail(admin, (m) => m.kind === 'comment' && m.toEmail === RACER && m.createdAt >= sharedAt);
    await waitForMail(admin, (m) => m.kind === 'check-recommended' && m.toEmail === RACER && m.createdAt >= sharedAt);
    await waitForMail(admin, (m) => m.kind === 'comment' && m.toEmail === COACH && m.createdAt >= sharedAt);

    await admin.goto(`${baseUrl}/admin/outbox`);
    const list = admin.getByRole('list', { name: 'Messages' });
    for (const kind of ['invitation', 'comment', 'check-recommended', 'photo-requested']) {
      await list.locator(`[data-kind="${kind}"]`).first().waitFor();
    }
    const invitation = list.locator('[data-kind="invitation"]').filter({ hasText: 'Tamsin Vell shared a case' }).first();
    expect(await invitation.textContent()).toContain(COACH);
    expect(await invitation.textContent()).toContain('Sent');
    await invitation.getByRole('button', { name: 'Show the message' }).click();
    await invitation.getByText('/invitations/', { exact: false }).waitFor();
    await invitation.getByRole('radio', { name: 'HTML' }).click();
    const frame = invitation.locator('iframe');
    await invitation.frameLocator('iframe').getByText('See what was shared').waitFor();
    expect(await frame.getAttribute('sandbox')).toBe('');
    expect(await frame.getAttribute('srcdoc')).toContain('/invitations/');
    await snap(admin, 'review-outbox-desktop');
    // Chromium leaves the sandboxed frame out of full-page captures: the message card on its own shows it.
    await snapPart(invitation, 'review-outbox-message-desktop');

    const adminPhone = await open(PHONE, 'dark');
    await signInQuietly(adminPhone, baseUrl, ADMIN);
    await adminPhone.goto(`${baseUrl}/admin/outbox`);
    const phoneList = adminPhone.getByRole('list', { name: 'Messages' });
    await phoneList.locator('[data-kind="check-recommended"]').first().waitFor();
    const notice = phoneList.locator('[data-kind="check-recommended"]').first();
    await notice.getByRole('button', { name: 'Show the message' }).click();
    await notice.locator('pre').waitFor();
    await snap(adminPhone, 'review-outbox-phone');

    expect(outside.flat()).toEqual([]);
  });
});
