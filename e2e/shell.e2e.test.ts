import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { inject } from 'vitest';
import type { Browser, Locator } from 'playwright-core';
import { DESKTOP, PHONE, launchChromium, newPage, recordOutsideRequests, snap } from './browser.js';

const baseUrl = inject('baseUrl');

const ROLES = [
  { email: 'racer@fuelwright.test', name: 'Tamsin Vell', lead: /Your karts, your open cases/ },
  { email: 'coach@fuelwright.test', name: 'Marit Quayle', lead: /Cases your racers share with you/ },
  { email: 'shop@fuelwright.test', name: 'Gearpit Workshop (invented)', lead: /Work orders for customers/ },
  { email: 'admin@fuelwright.test', name: 'Rune Alder', lead: /Accounts and roles/ },
] as const;

/**
 * Minimum touch target, 44 x 44 CSS px: Apple Human Interface Guidelines (Layout, "at least 44x44
 * points") and WCAG 2.2 success criterion 2.5.5 Target Size (Enhanced).
 */
const TOUCH_PX = 44;

/** Every visible element the locator matches that is smaller than a touch target, described. */
async function smallTargets(targets: Locator): Promise<string[]> {
  const small: string[] = [];
  for (const target of await targets.all()) {
    if (!(await target.isVisible())) continue;
    const box = await target.boundingBox();
    if (!box) continue;
    if (box.height < TOUCH_PX || box.width < TOUCH_PX) {
      const name = await target.evaluate(
        (el) => `${el.tagName.toLowerCase()} "${(el.getAttribute('aria-label') || el.textContent || el.getAttribute('name') || '').trim()}"`,
      );
      small.push(`${name}: ${box.width.toFixed(1)} x ${box.height.toFixed(1)} px`);
    }
  }
  return small;
}

describe('the app shell in Chromium', () => {
  let browser: Browser;
  beforeAll(async () => {
    browser = await launchChromium();
  });
  afterAll(() => browser?.close());

  for (const theme of ['dark', 'light'] as const) {
    for (const role of ROLES) {
      it(`signs in as ${role.email} at 390 px (${theme}) and shows that role's home, fetching nothing from outside`, async () => {
        const { context, page } = await newPage(browser, PHONE, theme);
        const outside = recordOutsideRequests(page, baseUrl);
        await page.goto(`${baseUrl}/sign-in`);
        await page.getByLabel('E-mail').fill(role.email);
        await page.getByLabel('Password', { exact: true }).fill('fuelwright-demo');
        await page.getByRole('button', { name: 'Sign in' }).click();
        try {
          await page.getByRole('heading', { name: `Hello, ${role.name}` }).waitFor();
        } catch (e) {
          await snap(page, `shell-failed-${role.email.split('@')[0]}-${theme}`);
          throw e;
        }
        await expect(page.getByText(role.lead).count()).resolves.toBeGreaterThan(0);
        const isDark = await page.evaluate(() => document.documentElement.classList.contains('bp6-dark') || document.body.classList.contains('bp6-dark'));
        expect(isDark).toBe(theme === 'dark');
        // The font is the one the app ships.
        const font = await page.evaluate(() => getComputedStyle(document.body).fontFamily);
        expect(font).toMatch(/Noto Sans/);
        await page.evaluate(() => document.fonts.ready);
        expect(await page.evaluate(() => document.fonts.check('16px "Noto Sans"'))).toBe(true);
        // Nothing sticks out sideways at phone width.
        expect(await page.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(PHONE.width);
        await snap(page, `shell-home-${role.email.split('@')[0]}-phone-${theme}`);
        expect(outside).toEqual([]);
        await context.close();
      });
    }
  }

  it('gives the navbar, the phone menu and the sign-in form touch targets of at least 44 px at 390 px', async () => {
    const { context, page } = await newPage(browser, PHONE, 'light');
    await page.goto(`${baseUrl}/sign-in`);
    const form = page.getByRole('form', { name: 'Sign in' });
    await form.waitFor();
    const formControls = form.locator('input:not([type=hidden]), button');
    expect(await formControls.count()).toBeGreaterThanOrEqual(3);
    expect(await smallTargets(formControls)).toEqual([]);
    const navbar = page.locator('.fw-navbar');
    expect(await smallTargets(navbar.locator('button, a'))).toEqual([]);

    await form.getByLabel('E-mail').fill('racer@fuelwright.test');
    await form.getByLabel('Password', { exact: true }).fill('fuelwright-demo');
    await form.getByRole('button', { name: 'Sign in' }).click();
    await page.getByRole('heading', { name: 'Hello, Tamsin Vell' }).waitFor();
    const navbarTargets = navbar.locator('button, a');
    expect(await navbarTargets.count()).toBeGreaterThanOrEqual(3);
    expect(await smallTargets(navbarTargets)).toEqual([]);

    await page.getByRole('button', { name: 'Open menu' }).click();
    const drawer = page.locator('.fw-nav-drawer');
    await drawer.getByRole('menuitem').first().waitFor();
    const menuItems = drawer.getByRole('menuitem');
    expect(await menuItems.count()).toBeGreaterThanOrEqual(3);
    expect(await smallTargets(menuItems)).toEqual([]);
    // The drawer's other controls: close, the theme switch (its label is the target), sign out.
    expect(await smallTargets(drawer.locator('button, label.fw-theme-switch'))).toEqual([]);
    await snap(page, 'shell-touch-targets-drawer-phone');
    await context.close();
  });

  it('lets a visitor sign up (a new racer) and keeps what was typed on an error', async () => {
    const { context, page } = await newPage(browser, DESKTOP, 'light');
    await page.goto(`${baseUrl}/sign-up`);
    await page.getByLabel('Your name').fill('New Visitor');
    await page.getByLabel('E-mail').fill('racer@fuelwright.test');
    await page.getByLabel('Password', { exact: true }).fill('a long enough password');
    await page.getByRole('form', { name: 'Create account' }).getByRole('button', { name: 'Create account' }).click();
    await page.getByText(/already exists/).waitFor();
    expect(await page.getByLabel('Your name').inputValue()).toBe('New Visitor');
    await page.getByLabel('E-mail').fill(`visitor.${Date.now()}@example.test`);
    await page.getByRole('form', { name: 'Create account' }).getByRole('button', { name: 'Create account' }).click();
    await page.getByRole('heading', { name: 'Hello, New Visitor' }).waitFor();
    await snap(page, 'shell-after-sign-up-desktop');
    await context.close();
  });

  it('sends a visitor who opens a signed-in page to sign-in, and back after signing in', async () => {
    const { context, page } = await newPage(browser, PHONE, 'dark');
    await page.goto(`${baseUrl}/cases`);
    await page.waitForURL(/\/sign-in\?next=%2Fcases/);
    await page.getByLabel('E-mail').fill('racer@fuelwright.test');
    await page.getByLabel('Password', { exact: true }).fill('fuelwright-demo');
    await page.getByRole('button', { name: 'Sign in' }).click();
    await page.waitForURL(/\/cases$/);
    await context.close();
  });
});
