import { createHmac, randomBytes } from 'node:crypto';
import { Inject, Injectable } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { and, eq, gt, lt } from 'drizzle-orm';
import { sessions, users, type Db } from '@fuelwright/db';
import type { AppConfig } from '../config/app.config.js';
import { DB } from '../database/database.tokens.js';
import type { SessionUser } from '../common/session-user.js';

/**
 * Sessions are rows: the cookie holds a random 256-bit token, the row holds its HMAC under the
 * server secret. Sign-out deletes the row, so a stolen cookie dies with it.
 */
@Injectable()
export class SessionService {
  private readonly secret: string;
  readonly maxAgeMs: number;

  constructor(
    @Inject(DB) private readonly db: Db,
    config: ConfigService,
  ) {
    const app = config.getOrThrow<AppConfig>('app');
    this.secret = app.sessionSecret;
    this.maxAgeMs = app.sessionDays * 24 * 3600 * 1000;
  }

  private hash(token: string): string {
    return createHmac('sha256', this.secret).update(token).digest('base64url');
  }

  async create(userId: string): Promise<{ token: string; expiresAt: Date }> {
    const token = randomBytes(32).toString('base64url');
    const expiresAt = new Date(Date.now() + this.maxAgeMs);
    await this.db.insert(sessions).values({ tokenHash: this.hash(token), userId, expiresAt });
    // Expired rows of this user go at the same time; no sweeper needed.
    await this.db.delete(sessions).where(and(eq(sessions.userId, userId), lt(sessions.expiresAt, new Date())));
    return { token, expiresAt };
  }

  async resolve(token: string): Promise<SessionUser | null> {
    const rows = await this.db
      .select({
        sessionId: sessions.id,
        id: users.id,
        email: users.email,
        displayName: users.displayName,
        role: users.role,
        createdAt: users.createdAt,
        emailVerifiedAt: users.emailVerifiedAt,
      })
      .from(sessions)
      .innerJoin(users, eq(users.id, sessions.userId))
      .where(and(eq(sessions.tokenHash, this.hash(token)), gt(sessions.expiresAt, new Date())))
      .limit(1);
    return rows[0] ?? null;
  }

  async revoke(sessionId: string): Promise<void> {
    await this.db.delete(sessions).where(eq(sessions.id, sessionId));
  }
}
