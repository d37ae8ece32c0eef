import { createHmac, randomBytes } from 'node:crypto';
import { Inject, Injectable } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { and, eq, gt, isNull } from 'drizzle-orm';
import { authTokens, type Db } from '@fuelwright/db';
import type { AppConfig } from '../config/app.config.js';
import { DB } from '../database/database.tokens.js';

type Tx = Parameters<Parameters<Db['transaction']>[0]>[0];
export type TokenKind = 'invitation' | 'email-verification' | 'password-reset';

export const TOKEN_TTL_MS: Record<TokenKind, number> = {
  invitation: 7 * 24 * 3600 * 1000,
  'email-verification': 3 * 24 * 3600 * 1000,
  'password-reset': 3600 * 1000,
};

/** Single-use, expiring tokens for e-mailed links; the database keeps only their keyed hash. */
@Injectable()
export class TokenService {
  private readonly secret: string;

  constructor(
    @Inject(DB) private readonly db: Db,
    config: ConfigService,
  ) {
    this.secret = config.getOrThrow<AppConfig>('app').sessionSecret;
  }

  hash(token: string): string {
    return createHmac('sha256', this.secret).update(`token:${token}`).digest('base64url');
  }

  async issue(tx: Db | Tx, kind: TokenKind, email: string, refs: { userId?: string; shareId?: string } = {}): Promise<string> {
    const token = randomBytes(32).toString('base64url');
    await tx.insert(authTokens).values({
      kind,
      tokenHash: this.hash(token),
      email,
      userId: refs.userId ?? null,
      shareId: refs.shareId ?? null,
      expiresAt: new Date(Date.now() + TOKEN_TTL_MS[kind]),
    });
    return token;
  }

  /** Finds a live token of this kind without using it up. */
  async peek(kind: TokenKind, token: string, db: Db | Tx = this.db) {
    const [row] = await db
      .select()
      .from(authTokens)
      .where(and(eq(authTokens.kind, kind), eq(authTokens.tokenHash, this.hash(token)), isNull(authTokens.usedAt), gt(authTokens.expiresAt, new Date())))
      .limit(1);
    return row;
  }

  /** Uses a token up, inside the caller's transaction; null when unknown, used or expired. */
  async consume(tx: Db | Tx, kind: TokenKind, token: string) {
    const [row] = await tx
      .update(authTokens)
      .set({ usedAt: new Date() })
      .where(and(eq(authTokens.kind, kind), eq(authTokens.tokenHash, this.hash(token)), isNull(authTokens.usedAt), gt(authTokens.expiresAt, new Date())))
      .returning();
    return row ?? null;
  }
}
