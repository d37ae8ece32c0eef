import { Inject, Injectable } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { eq } from 'drizzle-orm';
import { sessions, users, type Db } from '@fuelwright/db';
import type { AppConfig } from '../config/app.config.js';
import { DB } from '../database/database.tokens.js';
import { FieldsBadRequest } from '../common/validation.js';
import { MailService } from '../mail/mail.service.js';
import { hashPassword } from './password.js';
import { TokenService } from './token.service.js';

const LINK_INVALID = 'this link has expired or was already used: ask for a new one';

/** E-mail verification and password reset, both through single-use, expiring links. */
@Injectable()
export class AccountTokensService {
  private readonly publicUrl: string;

  constructor(
    @Inject(DB) private readonly db: Db,
    private readonly tokens: TokenService,
    private readonly mail: MailService,
    config: ConfigService,
  ) {
    this.publicUrl = config.getOrThrow<AppConfig>('app').publicUrl;
  }

  async verifyEmail(token: string): Promise<void> {
    await this.db.transaction(async (tx) => {
      const t = await this.tokens.consume(tx, 'email-verification', token);
      if (!t?.userId) throw new FieldsBadRequest({ token: [LINK_INVALID] });
      await tx.update(users).set({ emailVerifiedAt: new Date() }).where(eq(users.id, t.userId));
    });
  }

  /** Always the same answer, whether or not the address has an account (no enumeration). */
  async requestReset(emailRaw: string): Promise<void> {
    const email = emailRaw.trim().toLowerCase();
    const [u] = await this.db.select({ id: users.id }).from(users).where(eq(users.email, email));
    if (!u) return;
    await this.db.transaction(async (tx) => {
      const token = await this.tokens.issue(tx, 'password-reset', email, { userId: u.id });
      await this.mail.enqueue(tx, {
        kind: 'password-reset',
        toEmail: email,
        toUserId: u.id,
        content: {
          subject: 'Reset your Fuelwright password',
          paragraphs: ['Someone asked to reset the password of this account. If it was you, open the link within an hour; it works once.', 'If it was not you, ignore this e-mail: your password stays as it is.'],
          action: { label: 'Choose a new password', url: `${this.publicUrl}/reset-password?token=${token}` },
        },
      });
    });
  }

  /** Sets the new password and signs the account out everywhere. */
  async resetPassword(token: string, password: string): Promise<void> {
    const passwordHash = await hashPassword(password);
    await this.db.transaction(async (tx) => {
      const t = await this.tokens.consume(tx, 'password-reset', token);
      if (!t?.userId) throw new FieldsBadRequest({ token: [LINK_INVALID] });
      await tx.update(users).set({ passwordHash, updatedAt: new Date(), emailVerifiedAt: new Date() }).where(eq(users.id, t.userId));
      await tx.delete(sessions).where(eq(sessions.userId, t.userId));
    });
  }
}
