import { Inject } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { CommandHandler, type ICommandHandler } from '@nestjs/cqrs';
import { eq } from 'drizzle-orm';
import { shares, users, type Db } from '@fuelwright/db';
import type { AppConfig } from '../../config/app.config.js';
import { DB } from '../../database/database.tokens.js';
import { FieldsBadRequest } from '../../common/validation.js';
import { MailService } from '../../mail/mail.service.js';
import { hashPassword } from '../password.js';
import { SessionService } from '../session.service.js';
import { TokenService } from '../token.service.js';
import { toUserDto } from '../user-dto.js';
import { SignUpCommand } from './sign-up.command.js';

/**
 * New accounts are always racers (only an admin changes a role) and get an e-mail to verify their
 * address. Signing up through an invitation link proves the address and gives the account the
 * share, in one transaction; the share, not a role, lets it review what was shared (the inviter's
 * "as coach" or "as shop" only labels the share, so nobody gains shop powers by inviting a second
 * address of their own).
 */
@CommandHandler(SignUpCommand)
export class SignUpHandler implements ICommandHandler<SignUpCommand> {
  private readonly publicUrl: string;

  constructor(
    @Inject(DB) private readonly db: Db,
    private readonly sessions: SessionService,
    private readonly tokens: TokenService,
    private readonly mail: MailService,
    config: ConfigService,
  ) {
    this.publicUrl = config.getOrThrow<AppConfig>('app').publicUrl;
  }

  async execute(cmd: SignUpCommand) {
    const email = cmd.email.trim().toLowerCase();
    const passwordHash = await hashPassword(cmd.password);
    const row = await this.db.transaction(async (tx) => {
      let invitation: { shareId: string; caseId: string | null; kartId: string } | undefined;
      if (cmd.invitationToken) {
        const t = await this.tokens.consume(tx, 'invitation', cmd.invitationToken);
        if (!t?.shareId) throw new FieldsBadRequest({ invitationToken: ['this invitation link has expired, was already used, or was withdrawn'] });
        if (t.email !== email) throw new FieldsBadRequest({ email: [`use the address the invitation was sent to (${t.email})`] });
        const [s] = await tx.select().from(shares).where(eq(shares.id, t.shareId));
        if (!s || s.revokedAt) throw new FieldsBadRequest({ invitationToken: ['this invitation was withdrawn'] });
        invitation = { shareId: s.id, caseId: s.caseId, kartId: s.kartId };
      }
      const [inserted] = await tx
        .insert(users)
        .values({
          email,
          displayName: cmd.displayName.trim(),
          passwordHash,
          role: 'racer',
          emailVerifiedAt: invitation ? new Date() : null,
        })
        .onConflictDoNothing({ target: users.email })
        .returning();
      if (!inserted) {
        // Sign-up necessarily tells that an address is taken; sign-in, reset and invitations never do.
        throw new FieldsBadRequest({ email: ['an account with this e-mail already exists: sign in instead'] });
      }
      if (invitation) {
        await tx.update(shares).set({ granteeId: inserted.id }).where(eq(shares.id, invitation.shareId));
      } else {
        const token = await this.tokens.issue(tx, 'email-verification', email, { userId: inserted.id });
        await this.mail.enqueue(tx, {
          kind: 'email-verification',
          toEmail: email,
          toUserId: inserted.id,
          content: {
            subject: 'Confirm your e-mail address for Fuelwright',
            paragraphs: [`Welcome, ${inserted.displayName}.`, 'Confirm that this address is yours, so coaches and shops can reach you. The link works once and for 3 days.'],
            action: { label: 'Confirm my address', url: `${this.publicUrl}/verify-email?token=${token}` },
          },
        });
      }
      return { inserted, shared: invitation && { caseId: invitation.caseId, kartId: invitation.kartId } };
    });
    const { token, expiresAt } = await this.sessions.create(row.inserted.id);
    return { user: toUserDto(row.inserted), token, expiresAt, ...(row.shared ? { shared: row.shared } : {}) };
  }
}
