// Screenshots of the built UI at phone and desktop widths in both themes, with the API faked,
// for looking over the shell by eye. Build first (`npx vite build` in ui/), then from the repo root:
//   node ui/scripts/screenshots.mjs [outDir]      (default: screenshots/, git-ignored)
// Uses Debian's Chromium through playwright-core (never `playwright install`).
import { mkdirSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { preview } from 'vite';
import { chromium } from 'playwright-core';

const uiDir = fileURLToPath(new URL('..', import.meta.url));
const outDir = process.argv[2] ?? fileURLToPath(new URL('../../screenshots', import.meta.url));
mkdirSync(outDir, { recursive: true });

const USERS = {
  racer: { id: 'u1', email: 'racer@example.test', displayName: 'Robin Racer', role: 'racer', createdAt: '2026-03-02T09:00:00Z' },
  coach: { id: 'u2', email: 'coach@example.test', displayName: 'Casey Coach', role: 'coach', createdAt: '2026-02-11T09:00:00Z' },
  shop: { id: 'u3', email: 'shop@example.test', displayName: 'Sidney Shop', role: 'shop', createdAt: '2026-01-20T09:00:00Z' },
  admin: { id: 'u4', email: 'admin@example.test', displayName: 'Alex Admin', role: 'admin', createdAt: '2025-12-01T09:00:00Z' },
};

/** Fakes the API for one page: `who` is a role or null for a visitor. */
async function fakeApi(page, who, base) {
  await page.route(`${base}/api/**`, async (route) => {
    const url = new URL(route.request().url());
    const method = route.request().method();
    const json = (status, body) => route.fulfill({ status, contentType: 'application/json', body: JSON.stringify(body) });
    if (url.pathname === '/api/auth/me') {
      return who ? json(200, { user: USERS[who] }) : json(401, { statusCode: 401, error: 'Unauthorized', message: 'Sign in first.' });
    }
    if (url.pathname === '/api/users' && method === 'GET') return json(200, { users: Object.values(USERS) });
    if (url.pathname === '/api/auth/sign-in') {
      return json(400, {
        statusCode: 400,
        error: 'Bad Request',
        message: 'Some fields are not valid.',
        fields: { email: ['Enter a valid e-mail address.'] },
      });
    }
    return json(404, { statusCode: 404, error: 'Not Found', message: 'No such route.' });
  });
}

const SHOTS = [
  { name: 'landing', path: '/', who: null },
  { name: 'quick-diagnosis', path: '/diagnose', who: null },
  { name: 'sign-in-errors', path: '/sign-in', who: null, act: signInWithErrors },
  { name: 'sign-up', path: '/sign-up', who: null },
  { name: 'home-racer', path: '/home', who: 'racer' },
  { name: 'home-coach', path: '/home', who: 'coach' },
  { name: 'home-shop', path: '/home', who: 'shop' },
  { name: 'home-admin', path: '/home', who: 'admin' },
  { name: 'admin-users', path: '/admin/users', who: 'admin' },
  { name: 'coming-next-karts', path: '/karts', who: 'racer' },
  { name: 'forbidden', path: '/admin/users', who: 'racer' },
  { name: 'not-found', path: '/no/such/page', who: 'racer' },
  { name: 'menu-drawer', path: '/home', who: 'racer', phoneOnly: true, act: openDrawer },
];

async function signInWithErrors(page) {
  await page.getByLabel('E-mail').fill('robin-at-example');
  await page.getByLabel('Password', { exact: true }).fill('not the password');
  await page.getByRole('form', { name: 'Sign in' }).getByRole('button', { name: 'Sign in' }).click();
  await page.getByText('Enter a valid e-mail address.').waitFor();
}

async function openDrawer(page) {
  await page.getByRole('button', { name: 'Open menu' }).click();
  await page.getByRole('navigation', { name: 'Main' }).waitFor();
  await page.waitForTimeout(400); // drawer slide-in
}

const VIEWPORTS = { phone: { width: 390, height: 844 }, desktop: { width: 1366, height: 900 } };

const server = await preview({ root: uiDir, configFile: `${uiDir}/vite.config.ts`, preview: { port: 0, strictPort: false }, logLevel: 'warn' });
const base = server.resolvedUrls.local[0].replace(/\/$/, '');
const browser = await chromium.launch({
  executablePath: process.env.CHROMIUM_PATH ?? '/usr/bin/chromium',
  args: ['--headless', '--no-sandbox', '--disable-gpu', '--disable-quic', '--no-first-run', '--disable-background-networking', '--disable-component-update', '--disable-sync'],
});
const external = new Set();
let count = 0;
try {
  for (const [vpName, viewport] of Object.entries(VIEWPORTS)) {
    for (const theme of ['light', 'dark']) {
      const context = await browser.newContext({ viewport, deviceScaleFactor: 1, hasTouch: vpName === 'phone' });
      await context.addInitScript((t) => window.localStorage.setItem('fuelwright.theme', t), theme);
      for (const shot of SHOTS) {
        if (shot.phoneOnly && vpName !== 'phone') continue;
        const page = await context.newPage();
        page.on('request', (request) => {
          if (!request.url().startsWith(base)) external.add(request.url());
        });
        page.on('pageerror', (error) => console.error(`${shot.name}: page error: ${error.message}`));
        await fakeApi(page, shot.who, base);
        await page.goto(base + shot.path, { waitUntil: 'networkidle' });
        await page.locator('main h1').first().waitFor();
        if (shot.act) await shot.act(page);
        await page.evaluate(() => document.fonts.ready);
        await page.screenshot({ path: `${outDir}/${shot.name}-${vpName}-${theme}.png`, fullPage: true });
        count += 1;
        await page.close();
      }
      await context.close();
    }
  }
} finally {
  await browser.close();
  await server.close();
}
console.log(`screenshots: ${count} written to ${outDir}`);
if (external.size > 0) {
  console.error(`screenshots: requests outside the app: ${[...external].join(', ')}`);
  process.exitCode = 1;
}
