import { mkdirSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { chromium, type Browser, type BrowserContext, type Page } from 'playwright-core';

/** Debian's Chromium; Playwright's own browser downloads are never used. */
export const CHROMIUM_PATH = process.env.CHROMIUM_PATH || '/usr/bin/chromium';

export const SCREENSHOT_DIR = fileURLToPath(new URL('../screenshots/', import.meta.url));

export const PHONE = { width: 390, height: 844 } as const;
export const DESKTOP = { width: 1366, height: 900 } as const;

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
