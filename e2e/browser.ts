import { mkdirSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { chromium, type Browser, type BrowserContext, type Locator, type Page } from 'playwright-core';
import { expect } from 'vitest';
import type { CreateShareRequest, OutboxMessageDto } from '@fuelwright/shared';

/** Debian's Chromium; Playwright's own browser downloads are never used. */
export const CHROMIUM_PATH = process.env.CHROMIUM_PATH || '/usr/bin/chromium';

export const SCREENSHOT_DIR = fileURLToPath(new URL('../screenshots/', import.meta.url));

export const PHONE = { width: 390, height: 844 } as const;
export const DESKTOP = { width: 1366, height: 900 } as const;

/** The demo club's password (every demo user has it). */
export const DEMO_PASSWORD = 'fuelwright-demo';
/** expect.poll for what the app does in the background (the outbox is sent every 2 s) on a loaded machine. */
export const POLL = { timeout: 30_000, interval: 250 };

export function launchChromium(): Promise<Browser> {
  return chromium.launch({
    executablePath: CHROMIUM_PATH,
    args: [
      '--headless',
      '--no-sandbox',
      '--disable-gpu',
      '--disable-quic',
      '--no-first-run',
      '--disable-background-networking',
      '--disable-component-update',
      '--disable-sync',
    ],
  });
}

export async function newPage(
  browser: Browser,
  viewport: { width: number; height: number },
  theme?: 'dark' | 'light',
): Promise<{ context: BrowserContext; page: Page }> {
  const context = await browser.newContext({ viewport, hasTouch: viewport.width < 600 });
  if (theme) {
    await context.addInitScript((t) => window.localStorage.setItem('fuelwright.theme', t), theme);
  }
  const page = await context.newPage();
  return { context, page };
}

/**
 * Several pages on one browser, each in its own context, each recording any request that leaves
 * the app; `close()` closes every context, `outside()` lists the requests that left.
 */
export function trackedPages(baseUrl: string) {
  const contexts: BrowserContext[] = [];
  const outside: string[][] = [];
  return {
    async open(browser: Browser, viewport: { width: number; height: number }, theme: 'dark' | 'light'): Promise<Page> {
      const { context, page } = await newPage(browser, viewport, theme);
      contexts.push(context);
      outside.push(recordOutsideRequests(page, baseUrl));
      return page;
    },
    outside: () => outside.flat(),
    async close(): Promise<void> {
      for (const context of contexts) await context.close();
    },
  };
}

/** Saves a screenshot under screenshots/ (git-ignored) for a person to look at. */
export async function snap(page: Page, name: string): Promise<void> {
  mkdirSync(SCREENSHOT_DIR, { recursive: true });
  await page.screenshot({ path: `${SCREENSHOT_DIR}${name}.png`, fullPage: true });
}

/** Any request the page makes to another host: the app must fetch nothing from outside. */
export function recordOutsideRequests(page: Page, baseUrl: string): string[] {
  const outside: string[] = [];
  page.on('request', (req) => {
    const url = req.url();
    if (!url.startsWith(baseUrl) && !url.startsWith('data:') && !url.startsWith('blob:')) outside.push(url);
  });
  return outside;
}

/** Closes the toasts that would cover a part of the page. */
export async function dismissToasts(page: Page): Promise<void> {
  const close = page.getByRole('button', { name: 'Close', exact: true });
  for (let n = await close.count(); n > 0; n = await close.count()) {
    await close.first().click();
    await expect.poll(() => close.count(), POLL).toBeLessThan(n);
  }
}

/** A full-page screenshot from the top, toasts closed (the sticky navbar is drawn where the page is scrolled to). */
export async function snapTop(page: Page, name: string): Promise<void> {
  await dismissToasts(page);
  await page.evaluate(() => window.scrollTo(0, 0));
  await snap(page, name);
}

/** A screenshot of one part of the page, toasts closed. */
export async function snapPart(locator: Locator, name: string): Promise<void> {
  mkdirSync(SCREENSHOT_DIR, { recursive: true });
  await dismissToasts(locator.page());
  await locator.scrollIntoViewIfNeeded();
  await locator.screenshot({ path: `${SCREENSHOT_DIR}${name}.png` });
}

/** Calls the API from inside the page (same origin, the session cookie goes along). */
export async function apiFromPage<T>(page: Page, method: string, path: string, body?: unknown): Promise<{ status: number; body: T }> {
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

/** Signs a demo user in through the form, as a person does. */
export async function signInWithForm(page: Page, baseUrl: string, email: string): Promise<void> {
  await page.goto(`${baseUrl}/sign-in`);
  await page.fill('#sign-in-email', email);
  await page.fill('#sign-in-password', DEMO_PASSWORD);
  await page.getByRole('form', { name: 'Sign in' }).getByRole('button', { name: 'Sign in' }).click();
  await page.waitForURL(`${baseUrl}/home`);
}

/** Signs a demo user in through the API (for the extra windows that only take screenshots or set things up). */
export async function signInQuietly(page: Page, baseUrl: string, email: string): Promise<void> {
  await page.goto(`${baseUrl}/conditions`);
  const res = await apiFromPage(page, 'POST', '/api/auth/sign-in', { email, password: DEMO_PASSWORD });
  expect(res.status).toBe(200);
}

/**
 * Polls the admin's outbox (`admin` is a page signed in as an admin; the app sends the outbox to
 * the local capture server every 2 s) until a message matches and is sent.
 */
export async function waitForMail(admin: Page, match: (m: OutboxMessageDto) => boolean): Promise<OutboxMessageDto> {
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

/** The invitation sent to `email` since `since` (an ISO time), once it is sent. */
export function waitForInvitation(admin: Page, email: string, since: string): Promise<OutboxMessageDto> {
  return waitForMail(admin, (m) => m.kind === 'invitation' && m.toEmail === email && m.createdAt >= since);
}

/** The path of the invitation link in a message (the link's host is the app's public address). */
export function invitationPathIn(message: OutboxMessageDto): string {
  const path = /\/invitations\/[A-Za-z0-9_-]+/.exec(message.text)?.[0];
  expect(path, `no invitation link in: ${message.text}`).toBeDefined();
  return path!;
}

/**
 * Shares a case by e-mail and accepts it, through the API: the owner (signed in on `owner`) shares
 * the case with `email`, the invitation goes out, and the recipient (already signed in on
 * `recipient`) accepts the token of the e-mailed link. Returns the invitation.
 */
export async function shareCaseAndAccept(options: {
  owner: Page;
  admin: Page;
  recipient: Page;
  caseId: string;
  email: string;
  as: CreateShareRequest['as'];
}): Promise<OutboxMessageDto> {
  const { owner, admin, recipient, caseId, email, as } = options;
  const since = new Date(Date.now() - 1000).toISOString();
  const request: CreateShareRequest = { scope: 'case', caseId, email, as };
  const shared = await apiFromPage(owner, 'POST', '/api/shares', request);
  expect(shared.status, JSON.stringify(shared.body)).toBe(201);
  const invitation = await waitForInvitation(admin, email, since);
  const token = invitationPathIn(invitation).split('/').at(-1)!;
  const accepted = await apiFromPage(recipient, 'POST', '/api/invitations/accept', { token });
  expect(accepted.status, JSON.stringify(accepted.body)).toBe(200);
  return invitation;
}
