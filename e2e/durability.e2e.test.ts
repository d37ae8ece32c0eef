import { spawn, type ChildProcess } from 'node:child_process';
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { afterAll, describe, expect, it } from 'vitest';

const ROOT = fileURLToPath(new URL('..', import.meta.url));
const PORT = 39_000 + Math.floor(Math.random() * 1000);
const BASE = `http://127.0.0.1:${PORT}`;
const dataDir = mkdtempSync(join(tmpdir(), 'fw-durability-'));

function start(): ChildProcess {
  return spawn(process.execPath, ['service/dist/main.js'], {
    cwd: ROOT,
    env: { ...process.env, PORT: String(PORT), HOST: '127.0.0.1', DATA_DIR: dataDir, NODE_ENV: 'test' },
    stdio: 'ignore',
  });
}

async function ready(child: ChildProcess): Promise<void> {
  for (let i = 0; i < 240; i++) {
    if (child.exitCode !== null) throw new Error(`service exited with ${child.exitCode}`);
    try {
      if ((await fetch(`${BASE}/api/health`)).ok) return;
    } catch {
      /* not yet */
    }
    await new Promise((r) => setTimeout(r, 250));
  }
  throw new Error('service not ready in 60 s');
}

async function stopped(child: ChildProcess, signal: NodeJS.Signals): Promise<void> {
  const exited = new Promise((r) => child.once('exit', r));
  child.kill(signal);
  await exited;
}

describe('the embedded database keeps what was written', () => {
  let child: ChildProcess | undefined;
  afterAll(async () => {
    if (child && child.exitCode === null) await stopped(child, 'SIGTERM');
    rmSync(dataDir, { recursive: true, force: true });
  });

  it('after a kill -9 and after a clean restart, the kart and the session are still there', async () => {
    child = start();
    await ready(child);
    const signIn = await fetch(`${BASE}/api/auth/sign-in`, {
      method: 'POST',
      headers: { 'content-type': 'application/json' },
      body: JSON.stringify({ email: 'racer@fuelwright.test', password: 'fuelwright-demo' }),
    });
    expect(signIn.status).toBe(200);
    const cookie = signIn.headers.get('set-cookie')!.split(';')[0];
    const created = await fetch(`${BASE}/api/karts`, {
      method: 'POST',
      headers: { 'content-type': 'application/json', cookie },
      body: JSON.stringify({ name: 'Survivor', displacementCc: 125, drive: 'gearbox', carburettorKind: 'pump-around' }),
    });
    expect(created.status).toBe(201);

    await stopped(child, 'SIGKILL');
    child = start();
    await ready(child);
    let karts = (await (await fetch(`${BASE}/api/karts`, { headers: { cookie } })).json()) as { karts: { name: string }[] };
    expect(karts.karts.map((k) => k.name)).toContain('Survivor');

    await stopped(child, 'SIGTERM');
    child = start();
    await ready(child);
    karts = (await (await fetch(`${BASE}/api/karts`, { headers: { cookie } })).json()) as { karts: { name: string }[] };
    expect(karts.karts.map((k) => k.name)).toContain('Survivor');
    // The demo club is seeded once, not again on restart.
    expect(karts.karts.filter((k) => k.name === 'Blue 27')).toHaveLength(1);
  });
});
