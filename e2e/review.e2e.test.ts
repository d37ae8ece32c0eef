import sharp from 'sharp';
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import type { Browser, Page } from 'playwright-core';
import { DESKTOP, PHONE, POLL, apiFromPage, invitationPathIn, launchChromium, trackedPages, shareCaseAndAccept, signInQuietly, signInWithForm, snapPart, snapTop, waitForInvitation, waitForMail } from './browser.js';

const RACER = 'racer@fuelwright.test';
const RACER2 = 'racer2@fuelwright.test';
const COACH = 'coach@fuelwright.test';
const ADMIN = 'admin@fuelwright.test';
/** Unique per run, so this test's rows stand apart from other browser tests on the same demo club. */
const RUN = Date.now().toString(36).slice(-5);
const COMMENT = `Is the foam in the bowl crumbling? (${RUN})`;
const REASON = `The foam is the oldest part on this kart (${RUN})`;
const PHOTO_WANTED = `The foam blocks, out of the bowl (${RUN})`;
const STEP = 120_000;

describe('remote review in the browser: share, accept, comment, recommend, photo, outbox', () => {
  const baseUrl = inject('baseUrl');
  let browser: Browser;
  let racer: Page; // phone, dark theme: the racer at the track
  let racerDesk: Page;
  let coach: Page; // desktop, light theme: the coach at home
  let coachPhone: Page;
  let admin: Page;
  let caseId = '';
  let sharedAt = '';
  let recommendedLabel = '';

  const pages = trackedPages(baseUrl);
  const open = (viewport: typeof PHONE | typeof DESKTOP, theme: 'dark' | 'light') => pages.open(browser, viewport, theme);

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
    await pages.close();
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
    const invitation = await waitForInvitation(admin, COACH, sharedAt);
    expect(invitation.subject).toBe('Tamsin Vell shared a case with you on Fuelwright');

    await signInWithForm(coach, baseUrl, COACH);
    await coach.goto(`${baseUrl}${invitationPathIn(invitation)}`);
    await coach.getByText('Marit Quayle', { exact: false }).first().waitFor();
    await coach.getByRole('button', { name: 'Accept the invitation' }).waitFor();
    await snapTop(coach, 'review-invitation-desktop');
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
    await snapTop(coach, 'review-case-coach-desktop');

    await signInQuietly(coachPhone, baseUrl, COACH);
    await coachPhone.goto(`${baseUrl}/cases/${caseId}`);
    await coachPhone.getByRole('region', { name: 'Comments' }).getByText(COMMENT).waitFor();
    await coachPhone.getByText(`Recommended by Marit Quayle: ${REASON}`).waitFor();
    await snapTop(coachPhone, 'review-case-coach-phone');
  });

  it('the coach’s dashboard groups the shared cases by racer', { timeout: STEP }, async () => {
    // A second racer shares a case too (through the API); the coach accepts that link through the API.
    const racer2 = await open(DESKTOP, 'light');
    await signInQuietly(racer2, baseUrl, RACER2);
    const karts = await apiFromPage<{ karts: { id: string; name: string }[] }>(racer2, 'GET', '/api/karts');
    const yellow = karts.body.karts.find((k) => k.name === 'Yellow 8')!;
    const opened = await apiFromPage<{ id: string }>(racer2, 'POST', '/api/cases', { kartId: yellow.id, symptoms: ['hesitation'] });
    expect(opened.status).toBe(201);
    await shareCaseAndAccept({ owner: racer2, admin, recipient: coach, caseId: opened.body.id, email: COACH, as: 'coach' });

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
      await snapTop(page, name);
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
    await snapTop(racer, 'review-racer-case-phone');
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
    await snapTop(racerDesk, 'review-racer-case-desktop');
    await snapPart(racerDesk.getByRole('region', { name: 'Comments' }), 'review-racer-comments-desktop');
    await snapPart(deskGallery, 'review-photos-desktop');

    // Each kind of notice can be turned off (the notices' own links do the same for one kind).
    await racer.goto(`${baseUrl}/account/e-mails`);
    await racer.getByRole('checkbox', { name: 'New comments on a case' }).waitFor();
    await racer.getByRole('checkbox', { name: 'A photo added to a case' }).waitFor();
    await racer.getByRole('checkbox', { name: 'Progress on a shared case' }).waitFor();
    expect(await racer.getByRole('checkbox').count()).toBe(7);
    await snapTop(racer, 'review-email-settings-phone');

    // The coach sees the answer.
    await coach.reload();
    await coach.getByRole('region', { name: 'Photos asked for' }).getByText('Answered').waitFor();
  });

  it('the admin’s outbox shows the notices: invitation, comment, check recommended, photo added', { timeout: STEP }, async () => {
    await waitForMail(admin, (m) => m.kind === 'comment' && m.toEmail === RACER && m.createdAt >= sharedAt);
    await waitForMail(admin, (m) => m.kind === 'photo-added' && m.toEmail === COACH && m.createdAt >= sharedAt);
    await waitForMail(admin, (m) => m.kind === 'check-recommended' && m.toEmail === RACER && m.createdAt >= sharedAt);
    await waitForMail(admin, (m) => m.kind === 'comment' && m.toEmail === COACH && m.createdAt >= sharedAt);

    await admin.goto(`${baseUrl}/admin/outbox`);
    const list = admin.getByRole('list', { name: 'Messages' });
    for (const kind of ['invitation', 'comment', 'check-recommended', 'photo-requested', 'photo-added']) {
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
    await snapTop(admin, 'review-outbox-desktop');
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
    await snapTop(adminPhone, 'review-outbox-phone');

    expect(pages.outside()).toEqual([]);
  });
});
