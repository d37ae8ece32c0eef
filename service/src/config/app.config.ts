import { randomBytes } from 'node:crypto';
import { chmodSync, existsSync, mkdirSync, readFileSync, writeFileSync } from 'node:fs';
import { isAbsolute, join, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';
import { registerAs } from '@nestjs/config';

export interface AppConfig {
  port: number;
  host: string;
  /** Folder of the embedded database and the generated development secret. */
  dataDir: string;
  /** When set, a PostgreSQL server is used instead of the embedded database. */
  databaseUrl?: string;
  sessionSecret: string;
  sessionDays: number;
  cookieSecure: boolean;
  seedDemo: boolean;
  /** Built UI to serve beside the API; absent folder = API only. */
  uiDist: string;
  /** Requests per window on the rate-limited routes (sign-in, sign-up, the open rank route). */
  throttleLimit: number;
  throttleTtlMs: number;
  /** Address of the app as users reach it, for links in e-mails. */
  publicUrl: string;
  /** A real SMTP service (smtp:// or smtps:// URL); when absent a local capture server on loopback stands in. */
  smtpUrl?: string;
  mailFrom: string;
  /** Port of the local mail capture server (0 = any free port). */
  mailCapturePort: number;
  /** How often the outbox sender looks for due messages (0 = only when asked, as tests do). */
  mailPollMs: number;
  /** Object storage for photos: an S3-compatible endpoint; when absent a local fake on loopback stands in. */
  s3Endpoint?: string;
  s3Region: string;
  s3Bucket: string;
  s3AccessKeyId: string;
  s3SecretAccessKey: string;
  /** Folder of the local object-storage fake (default: <dataDir>/objects). */
  objectsDir: string;
}

const DEFAULT_UI_DIST = fileURLToPath(new URL('../../../ui/dist', import.meta.url));

export class ConfigError extends Error {}

function int(env: NodeJS.ProcessEnv, name: string, fallback: number, min: number, max: number): number {
  const raw = env[name];
  if (raw === undefined || raw === '') return fallback;
  const n = Number(raw);
  if (!Number.isInteger(n) || n < min || n > max) {
    throw new ConfigError(`${name} must be a whole number from ${min} to ${max} (got "${raw}")`);
  }
  return n;
}

function bool(env: NodeJS.ProcessEnv, name: string, fallback: boolean): boolean {
  const raw = env[name];
  if (raw === undefined || raw === '') return fallback;
  if (['1', 'true', 'yes'].includes(raw.toLowerCase())) return true;
  if (['0', 'false', 'no'].includes(raw.toLowerCase())) return false;
  throw new ConfigError(`${name} must be true or false (got "${raw}")`);
}

/**
 * The development secret: generated once, kept in the data folder (never in the repository).
 * A deployment sets SESSION_SECRET instead.
 */
export function loadOrCreateSecret(dataDir: string): string {
  const file = join(dataDir, 'session-secret');
  if (existsSync(file)) {
    const s = readFileSync(file, 'utf8').trim();
    if (s.length >= 32) return s;
  }
  mkdirSync(dataDir, { recursive: true });
  const s = randomBytes(48).toString('base64url');
  writeFileSync(file, s + '\n', { mode: 0o600 });
  // `mode` only applies when the file is created; a replaced (damaged) file is tightened here.
  chmodSync(file, 0o600);
  return s;
}

function smtpUrl(raw: string | undefined): string | undefined {
  if (!raw) return undefined;
  if (!/^smtps?:\/\//.test(raw)) throw new ConfigError('SMTP_URL must start with smtp:// or smtps://');
  return raw;
}

/** Reads and validates the configuration; a bad value stops start-up with the variable named. */
export function loadAppConfig(env: NodeJS.ProcessEnv = process.env): AppConfig {
  const dataDirRaw = env.DATA_DIR || './data';
  const dataDir = isAbsolute(dataDirRaw) ? dataDirRaw : resolve(process.cwd(), dataDirRaw);
  const databaseUrl = env.DATABASE_URL || undefined;
  if (databaseUrl && !/^postgres(ql)?:\/\//.test(databaseUrl)) {
    throw new ConfigError('DATABASE_URL must start with postgres:// or postgresql://');
  }
  let sessionSecret = env.SESSION_SECRET;
  if (sessionSecret !== undefined && sessionSecret !== '' && sessionSecret.length < 32) {
    throw new ConfigError('SESSION_SECRET must be at least 32 characters');
  }
  if (!sessionSecret) {
    if (env.NODE_ENV === 'production') throw new ConfigError('SESSION_SECRET is required when NODE_ENV=production');
    sessionSecret = loadOrCreateSecret(dataDir);
  }
  if (env.NODE_ENV === 'production' && !env.SMTP_URL) {
    // Without a real mail service, mail would go to the local capture, whose outbox page shows
    // invitation, verification and reset links in full.
    throw new ConfigError('SMTP_URL is required when NODE_ENV=production (the local mail capture is for development and tests)');
  }
  const host = env.HOST || '127.0.0.1';
  return {
    port: int(env, 'PORT', 3000, 0, 65535),
    host,
    dataDir,
    databaseUrl,
    sessionSecret,
    sessionDays: int(env, 'SESSION_DAYS', 30, 1, 365),
    cookieSecure: bool(env, 'COOKIE_SECURE', env.NODE_ENV === 'production'),
    seedDemo: bool(env, 'SEED_DEMO', true),
    uiDist: env.UI_DIST ? resolve(env.UI_DIST) : DEFAULT_UI_DIST,
    throttleLimit: int(env, 'THROTTLE_LIMIT', 20, 1, 100_000),
    throttleTtlMs: int(env, 'THROTTLE_TTL_MS', 60_000, 1_000, 3_600_000),
    publicUrl: (env.PUBLIC_URL || `http://localhost:${int(env, 'PORT', 3000, 0, 65535)}`).replace(/\/+$/, ''),
    smtpUrl: smtpUrl(env.SMTP_URL),
    mailFrom: env.MAIL_FROM || 'Fuelwright <no-reply@fuelwright.test>',
    mailCapturePort: int(env, 'MAIL_CAPTURE_PORT', 0, 0, 65535),
    mailPollMs: int(env, 'MAIL_POLL_MS', 2000, 0, 3_600_000),
    s3Endpoint: env.S3_ENDPOINT || undefined,
    s3Region: env.S3_REGION || 'us-east-1',
    s3Bucket: env.S3_BUCKET || 'fuelwright-photos',
    s3AccessKeyId: env.S3_ACCESS_KEY_ID || 'S3RVER',
    s3SecretAccessKey: env.S3_SECRET_ACCESS_KEY || 'S3RVER',
    objectsDir: env.OBJECTS_DIR ? resolve(env.OBJECTS_DIR) : join(dataDir, 'objects'),
  };
}

export const appConfig = registerAs('app', (): AppConfig => loadAppConfig());
