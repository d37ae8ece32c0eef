import { ConflictException } from '@nestjs/common';
import { eq } from 'drizzle-orm';
import { users } from '@fuelwright/db';
import { CommandHandler, type ICommandHandler } from '@nestjs/cqrs';
import { MailService } from '../../mail/mail.service.js';
import { FieldsBadRequest } from '../../common/validation.js';
import { canApply } from '../../cases/case-projection.js';
import { CaseRanking } from '../../cases/case-ranking.js';
import { CaseStore } from '../../cases/case-store.js';
import { ReviewContext } from '../review-context.js';
import { RecommendCheckCommand } from './recommend-check.command.js';

/** A coach or shop puts a check at the top of the racer's plan, with their reason, as a case event. */
@CommandHandler(RecommendCheckCommand)
export class RecommendCheckHandler implements ICommandHandler<RecommendCheckCommand> {
  constructor(
    private readonly review: ReviewContext,
    private readonly store: CaseStore,
    private readonly ranking: CaseRanking,
    private readonly mail: MailService,
  ) {}

  async execute({ user, caseId, checkId, reason }: RecommendCheckCommand) {
    const c = await this.review.load(user, caseId, 'recommend-check');
    const label = this.ranking.checkLabel(checkId, c.row.rulesetVersion);
    if (!label) throw new FieldsBadRequest({ checkId: [`unknown check "${checkId}": pick one from the catalog`] });
    if (!canApply(c.projection.state, 'check-recommended')) throw new ConflictException(`This case is ${c.projection.state}; it takes no more checks.`);
    const [owner] = c.row.ownerId === user.id ? [] : [{ id: c.row.ownerId }];
    await this.store.append(c, user.id, [{ type: 'check-recommended', payload: { checkId, reason } }], async (tx) => {
      if (!owner) return;
      const [o] = await tx.select({ email: users.email }).from(users).where(eq(users.id, owner.id));
      await this.mail.enqueue(tx, {
        kind: 'check-recommended',
        toEmail: o.email,
        toUserId: owner.id,
        content: {
          subject: `${user.displayName} recommends a check on "${c.kartName}"`,
          paragraphs: [`${user.displayName} recommends doing this check next: ${label}.`, `Why: ${reason}`, 'It is now at the top of your plan.'],
          action: { label: 'Open the case', url: this.review.caseUrl(caseId) },
        },
      });
    });
    return this.store.dto(await this.store.mustLoad(caseId));
  }
}
