import { Inject } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { CommandHandler, type ICommandHandler } from '@nestjs/cqrs';
import { and, eq, isNull } from 'drizzle-orm';
import { cases, shares, users, type Db } from '@fuelwright/db';
import type { AppConfig } from '../../config/app.config.js';
import { DB } from '../../database/database.tokens.js';
import { FieldsBadRequest } from '../../common/validation.js';
import { findKart } from '../../karts/kart-row.js';
import { TokenService } from '../../auth/token.service.js';
import { MailService } from '../../mail/mail.service.js';
import { selectShares } from '../share-row.js';
import { CreateShareCommand } from './create-share.command.js';

/**
 * Shares a kart or a case with a coach or a shop. Every share, to an existing account or not, is
 * accepted through the single-use link e-mailed to the address: the answer is the same either way,
 * so the form tells nobody whether an address has an account.
 */
@CommandHandler(CreateShareCommand)
export class CreateShareHandler implements ICommandHandler<CreateShareCommand> {
  private readonly publicUrl: string;

  constructor(
    @Inject(DB) private readonly db: Db,
    private readonly tokens: TokenService,
    private readonly mail: MailService,
    config: ConfigService,
  ) {
    this.publicUrl = config.getOrThrow<AppConfig>('app').publicUrl;
  }

  async execute({ user, input }: CreateShareCommand) {
    const email = input.email.trim().toLowerCase();
    if (email === user.email) throw new FieldsBadRequest({ email: ['that is your own address: share with your coach or shop'] });
    let kartId: string;
    let caseId: string | null = null;
    if (input.scope === 'case') {
      const [c] = await this.db.select({ ownerId: cases.ownerId, kartId: cases.kartId }).from(cases).where(eq(cases.id, input.caseId!));
      if (!c || c.ownerId !== user.id) throw new FieldsBadRequest({ caseId: ['caseId must be the id of one of your cases'] });
      kartId = c.kartId;
      caseId = input.caseId!;
    } else {
      const kart = await findKart(this.db, input.kartId!);
      if (!kart || kart.ownerId !== user.id) throw new FieldsBadRequest({ kartId: ['kartId must be the id of one of your karts'] });
      kartId = kart.id;
    }
    const kart = (await findKart(this.db, kartId))!;
    const shareId = await this.db.transaction(async (tx) => {
      const [existing] = await tx
        .select({ id: shares.id })
        .from(shares)
        .where(
          and(
            eq(shares.ownerId, user.id),
            eq(shares.scope, input.scope),
            eq(shares.kartId, kartId),
            caseId ? eq(shares.caseId, caseId) : isNull(shares.caseId),
            eq(shares.inviteeEmail, email),
            isNull(shares.revokedAt),
          ),
        );
      const id =
        existing?.id ??
        (await tx.insert(shares).values({ ownerId: user.id, scope: input.scope, kartId, caseId, inviteeEmail: email, inviteeRole: input.as }).returning({ id: shares.id }))[0].id;
      const token = await this.tokens.issue(tx, 'invitation', email, { shareId: id });
      // An invitee who already has an account gets it as theirs, so their "invitation" setting and the
      // unsubscribe link apply (the answer to the racer stays the same either way).
      const [invitee] = await tx.select({ id: users.id }).from(users).where(eq(users.email, email));
      const what = input.scope === 'case' ? `a running problem on the kart "${kart.name}"` : `the kart "${kart.name}" and its cases`;
      await this.mail.enqueue(tx, {
        kind: 'invitation',
        toEmail: email,
        toUserId: invitee?.id ?? null,
        content: {
          subject: `${user.displayName} shared ${input.scope === 'case' ? 'a case' : 'a kart'} with you on Fuelwright`,
          paragraphs: [
            `${user.displayName} would like you to review ${what} as their ${input.as}.`,
            'Open the link to sign in, or to create an account if you have none, and see it. The link works once and for 7 days.',
            'If you do not know this person, ignore this e-mail.',
          ],
          action: { label: 'See what was shared', url: `${this.publicUrl}/invitations/${token}` },
        },
      });
      return id;
    });
    return (await selectShares(this.db, eq(shares.id, shareId)))[0];
  }
}
