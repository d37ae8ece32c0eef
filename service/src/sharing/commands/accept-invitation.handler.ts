import { Inject } from '@nestjs/common';
import { CommandHandler, type ICommandHandler } from '@nestjs/cqrs';
import { eq } from 'drizzle-orm';
import { shares, type Db } from '@fuelwright/db';
import { DB } from '../../database/database.tokens.js';
import { FieldsBadRequest } from '../../common/validation.js';
import { TokenService } from '../../auth/token.service.js';
import { selectShares } from '../share-row.js';
import { AcceptInvitationCommand } from './accept-invitation.command.js';

export const INVITATION_INVALID = 'this invitation link has expired, was already used, or was withdrawn';

/** Uses the invitation up and gives the signed-in user the share, when they are the invited address. */
@CommandHandler(AcceptInvitationCommand)
export class AcceptInvitationHandler implements ICommandHandler<AcceptInvitationCommand> {
  constructor(
    @Inject(DB) private readonly db: Db,
    private readonly tokens: TokenService,
  ) {}

  async execute({ user, token }: AcceptInvitationCommand) {
    const shareId = await this.db.transaction(async (tx) => {
      const t = await this.tokens.consume(tx, 'invitation', token);
      if (!t?.shareId) throw new FieldsBadRequest({ token: [INVITATION_INVALID] });
      // The link is for the invited address only (as at sign-up): a forwarded link does not open the
      // share for someone else. Throwing rolls the transaction back, so the invitation stays usable.
      if (t.email !== user.email.trim().toLowerCase()) {
        throw new FieldsBadRequest({ token: [`this invitation was sent to ${t.email}: sign in with that address to accept it`] });
      }
      const [s] = await tx.select().from(shares).where(eq(shares.id, t.shareId));
      if (!s || s.revokedAt) throw new FieldsBadRequest({ token: [INVITATION_INVALID] });
      if (s.ownerId === user.id) throw new FieldsBadRequest({ token: ['this is your own share: send the link to your coach or shop'] });
      await tx.update(shares).set({ granteeId: user.id }).where(eq(shares.id, s.id));
      return s.id;
    });
    const share = (await selectShares(this.db, eq(shares.id, shareId)))[0];
    return { share, caseId: share.caseId, kartId: share.kartId };
  }
}
