import { Inject } from '@nestjs/common';
import { CommandHandler, type ICommandHandler } from '@nestjs/cqrs';
import { eq } from 'drizzle-orm';
import { cases, photoRequests, users, type Db } from '@fuelwright/db';
import { DB } from '../../database/database.tokens.js';
import { MailService } from '../../mail/mail.service.js';
import { FieldsBadRequest } from '../../common/validation.js';
import { CaseRanking } from '../../cases/case-ranking.js';
import { ReviewContext } from '../review-context.js';
import { RequestPhotoCommand } from './request-photo.command.js';

@CommandHandler(RequestPhotoCommand)
export class RequestPhotoHandler implements ICommandHandler<RequestPhotoCommand> {
  constructor(
    @Inject(DB) private readonly db: Db,
    private readonly review: ReviewContext,
    private readonly ranking: CaseRanking,
    private readonly mail: MailService,
  ) {}

  async execute({ user, caseId, what, checkId }: RequestPhotoCommand) {
    const c = await this.review.load(user, caseId, 'comment');
    if (c.row.ownerId === user.id) throw new FieldsBadRequest({ what: ['photo requests come from a coach or shop: attach the photo yourself instead'] });
    if (checkId && !this.ranking.checkLabel(checkId, c.row.rulesetVersion)) throw new FieldsBadRequest({ checkId: [`unknown check "${checkId}"`] });
    const row = await this.db.transaction(async (tx) => {
      const [inserted] = await tx.insert(photoRequests).values({ caseId, requestedBy: user.id, what, checkId: checkId ?? null }).returning();
      // A photo request is a change to the case: it moves the case up the shared-cases dashboard.
      await tx.update(cases).set({ updatedAt: new Date() }).where(eq(cases.id, caseId));
      const [owner] = await tx.select({ email: users.email }).from(users).where(eq(users.id, c.row.ownerId));
      await this.mail.enqueue(tx, {
        kind: 'photo-requested',
        toEmail: owner.email,
        toUserId: c.row.ownerId,
        content: {
          subject: `${user.displayName} asks for a photo on "${c.kartName}"`,
          paragraphs: [`${user.displayName} would like a photo of: ${what}`, 'Let the engine cool and keep fuel away from sparks before you open anything for the photo.'],
          action: { label: 'Open the case and upload it', url: this.review.caseUrl(caseId) },
        },
      });
      return inserted;
    });
    return {
      id: row.id,
      caseId,
      what: row.what,
      checkId: row.checkId,
      requestedBy: user.id,
      requestedByName: user.displayName,
      fulfilledByPhotoId: null,
      createdAt: row.createdAt.toISOString(),
    };
  }
}
