import { existsSync, mkdtempSync, readFileSync, rmSync, statSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { ConfigError, loadAppConfig } from './app.config.js';

const GOOD_SECRET = 'a-deployment-secret-that-is-long-enough-0123';

describe('configuration read at start-up', () => {
  let dataDir: string;
  beforeEach(() => {
    dataDir = mkdtempSync(join(tmpdir(), 'fw-config-'));
  });
  afterEach(() => {
    vi.restoreAllMocks();
    rmSync(dataDir, { recursive: true, force: true });
  });

  /** Loads with only the given variables (never the test process's own environment). */
  const load = (env: Record<string, string>) => loadAppConfig({ DATA_DIR: dataDir, SESSION_SECRET: GOOD_SECRET, ...env });

  it.each([
    ['PORT', '70000'],
    ['PORT', '-1'],
    ['PORT', 'http'],
    ['PORT', '3000.5'],
    ['SESSION_DAYS', '0'],
    ['SESSION_DAYS', '366'],
    ['THROTTLE_LIMIT', '0'],
    ['THROTTLE_TTL_MS', '10'],
    ['MAIL_CAPTURE_PORT', '65536'],
    ['MAIL_POLL_MS', 'often'],
    ['COOKIE_SECURE', 'maybe'],
    ['SEED_DEMO', 'sometimes'],
    ['DATABASE_URL', 'mysql://db.example.test/fuelwright'],
    ['SMTP_URL', 'http://mail.example.test'],
  ])('refuses %s=%s with a message naming the variable', (name, value) => {
    let error: unknown;
    try {
      load({ [name]: value });
    } catch (e) {
      error = e;
    }
    expect(error).toBeInstanceOf(ConfigError);
    expect((error as Error).message).toContain(name);
  });

  it('reads good values and falls back to the documented defaults', () => {
    const c = load({ PORT: '8080', COOKIE_SECURE: 'false', SEED_DEMO: 'no', DATABASE_URL: 'postgresql://db.example.test/fw' });
    expect(c).toMatchObject({ port: 8080, cookieSecure: false, seedDemo: false, databaseUrl: 'postgresql://db.example.test/fw' });
    const d = load({});
    expect(d).toMatchObject({ port: 3000, host: '127.0.0.1', sessionDays: 30, cookieSecure: false, seedDemo: true, dataDir });
    expect(d.databaseUrl).toBeUndefined();
  });

  it('in production requires SESSION_SECRET and does not generate one', () => {
    expect(() => loadAppConfig({ NODE_ENV: 'production', DATA_DIR: dataDir })).toThrow(
      /SESSION_SECRET is required when NODE_ENV=production/,
    );
    expect(existsSync(join(dataDir, 'session-secret'))).toBe(false);
    const c = loadAppConfig({ NODE_ENV: 'production', DATA_DIR: dataDir, SESSION_SECRET: GOOD_SECRET, SMTP_URL: 'smtp://mail.example.test:587' });
    expect(c.sessionSecret).toBe(GOOD_SECRET);
    // Production cookies are Secure unless told otherwise.
    expect(c.cookieSecure).toBe(true);
    expect(existsSync(join(dataDir, 'session-secret'))).toBe(false);
  });

  it('in production requires SMTP_URL, so no mail (with its reset and invitation links) goes to the local capture', () => {
    expect(() => loadAppConfig({ NODE_ENV: 'production', DATA_DIR: dataDir, SESSION_SECRET: GOOD_SECRET })).toThrow(/SMTP_URL is required when NODE_ENV=production/);
    expect(loadAppConfig({ DATA_DIR: dataDir, SESSION_SECRET: GOOD_SECRET }).smtpUrl).toBeUndefined();
  });

  it('refuses a SESSION_SECRET shorter than 32 characters, in production and in development', () => {
    const short = 'x'.repeat(31);
    expect(() => loadAppConfig({ NODE_ENV: 'production', DATA_DIR: dataDir, SESSION_SECRET: short })).toThrow(
      /SESSION_SECRET must be at least 32 characters/,
    );
    expect(() => loadAppConfig({ DATA_DIR: dataDir, SESSION_SECRET: short })).toThrow(/SESSION_SECRET/);
    expect(loadAppConfig({ DATA_DIR: dataDir, SESSION_SECRET: 'x'.repeat(32) }).sessionSecret).toBe('x'.repeat(32));
  });

  it('in development generates a secret in the data folder (owner-only), reuses it on the next start, and never prints it', () => {
    const printed: string[] = [];
    const capture = (chunk: unknown) => {
      printed.push(String(chunk));
      return true;
    };
    vi.spyOn(process.stdout, 'write').mockImplementation(capture);
    vi.spyOn(process.stderr, 'write').mockImplementation(capture);
    for (const method of ['log', 'info', 'warn', 'error', 'debug'] as const) {
      vi.spyOn(console, method).mockImplementation((...args: unknown[]) => void printed.push(args.map(String).join(' ')));
    }

    const first = loadAppConfig({ DATA_DIR: dataDir });
    const file = join(dataDir, 'session-secret');
    expect(first.sessionSecret.length).toBeGreaterThanOrEqual(32);
    expect(readFileSync(file, 'utf8').trim()).toBe(first.sessionSecret);
    // Readable and writable by the owner only.
    expect(statSync(file).mode & 0o777).toBe(0o600);

    const second = loadAppConfig({ DATA_DIR: dataDir });
    expect(second.sessionSecret).toBe(first.sessionSecret);

    vi.restoreAllMocks();
    expect(printed.some((line) => line.includes(first.sessionSecret))).toBe(false);
  });

  it('creates a missing data folder for the secret, and a different folder gets a different secret', () => {
    const nested = join(dataDir, 'not', 'yet');
    const a = loadAppConfig({ DATA_DIR: nested }).sessionSecret;
    expect(readFileSync(join(nested, 'session-secret'), 'utf8').trim()).toBe(a);
    const b = loadAppConfig({ DATA_DIR: join(dataDir, 'other') }).sessionSecret;
    expect(b).not.toBe(a);
  });

  it('replaces a damaged (too short) secret file rather than using it', () => {
    writeFileSync(join(dataDir, 'session-secret'), 'short\n', { mode: 0o644 });
    const c = loadAppConfig({ DATA_DIR: dataDir });
    expect(c.sessionSecret.length).toBeGreaterThanOrEqual(32);
    expect(readFileSync(join(dataDir, 'session-secret'), 'utf8').trim()).toBe(c.sessionSecret);
    expect(statSync(join(dataDir, 'session-secret')).mode & 0o777).toBe(0o600);
  });
});
