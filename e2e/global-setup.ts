import { spawn, execFileSync, type ChildProcess } from 'node:child_process';
import { cpSync, existsSync, mkdtempSync, rmSync } from 'node:fs';
import { createServer } from 'node:net';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import type { TestProject } from 'vitest/node';
import { CHROMIUM_PATH } from './browser.js';

declare module 'vitest' {
  export interface ProvidedContext {
    baseUrl: string;
  }
}

const ROOT = fileURLToPath(new URL('..', import.meta.url));

function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const srv = createServer();
    srv.unref();
    srv.on('error', reject);
    srv.listen(0, '127.0.0.1', () => {
      const { port } = srv.address() as { port: number };
      srv.close(() => resolve(port));
    });
  });
}

async function waitForHealth(url: string, child: ChildProcess, log: () => string): Promise<void> {
  const deadline = Date.now() + 60_000;
  while (Date.now() < deadline) {
    if (child.exitCode !== null) throw new Error(`the app exited with code ${child.exitCode} before it was ready:\n${log()}`);
    try {
      const res = await fetch(`${url}/api/health`);
      if (res.ok) return;
    } catch {
      /* not listening yet */
    }
    await new Promise((r) => setTimeout(r, 250));
  }
  throw new Error(`the app did not answer ${url}/api/health within 60 s:\n${log()}`);
}

/**
 * Builds the app as `npm start` does, starts it on a free loopback port with a fresh data folder
 * (so the demo club is seeded anew), and hands the address to the browser tests.
 */
export default async function setup(project: TestProject) {
  if (!existsSync(CHROMIUM_PATH)) {
    throw new Error(
      `Browser tests need Debian's Chromium at ${CHROMIUM_PATH}. Install it with:\n` +
        `  sudo apt-get update && sudo apt-get install -y chromium\n` +
        `(or run .ci/run, which installs it). Playwright's own browser downloads are not used.`,
    );
  }
  execFileSync('npm', ['run', 'build'], { cwd: ROOT, stdio: 'inherit' });
  const dataDir = mkdtempSync(join(tmpdir(), 'fw-e2e-data-'));
  // Serve a copy of the built UI, so a rebuild elsewhere cannot pull files from under the running app.
  const uiDist = join(dataDir, 'ui-dist');
  cpSync(join(ROOT, 'ui', 'dist'), uiDist, { recursive: true });
  const port = await freePort();
  let output = '';
  const child = spawn(process.execPath, ['service/dist/main.js'], {
    cwd: ROOT,
    env: { ...process.env, PORT: String(port), HOST: '127.0.0.1', DATA_DIR: dataDir, UI_DIST: uiDist, SEED_DEMO: 'true', THROTTLE_LIMIT: '1000', NODE_ENV: 'test' },
    stdio: ['ignore', 'pipe', 'pipe'],
  });
  child.stdout!.on('data', (d) => (output += d));
  child.stderr!.on('data', (d) => (output += d));
  const baseUrl = `http://127.0.0.1:${port}`;
  await waitForHealth(baseUrl, child, () => output);
  project.provide('baseUrl', baseUrl);
  return async () => {
    child.kill('SIGTERM');
    await new Promise((r) => (child.exitCode !== null ? r(null) : child.once('exit', r)));
    rmSync(dataDir, { recursive: true, force: true });
  };
}
